/**
 * Reference tier: the off-lattice Gupta energy (per-pair quintic switch) and its minimisation against
 * LAMMPS (Debian `lammps`, `lmp`): pair_style eam/fs with the same switched functions tabulated on
 * 20,000 r points, `run 0` for energies, `min_style cg` + `minimize` for relaxed energies.
 * Agreement required: 1e-6 eV/atom for energies, 1e-4 eV/atom for relaxed energies.
 */
import { describe, expect, it } from 'vitest';
import { buildCluster } from '../../shared-model/clusters/shapes';
import { guptaElement } from '../../shared-model/montecarlo/gupta-parameters';
import { relaxStructure } from '../../shared-model/montecarlo/minimise';
import { offLatticeEnergyEv } from '../../shared-model/montecarlo/offlattice-gupta';
import { createRandom } from '../../shared-model/random';
import { referenceAvailable } from '../support/reference-tools';
import { lammpsSwitchedEnergyEv } from '../support/gupta-lammps';

const available = referenceAvailable({ command: 'lmp' });

function displacedAlloy(a: string, b: string, xB: number, shells: number, jitter: number, seed: number) {
  const rng = createRandom(seed);
  const nn = (1 - xB) * guptaElement(a).r0Angstrom + xB * guptaElement(b).r0Angstrom;
  const geometry = buildCluster('cuboctahedron', { shells }, nn);
  const positions = Float64Array.from(geometry.positions, (v) => v + jitter * (2 * rng.next() - 1));
  const symbols = Array.from({ length: geometry.atoms }, () => (rng.next() < xB ? b : a));
  return { symbols, positions };
}

describe.skipIf(!available)('off-lattice Gupta vs LAMMPS eam/fs with the same switch', () => {
  it.each([
    ['Au', 'Ni', 0.5, 1],
    ['Ag', 'Cu', 0.3, 2],
    ['Pt', 'Ni', 0.4, 3],
  ] as const)('%s–%s random displaced 309-atom cluster: energy within 1e-6 eV/atom', (a, b, xB, seed) => {
    const s = displacedAlloy(a, b, xB, 4, 0.2, seed);
    const ours = offLatticeEnergyEv(s.symbols, s.positions);
    const lammps = lammpsSwitchedEnergyEv(s.symbols, s.positions);
    console.log(
      `${a}-${b}: ours ${ours.toFixed(9)} eV, LAMMPS ${lammps.toFixed(9)} eV, diff ${((ours - lammps) / 309).toExponential(2)} eV/atom`,
    );
    expect(Math.abs(ours - lammps) / s.symbols.length).toBeLessThan(1e-6);
  });

  it.each([
    ['Au', 'Ni', 0.5, 4],
    ['Ag', 'Pd', 0.5, 5],
  ] as const)(
    '%s–%s 147-atom cluster: FIRE relaxed energy = LAMMPS minimize cg within 1e-4 eV/atom',
    (a, b, xB, seed) => {
      const s = displacedAlloy(a, b, xB, 3, 0.02, seed);
      const ours = relaxStructure(s, { forceToleranceEvPerAngstrom: 1e-5, maxIterations: 50_000 });
      expect(ours.converged).toBe(true);
      const lammps = lammpsSwitchedEnergyEv(s.symbols, s.positions, { minimize: true });
      const diff = (ours.energyEv - lammps) / s.symbols.length;
      console.log(
        `${a}-${b} relaxed: ours ${ours.energyEv.toFixed(7)} eV (${ours.iterations} FIRE steps), LAMMPS ${lammps.toFixed(7)} eV, diff ${diff.toExponential(2)} eV/atom`,
      );
      expect(Math.abs(diff)).toBeLessThan(1e-4);
      expect(ours.energyEv).toBeLessThan(ours.initialEnergyEv - 1);
      // Our minimum is LAMMPS' minimum too: started there, cg does not find anything lower.
      const again = lammpsSwitchedEnergyEv(s.symbols, ours.positions, { minimize: true });
      expect(Math.abs(again - ours.energyEv) / s.symbols.length).toBeLessThan(1e-6);
    },
  );
});
