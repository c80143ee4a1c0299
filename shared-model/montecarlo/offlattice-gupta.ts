/**
 * The Gupta energy off the lattice: a smooth function of the positions, with analytic forces.
 *
 * Per element pair a–b both the repulsion and the density term are multiplied by the quintic switch
 * S(x) = 1 − 10x³ + 15x⁴ − 6x⁵, x = (r − rc1)/(rc2 − rc1), with rc1 = (√5 + 0.35(√6 − √5))·r0_ab and
 * rc2 = (√5 + 0.65(√6 − √5))·r0_ab: the window lies between the 5th and 6th fcc neighbour shells of that
 * pair's own r0, so on a pure metal's own lattice no distance falls in it and the energy is exactly the
 * five-shell sum the parameters were fitted with (Cleri & Rosato, Phys. Rev. B 48, 22 (1993)). S is
 * continuous with its first and second derivatives at both ends (common practice for smooth cut-offs).
 *
 * E = Σ_{i<j} φ_ab(r_ij) − Σ_i √ρ_i,  φ_ab = 2A_ab e^{−p_ab(r/r0_ab − 1)}·S_ab,  ρ_i = Σ_j ξ_ab² e^{−2q_ab(r/r0_ab − 1)}·S_ab.
 * Force on i: F_i = −Σ_j [φ'(r_ij) − (1/(2√ρ_i) + 1/(2√ρ_j))·ρ'(r_ij)]·(r_i − r_j)/r_ij.
 *
 * Atoms carry a type index into the model's element list; neighbours are found with a Verlet list
 * (cut-off = the largest rc2 + a skin) rebuilt when atoms have moved far enough to matter.
 */
import { DomainError, invalid } from '../api/result';
import { pairsWithin } from '../clusters/neighbours';
import { guptaElement, guptaPair } from './gupta-parameters';

/** Where the switch window starts and ends between the 5th (√5) and 6th (√6) shells, as fractions of the gap. */
export const SWITCH_START_FRACTION = 0.35;
export const SWITCH_END_FRACTION = 0.65;
const SQRT5 = Math.sqrt(5);
const SQRT6 = Math.sqrt(6);
export const SWITCH_START_FACTOR = SQRT5 + SWITCH_START_FRACTION * (SQRT6 - SQRT5);
export const SWITCH_END_FACTOR = SQRT5 + SWITCH_END_FRACTION * (SQRT6 - SQRT5);

/** Atoms closer than this fraction of the smallest r0 of their pair are overlapping: the energy has no meaning there. */
export const OVERLAP_FRACTION = 0.5;

/** S(x) on [0, 1] (1 below, 0 above). */
export function quinticSwitch(x: number): number {
  if (x <= 0) return 1;
  if (x >= 1) return 0;
  return 1 - x * x * x * (10 - 15 * x + 6 * x * x);
}

/** dS/dx. */
export function quinticSwitchDerivative(x: number): number {
  if (x <= 0 || x >= 1) return 0;
  const y = x * (1 - x);
  return -30 * y * y;
}

/** Values per ordered type pair (a·m + b) in `table`, stride PAIR_STRIDE. */
const PAIR_STRIDE = 8;
const SLOT_TWO_A = 0;
const SLOT_P = 1;
const SLOT_INV_R0 = 2;
const SLOT_XI2 = 3;
const SLOT_TWO_Q = 4;
const SLOT_RC1 = 5;
const SLOT_RC2 = 6;
const SLOT_INV_WIDTH = 7;

export interface PairTerms {
  phi: number;
  dPhi: number;
  rho: number;
  dRho: number;
}

/** The parameters of a set of metals, with the per-pair switch windows. */
export class OffLatticeGupta {
  readonly elements: readonly string[];
  readonly types: number;
  /** PAIR_STRIDE numbers per ordered pair of types. */
  readonly table: Float64Array;
  /** Largest rc2 over the pairs (Å). */
  readonly maxCutoffAngstrom: number;
  /** Smallest r0 over the pairs (Å), for the overlap test. */
  readonly minR0Angstrom: number;

