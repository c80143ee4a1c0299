/**
 * The as-made expectation of a batch (route, temperature, time): kinetic when interdiffusion cannot reach
 * across the particle, equilibrium after annealing. Reduction potentials: CRC Electrochemical Series
 * (recipes/potentials.ts); diffusion: Mehrer 2007 (prediction/diffusion.ts), from memory.
 */
import { describe, expect, it } from 'vitest';
import { DEFAULT_SYNTHESIS_TIME_H, asMadeForBatch } from '../../../shared-model/prediction/as-made';

describe('asMadeForBatch', () => {
  it('Au–Pd co-reduced at 25 °C: Au (AuCl₄⁻, +1.00 V) reduces before Pd (PdCl₄²⁻, +0.59 V) → Au@Pd as made', () => {
    const e = asMadeForBatch({ elementA: 'Au', elementB: 'Pd', xB: 0.5, diameterNm: 5, route: 'co-reduction' });
    expect(e.temperatureK).toBeCloseTo(298.15, 10);
    expect(e.timeH).toBe(DEFAULT_SYNTHESIS_TIME_H['co-reduction']);
    expect(e.basis).toBe('kinetic');
    expect(e.label).toBe('Au@Pd');
    expect(e.afterAnnealing).toBe('Pd@Au');
    expect(e.text).toMatch(/equilibrium not reachable: the as-made structure follows the reduction order/);
  });

  it('seeded growth: Ag on Au seeds stays Au@Ag; Au(III) on Pd seeds replaces Pd (hollow)', () => {
    const agOnAu = asMadeForBatch({
      elementA: 'Au',
      elementB: 'Ag',
      xB: 0.3,
      diameterNm: 20,
      route: 'seed-mediated',
      seedElement: 'Au',
    });
    expect(agOnAu.label).toBe('Au@Ag');
    const auOnPd = asMadeForBatch({
      elementA: 'Pd',
      elementB: 'Au',
      xB: 0.3,
      diameterNm: 20,
      route: 'seed-mediated',
      seedElement: 'Pd',
    });
    expect(auOnPd.label).toBe('hollow');
    expect(auOnPd.kinetic?.text).toMatch(/galvanic replacement/);
  });

  it('hot enough for long enough, the as-made structure is the equilibrium one', () => {
    const e = asMadeForBatch({
      elementA: 'Au',
      elementB: 'Pd',
      xB: 0.5,
      diameterNm: 3,
      route: 'organic',
      temperatureK: 900,
      timeH: 10,
    });
    expect(e.basis).toBe('equilibrium');
    expect(e.label).toBe(e.afterAnnealing);
    expect(e.environment).toBe('ligand');
  });

  it('names the oxide shell of a Cu batch in water', () => {
    const e = asMadeForBatch({ elementA: 'Cu', elementB: 'Pt', xB: 0.5, diameterNm: 5, route: 'co-reduction' });
    expect(e.oxidation).toMatch(/Cu/);
  });
});
