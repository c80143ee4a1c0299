/**
 * Canonical (fixed composition) swap Monte Carlo of a binary A–B particle on fixed sites, Metropolis
 * acceptance, Gupta energy (DOMAIN.md Models 4).
 *
 * A move picks one A atom and one B atom at random and proposes to exchange them. The energy change
 * is computed locally: only the pair terms of the two atoms and the band densities of the two atoms
 * and their neighbours change, so a move costs O(neighbours), not O(N). Densities ρ_i are kept in a
 * typed array and updated on acceptance; nothing is allocated inside the loop.
 *
 * Randomness: a seeded sfc32 generator (the same algorithm as `shared-model/random.ts`), inlined for
 * speed and seeded from the `SeededRandom` passed in, so a run repeats exactly from its seed.
 */
import type { SeededRandom } from '../random';
import type { NeighbourList } from '../clusters/neighbours';
import { guptaPair, pairDensityEv2, pairRepulsionEv, type GuptaPairParameters } from './gupta-parameters';

/** Boltzmann constant (eV/K), CODATA 2018 exact value 8.617333262e-5. */
export const BOLTZMANN_EV_PER_K = 8.617333262e-5;

export interface BinaryTables {
  elements: readonly [string, string];
  /** AA, AB, BB parameters. */
  pairs: readonly [GuptaPairParameters, GuptaPairParameters, GuptaPairParameters];
  /** Pair repulsion φ per distance class and pair type t = sA + sB (0 AA, 1 AB, 2 BB): index class*3 + t (eV). */
  phi: Float64Array;
  /** Density contribution per class and pair type (eV²). */
  rho: Float64Array;
}

/** Per-class energy tables of the pair (elementA, elementB) for the distances of `list`, optionally scaled. */
export function binaryTables(elementA: string, elementB: string, list: NeighbourList, distanceScale = 1): BinaryTables {
  const pairs = [guptaPair(elementA, elementA), guptaPair(elementA, elementB), guptaPair(elementB, elementB)] as const;
  const classes = list.classDistancesAngstrom.length;
  const phi = new Float64Array(classes * 3);
  const rho = new Float64Array(classes * 3);
  for (let c = 0; c < classes; c++) {
    const r = list.classDistancesAngstrom[c]! * distanceScale;
    for (let t = 0; t < 3; t++) {
      phi[c * 3 + t] = pairRepulsionEv(pairs[t]!, r);
      rho[c * 3 + t] = pairDensityEv2(pairs[t]!, r);
    }
  }
  return { elements: [elementA, elementB], pairs, phi, rho };
}

/**
 * Energy (eV) of an occupation (0 = A, 1 = B) on the sites of `list` with `tables`, from scratch. When
 * `densities` is given, each site's band density ρ_i and √ρ_i are written into it on the way.
 */
function energyFromScratch(
  list: NeighbourList,
  tables: BinaryTables,
  species: Uint8Array,
  densities?: { density: Float64Array; sqrtDensity: Float64Array },
): number {
  const { offsets, neighbours, distanceClass } = list;
  const { phi, rho } = tables;
  let pair = 0;
  let band = 0;
  for (let i = 0; i < list.atoms; i++) {
    const si = species[i]!;
    let density = 0;
    for (let e = offsets[i]!; e < offsets[i + 1]!; e++) {
      const idx = distanceClass[e]! * 3 + si + species[neighbours[e]!]!;
      pair += phi[idx]!;
      density += rho[idx]!;
    }
    const root = Math.sqrt(density);
    if (densities) {
      densities.density[i] = density;
      densities.sqrtDensity[i] = root;
    }
    band += root;
  }
  return pair / 2 - band;
}

/** Energy (eV) of an occupation (0 = A, 1 = B) on the sites of `list` with `tables`, from scratch. */
export function configurationEnergyEv(list: NeighbourList, tables: BinaryTables, species: Uint8Array): number {
  return energyFromScratch(list, tables, species);
}

