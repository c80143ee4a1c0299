/**
 * `outcomes.record`: everything measured on a batch — TEM sizes, composition, an EDX line scan, the observed
 * architecture, notes, file paths — stored in ONE transaction, in that order (so a line scan given in the same
 * call is the suggestion an observed "confirmed" refers to). Each part is analysed from its raw data and
 * stored beside its result and the analysis version. A failure in any part rolls back every part, and the
 * error names the part: its field is `<part>.<field>` (e.g. `lineScan.csvText`), its message starts with
 * the part's name. A measurement moves the batch and its campaign pair to characterized, in the same
 * transaction (batch-status.ts).
 */
import { getBatchForOutcome, type BatchForOutcome } from '../../db/repositories/batches';
import { insertComposition } from '../../db/repositories/outcome-compositions';
import { addOutcomeFile } from '../../db/repositories/outcome-files';
import { insertLineScan } from '../../db/repositories/outcome-line-scans';
import { setObservation, setOutcomeNotes } from '../../db/repositories/outcome-observations';
import { insertSizeImport } from '../../db/repositories/outcome-sizes';
import type { SqliteDatabase } from '../../db/store';
import {
  type LineScanPreview,
  OUTCOME_PART_NAMES,
  type OutcomePart,
  type OutcomeRecordInput,
  type RecordedOutcome,
} from '../../shared-model/api/outcomes';
import { DomainError, invalid } from '../../shared-model/api/result';
import { formatArchitecture, parseArchitecture } from '../../shared-model/architecture/labels';
import { compareComposition } from '../../shared-model/characterization/composition';
import { ANALYSIS_VERSION } from '../../shared-model/characterization/version';
import { characterizedByOutcome } from './batch-status';
import { analyseLineScanCsv, analyseSizeCsv } from './outcome-analysis';
import { batchOutcome, suggestionFor } from './outcome-reads';

const MEASUREMENT_PARTS: ReadonlySet<OutcomePart> = new Set(['sizes', 'composition', 'lineScan', 'observed']);

type Part<Name extends OutcomePart> = NonNullable<OutcomeRecordInput[Name]>;

/** Runs one part; a domain error (or a model's RangeError) is raised again naming the part. */
function inPart(part: OutcomePart, store: () => void): void {
  try {
    store();
  } catch (error) {
    if (error instanceof DomainError) {
      throw new DomainError(
        error.code,
        `${OUTCOME_PART_NAMES[part]}: ${error.message}`,
        error.field ? `${part}.${error.field}` : part,
      );
    }
    if (error instanceof RangeError)
      throw new DomainError('invalid_input', `${OUTCOME_PART_NAMES[part]}: ${error.message}`, part);
    throw error;
  }
}

function storeSizes(db: SqliteDatabase, batch: BatchForOutcome, sizes: Part<'sizes'>): void {
  const targetDiameterNm = sizes.targetDiameterNm === undefined ? batch.diameterNm : sizes.targetDiameterNm;
  const preview = analyseSizeCsv({ ...sizes, targetDiameterNm });
  const { analysisVersion, statistics, lognormal, histogram } = preview;
  insertSizeImport(db, {
    batchId: batch.id,
    sourceFile: sizes.sourceFile,
    column: preview.column,
    importNotes: preview.importNotes,
    targetDiameterNm: targetDiameterNm ?? null,
    precisionPercent: sizes.precisionPercent,
    diametersNm: preview.diametersNm,
    analysis: { analysisVersion, statistics, lognormal, histogram },
  });
}

function storeComposition(db: SqliteDatabase, batch: BatchForOutcome, composition: Part<'composition'>): void {
  const nominalXB = composition.nominalXB === undefined ? batch.nominalXB : composition.nominalXB;
  const { measurements, gridMetal } = composition;
  const comparison = compareComposition({
    elementA: batch.elementA,
    elementB: batch.elementB,
    nominalXB,
    measurements,
    gridMetal,
  });
  insertComposition(db, {
    batchId: batch.id,
    nominalXB,
    gridMetal,
    measurements,
    comparison,
    analysisVersion: ANALYSIS_VERSION,
  });
}

/** A line-scan fit computed before the transaction (in the compute pool), for the elements it was fitted with. */
export interface ComputedLineScan {
  elementA: string;
  elementB: string;
  preview?: LineScanPreview;
  error?: unknown;
}

