import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import { designBatch, type BatchDesign, type DesignContext } from '../../../shared-model/recipes/design';
import { batchDesignInputSchema, type BatchDesignRequest } from '../../../shared-model/recipes/design-input';
import { seedsFromBatch, seedBatchMetal } from '../../../shared-model/recipes/lineage';
import { prepareReagent } from '../../../shared-model/recipes/reagent';
import { REAGENT_SEED } from '../../../shared-model/recipes/reagent-seed';
import { auOnAg, auSeeds, ptNi, ptNiPolyol } from '../../support/sample-batches';

const catalog = REAGENT_SEED.map((r) => prepareReagent(r));
// Kittel, Introduction to Solid State Physics, 8th ed. (from memory)
const LATTICE: Record<string, number> = { Au: 0.40782, Pt: 0.39242, Ag: 0.40853, Ni: 0.3524, Pd: 0.38907, Fe: 0.2866 };
const context = (extra: Partial<DesignContext> = {}): DesignContext => ({
  catalog,
  latticeNm: (s) => LATTICE[s],
  ...extra,
});

function design(request: BatchDesignRequest, extra: Partial<DesignContext> = {}): BatchDesign {
  return designBatch(batchDesignInputSchema.parse(request), context(extra));
}

function fieldOf(request: BatchDesignRequest, extra: Partial<DesignContext> = {}): string | undefined {
  const parsed = batchDesignInputSchema.safeParse(request);
  if (!parsed.success) return parsed.error.issues[0]?.path.map(String).join('.');
  try {
    designBatch(parsed.data, context(extra));
  } catch (error) {
    if (error instanceof DomainError) return error.field;
    throw error;
  }
  return undefined;
}

const line = (d: BatchDesign, key: string) => {
  const found = d.reagents.find((r) => r.key === key);
  if (!found) throw new Error(`no line ${key}`);
  return found;
};

describe('co-reduction of a Pt75Ni25 alloy, worked by hand', () => {
  const d = design(ptNi);
  it('metals, masses and stock volumes', () => {
    // 0.1 mmol metal × 0.75 = 0.075 mmol Pt; × 0.25 = 0.025 mmol Ni
    expect(d.metals.find((m) => m.element === 'Pt')?.amountMmol).toBeCloseTo(0.075, 10);
    // H2PtCl6·6H2O: 0.075 mmol × 517.91 g/mol = 38.84 mg; 0.075 mmol / 20 mM = 3.75 mL
    expect(line(d, 'h2ptcl6-6h2o').massMg).toBeCloseTo(38.843, 2);
    expect(line(d, 'h2ptcl6-6h2o').volumeMl).toBeCloseTo(3.75, 10);
    // NiCl2·6H2O: 0.025 mmol × 237.69 g/mol = 5.942 mg; 1.25 mL of 20 mM
    expect(line(d, 'nicl2-6h2o').massMg).toBeCloseTo(5.942, 2);
    expect(line(d, 'nicl2-6h2o').volumeMl).toBeCloseTo(1.25, 10);
  });
  it('electron balance and reducer', () => {
    // e⁻ = 0.075 × 4 (Pt IV) + 0.025 × 2 (Ni II) = 0.35 mmol; NaBH4 = 0.35 / 8 × 5 = 0.21875 mmol
    expect(d.electronsMmol).toBeCloseTo(0.35, 10);
    expect(d.reducer?.stoichiometricMmol).toBeCloseTo(0.04375, 10);
    expect(line(d, 'nabh4').amountMmol).toBeCloseTo(0.21875, 10);
    // 0.21875 mmol × 37.833 g/mol = 8.276 mg; 2.1875 mL of 100 mM
    expect(line(d, 'nabh4').massMg).toBeCloseTo(8.276, 2);
    expect(line(d, 'nabh4').volumeMl).toBeCloseTo(2.1875, 10);
    // water: 50 − 3.75 − 1.25 − 2.1875 = 42.8125 mL
    expect(d.makeUpVolumeMl).toBeCloseTo(42.8125, 10);
    expect(line(d, 'water').volumeMl).toBeCloseTo(42.8125, 10);
  });
  it('particles', () => {
    // 2396.8 atoms per 4 nm particle (see particle.test.ts); 0.1 mmol → 2.5126e16 particles in 50 mL
    expect(d.atomsPerParticle).toBeCloseTo(2396.8, 0);
    expect(d.particles / 2.51256e16).toBeCloseTo(1, 4);
    expect(d.particlesPerMl / (2.51256e16 / 50)).toBeCloseTo(1, 4);
    expect(d.coreAtoms).toBe(d.atomsPerParticle);
    expect(d.shellAtoms).toBe(0);
  });
  it('kinetic checks: Pt reduces first, the large gap is flagged for an alloy target', () => {
    expect(d.reductionOrder?.first).toBe('Pt');
    expect(
      d.checks.some((c) => c.kind === 'reduction-order' && c.severity === 'warning' && c.message.includes('alloy')),
    ).toBe(true);
  });
  it('hazards: union of both precursors and the borohydride, hydrogen estimate', () => {
    const codes = d.hazards.map((h) => h.code);
    for (const code of ['H260', 'H301', 'H314', 'H334', 'H350', 'H360', 'H410']) expect(codes).toContain(code);
    expect(d.hazardSummary.signalWord).toBe('Danger');
    // 4 × 0.21875 mmol H2 = 0.875 mmol × 24.4654 L/mol = 21.41 mL
    const h2 = d.hazardSummary.warnings.find((w) => w.id === 'borohydride-hydrolysis');
    expect(h2?.hydrogenMl).toBeCloseTo(21.407, 2);
    expect(d.hazardSummary.warnings.some((w) => w.id === 'chloroplatinate-sensitiser')).toBe(true);
    expect(d.hazardSummary.caution).toContain('never replace');
  });
  it('the CLI figures add up: core + shell atoms, particles, reagent columns', () => {
    expect(d.atomsPerParticle).toBe(d.coreAtoms + d.shellAtoms);
    expect(d.particles).toBeGreaterThan(0);
    expect(d.reagents.length).toBeGreaterThan(0);
    for (const r of d.reagents)
      expect(Object.keys(r)).toEqual(
        expect.arrayContaining(['name', 'formula', 'role', 'amountMmol', 'massMg', 'volumeMl']),
      );
  });
});

