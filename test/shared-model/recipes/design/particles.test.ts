/** Design stage 1a: target, precursor choice, particle geometry and count, metal per element. */
import { describe, expect, it } from 'vitest';
import { planParticles } from '../../../../shared-model/recipes/design/particles';
import type { BatchDesignRequest } from '../../../../shared-model/recipes/design-input';
import { catalogIndex, kittelLattice, parseRequest } from '../../../support/design-stages';
import { domainErrorOf } from '../../../support/domain-error';
import { auOnAg, ptNi } from '../../../support/sample-batches';

const plan = (request: BatchDesignRequest) => planParticles(parseRequest(request), catalogIndex, kittelLattice);

describe('particles from a size target and a total metal', () => {
  it('4 nm Pt75Ni25, 0.1 mmol metal: atoms, count and metal per element (worked in particle.test.ts)', () => {
    const p = plan(ptNi);
    // π/6 · 4³ nm³ at the Vegard lattice constant → 2396.8 atoms per particle
    expect(p.geometry.atomsPerParticle).toBeCloseTo(2396.8, 0);
    // 0.1 mmol = 6.02214e19 atoms ÷ 2396.81 = 2.51256e16 particles
    expect(p.particles / 2.51256e16).toBeCloseTo(1, 4);
    expect(p.metalMmol.get('Pt')).toBeCloseTo(0.075, 12);
    expect(p.metalMmol.get('Ni')).toBeCloseTo(0.025, 12);
    expect(p.latticeNm).toEqual({ Pt: 0.39242, Ni: 0.3524 });
    expect(p.seeds).toBeNull();
    expect([...p.precursors.keys()]).toEqual(['Pt', 'Ni']);
    expect(p.checks).toEqual([]);
  });

  it('a particle concentration fixes the metal instead: 1e13/mL × 50 mL × atoms ÷ N_A', () => {
    const p = plan({ ...ptNi, amount: { kind: 'particle-concentration', particlesPerMl: 1e13 } });
    expect(p.particles).toBeCloseTo(5e14, -2);
    const total = (p.metalMmol.get('Pt') ?? 0) + (p.metalMmol.get('Ni') ?? 0);
    expect(total).toBeCloseTo(((5e14 * p.geometry.atomsPerParticle) / 6.02214076e23) * 1000, 15);
  });

  it('a thin shell (half a monolayer) earns a warning; a shell thicker than the core an info', () => {
    const thinShell = { kind: 'core-shell', coreDiameterNm: 3, shellMonolayers: 0.5 } as const;
    const thin = plan({ ...ptNi, target: 'Pt@Ni', size: thinShell });
    expect(thin.coreElement).toBe('Pt');
    expect(thin.shellElement).toBe('Ni');
    expect(thin.checks.map((c) => [c.kind, c.severity])).toEqual([['shell', 'warning']]);
    const thickShell = { kind: 'core-shell', coreDiameterNm: 1, shellThicknessNm: 3 } as const;
    const thick = plan({ ...ptNi, target: 'Pt@Ni', size: thickShell });
    expect(thick.checks.map((c) => [c.kind, c.severity])).toEqual([['shell', 'info']]);
  });

  it('a non-fcc metal is counted with its fcc-equivalent lattice constant, and says so', () => {
    const p = plan({
      ...ptNi,
      elementA: 'Fe',
      route: 'organic',
      precursors: [ptNi.precursors[0] as never, { element: 'Fe', reagentKey: 'fe-co5' }],
      size: { kind: 'alloy', diameterNm: 4, xB: 0.5 },
      elementB: 'Pt',
    });
    expect(p.checks.map((c) => c.kind)).toEqual(['geometry']);
    expect(p.checks[0]?.message).toContain('Fe is not fcc');
  });
});

describe('particles from seeds', () => {
  it('Au on 20 nm Ag seeds: the seeds fix the count and the Ag, the shell atoms the Au', () => {
    const p = plan(auOnAg);
    expect(p.coreElement).toBe('Ag');
    expect(p.shellElement).toBe('Au');
    // 0.5 mM Ag × 5 mL = 2.5e-3 mmol Ag, whatever the atoms per seed
    expect(p.metalMmol.get('Ag')).toBeCloseTo(0.0025, 12);
    expect(p.seeds?.atomsPerSeed).toBe(p.geometry.coreAtoms);
    expect(p.particles).toBeCloseTo((p.seeds?.particlesPerMl ?? 0) * 5, 0);
    const auMmol = ((p.geometry.shellAtoms * p.particles) / 6.02214076e23) * 1000;
    expect(p.metalMmol.get('Au')).toBeCloseTo(auMmol, 15);
    expect(p.checks).toEqual([]);
  });

  it('growth on seeds toward a target that is not seed@shell earns a target warning', () => {
    const p = plan({ ...auOnAg, target: 'alloy' });
    expect(p.checks.map((c) => [c.kind, c.severity])).toEqual([['target', 'warning']]);
    expect(p.checks[0]?.message).toContain('Ag@Au');
  });
});

describe('bad input names the field', () => {
  it.each<[string, BatchDesignRequest, string, RegExp]>([
    [
      'two precursors for one metal',
      { ...ptNi, precursors: [ptNi.precursors[0] as never, { element: 'Pt', reagentKey: 'k2ptcl4' }] },
      'precursors.1.element',
      /two precursors for Pt/,
    ],
    [
      'a precursor for the seed metal',
      { ...auOnAg, precursors: [...auOnAg.precursors, { element: 'Ag', reagentKey: 'agno3' }] },
      'precursors.1.element',
      /the seeds provide the Ag/,
    ],
    [
      'a second metal in a single-metal batch',
      { ...ptNi, size: { kind: 'single-metal', element: 'Pt', diameterNm: 3 } },
      'precursors.1.element',
      /makes Pt only/,
    ],
    [
      'a seed volume above the batch volume',
      { ...auOnAg, seeds: { metal: 'Ag', diameterNm: 20, metalMm: 0.5, volumeMl: 50 } },
      'seeds.volumeMl',
      /exceeds the batch volume/,
    ],
    [
      'a core diameter that is not the seed',
      { ...auOnAg, size: { kind: 'core-shell', coreDiameterNm: 10, shellMonolayers: 1 } },
      'size.coreDiameterNm',
      /the core is the seed/,
    ],
    ['no amount', { ...ptNi, amount: undefined }, 'amount', /total metal/],
    ['a hollow target', { ...ptNi, target: 'hollow' }, 'target', /not a target for Pt-Ni/],
  ])('%s', (_label, request, field, message) => {
    const error = domainErrorOf(() => plan(request));
    expect(error.field).toBe(field);
    expect(error.message).toMatch(message);
  });
});
