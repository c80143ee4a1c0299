/**
 * API operations of the segregation prediction (issue 3): predict one pair, rank an element set for a
 * target, isotherms for the pair detail view, save a prediction linked to a campaign pair, list them,
 * and the element property table with its sources.
 */
import { z } from 'zod';
import type { ClassificationThresholds } from '../architecture/classify';
import type { ColumnSource, ElementRecord } from '../elements/element-table';
import { METAL_SYMBOLS } from '../elements/symbols';
import type { Isotherm } from '../prediction/isotherm';
import { ISOTHERM_SWEEPS } from '../prediction/isotherm';
import type { Prediction } from '../prediction/predict';
import { PREDICTION_DEFAULTS, STRAIN_RULES } from '../prediction/conditions';
import { ENVIRONMENTS } from '../prediction/environment';
import { parseRankTarget, type RankTarget } from '../prediction/rank';
import { SURFACE_FACETS } from '../prediction/segregation';
import { DomainError } from './result';
import { operation } from './operation';
import { elementSymbolSchema, idSchema, pairTextSchema, particleShapeSchema } from './schemas';

// z.number() refuses NaN and ±Infinity (zod 4), so every bound below is a finite physical range.
const finite = (what: string) => z.number({ error: `must be a number (${what})` });

export const xBSchema = finite('atomic fraction of B')
  .gt(0, 'must lie strictly between 0 and 1 (atomic fraction of B)')
  .lt(1, 'must lie strictly between 0 and 1 (atomic fraction of B)');
// Clusters below a few atoms are refused by the model itself (field diameterNm, with the smallest size it takes).
export const diameterNmSchema = finite('nm')
  .gt(0, 'must be a positive diameter in nm')
  .max(1000, 'must be at most 1000 nm');
export const temperatureKSchema = finite('K')
  .gt(0, 'must be a positive temperature in K')
  // At least 1 K: the models are for synthesis and annealing temperatures; a denormal such as 5e-324 K is refused.
  .min(1, 'must be at least 1 K')
  .max(5000, 'must be at most 5000 K');
export const facetSchema = z.enum(SURFACE_FACETS, { error: 'must be "111" or "100"' });
export const environmentSchema = z.enum(ENVIRONMENTS, { error: `must be one of: ${ENVIRONMENTS.join(', ')}` });
// 1e-15 bar (below ultra-high vacuum, ~1e-13 bar; common practice) to 1000 bar.
export const pressureBarSchema = finite('bar')
  .gt(0, 'must be a positive pressure in bar')
  .min(1e-15, 'must be at least 1e-15 bar')
  .max(1000, 'must be at most 1000 bar');
// One second (1/3600 h) to 10,000 h (over a year of annealing).
export const timeHSchema = finite('h')
  .gt(0, 'must be a positive time in hours')
  .min(1 / 3600, 'must be at least one second (1/3600 h)')
  .max(10000, 'must be at most 10000 h');
export const strainRuleSchema = z.enum(STRAIN_RULES, { error: `must be one of: ${STRAIN_RULES.join(', ')}` });

// Enrichment E = (xs − x)/(1 − x) lies in (0, 1]; the unlike-neighbour ratio to a random alloy stays within a few
// units for any composition, so 100 is a generous cap (common practice).
const enrichmentThreshold = finite('enrichment, 0–1').gt(0, 'must be above 0').max(1, 'must be at most 1');
const unlikeRatioThreshold = finite('unlike-neighbour ratio')
  .gt(0, 'must be a positive number')
  .max(100, 'must be at most 100');
export const thresholdsSchema = z
  .object({
    coreShellEnrichment: enrichmentThreshold,
    enrichedAlloyEnrichment: enrichmentThreshold,
    janusUnlikeRatio: unlikeRatioThreshold,
    intermetallicUnlikeRatio: unlikeRatioThreshold,
  })
  .partial()
  .transform((t): ClassificationThresholds => ({ ...PREDICTION_DEFAULTS.thresholds, ...t }))
  .superRefine((t, ctx) => {
    if (t.enrichedAlloyEnrichment >= t.coreShellEnrichment) {
      ctx.addIssue({ code: 'custom', path: ['enrichedAlloyEnrichment'], message: 'must be below coreShellEnrichment' });
    }
    if (t.janusUnlikeRatio >= t.intermetallicUnlikeRatio) {
      ctx.addIssue({ code: 'custom', path: ['janusUnlikeRatio'], message: 'must be below intermetallicUnlikeRatio' });
    }
  });

