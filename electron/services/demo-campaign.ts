/**
 * The demo campaign: INVENTED data so a first-time user sees every view populated. Nothing here is a
 * measurement. It is labelled as demo everywhere: the campaign is marked is_demo with "(demo)" in its name,
 * batch names start with "Demo", notes start with "Demo data: invented", inventory rows sit on the
 * "Demo shelf (invented)" with lots "DEMO-…".
 *
 * Everything but the demo-flagged campaign row goes through the operations the views use (pairs.add and
 * update, prediction.save, batches.save and setStatus, outcomes.record, inventory.upsert), by the same path
 * as every transport (dispatch.ts: zod validation, then the service), inside ONE transaction: the services'
 * own transactions nest as savepoints, so a failure at any step leaves no part of the demo behind.
 * Measurements are generated from seeded generators (demo-measurements.ts), so every load gives the same demo.
 */
import { createCampaign, findCampaignByName } from '../../db/repositories/campaigns';
import type { SavedBatch } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { OperationInput, OperationName, OperationOutput } from '../../shared-model/api/contract';
import type { CandidatePair, PairStatus } from '../../shared-model/api/pairs';
import { DomainError } from '../../shared-model/api/result';
import type { BatchDesignRequest } from '../../shared-model/recipes/design-input';
import type { ServiceContext } from './context';
import { demoDiameterCsv, demoLineScanCsv, type DemoLineScanSpec, type DemoSizeSpec } from './demo-measurements';
import { runOperationInTransaction } from './dispatch';

export const DEMO_CAMPAIGN_NAME = 'Fuel-cell cathode screen (demo)';
export const DEMO_NOTE_PREFIX = 'Demo data: invented';
export const DEMO_INVENTORY_LOCATION = 'Demo shelf (invented)';
export const DEMO_BATCH_NAMES = {
  pdSeeds: 'Demo Pd seeds 8 nm',
  pdAu: 'Demo Pd@Au, 1 nm Au shell on the Pd seeds',
  ptNi: 'Demo Pt–Ni co-reduction alloy 4 nm',
  agPd: 'Demo Ag–Pd alloy 8 nm in oleylamine',
} as const;

interface DemoPair {
  elementA: string;
  elementB: string;
  target: string;
  status: PairStatus;
  notes: string;
  /** Conditions of the saved prediction (those of the pair's demo batch where it has one). */
  prediction: { xB: number; diameterNm: number; temperatureK: number };
}

const DEMO_PAIRS: readonly DemoPair[] = [
  {
    elementA: 'Pt',
    elementB: 'Ni',
    target: 'Ni@Pt',
    status: 'characterized',
    notes:
      'Demo data: invented. Pt-skin over a Ni-rich core for oxygen reduction; the co-reduced Pt3Ni alloy comes first.',
    prediction: { xB: 0.25, diameterNm: 4, temperatureK: 298 },
  },
  {
    elementA: 'Pt',
    elementB: 'Co',
    target: 'alloy',
    status: 'candidate',
    notes: 'Demo data: invented. Mixed alloy reference.',
    prediction: { xB: 0.25, diameterNm: 4, temperatureK: 298 },
  },
  {
    elementA: 'Pd',
    elementB: 'Au',
    target: 'Pd@Au',
    status: 'characterized',
    notes: 'Demo data: invented. Au shell on Pd seeds.',
    prediction: { xB: 0.5, diameterNm: 10, temperatureK: 298 },
  },
  {
    elementA: 'Ag',
    elementB: 'Pd',
    target: 'alloy',
    status: 'planned',
    notes: 'Demo data: invented. Co-reduction in oleylamine.',
    prediction: { xB: 0.5, diameterNm: 8, temperatureK: 473 },
  },
  {
    elementA: 'Cu',
    elementB: 'Ag',
    target: 'Janus',
    status: 'candidate',
    notes: 'Demo data: invented. Immiscible pair, expected to phase separate.',
    prediction: { xB: 0.5, diameterNm: 8, temperatureK: 298 },
  },
];

const PD_SEEDS: BatchDesignRequest = {
  elementA: 'Pd',
  elementB: 'Au',
  target: 'Pd@Au',
  route: 'co-reduction',
  size: { kind: 'single-metal', element: 'Pd', diameterNm: 8 },
  amount: { kind: 'total-metal', totalMetalMmol: 0.05 },
  batchVolumeMl: 50,
  precursors: [{ element: 'Pd', reagentKey: 'na2pdcl4', stockMm: 10 }],
  reducer: { reagentKey: 'ascorbic-acid', excess: 3, stockMm: 100 },
  capping: { reagentKey: 'pvp', molPerMolMetal: 10 },
};

