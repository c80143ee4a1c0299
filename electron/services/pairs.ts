import { addPair, getPair, listPairs, removePair, updatePair } from '../../db/repositories/pairs';
import { targetFitsPair, type pairOperations } from '../../shared-model/api/pairs';
import { invalid } from '../../shared-model/api/result';
import type { HandlerMap } from './context';

export const pairHandlers: HandlerMap<keyof typeof pairOperations> = {
  'pairs.add': (input, { store }) =>
    addPair(store.db, {
      campaignId: input.campaignId,
      elementA: input.pair.elementA,
      elementB: input.pair.elementB,
      target: input.target,
      notes: input.notes,
    }),
  'pairs.list': (input, { store }) => listPairs(store.db, input.campaignId),
  'pairs.update': (input, { store }) => {
    if (input.target !== undefined) {
      const pair = getPair(store.db, input.id);
      if (!targetFitsPair(input.target, [pair.elementA, pair.elementB])) {
        throw invalid('target', `"${input.target}" is not a target for ${pair.elementA}-${pair.elementB}`);
      }
    }
    return updatePair(store.db, input.id, { status: input.status, target: input.target, notes: input.notes });
  },
  'pairs.remove': (input, { store }) => ({ removed: removePair(store.db, input.id) }),
};
