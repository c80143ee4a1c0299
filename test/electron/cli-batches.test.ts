/** `pairwright recipe`, `reagents`, `catalog`, `batches` run as child processes against a real store folder. */
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { CatalogReagent } from '../../shared-model/api/batches';
import { REAGENT_SEED } from '../../shared-model/recipes/reagent-seed';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { PT_NI_RECIPE as PT_NI, recipeArgs } from '../support/cli-batches';
import { tempDataDir } from '../support/host-fixture';
import { TIMEOUTS } from '../support/timeouts';

interface RecipeJson {
  batchId?: number;
  atomsPerParticle: number;
  coreAtoms: number;
  shellAtoms: number;
  design: { xB: number };
  particles: number;
  reagents: {
    name: string;
    formula: string;
    role: string;
    amountMmol: number | null;
    massMg: number | null;
    volumeMl: number | null;
  }[];
  checks: { kind: string; severity: string; message: string }[];
  hazards: { code: string; text: string }[];
}

describe('pairwright recipe / reagents / catalog', () => {
  it('designs a batch with the contract JSON fields', () => {
    const data = tempDataDir();
    const recipe = runPairwrightJson<RecipeJson>([...PT_NI, '--data', data]);
    // 2396.8 atoms per 4 nm Pt75Ni25 particle (hand-worked in test/shared-model/recipes/particle.test.ts)
    expect(recipe.atomsPerParticle).toBeCloseTo(2396.8, 0);
    expect(recipe.coreAtoms).toBe(recipe.atomsPerParticle);
    expect(recipe.shellAtoms).toBe(0);
    // the composition as the fraction x_B, as predictions and outcomes state it (25 at.% Ni typed)
    expect(recipe.design.xB).toBe(0.25);
    expect(recipe.design).not.toHaveProperty('xBPct');
    expect(recipe.particles / 2.51256e16).toBeCloseTo(1, 4);
    const nabh4 = recipe.reagents.find((r) => r.formula === 'NaBH4');
    expect(nabh4).toMatchObject({ role: 'reducer', name: 'Sodium borohydride' });
    expect(nabh4?.amountMmol).toBeCloseTo(0.21875, 8);
    expect(nabh4?.volumeMl).toBeCloseTo(2.1875, 8);
    expect(recipe.checks.some((c) => c.kind === 'reduction-order')).toBe(true);
    expect(recipe.hazards).toContainEqual({
      code: 'H260',
      text: 'In contact with water releases flammable gases which may ignite spontaneously',
    });
  });

  it('prints a readable recipe with the hazard block and the standing caution', () => {
    const run = runPairwright([...PT_NI, '--data', tempDataDir()]);
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/Sodium borohydride\s+reducer/);
    // the text recipe still speaks at.%
    expect(run.stdout).toMatch(/25 at\.% Ni/);
    expect(run.stdout).toContain('H334 May cause allergy or asthma symptoms or breathing difficulties if inhaled');
    expect(run.stdout).toContain("never replace, the supplier's safety data sheet");
  });

  it(
    'saves batches and totals their reagents as CSV',
    () => {
      const data = tempDataDir();
      const first = runPairwrightJson<RecipeJson>([...PT_NI, '--save', 'PtNi A', '--data', data]);
      const second = runPairwrightJson<RecipeJson>([...PT_NI, '--save', 'PtNi B', '--data', data]);
      expect(first.batchId).toBeGreaterThan(0);
      const csv = runPairwright([
        'reagents',
        '--batches',
        `${first.batchId},${second.batchId}`,
        '--csv',
        '--data',
        data,
      ]);
      expect(csv.status).toBe(0);
      const rows = Papa.parse<Record<string, string>>(csv.stdout, { header: true, skipEmptyLines: true }).data;
      const pt = rows.find((r) => r.formula === 'H2PtCl6·6H2O');
      // two batches × 0.075 mmol × 517.91 g/mol = 77.69 mg
      expect(Number(pt?.total_mass_mg)).toBeCloseTo(77.69, 1);
      expect(pt?.status).toBe('not in inventory');
      const list = runPairwright(['batches', 'list', '--data', data]);
      expect(list.stdout).toMatch(/PtNi B\s+Pt-Ni\s+alloy\s+co-reduction/);
      // 1 g of H2PtCl6·6H2O in stock; the batch takes 0.075 mmol × 517.91 g/mol = 38.84 mg = 0.03884 g
      const added = runPairwright([
        'inventory',
        'add',
        'h2ptcl6-6h2o',
        '1',
        'g',
        '--location',
        'desiccator 2',
        '--data',
        data,
      ]);
      expect(added.status, added.stderr).toBe(0);
      // 5 mg of NiCl2·6H2O; the batch takes 0.025 mmol × 237.69 g/mol = 5.94 mg: the stock goes below zero
      runPairwright(['inventory', 'add', 'nicl2-6h2o', '5', 'mg', '--data', data]);
      const moved = runPairwright(['batches', 'status', String(first.batchId), 'made', '--data', data]);
      expect(moved.status, moved.stderr).toBe(0);
      expect(moved.stdout).toContain('is made');
      expect(moved.stdout).toMatch(/taken from the inventory:\n.*-0\.03884 g \(now 0\.9612 g\)/);
      expect(moved.stdout).toMatch(/warning: Nickel.*now shows -0\.94/);
      expect(moved.stdout).toMatch(/not matched: Sodium borohydride: not in the inventory/);
      const stock = runPairwrightJson<{ reagentKey: string; amount: number }[]>(['inventory', '--data', data]);
      expect(stock.find((i) => i.reagentKey === 'h2ptcl6-6h2o')?.amount).toBeCloseTo(1 - 0.075 * 0.5179097, 6);
      const undone = runPairwright(['batches', 'status', String(first.batchId), 'planned', '--data', data]);
      expect(undone.stdout).toMatch(/given back to the inventory:\n.*\+0\.03884 g \(now 1 g\)/);
      const after = runPairwrightJson<{ reagentKey: string; amount: number }[]>(['inventory', '--data', data]);
      expect(after.map((i) => i.amount)).toEqual([1, 5].map((v) => expect.closeTo(v, 9)));
    },
    TIMEOUTS.cliSequenceMs,
  );

  it('lists the catalog as JSON', () => {
    const catalog = runPairwrightJson<CatalogReagent[]>(['catalog', '--data', tempDataDir()]);
    expect(catalog).toHaveLength(REAGENT_SEED.length);
    expect(catalog.find((r) => r.key === 'agno3')).toMatchObject({
      formula: 'AgNO3',
      hCodes: ['H272', 'H290', 'H314', 'H410'],
    });
  });

  it(
    'exits 2 with one line naming the field for bad input',
    () => {
      const data = tempDataDir();
      // Pt-Ni with stocks and the excess left to their defaults, one field wrong (or missing) each.
      const PT_NI_BASE = { pair: 'Pt-Ni', diameterNm: '4', totalMetalMmol: '0.1', volumeMl: '50' };
      const cases: [string[], RegExp][] = [
        [
          recipeArgs({
            ...PT_NI_BASE,
            compositionPct: '120',
            precursors: ['Pt=h2ptcl6-6h2o', 'Ni=nicl2-6h2o'],
            reducer: 'nabh4',
          }),
          /0 and 100 at\.%.*\(input field size\.xB\)/,
        ],
        [
          recipeArgs({ ...PT_NI_BASE, compositionPct: '25', precursors: ['Pt=h2ptcl6-6h2o', 'Ni=nicl2-6h2o'] }),
          /reducer/,
        ],
        [
          recipeArgs({
            ...PT_NI_BASE,
            compositionPct: '25',
            precursors: ['Pt=h2ptcl6-6h2o', 'Ni=agno3'],
            reducer: 'nabh4',
          }),
          /Ag precursor, not a Ni precursor/,
        ],
        [['recipe', 'Pt-Ni', '--diameter', 'four'], /--diameter must be a number/],
        [
          ['recipe', 'Pt-Ni', '--diameter', '4', '--composition', '25', '--volume', '5', '--precursor', 'Pt h2ptcl6'],
          /--precursor/,
        ],
        [['reagents', '--batches', '3,x'], /--batches/],
        [['reagents', '--batches', '42'], /no batch with id 42/],
      ];
      for (const [args, message] of cases) {
        const run = runPairwright([...args, '--data', data]);
        expect(run.status, args.join(' ')).toBe(2);
        expect(run.stderr.trim().split('\n')).toHaveLength(1);
        expect(run.stderr).toMatch(message);
      }
    },
    TIMEOUTS.cliSequenceMs,
  );
});