export interface SwapStatistics {
  attempts: number;
  accepted: number;
}

/**
 * The Metropolis loop. Written as one closure over typed arrays with the local energy change inlined
 * (two paths: sites more than two cutoffs apart share no neighbour and need one pass each; otherwise
 * density changes are accumulated first so a shared neighbour is embedded once). A closure rather than
 * module functions over a state object: V8 specialises the first closure of a process to its arrays
 * (measured ~1.3× faster), and a run gets a fresh worker thread.
 */
interface Kernel {
  /** Runs `attempts` attempts at inverse temperature `beta` (1/eV); returns accepted moves. */
  run(attempts: number, beta: number): number;
  /** ΔE of exchanging A site i and B site j, not applied (touched buffers hold the new densities). */
  delta(i: number, j: number): number;
}

interface KernelState {
  offsets: Int32Array;
  /** Per neighbour entry: (neighbour index << 8) | (distance class << 1). */
  packed: Int32Array;
  positions: Float64Array;
  farSq: number;
  species: Uint8Array;
  surface: Uint8Array;
  density: Float64Array;
  sqrtDensity: Float64Array;
  dRho: Float64Array;
  dPhi: Float64Array;
  listA: Int32Array;
  listB: Int32Array;
  slot: Int32Array;
  /** [0..3] generator state. */
  rng: Int32Array;
  /** [0] energy, [1] accepted ΔE sum, [2] B atoms on surface sites. */
  totals: Float64Array;
}

/** Most distinct neighbour distances the packed layout holds (fcc shapes have 5, the Mackay icosahedron 13). */
export const MAX_DISTANCE_CLASSES = 127;

