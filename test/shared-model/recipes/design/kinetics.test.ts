/** Design stage 3: reduction order, galvanic replacement, kinetics against thermodynamics. */
import { describe, expect, it } from 'vitest';
import { designAmounts } from '../../../../shared-model/recipes/design/amounts';
import { kineticChecks, kineticsVersusThermodynamics } from '../../../../shared-model/recipes/design/kinetics';
import { reagentLines } from '../../../../shared-model/recipes/design/reagent-lines';
import type { BatchDesignRequest } from '../../../../shared-model/recipes/design-input';
import { catalogIndex, kittelLattice, parseRequest } from '../../../support/design-stages';
import { auOnAg, auSeeds, ptNi } from '../../../support/sample-batches';

const stagesOf = (request: BatchDesignRequest) => {
  const input = parseRequest(request);
  const amounts = designAmounts(input, catalogIndex, kittelLattice);
  const { lines } = reagentLines(input, amounts, catalogIndex);
  return { input, amounts, kinetics: kineticChecks(input, amounts, lines) };
};

describe('reduction order in co-reduction', () => {
  it('Pt75Ni25: [PtCl6]²⁻ is nobler than Ni²⁺ (−0.257 V, CRC): Pt first, the gap flagged for an alloy', () => {
    const { kinetics } = stagesOf(ptNi);
    expect(kinetics.reductionOrder).toMatchObject({ first: 'Pt', second: 'Ni', secondEV: -0.257 });
    const order = kinetics.reductionOrder;
    expect(order?.gapV).toBeCloseTo((order?.firstEV ?? Number.NaN) + 0.257, 12);
    expect(kinetics.kineticCore).toBe('Pt');
    expect(kinetics.checks.map((c) => [c.kind, c.severity])).toEqual([
      ['reduction-order', 'info'],
      ['reduction-order', 'warning'],
    ]);
  });

  it('a core@shell target against the order (Ni@Pt by co-reduction) points to seeded growth', () => {
    const size = { kind: 'core-shell', coreDiameterNm: 4, shellMonolayers: 2 } as const;
    const { kinetics } = stagesOf({ ...ptNi, target: 'Ni@Pt', size });
    const warning = kinetics.checks.find((c) => c.severity === 'warning');
    expect(warning?.message).toContain('seed-mediated');
  });

  it('a zero-valent carbonyl: the order follows decomposition, not potentials', () => {
    const { kinetics } = stagesOf({
      ...ptNi,
      elementA: 'Fe',
      elementB: 'Pt',
      route: 'organic',
      size: { kind: 'alloy', diameterNm: 4, xB: 0.5 },
      precursors: [
        { element: 'Pt', reagentKey: 'pt-acac2' },
        { element: 'Fe', reagentKey: 'fe-co5' },
      ],
      reducer: { reagentKey: 'hexadecanediol', excess: 3 },
      solvent: { reagentKey: 'octadecene', volumeMl: 20 },
    });
    expect(kinetics.reductionOrder).toBeNull();
    expect(kinetics.kineticCore).toBeNull();
    expect(kinetics.checks[0]?.message).toContain('zero-valent');
  });

  it('a single-metal batch: an info line, nothing to order', () => {
    const { kinetics } = stagesOf(auSeeds);
    expect(kinetics.checks.map((c) => [c.kind, c.severity])).toEqual([['target', 'info']]);
    expect(kinetics.kineticCore).toBeNull();
  });
});

describe('galvanic replacement in seeded growth', () => {
  it('Au on Ag with chloride: [AuCl4]⁻ (+1.002 V) vs AgCl/Ag (+0.222 V), three Ag dissolve per Au', () => {
    const { amounts, kinetics } = stagesOf(auOnAg);
    const galvanic = kinetics.galvanic;
    // CRC Handbook, Electrochemical Series: 1.002 − 0.22233 = 0.77967 V
    expect(galvanic?.drivingForceV).toBeCloseTo(0.77967, 5);
    expect(galvanic?.replaces).toBe(true);
    expect(galvanic?.seedAtomsPerShellAtom).toBe(3);
    expect(galvanic?.seedAtomsConsumedPerParticle).toBeCloseTo(3 * amounts.geometry.shellAtoms, 6);
    expect(kinetics.kineticCore).toBe('Ag');
    expect(kinetics.checks).toHaveLength(1);
    expect(kinetics.checks[0]?.severity).toBe('warning');
    expect(kinetics.checks[0]?.message).toContain('chloride present');
  });

  it('Pt on Au: no replacement', () => {
    const { kinetics } = stagesOf({
      ...auOnAg,
      elementB: 'Pt',
      target: 'Au@Pt',
      seeds: { metal: 'Au', diameterNm: 15, particlesPerMl: 1e12, volumeMl: 5 },
      precursors: [{ element: 'Pt', reagentKey: 'h2ptcl6-6h2o', stockMm: 10 }],
    });
    expect(kinetics.galvanic?.replaces).toBe(false);
    expect(kinetics.checks[0]?.message).toMatch(/^No galvanic replacement expected/);
  });
});

describe('kinetics against thermodynamics', () => {
  const seeded = stagesOf(auOnAg);
  const versus = (element: string | null | undefined, note: string | null = null) =>
    kineticsVersusThermodynamics(seeded.input, seeded.amounts, 'Ag', { element, note });

  it.each<[string | null | undefined, string, RegExp]>([
    ['Ag', 'warning', /disagree.*invert/],
    ['Au', 'info', /agree: Ag in the core, Au at the surface/],
    [null, 'info', /no strong surface enrichment/],
    [undefined, 'info', /^No thermodynamic prediction/],
  ])('surface element %s → %s', (element, severity, message) => {
    const checks = versus(element);
    expect(checks).toHaveLength(1);
    expect(checks[0]?.severity).toBe(severity);
    expect(checks[0]?.message).toMatch(message);
  });

  it('the reason a prediction is missing follows the missing-prediction line', () => {
    const checks = versus(undefined, 'thermodynamic prediction unavailable: no Miedema data');
    expect(checks.map((c) => c.message)).toEqual([
      'No thermodynamic prediction was available to compare with the kinetic expectation.',
      'thermodynamic prediction unavailable: no Miedema data',
    ]);
  });

  it('an alloy with no strong enrichment, or one metal only, gives nothing to compare', () => {
    const alloy = stagesOf(ptNi);
    expect(kineticsVersusThermodynamics(alloy.input, alloy.amounts, 'Pt', { element: null, note: null })).toEqual([]);
    const single = stagesOf(auSeeds);
    const none = { element: undefined, note: null };
    expect(kineticsVersusThermodynamics(single.input, single.amounts, null, none)).toEqual([]);
  });
});
