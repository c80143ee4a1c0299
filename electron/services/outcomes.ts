/**
 * Outcome services (issue "Outcomes"): previews that store nothing, and imports on a batch that keep raw
 * data beside derived results (validate → analyse → store in one transaction → answer). A failed import
 * (bad CSV row, too few particles, a scan shorter than the particle) throws before anything is written.
 */
import { getBatchForOutcome, listCampaignBatches, type BatchForOutcome } from '../../db/repositories/batches';
import {
  addOutcomeFile,
  getObservation,
  getLineScan,
  insertComposition,
  insertLineScan,
  insertSizeImport,
  lineScanElements,
  lineScanPoints,
  listCompositions,
  listLineScans,
  listOutcomeFiles,
  listSizeImports,
  removeLineScan,
  removeOutcomeFile,
  removeSizeImport,
  setObservation,
  setOutcomeNotes,
  updateLineScanFit,
} from '../../db/repositories/outcomes';
import { getCampaign } from '../../db/repositories/campaigns';
import { latestPredictionBefore } from '../../db/repositories/predictions';
import { latestFinishedRun } from '../../db/repositories/simulation';
import type { SqliteDatabase } from '../../db/store';
import { formatArchitecture, parseArchitecture } from '../../shared-model/architecture/labels';
import type {
  Agreement,
  BatchOutcome,
  CampaignConfusion,
  OutcomeRow,
  OutcomeSuggestion,
  outcomeAnalysisOperations,
  outcomeOperations,
  PredictionAtPlanning,
} from '../../shared-model/api/outcomes';
import { invalid } from '../../shared-model/api/result';
import { compareComposition } from '../../shared-model/characterization/composition';
import { confusionMatrix, labelAgreement } from '../../shared-model/characterization/confusion';
import { fitLineScan } from '../../shared-model/characterization/line-scan-fit';
import { ANALYSIS_VERSION } from '../../shared-model/characterization/version';
import type { HandlerMap } from './context';
import { analyseLineScanCsv, analyseSizeCsv, pairLattices } from './outcome-analysis';

export const outcomeAnalysisHandlers: HandlerMap<keyof typeof outcomeAnalysisOperations> = {
  'outcomes.previewSizes': (input) => analyseSizeCsv(input),
  'outcomes.previewLineScan': (input) => analyseLineScanCsv(input, input.pair.elementA, input.pair.elementB),
};

/** The suggestion for the observed label: the most recent line scan's. */
function suggestionFor(db: SqliteDatabase, batchId: number): OutcomeSuggestion | null {
  const scans = listLineScans(db, batchId);
  const latest = scans[scans.length - 1];
  if (!latest) return null;
  return { label: latest.analysis.suggestion.label, reason: latest.analysis.suggestion.reason, lineScanId: latest.id };
}

/**
 * What was predicted for a batch when it was planned: the analytic prediction stored for its pair at or
 * before the batch was saved (else the newest one of the same two elements before it), plus the newest
 * finished simulation of the pair, whenever it ran.
 */
export function predictionsAtPlanning(db: SqliteDatabase, batch: BatchForOutcome): PredictionAtPlanning[] {
  const found: PredictionAtPlanning[] = [];
  const pair = { pairId: batch.pairId, elementA: batch.elementA, elementB: batch.elementB };
  const analytic = latestPredictionBefore(db, { ...pair, madeBy: batch.createdAt });
  if (analytic) {
    const { label, modelVersion, createdAt } = analytic;
    found.push({ label, source: 'analytic', modelVersion, createdAt });
  }
  const run = latestFinishedRun(db, pair);
  if (run) {
    found.push({ label: run.label, source: 'simulation', modelVersion: run.engineVersion, createdAt: run.createdAt });
  }
  return found;
}