function createKernel(state: KernelState): Kernel {
  const {
    offsets,
    packed,
    positions,
    farSq,
    species,
    surface,
    density,
    sqrtDensity,
    dRho,
    dPhi,
    listA,
    listB,
    slot,
    rng,
    totals,
  } = state;
  const atoms = species.length;
  let maxDegree = 0;
  for (let i = 0; i < atoms; i++) maxDegree = Math.max(maxDegree, offsets[i + 1]! - offsets[i]!);
  const pending = new Float64Array(atoms);
  const touchedSite = new Int32Array(2 * maxDegree + 2);
  const touchedDensity = new Float64Array(2 * maxDegree + 2);
  const touchedSqrt = new Float64Array(2 * maxDegree + 2);
  /** Sites touched by the last trial; −1 after a far trial, whose sites are N(i), i, N(j), j in order. */
  let touched = 0;

  function delta(i: number, j: number): number {
    let dE = 0;
    let t = 0;
    const rx = positions[3 * i]! - positions[3 * j]!;
    const ry = positions[3 * i + 1]! - positions[3 * j + 1]!;
    const rz = positions[3 * i + 2]! - positions[3 * j + 2]!;
    if (rx * rx + ry * ry + rz * rz >= farSq) {
      // Far: no site neighbours both, so each touched density changes by one term; one pass per atom.
      let sum = 0;
      for (let e = offsets[i]!, end = offsets[i + 1]!; e < end; e++) {
        const p = packed[e]!;
        const k = p >> 8;
        const idx = (p & 255) + species[k]!;
        const d = dRho[idx]!;
        sum += d;
        const nr = density[k]! + d;
        const root = Math.sqrt(nr);
        dE += dPhi[idx]! + sqrtDensity[k]! - root;
        touchedDensity[t] = nr;
        touchedSqrt[t] = root;
        t++;
      }
      let nr = density[i]! + sum;
      let root = Math.sqrt(nr);
      dE += sqrtDensity[i]! - root;
      touchedDensity[t] = nr;
      touchedSqrt[t] = root;
      t++;
      sum = 0;
      for (let e = offsets[j]!, end = offsets[j + 1]!; e < end; e++) {
        const p = packed[e]!;
        const k = p >> 8;
        const idx = (p & 255) + species[k]!;
        const d = dRho[idx]!;
        sum += d;
        const nk = density[k]! - d;
        const rk = Math.sqrt(nk);
        dE += sqrtDensity[k]! - rk - dPhi[idx]!;
        touchedDensity[t] = nk;
        touchedSqrt[t] = rk;
        t++;
      }
      nr = density[j]! - sum;
      root = Math.sqrt(nr);
      dE += sqrtDensity[j]! - root;
      touchedDensity[t] = nr;
      touchedSqrt[t] = root;
      touched = -1;
      return dE;
    }
    // Near: i turns A → B, j turns B → A; the i–j pair is A–B before and after and is skipped.
    let sumI = 0;
    for (let e = offsets[i]!, end = offsets[i + 1]!; e < end; e++) {
      const p = packed[e]!;
      const k = p >> 8;
      if (k === j) continue;
      const idx = (p & 255) + species[k]!;
      const d = dRho[idx]!;
      pending[k] = pending[k]! + d;
      sumI += d;
      dE += dPhi[idx]!;
    }
    pending[i] = pending[i]! + sumI;
    let sumJ = 0;
    for (let e = offsets[j]!, end = offsets[j + 1]!; e < end; e++) {
      const p = packed[e]!;
      const k = p >> 8;
      if (k === i) continue;
      const idx = (p & 255) + species[k]!;
      const d = dRho[idx]!;
      pending[k] = pending[k]! - d;
      sumJ -= d;
      dE -= dPhi[idx]!;
    }
    pending[j] = pending[j]! + sumJ;
    // Embedding change −(√ρ' − √ρ) of every touched site once (pending is cleared as it is read).
    for (let pass = 0; pass < 2; pass++) {
      const centre = pass === 0 ? i : j;
      let q = pending[centre]!;
      if (q !== 0) {
        pending[centre] = 0;
        const nr = density[centre]! + q;
        const root = Math.sqrt(nr);
        dE += sqrtDensity[centre]! - root;
        touchedSite[t] = centre;
        touchedDensity[t] = nr;
        touchedSqrt[t] = root;
        t++;
      }
      for (let e = offsets[centre]!, end = offsets[centre + 1]!; e < end; e++) {
        const k = packed[e]! >> 8;
        q = pending[k]!;
        if (q === 0) continue;
        pending[k] = 0;
        const nr = density[k]! + q;
        const root = Math.sqrt(nr);
        dE += sqrtDensity[k]! - root;
        touchedSite[t] = k;
        touchedDensity[t] = nr;
        touchedSqrt[t] = root;
        t++;
      }
    }
    touched = t;
    return dE;
  }

  /** Writes the densities of the last trial (i A → B, j B → A) back. */
  function commit(i: number, j: number): void {
    if (touched < 0) {
      let t = 0;
      for (let e = offsets[i]!, end = offsets[i + 1]!; e < end; e++) {
        const k = packed[e]! >> 8;
        density[k] = touchedDensity[t]!;
        sqrtDensity[k] = touchedSqrt[t]!;
        t++;
      }
      density[i] = touchedDensity[t]!;
      sqrtDensity[i] = touchedSqrt[t]!;
      t++;
      for (let e = offsets[j]!, end = offsets[j + 1]!; e < end; e++) {
        const k = packed[e]! >> 8;
        density[k] = touchedDensity[t]!;
        sqrtDensity[k] = touchedSqrt[t]!;
        t++;
      }
      density[j] = touchedDensity[t]!;
      sqrtDensity[j] = touchedSqrt[t]!;
    } else {
      for (let k = 0; k < touched; k++) {
        const site = touchedSite[k]!;
        density[site] = touchedDensity[k]!;
        sqrtDensity[site] = touchedSqrt[k]!;
      }
    }
  }

  function run(attempts: number, beta: number): number {
    const nA = listA.length;
    const nB = listB.length;
    const scaleA = nA / 4294967296;
    const scaleB = nB / 4294967296;
    let a = rng[0]!;
    let b = rng[1]!;
    let c = rng[2]!;
    let d = rng[3]!;
    let energy = totals[0]!;
    let deltaSum = totals[1]!;
    let surfaceB = totals[2]!;
    let accepted = 0;
    for (let n = 0; n < attempts; n++) {
      let t = (((a + b) | 0) + d) | 0;
      d = (d + 1) | 0;
      a = b ^ (b >>> 9);
      b = (c + (c << 3)) | 0;
      c = (c << 21) | (c >>> 11);
      c = (c + t) | 0;
      const slotI = ((t >>> 0) * scaleA) | 0;
      t = (((a + b) | 0) + d) | 0;
      d = (d + 1) | 0;
      a = b ^ (b >>> 9);
      b = (c + (c << 3)) | 0;
      c = (c << 21) | (c >>> 11);
      c = (c + t) | 0;
      const slotJ = ((t >>> 0) * scaleB) | 0;
      const i = listA[slotI]!;
      const j = listB[slotJ]!;
      const dE = delta(i, j);
      if (dE > 0) {
        t = (((a + b) | 0) + d) | 0;
        d = (d + 1) | 0;
        a = b ^ (b >>> 9);
        b = (c + (c << 3)) | 0;
        c = (c << 21) | (c >>> 11);
        c = (c + t) | 0;
        if ((t >>> 0) / 4294967296 >= Math.exp(-dE * beta)) continue;
      }
      commit(i, j);
      species[i] = 1;
      species[j] = 0;
      listA[slotI] = j;
      listB[slotJ] = i;
      slot[j] = slotI;
      slot[i] = slotJ;
      surfaceB += surface[i]! - surface[j]!;
      energy += dE;
      deltaSum += dE;
      accepted++;
    }
    rng[0] = a;
    rng[1] = b;
    rng[2] = c;
    rng[3] = d;
    totals[0] = energy;
    totals[1] = deltaSum;
    totals[2] = surfaceB;
    return accepted;
  }

  return { run, delta };
}

