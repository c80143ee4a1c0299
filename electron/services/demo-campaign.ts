/**
 * The demo campaign: INVENTED data so a first-time user sees every view populated. Nothing here is a
 * measurement. It is labelled as demo everywhere: the campaign is marked is_demo with "(demo)" in its name,
 * batch names start with "Demo", notes start with "Demo data: invented", inventory rows sit on the
 * "Demo shelf (invented)" with lots "DEMO-…".
 *
 * Everything goes through the same service functions the views use (prediction.save, batches.save and
 * setStatus, outcomes.recordSizes / recordComposition / importLineScan / setObserved, inventory.upsert),
 * validated by the same zod schemas, inside ONE transaction: the services' own transactions nest as
 * savepoints, so a failure at any step leaves no part of the demo behind. Measurements are generated from
 * seeded generators (demo-measurements.ts), so every load gives the same demo.
 */
import { createCampaign, findCampaignByName } from '../../db/repositories/campaigns';
import { addPair } from '../../db/repositories/pairs';
import type { SavedBatch } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { OperationInput, OperationName, OperationOutput } from '../../shared-model/api/contract';
import type { CandidatePair, PairStatus } from '../../shared-model/api/pairs';
import { DomainError } from '../../shared-model/api/result';
import { validateInput } from '../../shared-model/api/validate';
import type { BatchDesignRequest } from '../../shared-model/recipes/design-input';
import { batchHandlers } from './batches';
import type { Handler, ServiceContext } from './context';
import { demoDiameterCsv, demoLineScanCsv, type DemoLineScanSpec, type DemoSizeSpec } from './demo-measurements';
import { outcomeHandlers } from './outcomes';
import { predictionHandlers } from './prediction';

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
    notes: 'Demo data: invented. Pt-skin over a Ni-rich core for oxygen reduction; the co-reduced Pt3Ni alloy comes first.',
    prediction: { xB: 0.25, diameterNm: 4, temperatureK: 298 },
  },
  { elementA: 'Pt', elementB: 'Co', target: 'alloy', status: 'candidate', notes: 'Demo data: invented. Mixed alloy reference.', prediction: { xB: 0.25, diameterNm: 4, temperatureK: 298 } },
  { elementA: 'Pd', elementB: 'Au', target: 'Pd@Au', status: 'characterized', notes: 'Demo data: invented. Au shell on Pd seeds.', prediction: { xB: 0.5, diameterNm: 10, temperatureK: 298 } },
  { elementA: 'Ag', elementB: 'Pd', target: 'alloy', status: 'planned', notes: 'Demo data: invented. Co-reduction in oleylamine.', prediction: { xB: 0.5, diameterNm: 8, temperatureK: 473 } },
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
 * Runs one operation's service function exactly as dispatch does (zod validation with defaults, then the
 * handler), but synchronously and throwing, so it can run inside the demo's transaction. A failure names the
 * demo step and is raised as a DomainError, which rolls the whole demo back.
 */
function run<Name extends OperationName>(step: string, name: Name, handler: Handler<Name>, input: OperationInput<Name>, context: ServiceContext): OperationOutput<Name> {
  const fail = (code: DomainError['code'], message: string): DomainError =>
    new DomainError(code, `The demo campaign could not be loaded (nothing was stored): ${step} (${name}): ${message}`);
  const validated = validateInput(name, input);
  if (!validated.ok) throw fail(validated.error.code, validated.error.message);
  let output: OperationOutput<Name> | Promise<OperationOutput<Name>>;
  try {
    output = handler(validated.value, context);
  } catch (error) {
    if (error instanceof DomainError) throw fail(error.code, error.field ? `${error.field}: ${error.message}` : error.message);
    throw error;
  }
  if (output instanceof Promise) throw new Error(`${name} answered asynchronously; the demo needs synchronous services to load in one transaction`);
  return output;
}

function recordOutcome(batch: SavedBatch, outcome: DemoOutcome, context: ServiceContext): void {
  const step = (what: string) => `${what} of "${batch.name}"`;
  const notes = `${DEMO_NOTE_PREFIX}. Generated by Pairwright, not measured. TEM diameters drawn from a seeded log-normal; the EDX line scan is the line-scan model with Poisson noise; compositions are made-up numbers.`;
  run(step('TEM sizes'), 'outcomes.recordSizes', outcomeHandlers['outcomes.recordSizes'], { batchId: batch.id, csvText: demoDiameterCsv(outcome.sizes) }, context);
  run(step('composition'), 'outcomes.recordComposition', outcomeHandlers['outcomes.recordComposition'], { batchId: batch.id, measurements: outcome.composition, gridMetal: 'Cu' }, context);
  const { elementA, elementB } = batch.design;
  run(
    step('line scan'),
    'outcomes.importLineScan',
    outcomeHandlers['outcomes.importLineScan'],
    { batchId: batch.id, name: 'Demo scan (invented)', csvText: demoLineScanCsv({ ...outcome.scan, elementA, elementB }) },
    context,
  );
  run(
    step('observed architecture'),
    'outcomes.setObserved',
    outcomeHandlers['outcomes.setObserved'],
    { batchId: batch.id, label: outcome.observed, decision: 'confirmed', reason: `${DEMO_NOTE_PREFIX}. Confirms the line-scan suggestion of the invented scan.` },
    context,
  );
  run(step('notes'), 'outcomes.setNotes', outcomeHandlers['outcomes.setNotes'], { batchId: batch.id, notes }, context);
}

