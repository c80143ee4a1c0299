import { describe, expect, it } from 'vitest';
import { buildCluster } from '../../../shared-model/clusters/shapes';
import type { ParticleShape } from '../../../shared-model/geometry/shapes';
import { buildNeighbourList, FIVE_SHELL_CUTOFF_FACTOR } from '../../../shared-model/clusters/neighbours';
import { surfaceSites } from '../../../shared-model/montecarlo/analysis';
import { bruteForceEnergyEv, totalEnergy } from '../../../shared-model/montecarlo/gupta-energy';
import { guptaElement } from '../../../shared-model/montecarlo/gupta-parameters';
import {
  BOLTZMANN_EV_PER_K,
  binaryTables,
  configurationEnergyEv,
  SwapEngine,
} from '../../../shared-model/montecarlo/swap-engine';
import { createRandom, type SeededRandom } from '../../../shared-model/random';

function setup(
  shape: ParticleShape,
  shells: number,
  elementA: string,
  elementB: string,
  xB: number,
  rng: SeededRandom,
) {
  const nn = (1 - xB) * guptaElement(elementA).r0Angstrom + xB * guptaElement(elementB).r0Angstrom;
  const geometry = buildCluster(shape, { shells }, nn);
  const list = buildNeighbourList(geometry.positions, FIVE_SHELL_CUTOFF_FACTOR * nn);
  const species = new Uint8Array(geometry.atoms);
  for (let i = 0; i < geometry.atoms; i++) species[i] = rng.next() < xB ? 1 : 0;
  const tables = binaryTables(elementA, elementB, list);
  const engine = new SwapEngine(list, geometry.positions, tables, species, surfaceSites(list, nn), rng);
  const symbolsOf = (s: Uint8Array) => Array.from(s, (v) => (v ? elementB : elementA));
  const brute = (s: Uint8Array) =>
    bruteForceEnergyEv({ symbols: symbolsOf(s), positions: geometry.positions }, FIVE_SHELL_CUTOFF_FACTOR * nn);
  return { nn, geometry, list, tables, engine, brute, symbolsOf };
}

describe('swap engine energy = brute-force O(N²) Gupta sum', () => {
  const cases: [ParticleShape, number, string, string][] = [
    ['cuboctahedron', 4, 'Ag', 'Pd'],
    ['icosahedron', 4, 'Au', 'Pt'],
    ['truncated-octahedron', 2, 'Cu', 'Ni'],
    ['sphere', 4, 'Pb', 'Al'],
  ];
  for (const [shape, shells, a, b] of cases) {
    it(`${a}–${b} ${shape}: random configuration, then after 20 000 moves, to 1e-9 relative`, () => {
      const rng = createRandom(42);
      const { engine, brute } = setup(shape, shells, a, b, 0.4, rng);
      const before = brute(engine.species);
      expect(Math.abs(engine.energyEv - before) / Math.abs(before)).toBeLessThan(1e-9);
      engine.runAttempts(20_000, 900);
      expect(engine.stats.accepted).toBeGreaterThan(0);
      const after = brute(engine.species);
      // The incrementally updated energy and densities, without a recompute:
      expect(Math.abs(engine.energyEv - after) / Math.abs(after)).toBeLessThan(1e-9);
      expect(Math.abs(engine.recomputeEnergy() - after) / Math.abs(after)).toBeLessThan(1e-9);
    });
  }

  it('the cell-list totalEnergy of a structure agrees with the brute-force sum', () => {
    const rng = createRandom(3);
    const { engine, geometry, brute, symbolsOf } = setup('icosahedron', 3, 'Ag', 'Cu', 0.5, rng);
    const e = totalEnergy({ symbols: symbolsOf(engine.species), positions: geometry.positions });
    expect(Math.abs(e.energyEv - brute(engine.species)) / Math.abs(e.energyEv)).toBeLessThan(1e-12);
  });
});