export class SwapEngine {
  readonly atoms: number;
  readonly list: NeighbourList;
  readonly tables: BinaryTables;
  /** 0 = A, 1 = B per site. Read it; change it only through the engine. */
  readonly species: Uint8Array;
  /** 1 for surface sites (used for the running surface composition). */
  readonly surface: Uint8Array;
  readonly surfaceSites: number;
  readonly countA: number;
  readonly countB: number;
  readonly stats: SwapStatistics = { attempts: 0, accepted: 0 };

  private readonly density: Float64Array;
  private readonly sqrtDensity: Float64Array;
  private readonly totals = new Float64Array(3);
  private readonly kernel: Kernel;

  constructor(
    list: NeighbourList,
    positions: Float64Array,
    tables: BinaryTables,
    species: Uint8Array,
    surface: Uint8Array,
    random: SeededRandom,
  ) {
    if (species.length !== list.atoms || surface.length !== list.atoms)
      throw new RangeError('species and surface arrays must have one entry per site');
    if (positions.length !== 3 * list.atoms) throw new RangeError('positions must hold x, y, z for every site');
    const n = list.atoms;
    this.atoms = n;
    this.list = list;
    this.tables = tables;
    this.species = Uint8Array.from(species);
    this.surface = Uint8Array.from(surface);
    this.density = new Float64Array(n);
    this.sqrtDensity = new Float64Array(n);
    const classes = list.classDistancesAngstrom.length;
    // Change of density/repulsion seen from a neighbour of species s when an atom turns from A to B: index class*2 + s.
    const dRho = new Float64Array(classes * 2);
    const dPhi = new Float64Array(classes * 2);
    for (let c = 0; c < classes; c++) {
      for (let s = 0; s < 2; s++) {
        dRho[c * 2 + s] = tables.rho[c * 3 + 1 + s]! - tables.rho[c * 3 + s]!;
        dPhi[c * 2 + s] = tables.phi[c * 3 + 1 + s]! - tables.phi[c * 3 + s]!;
      }
    }
    let countB = 0;
    for (let i = 0; i < n; i++) {
      if (this.species[i]! > 1) throw new RangeError('species must be 0 (A) or 1 (B)');
      countB += this.species[i]!;
    }
    this.countB = countB;
    this.countA = n - countB;
    const listA = new Int32Array(this.countA);
    const listB = new Int32Array(this.countB);
    const slot = new Int32Array(n);
    let a = 0;
    let b = 0;
    let surfaceSites = 0;
    let surfaceB = 0;
    for (let i = 0; i < n; i++) {
      if (this.species[i] === 0) {
        slot[i] = a;
        listA[a++] = i;
      } else {
        slot[i] = b;
        listB[b++] = i;
      }
      surfaceSites += this.surface[i]!;
      if (this.surface[i] && this.species[i]) surfaceB++;
    }
    this.surfaceSites = surfaceSites;
    const rng = new Int32Array(4);
    for (let k = 0; k < 4; k++) rng[k] = Math.floor(random.next() * 4294967296) | 0;
    this.totals[2] = surfaceB;
    if (classes > MAX_DISTANCE_CLASSES)
      throw new RangeError(
        `the engine handles at most ${MAX_DISTANCE_CLASSES} distinct neighbour distances, this structure has ${classes}`,
      );
    if (n >= 1 << 23) throw new RangeError(`the engine handles fewer than ${1 << 23} sites`);
    const packed = new Int32Array(list.neighbours.length);
    for (let e = 0; e < packed.length; e++) packed[e] = (list.neighbours[e]! << 8) | (list.distanceClass[e]! << 1);
    this.kernel = createKernel({
      offsets: list.offsets,
      packed,
      positions,
      farSq: (2 * list.cutoffAngstrom) ** 2,
      species: this.species,
      surface: this.surface,
      density: this.density,
      sqrtDensity: this.sqrtDensity,
      dRho,
      dPhi,
      listA,
      listB,
      slot,
      rng,
      totals: this.totals,
    });
    this.recomputeEnergy();
  }