  constructor(elements: readonly string[]) {
    if (elements.length === 0) throw invalid('elements', 'the model needs at least one element');
    for (const [k, symbol] of elements.entries()) guptaElement(symbol, `elements[${k}]`);
    this.elements = [...elements];
    const m = elements.length;
    this.types = m;
    this.table = new Float64Array(m * m * PAIR_STRIDE);
    let maxCutoff = 0;
    let minR0 = Infinity;
    for (let a = 0; a < m; a++) {
      for (let b = 0; b < m; b++) {
        const pair = guptaPair(elements[a]!, elements[b]!);
        const base = (a * m + b) * PAIR_STRIDE;
        const rc1 = SWITCH_START_FACTOR * pair.r0Angstrom;
        const rc2 = SWITCH_END_FACTOR * pair.r0Angstrom;
        this.table[base + SLOT_TWO_A] = 2 * pair.aEv;
        this.table[base + SLOT_P] = pair.p;
        this.table[base + SLOT_INV_R0] = 1 / pair.r0Angstrom;
        this.table[base + SLOT_XI2] = pair.xiEv * pair.xiEv;
        this.table[base + SLOT_TWO_Q] = 2 * pair.q;
        this.table[base + SLOT_RC1] = rc1;
        this.table[base + SLOT_RC2] = rc2;
        this.table[base + SLOT_INV_WIDTH] = 1 / (rc2 - rc1);
        maxCutoff = Math.max(maxCutoff, rc2);
        minR0 = Math.min(minR0, pair.r0Angstrom);
      }
    }
    this.maxCutoffAngstrom = maxCutoff;
    this.minR0Angstrom = minR0;
  }

  /** Switch window [rc1, rc2] (Å) of the pair of types a, b. */
  window(a: number, b: number): { startAngstrom: number; endAngstrom: number } {
    const base = (a * this.types + b) * PAIR_STRIDE;
    return { startAngstrom: this.table[base + SLOT_RC1]!, endAngstrom: this.table[base + SLOT_RC2]! };
  }

  /** φ, dφ/dr, ρ contribution, dρ/dr of types a, b at distance r (for tables and tests; the loops inline this). */
  pairTerms(a: number, b: number, r: number): PairTerms {
    const base = (a * this.types + b) * PAIR_STRIDE;
    const t = this.table;
    if (r >= t[base + SLOT_RC2]!) return { phi: 0, dPhi: 0, rho: 0, dRho: 0 };
    const invR0 = t[base + SLOT_INV_R0]!;
    const u = r * invR0 - 1;
    const p = t[base + SLOT_P]!;
    const twoQ = t[base + SLOT_TWO_Q]!;
    const ePhi = t[base + SLOT_TWO_A]! * Math.exp(-p * u);
    const eRho = t[base + SLOT_XI2]! * Math.exp(-twoQ * u);
    let s = 1;
    let ds = 0;
    const rc1 = t[base + SLOT_RC1]!;
    if (r > rc1) {
      const w = t[base + SLOT_INV_WIDTH]!;
      const x = (r - rc1) * w;
      s = quinticSwitch(x);
      ds = quinticSwitchDerivative(x) * w;
    }
    return { phi: ePhi * s, dPhi: ePhi * (ds - p * invR0 * s), rho: eRho * s, dRho: eRho * (ds - twoQ * invR0 * s) };
  }

  /** Type index of every symbol (a DomainError names the atom whose element the model lacks). */
  typesOf(symbols: readonly string[]): Uint8Array {
    const out = new Uint8Array(symbols.length);
    symbols.forEach((symbol, i) => {
      const k = this.elements.indexOf(symbol);
      if (k < 0)
        throw invalid(
          `atoms[${i + 1}].species`,
          `atom ${i + 1} is ${symbol}, which this model does not hold (${this.elements.join(', ')})`,
        );
      out[i] = k;
    });
    return out;
  }
}

