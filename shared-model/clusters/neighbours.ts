/**
 * Neighbour lists of a fixed set of sites, computed once (cell lists, O(N)) and stored in CSR layout:
 * the neighbours of site i are `neighbours[offsets[i] .. offsets[i+1])`. Each entry also carries a
 * distance class: distinct pair distances (grouped to a relative 1e-10) are numbered so that energy
 * tables can be looked up per class instead of recomputing exponentials in the Monte Carlo loop. An fcc
 * cluster has five classes (the five neighbour shells); an icosahedron has many.
 *
 * Cutoff rule (DOMAIN.md Models 4): the Gupta parameters were fitted with sums over five fcc
 * neighbour shells, so pairs count when closer than 2.35 × the nearest-neighbour distance — between the
 * 5th shell (√5 = 2.236) and the 6th (√6 = 2.449).
 */
import { invalid } from '../api/result';

/** Cutoff as a multiple of the nearest-neighbour distance: between the 5th (√5) and 6th (√6) fcc shells. */
export const FIVE_SHELL_CUTOFF_FACTOR = 2.35;
/** First-shell limit as a multiple of the nearest-neighbour distance: between the 1st (1) and 2nd (√2) fcc shells. */
export const FIRST_SHELL_FACTOR = (1 + Math.SQRT2) / 2;

export interface NeighbourList {
  atoms: number;
  cutoffAngstrom: number;
  /** Length atoms + 1. */
  offsets: Int32Array;
  neighbours: Int32Array;
  /** Distance class of each entry, index into `classDistancesAngstrom`. */
  distanceClass: Uint16Array;
  /** Representative distance of each class (Å), ascending. */
  classDistancesAngstrom: Float64Array;
}

export interface PairsWithin {
  first: Int32Array;
  second: Int32Array;
  distanceAngstrom: Float64Array;
  count: number;
}

/**
 * All pairs i < j closer than `cutoffAngstrom` (strictly), found with a cell list. `check`, when given, is called
 * with the pairs found so far after each cell and before the pair arrays grow; it may throw to stop the search
 * (a compute budget).
 */
export function pairsWithin(
  positions: Float64Array,
  cutoffAngstrom: number,
  check?: (pairsSoFar: number) => void,
): PairsWithin {
  if (!Number.isFinite(cutoffAngstrom) || cutoffAngstrom <= 0)
    throw invalid('cutoffAngstrom', `cutoff must be a positive number of Å, got ${cutoffAngstrom}`);
  if (positions.length % 3 !== 0) throw invalid('positions', 'positions must hold x, y, z for every atom');
  const atoms = positions.length / 3;
  let minX = Infinity;
  let minY = Infinity;
  let minZ = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  let maxZ = -Infinity;
  for (let i = 0; i < atoms; i++) {
    const x = positions[3 * i]!;
    const y = positions[3 * i + 1]!;
    const z = positions[3 * i + 2]!;
    if (!Number.isFinite(x) || !Number.isFinite(y) || !Number.isFinite(z))
      throw invalid('positions', `atom ${i + 1} has a non-finite coordinate`);
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (z < minZ) minZ = z;
    if (x > maxX) maxX = x;
    if (y > maxY) maxY = y;
    if (z > maxZ) maxZ = z;
  }
  const cell = cutoffAngstrom;
  const nx = Math.max(1, Math.floor((maxX - minX) / cell) + 1);
  const ny = Math.max(1, Math.floor((maxY - minY) / cell) + 1);
  const nz = Math.max(1, Math.floor((maxZ - minZ) / cell) + 1);
  const cellCount = nx * ny * nz;
  if (!Number.isSafeInteger(cellCount) || cellCount > 64 * atoms + 1_000_000) {
    throw invalid('positions', 'atoms are spread too thinly for one neighbour grid (is this a cluster in Å?)');
  }
  const cellOf = new Int32Array(atoms);
  const cellStart = new Int32Array(cellCount + 1);
  for (let i = 0; i < atoms; i++) {
    const cx = Math.min(nx - 1, Math.floor((positions[3 * i]! - minX) / cell));
    const cy = Math.min(ny - 1, Math.floor((positions[3 * i + 1]! - minY) / cell));
    const cz = Math.min(nz - 1, Math.floor((positions[3 * i + 2]! - minZ) / cell));
    const c = (cx * ny + cy) * nz + cz;
    cellOf[i] = c;
    cellStart[c + 1]!++;
  }
  for (let c = 0; c < cellCount; c++) cellStart[c + 1]! += cellStart[c]!;
  const fill = cellStart.slice(0, cellCount);
  const members = new Int32Array(atoms);
  for (let i = 0; i < atoms; i++) members[fill[cellOf[i]!]!++] = i;

  let capacity = Math.max(16, atoms * 48);
  let first = new Int32Array(capacity);
  let second = new Int32Array(capacity);
  let distance = new Float64Array(capacity);
  let count = 0;
  const cutSq = cutoffAngstrom * cutoffAngstrom;
  for (let cx = 0; cx < nx; cx++) {
    for (let cy = 0; cy < ny; cy++) {
      for (let cz = 0; cz < nz; cz++) {
        const c = (cx * ny + cy) * nz + cz;
        if (check && (c & 255) === 0) check(count);
        for (let dx = -1; dx <= 1; dx++) {
          const ox = cx + dx;
          if (ox < 0 || ox >= nx) continue;
          for (let dy = -1; dy <= 1; dy++) {
            const oy = cy + dy;
            if (oy < 0 || oy >= ny) continue;
            for (let dz = -1; dz <= 1; dz++) {
              const oz = cz + dz;
              if (oz < 0 || oz >= nz) continue;
              const o = (ox * ny + oy) * nz + oz;
              if (o < c) continue;
              for (let a = cellStart[c]!; a < cellStart[c + 1]!; a++) {
                const i = members[a]!;
                const xi = positions[3 * i]!;
                const yi = positions[3 * i + 1]!;
                const zi = positions[3 * i + 2]!;
                for (let b = o === c ? a + 1 : cellStart[o]!; b < cellStart[o + 1]!; b++) {
                  const j = members[b]!;
                  const rx = positions[3 * j]! - xi;
                  const ry = positions[3 * j + 1]! - yi;
                  const rz = positions[3 * j + 2]! - zi;
                  const d2 = rx * rx + ry * ry + rz * rz;
                  if (d2 >= cutSq) continue;
                  if (count === capacity) {
                    check?.(count);
                    capacity *= 2;
                    const f = new Int32Array(capacity);
                    f.set(first);
                    first = f;
                    const s = new Int32Array(capacity);
                    s.set(second);
                    second = s;
                    const d = new Float64Array(capacity);
                    d.set(distance);
                    distance = d;
                  }
                  first[count] = Math.min(i, j);
                  second[count] = Math.max(i, j);
                  distance[count] = Math.sqrt(d2);
                  count++;
                }
              }
            }
          }
        }
      }
    }
  }
  check?.(count);
  return { first, second, distanceAngstrom: distance, count };
}

