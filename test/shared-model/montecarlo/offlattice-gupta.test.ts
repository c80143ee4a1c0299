import { describe, expect, it } from 'vitest';
import {
  buildNeighbourList,
  FIRST_SHELL_FACTOR,
  FIVE_SHELL_CUTOFF_FACTOR,
} from '../../../shared-model/clusters/neighbours';
import { buildCluster } from '../../../shared-model/clusters/shapes';
import { layersFromSurface } from '../../../shared-model/montecarlo/analysis';
import { bulkEnergyPerAtomEv, totalEnergy } from '../../../shared-model/montecarlo/gupta-energy';
import { GUPTA_ELEMENTS, guptaElement } from '../../../shared-model/montecarlo/gupta-parameters';
import { relaxStructure } from '../../../shared-model/montecarlo/minimise';
import {
  energyAndForces,
  offLatticeEnergyEv,
  OffLatticeGupta,
  quinticSwitch,
  quinticSwitchDerivative,
  VerletList,
} from '../../../shared-model/montecarlo/offlattice-gupta';
import { createRandom } from '../../../shared-model/random';

function randomAlloy(a: string, b: string, xB: number, shells: number, jitter: number, seed: number) {
  const rng = createRandom(seed);
  const nn = (1 - xB) * guptaElement(a).r0Angstrom + xB * guptaElement(b).r0Angstrom;
  const geometry = buildCluster('cuboctahedron', { shells }, nn);
  const positions = Float64Array.from(geometry.positions, (v) => v + jitter * (2 * rng.next() - 1));
  const symbols = Array.from({ length: geometry.atoms }, () => (rng.next() < xB ? b : a));
  return { symbols, positions, nn };
}

describe('quintic switch', () => {
  it('S(0)=1, S(1)=0, S(½)=½ and its derivative matches a central difference', () => {
    expect(quinticSwitch(0)).toBe(1);
    expect(quinticSwitch(1)).toBe(0);
    expect(quinticSwitch(0.5)).toBeCloseTo(0.5, 15);
    for (const x of [0.1, 0.37, 0.8]) {
      const h = 1e-6;
      expect(quinticSwitchDerivative(x)).toBeCloseTo((quinticSwitch(x + h) - quinticSwitch(x - h)) / (2 * h), 8);
    }
  });
});

describe('off-lattice Gupta energy', () => {
  it.each(GUPTA_ELEMENTS.map((s) => [s]))(
    '%s on its own lattice: exactly the five-shell sum of the rigid engine',
    (symbol) => {
      const nn = guptaElement(symbol).r0Angstrom;
      const geometry = buildCluster('cuboctahedron', { shells: 4 }, nn);
      const symbols = Array.from({ length: geometry.atoms }, () => symbol);
      const rigid = totalEnergy(
        { symbols, positions: geometry.positions },
        { cutoffAngstrom: FIVE_SHELL_CUTOFF_FACTOR * nn },
      ).energyEv;
      const smooth = offLatticeEnergyEv(symbols, geometry.positions);
      expect(Math.abs(smooth - rigid) / Math.abs(rigid)).toBeLessThan(1e-12);
    },
  );

  it('bulk limit: a large pure Cu cube-free sphere approaches the five-shell bulk energy from above', () => {
    // Kittel's cohesive energy of Cu (3.49 eV/atom, from memory) is what the fit reproduces in bulk.
    const nn = guptaElement('Cu').r0Angstrom;
    const geometry = buildCluster('sphere', { shells: 6 }, nn);
    const symbols = Array.from({ length: geometry.atoms }, () => 'Cu');
    const perAtom = offLatticeEnergyEv(symbols, geometry.positions) / geometry.atoms;
    expect(perAtom).toBeGreaterThan(bulkEnergyPerAtomEv('Cu'));
    expect(perAtom).toBeLessThan(0.8 * bulkEnergyPerAtomEv('Cu'));
  });

  it.each([
    ['Au', 'Ni', 0.5],
    ['Ag', 'Cu', 0.3],
    ['Pt', 'Pd', 0.6],
    ['Pb', 'Al', 0.5],
  ] as const)(
    '%s–%s: analytic forces = central finite differences to 1e-6 eV/Å (displaced random cluster)',
    (a, b, xB) => {
      const { symbols, positions } = randomAlloy(a, b, xB, 3, 0.25, 11);
      const model = new OffLatticeGupta([a, b]);
      const types = model.typesOf(symbols);
      const list = new VerletList(symbols.length, model.maxCutoffAngstrom, 1.0);
      list.build(positions);
      const forces = new Float64Array(positions.length);
      energyAndForces(model, positions, types, list, forces);
      // Pairs inside a switch window: the switch and its derivative are exercised.
      let inWindow = 0;
      for (let i = 0; i < symbols.length; i++) {
        for (let j = i + 1; j < symbols.length; j++) {
          const r = Math.hypot(
            positions[3 * i]! - positions[3 * j]!,
            positions[3 * i + 1]! - positions[3 * j + 1]!,
            positions[3 * i + 2]! - positions[3 * j + 2]!,
          );
          const w = model.window(types[i]!, types[j]!);
          if (r > w.startAngstrom && r < w.endAngstrom) inWindow++;
        }
      }
      expect(inWindow).toBeGreaterThan(20);
      const h = 1e-5;
      let worst = 0;
      for (let k = 0; k < positions.length; k += 7) {
        const saved = positions[k]!;
        positions[k] = saved + h;
        const plus = energyAndForces(model, positions, types, list);
        positions[k] = saved - h;
        const minus = energyAndForces(model, positions, types, list);
        positions[k] = saved;
        worst = Math.max(worst, Math.abs(-(plus - minus) / (2 * h) - forces[k]!));
      }
      expect(worst).toBeLessThan(1e-6);
    },
  );

  it('forces vanish (below the tolerance) after relaxation and still match finite differences there', () => {
    const { symbols, positions } = randomAlloy('Ag', 'Ni', 0.4, 3, 0.1, 5);
    const relaxed = relaxStructure({ symbols, positions }, { forceToleranceEvPerAngstrom: 1e-5 });
    expect(relaxed.converged).toBe(true);
    expect(relaxed.energyEv).toBeLessThan(relaxed.initialEnergyEv);
    const model = new OffLatticeGupta([...new Set(symbols)]);
    const types = model.typesOf(symbols);
    const list = new VerletList(symbols.length, model.maxCutoffAngstrom, 1.0);
    list.build(relaxed.positions);
    const forces = new Float64Array(positions.length);
    energyAndForces(model, relaxed.positions, types, list, forces);
    const h = 1e-5;
    for (let k = 0; k < positions.length; k += 11) {
      const p = relaxed.positions;
      const saved = p[k]!;
      p[k] = saved + h;
      const plus = energyAndForces(model, p, types, list);
      p[k] = saved - h;
      const minus = energyAndForces(model, p, types, list);
      p[k] = saved;
      expect(Math.abs(-(plus - minus) / (2 * h) - forces[k]!)).toBeLessThan(1e-6);
      expect(Math.abs(forces[k]!)).toBeLessThan(1e-5);
    }
  });
});

