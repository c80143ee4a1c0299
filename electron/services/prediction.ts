/** Segregation prediction services: predict, rank, isotherms, stored predictions, element table. */
import { insertPrediction, listPredictionsForPair } from '../../db/repositories/predictions';
import type { predictionOperations } from '../../shared-model/api/prediction';
import { ELEMENT_COLUMN_SOURCES, ELEMENT_RECORDS } from '../../shared-model/elements/element-table';
import { computeIsotherm } from '../../shared-model/prediction/isotherm';
import { predictPair, type Prediction } from '../../shared-model/prediction/predict';
import { describeRankTarget, rankPairs, splitByTarget } from '../../shared-model/prediction/rank';
import type { HandlerMap } from './context';

/** A plain copy (the lazily built `reason` becomes a data property) that any transport can carry. */
function plain(prediction: Prediction): Prediction {
  return { ...prediction, flags: [...prediction.flags] };
}

export const predictionHandlers: HandlerMap<keyof typeof predictionOperations> = {
  'prediction.predict': (input) => plain(predictPair(input.pair.elementA, input.pair.elementB, input.conditions)),
  'prediction.rank': (input) => {
    const ranked = rankPairs(input.elements, input.target, input.conditions);
    // the answer to the question asked: only the pairs that meet the target; the rest on request
    const { meeting, missing } = splitByTarget(ranked, input.target);
    const kept = input.limit === undefined ? meeting : meeting.slice(0, input.limit);
    const shownMissing = input.all === true ? missing : meeting.length === 0 ? missing.slice(0, 3) : [];
    return {
      target: describeRankTarget(input.target),
      conditions: input.conditions,
      rows: kept.map((row) => ({ rank: row.rank, score: row.score, prediction: plain(row.prediction) })),
      meeting: meeting.length,
      ranked: ranked.length,
      missing: shownMissing.map((row) => ({
        rank: row.rank,
        score: row.score,
        prediction: plain(row.prediction),
        miss: row.miss,
      })),
    };
  },
  'prediction.isotherm': (input) =>
    computeIsotherm(input.pair.elementA, input.pair.elementB, input.conditions, input.sweep, input.points),
  'prediction.save': (input, { store }) => {
    const { elementA, elementB } = input.pair;
    const result = plain(predictPair(elementA, elementB, input.conditions));
    return insertPrediction(store.db, {
      pairId: input.pairId ?? null,
      inputs: { elementA, elementB, conditions: input.conditions },
      result,
    });
  },
  'prediction.listForPair': (input, { store }) => listPredictionsForPair(store.db, input.pairId),
  'elements.table': () => ({
    elements: ELEMENT_RECORDS.map((record) => ({ ...record })),
    sources: [...ELEMENT_COLUMN_SOURCES],
  }),
};
