/**
 * Builders of closed-shell metal clusters: cuboctahedron, Mackay icosahedron, regular truncated
 * octahedron and a sphere cut from fcc. Positions in Å, interleaved x,y,z, centred on the origin.
 *
 * Size is given by `shells` (atoms counted from the centre: 0 shells = one atom) or by a diameter, in
 * which case the shell count whose volume-equivalent diameter (a sphere of the same atoms at bulk fcc
 * density) is nearest is chosen. Closed-form counts: `shared-model/geometry/magic-numbers.ts`.
 *
 * - cuboctahedron(n): fcc sites with |x|,|y|,|z| ≤ n and |x|+|y|+|z| ≤ 2n (coordinates in units of a/2,
 *   x+y+z even); 13, 55, 147, 309, ... atoms.
 * - truncated octahedron(n): the regular one with L = n + 1 atoms on every edge (octahedron of edge
 *   3L − 2 atoms with L − 1 layers cut from each vertex); 1, 38, 201, 586, ... atoms. For odd n its centre is
 *   an octahedral interstice, not an atom.
 * - Mackay icosahedron(n): shell k holds the 20 triangular faces of an icosahedron with k + 1 atoms per
 *   edge (10k² + 2 atoms). It is not an fcc lattice: radial bonds are 5 % shorter than bonds within a
 *   shell. We scale it so that the MEAN nearest-neighbour bond equals the requested nearest-neighbour
 *   distance; its neighbour shells are then defined by distance alone (the same cutoff rule as fcc,
 *   see `neighbours.ts`), so many distinct distances occur instead of five.
 * - sphere(n): fcc sites within n nearest-neighbour distances of a central atom; by diameter, sites
 *   within half the diameter.
 */
import { invalid } from '../api/result';
import { nearestClosedShell } from '../geometry/closed-shells';
import { magicClusterAtoms, truncatedOctahedronAtoms } from '../geometry/magic-numbers';
import { isParticleShape, PARTICLE_SHAPES, type ParticleShape } from '../geometry/shapes';
import { pairsWithin } from './neighbours';

export interface ClusterGeometry {
  shape: ParticleShape;
  /** Shells around the centre (truncated octahedron: edge atoms − 1; sphere: radius in nearest-neighbour distances). */
  shells: number;
  atoms: number;
  /** Å, interleaved x, y, z. */
  positions: Float64Array;
  /** Nearest-neighbour distance the cluster was built with (Å); for the icosahedron, the mean bond. */
  nearestNeighbourAngstrom: number;
  /** Diameter of a sphere holding the same atoms at bulk fcc density with this nearest-neighbour distance (nm). */
  equivalentDiameterNm: number;
}

/** Volume-equivalent diameter (nm) of `atoms` fcc atoms with nearest-neighbour distance `nnAngstrom`. */
export function equivalentDiameterNm(atoms: number, nnAngstrom: number): number {
  const latticeNm = (nnAngstrom * Math.SQRT2) / 10;
  return latticeNm * Math.cbrt((3 * atoms) / (2 * Math.PI));
}

function requireNearestNeighbour(nnAngstrom: number): void {
  if (!Number.isFinite(nnAngstrom) || nnAngstrom <= 0) {
    throw invalid(
      'nearestNeighbourAngstrom',
      `nearest-neighbour distance must be a positive number of Å, got ${nnAngstrom}`,
    );
  }
}

function requireShells(shells: number): void {
  if (!Number.isInteger(shells) || shells < 0)
    throw invalid('shells', `shells must be a whole number ≥ 0, got ${shells}`);
}

/** Collects fcc sites (integer coordinates in units of a/2 with the given parity of x+y+z) passing `keep`. */
function fccSites(
  extent: number,
  parity: 0 | 1,
  keep: (x: number, y: number, z: number) => boolean,
  scale: number,
): Float64Array {
  const out: number[] = [];
  for (let x = -extent; x <= extent; x++) {
    for (let y = -extent; y <= extent; y++) {
      for (let z = -extent; z <= extent; z++) {
        if ((((x + y + z) % 2) + 2) % 2 !== parity) continue;
        if (keep(x, y, z)) out.push(x * scale, y * scale, z * scale);
      }
    }
  }
  return Float64Array.from(out);
}

function finish(shape: ParticleShape, shells: number, positions: Float64Array, nn: number): ClusterGeometry {
  const atoms = positions.length / 3;
  return {
    shape,
    shells,
    atoms,
    positions,
    nearestNeighbourAngstrom: nn,
    equivalentDiameterNm: equivalentDiameterNm(atoms, nn),
  };
}

