/**
 * Sample batch-design requests shared by the recipe model tests, the service, CLI and browser tests and
 * the recipe benchmark. Tests that change a field spread a copy (`{ ...ptNi, batchVolumeMl: 0 }`).
 */
import type { BatchDesignRequest } from '../../shared-model/recipes/design-input';

/** 4 nm Pt75Ni25 alloy by NaBH4 co-reduction, 0.1 mmol metal in 50 mL (hand-worked in test/shared-model/recipes/design.test.ts). */
export const ptNi: BatchDesignRequest = {
  elementA: 'Pt',
  elementB: 'Ni',
  target: 'alloy',
  route: 'co-reduction',
  size: { kind: 'alloy', diameterNm: 4, xBPct: 25 },
  amount: { kind: 'total-metal', totalMetalMmol: 0.1 },
  batchVolumeMl: 50,
  precursors: [
    { element: 'Pt', reagentKey: 'h2ptcl6-6h2o', stockMm: 20 },
    { element: 'Ni', reagentKey: 'nicl2-6h2o', stockMm: 20 },
  ],
  reducer: { reagentKey: 'nabh4', excess: 5, stockMm: 100 },
};

/** 10 nm Au50Pd50 alloy by NaBH4 co-reduction, 0.1 mmol metal in 50 mL (the outcome tests' made batch). */
export const auPd: BatchDesignRequest = {
  elementA: 'Au',
  elementB: 'Pd',
  target: 'alloy',
  route: 'co-reduction',
  size: { kind: 'alloy', diameterNm: 10, xBPct: 50 },
  amount: { kind: 'total-metal', totalMetalMmol: 0.1 },
  batchVolumeMl: 50,
  precursors: [
    { element: 'Au', reagentKey: 'haucl4-3h2o', stockMm: 20 },
    { element: 'Pd', reagentKey: 'na2pdcl4', stockMm: 20 },
  ],
  reducer: { reagentKey: 'nabh4', excess: 5, stockMm: 100 },
};

/** 15 nm Au seeds by citrate reduction, 0.025 mmol Au in 100 mL, planned for an Au@Pt growth batch (the lineage tests' seed batch). */
export const auSeeds: BatchDesignRequest = {
  elementA: 'Au',
  elementB: 'Pt',
  target: 'Au@Pt',
  route: 'co-reduction',
  size: { kind: 'single-metal', element: 'Au', diameterNm: 15 },
  amount: { kind: 'total-metal', totalMetalMmol: 0.025 },
  batchVolumeMl: 100,
  precursors: [{ element: 'Au', reagentKey: 'haucl4-3h2o', stockMm: 25 }],
  reducer: { reagentKey: 'trisodium-citrate-2h2o', excess: 3, stockMm: 34 },
};
