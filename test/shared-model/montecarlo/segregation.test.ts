import { describe, expect, it } from 'vitest';
import { diluteSegregationEnergy111 } from '../../../shared-model/montecarlo/segregation';

/**
 * Directions vs Ruban, Skriver & Nørskov, Phys. Rev. B 59, 15990 (1999) (signs from memory): Ag segregates
 * to the surface of Pd (negative), Pd in Ag stays inside (positive); Au to the surface of Pt (negative).
 */
describe('dilute (111) segregation energy on the relaxed Gupta energy', () => {
  it.each([
    ['Pd', 'Ag', -1],
    ['Ag', 'Pd', 1],
    ['Pt', 'Au', -1],
  ] as const)('%s host, %s solute: sign %i', (host, solute, sign) => {
    const result = diluteSegregationEnergy111(host, solute, 4);
    expect(Math.sign(result.segregationEnergyEv)).toBe(sign);
    expect(Math.abs(result.segregationEnergyEv)).toBeGreaterThan(0.02);
    expect(Math.abs(result.segregationEnergyEv)).toBeLessThan(1.5);
  });

  it('refuses a solute equal to the host, naming the field', () => {
    expect(() => diluteSegregationEnergy111('Pd', 'Pd')).toThrow(/solute must differ/);
  });
});