export function buildCuboctahedron(shells: number, nnAngstrom: number): ClusterGeometry {
  requireShells(shells);
  requireNearestNeighbour(nnAngstrom);
  const n = shells;
  const halfLattice = nnAngstrom / Math.SQRT2; // a/2
  const positions = fccSites(
    2 * n,
    0,
    (x, y, z) =>
      Math.abs(x) <= n && Math.abs(y) <= n && Math.abs(z) <= n && Math.abs(x) + Math.abs(y) + Math.abs(z) <= 2 * n,
    halfLattice,
  );
  return finish('cuboctahedron', shells, positions, nnAngstrom);
}

export function buildTruncatedOctahedron(shells: number, nnAngstrom: number): ClusterGeometry {
  requireShells(shells);
  requireNearestNeighbour(nnAngstrom);
  const n = shells;
  const halfLattice = nnAngstrom / Math.SQRT2;
  const parity = (n % 2) as 0 | 1;
  const positions = fccSites(
    3 * n,
    parity,
    (x, y, z) =>
      Math.abs(x) + Math.abs(y) + Math.abs(z) <= 3 * n &&
      Math.abs(x) <= 2 * n &&
      Math.abs(y) <= 2 * n &&
      Math.abs(z) <= 2 * n,
    halfLattice,
  );
  return finish('truncated-octahedron', shells, positions, nnAngstrom);
}

/** fcc sites within `radiusAngstrom` of a central atom (inclusive, with a relative tolerance of 1e-9). */
export function buildSphereOfRadius(radiusAngstrom: number, nnAngstrom: number, shells: number): ClusterGeometry {
  requireNearestNeighbour(nnAngstrom);
  if (!Number.isFinite(radiusAngstrom) || radiusAngstrom < 0)
    throw invalid('diameterNm', `sphere radius must be ≥ 0, got ${radiusAngstrom} Å`);
  const halfLattice = nnAngstrom / Math.SQRT2;
  const limit = radiusAngstrom * (1 + 1e-9);
  const limitSq = limit * limit;
  const extent = Math.ceil(limit / halfLattice) + 1;
  const positions = fccSites(
    extent,
    0,
    (x, y, z) => (x * x + y * y + z * z) * halfLattice * halfLattice <= limitSq,
    halfLattice,
  );
  return finish('sphere', shells, positions, nnAngstrom);
}

export function buildSphere(shells: number, nnAngstrom: number): ClusterGeometry {
  requireShells(shells);
  return buildSphereOfRadius(shells * nnAngstrom, nnAngstrom, shells);
}

const GOLDEN = (1 + Math.sqrt(5)) / 2;

function icosahedronVertices(): number[][] {
  const raw: number[][] = [];
  for (const s1 of [-1, 1]) {
    for (const s2 of [-1, 1]) {
      raw.push([0, s1, s2 * GOLDEN], [s1, s2 * GOLDEN, 0], [s2 * GOLDEN, 0, s1]);
    }
  }
  const norm = Math.hypot(1, GOLDEN);
  return raw.map((v) => v.map((c) => c / norm));
}

function icosahedronFaces(vertices: number[][]): [number, number, number][] {
  const distance = (a: number[], b: number[]) => Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!);
  let edge = Infinity;
  for (let i = 0; i < vertices.length; i++)
    for (let j = i + 1; j < vertices.length; j++) edge = Math.min(edge, distance(vertices[i]!, vertices[j]!));
  const isEdge = (i: number, j: number) => Math.abs(distance(vertices[i]!, vertices[j]!) - edge) < 1e-9;
  const faces: [number, number, number][] = [];
  for (let i = 0; i < vertices.length; i++) {
    for (let j = i + 1; j < vertices.length; j++) {
      if (!isEdge(i, j)) continue;
      for (let k = j + 1; k < vertices.length; k++) if (isEdge(i, k) && isEdge(j, k)) faces.push([i, j, k]);
    }
  }
  return faces;
}

