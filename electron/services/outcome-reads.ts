/**
 * What the outcome views read: one batch's record (with the predictions made when it was planned and the
 * suggested architecture), the prediction-vs-outcome rows of a campaign and its confusion matrix. The rows
 * come from their owners: batches.ts, outcomes.ts, predictions.ts and simulation.ts.
 */
import { getBatchForOutcome, listCampaignBatches, type BatchForOutcome } from '../../db/repositories/batches';
import { getCampaign } from '../../db/repositories/campaigns';
import { listCompositions } from '../../db/repositories/outcome-compositions';
import { listOutcomeFiles } from '../../db/repositories/outcome-files';
import { listLineScans } from '../../db/repositories/outcome-line-scans';
import { getObservation } from '../../db/repositories/outcome-observations';
import { listSizeImports } from '../../db/repositories/outcome-sizes';
import { latestPredictionBefore } from '../../db/repositories/predictions';
import { latestFinishedRun } from '../../db/repositories/simulation';
import type { SqliteDatabase } from '../../db/store';
import type {
  Agreement,
  BatchOutcome,
  CampaignConfusion,
  OutcomeRow,
  OutcomeSuggestion,
  PredictionAtPlanning,
} from '../../shared-model/api/outcomes';
import { confusionMatrix, labelAgreement } from '../../shared-model/characterization/confusion';
import { ANALYSIS_VERSION } from '../../shared-model/characterization/version';

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

/** The suggestion for the observed label: the most recent line scan's. */
export function suggestionFor(db: SqliteDatabase, batchId: number): OutcomeSuggestion | null {
  const scans = listLineScans(db, batchId);
  const latest = scans[scans.length - 1];
  if (!latest) return null;
  return { label: latest.analysis.suggestion.label, reason: latest.analysis.suggestion.reason, lineScanId: latest.id };
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

/** Predicted (analytic or simulated) vs observed architecture over the batches of a campaign. */
export function campaignConfusion(
  db: SqliteDatabase,
  campaignId: number,
  against: CampaignConfusion['against'],
): CampaignConfusion {
  const pairs: { predicted: string; observed: string }[] = [];
  let unmatched = 0;
  for (const row of campaignOutcomeRows(db, campaignId)) {
    if (row.observed === null) continue;
    const predicted = against === 'prediction' ? row.predicted : row.simulated;
    if (predicted === null) unmatched++;
    else pairs.push({ predicted, observed: row.observed });
  }
  return { campaignId, against, matrix: confusionMatrix(pairs), unmatched };
}
