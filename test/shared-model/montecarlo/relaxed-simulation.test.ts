/**
 * Relaxed runs against what the phase diagrams say, the stopping rule, and the default mode.
 * Sources (from memory): Au–Ni and Ag–Cu bulk phase diagrams show wide miscibility gaps at 600 K
 * (Massalski, Binary Alloy Phase Diagrams); Ag–Pd and Au–Pd are continuous solid solutions.
 */
import { describe, expect, it } from 'vitest';
import { buildNeighbourList, FIRST_SHELL_FACTOR } from '../../../shared-model/clusters/neighbours';
import { buildCluster } from '../../../shared-model/clusters/shapes';
import { guptaElement } from '../../../shared-model/montecarlo/gupta-parameters';
import { relaxStructure } from '../../../shared-model/montecarlo/minimise';
import {
  DEFAULT_STOPPING,
  defaultRelaxation,
  rebuildGeometry,
  runSimulation,
  type SimulationResult,
  type SimulationSpec,
} from '../../../shared-model/montecarlo/simulate';
import { createRandom } from '../../../shared-model/random';

function relaxedMixingEnergyPerAtomEv(a: string, b: string, xB: number, seed: number): number {
  const rng = createRandom(seed);
  const nn = (1 - xB) * guptaElement(a).r0Angstrom + xB * guptaElement(b).r0Angstrom;
  const geometry = buildCluster('cuboctahedron', { shells: 4 }, nn);
  const symbols = Array.from({ length: geometry.atoms }, () => (rng.next() < xB ? b : a));
  const x = symbols.filter((s) => s === b).length / geometry.atoms;
  const alloy = relaxStructure({ symbols, positions: geometry.positions }).energyEv / geometry.atoms;
  const pure = (s: string) =>
    relaxStructure({
      symbols: symbols.map(() => s),
      positions: Float64Array.from(geometry.positions, (v) => (v * guptaElement(s).r0Angstrom) / nn),
    }).energyEv / geometry.atoms;
  return alloy - (1 - x) * pure(a) - x * pure(b);
}

/** Unlike-neighbour ratio among the fully coordinated (core) sites of a run's final occupation. */
function coreUnlikeRatio(result: SimulationResult): number {
  const geometry = rebuildGeometry(result.spec);
  const list = buildNeighbourList(geometry.positions, FIRST_SHELL_FACTOR * result.geometry.nearestNeighbourAngstrom);
  const core = (i: number) => list.offsets[i + 1]! - list.offsets[i]! === 12;
  let bonds = 0;
  let unlike = 0;
  let nA = 0;
  let nB = 0;
  for (let i = 0; i < geometry.atoms; i++) {
    if (!core(i)) continue;
    if (result.finalOccupation[i] === 'B') nB++;
    else nA++;
    for (let e = list.offsets[i]!; e < list.offsets[i + 1]!; e++) {
      const j = list.neighbours[e]!;
      if (j > i && core(j)) {
        bonds++;
        if (result.finalOccupation[i] !== result.finalOccupation[j]) unlike++;
      }
    }
  }
  const n = nA + nB;
  return unlike / ((bonds * 2 * nA * nB) / (n * (n - 1)));
}

const run = (elementA: string, elementB: string, extra: Partial<SimulationSpec>) =>
  runSimulation(
    {
      elementA,
      elementB,
      xB: 0.5,
      shape: 'cuboctahedron',
      shells: 4,
      temperatureK: 600,
      sweeps: 300,
      seed: 3,
      ...extra,
    },
    createRandom(3),
  );

