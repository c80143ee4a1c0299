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
  size: { kind: 'alloy', diameterNm: 4, xB: 0.25 },
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
  size: { kind: 'alloy', diameterNm: 10, xB: 0.5 },
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

/** Au shell (2 monolayers) grown with ascorbate on 20 nm Ag seeds, 0.5 mM Ag × 5 mL: the galvanic-replacement case. */
export const auOnAg: BatchDesignRequest = {
  elementA: 'Au',
  elementB: 'Ag',
  target: 'Ag@Au',
  route: 'seed-mediated',
  size: { kind: 'core-shell', shellMonolayers: 2 },
  batchVolumeMl: 20,
  seeds: { metal: 'Ag', diameterNm: 20, metalMm: 0.5, volumeMl: 5 },
  precursors: [{ element: 'Au', reagentKey: 'haucl4-3h2o', stockMm: 10 }],
  reducer: { reagentKey: 'ascorbic-acid', excess: 4, stockMm: 100 },
  capping: { reagentKey: 'pvp', molPerMolMetal: 10 },
};

/** 5 nm Pt50Ni50 alloy in 20 mL ethylene glycol (solvent and reducer), PVP 10 mol/mol: the polyol case. */
export const ptNiPolyol: BatchDesignRequest = {
  elementA: 'Pt',
  elementB: 'Ni',
  target: 'alloy',
  route: 'polyol',
  size: { kind: 'alloy', diameterNm: 5, xB: 0.5 },
  amount: { kind: 'total-metal', totalMetalMmol: 0.2 },
  batchVolumeMl: 20,
  precursors: [
    { element: 'Pt', reagentKey: 'pt-acac2' },
    { element: 'Ni', reagentKey: 'ni-acetate-4h2o' },
  ],
  solvent: { reagentKey: 'ethylene-glycol', volumeMl: 20 },
  capping: { reagentKey: 'pvp', molPerMolMetal: 10 },
};