describe('seed-mediated growth', () => {
  // Au shell on 20 nm Ag seeds: the galvanic-replacement case (test/support/sample-batches.ts)
  const agAu = auOnAg;

  it('Au shell on Ag seeds: galvanic replacement quantified, three Ag per Au', () => {
    const d = design(agAu);
    expect(d.galvanic?.replaces).toBe(true);
    expect(d.galvanic?.seedAtomsPerShellAtom).toBe(3);
    expect(d.galvanic?.seedAtomsConsumedPerParticle).toBeCloseTo(3 * d.shellAtoms, 6);
    expect(d.galvanic?.seedFractionConsumed).toBeCloseTo((3 * d.shellAtoms) / d.coreAtoms, 10);
    expect(d.checks.find((c) => c.kind === 'galvanic-replacement')?.severity).toBe('warning');
    // seeds: 0.5 mM Ag × 5 mL = 2.5e-3 mmol Ag; the Au precursor is shell atoms × seeds
    expect(d.metals.find((m) => m.element === 'Ag')?.amountMmol).toBeCloseTo(0.0025, 12);
    const auMmol = ((d.shellAtoms * d.particles) / 6.02214076e23) * 1000;
    expect(line(d, 'haucl4-3h2o').amountMmol).toBeCloseTo(auMmol, 12);
    // PVP: 10 mol monomer per mol of Au reduced
    expect(line(d, 'pvp').amountMmol).toBeCloseTo(10 * auMmol, 12);
    expect(d.reagents[0]?.role).toBe('seeds');
  });

  it('Pt shell on Au seeds: no replacement', () => {
    const d = design({
      ...agAu,
      elementA: 'Au',
      elementB: 'Pt',
      target: 'Au@Pt',
      seeds: { metal: 'Au', diameterNm: 15, particlesPerMl: 1e12, volumeMl: 5 },
      precursors: [{ element: 'Pt', reagentKey: 'h2ptcl6-6h2o', stockMm: 10 }],
    });
    expect(d.galvanic?.replaces).toBe(false);
    expect(d.particles).toBeCloseTo(5e12, 0);
  });

  it('kinetics vs thermodynamics: seed metal predicted at the surface → warning', () => {
    const d = design(agAu, { thermodynamicSurfaceElement: 'Ag' });
    const check = d.checks.find((c) => c.kind === 'kinetics-vs-thermodynamics');
    expect(check?.severity).toBe('warning');
    expect(check?.message).toContain('invert');
    const agree = design(agAu, { thermodynamicSurfaceElement: 'Au' });
    expect(agree.checks.find((c) => c.kind === 'kinetics-vs-thermodynamics')?.severity).toBe('info');
  });

  it('lineage: the seed batch’s measured size and concentration feed the shell', () => {
    const seedBatch = design(auSeeds);
    expect(seedBatch.architecture).toBe('single-metal');
    expect(seedBatchMetal({ id: 3, name: 'Au seeds', design: seedBatch })).toBe('Au');
    const planned = seedsFromBatch({ id: 3, name: 'Au seeds', design: seedBatch }, 'Au', 10);
    expect(planned.diameterFrom).toBe('planned');
    expect(planned.seeds.particlesPerMl).toBeCloseTo(seedBatch.particlesPerMl, 6);
    const measured = seedsFromBatch(
      { id: 3, name: 'Au seeds', design: seedBatch, measured: { diameterNm: 13.2, particlesPerMl: 2.1e12 } },
      'Au',
      10,
    );
    expect(measured.seeds.diameterNm).toBe(13.2);
    expect(measured.concentrationFrom).toBe('measured');
    const growth = design({
      elementA: 'Au',
      elementB: 'Pt',
      target: 'Au@Pt',
      route: 'seed-mediated',
      size: { kind: 'core-shell', shellMonolayers: 1 },
      batchVolumeMl: 20,
      seeds: measured.seeds,
      precursors: [{ element: 'Pt', reagentKey: 'k2ptcl4', stockMm: 5 }],
      reducer: { reagentKey: 'ascorbic-acid', excess: 2, stockMm: 100 },
    });
    expect(growth.coreDiameterNm).toBe(13.2);
    expect(growth.particles).toBeCloseTo(2.1e13, 0);
    expect(growth.reagents[0]?.name).toContain('batch #3');
  });
});