/** CSR neighbour list with distance classes for pairs closer than `cutoffAngstrom`. */
export function buildNeighbourList(positions: Float64Array, cutoffAngstrom: number): NeighbourList {
  const atoms = positions.length / 3;
  const pairs = pairsWithin(positions, cutoffAngstrom);
  const { first, second, distanceAngstrom, count } = pairs;

  // Distance classes: sort the distances, group consecutive values within a relative 1e-10.
  const sorted = distanceAngstrom.slice(0, count).sort();
  const classes: number[] = [];
  for (let k = 0; k < count; k++) {
    const d = sorted[k]!;
    const last = classes.length > 0 ? classes[classes.length - 1]! : -Infinity;
    if (d - last > 1e-10 * d) classes.push(d);
  }
  if (classes.length > 65535) {
    throw invalid(
      'atoms',
      `this structure has ${classes.length} distinct neighbour distances; at most 65535 are supported`,
    );
  }
  const classDistances = Float64Array.from(classes);
  const classOfDistance = (d: number): number => {
    // Largest class start ≤ d (classes are group starts; members lie within 1e-10 relative above it).
    let lo = 0;
    let hi = classDistances.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (classDistances[mid]! <= d) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  };

  const degree = new Int32Array(atoms + 1);
  for (let k = 0; k < count; k++) {
    degree[first[k]! + 1]!++;
    degree[second[k]! + 1]!++;
  }
  const offsets = new Int32Array(atoms + 1);
  for (let i = 0; i < atoms; i++) offsets[i + 1] = offsets[i]! + degree[i + 1]!;
  const cursor = offsets.slice(0, atoms);
  const neighbours = new Int32Array(2 * count);
  const distanceClass = new Uint16Array(2 * count);
  for (let k = 0; k < count; k++) {
    const i = first[k]!;
    const j = second[k]!;
    const cls = classOfDistance(distanceAngstrom[k]!);
    const ei = cursor[i]!++;
    neighbours[ei] = j;
    distanceClass[ei] = cls;
    const ej = cursor[j]!++;
    neighbours[ej] = i;
    distanceClass[ej] = cls;
  }
  // Sort each row by neighbour index: deterministic order and friendlier memory access.
  for (let i = 0; i < atoms; i++) {
    const start = offsets[i]!;
    const end = offsets[i + 1]!;
    for (let a = start + 1; a < end; a++) {
      const n = neighbours[a]!;
      const c = distanceClass[a]!;
      let b = a - 1;
      while (b >= start && neighbours[b]! > n) {
        neighbours[b + 1] = neighbours[b]!;
        distanceClass[b + 1] = distanceClass[b]!;
        b--;
      }
      neighbours[b + 1] = n;
      distanceClass[b + 1] = c;
    }
  }
  return { atoms, cutoffAngstrom, offsets, neighbours, distanceClass, classDistancesAngstrom: classDistances };
}

/** Number of first-shell neighbours of each site (closer than FIRST_SHELL_FACTOR × nn), restricted to `present` sites when given. */
export function coordinationNumbers(list: NeighbourList, nnAngstrom: number, present?: Uint8Array): Uint8Array {
  const limit = FIRST_SHELL_FACTOR * nnAngstrom;
  const firstShell = new Uint8Array(list.classDistancesAngstrom.length);
  for (let c = 0; c < firstShell.length; c++) firstShell[c] = list.classDistancesAngstrom[c]! < limit ? 1 : 0;
  const out = new Uint8Array(list.atoms);
  for (let i = 0; i < list.atoms; i++) {
    if (present && !present[i]) continue;
    let n = 0;
    for (let e = list.offsets[i]!; e < list.offsets[i + 1]!; e++) {
      if (firstShell[list.distanceClass[e]!] && (!present || present[list.neighbours[e]!])) n++;
    }
    out[i] = n;
  }
  return out;
}