  /** Recomputes every density and the total energy from the occupation (removes round-off drift). */
  recomputeEnergy(): number {
    this.totals[0] = energyFromScratch(this.list, this.tables, this.species, {
      density: this.density,
      sqrtDensity: this.sqrtDensity,
    });
    return this.totals[0];
  }

  /** Current total energy (eV), kept up to date by accepted moves. */
  get energyEv(): number {
    return this.totals[0]!;
  }

  /** Sum of the accepted local energy changes since construction (for the bookkeeping check). */
  get acceptedDeltaSumEv(): number {
    return this.totals[1]!;
  }

  /** B atoms on surface sites. */
  get surfaceCountB(): number {
    return this.totals[2]!;
  }

  /** Fraction of surface sites held by B. */
  get surfaceXB(): number {
    return this.surfaceSites === 0 ? 0 : this.totals[2]! / this.surfaceSites;
  }

  /** Energy change (eV) of exchanging A site `i` with B site `j`, without applying it. */
  trialSwapDeltaEv(i: number, j: number): number {
    if (this.species[i] !== 0 || this.species[j] !== 1)
      throw new RangeError('a trial swap needs an A site first and a B site second');
    return this.kernel.delta(i, j);
  }

  /** Runs `attempts` Metropolis swap attempts at `temperatureK`; returns the number accepted. */
  runAttempts(attempts: number, temperatureK: number): number {
    if (!(temperatureK > 0) || !Number.isFinite(temperatureK))
      throw new RangeError(`temperature must be > 0 K, got ${temperatureK}`);
    if (!Number.isInteger(attempts) || attempts < 0)
      throw new RangeError(`attempts must be a whole number ≥ 0, got ${attempts}`);
    let accepted = 0;
    if (this.countA > 0 && this.countB > 0)
      accepted = this.kernel.run(attempts, 1 / (BOLTZMANN_EV_PER_K * temperatureK));
    this.stats.attempts += attempts;
    this.stats.accepted += accepted;
    return accepted;
  }
}
