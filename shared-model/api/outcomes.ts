/**
 * Outcomes of made batches (issue "Outcomes"): TEM sizes, composition (nominal / bulk / EDX), EDX line scans
 * with model fits, the observed architecture (confirmed or overridden), notes, file paths, and the
 * prediction-vs-outcome tables of a campaign. Raw data (every diameter, every line-scan point) are stored
 * beside the derived results and the analysis version that produced them.
 */
import { z } from 'zod';
import type { ArchitectureLabel } from '../architecture/labels';
import type { CompositionComparison, CompositionMeasurement } from '../characterization/composition';
import { COMPOSITION_METHODS } from '../characterization/composition';
import type { ConfusionMatrix } from '../characterization/confusion';
import type { LineScanAnalysis } from '../characterization/line-scan-fit';
import type { SizeAnalysis } from '../characterization/size-analysis';
import { operation } from './operation';
import { elementSymbolSchema, idSchema, pairTextSchema } from './schemas';

/**
 * A STEM probe's σ, nm: 0.01–50 (aberration-corrected probes are ~0.05 nm wide, broad scans a few nm; common
 * practice). 1e-6 or 1e6 nm once made a line-scan fit run for minutes.
 */
const probeSigmaSchema = z
  .number({ error: 'must be a number of nm' })
  .min(0.01, 'must be at least 0.01 nm')
  .max(50, 'must be at most 50 nm');

export interface SizeRecord extends SizeAnalysis {
  id: number;
  batchId: number;
  diametersNm: number[];
  sourceFile: string | null;
  column: { number: number; name: string | null };
  importNotes: string[];
  createdAt: string;
}

export interface CompositionRecord {
  id: number;
  batchId: number;
  analysisVersion: string;
  nominalXB: number | null;
  measurements: CompositionMeasurement[];
  gridMetal: string | null;
  comparison: CompositionComparison;
  createdAt: string;
}

export interface LineScanPoint {
  positionNm: number;
  a: number;
  b: number;
}

export interface LineScanRecord {
  id: number;
  batchId: number;
  name: string;
  sourceFile: string | null;
  unit: 'counts' | 'atPercent';
  /** Probe σ given by the user (nm), or null when it was fitted. */
  probeSigmaNm: number | null;
  points: LineScanPoint[];
  importNotes: string[];
  analysis: LineScanAnalysis;
  createdAt: string;
}

export const OBSERVED_DECISIONS = ['confirmed', 'override'] as const;
export type ObservedDecision = (typeof OBSERVED_DECISIONS)[number];

export interface ObservedArchitecture {
  label: ArchitectureLabel;
  decision: ObservedDecision;
  /** The label Pairwright suggested when the decision was made (null when there was none). */
  suggestedLabel: ArchitectureLabel | null;
  reason: string;
  updatedAt: string;
}

export const OUTCOME_FILE_KINDS = ['image', 'spectrum', 'line scan', 'other'] as const;
export type OutcomeFileKind = (typeof OUTCOME_FILE_KINDS)[number];

export interface OutcomeFile {
  id: number;
  batchId: number;
  path: string;
  kind: OutcomeFileKind;
  note: string;
  addedAt: string;
}

/** What was predicted for a batch when it was planned (filled from the prediction area when present). */
export interface PredictionAtPlanning {
  label: ArchitectureLabel;
  /** "analytic" (segregation model) or "simulation" (lattice Monte Carlo). */
  source: string;
  modelVersion: string | null;
  createdAt: string | null;
}

export interface OutcomeSuggestion {
  label: ArchitectureLabel;
  reason: string;
  lineScanId: number | null;
}

export interface BatchOutcome {
  batchId: number;
  batchName: string;
  campaignId: number | null;
  elementA: string;
  elementB: string;
  targetLabel: string | null;
  targetDiameterNm: number | null;
  nominalXB: number | null;
  sizes: SizeRecord[];
  compositions: CompositionRecord[];
  lineScans: LineScanRecord[];
  observed: ObservedArchitecture | null;
  suggestion: OutcomeSuggestion | null;
  notes: string;
  files: OutcomeFile[];
  predictions: PredictionAtPlanning[];
  analysisVersion: string;
}

export type Agreement = 'agree' | 'same kind' | 'disagree';

export interface OutcomeRow {
  batchId: number;
  batchName: string;
  elementA: string;
  elementB: string;
  predicted: ArchitectureLabel | null;
  simulated: ArchitectureLabel | null;
  observed: ArchitectureLabel | null;
  decision: ObservedDecision | null;
  /** Observed vs predicted (the analytic prediction, else the simulation); null when either is missing. */
  agreement: Agreement | null;
  meanDiameterNm: number | null;
  cvPercent: number | null;
  lineScanModel: ArchitectureLabel | null;
  lineScanEvidence: string | null;
}

export interface CampaignConfusion {
  campaignId: number;
  /** Which prediction was compared: the analytic one or the simulation. */
  against: 'prediction' | 'simulation';
  matrix: ConfusionMatrix;
  /** Batches with an observed label but no prediction of that kind (left out of the matrix). */
  unmatched: number;
}

