/**
 * The demo campaign through the dispatcher every transport uses, on real SQLite files: it populates every
 * view (predictions, batches with lineage and statuses, outcomes, inventory), all of it labelled as demo,
 * loads once, is the same on every load, and a failure part-way leaves nothing behind.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import {
  DEMO_BATCH_NAMES,
  DEMO_CAMPAIGN_NAME,
  DEMO_INVENTORY_LOCATION,
  DEMO_NOTE_PREFIX,
  PD_AU_OUTCOME,
  PT_NI_OUTCOME,
  type DemoOutcome,
} from '../../electron/services/demo-campaign';
import { demoDiameterCsv, demoLineScanCsv, poissonCount } from '../../electron/services/demo-measurements';
import { dispatch } from '../../electron/services/dispatch';
import type { BatchSummary, CatalogReagent, InventoryRecord, SavedBatch } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { BatchOutcome, CampaignConfusion, OutcomeRow } from '../../shared-model/api/outcomes';
import type { CandidatePair } from '../../shared-model/api/pairs';
import type { SavedPrediction } from '../../shared-model/api/prediction';
import { createRandom } from '../../shared-model/random';
import type { ReagentList } from '../../shared-model/recipes/reagent-list';
import { tempDataDir } from '../support/host-fixture';

let store: Store;
let context: ServiceContext;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  context = { store };
});
afterEach(() => store.close());

async function ok<T>(name: string, input: unknown, on: ServiceContext = context): Promise<T> {
  const result = await dispatch(on, name, input);
  if (!result.ok) throw new Error(`${name}: ${result.error.message}`);
  return result.value as T;
}

/** Every table the demo writes to (the catalog is seeded on first read and is not demo data). */
const DEMO_TABLES = [
  'campaigns',
  'pairs',
  'predictions',
  'batches',
  'outcome_size_imports',
  'outcome_diameters',
  'outcome_compositions',
  'outcome_composition_measurements',
  'outcome_line_scans',
  'outcome_line_scan_points',
  'outcome_observations',
  'inventory',
] as const;
const counts = (db: Store['db'] = store.db): Record<string, number> =>
  Object.fromEntries(
    DEMO_TABLES.map((table) => [table, (db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n]),
  );

async function loadDemo(
  on: ServiceContext = context,
): Promise<{ campaign: Campaign; batches: Map<string, BatchSummary> }> {
  const campaign = await ok<Campaign>('campaigns.loadDemo', {}, on);
  const list = await ok<BatchSummary[]>('batches.list', { campaignId: campaign.id }, on);
  return { campaign, batches: new Map(list.map((b) => [b.name, b])) };
}

function batchId(batches: Map<string, BatchSummary>, name: string): number {
  const batch = batches.get(name);
  if (!batch) throw new Error(`no demo batch "${name}"`);
  return batch.id;
}

describe('the demo campaign', () => {
  it('populates pairs with saved predictions, batches with lineage and statuses, outcomes and the confusion matrix', async () => {
    const { campaign, batches } = await loadDemo();
    expect(campaign).toMatchObject({ name: DEMO_CAMPAIGN_NAME, isDemo: true, pairCount: 5 });
    expect(campaign.description).toMatch(/^DEMO DATA — invented/);

    // One saved prediction per pair, linked to the pair, through prediction.save.
    const pairs = await ok<CandidatePair[]>('pairs.list', { campaignId: campaign.id });
    expect(pairs).toHaveLength(5);
    for (const pair of pairs) {
      expect(pair.notes.startsWith(DEMO_NOTE_PREFIX)).toBe(true);
      const predictions = await ok<SavedPrediction[]>('prediction.listForPair', { pairId: pair.id });
      expect(predictions).toHaveLength(1);
      expect(predictions[0]?.pair).toBe(`${pair.elementA}-${pair.elementB}`);
      expect(typeof predictions[0]?.result.architecture).toBe('string');
    }

    // Four batches, every name and note labelled, one planned, one made, two characterized.
    expect([...batches.keys()].sort()).toEqual(Object.values(DEMO_BATCH_NAMES).sort());
    const statuses = Object.fromEntries([...batches.values()].map((b) => [b.name, b.status]));
    expect(statuses).toEqual({
      [DEMO_BATCH_NAMES.pdSeeds]: 'made',
      [DEMO_BATCH_NAMES.pdAu]: 'characterized',
      [DEMO_BATCH_NAMES.ptNi]: 'characterized',
      [DEMO_BATCH_NAMES.agPd]: 'planned',
    });
    for (const summary of batches.values()) {
      const batch = await ok<SavedBatch>('batches.get', { id: summary.id });
      expect(batch.name.startsWith('Demo ')).toBe(true);
      expect(batch.notes.startsWith(DEMO_NOTE_PREFIX)).toBe(true);
      expect(batch.campaignId).toBe(campaign.id);
      const pair = pairs.find((p) => p.id === batch.pairId);
      expect([pair?.elementA, pair?.elementB].sort()).toEqual([batch.design.elementA, batch.design.elementB].sort());
    }
    // Lineage: the growth batch uses the seed batch's planned size (the seeds were not characterized).
    const seeds = await ok<SavedBatch>('batches.get', { id: batchId(batches, DEMO_BATCH_NAMES.pdSeeds) });
    const growth = await ok<SavedBatch>('batches.get', { id: batchId(batches, DEMO_BATCH_NAMES.pdAu) });
    expect(growth.seedBatchId).toBe(seeds.id);
    expect(growth.design.coreDiameterNm).toBe(seeds.design.diameterNm);
    expect(growth.input.seeds?.particlesPerMl).toBe(seeds.design.particlesPerMl);

    // Outcomes on the characterized batches only, each labelled as demo, with the generated architecture confirmed.
    const characterized: [string, DemoOutcome][] = [
      [DEMO_BATCH_NAMES.pdAu, PD_AU_OUTCOME],
      [DEMO_BATCH_NAMES.ptNi, PT_NI_OUTCOME],
    ];
    for (const [name, spec] of characterized) {
      const outcome = await ok<BatchOutcome>('outcomes.get', { batchId: batchId(batches, name) });
      expect(outcome.notes.startsWith(DEMO_NOTE_PREFIX)).toBe(true);
      expect(outcome.sizes).toHaveLength(1);
      expect(outcome.sizes[0]?.diametersNm).toHaveLength(spec.sizes.count);
      expect(outcome.compositions[0]?.measurements.map((m) => m.method)).toEqual(spec.composition.map((m) => m.method));
      expect(outcome.lineScans).toHaveLength(1);
      expect(outcome.lineScans[0]?.name).toMatch(/^Demo .*invented/);
      expect(outcome.observed).toMatchObject({
        label: spec.observed,
        decision: 'confirmed',
        suggestedLabel: spec.observed,
      });
      expect(outcome.observed?.reason.startsWith(DEMO_NOTE_PREFIX)).toBe(true);
      expect(outcome.predictions.find((p) => p.source === 'analytic')).toBeDefined();
    }
    for (const name of [DEMO_BATCH_NAMES.pdSeeds, DEMO_BATCH_NAMES.agPd]) {
      const outcome = await ok<BatchOutcome>('outcomes.get', { batchId: batchId(batches, name) });
      expect([outcome.sizes.length, outcome.compositions.length, outcome.lineScans.length, outcome.observed]).toEqual([
        0,
        0,
        0,
        null,
      ]);
    }

    // The prediction-vs-outcome table and the confusion matrix hold the two characterized batches.
    const rows = await ok<OutcomeRow[]>('outcomes.listByCampaign', { campaignId: campaign.id });
    expect(rows).toHaveLength(4);
    const observedRows = rows.filter((r) => r.observed !== null);
    expect(observedRows.map((r) => r.batchName).sort()).toEqual([DEMO_BATCH_NAMES.pdAu, DEMO_BATCH_NAMES.ptNi].sort());
    expect(observedRows.every((r) => r.predicted !== null && r.agreement !== null && r.meanDiameterNm !== null)).toBe(
      true,
    );
    const confusion = await ok<CampaignConfusion>('outcomes.confusion', { campaignId: campaign.id });
    expect(confusion.matrix.total).toBe(2);
    expect(confusion.unmatched).toBe(0);
    expect(confusion.matrix.counts.flat().reduce((s, n) => s + n, 0)).toBe(2);
  });

  it('recovers the generating parameters from the invented measurements (the generators do what they say)', async () => {
    const { batches } = await loadDemo();
    for (const [name, spec] of [
      [DEMO_BATCH_NAMES.pdAu, PD_AU_OUTCOME],
      [DEMO_BATCH_NAMES.ptNi, PT_NI_OUTCOME],
    ] as const) {
      const outcome = await ok<BatchOutcome>('outcomes.get', { batchId: batchId(batches, name) });
      const fit = outcome.sizes[0]?.lognormal;
      const n = spec.sizes.count;
      // Large-sample standard errors of the log-normal MLE (from memory): μ ± σ/√n, σ ± σ/√(2n); allow 4 of them.
      expect(Math.abs((fit?.mu ?? Number.NaN) - Math.log(spec.sizes.medianNm))).toBeLessThan(
        (4 * spec.sizes.sigmaLog) / Math.sqrt(n),
      );
      expect(Math.abs((fit?.sigma ?? Number.NaN) - spec.sizes.sigmaLog)).toBeLessThan(
        (4 * spec.sizes.sigmaLog) / Math.sqrt(2 * n),
      );

      // The four-model fit picks the kind the scan was generated as, with the particle's radius.
      const analysis = outcome.lineScans[0]?.analysis;
      expect(analysis?.chosenKind).toBe(spec.scan.kind);
      expect(analysis?.noise.model).toBe('poisson');
      const chosen = analysis?.models.find((m) => m.model === spec.scan.kind);
      const radius = chosen?.radiusNm;
      expect(radius?.sd).not.toBeNull();
      expect(Math.abs((radius?.value ?? Number.NaN) - spec.scan.radiusNm)).toBeLessThan(4 * (radius?.sd ?? 0));
      if (spec.scan.kind === 'A@B') {
        const core = chosen?.coreRadiusNm;
        expect(Math.abs((core?.value ?? Number.NaN) - spec.scan.coreRadiusNm)).toBeLessThan(4 * (core?.sd ?? 0));
      }
    }
  });

  it('stocks an empty inventory with labelled demo rows so the planned batch shows a shortfall', async () => {
    const { batches } = await loadDemo();
    const inventory = await ok<InventoryRecord[]>('inventory.list', {});
    expect(inventory.length).toBeGreaterThanOrEqual(2);
    expect(inventory.every((item) => item.location === DEMO_INVENTORY_LOCATION && item.lot.startsWith('DEMO-'))).toBe(
      true,
    );
    const list = await ok<ReagentList>('reagents.list', { batchIds: [batchId(batches, DEMO_BATCH_NAMES.agPd)] });
    const short = list.lines.filter((line) => line.status === 'short');
    expect(short.map((line) => line.key)).toEqual(['agno3']);
    expect(list.lines.some((line) => line.status === 'enough')).toBe(true);
  });

  it('leaves a real inventory alone', async () => {
    await ok('inventory.upsert', {
      reagentKey: 'haucl4-3h2o',
      amount: 1,
      unit: 'g',
      location: 'desiccator',
      lot: 'MK1',
    });
    await loadDemo();
    const inventory = await ok<InventoryRecord[]>('inventory.list', {});
    expect(inventory.map((item) => item.lot)).toEqual(['MK1']);
  });

  it('loads once: a second call returns the same campaign and adds nothing', async () => {
    const first = await loadDemo();
    const before = counts();
    const second = await loadDemo();
    expect(second.campaign).toEqual(first.campaign);
    expect(counts()).toEqual(before);
    expect(before.batches).toBe(4);
  });

  it('is the same on every load: seeded diameters and line-scan counts repeat exactly', async () => {
    const { batches } = await loadDemo();
    const other = openStore({ dataDir: tempDataDir() });
    try {
      const again = await loadDemo({ store: other });
      for (const name of [DEMO_BATCH_NAMES.pdAu, DEMO_BATCH_NAMES.ptNi]) {
        const a = await ok<BatchOutcome>('outcomes.get', { batchId: batchId(batches, name) });
        const b = await ok<BatchOutcome>('outcomes.get', { batchId: batchId(again.batches, name) }, { store: other });
        expect(b.sizes[0]?.diametersNm).toEqual(a.sizes[0]?.diametersNm);
        expect(b.lineScans[0]?.points).toEqual(a.lineScans[0]?.points);
      }
    } finally {
      other.close();
    }
  });

  it('stores nothing when a step fails part-way (a catalog edit makes a later batch impossible)', async () => {
    // The user has recorded ascorbic acid as an additive only (an antioxidant in their own recipes): the demo's
    // Pd seed batch, designed after the Ag–Pd and Pt–Ni batches and the Pt–Ni outcomes are written, then has
    // no reducer the design accepts, and the design refuses it.
    const catalog = await ok<CatalogReagent[]>('reagents.catalog', {});
    const ascorbic = catalog.find((r) => r.key === 'ascorbic-acid') as CatalogReagent;
    await ok('reagents.edit', { ...ascorbic, roles: ['additive'] });
    const empty = counts();
    expect(Object.values(empty).every((n) => n === 0)).toBe(true);

    const result = await dispatch(context, 'campaigns.loadDemo', {});
    expect(result.ok).toBe(false);
    const message = result.ok ? '' : result.error.message;
    expect(message).toContain('nothing was stored');
    expect(message).toContain(DEMO_BATCH_NAMES.pdSeeds);
    expect(message).toMatch(/reducer/);
    expect(counts()).toEqual(empty);
    // The user's own edit is untouched by the rollback.
    const after = await ok<CatalogReagent[]>('reagents.catalog', {});
    expect(after.find((r) => r.key === 'ascorbic-acid')?.roles).toEqual(['additive']);
  });
});

describe('demo measurement generators', () => {
  it('write CSV the importers read, repeat from the seed and differ between seeds', () => {
    const sizes = demoDiameterCsv({ seed: 1, medianNm: 5, sigmaLog: 0.1, count: 50 });
    expect(sizes.split('\n')[0]).toBe('diameter (nm)');
    expect(sizes.trim().split('\n')).toHaveLength(51);
    expect(demoDiameterCsv({ seed: 1, medianNm: 5, sigmaLog: 0.1, count: 50 })).toBe(sizes);
    expect(demoDiameterCsv({ seed: 2, medianNm: 5, sigmaLog: 0.1, count: 50 })).not.toBe(sizes);
    const scan = demoLineScanCsv({ ...PT_NI_OUTCOME.scan, elementA: 'Pt', elementB: 'Ni' });
    const rows = scan.trim().split('\n');
    expect(rows[0]).toBe('position (nm),Pt,Ni');
    expect(rows.slice(1).every((row) => /^[\d.]+,\d+,\d+$/.test(row))).toBe(true);
  });

  it('draws Poisson counts with the right mean and variance', () => {
    // A Poisson distribution has variance equal to its mean (any statistics text); check both regimes of the sampler.
    for (const mean of [4, 80]) {
      const random = createRandom(7);
      const n = 20_000;
      let sum = 0;
      let sumSq = 0;
      for (let i = 0; i < n; i++) {
        const k = poissonCount(random, mean);
        sum += k;
        sumSq += k * k;
      }
      const m = sum / n;
      const variance = sumSq / n - m * m;
      // Standard errors: of the mean √(λ/n); of the sample variance √((μ4 − σ⁴)/n) with the Poisson fourth central
      // moment μ4 = λ(1 + 3λ), i.e. √((λ + 2λ²)/n) (from memory); allow 5 of them.
      expect(Math.abs(m - mean)).toBeLessThan(5 * Math.sqrt(mean / n));
      expect(Math.abs(variance - mean)).toBeLessThan(5 * Math.sqrt((mean + 2 * mean * mean) / n));
    }
  });
});