describe('sign of mixing with relaxation', () => {
  it.each([
    ['Au', 'Ni'],
    ['Ag', 'Cu'],
  ])('%s–%s: the relaxed random alloy lies above the relaxed pure particles (309 atoms)', (a, b) => {
    expect(relaxedMixingEnergyPerAtomEv(a!, b!, 0.5, 1)).toBeGreaterThan(0.01);
  });

  it.each([
    ['Au', 'Ni'],
    ['Ag', 'Cu'],
  ])(
    '%s–%s at 600 K: relaxed Monte Carlo demixes (unlike-neighbour ratio well below 1 and below the rigid run)',
    (a, b) => {
      const relaxed = run(a!, b!, { relaxation: 'relaxed' });
      const rigid = run(a!, b!, { relaxation: 'rigid' });
      expect(relaxed.relaxation.mode).toBe('relaxed');
      expect(relaxed.unlikeNeighbourRatio).toBeLessThan(0.72);
      expect(relaxed.unlikeNeighbourRatio).toBeLessThan(rigid.unlikeNeighbourRatio - 0.15);
      expect(Math.abs(relaxed.energyDriftEv)).toBeLessThan(1e-6);
    },
  );

  it.each([
    ['Ag', 'Pd'],
    ['Au', 'Pd'],
  ])('%s–%s at 600 K: relaxed Monte Carlo keeps the core mixed', (a, b) => {
    const relaxed = run(a!, b!, { relaxation: 'relaxed', sweeps: 200 });
    expect(coreUnlikeRatio(relaxed)).toBeGreaterThan(0.85);
    expect(relaxed.unlikeNeighbourRatio).toBeGreaterThan(0.75);
  });
});

describe('default mode by size mismatch', () => {
  it('Au–Ni, Ag–Cu, Pt–Ni run relaxed by default; Ag–Pd, Au–Pd, Au–Ag rigid; the reason is stated', () => {
    for (const [a, b] of [
      ['Au', 'Ni'],
      ['Ag', 'Cu'],
      ['Pt', 'Ni'],
    ])
      expect(defaultRelaxation(a!, b!).mode).toBe('relaxed');
    for (const [a, b] of [
      ['Ag', 'Pd'],
      ['Au', 'Pd'],
      ['Au', 'Ag'],
    ])
      expect(defaultRelaxation(a!, b!).mode).toBe('rigid');
    expect(defaultRelaxation('Au', 'Ni').reason).toMatch(/differ by 14\.\d % \(more than 6 %\)/);
  });

  it('a relaxed run stores its design, step, acceptances and final positions', () => {
    const result = runSimulation(
      {
        elementA: 'Au',
        elementB: 'Ni',
        xB: 0.3,
        shape: 'cuboctahedron',
        shells: 2,
        temperatureK: 600,
        sweeps: 60,
        seed: 2,
      },
      createRandom(2),
    );
    expect(result.relaxation.mode).toBe('relaxed');
    expect(result.relaxation.design).toMatch(/displacement/);
    expect(result.relaxation.displacementAcceptance).toBeGreaterThan(0.3);
    expect(result.relaxation.displacementAcceptance).toBeLessThan(0.6);
    expect(result.finalPositionsAngstrom).toHaveLength(3 * result.atoms);
    expect(result.relaxation.quenchedEnergyEv).toBeLessThan(result.energyEv);
    expect(result.kineticNote).toMatch(/equilibrium arrangement/);
  });
});

describe('runs that stop at the answer', () => {
  it('Ag–Pd 3 nm at 600 K: stops with SE < 0.005 within 300 sweeps and agrees with a 3,000-sweep run within 2 SE', () => {
    const spec: SimulationSpec = {
      elementA: 'Ag',
      elementB: 'Pd',
      xB: 0.5,
      shape: 'cuboctahedron',
      diameterNm: 3,
      temperatureK: 600,
      sweeps: 3000,
      seed: 5,
    };
    const stopped = runSimulation({ ...spec, stopping: DEFAULT_STOPPING }, createRandom(5));
    expect(stopped.stopping.stoppedAtAnswer).toBe(true);
    expect(stopped.stopping.sweepsTaken).toBeLessThanOrEqual(300);
    expect(stopped.stopping.sweepsTaken).toBeGreaterThanOrEqual(DEFAULT_STOPPING.minSweeps);
    expect(stopped.surfaceXBStandardError).toBeLessThan(0.005);
    const long = runSimulation({ ...spec, seed: 6 }, createRandom(6));
    expect(long.stopping.sweepsTaken).toBe(3000);
    const combined = Math.hypot(stopped.surfaceXBStandardError, long.surfaceXBStandardError);
    expect(Math.abs(stopped.surfaceXB - long.surfaceXB)).toBeLessThan(2 * combined);
  });
});
