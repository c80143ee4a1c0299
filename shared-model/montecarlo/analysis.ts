/**
 * What a final (or sampled) occupation of a binary particle says: surface sites by coordination,
 * surface composition, a radial composition profile layer by layer, the Warren–Cowley short-range
 * order of nearest neighbours, and the architecture label from THE classifier
 * (`shared-model/architecture/classify.ts`).
 */
import {
  classifyArchitecture,
  DEFAULT_THRESHOLDS,
  type Classification,
  type ClassificationThresholds,
} from '../architecture/classify';
import { coordinationNumbers, FIRST_SHELL_FACTOR, type NeighbourList } from '../clusters/neighbours';

/** Bulk fcc (and icosahedral interior) coordination: a site with fewer first-shell neighbours is a surface site. */
export const BULK_COORDINATION = 12;

/** 1 for sites with fewer than 12 nearest neighbours (the particle's surface). */
export function surfaceSites(list: NeighbourList, nnAngstrom: number): Uint8Array {
  const cn = coordinationNumbers(list, nnAngstrom);
  const out = new Uint8Array(list.atoms);
  for (let i = 0; i < list.atoms; i++) out[i] = cn[i]! < BULK_COORDINATION ? 1 : 0;
  return out;
}

/**
 * Layer index of every site counted from the surface: layer 0 = surface sites; remove them and the
 * under-coordinated sites of what remains form layer 1; and so on to the centre ("onion peeling").
 * For a cuboctahedron or icosahedron the layers are exactly its geometric shells.
 */
export function layersFromSurface(list: NeighbourList, nnAngstrom: number): Int32Array {
  const layer = new Int32Array(list.atoms).fill(-1);
  const present = new Uint8Array(list.atoms).fill(1);
  let remaining = list.atoms;
  for (let depth = 0; remaining > 0; depth++) {
    const cn = coordinationNumbers(list, nnAngstrom, present);
    const peel: number[] = [];
    for (let i = 0; i < list.atoms; i++) if (present[i] && cn[i]! < BULK_COORDINATION) peel.push(i);
    if (peel.length === 0) {
      // A fully coordinated remnant with no under-coordinated site cannot occur in a finite cluster; guard anyway.
      for (let i = 0; i < list.atoms; i++) if (present[i]) peel.push(i);
    }
    for (const i of peel) {
      layer[i] = depth;
      present[i] = 0;
    }
    remaining -= peel.length;
  }
  return layer;
}

export interface RadialLayer {
  /** 0 = surface. */
  layerFromSurface: number;
  atoms: number;
  /** Fraction of this layer's sites held by B. */
  xB: number;
  /** Mean distance of the layer's sites from the particle's centroid (Å). */
  meanRadiusAngstrom: number;
}

export interface NeighbourOrder {
  /** Nearest-neighbour bonds in the particle. */
  bonds: number;
  unlikeBonds: number;
  /** Unlike bonds expected if the same atoms were placed at random on the same sites: bonds × 2nAnB/(N(N−1)). */
  randomUnlikeBonds: number;
  /** unlikeBonds / randomUnlikeBonds (1 = random; < 1 like atoms cluster; > 1 ordering). */
  unlikeNeighbourRatio: number;
  /** Warren–Cowley α of the first shell, 1 − unlikeNeighbourRatio (0 random, > 0 segregating, < 0 ordering). */
  warrenCowley: number;
}

export interface ParticleAnalysis {
  atoms: number;
  countA: number;
  countB: number;
  xB: number;
  surfaceSites: number;
  /** Fraction of surface sites held by B. */
  surfaceXB: number;
  /** Fraction of surface sites held by each element (symbol → share). */
  surfaceComposition: Record<string, number>;
  /** Fraction of each element's atoms that sit on the surface (symbol → share). */
  fractionAtSurface: Record<string, number>;
  /** From the centre outward (last entry = surface). */
  radialProfile: RadialLayer[];
  order: NeighbourOrder;
}

export interface ParticleSites {
  list: NeighbourList;
  positions: Float64Array;
  nearestNeighbourAngstrom: number;
  surface: Uint8Array;
  layers: Int32Array;
}