function storeLineScan(
  db: SqliteDatabase,
  batch: BatchForOutcome,
  scan: Part<'lineScan'>,
  computed: ComputedLineScan | undefined,
): void {
  const current = computed && computed.elementA === batch.elementA && computed.elementB === batch.elementB;
  if (current && computed.error !== undefined) throw computed.error;
  const preview =
    current && computed.preview ? computed.preview : analyseLineScanCsv(scan, batch.elementA, batch.elementB);
  insertLineScan(db, {
    batchId: batch.id,
    name: scan.name,
    sourceFile: scan.sourceFile,
    elementA: batch.elementA,
    elementB: batch.elementB,
    unit: preview.unit,
    probeSigmaNm: scan.probeSigmaNm,
    importNotes: preview.importNotes,
    points: preview.points,
    analysis: preview.analysis,
  });
}

/** The label in its canonical spelling, when it is an architecture of the batch's pair. */
function checkLabelForPair(label: string, batch: BatchForOutcome): string {
  const parsed = parseArchitecture(label, [batch.elementA, batch.elementB]);
  if (!parsed) {
    const { elementA: a, elementB: b } = batch;
    throw invalid(
      'label',
      `"${label}" is not an architecture of ${a}-${b}; use alloy, surface-enriched alloy, ${a}@${b}, ${b}@${a}, ` +
        'Janus, intermetallic, hollow, other or unknown',
    );
  }
  return formatArchitecture(parsed);
}

function storeObserved(db: SqliteDatabase, batch: BatchForOutcome, observed: Part<'observed'>): void {
  const suggestion = suggestionFor(db, batch.id);
  let label: string;
  if (observed.decision === 'confirmed') {
    if (!suggestion) {
      throw invalid(
        'decision',
        'there is no suggested architecture to confirm yet (import a line scan first); record the label as an override',
      );
    }
    label = observed.label === undefined ? suggestion.label : checkLabelForPair(observed.label, batch);
    if (suggestion.label !== label) {
      throw invalid('label', `the suggestion is ${suggestion.label}; to record ${label} instead, choose override`);
    }
  } else {
    label = checkLabelForPair(observed.label, batch);
  }
  setObservation(db, batch.id, {
    label,
    decision: observed.decision,
    suggestedLabel: suggestion?.label ?? null,
    reason: observed.reason,
  });
}

function storeFiles(db: SqliteDatabase, batch: BatchForOutcome, files: Part<'files'>): void {
  for (const file of files) addOutcomeFile(db, { batchId: batch.id, ...file });
}

/** Stores every part given, in one transaction; answers which parts were stored and the batch's outcome. */
export function recordOutcome(
  db: SqliteDatabase,
  input: OutcomeRecordInput,
  computed: { lineScan?: ComputedLineScan } = {},
): RecordedOutcome {
  return db.transaction((): RecordedOutcome => {
    const batch = getBatchForOutcome(db, input.batchId);
    const recorded: OutcomePart[] = [];
    const store = <Name extends OutcomePart>(part: Name, write: (value: Part<Name>) => void): void => {
      const value = input[part];
      if (value === undefined) return;
      inPart(part, () => write(value as Part<Name>));
      recorded.push(part);
    };
    store('sizes', (sizes) => storeSizes(db, batch, sizes));
    store('composition', (composition) => storeComposition(db, batch, composition));
    store('lineScan', (scan) => storeLineScan(db, batch, scan, computed.lineScan));
    store('observed', (observed) => storeObserved(db, batch, observed));
    store('notes', (notes) => setOutcomeNotes(db, batch.id, notes));
    store('files', (files) => storeFiles(db, batch, files));
    // A measurement (not notes or file paths alone) makes the batch, and its campaign pair, characterized.
    const measured = recorded.filter((part) => MEASUREMENT_PARTS.has(part));
    const statusChanges =
      measured.length > 0
        ? characterizedByOutcome(
            db,
            batch.id,
            measured.map((part) => OUTCOME_PART_NAMES[part]),
          )
        : { batch: null, pair: null };
    return { recorded, outcome: batchOutcome(db, batch.id), statusChanges };
  })();
}
