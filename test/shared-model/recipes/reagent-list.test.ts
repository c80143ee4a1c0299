import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { designBatch } from '../../../shared-model/recipes/design';
import { batchDesignInputSchema, type BatchDesignRequest } from '../../../shared-model/recipes/design-input';
import { prepareReagent } from '../../../shared-model/recipes/reagent';
import { buildReagentList, inventoryMassMg, reagentListCsv } from '../../../shared-model/recipes/reagent-list';
import { REAGENT_SEED } from '../../../shared-model/recipes/reagent-seed';
import { ptNi } from '../../support/sample-batches';

const catalog = REAGENT_SEED.map((r) => prepareReagent(r));
const LATTICE: Record<string, number> = { Au: 0.40782, Pt: 0.39242, Ni: 0.3524 };
const design = (request: BatchDesignRequest) =>
  designBatch(batchDesignInputSchema.parse(request), { catalog, latticeNm: (s) => LATTICE[s] });

const auPt: BatchDesignRequest = {
  elementA: 'Au',
  elementB: 'Pt',
  target: 'alloy',
  route: 'polyol',
  size: { kind: 'alloy', diameterNm: 5, xB: 0.5 },
  amount: { kind: 'total-metal', totalMetalMmol: 0.2 },
  batchVolumeMl: 20,
  precursors: [
    { element: 'Au', reagentKey: 'haucl4-3h2o' },
    { element: 'Pt', reagentKey: 'h2ptcl6-6h2o' },
  ],
  solvent: { reagentKey: 'ethylene-glycol', volumeMl: 20 },
  capping: { reagentKey: 'pvp', molPerMolMetal: 10 },
};

describe('reagent list across batches', () => {
  const b3 = design(ptNi);
  const b4 = design(auPt);
  const list = buildReagentList(
    [
      { batchId: 3, batchName: 'PtNi', reagents: b3.reagents },
      { batchId: 4, batchName: 'AuPt', reagents: b4.reagents },
    ],
    [
      { reagentKey: 'h2ptcl6-6h2o', amount: 0.05, unit: 'g', location: 'desiccator 2', lot: 'MKCD1234' },
      { reagentKey: 'nabh4', amount: 5, unit: 'g', location: 'flammables cabinet', lot: 'BCBX9' },
      { reagentKey: 'ethylene-glycol', amount: 10, unit: 'mL', location: 'solvent shelf', lot: '' },
      { reagentKey: 'nicl2-6h2o', amount: 2, unit: 'mL', location: '', lot: '' },
    ],
    catalog,
  );
  const get = (key: string) => {
    const found = list.lines.find((l) => l.key === key);
    if (!found) throw new Error(`no line ${key}`);
    return found;
  };

  it('sums a reagent used by two batches', () => {
    // H2PtCl6·6H2O: 0.075 mmol (batch 3) + 0.1 mmol (batch 4) = 0.175 mmol × 517.91 = 90.63 mg
    const line = get('h2ptcl6-6h2o');
    expect(line.totalAmountMmol).toBeCloseTo(0.175, 10);
    expect(line.totalMassMg).toBeCloseTo(0.175 * 517.9097, 2);
    expect(line.batchIds).toEqual([3, 4]);
  });
  it('flags shortfalls against the inventory (50 mg on hand, 90.6 mg needed)', () => {
    const line = get('h2ptcl6-6h2o');
    expect(line.status).toBe('short');
    expect(line.onHandMg).toBe(50);
    expect(line.shortfallMg).toBeCloseTo(0.175 * 517.9097 - 50, 2);
    expect(line.locations).toEqual(['desiccator 2']);
    expect(line.lots).toEqual(['MKCD1234']);
  });
  it('compares liquids through their density (10 mL EG = 11.13 g < 22.26 g needed)', () => {
    const line = get('ethylene-glycol');
    expect(line.onHandMg).toBeCloseTo(11130, 6);
    expect(line.totalVolumeMl).toBeCloseTo(20, 10);
    expect(line.status).toBe('short');
  });
  it('enough, missing from the inventory, or not comparable', () => {
    expect(get('nabh4').status).toBe('enough');
    expect(get('haucl4-3h2o').status).toBe('not in inventory');
    // a solid recorded in mL cannot be compared without a density
    expect(get('nicl2-6h2o').status).toBe('cannot compare');
  });
  it('leaves make-up water out', () => {
    expect(list.lines.some((l) => l.key === 'water')).toBe(false);
  });
  it('summarises hazards across the list', () => {
    expect(list.hazardSummary.signalWord).toBe('Danger');
    const codes = list.hazardSummary.hazards.map((h) => h.code);
    expect(codes).toEqual(expect.arrayContaining(['H260', 'H334', 'H350', 'H373']));
    expect(list.hazardSummary.warnings.map((w) => w.id)).toContain('chloroplatinate-sensitiser');
  });
  it('exports CSV that reads back', () => {
    const csv = reagentListCsv(list);
    const parsed = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([
      'reagent',
      'formula',
      'roles',
      'total_mmol',
      'total_mass_mg',
      'total_volume_ml',
      'total_stock_ml',
      'batches',
      'on_hand',
      'location',
      'lot',
      'shortfall_mg',
      'status',
      'h_codes',
      'signal_word',
    ]);
    const row = parsed.data.find((d) => d.formula === 'H2PtCl6·6H2O');
    expect(Number(row?.total_mass_mg)).toBeCloseTo(90.63, 1);
    expect(row?.status).toBe('short');
    expect(row?.batches).toBe('3; 4');
    expect(parsed.data).toHaveLength(list.lines.length);
  });
});