/** A size import analysed without storing it (the CLI `sizes` command, previews in the view). */
export interface SizePreview extends SizeAnalysis {
  diametersNm: number[];
  column: { number: number; name: string | null };
  importNotes: string[];
}

/** A line scan read and fitted without storing it (the CLI `linescan` command, previews in the view). */
export interface LineScanPreview {
  points: LineScanPoint[];
  unit: 'counts' | 'atPercent';
  columns: { position: string; a: string; b: string };
  importNotes: string[];
  /** Lattice constants (nm) used for monolayers: the shell metal's own (fcc-equivalent for non-fcc metals). */
  latticeNm: Record<string, number>;
  analysis: LineScanAnalysis;
}

const MAX_CSV_CHARS = 5_000_000;
const csvTextSchema = z
  .string({ error: 'must be the text of a CSV file' })
  .min(1, 'the file is empty')
  .max(MAX_CSV_CHARS, `the file is larger than ${MAX_CSV_CHARS / 1e6} MB of text`);
const columnSchema = z.union(
  [
    z.string().trim().min(1, 'must name a column'),
    z
      .number()
      .int('must be a column number')
      .positive('columns count from 1')
      .max(10_000, 'must be a column number of at most 10000'),
  ],
  {
    error: 'must be a column name or number',
  },
);
const decimalSchema = z.enum(['auto', '.', ','], { error: 'must be "auto", "." or ","' }).default('auto');
const sourceFileSchema = z
  .string({ error: 'must be a file path' })
  .trim()
  .max(1000, 'must be at most 1000 characters')
  .nullable()
  .default(null);
const fractionSchema = (what: string) =>
  z
    .number({ error: `${what} must be a number` })
    .min(0, `${what} must be at least 0`)
    .max(1, `${what} must be at most 1 (a fraction; 0.25 = 25 at.%)`);
const notesSchema = z.string({ error: 'must be text' }).max(8000, 'must be at most 8000 characters');
const confirmSchema = (what: string) =>
  z.literal(true, { error: `removing ${what} needs confirmation (confirm: true)` });

export const compositionMeasurementSchema = z.object({
  method: z.enum(COMPOSITION_METHODS, { error: `must be one of: ${COMPOSITION_METHODS.join(', ')}` }),
  xB: fractionSchema('xB'),
  uncertaintyXB: fractionSchema('uncertainty').nullable().default(null),
  lines: z.string({ error: 'must be text' }).trim().max(200, 'must be at most 200 characters').optional(),
});

const sizeImportFields = {
  csvText: csvTextSchema,
  column: columnSchema.optional(),
  decimalSeparator: decimalSchema,
  targetDiameterNm: z
    .number({ error: 'must be a number of nm' })
    .positive('must be greater than 0')
    .max(1000, 'must be at most 1000 nm')
    .nullable()
    .optional(),
  precisionPercent: z
    .number({ error: 'must be a number' })
    .positive('must be greater than 0')
    .min(0.01, 'must be at least 0.01 %')
    .max(50, 'must be at most 50 %')
    .default(2),
};

const lineScanImportFields = {
  csvText: csvTextSchema,
  positionColumn: columnSchema.optional(),
  aColumn: columnSchema.optional(),
  bColumn: columnSchema.optional(),
  unit: z.enum(['auto', 'counts', 'atPercent'], { error: 'must be auto, counts or atPercent' }).default('auto'),
  decimalSeparator: decimalSchema,
  probeSigmaNm: probeSigmaSchema.nullable().default(null),
};

const filePathSchema = z
  .string({ error: 'must be a file path' })
  .trim()
  .min(1, 'must not be empty')
  .max(1000, 'must be at most 1000 characters');

/** The parts of a batch outcome `outcomes.record` stores, in the order it writes them. */
export const OUTCOME_PARTS = ['sizes', 'composition', 'lineScan', 'observed', 'notes', 'files'] as const;
export type OutcomePart = (typeof OUTCOME_PARTS)[number];
/** How an error message names the part that failed ("line scan: …"). */
export const OUTCOME_PART_NAMES: Record<OutcomePart, string> = {
  sizes: 'sizes',
  composition: 'composition',
  lineScan: 'line scan',
  observed: 'observed architecture',
  notes: 'notes',
  files: 'files',
};

/** What `outcomes.record` stored, and the batch's outcome afterwards. */
export interface RecordedOutcome {
  recorded: OutcomePart[];
  outcome: BatchOutcome;
  /** What the record moved: the batch and its campaign pair to characterized (null when already so). */
  statusChanges: {
    batch: { from: string; to: string } | null;
    pair: { id: number; from: string; to: string } | null;
  };
}

const observedLabelSchema = z
  .string({ error: 'must be an architecture such as alloy, Au@Pd, Janus, hollow' })
  .trim()
  .min(1, 'must not be empty');
