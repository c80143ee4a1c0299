import { describe, expect, it } from 'vitest';
import { procedureFor } from '../../../shared-model/benchsheet/route-procedure';
import type { DesignedReagent } from '../../../shared-model/recipes/design/types';

const reagent = (key: string, name: string, role: DesignedReagent['role']): DesignedReagent => ({
  key,
  name,
  formula: '',
  role,
  amountMmol: 1,
  massMg: 1,
  volumeMl: 1,
  stockMm: 1,
  molarMassGPerMol: 1,
  note: '',
});

const coReduction = [
  reagent('haucl4', 'HAuCl4·3H2O', 'metal-precursor'),
  reagent('citrate', 'Trisodium citrate', 'capping-agent'),
  reagent('nabh4', 'Sodium borohydride', 'reducer'),
];

describe('order of addition per route (common practice)', () => {
  it('co-reduction: salts and capping first, then ice-cold fresh borohydride quickly under stirring', () => {
    const steps = procedureFor('co-reduction', coReduction, 25).map((s) => s.text);
    const salts = steps.findIndex((s) => s.includes('HAuCl4·3H2O') && s.includes('Trisodium citrate'));
    const reducer = steps.findIndex((s) => s.includes('ice-cold Sodium borohydride quickly'));
    expect(salts).toBeGreaterThanOrEqual(0);
    expect(reducer).toBeGreaterThan(salts);
    expect(steps.some((s) => s.includes('fresh'))).toBe(true);
    expect(steps.some((s) => /hydrogen/.test(s))).toBe(true);
  });

  it('seed-mediated: seeds and capping, then the shell precursor, then the mild reducer slowly', () => {
    const reagents = [
      reagent('seeds', 'Au seeds', 'seeds'),
      reagent('ctab', 'CTAB', 'capping-agent'),
      reagent('k2ptcl4', 'K2PtCl4', 'metal-precursor'),
      reagent('aa', 'Ascorbic acid', 'reducer'),
    ];
    const steps = procedureFor('seed-mediated', reagents, 30).map((s) => s.text);
    const seeds = steps.findIndex((s) => s.includes('seed dispersion') && s.includes('CTAB'));
    const shell = steps.findIndex((s) => s.includes('K2PtCl4'));
    const reducer = steps.findIndex((s) => s.includes('Ascorbic acid') && s.includes('slowly'));
    expect([seeds, shell, reducer].every((i) => i >= 0)).toBe(true);
    expect(seeds).toBeLessThan(shell);
    expect(shell).toBeLessThan(reducer);
    expect(steps.join(' ')).toContain('30 °C');
  });

  it('polyol and organic routes heat to the batch temperature; organic runs under inert gas', () => {
    expect(
      procedureFor('polyol', coReduction, 160)
        .map((s) => s.text)
        .join(' '),
    ).toContain('160 °C');
    const organic = procedureFor('organic', coReduction, 220)
      .map((s) => s.text)
      .join(' ');
    expect(organic).toContain('220 °C');
    expect(organic).toContain('inert gas');
  });

  it('names generic reagents when the batch has none of a role', () => {
    const steps = procedureFor('co-reduction', [], 25)
      .map((s) => s.text)
      .join(' ');
    expect(steps).toContain('the metal precursor(s)');
    expect(steps).toContain('the capping agent');
  });
});
