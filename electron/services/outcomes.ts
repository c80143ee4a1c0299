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
import { fitLineScan } from '../../shared-model/characterization/line-scan-fit';
import type { HandlerMap } from './context';
import { analyseLineScanCsv, analyseSizeCsv, pairLattices } from './outcome-analysis';
import { batchOutcome, campaignConfusion, campaignOutcomeRows } from './outcome-reads';
import { recordOutcome } from './outcome-record';

export const outcomeAnalysisHandlers: HandlerMap<keyof typeof outcomeAnalysisOperations> = {
  'outcomes.previewSizes': (input) => analyseSizeCsv(input),
  'outcomes.previewLineScan': (input) => analyseLineScanCsv(input, input.pair.elementA, input.pair.elementB),
};

export const outcomeHandlers: HandlerMap<keyof typeof outcomeOperations> = {
  'outcomes.get': (input, { store }) => batchOutcome(store.db, input.batchId),
  'outcomes.record': (input, { store }) => recordOutcome(store.db, input),
  'outcomes.removeSizes': (input, { store }) => ({ removed: removeSizeImport(store.db, input.id) }),
  'outcomes.refitLineScan': (input, { store }) => {
    const stored = getLineScan(store.db, input.id);
    const { elementA, elementB } = lineScanElements(store.db, input.id);
    const points = lineScanPoints(store.db, input.id);
    const probeSigmaNm = input.probeSigmaNm === undefined ? stored.probeSigmaNm : input.probeSigmaNm;
    const lattice = pairLattices(elementA, elementB);
    const analysis = fitLineScan(
      {
        positionsNm: points.map((p) => p.positionNm),
        signalA: points.map((p) => p.a),
        signalB: points.map((p) => p.b),
        unit: stored.unit,
      },
      {
        elementA,
        elementB,
        probeSigmaNm,
        latticeANm: lattice[elementA] ?? null,
        latticeBNm: lattice[elementB] ?? null,
      },
    );
    return updateLineScanFit(store.db, input.id, probeSigmaNm, analysis);
  },
  'outcomes.removeLineScan': (input, { store }) => ({ removed: removeLineScan(store.db, input.id) }),
  'outcomes.removeFile': (input, { store }) => ({ removed: removeOutcomeFile(store.db, input.id) }),
  'outcomes.listByCampaign': (input, { store }) => campaignOutcomeRows(store.db, input.campaignId),
  'outcomes.confusion': (input, { store }) => campaignConfusion(store.db, input.campaignId, input.against),
};
