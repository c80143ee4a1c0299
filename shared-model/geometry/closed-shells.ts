/**
 * The one rule for "the closed-shell particle nearest to a diameter", used by the analytic prediction
 * (site counts) and by the Monte Carlo (the cluster it builds), so the same "3 nm cuboctahedron" has the
 * same atom count everywhere:
 *
 *   of the closed-shell clusters of the shape (n ≥ 1 shells), take the one whose volume-equivalent diameter
 *   d(N) = a·(3N/2π)^(1/3) — a sphere of the same N atoms at bulk fcc density, 4 atoms per a³ — lies nearest
 *   to the diameter asked (a tie goes to the smaller cluster).
 *
 * Closed shells: cuboctahedron and Mackay icosahedron N(n) = (10n³ + 15n² + 11n + 3)/3, Ns(n) = 10n² + 2
 * (Mackay, Acta Cryst. 15, 916 (1962)); regular truncated octahedron with L = n + 1 atoms on every edge
 * (magic-numbers.ts). A sphere cut from fcc has no closed shells; it is not covered here.
 */
import { invalid } from '../api/result';
import {
  magicClusterAtoms,
  magicClusterSurfaceAtoms,
  truncatedOctahedronAtoms,
  truncatedOctahedronSurfaceAtoms,
} from './magic-numbers';
import { shapeLabel, type ParticleShape } from './shapes';

export type ClosedShellShape = Exclude<ParticleShape, 'sphere'>;

export interface ClosedShell {
  shape: ClosedShellShape;
  /** Shells around the centre atom (truncated octahedron: atoms per edge − 1). */
  shells: number;
  atoms: number;
  surfaceAtoms: number;
  /** Diameter of a sphere of the same atoms at bulk fcc density with the lattice constant used (nm). */
  equivalentDiameterNm: number;
}

/** The rule in words, shown beside every atom count a diameter gave. */
export const CLOSED_SHELL_RULE =
  'the closed-shell cluster whose volume-equivalent diameter (the same atoms as a sphere at bulk fcc density) is nearest to the diameter asked';

/** Volume-equivalent diameter (nm) of `atoms` fcc atoms with lattice constant `latticeNm`: a·(3N/2π)^(1/3). */
export function volumeEquivalentDiameterNm(atoms: number, latticeNm: number): number {
  return latticeNm * Math.cbrt((3 * atoms) / (2 * Math.PI));
}

/** Atoms of the closed-shell cluster of `shape` with `shells` shells (n ≥ 0). */
export function closedShellAtoms(shape: ClosedShellShape, shells: number): number {
  return shape === 'truncated-octahedron' ? truncatedOctahedronAtoms(shells + 1) : magicClusterAtoms(shells);
}

/** Surface atoms of that cluster. */
export function closedShellSurfaceAtoms(shape: ClosedShellShape, shells: number): number {
  return shape === 'truncated-octahedron'
    ? truncatedOctahedronSurfaceAtoms(shells + 1)
    : magicClusterSurfaceAtoms(shells);
}

function shellOf(shape: ClosedShellShape, shells: number, latticeNm: number): ClosedShell {
  const atoms = closedShellAtoms(shape, shells);
  return {
    shape,
    shells,
    atoms,
    surfaceAtoms: closedShellSurfaceAtoms(shape, shells),
    equivalentDiameterNm: volumeEquivalentDiameterNm(atoms, latticeNm),
  };
}

/** The closed-shell cluster of `shape` nearest to `diameterNm` by the rule above, for lattice constant `latticeNm`. */
export function nearestClosedShell(shape: ClosedShellShape, diameterNm: number, latticeNm: number): ClosedShell {
  if (typeof diameterNm !== 'number' || !Number.isFinite(diameterNm) || diameterNm <= 0)
    throw invalid('diameterNm', `diameter must be a positive number of nm, got ${String(diameterNm)}`);
  if (typeof latticeNm !== 'number' || !Number.isFinite(latticeNm) || latticeNm <= 0)
    throw invalid('latticeNm', `lattice constant must be a positive number of nm, got ${String(latticeNm)}`);
  const d = (n: number) => volumeEquivalentDiameterNm(closedShellAtoms(shape, n), latticeNm);
  // the smallest n whose diameter reaches the one asked, by doubling then bisection (d grows with n)
  let lo = 1;
  let hi = 1;
  while (d(hi) < diameterNm) {
    lo = hi;
    hi *= 2;
  }
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (d(mid) < diameterNm) lo = mid;
    else hi = mid;
  }
  const below = shellOf(shape, lo, latticeNm);
  if (lo === hi) return below;
  const above = shellOf(shape, hi, latticeNm);
  return diameterNm - below.equivalentDiameterNm <= above.equivalentDiameterNm - diameterNm ? below : above;
}

/** "923 atoms (closed-shell cuboctahedron, 6 shells, volume-equivalent 3.05 nm)". */
export function describeClosedShell(shell: ClosedShell): string {
  const shells =
    shell.shape === 'truncated-octahedron' ? `${shell.shells + 1} atoms per edge` : `${shell.shells} shells`;
  return `${shell.atoms} atoms (closed-shell ${shapeLabel(shell.shape)}, ${shells}, volume-equivalent ${shell.equivalentDiameterNm.toFixed(2)} nm)`;
}
