/** Design stage 1: precursor formula units, electron balance, reducer and capping amounts. */
import { describe, expect, it } from 'vitest';
import { designAmounts } from '../../../../shared-model/recipes/design/amounts';
import type { BatchDesignRequest } from '../../../../shared-model/recipes/design-input';
import { catalogIndex, kittelLattice, parseRequest } from '../../../support/design-stages';
import { domainErrorOf } from '../../../support/domain-error';
import { auOnAg, ptNi, ptNiPolyol } from '../../../support/sample-batches';

const amounts = (request: BatchDesignRequest) => designAmounts(parseRequest(request), catalogIndex, kittelLattice);

describe('co-reduction of Pt75Ni25 (hand-worked in design.test.ts)', () => {
  const a = amounts(ptNi);
  it('metals and final concentrations in 50 mL', () => {
    expect(a.metals.map((m) => [m.element, m.precursorKey, m.oxidationState])).toEqual([
      ['Pt', 'h2ptcl6-6h2o', 4],
      ['Ni', 'nicl2-6h2o', 2],
    ]);
    // 0.075 mmol / 50 mL = 1.5 mM; 0.025 mmol / 50 mL = 0.5 mM
    expect(a.metals[0]?.finalMm).toBeCloseTo(1.5, 12);
    expect(a.metals[1]?.finalMm).toBeCloseTo(0.5, 12);
    // one metal atom per formula unit: formula units = metal
    expect(a.precursorAmounts.map((p) => p.amountMmol)).toEqual(a.precursorAmounts.map((p) => p.metalMmol));
  });
  it('electrons and borohydride: 0.075 × 4 + 0.025 × 2 = 0.35 mmol e⁻; ÷ 8 e⁻ × 5 excess', () => {
    expect(a.electronsMmol).toBeCloseTo(0.35, 12);
    expect(a.reducer?.balance?.electronsPerUnit).toBe(8);
    expect(a.reducer?.balance?.stoichiometricMmol).toBeCloseTo(0.04375, 12);
    expect(a.reducer?.amountMmol).toBeCloseTo(0.21875, 12);
    expect(a.temperatureC).toBe(25);
    expect(a.aqueous).toBe(true);
    expect(a.capping).toBeNull();
  });
  it('a reducer below the electron balance earns a warning', () => {
    const low = amounts({ ...ptNi, reducer: { reagentKey: 'nabh4', excess: 0.5 } });
    expect(low.checks.map((c) => [c.kind, c.severity])).toEqual([['reducer', 'warning']]);
    expect(low.checks[0]?.message).toContain('at most 50.0 %');
  });
  it('capping by final concentration: 1 mM × 50 mL = 0.05 mmol', () => {
    const capped = amounts({ ...ptNi, capping: { reagentKey: 'ctab', concentrationMm: 1 } });
    expect(capped.capping?.amountMmol).toBeCloseTo(0.05, 12);
    expect(capped.capping?.basis).toEqual({ concentrationMm: 1 });
  });
});

describe('other routes', () => {
  it('polyol: the glycol is solvent and reducer, so no reducer line amount; 160 °C by default', () => {
    const a = amounts(ptNiPolyol);
    // 0.1 mmol Pt(II) × 2 + 0.1 mmol Ni(II) × 2 = 0.4 mmol e⁻; glycol gives 2 e⁻ → 0.2 mmol stoichiometric
    expect(a.electronsMmol).toBeCloseTo(0.4, 12);
    expect(a.reducer?.reagent.key).toBe('ethylene-glycol');
    expect(a.reducer?.balance?.stoichiometricMmol).toBeCloseTo(0.2, 12);
    expect(a.reducer?.amountMmol).toBeNull();
    expect(a.solvent?.key).toBe('ethylene-glycol');
    expect(a.aqueous).toBe(false);
    expect(a.temperatureC).toBe(160);
    // PVP: 10 mol monomer per mol of metal reduced (0.2 mmol)
    expect(a.capping?.amountMmol).toBeCloseTo(2, 12);
  });

  it('seeded growth: the capping ratio counts only the metal reduced, not the seeds', () => {
    const a = amounts(auOnAg);
    const au = a.metals.find((m) => m.element === 'Au');
    expect(a.metals.find((m) => m.element === 'Ag')?.precursorKey).toBeNull();
    expect(a.capping?.amountMmol).toBeCloseTo(10 * (au?.amountMmol ?? Number.NaN), 15);
    // Au(III): 3 e⁻ per Au atom; ascorbate gives 2 e⁻
    expect(a.electronsMmol).toBeCloseTo(3 * (au?.amountMmol ?? Number.NaN), 15);
    expect(a.reducer?.balance?.stoichiometricMmol).toBeCloseTo(a.electronsMmol / 2, 15);
  });
});