describe('other routes', () => {
  it('polyol: ethylene glycol is solvent and reducer, its electron excess is reported', () => {
    const d = design(ptNiPolyol);
    expect(d.reagents.filter((r) => r.key === 'ethylene-glycol')).toHaveLength(1);
    // 20 mL × 1.113 g/mL = 22.26 g / 62.068 g/mol = 358.6 mmol EG; × 2 e⁻ = 717.3 mmol e⁻
    // need: 0.1 × 2 (Pt II) + 0.1 × 2 (Ni II) = 0.4 mmol e⁻ → 1793-fold
    expect(line(d, 'ethylene-glycol').amountMmol).toBeCloseTo(358.64, 1);
    expect(d.checks.find((c) => c.kind === 'reducer')?.message).toContain('1793 times');
    expect(d.temperatureC).toBe(160);
    expect(d.hazardSummary.warnings.some((w) => w.id === 'heated-solvent')).toBe(true);
  });

  it('organic route with a carbonyl: zero-valent Fe needs no electrons, CO and hot-amine cautions', () => {
    const d = design({
      elementA: 'Fe',
      elementB: 'Pt',
      target: 'intermetallic',
      route: 'organic',
      size: { kind: 'alloy', diameterNm: 4, xB: 0.5 },
      amount: { kind: 'total-metal', totalMetalMmol: 1 },
      batchVolumeMl: 25,
      precursors: [
        { element: 'Pt', reagentKey: 'pt-acac2' },
        { element: 'Fe', reagentKey: 'fe-co5' },
      ],
      reducer: { reagentKey: 'hexadecanediol', excess: 3 },
      solvent: { reagentKey: 'octadecene', volumeMl: 20 },
      capping: { reagentKey: 'oleylamine', molPerMolMetal: 1 },
      temperatureC: 300,
    });
    // only Pt(II) needs electrons: 0.5 mmol × 2 = 1 mmol e⁻ → diol 1/2 × 3 = 1.5 mmol
    expect(d.electronsMmol).toBeCloseTo(1, 10);
    expect(line(d, 'hexadecanediol').amountMmol).toBeCloseTo(1.5, 10);
    // Fe(CO)5: 0.5 mmol × 195.90 = 97.95 mg → / 1.453 g/mL = 0.0674 mL
    expect(line(d, 'fe-co5').volumeMl).toBeCloseTo(0.06741, 4);
    const ids = d.hazardSummary.warnings.map((w) => w.id);
    expect(ids).toEqual(expect.arrayContaining(['metal-carbonyl', 'heated-amine', 'heated-solvent']));
    expect(d.checks.find((c) => c.kind === 'reduction-order')?.message).toContain('zero-valent');
  });

  it('a core@shell target against the reduction order earns a warning', () => {
    const d = design({ ...ptNi, target: 'Ni@Pt', size: { kind: 'core-shell', coreDiameterNm: 4, shellMonolayers: 2 } });
    expect(
      d.checks.some(
        (c) => c.kind === 'reduction-order' && c.severity === 'warning' && c.message.includes('seed-mediated'),
      ),
    ).toBe(true);
    expect(d.coreElement).toBe('Ni');
    expect(d.shellMonolayers).toBeCloseTo(2, 10);
  });

  it('a particle-concentration target fixes the metal', () => {
    const d = design({ ...ptNi, amount: { kind: 'particle-concentration', particlesPerMl: 1e13 } });
    // 1e13/mL × 50 mL × 2396.8 atoms / N_A = 1.990e-6 mol = 1.990e-3 mmol
    const total = d.metals.reduce((s, m) => s + m.amountMmol, 0);
    expect(total).toBeCloseTo(((1e13 * 50 * d.atomsPerParticle) / 6.02214076e23) * 1000, 12);
    expect(d.particlesPerMl).toBeCloseTo(1e13, -3);
  });

  it('stock ages: a two-hour-old borohydride stock is stale, ascorbate is not', () => {
    const d = design(
      {
        ...ptNi,
        stocks: [
          { reagentKey: 'nabh4', preparedAt: '2025-03-01T08:00:00Z' },
          { reagentKey: 'ascorbic-acid', preparedAt: '2025-03-01T08:00:00Z' },
        ],
      },
      { now: '2025-03-01T10:00:00Z' },
    );
    const stale = d.checks.filter((c) => c.kind === 'stock-age');
    expect(stale).toHaveLength(1);
    expect(stale[0]?.message).toContain('Sodium borohydride');
  });
});

