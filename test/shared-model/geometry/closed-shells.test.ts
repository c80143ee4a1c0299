/**
 * One rule for "the closed-shell particle nearest to a diameter", used by the prediction and the Monte
 * Carlo: the same "3 nm cuboctahedron" has the same atom count in both (it was 1095 vs 923 before).
 */
import { describe, expect, it } from 'vitest';
import { shellsForDiameter } from '../../../shared-model/clusters/shapes';
import {
  closedShellAtoms,
  nearestClosedShell,
  volumeEquivalentDiameterNm,
} from '../../../shared-model/geometry/closed-shells';
import { sphereDiameterForAtoms } from '../../../shared-model/geometry/fcc';
import { planSimulation } from '../../../shared-model/montecarlo/simulate';
import { predictPair } from '../../../shared-model/prediction/predict';

// Pt lattice constant 0.39242 nm (Kittel, Introduction to Solid State Physics, 8th ed., table 4 of ch. 1)
const A_PT_NM = 0.39242;

describe('nearestClosedShell', () => {
  it('takes the closed shell whose volume-equivalent diameter is nearest (Mackay counts 561, 923, 1415)', () => {
    // 3 nm of Pt at bulk density is 936 atoms ((π/6)d³·4/a³): the 6-shell cuboctahedron (923) is nearest
    const shell = nearestClosedShell('cuboctahedron', 3, A_PT_NM);
    expect(shell).toMatchObject({ shells: 6, atoms: 923, surfaceAtoms: 362 });
    expect(shell.equivalentDiameterNm).toBeCloseTo(volumeEquivalentDiameterNm(923, A_PT_NM), 12);
    // half-way in diameter between two shells goes to the nearer one by diameter, a tie to the smaller
    const d5 = volumeEquivalentDiameterNm(561, A_PT_NM);
    const d6 = volumeEquivalentDiameterNm(923, A_PT_NM);
    expect(nearestClosedShell('icosahedron', d5 + 0.4 * (d6 - d5), A_PT_NM).atoms).toBe(561);
    expect(nearestClosedShell('icosahedron', d5 + 0.6 * (d6 - d5), A_PT_NM).atoms).toBe(923);
    expect(nearestClosedShell('icosahedron', (d5 + d6) / 2, A_PT_NM).atoms).toBe(561);
  });

  it('is exact at every magic size, for the truncated octahedron too (38, 201, 586, 1289)', () => {
    for (let n = 1; n <= 12; n++) {
      for (const shape of ['cuboctahedron', 'truncated-octahedron'] as const) {
        const atoms = closedShellAtoms(shape, n);
        expect(nearestClosedShell(shape, sphereDiameterForAtoms(atoms, A_PT_NM), A_PT_NM).shells).toBe(n);
      }
    }
    expect([1, 2, 3, 4].map((n) => closedShellAtoms('truncated-octahedron', n))).toEqual([38, 201, 586, 1289]);
  });

  it('agrees with a plain scan over every shell (the rule written out here independently)', () => {
    for (const d of [0.3, 0.9, 1.7, 2.5, 3, 4.4, 6, 9.9, 17, 30]) {
      for (const shape of ['cuboctahedron', 'icosahedron', 'truncated-octahedron'] as const) {
        let best = 1;
        for (let n = 1; n < 400; n++) {
          const gap = Math.abs(volumeEquivalentDiameterNm(closedShellAtoms(shape, n), A_PT_NM) - d);
          const bestGap = Math.abs(volumeEquivalentDiameterNm(closedShellAtoms(shape, best), A_PT_NM) - d);
          if (gap < bestGap) best = n;
        }
        expect(nearestClosedShell(shape, d, A_PT_NM).shells, `${shape} ${d} nm`).toBe(best);
      }
    }
  });

  it('refuses a diameter or lattice that is not a positive number, naming it', () => {
    expect(() => nearestClosedShell('cuboctahedron', 0, A_PT_NM)).toThrow(/diameter must be a positive/);
    expect(() => nearestClosedShell('cuboctahedron', 3, Number.NaN)).toThrow(/lattice constant/);
  });
});

describe('prediction and simulation count the same atoms', () => {
  it('a 3 nm Pt-Ni 50:50 cuboctahedron is 923 atoms in both (was 1095 in the prediction)', () => {
    const conditions = { xB: 0.5, diameterNm: 3, temperatureK: 600, shape: 'cuboctahedron' as const };
    const predicted = predictPair('Pt', 'Ni', conditions);
    const plan = planSimulation({
      elementA: 'Pt',
      elementB: 'Ni',
      xB: 0.5,
      shape: 'cuboctahedron',
      diameterNm: 3,
      temperatureK: 600,
      sweeps: 10,
      seed: 1,
    });
    expect(predicted.atoms).toBe(923);
    expect(plan.atoms).toBe(923);
  });

  it('agree over pairs, sizes and shapes wherever their lattice constants pick the same shell', () => {
    let compared = 0;
    for (const [a, b] of [
      ['Au', 'Pd'],
      ['Ag', 'Pd'],
      ['Pt', 'Ni'],
      ['Au', 'Ag'],
    ] as const) {
      for (const diameterNm of [2, 3, 4, 5]) {
        for (const shape of ['cuboctahedron', 'icosahedron', 'truncated-octahedron'] as const) {
          const predicted = predictPair(a, b, { xB: 0.5, diameterNm, temperatureK: 600, shape });
          const plan = planSimulation({
            elementA: a,
            elementB: b,
            xB: 0.5,
            shape,
            diameterNm,
            temperatureK: 600,
            sweeps: 10,
            seed: 1,
          });
          const simShells = shellsForDiameter(shape, diameterNm, plan.nearestNeighbourAngstrom);
          const predictedShell = nearestClosedShell(shape, diameterNm, predicted.latticeNm);
          // the two models' lattice constants differ slightly (element table vs Gupta r0); same shell, same count
          if (simShells === predictedShell.shells) {
            expect(predicted.atoms, `${a}-${b} ${diameterNm} nm ${shape}`).toBe(plan.atoms);
            compared++;
          }
        }
      }
    }
    expect(compared).toBeGreaterThan(40);
  });
});
