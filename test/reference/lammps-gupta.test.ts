/**
 * Reference tier: Pairwright's Gupta energies against LAMMPS (Debian `lammps`, `lmp`), with the
 * potential tabulated as pair_style eam/fs (a density function per element pair, so the mixing-rule
 * hetero pair is exact) and the same sharp cutoff at 2.35 nearest-neighbour distances.
 * Agreement required: 1e-4 eV/atom (the task's criterion); the tables are dense enough for far better.
 */
import { describe, expect, it } from 'vitest';
import { buildCluster } from '../../shared-model/clusters/shapes';
import { totalEnergy } from '../../shared-model/montecarlo/gupta-energy';
import { guptaElement } from '../../shared-model/montecarlo/gupta-parameters';
import { rebuildGeometry, runSimulation } from '../../shared-model/montecarlo/simulate';
import { createRandom } from '../../shared-model/random';
import { referenceAvailable } from '../support/reference-tools';
import { lammpsGuptaEnergyEv } from '../support/gupta-lammps';

const available = referenceAvailable({ command: 'lmp' });

function randomConfiguration(
  elementA: string,
  elementB: string,
  xB: number,
  shape: 'cuboctahedron' | 'icosahedron' | 'sphere',
  shells: number,
  seed: number,
) {
  const rng = createRandom(seed);
  const nn = (1 - xB) * guptaElement(elementA).r0Angstrom + xB * guptaElement(elementB).r0Angstrom;
  const geometry = buildCluster(shape, { shells }, nn);
  const symbols = Array.from({ length: geometry.atoms }, () => (rng.next() < xB ? elementB : elementA));
  return { symbols, positions: geometry.positions };
}

describe.skipIf(!available)('Gupta energy vs LAMMPS eam/fs', () => {
  it('random Ag–Pd cuboctahedron (309 atoms): within 1e-4 eV/atom', () => {
    const s = randomConfiguration('Ag', 'Pd', 0.5, 'cuboctahedron', 4, 5);
    const ours = totalEnergy(s);
    const lammps = lammpsGuptaEnergyEv(s.symbols, s.positions, ours.cutoffAngstrom);
    expect(Math.abs(ours.energyEv - lammps) / ours.atoms).toBeLessThan(1e-4);
  });

  it('pure Pt sphere cut: within 1e-4 eV/atom', () => {
    const s = randomConfiguration('Pt', 'Pt', 0, 'sphere', 4, 1);
    const ours = totalEnergy(s);
    const lammps = lammpsGuptaEnergyEv(s.symbols, s.positions, ours.cutoffAngstrom);
    expect(Math.abs(ours.energyEv - lammps) / ours.atoms).toBeLessThan(1e-4);
  });

  it('random Au–Pt Mackay icosahedron (many distinct distances): within 1e-4 eV/atom', () => {
    const s = randomConfiguration('Au', 'Pt', 0.3, 'icosahedron', 4, 9);
    const ours = totalEnergy(s);
    const lammps = lammpsGuptaEnergyEv(s.symbols, s.positions, ours.cutoffAngstrom);
    expect(Math.abs(ours.energyEv - lammps) / ours.atoms).toBeLessThan(1e-4);
  });

  it('the final configuration of a Monte Carlo run: engine energy = LAMMPS', () => {
    const result = runSimulation(
      {
        elementA: 'Cu',
        elementB: 'Ag',
        xB: 0.4,
        shape: 'cuboctahedron',
        shells: 4,
        temperatureK: 500,
        sweeps: 100,
        seed: 3,
        relaxation: 'rigid',
      },
      createRandom(3),
    );
    const geometry = rebuildGeometry(result.spec);
    const symbols = Array.from(result.finalOccupation, (c) => (c === 'B' ? 'Ag' : 'Cu'));
    const lammps = lammpsGuptaEnergyEv(symbols, geometry.positions, result.geometry.cutoffAngstrom);
    expect(Math.abs(result.energyEv - lammps) / result.atoms).toBeLessThan(1e-4);
  });
});
