/**
 * Closed-form atom counts of the closed-shell ("magic") clusters with n shells around a central atom
 * (n = 0 is the single atom). Cuboctahedron and Mackay icosahedron share the counts
 * N(n) = (10n³ + 15n² + 11n + 3)/3 and surface sites 10n² + 2 (Mackay, Acta Cryst. 15, 916 (1962)),
 * here written with n shells around the centre so N(1) = 13, N(2) = 55, N(3) = 147.
 */
import { invalid } from '../api/result';

function requireShells(shells: number): void {
  if (!Number.isInteger(shells) || shells < 0)
    throw invalid('shells', `shells must be a whole number ≥ 0, got ${shells}`);
}

/** Total atoms of a cuboctahedron or Mackay icosahedron with `shells` shells around the centre atom. */
export function magicClusterAtoms(shells: number): number {
  requireShells(shells);
  const n = shells;
  return (10 * n ** 3 + 15 * n ** 2 + 11 * n + 3) / 3;
}

/** Atoms in the outermost shell (surface sites) of the same cluster: 10n² + 2 (1 for n = 0). */
export function magicClusterSurfaceAtoms(shells: number): number {
  requireShells(shells);
  return shells === 0 ? 1 : 10 * shells ** 2 + 2;
}

/**
 * Regular truncated octahedron cut from fcc with edge length of `edgeAtoms` atoms (edgeAtoms ≥ 2):
 * N = 16L³ − 33L² + 24L − 6 and surface Ns = 30L² − 60L + 32, with L = edgeAtoms
 * (from memory; checked against explicit construction in the cluster-builder tests).
 */
export function truncatedOctahedronAtoms(edgeAtoms: number): number {
  if (!Number.isInteger(edgeAtoms) || edgeAtoms < 2)
    throw invalid('edgeAtoms', `edge length must be a whole number of atoms ≥ 2, got ${edgeAtoms}`);
  const L = edgeAtoms;
  return 16 * L ** 3 - 33 * L ** 2 + 24 * L - 6;
}

export function truncatedOctahedronSurfaceAtoms(edgeAtoms: number): number {
  if (!Number.isInteger(edgeAtoms) || edgeAtoms < 2)
    throw invalid('edgeAtoms', `edge length must be a whole number of atoms ≥ 2, got ${edgeAtoms}`);
  const L = edgeAtoms;
  return 30 * L ** 2 - 60 * L + 32;
}