describe('relaxation of a pure metal particle', () => {
  it('Au sphere of 3 nm: bulk-like nearest-neighbour distance inside (within 1 %), contracted at the surface', () => {
    // Common knowledge of metal surfaces: under-coordinated surface atoms pull in (shorter bonds).
    const nn = guptaElement('Au').r0Angstrom;
    const geometry = buildCluster('sphere', { diameterNm: 3 }, nn);
    const symbols = Array.from({ length: geometry.atoms }, () => 'Au');
    const relaxed = relaxStructure({ symbols, positions: geometry.positions }, { forceToleranceEvPerAngstrom: 1e-3 });
    expect(relaxed.converged).toBe(true);
    const list = buildNeighbourList(geometry.positions, FIVE_SHELL_CUTOFF_FACTOR * nn);
    const layers = layersFromSurface(list, nn);
    let inner = 0;
    let innerCount = 0;
    let outer = 0;
    let outerCount = 0;
    const p = relaxed.positions;
    for (let i = 0; i < geometry.atoms; i++) {
      for (let e = list.offsets[i]!; e < list.offsets[i + 1]!; e++) {
        const j = list.neighbours[e]!;
        if (j <= i || list.classDistancesAngstrom[list.distanceClass[e]!]! > FIRST_SHELL_FACTOR * nn) continue;
        const d = Math.hypot(p[3 * i]! - p[3 * j]!, p[3 * i + 1]! - p[3 * j + 1]!, p[3 * i + 2]! - p[3 * j + 2]!);
        if (layers[i]! >= 2 && layers[j]! >= 2) {
          inner += d;
          innerCount++;
        } else if (layers[i] === 0 && layers[j] === 0) {
          outer += d;
          outerCount++;
        }
      }
    }
    inner /= innerCount;
    outer /= outerCount;
    expect(Math.abs(inner / nn - 1)).toBeLessThan(0.01);
    expect(outer).toBeLessThan(inner);
  });
});

describe('bad structures', () => {
  it('overlapping atoms are refused, naming both', () => {
    const positions = Float64Array.from([0, 0, 0, 2.8, 0, 0, 0.3, 0.1, 0]);
    expect(() => relaxStructure({ symbols: ['Au', 'Au', 'Ni'], positions })).toThrow(/atoms 1 \(Au\) and 3 \(Ni\)/);
  });
});
