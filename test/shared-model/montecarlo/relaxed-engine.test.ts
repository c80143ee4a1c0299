import { describe, expect, it } from 'vitest';
import { buildNeighbourList, FIVE_SHELL_CUTOFF_FACTOR } from '../../../shared-model/clusters/neighbours';
import { buildCluster } from '../../../shared-model/clusters/shapes';
import { surfaceSites } from '../../../shared-model/montecarlo/analysis';
import { guptaElement } from '../../../shared-model/montecarlo/gupta-parameters';
import { offLatticeEnergyEv, OffLatticeGupta } from '../../../shared-model/montecarlo/offlattice-gupta';
import { RelaxedEngine } from '../../../shared-model/montecarlo/relaxed-engine';
import { relaxStructure } from '../../../shared-model/montecarlo/minimise';
import { BOLTZMANN_EV_PER_K } from '../../../shared-model/montecarlo/swap-engine';
import { createRandom } from '../../../shared-model/random';

function engineFor(a: string, b: string, xB: number, shells: number, seed: number) {
  const rng = createRandom(seed);
  const nn = (1 - xB) * guptaElement(a).r0Angstrom + xB * guptaElement(b).r0Angstrom;
  const geometry = buildCluster('cuboctahedron', { shells }, nn);
  const species = Uint8Array.from({ length: geometry.atoms }, () => (rng.next() < xB ? 1 : 0));
  const list = buildNeighbourList(geometry.positions, FIVE_SHELL_CUTOFF_FACTOR * nn);
  const model = new OffLatticeGupta([a, b]);
  const engine = new RelaxedEngine(model, geometry.positions, species, surfaceSites(list, nn), rng, 0.1);
  const symbols = () => Array.from(engine.species, (s) => (s ? b : a));
  return { engine, symbols, geometry };
}

describe('relaxed Monte Carlo engine', () => {
  it.each([
    ['Au', 'Ni', 0.5],
    ['Ag', 'Cu', 0.3],
  ] as const)(
    '%s–%s: the incrementally kept energy equals a from-scratch sum after many swaps and displacements',
    (a, b, xB) => {
      const { engine, symbols } = engineFor(a, b, xB, 3, 9);
      const start = engine.energyEv;
      expect(Math.abs(start - offLatticeEnergyEv(symbols(), engine.positions))).toBeLessThan(1e-9);
      for (let s = 0; s < 20; s++) engine.runSweep(900);
      expect(engine.stats.swapAccepted).toBeGreaterThan(0);
      expect(engine.stats.displacementAccepted).toBeGreaterThan(100);
      const scratch = offLatticeEnergyEv(symbols(), engine.positions);
      // Bookkeeping: accumulated ΔE = final − initial, and the kept energy = the from-scratch sum.
      expect(Math.abs(engine.energyEv - scratch)).toBeLessThan(1e-8);
      expect(Math.abs(engine.acceptedDeltaSumEv - (scratch - start))).toBeLessThan(1e-8);
    },
  );

  it('trial deltas equal energy differences computed from scratch (swap and displacement)', () => {
    const { engine, symbols } = engineFor('Pt', 'Ni', 0.4, 2, 4);
    const before = offLatticeEnergyEv(symbols(), engine.positions);
    const i = engine.species.indexOf(0);
    const j = engine.species.indexOf(1);
    const dSwap = engine.swapDelta(i, j);
    const swapped = symbols();
    swapped[i] = 'Ni';
    swapped[j] = 'Pt';
    expect(Math.abs(dSwap - (offLatticeEnergyEv(swapped, engine.positions) - before))).toBeLessThan(1e-9);
    const moved = Float64Array.from(engine.positions);
    moved[3 * i]! += 0.17;
    moved[3 * i + 2]! -= 0.09;
    const dMove = engine.displacementDelta(i, moved[3 * i]!, moved[3 * i + 1]!, moved[3 * i + 2]!);
    expect(Math.abs(dMove - (offLatticeEnergyEv(symbols(), moved) - before))).toBeLessThan(1e-9);
  });

  it('detailed balance of the displacement moves: equipartition, ⟨E⟩ − E_min = (3N − 6)kT/2 near a minimum', () => {
    // Classical statistics of a harmonic solid (any statistical-mechanics text): each of the 3N − 6
    // vibrational modes holds kT/2 of potential energy. At 8 K the Gupta well is harmonic to well under 1 %.
    const nn = guptaElement('Pt').r0Angstrom;
    const geometry = buildCluster('icosahedron', { shells: 2 }, nn);
    const symbols = Array.from({ length: geometry.atoms }, () => 'Pt');
    const relaxed = relaxStructure({ symbols, positions: geometry.positions }, { forceToleranceEvPerAngstrom: 1e-7 });
    const rng = createRandom(17);
    const model = new OffLatticeGupta(['Pt', 'Au']);
    const engine = new RelaxedEngine(
      model,
      relaxed.positions,
      new Uint8Array(geometry.atoms),
      new Uint8Array(geometry.atoms),
      rng,
      0.01,
    );
    const temperatureK = 8;
    for (let s = 0; s < 200; s++) {
      const before = { ...engine.stats };
      engine.runSweep(temperatureK);
      engine.tuneStep(
        (engine.stats.displacementAccepted - before.displacementAccepted) /
          (engine.stats.displacementAttempts - before.displacementAttempts),
      );
    }
    let sum = 0;
    const sweeps = 4000;
    for (let s = 0; s < sweeps; s++) {
      engine.runSweep(temperatureK);
      sum += engine.energyEv;
    }
    const expected = ((3 * geometry.atoms - 6) / 2) * BOLTZMANN_EV_PER_K * temperatureK;
    const measured = sum / sweeps - relaxed.energyEv;
    expect(Math.abs(measured / expected - 1)).toBeLessThan(0.03);
  });

  it('step tuning reaches the 40–50 % displacement acceptance band', () => {
    const { engine } = engineFor('Ag', 'Pd', 0.5, 3, 5);
    let acceptance = 0;
    for (let s = 0; s < 30; s++) {
      const before = { ...engine.stats };
      engine.runSweep(600);
      acceptance =
        (engine.stats.displacementAccepted - before.displacementAccepted) /
        (engine.stats.displacementAttempts - before.displacementAttempts);
      engine.tuneStep(acceptance);
    }
    expect(acceptance).toBeGreaterThan(0.33);
    expect(acceptance).toBeLessThan(0.57);
    expect(engine.stepAngstrom).toBeGreaterThan(0.02);
  });
});
