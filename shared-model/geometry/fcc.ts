/**
 * fcc particle geometry (DOMAIN.md Models 5): atoms per volume 4/a³, Vegard's-law alloy lattice constant,
 * one (111) monolayer = a/√3, atom counts of spheres and shells. Lengths in nm unless the name says otherwise.
 */
import { invalid } from '../api/result';

function requirePositive(field: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) throw invalid(field, `${field} must be a positive number, got ${value}`);
}

/** Atoms per nm³ of an fcc lattice with cubic lattice constant `latticeNm` (4 atoms per cubic cell). */
export function fccAtomsPerNm3(latticeNm: number): number {
  requirePositive('latticeNm', latticeNm);
  return 4 / latticeNm ** 3;
}

/** Vegard's law: lattice constant of an A(1−xB)B(xB) solid solution, linear in composition. */
export function vegardLatticeNm(latticeANm: number, latticeBNm: number, xB: number): number {
  requirePositive('latticeANm', latticeANm);
  requirePositive('latticeBNm', latticeBNm);
  if (!Number.isFinite(xB) || xB < 0 || xB > 1) throw invalid('xB', `xB must lie between 0 and 1, got ${xB}`);
  return (1 - xB) * latticeANm + xB * latticeBNm;
}

/** Spacing of (111) planes, a/√3: the thickness of one close-packed monolayer. */
export function monolayerThicknessNm(latticeNm: number): number {
  requirePositive('latticeNm', latticeNm);
  return latticeNm / Math.sqrt(3);
}

/** Atoms in a sphere of diameter `diameterNm` filled at bulk fcc density. */
export function atomsInSphere(diameterNm: number, latticeNm: number): number {
  requirePositive('diameterNm', diameterNm);
  const volumeNm3 = (Math.PI / 6) * diameterNm ** 3;
  return volumeNm3 * fccAtomsPerNm3(latticeNm);
}

/** Diameter of the sphere holding `atoms` atoms at bulk fcc density (inverse of `atomsInSphere`). */
export function sphereDiameterForAtoms(atoms: number, latticeNm: number): number {
  requirePositive('atoms', atoms);
  const volumeNm3 = atoms / fccAtomsPerNm3(latticeNm);
  return Math.cbrt((6 * volumeNm3) / Math.PI);
}

/** Atoms in a spherical shell of thickness `shellNm` on a core of diameter `coreDiameterNm`, shell lattice `shellLatticeNm`. */
export function atomsInSphericalShell(coreDiameterNm: number, shellNm: number, shellLatticeNm: number): number {
  requirePositive('coreDiameterNm', coreDiameterNm);
  requirePositive('shellNm', shellNm);
  const outer = coreDiameterNm + 2 * shellNm;
  const volumeNm3 = (Math.PI / 6) * (outer ** 3 - coreDiameterNm ** 3);
  return volumeNm3 * fccAtomsPerNm3(shellLatticeNm);
}

export function monolayersToNm(monolayers: number, latticeNm: number): number {
  if (!Number.isFinite(monolayers) || monolayers < 0)
    throw invalid('monolayers', `monolayers must be ≥ 0, got ${monolayers}`);
  return monolayers * monolayerThicknessNm(latticeNm);
}

export function nmToMonolayers(thicknessNm: number, latticeNm: number): number {
  if (!Number.isFinite(thicknessNm) || thicknessNm < 0)
    throw invalid('thicknessNm', `thickness must be ≥ 0, got ${thicknessNm}`);
  return thicknessNm / monolayerThicknessNm(latticeNm);
}

/** Nearest-neighbour distance in fcc, a/√2. */
export function fccNearestNeighbourNm(latticeNm: number): number {
  requirePositive('latticeNm', latticeNm);
  return latticeNm / Math.SQRT2;
}