describe('the thermodynamic prediction, asked once about the designed particle', () => {
  it('the caller is asked once with the composition as a fraction, the size and the route temperature', () => {
    const asked: unknown[] = [];
    const d = design(ptNi, {
      thermodynamicSurface: (particle) => {
        asked.push(particle);
        return { element: 'Ni', note: null };
      },
    });
    const particle = {
      elementA: 'Pt',
      elementB: 'Ni',
      architecture: 'alloy',
      xB: 0.25,
      diameterNm: 4,
      temperatureC: 25,
      route: 'co-reduction',
      seedElement: null,
    };
    expect(asked).toEqual([particle]);
    expect(d.thermodynamicSurfaceElement).toBe('Ni');
    expect(d.asMade).toBeNull();
    expect(d.checks.find((c) => c.kind === 'kinetics-vs-thermodynamics')?.message).toContain('agree: Pt in the core');
  });

  it('no answer: the reason follows the missing-prediction line', () => {
    const d = design(ptNi, { thermodynamicSurface: () => ({ element: undefined, note: 'unavailable: no data' }) });
    const versus = d.checks.filter((c) => c.kind === 'kinetics-vs-thermodynamics').map((c) => c.message);
    expect(versus).toEqual([
      'No thermodynamic prediction was available to compare with the kinetic expectation.',
      'unavailable: no data',
    ]);
  });
});