/**
 * A full (both directions) Verlet list: neighbours closer than cut-off + skin at the time of the build.
 * It stays valid while no two atoms together moved more than the skin since the build; `maxDisplacement`
 * (the largest displacement of any atom since the build) lets a caller decide when to rebuild.
 */
export class VerletList {
  offsets = new Int32Array(1);
  neighbours = new Int32Array(0);
  readonly reference: Float64Array;
  maxDisplacementAngstrom = 0;
  builds = 0;

  constructor(
    readonly atoms: number,
    readonly cutoffAngstrom: number,
    readonly skinAngstrom: number,
  ) {
    this.reference = new Float64Array(3 * atoms);
  }

  build(positions: Float64Array): void {
    const n = this.atoms;
    this.reference.set(positions.subarray(0, 3 * n));
    this.maxDisplacementAngstrom = 0;
    this.builds++;
    if (n < 2) {
      this.offsets = new Int32Array(n + 1);
      this.neighbours = new Int32Array(0);
      return;
    }
    const pairs = pairsWithin(positions, this.cutoffAngstrom + this.skinAngstrom);
    const offsets = new Int32Array(n + 1);
    for (let k = 0; k < pairs.count; k++) {
      offsets[pairs.first[k]! + 1]!++;
      offsets[pairs.second[k]! + 1]!++;
    }
    for (let i = 0; i < n; i++) offsets[i + 1]! += offsets[i]!;
    const cursor = offsets.slice(0, n);
    const neighbours = new Int32Array(2 * pairs.count);
    for (let k = 0; k < pairs.count; k++) {
      const i = pairs.first[k]!;
      const j = pairs.second[k]!;
      neighbours[cursor[i]!++] = j;
      neighbours[cursor[j]!++] = i;
    }
    for (let i = 0; i < n; i++) neighbours.subarray(offsets[i], offsets[i + 1]).sort();
    this.offsets = offsets;
    this.neighbours = neighbours;
  }

  /** Records that atom i now sits at (x, y, z). */
  noteMoved(i: number, x: number, y: number, z: number): void {
    const d = Math.hypot(x - this.reference[3 * i]!, y - this.reference[3 * i + 1]!, z - this.reference[3 * i + 2]!);
    if (d > this.maxDisplacementAngstrom) this.maxDisplacementAngstrom = d;
  }

  /** Largest displacement of any atom since the build, checked over all atoms (after bulk moves). */
  refreshDisplacement(positions: Float64Array): number {
    let max = 0;
    for (let i = 0; i < this.atoms; i++) {
      const d = Math.hypot(
        positions[3 * i]! - this.reference[3 * i]!,
        positions[3 * i + 1]! - this.reference[3 * i + 1]!,
        positions[3 * i + 2]! - this.reference[3 * i + 2]!,
      );
      if (d > max) max = d;
    }
    this.maxDisplacementAngstrom = max;
    return max;
  }

  /** True when a further move of up to `stepAngstrom` could bring an unlisted pair inside the cut-off. */
  needsRebuild(stepAngstrom = 0): boolean {
    return 2 * this.maxDisplacementAngstrom + stepAngstrom >= this.skinAngstrom;
  }
}

/** Default Verlet skin (Å): common practice is a few tenths of the nearest-neighbour distance. */
export const DEFAULT_SKIN_ANGSTROM = 1.0;

/** The closest pair among the listed neighbours, or null when no atom has a neighbour. */
export function closestPair(
  positions: Float64Array,
  list: VerletList,
): { i: number; j: number; distanceAngstrom: number } | null {
  let best: { i: number; j: number; distanceAngstrom: number } | null = null;
  for (let i = 0; i < list.atoms; i++) {
    for (let e = list.offsets[i]!; e < list.offsets[i + 1]!; e++) {
      const j = list.neighbours[e]!;
      if (j <= i) continue;
      const d = Math.hypot(
        positions[3 * i]! - positions[3 * j]!,
        positions[3 * i + 1]! - positions[3 * j + 1]!,
        positions[3 * i + 2]! - positions[3 * j + 2]!,
      );
      if (best === null || d < best.distanceAngstrom) best = { i, j, distanceAngstrom: d };
    }
  }
  return best;
}

