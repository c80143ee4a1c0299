import { z } from 'zod';
import { parseArchitecture } from '../architecture/labels';
import { operation } from './operation';
import { idSchema, pairTextSchema } from './schemas';

export const PAIR_STATUSES = ['candidate', 'planned', 'in synthesis', 'characterized', 'dropped'] as const;
export type PairStatus = (typeof PAIR_STATUSES)[number];

export interface CandidatePair {
  id: number;
  campaignId: number;
  elementA: string;
  elementB: string;
  /** Target architecture label, e.g. "alloy", "Ni@Pt", "Janus". */
  target: string;
  status: PairStatus;
  notes: string;
  createdAt: string;
  updatedAt: string;
}

const targetText = z
  .string({ error: 'must be an architecture such as alloy, Ni@Pt or Janus' })
  .trim()
  .min(1, 'must not be empty');
const statusSchema = z.enum(PAIR_STATUSES, { error: `must be one of: ${PAIR_STATUSES.join(', ')}` });
const notesSchema = z.string({ error: 'must be text' }).max(4000, 'must be at most 4000 characters');

function targetFitsPair(target: string, pair: readonly [string, string]): boolean {
  const parsed = parseArchitecture(target, pair);
  return parsed !== null && parsed.kind !== 'hollow' && parsed.kind !== 'other';
}

export const pairOperations = {
  'pairs.add': operation<CandidatePair>()({
    kind: 'command',
    summary: 'Add a candidate pair to a campaign',
    input: z
      .object({
        campaignId: idSchema,
        pair: pairTextSchema,
        target: targetText.default('alloy'),
        notes: notesSchema.default(''),
      })
      .superRefine((value, ctx) => {
        const pair = [value.pair.elementA, value.pair.elementB] as const;
        if (!targetFitsPair(value.target, pair)) {
          ctx.addIssue({
            code: 'custom',
            path: ['target'],
            message: `"${value.target}" is not a target for ${pair[0]}-${pair[1]}; use alloy, surface-enriched alloy, ${pair[0]}@${pair[1]}, ${pair[1]}@${pair[0]}, Janus or intermetallic`,
          });
        }
      }),
  }),
  'pairs.list': operation<CandidatePair[]>()({
    kind: 'query',
    summary: 'List the candidate pairs of a campaign',
    input: z.object({ campaignId: idSchema }),
  }),
  'pairs.update': operation<CandidatePair>()({
    kind: 'command',
    summary: 'Change the status, target or notes of a pair',
    input: z.object({
      id: idSchema,
      status: statusSchema.optional(),
      target: targetText.optional(),
      notes: notesSchema.optional(),
    }),
  }),
  'pairs.remove': operation<{ removed: number }>()({
    kind: 'command',
    summary: 'Remove a pair (needs confirm: true)',
    input: z.object({
      id: idSchema,
      confirm: z.literal(true, { error: 'removing a pair needs confirmation (confirm: true)' }),
    }),
  }),
};

export { targetFitsPair };