export function batchOutcome(db: SqliteDatabase, batchId: number): BatchOutcome {
  const batch = getBatchForOutcome(db, batchId);
  const { observed, notes } = getObservation(db, batchId);
  return {
    batchId: batch.id,
    batchName: batch.name,
    campaignId: batch.campaignId,
    elementA: batch.elementA,
    elementB: batch.elementB,
    targetLabel: batch.target,
    targetDiameterNm: batch.diameterNm,
    nominalXB: batch.nominalXB,
    sizes: listSizeImports(db, batchId),
    compositions: listCompositions(db, batchId),
    lineScans: listLineScans(db, batchId),
    observed,
    suggestion: suggestionFor(db, batchId),
    notes,
    files: listOutcomeFiles(db, batchId),
    predictions: predictionsAtPlanning(db, batch),
    analysisVersion: ANALYSIS_VERSION,
  };
}

export function agreementOf(predicted: string | null, observed: string | null): Agreement | null {
  if (predicted === null || observed === null) return null;
  return labelAgreement(predicted, observed);
}

function outcomeRow(db: SqliteDatabase, batch: BatchForOutcome): OutcomeRow {
  const { observed } = getObservation(db, batch.id);
  const predictions = predictionsAtPlanning(db, batch);
  const predicted = predictions.find((p) => p.source === 'analytic')?.label ?? null;
  const simulated = predictions.find((p) => p.source === 'simulation')?.label ?? null;
  const sizes = listSizeImports(db, batch.id);
  const lastSize = sizes[sizes.length - 1];
  const scans = listLineScans(db, batch.id);
  const lastScan = scans[scans.length - 1];
  const observedLabel = observed?.label ?? null;
  return {
    batchId: batch.id,
    batchName: batch.name,
    elementA: batch.elementA,
    elementB: batch.elementB,
    predicted,
    simulated,
    observed: observedLabel,
    decision: observed?.decision ?? null,
    agreement: agreementOf(predicted ?? simulated, observedLabel),
    meanDiameterNm: lastSize ? lastSize.statistics.meanNm : null,
    cvPercent: lastSize ? lastSize.statistics.cvPercent : null,
    lineScanModel: lastScan ? lastScan.analysis.chosenModel : null,
    lineScanEvidence: lastScan ? lastScan.analysis.evidence : null,
  };
}

export function campaignOutcomeRows(db: SqliteDatabase, campaignId: number): OutcomeRow[] {
  getCampaign(db, campaignId);
  return listCampaignBatches(db, campaignId).map((batch) => outcomeRow(db, batch));
}

function checkLabelForPair(label: string, batch: BatchForOutcome): string {
  const parsed = parseArchitecture(label, [batch.elementA, batch.elementB]);
  if (!parsed) {
    throw invalid(
      'label',
      `"${label}" is not an architecture of ${batch.elementA}-${batch.elementB}; use alloy, surface-enriched alloy, ${batch.elementA}@${batch.elementB}, ${batch.elementB}@${batch.elementA}, Janus, intermetallic, hollow, other or unknown`,
    );
  }
  return formatArchitecture(parsed);
}