describe('local energy change', () => {
  it('equals the brute-force difference for every kind of pair (neighbours, shared neighbours, far apart)', () => {
    const rng = createRandom(5);
    const { engine, brute, geometry } = setup('cuboctahedron', 5, 'Ag', 'Pd', 0.5, rng);
    const species = engine.species;
    const a = [] as number[];
    const b = [] as number[];
    species.forEach((s, i) => (s ? b : a).push(i));
    const base = brute(species);
    let near = 0;
    let far = 0;
    for (let trial = 0; trial < 60; trial++) {
      const i = a[rng.nextInt(a.length)]!;
      // Half the trials take the B atom nearest to i so that neighbouring pairs are covered.
      let j = b[rng.nextInt(b.length)]!;
      if (trial % 2 === 0) {
        let best = Infinity;
        for (const k of b) {
          const d = Math.hypot(
            geometry.positions[3 * i]! - geometry.positions[3 * k]!,
            geometry.positions[3 * i + 1]! - geometry.positions[3 * k + 1]!,
            geometry.positions[3 * i + 2]! - geometry.positions[3 * k + 2]!,
          );
          if (d < best) {
            best = d;
            j = k;
          }
        }
      }
      const d = Math.hypot(
        geometry.positions[3 * i]! - geometry.positions[3 * j]!,
        geometry.positions[3 * i + 1]! - geometry.positions[3 * j + 1]!,
        geometry.positions[3 * i + 2]! - geometry.positions[3 * j + 2]!,
      );
      if (d < 2 * engine.list.cutoffAngstrom) near++;
      else far++;
      const delta = engine.trialSwapDeltaEv(i, j);
      const swapped = Uint8Array.from(species);
      swapped[i] = 1;
      swapped[j] = 0;
      expect(delta).toBeCloseTo(brute(swapped) - base, 9);
    }
    expect(near).toBeGreaterThan(10);
    expect(far).toBeGreaterThan(5);
  });

  it('sums over a run to the final minus the initial energy', () => {
    const rng = createRandom(8);
    const { engine, brute } = setup('cuboctahedron', 5, 'Au', 'Pt', 0.3, rng);
    const initial = brute(engine.species);
    for (const t of [2000, 1200, 800, 400]) engine.runAttempts(50_000, t);
    const final = brute(engine.species);
    expect(engine.stats.accepted).toBeGreaterThan(100);
    expect(Math.abs(engine.acceptedDeltaSumEv - (final - initial))).toBeLessThan(1e-9 * Math.abs(final));
  });

  it('repeats exactly from its seed and differs with another seed', () => {
    const run = (seed: number) => {
      const { engine } = setup('cuboctahedron', 3, 'Ag', 'Pd', 0.5, createRandom(seed));
      engine.runAttempts(10_000, 600);
      return Array.from(engine.species).join('') + engine.energyEv;
    };
    expect(run(7)).toBe(run(7));
    expect(run(7)).not.toBe(run(8));
  });
});

/**
 * Detailed balance on a 13-atom Ag–Pd cuboctahedron with 2 Pd atoms: all C(13,2) = 78 arrangements
 * are enumerated, their Boltzmann weights computed, and the Monte Carlo occupation histogram tested
 * with Pearson's χ² at significance 0.001 (77 degrees of freedom). Samples are taken every 20 attempts
 * so that they are close to independent (the chain forgets its state within a few accepted moves).
 */
describe('detailed balance on an enumerable cluster', () => {
  const temperatureK = 1500;
  const samples = 60_000;
  const thin = 20;

  /** χ² quantile by the Wilson–Hilferty cube-root approximation (Wilson & Hilferty, PNAS 17, 684 (1931)). */
  function chiSquareCritical(dof: number, zUpper: number): number {
    const c = 2 / (9 * dof);
    return dof * (1 - c + zUpper * Math.sqrt(c)) ** 3;
  }
  const Z_0_999 = 3.0902; // standard normal 0.999 quantile (statistical tables)

  function histogramChiSquare(boltzmannTemperatureK: number): { chi2: number; dof: number } {
    const rng = createRandom(2024);
    const nn = guptaElement('Ag').r0Angstrom;
    const geometry = buildCluster('cuboctahedron', { shells: 1 }, nn);
    const list = buildNeighbourList(geometry.positions, FIVE_SHELL_CUTOFF_FACTOR * nn);
    const tables = binaryTables('Ag', 'Pd', list);
    const species = new Uint8Array(13);
    species[0] = 1;
    species[5] = 1;
    const mc = new SwapEngine(list, geometry.positions, tables, species, surfaceSites(list, nn), rng);
    const states: string[] = [];
    const energies: number[] = [];
    for (let i = 0; i < 13; i++) {
      for (let j = i + 1; j < 13; j++) {
        const s = new Uint8Array(13);
        s[i] = 1;
        s[j] = 1;
        states.push(`${i},${j}`);
        energies.push(configurationEnergyEv(list, tables, s));
      }
    }
    const beta = 1 / (BOLTZMANN_EV_PER_K * boltzmannTemperatureK);
    const eMin = Math.min(...energies);
    const weights = energies.map((e) => Math.exp(-(e - eMin) * beta));
    const z = weights.reduce((s, w) => s + w, 0);
    const counts = new Map<string, number>();
    mc.runAttempts(2000, temperatureK);
    for (let k = 0; k < samples; k++) {
      mc.runAttempts(thin, temperatureK);
      const occupied: number[] = [];
      mc.species.forEach((v, i) => v && occupied.push(i));
      const key = occupied.join(',');
      counts.set(key, (counts.get(key) ?? 0) + 1);
    }
    let chi2 = 0;
    states.forEach((state, k) => {
      const expected = (samples * weights[k]!) / z;
      chi2 += ((counts.get(state) ?? 0) - expected) ** 2 / expected;
    });
    return { chi2, dof: states.length - 1 };
  }

  it('the sampled arrangement histogram matches Boltzmann weights (χ², α = 0.001)', () => {
    const { chi2, dof } = histogramChiSquare(temperatureK);
    expect(dof).toBe(77);
    expect(chi2).toBeLessThan(chiSquareCritical(dof, Z_0_999));
  });

  it('has the power to see a wrong distribution: the same histogram fails against weights at 1.5 × T', () => {
    const { chi2, dof } = histogramChiSquare(1.5 * temperatureK);
    expect(chi2).toBeGreaterThan(chiSquareCritical(dof, Z_0_999));
  });
});