const pdAuGrowth = (seedBatchId: number): BatchDesignRequest => ({
  elementA: 'Pd',
  elementB: 'Au',
  target: 'Pd@Au',
  route: 'seed-mediated',
  size: { kind: 'core-shell', shellThicknessNm: 1 },
  batchVolumeMl: 20,
  seeds: { metal: 'Pd', volumeMl: 10, seedBatchId },
  precursors: [{ element: 'Au', reagentKey: 'haucl4-3h2o', stockMm: 5 }],
  reducer: { reagentKey: 'ascorbic-acid', excess: 2, stockMm: 100 },
  capping: { reagentKey: 'pvp', molPerMolMetal: 10 },
});

const PT_NI_ALLOY: BatchDesignRequest = {
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
  capping: { reagentKey: 'pvp', molPerMolMetal: 10 },
};

const AG_PD_OLEYLAMINE: BatchDesignRequest = {
  elementA: 'Ag',
  elementB: 'Pd',
  target: 'alloy',
  route: 'organic',
  size: { kind: 'alloy', diameterNm: 8, xB: 0.5 },
  amount: { kind: 'total-metal', totalMetalMmol: 0.2 },
  batchVolumeMl: 20,
  precursors: [
    { element: 'Ag', reagentKey: 'agno3' },
    { element: 'Pd', reagentKey: 'pd-acac2' },
  ],
  solvent: { reagentKey: 'oleylamine', volumeMl: 20 },
  temperatureC: 200,
};

/** Invented inventory: enough Pd(acac)2, too little AgNO3 for the planned Ag–Pd batch (a shortfall to show). */
const DEMO_INVENTORY = [
  { reagentKey: 'agno3', amount: 10, unit: 'mg', lot: 'DEMO-AG-01' },
  { reagentKey: 'pd-acac2', amount: 250, unit: 'mg', lot: 'DEMO-PD-01' },
  { reagentKey: 'oleylamine', amount: 100, unit: 'mL', lot: 'DEMO-OLA-01' },
] as const;

export interface DemoOutcome {
  sizes: DemoSizeSpec;
  composition: { method: 'ICP-OES' | 'EDX area'; xB: number; uncertaintyXB: number }[];
  scan: Omit<DemoLineScanSpec, 'elementA' | 'elementB'>;
  /** The architecture the scan was generated as; the fit must suggest it for the demo to confirm it. */
  observed: string;
}

/** Pd@Au: 8 nm planned seeds + 1 nm Au shell → 10 nm. Pd is A, Au is B: the scan is generated as A@B. */
export const PD_AU_OUTCOME: DemoOutcome = {
  sizes: { seed: 20_101, medianNm: 10.3, sigmaLog: 0.09, count: 180 },
  composition: [
    { method: 'ICP-OES', xB: 0.45, uncertaintyXB: 0.01 },
    { method: 'EDX area', xB: 0.47, uncertaintyXB: 0.03 },
  ],
  scan: {
    seed: 20_102,
    kind: 'A@B',
    centerNm: 10.3,
    radiusNm: 5.1,
    coreRadiusNm: 4.0,
    probeSigmaNm: 0.5,
    startNm: 0,
    endNm: 20,
    stepNm: 0.4,
    countsPerNmA: 30,
    countsPerNmB: 30,
    backgroundA: 6,
    backgroundB: 4,
  },
  observed: 'Pd@Au',
};

/** Pt–Ni co-reduced alloy, 4 nm target, 25 at.% Ni: both elements fill the particle. */
export const PT_NI_OUTCOME: DemoOutcome = {
  sizes: { seed: 20_201, medianNm: 4.3, sigmaLog: 0.14, count: 220 },
  composition: [
    { method: 'ICP-OES', xB: 0.23, uncertaintyXB: 0.01 },
    { method: 'EDX area', xB: 0.22, uncertaintyXB: 0.03 },
  ],
  scan: {
    seed: 20_202,
    kind: 'alloy',
    centerNm: 5.1,
    radiusNm: 2.2,
    coreRadiusNm: 0,
    probeSigmaNm: 0.3,
    startNm: 0,
    endNm: 10,
    stepNm: 0.2,
    countsPerNmA: 60,
    countsPerNmB: 20,
    backgroundA: 5,
    backgroundB: 5,
  },
  observed: 'alloy',
};

/**
 * One step of the demo: the operation through the common path (dispatch.ts), inside the demo's transaction.
 * A failure is raised again naming the demo step, which rolls the whole demo back.
 */
function step<Name extends OperationName>(
  context: ServiceContext,
  what: string,
  name: Name,
  input: OperationInput<Name>,
): OperationOutput<Name> {
  try {
    return runOperationInTransaction(context, name, input);
  } catch (error) {
    if (!(error instanceof DomainError)) throw error;
    const detail =
      error.field && !error.message.startsWith(`${error.field}:`) ? `${error.field}: ${error.message}` : error.message;
    throw new DomainError(
      error.code,
      `The demo campaign could not be loaded (nothing was stored): ${what} (${name}): ${detail}`,
    );
  }
}