/** Refuses overlapping atoms (closer than OVERLAP_FRACTION × the smallest r0), naming them (1-based) and their elements. */
export function assertNoOverlap(
  model: OffLatticeGupta,
  positions: Float64Array,
  types: Uint8Array,
  list: VerletList,
  field = 'structure',
): void {
  const closest = closestPair(positions, list);
  const limit = OVERLAP_FRACTION * model.minR0Angstrom;
  if (closest && closest.distanceAngstrom < limit) {
    const a = model.elements[types[closest.i]!]!;
    const b = model.elements[types[closest.j]!]!;
    throw invalid(
      field,
      `atoms ${closest.i + 1} (${a}) and ${closest.j + 1} (${b}) are only ${closest.distanceAngstrom.toFixed(3)} Å apart ` +
        `(less than ${limit.toFixed(3)} Å, half the shortest nearest-neighbour distance): overlapping atoms have no meaningful energy`,
    );
  }
}

/**
 * Total energy (eV) of the configuration, and the forces (eV/Å) into `forces` when given. Densities
 * per atom go into `density` when given. `list` must be valid for `positions` (see VerletList).
 */
export function energyAndForces(
  model: OffLatticeGupta,
  positions: Float64Array,
  types: Uint8Array,
  list: VerletList,
  forces?: Float64Array,
  density?: Float64Array,
): number {
  const n = list.atoms;
  const m = model.types;
  const t = model.table;
  const rho = density ?? new Float64Array(n);
  rho.fill(0);
  const { offsets, neighbours } = list;
  let repulsion = 0;
  for (let i = 0; i < n; i++) {
    const xi = positions[3 * i]!;
    const yi = positions[3 * i + 1]!;
    const zi = positions[3 * i + 2]!;
    const rowBase = types[i]! * m;
    for (let e = offsets[i]!, end = offsets[i + 1]!; e < end; e++) {
      const j = neighbours[e]!;
      if (j <= i) continue;
      const dx = xi - positions[3 * j]!;
      const dy = yi - positions[3 * j + 1]!;
      const dz = zi - positions[3 * j + 2]!;
      const r = Math.sqrt(dx * dx + dy * dy + dz * dz);
      const base = (rowBase + types[j]!) * PAIR_STRIDE;
      if (r >= t[base + SLOT_RC2]!) continue;
      const u = r * t[base + SLOT_INV_R0]! - 1;
      let phi = t[base + SLOT_TWO_A]! * Math.exp(-t[base + SLOT_P]! * u);
      let dens = t[base + SLOT_XI2]! * Math.exp(-t[base + SLOT_TWO_Q]! * u);
      const rc1 = t[base + SLOT_RC1]!;
      if (r > rc1) {
        const s = quinticSwitch((r - rc1) * t[base + SLOT_INV_WIDTH]!);
        phi *= s;
        dens *= s;
      }
      repulsion += phi;
      rho[i]! += dens;
      rho[j]! += dens;
    }
  }
  let band = 0;
  for (let i = 0; i < n; i++) band += Math.sqrt(rho[i]!);
  const energy = repulsion - band;
  if (!forces) return energy;
  forces.fill(0);
  // Embedding derivative −1/(2√ρ) per atom (0 for an isolated atom, which has no neighbour term anyway).
  const halfInvRoot = new Float64Array(n);
  for (let i = 0; i < n; i++) halfInvRoot[i] = rho[i]! > 0 ? 0.5 / Math.sqrt(rho[i]!) : 0;
  for (let i = 0; i < n; i++) {
    const xi = positions[3 * i]!;
    const yi = positions[3 * i + 1]!;
    const zi = positions[3 * i + 2]!;
    const rowBase = types[i]! * m;
    let fx = 0;
    let fy = 0;
    let fz = 0;
    for (let e = offsets[i]!, end = offsets[i + 1]!; e < end; e++) {
      const j = neighbours[e]!;
      if (j <= i) continue;
      const dx = xi - positions[3 * j]!;
      const dy = yi - positions[3 * j + 1]!;
      const dz = zi - positions[3 * j + 2]!;
      const r = Math.sqrt(dx * dx + dy * dy + dz * dz);
      const base = (rowBase + types[j]!) * PAIR_STRIDE;
      if (r >= t[base + SLOT_RC2]!) continue;
      const invR0 = t[base + SLOT_INV_R0]!;
      const u = r * invR0 - 1;
      const p = t[base + SLOT_P]!;
      const twoQ = t[base + SLOT_TWO_Q]!;
      const ePhi = t[base + SLOT_TWO_A]! * Math.exp(-p * u);
      const eRho = t[base + SLOT_XI2]! * Math.exp(-twoQ * u);
      let s = 1;
      let ds = 0;
      const rc1 = t[base + SLOT_RC1]!;
      if (r > rc1) {
        const w = t[base + SLOT_INV_WIDTH]!;
        const x = (r - rc1) * w;
        s = quinticSwitch(x);
        ds = quinticSwitchDerivative(x) * w;
      }
      const dPhi = ePhi * (ds - p * invR0 * s);
      const dRho = eRho * (ds - twoQ * invR0 * s);
      const dEdr = dPhi - (halfInvRoot[i]! + halfInvRoot[j]!) * dRho;
      const scale = -dEdr / r;
      fx += scale * dx;
      fy += scale * dy;
      fz += scale * dz;
      forces[3 * j]! -= scale * dx;
      forces[3 * j + 1]! -= scale * dy;
      forces[3 * j + 2]! -= scale * dz;
    }
    forces[3 * i]! += fx;
    forces[3 * i + 1]! += fy;
    forces[3 * i + 2]! += fz;
  }
  return energy;
}

