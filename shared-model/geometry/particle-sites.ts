/**
 * Atoms N and surface sites Ns of a particle from its diameter, lattice constant and shape.
 *
 * - Cuboctahedron, Mackay icosahedron, truncated octahedron: the closed-shell cluster nearest to the diameter
 *   by the one rule of closed-shells.ts (volume-equivalent diameter nearest to the one asked), the same
 *   cluster the Monte Carlo builds; N and Ns are its closed-shell counts (Mackay 1962; magic-numbers.ts), so
 *   N is a whole number and steps from one closed shell to the next as the diameter grows.
 * - Sphere: N atoms of a sphere of that diameter at bulk fcc density, (π/6)d³·4/a³ (the diameter read as
 *   the equal-volume diameter, the usual reading of a TEM size), kept as a real number; Ns the atoms within
 *   one (111) monolayer a/√3 of the surface, Ns = N·[1 − (1 − 2t/d)³].
 */
import { invalid } from '../api/result';
import { nearestClosedShell } from './closed-shells';
import { monolayerThicknessNm } from './fcc';

import { PARTICLE_SHAPES, type ParticleShape } from './shapes';

export { PARTICLE_SHAPES, isParticleShape, type ParticleShape } from './shapes';

export interface ParticleSiteCounts {
  /** Number of atoms: the closed-shell count, or for a sphere the expected (real) count. */
  atoms: number;
  /** Number of surface sites, 0 < Ns ≤ N. */
  surfaceSites: number;
  /** Shells n (cuboctahedron/icosahedron) or atoms per edge L (truncated octahedron) of the cluster; 0 for spheres. */
  shellIndex: number;
  shape: ParticleShape;
}

export function particleSiteCounts(diameterNm: number, latticeNm: number, shape: ParticleShape): ParticleSiteCounts {
  if (typeof diameterNm !== 'number' || !Number.isFinite(diameterNm) || diameterNm <= 0) {
    throw invalid('diameterNm', `diameter must be a positive number of nm, got ${String(diameterNm)}`);
  }
  if (typeof latticeNm !== 'number' || !Number.isFinite(latticeNm) || latticeNm <= 0) {
    throw invalid('latticeNm', `lattice constant must be a positive number of nm, got ${String(latticeNm)}`);
  }
  // atoms of a sphere at bulk fcc density, (π/6)d³·4/a³ (as atomsInSphere in fcc.ts)
  const atoms = ((Math.PI / 6) * diameterNm * diameterNm * diameterNm * 4) / (latticeNm * latticeNm * latticeNm);
  if (atoms < 2) {
    throw invalid(
      'diameterNm',
      `a ${diameterNm} nm particle holds fewer than 2 atoms (${atoms.toFixed(2)}); a pair needs a larger diameter`,
    );
  }
  switch (shape) {
    case 'cuboctahedron':
    case 'icosahedron':
    case 'truncated-octahedron': {
      const shell = nearestClosedShell(shape, diameterNm, latticeNm);
      const shellIndex = shape === 'truncated-octahedron' ? shell.shells + 1 : shell.shells;
      return { atoms: shell.atoms, surfaceSites: shell.surfaceAtoms, shellIndex, shape };
    }
    case 'sphere': {
      const t = monolayerThicknessNm(latticeNm);
      const inner = Math.max(0, 1 - (2 * t) / diameterNm);
      return { atoms, surfaceSites: atoms * (1 - inner ** 3), shellIndex: 0, shape };
    }
    default:
      throw invalid('shape', `shape must be one of ${PARTICLE_SHAPES.join(', ')}, got "${String(shape)}"`);
  }
}