function advance(batch: SavedBatch, statuses: readonly ('made' | 'characterized')[], context: ServiceContext): void {
  for (const status of statuses) run(`status of "${batch.name}"`, 'batches.setStatus', batchHandlers['batches.setStatus'], { id: batch.id, status }, context);
}

/** Creates the demo campaign once, populated in every view; a second call returns the existing one unchanged. */
export function loadDemoCampaign(context: ServiceContext): Campaign {
  const db = context.store.db;
  return db.transaction(() => {
    const existing = findCampaignByName(db, DEMO_CAMPAIGN_NAME);
    if (existing) return existing;
    const campaign = createCampaign(db, {
      name: DEMO_CAMPAIGN_NAME,
      description: 'DEMO DATA — invented for a first look at Pairwright; not measurements. Archive it when you start your own campaign.',
      isDemo: true,
    });
    const pairs = new Map<string, CandidatePair>();
    for (const pair of DEMO_PAIRS) {
      const added = addPair(db, { campaignId: campaign.id, elementA: pair.elementA, elementB: pair.elementB, target: pair.target, status: pair.status, notes: pair.notes });
      pairs.set(`${pair.elementA}-${pair.elementB}`, added);
      run(
        `prediction for ${pair.elementA}-${pair.elementB}`,
        'prediction.save',
        predictionHandlers['prediction.save'],
        { pair: `${pair.elementA}-${pair.elementB}`, pairId: added.id, conditions: pair.prediction },
        context,
      );
    }
    const pairId = (key: string): number => {
      const pair = pairs.get(key);
      if (!pair) throw new Error(`demo pair ${key} is missing from DEMO_PAIRS`);
      return pair.id;
    };
    const save = (name: string, pair: string, design: BatchDesignRequest, notes: string): SavedBatch =>
      run(`batch "${name}"`, 'batches.save', batchHandlers['batches.save'], { name, campaignId: campaign.id, pairId: pairId(pair), design, notes }, context);

    // Saved oldest first as listed; the views list the newest first, so Results opens on the Pd@Au batch.
    save(DEMO_BATCH_NAMES.agPd, 'Ag-Pd', AG_PD_OLEYLAMINE, `${DEMO_NOTE_PREFIX}. Planned; short of AgNO3 against the demo inventory (which is only added to an empty inventory).`);
    const ptNi = save(DEMO_BATCH_NAMES.ptNi, 'Pt-Ni', PT_NI_ALLOY, `${DEMO_NOTE_PREFIX}. Co-reduced Pt3Ni alloy, the starting point for a Pt skin.`);
    advance(ptNi, ['made', 'characterized'], context);
    recordOutcome(ptNi, PT_NI_OUTCOME, context);
    const seeds = save(
      DEMO_BATCH_NAMES.pdSeeds,
      'Pd-Au',
      PD_SEEDS,
      `${DEMO_NOTE_PREFIX}. Seeds used straight from the flask for the Pd@Au growth batch (not imaged separately), so the growth batch uses their planned size and concentration.`,
    );
    advance(seeds, ['made'], context);
    const growth = save(DEMO_BATCH_NAMES.pdAu, 'Pd-Au', pdAuGrowth(seeds.id), `${DEMO_NOTE_PREFIX}. Seed-mediated growth on the demo Pd seeds.`);
    advance(growth, ['made', 'characterized'], context);
    recordOutcome(growth, PD_AU_OUTCOME, context);
    // Invented stock only goes into an empty inventory: a real one is never padded with demo amounts.
    const inventory = run('inventory', 'inventory.list', batchHandlers['inventory.list'], {}, context);
    if (inventory.length === 0) {
      for (const item of DEMO_INVENTORY) {
        run(`inventory row ${item.reagentKey}`, 'inventory.upsert', batchHandlers['inventory.upsert'], { ...item, location: DEMO_INVENTORY_LOCATION }, context);
      }
    }
    return findCampaignByName(db, DEMO_CAMPAIGN_NAME) ?? campaign;
  })();
}
