/**
 * Learning from outcomes (issue 11) through the API: import a history table, enter metal prices, retrain the
 * campaign's model as a job (progress, cancel; computed off the main thread), read the stored model review,
 * and propose next batches from the stored model. Every proposal set is stored with the model version and
 * the ids of the outcomes the model was trained on.
 */
import { z } from 'zod';
import type { ModelReview } from '../learn/review';
import type { Proposal } from '../learn/proposals';
import type { SynthesisRoute } from '../recipes/design-input';
import { operation } from './operation';
import { elementSymbolSchema, idSchema, seedSchema } from './schemas';

export interface HistoryImportSummary {
  id: number;
  campaignId: number;
  fileName: string | null;
  rowCount: number;
  createdAt: string;
}

export interface HistoryImportResult {
  import: HistoryImportSummary;
  rows: number;
  /** Rows per observed label. */
  labels: Record<string, number>;
  notes: string[];
  /** Set when the same table had been imported before and duplicates were allowed. */
  duplicateOf: HistoryImportSummary | null;
  /** The batch made of each row (characterized, marked imported history), in the order of the rows. */
  batchIds?: number[];
}

export interface HistoryOutcomeView {
  id: string;
  /** The batch of this row (marked imported history). */
  batchId?: number | null;
  importId: number;
  line: number;
  pair: string;
  xB: number;
  diameterNm: number;
  temperatureK: number;
  route: SynthesisRoute;
  observed: string;
  madeOn: string | null;
  notes: string;
}

export interface MetalPriceView {
  id: number;
  symbol: string;
  pricePerGram: number;
  currency: string;
  pricedOn: string;
  enteredAt: string;
}

export const LEARN_JOB_STATUSES = ['running', 'done', 'failed', 'cancelled'] as const;
export type LearnJobStatus = (typeof LEARN_JOB_STATUSES)[number];

export interface LearnJob {
  id: number;
  campaignId: number;
  status: LearnJobStatus;
  fraction: number;
  stage: string;
  error: string | null;
  /** Stored model once done. */
  modelId: number | null;
  startedAt: string;
  finishedAt: string | null;
}

/** A ready review without the fitted parameters (those stay in the store), or the too-few answer. */
export type ReviewView =
  Extract<ModelReview, { status: 'too-few' }> | Omit<Extract<ModelReview, { status: 'ready' }>, 'fitted'>;

export interface StoredReview {
  modelId: number;
  modelVersion: string;
  trainedOn: string[];
  createdAt: string;
  /** Outcomes of the campaign now that the model was not trained on (retrain to include them). */
  newOutcomes: number;
  review: ReviewView;
}

export interface ProposalSet {
  id: number;
  modelId: number;
  modelVersion: string;
  trainedOn: string[];
  target: string;
  proposals: Proposal[];
  candidatesConsidered: number;
  excludedTested: number;
  excludedFailed: number;
  costNote: string | null;
  targetNote: string | null;
  /** Posterior mean P(target) from which a proposal meets the target; `meeting` of them do. */
  threshold: number;
  meeting: number;
  /** Null when every non-exploration proposal meets the target; otherwise says how many do. */
  meetingNote: string | null;
  metalMmolPerBatch: number;
}

const campaignId = idSchema;
const text = z.string({ error: 'must be text' });

export const learnOperations = {
  'learn.importHistory': operation<HistoryImportResult>()({
    kind: 'command',
    summary: 'Import a history table (CSV) as outcomes of a campaign: all rows or none',
    input: z.object({
      campaignId,
      csvText: text.max(20_000_000, 'the file is too large (over 20 MB)'),
      fileName: text.max(500, 'must be at most 500 characters').nullish(),
      allowDuplicates: z.boolean({ error: 'must be true or false' }).default(false),
    }),
  }),
  'learn.history': operation<{ imports: HistoryImportSummary[]; outcomes: HistoryOutcomeView[] }>()({
    kind: 'query',
    summary: 'Imported history tables and their outcomes of a campaign',
    input: z.object({ campaignId }),
  }),
  'learn.removeImport': operation<{ removed: number; batchesRemoved: number }>()({
    kind: 'command',
    summary: 'Remove one imported history table with its rows and their batches',
    input: z.object({ importId: idSchema }),
  }),
  'learn.setPrice': operation<MetalPriceView>()({
    kind: 'command',
    summary: 'Enter the price per gram of a metal on a date',
    input: z.object({
      symbol: elementSymbolSchema,
      pricePerGram: z
        .number({ error: 'must be a number (price per gram)' })
        .positive('must be above 0')
        // Up to a million per gram: the dearest metals here cost hundreds per gram (from memory).
        .max(1e6, 'must be at most 1000000 per gram'),
      currency: text.trim().min(1, 'must not be empty').max(8, 'must be at most 8 characters').default('EUR'),
      pricedOn: z.iso.date({ error: 'must be an ISO date (YYYY-MM-DD)' }),
    }),
  }),
  'learn.prices': operation<{ latest: MetalPriceView[]; all: MetalPriceView[] }>()({
    kind: 'query',
    summary: 'Metal prices: the latest per metal and every entry',
    input: z.object({}),
  }),
  'learn.retrain': operation<LearnJob>()({
    kind: 'command',
    summary: "Retrain the campaign's model as a job (off the main thread; progress and cancel)",
    input: z.object({
      campaignId,
      priorWeight: z
        .union([z.literal('tune'), z.number().positive('must be above 0').max(1, 'must be at most 1')])
        .default('tune'),
      C: z
        .number({ error: 'must be a number' })
        .positive('must be above 0')
        .min(1e-6, 'must be at least 1e-6')
        .max(1e6, 'must be at most 1e6')
        .default(1),
    }),
  }),
  'learn.job': operation<LearnJob>()({
    kind: 'query',
    summary: 'State of a retrain job',
    input: z.object({ jobId: idSchema }),
  }),
  'learn.cancel': operation<LearnJob>()({
    kind: 'command',
    summary: 'Cancel a retrain job',
    input: z.object({ jobId: idSchema }),
  }),
  'learn.review': operation<{ stored: StoredReview | null }>()({
    kind: 'query',
    summary: 'The latest stored model review of a campaign (null before the first retrain)',
    input: z.object({ campaignId }),
  }),
  'learn.propose': operation<ProposalSet>()({
    kind: 'command',
    summary: 'Propose next batches for a target from the stored model; the set is stored with the model version',
    input: z.object({
      campaignId,
      target: text.trim().min(1, 'give a target: alloy, core@shell, core@shell:X, Janus or intermetallic'),
      count: z
        .number({ error: 'must be a whole number' })
        .int('must be a whole number')
        .min(1, 'must be at least 1')
        .max(50, 'must be at most 50')
        .default(6),
      explorationSlots: z
        .number({ error: 'must be a whole number' })
        .int('must be a whole number')
        .min(0, 'must be at least 0')
        .max(50, 'must be at most 50')
        .default(1),
      includeFailed: z.boolean({ error: 'must be true or false' }).default(false),
      metalMmolPerBatch: z
        .number({ error: 'must be a number (mmol)' })
        .positive('must be above 0')
        .max(1000, 'must be at most 1000 mmol')
        .default(0.1),
      seed: seedSchema.default(1),
    }),
  }),
};