/** Energy (eV) of symbols at positions, from scratch (builds its own list). */
export function offLatticeEnergyEv(
  symbols: readonly string[],
  positions: Float64Array,
  model?: OffLatticeGupta,
): number {
  const elements = model?.elements ?? [...new Set(symbols)];
  const m = model ?? new OffLatticeGupta(elements);
  const types = m.typesOf(symbols);
  const list = new VerletList(symbols.length, m.maxCutoffAngstrom, 0);
  list.build(positions);
  return energyAndForces(m, positions, types, list);
}

/** A DomainError for a configuration whose energy or forces stopped being finite, naming the atoms at fault. */
export function explodedError(
  model: OffLatticeGupta,
  positions: Float64Array,
  types: Uint8Array,
  forces: Float64Array,
  list: VerletList,
  step: string,
): DomainError {
  const bad: number[] = [];
  for (let i = 0; i < list.atoms && bad.length < 5; i++) {
    if (
      !Number.isFinite(forces[3 * i]!) ||
      !Number.isFinite(forces[3 * i + 1]!) ||
      !Number.isFinite(forces[3 * i + 2]!) ||
      !Number.isFinite(positions[3 * i]!)
    )
      bad.push(i);
  }
  const closest = closestPair(positions, list);
  const named = bad.map((i) => `${i + 1} (${model.elements[types[i]!]})`).join(', ');
  const near = closest
    ? `; closest pair: atoms ${closest.i + 1} and ${closest.j + 1} at ${closest.distanceAngstrom.toFixed(3)} Å`
    : '';
  return invalid(
    'structure',
    `the minimisation exploded at ${step} (energy or forces no longer finite${named ? ` on atoms ${named}` : ''}${near}); check the structure for overlapping or far-flung atoms`,
  );
}