export function buildIcosahedron(shells: number, nnAngstrom: number): ClusterGeometry {
  requireShells(shells);
  requireNearestNeighbour(nnAngstrom);
  const vertices = icosahedronVertices();
  const faces = icosahedronFaces(vertices);
  const points: number[] = [0, 0, 0];
  for (let k = 1; k <= shells; k++) {
    const seen = new Set<string>();
    for (const [a, b, c] of faces) {
      const va = vertices[a]!;
      const vb = vertices[b]!;
      const vc = vertices[c]!;
      for (let i = 0; i <= k; i++) {
        for (let j = 0; j <= k - i; j++) {
          const x = k * va[0]! + i * (vb[0]! - va[0]!) + j * (vc[0]! - va[0]!);
          const y = k * va[1]! + i * (vb[1]! - va[1]!) + j * (vc[1]! - va[1]!);
          const z = k * va[2]! + i * (vb[2]! - va[2]!) + j * (vc[2]! - va[2]!);
          const key = `${Math.round(x * 1e6)},${Math.round(y * 1e6)},${Math.round(z * 1e6)}`;
          if (seen.has(key)) continue;
          seen.add(key);
          points.push(x, y, z);
        }
      }
    }
  }
  const positions = Float64Array.from(points);
  // Scale so that the mean nearest-neighbour bond equals nnAngstrom. In construction units the radial
  // spacing is 1 and the within-shell spacing is the icosahedron's edge/circumradius, 1.0515; second
  // neighbours lie beyond 1.4, so pairs closer than 1.2 are the nearest-neighbour bonds.
  if (positions.length > 3) {
    const bonds = pairsWithin(positions, 1.2);
    let sum = 0;
    for (let k = 0; k < bonds.count; k++) sum += bonds.distanceAngstrom[k]!;
    const scale = nnAngstrom / (sum / bonds.count);
    for (let i = 0; i < positions.length; i++) positions[i] = positions[i]! * scale;
  }
  return finish('icosahedron', shells, positions, nnAngstrom);
}

/** Closed-form atom count of a shape with `shells` shells (sphere: counted by building, it has no closed form). */
export function shapeAtomCount(shape: ParticleShape, shells: number): number {
  switch (shape) {
    case 'cuboctahedron':
    case 'icosahedron':
      return magicClusterAtoms(shells);
    case 'truncated-octahedron':
      return truncatedOctahedronAtoms(shells + 1);
    case 'sphere':
      return buildSphere(shells, 1).atoms;
  }
}

/** Approximate atom count of a sphere cut of diameter `diameterNm` (bulk density), used for size caps before building. */
export function sphereAtomEstimate(diameterNm: number, nnAngstrom: number): number {
  const latticeNm = (nnAngstrom * Math.SQRT2) / 10;
  return (Math.PI / 6) * diameterNm ** 3 * (4 / latticeNm ** 3);
}

/**
 * The shell count of `shape` whose volume-equivalent diameter is nearest to `diameterNm`: the one rule of
 * geometry/closed-shells.ts, which the prediction's site counts use too (lattice a = √2 · nearest-neighbour).
 */
export function shellsForDiameter(
  shape: Exclude<ParticleShape, 'sphere'>,
  diameterNm: number,
  nnAngstrom: number,
): number {
  if (!Number.isFinite(diameterNm) || diameterNm <= 0)
    throw invalid('diameterNm', `diameter must be a positive number of nm, got ${diameterNm}`);
  requireNearestNeighbour(nnAngstrom);
  return nearestClosedShell(shape, diameterNm, (nnAngstrom * Math.SQRT2) / 10).shells;
}

export type ClusterSize = { shells: number } | { diameterNm: number };

/** Builds `shape` at the given size with nearest-neighbour distance `nnAngstrom`. */
export function buildCluster(shape: ParticleShape, size: ClusterSize, nnAngstrom: number): ClusterGeometry {
  if (!isParticleShape(shape))
    throw invalid('shape', `unknown shape "${String(shape)}"; use one of ${PARTICLE_SHAPES.join(', ')}`);
  if ('diameterNm' in size) {
    if (!Number.isFinite(size.diameterNm) || size.diameterNm <= 0)
      throw invalid('diameterNm', `diameter must be a positive number of nm, got ${size.diameterNm}`);
    if (shape === 'sphere') {
      const radiusAngstrom = (size.diameterNm * 10) / 2;
      return buildSphereOfRadius(radiusAngstrom, nnAngstrom, Math.round(radiusAngstrom / nnAngstrom));
    }
    return buildCluster(shape, { shells: shellsForDiameter(shape, size.diameterNm, nnAngstrom) }, nnAngstrom);
  }
  switch (shape) {
    case 'cuboctahedron':
      return buildCuboctahedron(size.shells, nnAngstrom);
    case 'icosahedron':
      return buildIcosahedron(size.shells, nnAngstrom);
    case 'truncated-octahedron':
      return buildTruncatedOctahedron(size.shells, nnAngstrom);
    case 'sphere':
      return buildSphere(size.shells, nnAngstrom);
  }
}

/** Atom count a size would give, computed without building (closed forms; sphere by volume estimate). */
export function predictedAtomCount(shape: ParticleShape, size: ClusterSize, nnAngstrom: number): number {
  if ('diameterNm' in size) {
    if (shape === 'sphere') return Math.round(sphereAtomEstimate(size.diameterNm, nnAngstrom));
    return shapeAtomCount(shape, shellsForDiameter(shape, size.diameterNm, nnAngstrom));
  }
  if (shape === 'sphere') return Math.round(sphereAtomEstimate((2 * size.shells * nnAngstrom) / 10, nnAngstrom));
  return shapeAtomCount(shape, size.shells);
}