const observedReasonSchema = z
  .string({ error: 'must be text' })
  .trim()
  .max(2000, 'must be at most 2000 characters')
  .default('');

/** confirmed: the suggestion of the newest line scan (the label may be left out); override: the label given. */
const observedPartSchema = z.discriminatedUnion(
  'decision',
  [
    z.object({ decision: z.literal('confirmed'), label: observedLabelSchema.optional(), reason: observedReasonSchema }),
    z.object({ decision: z.literal('override'), label: observedLabelSchema, reason: observedReasonSchema }),
  ],
  { error: (issue) => (issue.code === 'invalid_union' ? 'must be confirmed or override' : undefined) },
);

export const outcomeRecordSchema = z
  .object({
    batchId: idSchema,
    sizes: z.object({ sourceFile: sourceFileSchema, ...sizeImportFields }).optional(),
    composition: z
      .object({
        nominalXB: fractionSchema('nominal xB').nullable().optional(),
        measurements: z
          .array(compositionMeasurementSchema, { error: 'must be a list of measurements' })
          .max(50, 'at most 50 measurements'),
        gridMetal: elementSymbolSchema.nullable().default(null),
      })
      .optional(),
    lineScan: z
      .object({
        name: z.string({ error: 'must be text' }).trim().max(120, 'must be at most 120 characters').default(''),
        sourceFile: sourceFileSchema,
        ...lineScanImportFields,
      })
      .optional(),
    observed: observedPartSchema.optional(),
    notes: notesSchema.optional(),
    files: z
      .array(
        z.object({
          path: filePathSchema,
          kind: z
            .enum(OUTCOME_FILE_KINDS, { error: `must be one of: ${OUTCOME_FILE_KINDS.join(', ')}` })
            .default('image'),
          note: z.string({ error: 'must be text' }).trim().max(500, 'must be at most 500 characters').default(''),
        }),
        { error: 'must be a list of files' },
      )
      .max(100, 'at most 100 files at once')
      .optional(),
  })
  .refine((value) => OUTCOME_PARTS.some((part) => value[part] !== undefined), {
    error: 'nothing to record: give sizes, composition, lineScan, observed, notes or files',
  });
export type OutcomeRecordInput = z.output<typeof outcomeRecordSchema>;

/** Analyses that store nothing: usable without a batch (CLI `sizes` / `linescan`). */
export const outcomeAnalysisOperations = {
  'outcomes.previewSizes': operation<SizePreview>()({
    kind: 'query',
    summary: 'Read particle diameters from CSV text and analyse them, storing nothing',
    input: z.object(sizeImportFields),
  }),
  'outcomes.previewLineScan': operation<LineScanPreview>()({
    kind: 'query',
    summary: 'Read an EDX line scan from CSV text and fit the four models, storing nothing',
    input: z.object({ pair: pairTextSchema, ...lineScanImportFields }),
  }),
};

export const outcomeOperations = {
  'outcomes.get': operation<BatchOutcome>()({
    kind: 'query',
    summary:
      'Everything recorded for one batch: sizes, composition, line scans, observed architecture, files, predictions',
    input: z.object({ batchId: idSchema }),
  }),
  'outcomes.record': operation<RecordedOutcome>()({
    kind: 'command',
    summary:
      'Record what was measured on a batch — sizes, composition, line scan, observed architecture, notes, ' +
      'file paths — in one transaction: all of it is stored or none, and an error names the part that failed',
    input: outcomeRecordSchema,
  }),
  'outcomes.removeSizes': operation<{ removed: number }>()({
    kind: 'command',
    summary: 'Remove one size import (needs confirm: true)',
    input: z.object({ id: idSchema, confirm: confirmSchema('a size import') }),
  }),
  'outcomes.refitLineScan': operation<LineScanRecord>()({
    kind: 'command',
    summary: 'Fit a stored line scan again (current analysis version, optionally a given probe σ)',
    input: z.object({
      id: idSchema,
      probeSigmaNm: probeSigmaSchema.nullable().optional(),
    }),
  }),
  'outcomes.removeLineScan': operation<{ removed: number }>()({
    kind: 'command',
    summary: 'Remove one line scan (needs confirm: true)',
    input: z.object({ id: idSchema, confirm: confirmSchema('a line scan') }),
  }),
  'outcomes.removeFile': operation<{ removed: number }>()({
    kind: 'command',
    summary: 'Forget a recorded file path (the file itself is not touched)',
    input: z.object({ id: idSchema }),
  }),
  'outcomes.listByCampaign': operation<OutcomeRow[]>()({
    kind: 'query',
    summary: 'Prediction vs outcome for every batch of a campaign',
    input: z.object({ campaignId: idSchema }),
  }),
  'outcomes.confusion': operation<CampaignConfusion>()({
    kind: 'query',
    summary: 'Confusion matrix of predicted vs observed architectures over a campaign',
    input: z.object({
      campaignId: idSchema,
      against: z
        .enum(['prediction', 'simulation'], { error: 'must be prediction or simulation' })
        .default('prediction'),
    }),
  }),
};