/** The one validator of prediction conditions from outside; defaults from PREDICTION_DEFAULTS (model). */
export const conditionsSchema = z.object({
  xB: xBSchema,
  diameterNm: diameterNmSchema,
  shape: particleShapeSchema.default(PREDICTION_DEFAULTS.shape),
  temperatureK: temperatureKSchema,
  facet: facetSchema.default(PREDICTION_DEFAULTS.facet),
  strainRule: strainRuleSchema.default(PREDICTION_DEFAULTS.strainRule),
  thresholds: thresholdsSchema.default(() => ({ ...PREDICTION_DEFAULTS.thresholds })),
  environment: environmentSchema.default(PREDICTION_DEFAULTS.environment),
  pressureBar: pressureBarSchema.default(PREDICTION_DEFAULTS.pressureBar),
  timeH: timeHSchema.default(PREDICTION_DEFAULTS.timeH),
});
export type ConditionsInput = z.input<typeof conditionsSchema>;

export const rankTargetSchema = z
  .string({ error: 'must be a target such as alloy, core@shell, core@shell:Pt or Janus' })
  .transform((text, ctx): RankTarget => {
    try {
      return parseRankTarget(text);
    } catch (error) {
      if (error instanceof DomainError) {
        ctx.addIssue({ code: 'custom', message: error.message });
        return z.NEVER;
      }
      throw error;
    }
  });

export const elementListSchema = z.union(
  [
    z.literal('all'),
    z
      .array(elementSymbolSchema, { error: 'must be a list of element symbols or "all"' })
      .min(2, 'give at least two elements')
      .refine((list) => new Set(list).size === list.length, { error: 'lists an element twice' }),
  ],
  { error: `must be "all" or a list of symbols from: ${METAL_SYMBOLS.join(' ')}` },
);

export interface RankRow {
  rank: number;
  score: number;
  prediction: Prediction;
}

export interface MissRow extends RankRow {
  /** Why the pair does not meet the target, e.g. "Ag goes to the surface, not Pt". */
  miss: string;
}

export interface RankResult {
  target: string;
  conditions: z.output<typeof conditionsSchema>;
  /** Only the pairs whose prediction meets the target, best first. */
  rows: RankRow[];
  /** How many pairs meet the target (before any limit) and how many were ranked. */
  meeting: number;
  ranked: number;
  /** With `all`: every other pair, closest first; when none meets the target: the closest three. */
  missing: MissRow[];
}

export interface SavedPrediction {
  id: number;
  pairId: number | null;
  pair: string;
  modelVersion: string;
  inputs: { elementA: string; elementB: string; conditions: z.output<typeof conditionsSchema> };
  result: Prediction;
  createdAt: string;
}

export interface ElementTableResult {
  elements: ElementRecord[];
  sources: ColumnSource[];
}

export const predictionOperations = {
  'prediction.predict': operation<Prediction>()({
    kind: 'query',
    summary: 'Predict surface composition and architecture of one pair under given conditions',
    input: z.object({ pair: pairTextSchema, conditions: conditionsSchema }),
  }),
  'prediction.rank': operation<RankResult>()({
    kind: 'query',
    summary: 'Rank the pairs of an element set that meet a target architecture (all: the rest too, with why they miss)',
    input: z.object({
      elements: elementListSchema,
      target: rankTargetSchema,
      conditions: conditionsSchema,
      limit: z
        .number({ error: 'must be a number' })
        .int('must be a whole number')
        .min(1, 'must be at least 1')
        .max(1000, 'must be at most 1000')
        .optional(),
      all: z.boolean({ error: 'must be true or false' }).optional(),
    }),
  }),
  'prediction.isotherm': operation<Isotherm>()({
    kind: 'query',
    summary: 'Surface composition of a pair against composition, diameter or temperature',
    input: z.object({
      pair: pairTextSchema,
      conditions: conditionsSchema,
      sweep: z.enum(ISOTHERM_SWEEPS, { error: `must be one of: ${ISOTHERM_SWEEPS.join(', ')}` }),
      points: z
        .number({ error: 'must be a number' })
        .int('must be a whole number')
        .min(3, 'must be at least 3')
        .max(400, 'must be at most 400')
        .default(41),
    }),
  }),
  'prediction.save': operation<SavedPrediction>()({
    kind: 'command',
    summary: 'Compute and store a prediction (inputs, settings, model version), optionally linked to a campaign pair',
    input: z.object({ pair: pairTextSchema, conditions: conditionsSchema, pairId: idSchema.optional() }),
  }),
  'prediction.listForPair': operation<SavedPrediction[]>()({
    kind: 'query',
    summary: 'Stored predictions linked to a campaign pair, newest first',
    input: z.object({ pairId: idSchema }),
  }),
  'elements.table': operation<ElementTableResult>()({
    kind: 'query',
    summary: 'Element property table with the source of each column',
    input: z.object({}),
  }),
};
