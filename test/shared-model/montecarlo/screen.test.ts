import { describe, expect, it } from 'vitest';
import { planScreen } from '../../../shared-model/montecarlo/screen';
import { DEFAULT_STOPPING } from '../../../shared-model/montecarlo/simulate';

// Lattice constants of Kittel, Introduction to Solid State Physics, 8th ed., Ch. 1 Table 4 (the Gupta r0 = a/√2):
// Ag 4.09 Å and Pd 3.89 Å differ by 5.0 % (at most the 6 % threshold: rigid), Ag and Au (4.08 Å) by 0.2 %;
// Au and Ni (3.52 Å) by 14.8 %, Ag and Ni by 15.0 % (relaxed).
describe('planScreen', () => {
  it('plans every run to stop at the answer, in the mode of the size-mismatch rule', () => {
    const plan = planScreen({
      elements: ['Ag', 'Pd', 'Au', 'Ni'],
      xB: [0.25, 0.5],
      diameterNm: [2],
      temperatureK: 600,
      shape: 'cuboctahedron',
      sweeps: 3000,
      seed: 1,
    });
    expect(plan.runs).toHaveLength(6 * 2);
    for (const run of plan.runs) {
      expect(run.spec.stopping).toEqual(DEFAULT_STOPPING);
      expect(run.spec.sweeps).toBe(3000);
    }
    const mode = (a: string, b: string) => plan.runs.find((r) => r.elementA === a && r.elementB === b)?.spec.relaxation;
    expect(mode('Ag', 'Pd')).toBe('rigid');
    expect(mode('Ag', 'Au')).toBe('rigid');
    expect(mode('Au', 'Ni')).toBe('relaxed');
    expect(mode('Ag', 'Ni')).toBe('relaxed');
  });
});