describe('bad input names the field', () => {
  it.each<[string, BatchDesignRequest, string]>([
    ['composition x_B = 0', { ...ptNi, size: { kind: 'alloy', diameterNm: 4, xB: 0 } }, 'size.xB'],
    ['composition x_B = 1', { ...ptNi, size: { kind: 'alloy', diameterNm: 4, xB: 1 } }, 'size.xB'],
    ['composition x_B = 1.3', { ...ptNi, size: { kind: 'alloy', diameterNm: 4, xB: 1.3 } }, 'size.xB'],
    [
      'negative metal amount',
      { ...ptNi, amount: { kind: 'total-metal', totalMetalMmol: -1 } },
      'amount.totalMetalMmol',
    ],
    ['zero batch volume', { ...ptNi, batchVolumeMl: 0 }, 'batchVolumeMl'],
    ['zero diameter', { ...ptNi, size: { kind: 'alloy', diameterNm: 0, xB: 0.25 } }, 'size.diameterNm'],
    ['reducer excess ≤ 0', { ...ptNi, reducer: { reagentKey: 'nabh4', excess: 0 } }, 'reducer.excess'],
    [
      'precursor of the wrong metal',
      { ...ptNi, precursors: [ptNi.precursors[0] as never, { element: 'Ni', reagentKey: 'cocl2-6h2o' }] },
      'precursors.1.reagentKey',
    ],
    [
      'precursor for a metal outside the pair',
      { ...ptNi, precursors: [ptNi.precursors[0] as never, { element: 'Au', reagentKey: 'haucl4-3h2o' }] },
      'precursors.1.element',
    ],
    ['missing precursor', { ...ptNi, precursors: [ptNi.precursors[0] as never] }, 'precursors'],
    ['missing reducer', { ...ptNi, reducer: undefined }, 'reducer'],
    ['a reducer that is not one', { ...ptNi, reducer: { reagentKey: 'ctab', excess: 1 } }, 'reducer.reagentKey'],
    ['unknown reagent', { ...ptNi, reducer: { reagentKey: 'unobtainium', excess: 1 } }, 'reducer.reagentKey'],
    [
      'shell thicker than the radius',
      { ...ptNi, target: 'Pt@Ni', size: { kind: 'core-shell-overall', diameterNm: 4, shellThicknessNm: 2.5 } },
      'size.shellThicknessNm',
    ],
    [
      'shell below a tenth of a monolayer',
      { ...ptNi, target: 'Pt@Ni', size: { kind: 'core-shell', coreDiameterNm: 4, shellMonolayers: 0.05 } },
      'size.shellMonolayers',
    ],
    [
      'both shell forms',
      {
        ...ptNi,
        target: 'Pt@Ni',
        size: { kind: 'core-shell', coreDiameterNm: 4, shellMonolayers: 1, shellThicknessNm: 0.3 },
      },
      'size.shellThicknessNm',
    ],
    ['alloy size for a core@shell target', { ...ptNi, target: 'Pt@Ni' }, 'size.kind'],
    ['unknown target', { ...ptNi, target: 'Au@Pt' }, 'target'],
    ['same element twice', { ...ptNi, elementB: 'Pt' }, 'elementB'],
    [
      'seed route without seeds',
      { ...ptNi, route: 'seed-mediated', target: 'Pt@Ni', size: { kind: 'core-shell', shellMonolayers: 1 } },
      'seeds',
    ],
    [
      'seeds without concentration',
      {
        ...ptNi,
        route: 'seed-mediated',
        target: 'Pt@Ni',
        size: { kind: 'core-shell', shellMonolayers: 1 },
        seeds: { metal: 'Pt', diameterNm: 3, volumeMl: 1 },
      },
      'seeds.particlesPerMl',
    ],
    [
      'polyol without solvent volume',
      { ...ptNi, route: 'polyol', solvent: { reagentKey: 'ethylene-glycol' } },
      'solvent.volumeMl',
    ],
    [
      'stock date that is not a date',
      { ...ptNi, stocks: [{ reagentKey: 'nabh4', preparedAt: 'yesterday' }] },
      'stocks.0.preparedAt',
    ],
  ])('%s', (_label, request, field) => {
    expect(fieldOf(request)).toBe(field);
  });
});