export const outcomeHandlers: HandlerMap<keyof typeof outcomeOperations> = {
  'outcomes.get': (input, { store }) => batchOutcome(store.db, input.batchId),
  'outcomes.recordSizes': (input, { store }) => {
    const batch = getBatchForOutcome(store.db, input.batchId);
    const targetDiameterNm = input.targetDiameterNm === undefined ? batch.diameterNm : input.targetDiameterNm;
    const preview = analyseSizeCsv({ ...input, targetDiameterNm });
    return insertSizeImport(store.db, {
      batchId: batch.id,
      sourceFile: input.sourceFile,
      column: preview.column,
      importNotes: preview.importNotes,
      targetDiameterNm: targetDiameterNm ?? null,
      precisionPercent: input.precisionPercent,
      diametersNm: preview.diametersNm,
      analysis: { analysisVersion: preview.analysisVersion, statistics: preview.statistics, lognormal: preview.lognormal, histogram: preview.histogram },
    });
  },
  'outcomes.removeSizes': (input, { store }) => ({ removed: removeSizeImport(store.db, input.id) }),
  'outcomes.recordComposition': (input, { store }) => {
    const batch = getBatchForOutcome(store.db, input.batchId);
    const nominalXB = input.nominalXB === undefined ? batch.nominalXB : input.nominalXB;
    const comparison = compareComposition({ elementA: batch.elementA, elementB: batch.elementB, nominalXB, measurements: input.measurements, gridMetal: input.gridMetal });
    return insertComposition(store.db, { batchId: batch.id, nominalXB, gridMetal: input.gridMetal, measurements: input.measurements, comparison, analysisVersion: ANALYSIS_VERSION });
  },
  'outcomes.importLineScan': (input, { store }) => {
    const batch = getBatchForOutcome(store.db, input.batchId);
    const preview = analyseLineScanCsv(input, batch.elementA, batch.elementB);
    return insertLineScan(store.db, {
      batchId: batch.id,
      name: input.name,
      sourceFile: input.sourceFile,
      elementA: batch.elementA,
      elementB: batch.elementB,
      unit: preview.unit,
      probeSigmaNm: input.probeSigmaNm,
      importNotes: preview.importNotes,
      points: preview.points,
      analysis: preview.analysis,
    });
  },
  'outcomes.refitLineScan': (input, { store }) => {
    const stored = getLineScan(store.db, input.id);
    const { elementA, elementB } = lineScanElements(store.db, input.id);
    const points = lineScanPoints(store.db, input.id);
    const probeSigmaNm = input.probeSigmaNm === undefined ? stored.probeSigmaNm : input.probeSigmaNm;
    const lattice = pairLattices(elementA, elementB);
    const analysis = fitLineScan(
      { positionsNm: points.map((p) => p.positionNm), signalA: points.map((p) => p.a), signalB: points.map((p) => p.b), unit: stored.unit },
      { elementA, elementB, probeSigmaNm, latticeANm: lattice[elementA] ?? null, latticeBNm: lattice[elementB] ?? null },
    );
    return updateLineScanFit(store.db, input.id, probeSigmaNm, analysis);
  },
  'outcomes.removeLineScan': (input, { store }) => ({ removed: removeLineScan(store.db, input.id) }),
  'outcomes.setObserved': (input, { store }) => {
    const batch = getBatchForOutcome(store.db, input.batchId);
    const label = checkLabelForPair(input.label, batch);
    const suggestion = suggestionFor(store.db, batch.id);
    if (input.decision === 'confirmed') {
      if (!suggestion) throw invalid('decision', 'there is no suggested architecture to confirm yet (import a line scan first); record the label as an override');
      if (suggestion.label !== label) {
        throw invalid('label', `the suggestion is ${suggestion.label}; to record ${label} instead, choose override`);
      }
    }
    setObservation(store.db, batch.id, { label, decision: input.decision, suggestedLabel: suggestion?.label ?? null, reason: input.reason });
    return batchOutcome(store.db, batch.id);
  },
  'outcomes.setNotes': (input, { store }) => {
    getBatchForOutcome(store.db, input.batchId);
    setOutcomeNotes(store.db, input.batchId, input.notes);
    return batchOutcome(store.db, input.batchId);
  },
  'outcomes.addFile': (input, { store }) => {
    getBatchForOutcome(store.db, input.batchId);
    return addOutcomeFile(store.db, input);
  },
  'outcomes.removeFile': (input, { store }) => ({ removed: removeOutcomeFile(store.db, input.id) }),
  'outcomes.listByCampaign': (input, { store }) => campaignOutcomeRows(store.db, input.campaignId),
  'outcomes.confusion': (input, { store }): CampaignConfusion => {
    const rows = campaignOutcomeRows(store.db, input.campaignId);
    const pairs: { predicted: string; observed: string }[] = [];
    let unmatched = 0;
    for (const row of rows) {
      if (row.observed === null) continue;
      const predicted = input.against === 'prediction' ? row.predicted : row.simulated;
      if (predicted === null) unmatched++;
      else pairs.push({ predicted, observed: row.observed });
    }
    return { campaignId: input.campaignId, against: input.against, matrix: confusionMatrix(pairs), unmatched };
  },
};