describe('inventory units', () => {
  it('converts to mg', () => {
    expect(inventoryMassMg({ amount: 2, unit: 'g' }, null)).toBe(2000);
    expect(inventoryMassMg({ amount: 0.001, unit: 'kg' }, null)).toBe(1000);
    expect(inventoryMassMg({ amount: 1, unit: 'L' }, 0.813)).toBeCloseTo(813000, 6);
    expect(inventoryMassMg({ amount: 1, unit: 'mL' }, null)).toBeNull();
  });
});

describe('hazard cautions over a reagent list: incompatibilities only within a batch', () => {
  // NaBH4 with an acid releases hydrogen violently ("danger", incompatibilities.ts, common practice);
  // HAuCl4·3H2O is tagged as an acid. In one batch together: the danger line; in two batches: none.
  const borohydrideOnly: BatchDesignRequest = {
    elementA: 'Ni',
    elementB: 'Pt',
    target: 'alloy',
    route: 'co-reduction',
    size: { kind: 'single-metal', element: 'Ni', diameterNm: 5 },
    amount: { kind: 'total-metal', totalMetalMmol: 0.05 },
    batchVolumeMl: 50,
    precursors: [{ element: 'Ni', reagentKey: 'nicl2-6h2o', stockMm: 20 }],
    reducer: { reagentKey: 'nabh4', excess: 5, stockMm: 100 },
  };
  const goldOnly: BatchDesignRequest = {
    elementA: 'Au',
    elementB: 'Pt',
    target: 'alloy',
    route: 'co-reduction',
    size: { kind: 'single-metal', element: 'Au', diameterNm: 15 },
    amount: { kind: 'total-metal', totalMetalMmol: 0.025 },
    batchVolumeMl: 100,
    precursors: [{ element: 'Au', reagentKey: 'haucl4-3h2o', stockMm: 25 }],
    reducer: { reagentKey: 'trisodium-citrate-2h2o', excess: 3, stockMm: 34 },
  };
  const goldWithBorohydride: BatchDesignRequest = {
    ...goldOnly,
    reducer: { reagentKey: 'nabh4', excess: 5, stockMm: 100 },
  };
  const lines = (request: BatchDesignRequest) => design(request).reagents;
  const hydrolysis = (list: ReturnType<typeof buildReagentList>) =>
    list.hazardSummary.warnings.filter((w) => w.id === 'borohydride-hydrolysis');

  it('borohydride in one batch and a gold salt in another give no acid "danger" line', () => {
    const list = buildReagentList(
      [
        { batchId: 1, batchName: 'Ni seeds', reagents: lines(borohydrideOnly), context: { aqueous: true } },
        { batchId: 2, batchName: 'Au citrate', reagents: lines(goldOnly), context: { aqueous: true } },
      ],
      [],
      catalog,
    );
    const found = hydrolysis(list);
    expect(found.map((w) => w.severity)).toEqual(['caution']); // borohydride with water, in batch 1 only
    expect(found[0]?.message).toMatch(/^Batch #1 Ni seeds: /);
    expect(found[0]?.message).not.toMatch(/acid/);
  });

  it('the same two reagents in one batch do give it, naming that batch', () => {
    const list = buildReagentList(
      [
        { batchId: 2, batchName: 'Au citrate', reagents: lines(goldOnly), context: { aqueous: true } },
        { batchId: 5, batchName: 'Au borohydride', reagents: lines(goldWithBorohydride), context: { aqueous: true } },
      ],
      [],
      catalog,
    );
    const found = hydrolysis(list);
    expect(found.map((w) => w.severity)).toEqual(['danger']);
    expect(found[0]?.message).toMatch(/^Batch #5 Au borohydride: .*acid/);
  });

  it('totals the stock-solution volumes to pipette per reagent', () => {
    const one = design(ptNi);
    const list = buildReagentList(
      [
        { batchId: 3, batchName: 'A', reagents: one.reagents },
        { batchId: 4, batchName: 'B', reagents: one.reagents },
      ],
      [],
      catalog,
    );
    // H2PtCl6: 0.075 mmol from a 20 mM stock = 3.75 mL per batch, 7.5 mL for two (hand-worked)
    const platinum = list.lines.find((l) => l.key === 'h2ptcl6-6h2o');
    expect(platinum?.totalStockVolumeMl).toBeCloseTo(7.5, 9);
    const borohydride = list.lines.find((l) => l.key === 'nabh4');
    const perBatch = one.reagents.find((r) => r.key === 'nabh4')?.volumeMl ?? Number.NaN;
    expect(borohydride?.totalStockVolumeMl).toBeCloseTo(2 * perBatch, 9);
  });
});