function recordOutcome(batch: SavedBatch, outcome: DemoOutcome, context: ServiceContext): void {
  const notes =
    `${DEMO_NOTE_PREFIX}. Generated by Pairwright, not measured. TEM diameters drawn from a seeded log-normal; ` +
    'the EDX line scan is the line-scan model with Poisson noise; compositions are made-up numbers.';
  const { elementA, elementB } = batch.design;
  step(context, `outcome of "${batch.name}"`, 'outcomes.record', {
    batchId: batch.id,
    sizes: { csvText: demoDiameterCsv(outcome.sizes) },
    composition: { measurements: outcome.composition, gridMetal: 'Cu' },
    lineScan: { name: 'Demo scan (invented)', csvText: demoLineScanCsv({ ...outcome.scan, elementA, elementB }) },
    observed: {
      label: outcome.observed,
      decision: 'confirmed',
      reason: `${DEMO_NOTE_PREFIX}. Confirms the line-scan suggestion of the invented scan.`,
    },
    notes,
  });
}

function advance(batch: SavedBatch, statuses: readonly ('made' | 'characterized')[], context: ServiceContext): void {
  for (const status of statuses) {
    // Demo batches never touch the inventory: a real one must not lose invented amounts.
    step(context, `status of "${batch.name}"`, 'batches.setStatus', { id: batch.id, status, inventory: false });
  }
}

/** Creates the demo campaign once, populated in every view; a second call returns the existing one unchanged. */
export function loadDemoCampaign(context: ServiceContext): Campaign {
  const db = context.store.db;
  return db.transaction(() => {
    const existing = findCampaignByName(db, DEMO_CAMPAIGN_NAME);
    if (existing) return existing;
    // The one direct write: no operation makes a campaign flagged as demo, on purpose.
    const campaign = createCampaign(db, {
      name: DEMO_CAMPAIGN_NAME,
      description:
        'DEMO DATA — invented for a first look at Pairwright; not measurements. ' +
        'Archive it when you start your own campaign.',
      isDemo: true,
    });
    const pairs = new Map<string, CandidatePair>();
    for (const pair of DEMO_PAIRS) {
      const text = `${pair.elementA}-${pair.elementB}`;
      const added = step(context, `pair ${text}`, 'pairs.add', {
        campaignId: campaign.id,
        pair: text,
        target: pair.target,
        notes: pair.notes,
      });
      const stored =
        pair.status === added.status
          ? added
          : step(context, `status of pair ${text}`, 'pairs.update', { id: added.id, status: pair.status });
      pairs.set(text, stored);
      step(context, `prediction for ${text}`, 'prediction.save', {
        pair: text,
        pairId: added.id,
        conditions: pair.prediction,
      });
    }
    const pairId = (key: string): number => {
      const pair = pairs.get(key);
      if (!pair) throw new Error(`demo pair ${key} is missing from DEMO_PAIRS`);
      return pair.id;
    };
    const save = (name: string, pair: string, design: BatchDesignRequest, notes: string): SavedBatch =>
      step(context, `batch "${name}"`, 'batches.save', {
        name,
        campaignId: campaign.id,
        pairId: pairId(pair),
        design,
        notes,
      });

    // Saved oldest first as listed; the views list the newest first, so Results opens on the Pd@Au batch.
    save(
      DEMO_BATCH_NAMES.agPd,
      'Ag-Pd',
      AG_PD_OLEYLAMINE,
      `${DEMO_NOTE_PREFIX}. Planned; short of AgNO3 against the demo inventory ` +
        '(which is only added to an empty inventory).',
    );
    const ptNi = save(
      DEMO_BATCH_NAMES.ptNi,
      'Pt-Ni',
      PT_NI_ALLOY,
      `${DEMO_NOTE_PREFIX}. Co-reduced Pt3Ni alloy, the starting point for a Pt skin.`,
    );
    advance(ptNi, ['made', 'characterized'], context);
    recordOutcome(ptNi, PT_NI_OUTCOME, context);
    const seeds = save(
      DEMO_BATCH_NAMES.pdSeeds,
      'Pd-Au',
      PD_SEEDS,
      `${DEMO_NOTE_PREFIX}. Seeds used straight from the flask for the Pd@Au growth batch (not imaged separately), ` +
        'so the growth batch uses their planned size and concentration.',
    );
    advance(seeds, ['made'], context);
    const growth = save(
      DEMO_BATCH_NAMES.pdAu,
      'Pd-Au',
      pdAuGrowth(seeds.id),
      `${DEMO_NOTE_PREFIX}. Seed-mediated growth on the demo Pd seeds.`,
    );
    advance(growth, ['made', 'characterized'], context);
    recordOutcome(growth, PD_AU_OUTCOME, context);
    // Invented stock only goes into an empty inventory: a real one is never padded with demo amounts.
    const inventory = step(context, 'inventory', 'inventory.list', {});
    if (inventory.length === 0) {
      for (const item of DEMO_INVENTORY) {
        step(context, `inventory row ${item.reagentKey}`, 'inventory.upsert', {
          ...item,
          location: DEMO_INVENTORY_LOCATION,
        });
      }
    }
    return findCampaignByName(db, DEMO_CAMPAIGN_NAME) ?? campaign;
  })();
}
