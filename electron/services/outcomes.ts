/**
 * Outcome services: previews that store nothing; `outcomes.record`, the one operation that stores what was
 * measured on a batch (outcome-record.ts); refits and removals of single records; the reads behind the
 * Results view (outcome-reads.ts).
 */
import { removeOutcomeFile } from '../../db/repositories/outcome-files';
import {
  getLineScan,
  lineScanElements,
  lineScanPoints,
  removeLineScan,
  updateLineScanFit,
} from '../../db/repositories/outcome-line-scans';
import { removeSizeImport } from '../../db/repositories/outcome-sizes';
import type { outcomeAnalysisOperations, outcomeOperations } from '../../shared-model/api/outcomes';
import { getBatchForOutcome } from '../../db/repositories/batches';
import type { HandlerMap } from './context';
import { computePool } from '../workers/compute-pool';
import { analyseSizeCsv, pairLattices } from './outcome-analysis';
import { batchOutcome, campaignConfusion, campaignOutcomeRows } from './outcome-reads';
import { recordOutcome } from './outcome-record';

export const outcomeAnalysisHandlers: HandlerMap<keyof typeof outcomeAnalysisOperations> = {
  'outcomes.previewSizes': (input) => analyseSizeCsv(input),
  // Fits run in the compute pool, so the host answers other calls meanwhile.
  'outcomes.previewLineScan': (input) =>
    computePool().run('previewLineScan', { input, elementA: input.pair.elementA, elementB: input.pair.elementB }),
};

export const outcomeHandlers: HandlerMap<keyof typeof outcomeOperations> = {
  'outcomes.get': (input, { store }) => batchOutcome(store.db, input.batchId),
  'outcomes.record': (input, { store }) => {
    // Inside a caller's transaction (the demo campaign) nothing can be awaited: the fit runs in place.
    if (!input.lineScan || store.db.inTransaction) return recordOutcome(store.db, input);
    const scan = input.lineScan;
    // The fit first, in the compute pool; then every part is written in one transaction. A fit that fails is
    // reported when the transaction reaches the line-scan part, so an earlier part's error still comes first.
    const { elementA, elementB } = getBatchForOutcome(store.db, input.batchId);
    return computePool()
      .run('previewLineScan', { input: scan, elementA, elementB })
      .then(
        (preview) => ({ elementA, elementB, preview }),
        (error: unknown) => ({ elementA, elementB, error }),
      )
      .then((lineScan) => recordOutcome(store.db, input, { lineScan }));
  },
  'outcomes.removeSizes': (input, { store }) => ({ removed: removeSizeImport(store.db, input.id) }),
  'outcomes.refitLineScan': async (input, { store }) => {
    const stored = getLineScan(store.db, input.id);
    const { elementA, elementB } = lineScanElements(store.db, input.id);
    const points = lineScanPoints(store.db, input.id);
    const probeSigmaNm = input.probeSigmaNm === undefined ? stored.probeSigmaNm : input.probeSigmaNm;
    const lattice = pairLattices(elementA, elementB);
    const analysis = await computePool().run('fitLineScan', {
      scan: {
        positionsNm: points.map((p) => p.positionNm),
        signalA: points.map((p) => p.a),
        signalB: points.map((p) => p.b),
        unit: stored.unit,
      },
      options: {
        elementA,
        elementB,
        probeSigmaNm,
        latticeANm: lattice[elementA] ?? null,
        latticeBNm: lattice[elementB] ?? null,
      },
    });
    // Computed in the pool, then written in one transaction (the scan may have been removed meanwhile).
    return store.db.transaction(() => {
      getLineScan(store.db, input.id);
      return updateLineScanFit(store.db, input.id, probeSigmaNm, analysis);
    })();
  },
  'outcomes.removeLineScan': (input, { store }) => ({ removed: removeLineScan(store.db, input.id) }),
  'outcomes.removeFile': (input, { store }) => ({ removed: removeOutcomeFile(store.db, input.id) }),
  'outcomes.listByCampaign': (input, { store }) => campaignOutcomeRows(store.db, input.campaignId),
  'outcomes.confusion': (input, { store }) => campaignConfusion(store.db, input.campaignId, input.against),
};