export function describeSites(list: NeighbourList, positions: Float64Array, nnAngstrom: number): ParticleSites {
  return {
    list,
    positions,
    nearestNeighbourAngstrom: nnAngstrom,
    surface: surfaceSites(list, nnAngstrom),
    layers: layersFromSurface(list, nnAngstrom),
  };
}

export function neighbourOrder(list: NeighbourList, nnAngstrom: number, species: Uint8Array): NeighbourOrder {
  const limit = FIRST_SHELL_FACTOR * nnAngstrom;
  let bonds = 0;
  let unlike = 0;
  let countB = 0;
  for (let i = 0; i < list.atoms; i++) {
    countB += species[i]!;
    for (let e = list.offsets[i]!; e < list.offsets[i + 1]!; e++) {
      const j = list.neighbours[e]!;
      if (j <= i || list.classDistancesAngstrom[list.distanceClass[e]!]! >= limit) continue;
      bonds++;
      if (species[i] !== species[j]) unlike++;
    }
  }
  const n = list.atoms;
  const countA = n - countB;
  const randomUnlike = n > 1 ? (bonds * 2 * countA * countB) / (n * (n - 1)) : 0;
  const ratio = randomUnlike > 0 ? unlike / randomUnlike : 1;
  return {
    bonds,
    unlikeBonds: unlike,
    randomUnlikeBonds: randomUnlike,
    unlikeNeighbourRatio: ratio,
    warrenCowley: 1 - ratio,
  };
}

export function analyseParticle(
  sites: ParticleSites,
  species: Uint8Array,
  elementA: string,
  elementB: string,
): ParticleAnalysis {
  const { list, positions, surface, layers } = sites;
  const n = list.atoms;
  let countB = 0;
  let surfaceCount = 0;
  let surfaceB = 0;
  let cx = 0;
  let cy = 0;
  let cz = 0;
  let maxLayer = 0;
  for (let i = 0; i < n; i++) {
    countB += species[i]!;
    surfaceCount += surface[i]!;
    if (surface[i] && species[i]) surfaceB++;
    cx += positions[3 * i]!;
    cy += positions[3 * i + 1]!;
    cz += positions[3 * i + 2]!;
    if (layers[i]! > maxLayer) maxLayer = layers[i]!;
  }
  cx /= n;
  cy /= n;
  cz /= n;
  const countA = n - countB;
  const layerAtoms = new Float64Array(maxLayer + 1);
  const layerB = new Float64Array(maxLayer + 1);
  const layerRadius = new Float64Array(maxLayer + 1);
  for (let i = 0; i < n; i++) {
    const l = layers[i]!;
    layerAtoms[l]!++;
    layerB[l]! += species[i]!;
    layerRadius[l]! += Math.hypot(positions[3 * i]! - cx, positions[3 * i + 1]! - cy, positions[3 * i + 2]! - cz);
  }
  const radialProfile: RadialLayer[] = [];
  for (let l = maxLayer; l >= 0; l--) {
    if (layerAtoms[l] === 0) continue;
    radialProfile.push({
      layerFromSurface: l,
      atoms: layerAtoms[l]!,
      xB: layerB[l]! / layerAtoms[l]!,
      meanRadiusAngstrom: layerRadius[l]! / layerAtoms[l]!,
    });
  }
  const surfaceXB = surfaceCount > 0 ? surfaceB / surfaceCount : 0;
  return {
    atoms: n,
    countA,
    countB,
    xB: countB / n,
    surfaceSites: surfaceCount,
    surfaceXB,
    surfaceComposition: { [elementA]: 1 - surfaceXB, [elementB]: surfaceXB },
    fractionAtSurface: {
      [elementA]: countA > 0 ? (surfaceCount - surfaceB) / countA : 0,
      [elementB]: countB > 0 ? surfaceB / countB : 0,
    },
    radialProfile,
    order: neighbourOrder(list, sites.nearestNeighbourAngstrom, species),
  };
}

/** The architecture label from the shared classifier, fed with the particle's numbers. */
export function classifyParticle(
  elementA: string,
  elementB: string,
  xB: number,
  surfaceXB: number,
  unlikeNeighbourRatio: number,
  thresholds: ClassificationThresholds = DEFAULT_THRESHOLDS,
): Classification {
  return classifyArchitecture({ elementA, elementB, xB, surfaceXB, unlikeNeighbourRatio }, thresholds);
}
