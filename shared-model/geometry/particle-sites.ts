/**
 * Atoms N and surface sites Ns of a particle from its diameter, lattice constant and shape.
 *
 * - N: atoms of a sphere of that diameter at bulk fcc density, (π/6)d³·4/a³ (the diameter is read as the
 *   equal-volume diameter, the usual reading of a TEM size).
 * - Cuboctahedron and Mackay icosahedron: closed-shell counts N(n) = (10n³+15n²+11n+3)/3, Ns(n) = 10n²+2
 *   (Mackay 1962); truncated octahedron: N(L), Ns(L) of magic-numbers.ts. Between two closed shells the
 *   surface count is interpolated linearly in N (the extra atoms of a growing shell are all surface atoms,
 *   and the count is exact at every magic size).
 * - Sphere: the atoms within one (111) monolayer a/√3 of the surface, Ns = N·[1 − (1 − 2t/d)³].
 * N is kept as a real number (the expected count) so the results vary smoothly with the diameter.
 */
import { invalid } from '../api/result';
import { monolayerThicknessNm } from './fcc';

import { PARTICLE_SHAPES, type ParticleShape } from './shapes';

export { PARTICLE_SHAPES, isParticleShape, type ParticleShape } from './shapes';

export interface ParticleSiteCounts {
  /** Expected number of atoms (real). */
  atoms: number;
  /** Expected number of surface sites (real), 0 < Ns ≤ N. */
  surfaceSites: number;
  /** Fractional shell index n (cuboctahedron/icosahedron) or edge length L (truncated octahedron); NaN-free, 0 for spheres. */
  shellIndex: number;
  shape: ParticleShape;
}

/**
 * Real k ≥ `start` with f(k) = target for a cubic f increasing on [start, ∞), by Newton steps from the
 * leading-term guess, kept inside a bracket (bisection if a step leaves it).
 */
function invertCubic(
  f: (k: number) => number,
  df: (k: number) => number,
  target: number,
  start: number,
  guess: number,
): number {
  let lo = start;
  let hi = Math.max(start + 1, 2 * guess);
  while (f(hi) < target) {
    lo = hi;
    hi *= 2;
  }
  let k = Math.min(hi, Math.max(lo, guess));
  for (let i = 0; i < 100; i++) {
    const value = f(k) - target;
    if (value < 0) lo = k;
    else hi = k;
    let next = k - value / df(k);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - k) <= 1e-12 * k) return next;
    k = next;
  }
  return k;
}

const mackayAtoms = (n: number) => (((10 * n + 15) * n + 11) * n + 3) / 3;
const mackayAtomsSlope = (n: number) => ((30 * n + 30) * n + 11) / 3;
const octaAtoms = (l: number) => ((16 * l - 33) * l + 24) * l - 6;
const octaAtomsSlope = (l: number) => (48 * l - 66) * l + 24;

interface ClusterFamily {
  /** Closed-shell counts at whole index k. */
  atoms: (k: number) => number;
  surface: (k: number) => number;
  /** Smallest whole index of the family. */
  first: number;
  /** The atom count as a real polynomial of k and its slope (for the inversion). */
  real: (k: number) => number;
  slope: (k: number) => number;
  /** Leading-order inverse, k ≈ guess(N). */
  guess: (atoms: number) => number;
}

// The families below evaluate the same closed forms as magic-numbers.ts without its argument checks (whole
// k ≥ first is guaranteed here); the tests check both agree at every magic size.
const MACKAY: ClusterFamily = {
  atoms: mackayAtoms,
  surface: (n) => 10 * n * n + 2,
  first: 1,
  real: mackayAtoms,
  slope: mackayAtomsSlope,
  guess: (atoms) => Math.cbrt(0.3 * atoms) - 0.5,
};

const TRUNCATED_OCTAHEDRON: ClusterFamily = {
  atoms: octaAtoms,
  surface: (l) => (30 * l - 60) * l + 32,
  first: 2,
  real: octaAtoms,
  slope: octaAtomsSlope,
  guess: (atoms) => Math.cbrt(atoms / 16) + 0.69,
};

/** Surface sites for N atoms of a closed-shell family, linear in N between successive magic sizes. */
function interpolatedSurface(atoms: number, family: ClusterFamily): { surface: number; index: number } {
  // below the first magic size: from a single atom (N = 1, Ns = 1) to the first closed shell
  const firstAtoms = family.atoms(family.first);
  if (atoms <= firstAtoms) {
    const t = (atoms - 1) / (firstAtoms - 1);
    return { surface: 1 + t * (family.surface(family.first) - 1), index: family.first * Math.max(0, t) };
  }
  const index = invertCubic(
    family.real,
    family.slope,
    atoms,
    family.first,
    Math.max(family.first, family.guess(atoms)),
  );
  let k = Math.max(family.first, Math.floor(index));
  // guard the floor against rounding at an exact magic size
  if (family.atoms(k) > atoms && k > family.first) k -= 1;
  if (family.atoms(k + 1) <= atoms) k += 1;
  const n0 = family.atoms(k);
  const n1 = family.atoms(k + 1);
  const t = Math.min(1, Math.max(0, (atoms - n0) / (n1 - n0)));
  const s0 = family.surface(k);
  return { surface: s0 + t * (family.surface(k + 1) - s0), index };
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
    case 'icosahedron': {
      const { surface, index } = interpolatedSurface(atoms, MACKAY);
      return { atoms, surfaceSites: Math.min(atoms, surface), shellIndex: index, shape };
    }
    case 'truncated-octahedron': {
      const { surface, index } = interpolatedSurface(atoms, TRUNCATED_OCTAHEDRON);
      return { atoms, surfaceSites: Math.min(atoms, surface), shellIndex: index, shape };
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
