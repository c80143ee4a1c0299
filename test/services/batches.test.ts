/** Batch design services through the dispatcher every transport uses, on a real SQLite file. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { dispatch } from '../../electron/services/dispatch';
import type { CatalogReagent, SavedBatch } from '../../shared-model/api/batches';
import { predictPair } from '../../shared-model/prediction/predict';
import type { BatchDesign } from '../../shared-model/recipes/design';
import type { ReagentList } from '../../shared-model/recipes/reagent-list';
import { REAGENT_SEED } from '../../shared-model/recipes/reagent-seed';
import { dispatchValue } from '../support/dispatch';
import { tempDataDir } from '../support/host-fixture';
import { auSeeds, ptNi } from '../support/sample-batches';

let store: Store;
let context: ServiceContext;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  context = { store };
});
afterEach(() => store.close());

const ok = <T>(name: string, input: unknown): Promise<T> => dispatchValue<T>(context, name, input);
const count = (table: string) => (store.db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;

describe('catalog', () => {
  it('is seeded once from the built-in reagents', async () => {
    const catalog = await ok<CatalogReagent[]>('reagents.catalog', {});
    expect(catalog).toHaveLength(REAGENT_SEED.length);
    expect(catalog.every((r) => r.revision === 1 && r.builtIn)).toBe(true);
    await ok('reagents.catalog', {});
    expect(count('reagents')).toBe(REAGENT_SEED.length);
    expect(catalog.find((r) => r.key === 'haucl4-3h2o')?.molarMassGPerMol).toBeCloseTo(393.83, 1);
  });

  it('adds a user reagent and refuses bad ones naming the field', async () => {
    const added = await ok<CatalogReagent>('reagents.add', {
      key: 'k2pdcl4',
      name: 'Potassium tetrachloropalladate(II)',
      formula: 'K2PdCl4',
      roles: ['metal-precursor'],
      form: 'solid',
      metal: { symbol: 'Pd', oxidationState: 2, coupleId: 'PdCl4/Pd' },
      hCodes: ['H302', 'H317'],
      signalWord: 'Warning',
      wasteStream: 'precious-metal-recovery',
    });
    expect(added.molarMassGPerMol).toBeCloseTo(326.43, 1); // CRC Handbook (from memory): 326.43
    expect(await dispatch(context, 'reagents.add', { ...added, key: 'k2pdcl4' })).toMatchObject({
      ok: false,
      error: { code: 'conflict', field: 'key' },
    });
    expect(await dispatch(context, 'reagents.add', { ...added, key: 'broken', formula: 'K2PdCl4)' })).toMatchObject({
      ok: false,
      error: { field: 'formula' },
    });
    expect(
      await dispatch(context, 'reagents.add', {
        ...added,
        key: 'broken',
        metal: { symbol: 'Pt', oxidationState: 2, coupleId: 'PtCl4/Pt' },
      }),
    ).toMatchObject({
      ok: false,
      error: { field: 'metal.symbol' },
    });
    expect(count('reagents')).toBe(REAGENT_SEED.length + 1);
  });
});

describe('designing and saving batches', () => {
  it('designs with the thermodynamic prediction wired in', async () => {
    const design = await ok<BatchDesign>('batches.design', ptNi);
    expect(
      design.thermodynamicSurfaceElement === null ||
        ['Pt', 'Ni'].includes(design.thermodynamicSurfaceElement as string),
    ).toBe(true);
    expect(
      design.checks.some(
        (c) => c.kind === 'kinetics-vs-thermodynamics' && c.message.startsWith('No thermodynamic prediction'),
      ),
    ).toBe(false);
    expect(design.latticeNm.Pt).toBeCloseTo(0.39242, 4);
    // the same answer as the prediction model at the designed particle (x_B 0.25, 4 nm, 25 °C)
    const prediction = predictPair('Pt', 'Ni', { xB: 0.25, diameterNm: 4, shape: 'sphere', temperatureK: 298.15 });
    expect(design.thermodynamicSurfaceElement).toBe(prediction.surfaceElement);
  });

  it('states the as-made expectation for the route: Pt–Ni co-reduced at 25 °C follows the reduction order', async () => {
    const design = await ok<BatchDesign>('batches.design', ptNi);
    // Pt (PtCl₆²⁻, +0.72 V) reduces long before Ni (Ni²⁺, −0.26 V; CRC Electrochemical Series); at 298 K
    // bulk interdiffusion moves atoms far less than a radius in 0.5 h (Mehrer 2007, from memory)
    expect(design.asMade?.basis).toBe('kinetic');
    expect(design.asMade?.label).toBe('Pt@Ni');
    expect(design.asMade?.text).toMatch(/equilibrium not reachable/);
    expect(design.asMade?.oxidation).toMatch(/Ni/); // NiO −239.7 kJ/mol (CRC): a Ni surface oxidises in water
  });

  it('refuses bad input naming the field and saves nothing', async () => {
    const cases: [unknown, string][] = [
      [{ ...ptNi, size: { kind: 'alloy', diameterNm: 4, xB: 1.2 } }, 'design.size.xB'],
      [{ ...ptNi, reducer: undefined }, 'reducer'],
      [
        { ...ptNi, precursors: [ptNi.precursors[0], { element: 'Ni', reagentKey: 'agno3' }] },
        'precursors.1.reagentKey',
      ],
    ];
    for (const [design, field] of cases) {
      const result = await dispatch(context, 'batches.save', { name: 'bad', design });
      expect(result.ok).toBe(false);
      expect(result.ok ? '' : result.error.field).toBe(field);
    }
    expect(await dispatch(context, 'batches.save', { name: '', design: ptNi })).toMatchObject({
      ok: false,
      error: { field: 'name' },
    });
    expect(
      await dispatch(context, 'batches.save', { name: 'x', design: ptNi, lots: [{ reagentKey: 'ctab', lot: 'L1' }] }),
    ).toMatchObject({ ok: false, error: { field: 'lots.0.reagentKey' } });
    expect(count('batches')).toBe(0);
  });

  it('stores the composition as the atomic fraction x_B, the unit of predictions and outcomes', async () => {
    const saved = await ok<SavedBatch>('batches.save', { name: 'PtNi 4 nm', design: ptNi });
    expect(saved.input.size).toEqual({ kind: 'alloy', diameterNm: 4, xB: 0.25 });
    const row = store.db.prepare('SELECT inputs FROM batches WHERE id = ?').get(saved.id) as { inputs: string };
    expect(JSON.parse(row.inputs).size).toEqual({ kind: 'alloy', diameterNm: 4, xB: 0.25 });
    // 4 nm Pt75Ni25: 2396.8 atoms (hand-worked in test/shared-model/recipes/particle.test.ts)
    expect(saved.design.atomsPerParticle).toBeCloseTo(2396.8, 0);
  });

  it('keeps a saved batch as computed when the catalog changes, and says so', async () => {
    const saved = await ok<SavedBatch>('batches.save', {
      name: 'PtNi 4 nm',
      design: ptNi,
      lots: [{ reagentKey: 'nabh4', lot: 'BCBX9' }],
    });
    expect(saved.status).toBe('planned');
    expect(saved.catalogChanges).toEqual([]);
    expect(saved.lots).toEqual([{ reagentKey: 'nabh4', lot: 'BCBX9' }]);
    const massBefore = saved.design.reagents.find((r) => r.key === 'h2ptcl6-6h2o')?.massMg;

    const catalog = await ok<CatalogReagent[]>('reagents.catalog', {});
    const h2ptcl6 = catalog.find((r) => r.key === 'h2ptcl6-6h2o') as CatalogReagent;
    const edited = await ok<CatalogReagent>('reagents.edit', {
      ...h2ptcl6,
      formula: 'H2PtCl6·5H2O',
      name: 'Chloroplatinic acid (assay edited)',
    });
    expect(edited.revision).toBe(2);

    const reread = await ok<SavedBatch>('batches.get', { id: saved.id });
    expect(reread.design.reagents.find((r) => r.key === 'h2ptcl6-6h2o')?.massMg).toBe(massBefore);
    expect(reread.catalogChanges).toEqual([
      { reagentKey: 'h2ptcl6-6h2o', name: 'Chloroplatinic acid hexahydrate', savedRevision: 1, currentRevision: 2 },
    ]);
    const list = await ok<{ id: number; catalogChanged: boolean }[]>('batches.list', {});
    expect(list[0]?.catalogChanged).toBe(true);
  });

  it('moves planned → made → characterized, refuses skipping, records stock dates', async () => {
    const saved = await ok<SavedBatch>('batches.save', { name: 'B', design: ptNi });
    expect(await dispatch(context, 'batches.setStatus', { id: saved.id, status: 'characterized' })).toMatchObject({
      ok: false,
      error: { field: 'status' },
    });
    await ok('batches.setStatus', { id: saved.id, status: 'made' });
    const done = await ok<SavedBatch>('batches.setStatus', {
      id: saved.id,
      status: 'characterized',
      measured: { diameterNm: 4.3 },
    });
    expect(done.status).toBe('characterized');
    expect(done.measured).toEqual({ diameterNm: 4.3, particlesPerMl: null });
    const old = new Date(Date.now() - 3 * 3600_000).toISOString();
    const recorded = await ok<SavedBatch>('batches.record', {
      id: saved.id,
      stocks: [{ reagentKey: 'nabh4', preparedAt: old }],
      notes: 'ice bath',
    });
    expect(recorded.notes).toBe('ice bath');
    expect(recorded.stockAges[0]?.stale).toBe(true);
    expect(recorded.stockAges[0]?.ageHours).toBeGreaterThan(2.9);
  });

  it('lineage: a growth batch takes the seed batch’s measured size and concentration; the seed batch cannot be removed', async () => {
    const seeds = await ok<SavedBatch>('batches.save', { name: 'Au seeds 15 nm', design: auSeeds });
    await ok('batches.setStatus', { id: seeds.id, status: 'made' });
    await ok('batches.setStatus', {
      id: seeds.id,
      status: 'characterized',
      measured: { diameterNm: 13.2, particlesPerMl: 2.1e12 },
    });
    const growth = await ok<SavedBatch>('batches.save', {
      name: 'Au@Pt 1 ML',
      design: {
        elementA: 'Au',
        elementB: 'Pt',
        target: 'Au@Pt',
        route: 'seed-mediated',
        size: { kind: 'core-shell', shellMonolayers: 1 },
        batchVolumeMl: 20,
        seeds: { metal: 'Au', volumeMl: 10, seedBatchId: seeds.id },
        precursors: [{ element: 'Pt', reagentKey: 'k2ptcl4', stockMm: 5 }],
        reducer: { reagentKey: 'ascorbic-acid', excess: 2, stockMm: 100 },
      },
    });
    expect(growth.seedBatchId).toBe(seeds.id);
    expect(growth.design.coreDiameterNm).toBe(13.2);
    expect(growth.design.particles).toBeCloseTo(2.1e13, -6);
    expect(growth.input.seeds?.diameterNm).toBe(13.2);
    expect(await dispatch(context, 'batches.remove', { id: seeds.id, confirm: true })).toMatchObject({
      ok: false,
      error: { code: 'conflict' },
    });
    expect(
      await dispatch(context, 'batches.save', {
        name: 'x',
        design: { ...growth.input, seeds: { metal: 'Pt', volumeMl: 1, seedBatchId: seeds.id } },
      }),
    ).toMatchObject({
      ok: false,
      error: { field: 'seeds.metal' },
    });
  });
});

describe('reagent lists', () => {
  it('totals batches against the inventory and exports CSV', async () => {
    const a = await ok<SavedBatch>('batches.save', { name: 'A', design: ptNi });
    const b = await ok<SavedBatch>('batches.save', {
      name: 'B',
      design: { ...ptNi, amount: { kind: 'total-metal', totalMetalMmol: 0.3 } },
    });
    await ok('inventory.upsert', {
      reagentKey: 'h2ptcl6-6h2o',
      amount: 100,
      unit: 'mg',
      location: 'desiccator',
      lot: 'MK1',
    });
    expect(await dispatch(context, 'inventory.upsert', { reagentKey: 'nope', amount: 1, unit: 'g' })).toMatchObject({
      ok: false,
      error: { field: 'reagentKey' },
    });
    expect(await dispatch(context, 'inventory.upsert', { reagentKey: 'nabh4', amount: -1, unit: 'g' })).toMatchObject({
      ok: false,
      error: { field: 'amount' },
    });
    const list = await ok<ReagentList>('reagents.list', { batchIds: [a.id, b.id] });
    const pt = list.lines.find((l) => l.key === 'h2ptcl6-6h2o');
    // 0.075 + 0.225 mmol = 0.3 mmol × 517.91 g/mol = 155.4 mg against 100 mg on hand
    expect(pt?.totalMassMg).toBeCloseTo(155.37, 1);
    expect(pt?.status).toBe('short');
    expect(pt?.shortfallMg).toBeCloseTo(55.37, 1);
    const csv = await ok<{ csv: string; filename: string }>('reagents.csv', { batchIds: [a.id, b.id] });
    expect(csv.filename).toBe(`pairwright-reagents-batches-${a.id}-${b.id}.csv`);
    expect(csv.csv.split('\n')[0]).toContain('reagent,formula,roles');
    expect(await dispatch(context, 'reagents.list', { batchIds: [a.id, 999] })).toMatchObject({
      ok: false,
      error: { code: 'not_found', field: 'batchIds.1' },
    });
    expect(await dispatch(context, 'reagents.list', { batchIds: [] })).toMatchObject({
      ok: false,
      error: { field: 'batchIds' },
    });
  });
});