describe('bad input names the field', () => {
  it.each<[string, BatchDesignRequest, string, RegExp]>([
    ['no reducer though electrons are needed', { ...ptNi, reducer: undefined }, 'reducer', /0\.350 mmol of electrons/],
    [
      'a reducer that is not one',
      { ...ptNi, reducer: { reagentKey: 'ctab', excess: 1 } },
      'reducer.reagentKey',
      /not a reducer/,
    ],
    ['an organic route without its solvent', { ...ptNi, route: 'organic' }, 'solvent', /needs its solvent/],
    ['a solvent that is not one', { ...ptNi, solvent: { reagentKey: 'nabh4' } }, 'solvent.reagentKey', /not a solvent/],
    [
      'a capping agent that is not one',
      { ...ptNi, capping: { reagentKey: 'water', molPerMolMetal: 1 } },
      'capping.reagentKey',
      /not a capping agent/,
    ],
  ])('%s', (_label, request, field, message) => {
    const error = domainErrorOf(() => amounts(request));
    expect(error.field).toBe(field);
    expect(error.message).toMatch(message);
  });
});

describe('reducer excess when none is given (common practice per reducer, stated)', () => {
  const { excess: _given, ...nabh4 } = ptNi.reducer ?? { reagentKey: 'nabh4' };
  it('borohydride in water: 5× the electron balance, said so in a check and in the balance', () => {
    const a = amounts({ ...ptNi, reducer: nabh4 });
    // 0.04375 mmol stoichiometric (above) × 5 = 0.21875 mmol, the same as the example's typed 5×
    expect(a.reducer?.amountMmol).toBeCloseTo(0.21875, 12);
    expect(a.reducer?.balance).toMatchObject({ excess: 5, excessAssumed: true });
    expect(a.reducer?.balance?.excessBasis).toMatch(/hydrolyses in water.*several-fold.*common practice/);
    const said = a.checks.filter((c) => c.kind === 'reducer');
    expect(said).toHaveLength(1);
    expect(said[0]?.severity).toBe('info');
    expect(said[0]?.message).toMatch(
      /^Sodium borohydride: 5\.00× the electron balance assumed, as no excess was given/,
    );
  });
  it('a typed excess is used as typed and earns no assumption note', () => {
    const a = amounts(ptNi);
    expect(a.reducer?.balance).toMatchObject({ excess: 5, excessAssumed: false, excessBasis: 'given' });
    expect(a.checks.filter((c) => c.kind === 'reducer')).toEqual([]);
  });
  it.each<[string, number]>([
    // common practice (reducers.ts states each reason); citrate after Turkevich/Frens ≈ 3.5 citrate per Au(III)
    ['ascorbic-acid', 1.5],
    ['trisodium-citrate-2h2o', 2.5],
    ['hydrazine-hydrate', 3],
  ])('%s: %s× assumed, never a silent 1×', (reagentKey, excess) => {
    const a = amounts({ ...ptNi, reducer: { reagentKey } });
    expect(a.reducer?.balance?.excess).toBe(excess);
    expect(a.reducer?.balance?.excessAssumed).toBe(true);
    expect(a.checks.some((c) => c.kind === 'reducer' && c.message.includes('common practice'))).toBe(true);
  });
  it('polyol: the glycol is the solvent, in large excess; no amount is dosed, so no assumption note', () => {
    const a = amounts(ptNiPolyol);
    expect(a.reducer?.amountMmol).toBeNull();
    expect(a.checks.filter((c) => c.kind === 'reducer')).toEqual([]);
  });
});
