/**
 * Canonical Monte Carlo of a binary particle whose atoms may leave their lattice sites: Metropolis swap
 * moves (exchange the species of an A atom and a B atom where they stand) and displacement moves (one
 * atom moved by a uniform random vector in a cube of half-edge `stepAngstrom`, a symmetric proposal), on
 * the off-lattice Gupta energy with the per-pair quintic switch (`offlattice-gupta.ts`).
 *
 * Both moves change the energy locally: the pair terms of the moved (or re-typed) atoms and the band
 * densities of them and their neighbours. Densities are kept per atom in typed arrays and updated on
 * acceptance; neighbours come from a Verlet list rebuilt when an atom has moved far enough that a pair
 * outside the list could come inside the cut-off. The step is tuned by the caller (`tuneStep`) only
 * while equilibrating and then held fixed, so the production moves satisfy detailed balance.
 */
import type { SeededRandom } from '../random';
import { energyAndForces, OffLatticeGupta, quinticSwitch, VerletList } from './offlattice-gupta';
import { BOLTZMANN_EV_PER_K } from './swap-engine';

/** Verlet skin of the Monte Carlo (Å). */
export const RELAXED_SKIN_ANGSTROM = 1.2;
/** Largest displacement half-edge (Å); keeps one proposal well inside the skin. */
export const MAX_STEP_ANGSTROM = 0.25;
/** Acceptance band the step is tuned into during equilibration. */
export const DISPLACEMENT_ACCEPTANCE_TARGET = Object.freeze({ low: 0.4, high: 0.5 });

export interface RelaxedMoveStatistics {
  swapAttempts: number;
  swapAccepted: number;
  displacementAttempts: number;
  displacementAccepted: number;
}

export class RelaxedEngine {
  readonly atoms: number;
  readonly model: OffLatticeGupta;
  /** Å, interleaved; changed by accepted displacements. */
  readonly positions: Float64Array;
  /** 0 = A, 1 = B per atom (the model's type index). */
  readonly species: Uint8Array;
  readonly surface: Uint8Array;
  readonly surfaceSites: number;
  readonly countA: number;
  readonly countB: number;
  readonly stats: RelaxedMoveStatistics = {
    swapAttempts: 0,
    swapAccepted: 0,
    displacementAttempts: 0,
    displacementAccepted: 0,
  };
  stepAngstrom: number;

  private readonly list: VerletList;
  private readonly density: Float64Array;
  private readonly sqrtDensity: Float64Array;
  private readonly pending: Float64Array;
  private readonly stamp: Int32Array;
  private stampValue = 0;
  private touched = new Int32Array(0);
  private touchedSqrt = new Float64Array(0);
  private touchedCount = 0;
  private readonly listA: Int32Array;
  private readonly listB: Int32Array;
  private readonly slot: Int32Array;
  private energy = 0;
  private acceptedDeltaSum = 0;
  private surfaceB = 0;
  /** Scratch: φ and ρ of the last `pairTerms` call. */
  private phiOut = 0;
  private rhoOut = 0;

  constructor(
    model: OffLatticeGupta,
    positions: Float64Array,
    species: Uint8Array,
    surface: Uint8Array,
    private readonly random: SeededRandom,
    stepAngstrom = 0.05,
  ) {
    if (model.types !== 2) throw new RangeError('the relaxed engine needs a model of exactly two elements');
    const n = species.length;
    if (positions.length !== 3 * n || surface.length !== n)
      throw new RangeError('positions, species and surface must describe the same atoms');
    this.atoms = n;
    this.model = model;
    this.positions = Float64Array.from(positions);
    this.species = Uint8Array.from(species);
    this.surface = Uint8Array.from(surface);
    this.stepAngstrom = Math.min(stepAngstrom, MAX_STEP_ANGSTROM);
    this.density = new Float64Array(n);
    this.sqrtDensity = new Float64Array(n);
    this.pending = new Float64Array(n);
    this.stamp = new Int32Array(n);
    let countB = 0;
    let surfaceSites = 0;
    for (let i = 0; i < n; i++) {
      if (this.species[i]! > 1) throw new RangeError('species must be 0 (A) or 1 (B)');
      countB += this.species[i]!;
      surfaceSites += this.surface[i]!;
      if (this.surface[i] && this.species[i]) this.surfaceB++;
    }
    this.countB = countB;
    this.countA = n - countB;
    this.surfaceSites = surfaceSites;
    this.listA = new Int32Array(this.countA);
    this.listB = new Int32Array(this.countB);
    this.slot = new Int32Array(n);
    let a = 0;
    let b = 0;
    for (let i = 0; i < n; i++) {
      if (this.species[i] === 0) {
        this.slot[i] = a;
        this.listA[a++] = i;
      } else {
        this.slot[i] = b;
        this.listB[b++] = i;
      }
    }
    this.list = new VerletList(n, model.maxCutoffAngstrom, RELAXED_SKIN_ANGSTROM);
    this.rebuild();
    this.recomputeEnergy();
  }

  private rebuild(): void {
    this.list.build(this.positions);
    let maxDegree = 0;
    for (let i = 0; i < this.atoms; i++)
      maxDegree = Math.max(maxDegree, this.list.offsets[i + 1]! - this.list.offsets[i]!);
    if (this.touched.length < 2 * maxDegree + 2) {
      this.touched = new Int32Array(2 * maxDegree + 2);
      this.touchedSqrt = new Float64Array(2 * maxDegree + 2);
    }
  }

  /** Recomputes every density and the energy from scratch; answers the energy (eV). */
  recomputeEnergy(): number {
    this.energy = energyAndForces(this.model, this.positions, this.species, this.list, undefined, this.density);
    for (let i = 0; i < this.atoms; i++) this.sqrtDensity[i] = Math.sqrt(this.density[i]!);
    return this.energy;
  }

  get energyEv(): number {
    return this.energy;
  }

  get acceptedDeltaSumEv(): number {
    return this.acceptedDeltaSum;
  }

  get surfaceXB(): number {
    return this.surfaceSites === 0 ? 0 : this.surfaceB / this.surfaceSites;
  }

  get neighbourListBuilds(): number {
    return this.list.builds;
  }

  /** φ and ρ of the pair of types (a, b) at r into phiOut / rhoOut (zero beyond the pair's rc2). */
  private pairTerms(a: number, b: number, r: number): void {
    const t = this.model.table;
    const base = (a * 2 + b) * 8;
    if (r >= t[base + 6]!) {
      this.phiOut = 0;
      this.rhoOut = 0;
      return;
    }
    const u = r * t[base + 2]! - 1;
    let phi = t[base]! * Math.exp(-t[base + 1]! * u);
    let rho = t[base + 3]! * Math.exp(-t[base + 4]! * u);
    const rc1 = t[base + 5]!;
    if (r > rc1) {
      const s = quinticSwitch((r - rc1) * t[base + 7]!);
      phi *= s;
      rho *= s;
    }
    this.phiOut = phi;
    this.rhoOut = rho;
  }

  private addPending(k: number, d: number): void {
    if (this.stamp[k] !== this.stampValue) {
      this.stamp[k] = this.stampValue;
      this.pending[k] = 0;
      this.touched[this.touchedCount++] = k;
    }
    this.pending[k]! += d;
  }

  /** Embedding change of every touched atom, −Σ(√ρ' − √ρ); keeps the new roots for a commit. */
  private embeddingDelta(): number {
    let dE = 0;
    for (let t = 0; t < this.touchedCount; t++) {
      const k = this.touched[t]!;
      const root = Math.sqrt(Math.max(0, this.density[k]! + this.pending[k]!));
      this.touchedSqrt[t] = root;
      dE += this.sqrtDensity[k]! - root;
    }
    return dE;
  }

  private commitDensities(): void {
    for (let t = 0; t < this.touchedCount; t++) {
      const k = this.touched[t]!;
      this.density[k]! += this.pending[k]!;
      this.sqrtDensity[k] = this.touchedSqrt[t]!;
    }
  }

  private beginTrial(): void {
    this.stampValue++;
    if (this.stampValue === 0x7fffffff) {
      this.stamp.fill(0);
      this.stampValue = 1;
    }
    this.touchedCount = 0;
  }

  /** ΔE (eV) of turning atom `i` from species `from` to `to`, skipping its pair with `skip`; pending densities accumulate. */
  private retypeDelta(i: number, from: number, to: number, skip: number): number {
    const p = this.positions;
    const xi = p[3 * i]!;
    const yi = p[3 * i + 1]!;
    const zi = p[3 * i + 2]!;
    const { offsets, neighbours } = this.list;
    let dE = 0;
    for (let e = offsets[i]!, end = offsets[i + 1]!; e < end; e++) {
      const k = neighbours[e]!;
      if (k === skip) continue;
      const dx = xi - p[3 * k]!;
      const dy = yi - p[3 * k + 1]!;
      const dz = zi - p[3 * k + 2]!;
      const r = Math.sqrt(dx * dx + dy * dy + dz * dz);
      const sk = this.species[k]!;
      this.pairTerms(from, sk, r);
      const phiOld = this.phiOut;
      const rhoOld = this.rhoOut;
      this.pairTerms(to, sk, r);
      const d = this.rhoOut - rhoOld;
      if (d === 0 && this.phiOut === phiOld) continue;
      dE += this.phiOut - phiOld;
      this.addPending(k, d);
      this.addPending(i, d);
    }
    return dE;
  }

  /** Energy change (eV) of exchanging A atom `i` with B atom `j`, not applied. */
  swapDelta(i: number, j: number): number {
    this.beginTrial();
    const dE = this.retypeDelta(i, 0, 1, j) + this.retypeDelta(j, 1, 0, i);
    return dE + this.embeddingDelta();
  }

  /** Energy change (eV) of moving atom `i` to (x, y, z), not applied. */
  displacementDelta(i: number, x: number, y: number, z: number): number {
    this.beginTrial();
    const p = this.positions;
    const xi = p[3 * i]!;
    const yi = p[3 * i + 1]!;
    const zi = p[3 * i + 2]!;
    const si = this.species[i]!;
    const { offsets, neighbours } = this.list;
    let dE = 0;
    for (let e = offsets[i]!, end = offsets[i + 1]!; e < end; e++) {
      const k = neighbours[e]!;
      const kx = p[3 * k]!;
      const ky = p[3 * k + 1]!;
      const kz = p[3 * k + 2]!;
      const rOld = Math.sqrt((xi - kx) ** 2 + (yi - ky) ** 2 + (zi - kz) ** 2);
      const rNew = Math.sqrt((x - kx) ** 2 + (y - ky) ** 2 + (z - kz) ** 2);
      const sk = this.species[k]!;
      this.pairTerms(si, sk, rOld);
      const phiOld = this.phiOut;
      const rhoOld = this.rhoOut;
      this.pairTerms(si, sk, rNew);
      if (this.rhoOut === 0 && rhoOld === 0) continue;
      const d = this.rhoOut - rhoOld;
      dE += this.phiOut - phiOld;
      this.addPending(k, d);
      this.addPending(i, d);
    }
    return dE + this.embeddingDelta();
  }

  private accept(dE: number, beta: number): boolean {
    return dE <= 0 || this.random.next() < Math.exp(-dE * beta);
  }

  /** One swap attempt between a random A and a random B atom; true when accepted. */
  attemptSwap(beta: number): boolean {
    if (this.countA === 0 || this.countB === 0) return false;
    this.stats.swapAttempts++;
    const slotI = this.random.nextInt(this.countA);
    const slotJ = this.random.nextInt(this.countB);
    const i = this.listA[slotI]!;
    const j = this.listB[slotJ]!;
    const dE = this.swapDelta(i, j);
    if (!this.accept(dE, beta)) return false;
    this.commitDensities();
    this.species[i] = 1;
    this.species[j] = 0;
    this.listA[slotI] = j;
    this.listB[slotJ] = i;
    this.slot[j] = slotI;
    this.slot[i] = slotJ;
    this.surfaceB += this.surface[i]! - this.surface[j]!;
    this.energy += dE;
    this.acceptedDeltaSum += dE;
    this.stats.swapAccepted++;
    return true;
  }

  /** One displacement attempt of a random atom; true when accepted. */
  attemptDisplacement(beta: number): boolean {
    this.stats.displacementAttempts++;
    const i = this.random.nextInt(this.atoms);
    const s = this.stepAngstrom;
    const p = this.positions;
    const x = p[3 * i]! + s * (2 * this.random.next() - 1);
    const y = p[3 * i + 1]! + s * (2 * this.random.next() - 1);
    const z = p[3 * i + 2]! + s * (2 * this.random.next() - 1);
    const dE = this.displacementDelta(i, x, y, z);
    if (!this.accept(dE, beta)) return false;
    this.commitDensities();
    p[3 * i] = x;
    p[3 * i + 1] = y;
    p[3 * i + 2] = z;
    this.energy += dE;
    this.acceptedDeltaSum += dE;
    this.stats.displacementAccepted++;
    this.list.noteMoved(i, x, y, z);
    if (this.list.needsRebuild(Math.sqrt(3) * MAX_STEP_ANGSTROM)) this.rebuild();
    return true;
  }

  /**
   * One sweep at `temperatureK`: N rounds of one displacement attempt and one swap attempt (N atoms), so
   * every atom is offered a move and a swap per sweep on average.
   */
  runSweep(temperatureK: number): void {
    if (!(temperatureK > 0) || !Number.isFinite(temperatureK))
      throw new RangeError(`temperature must be > 0 K, got ${temperatureK}`);
    const beta = 1 / (BOLTZMANN_EV_PER_K * temperatureK);
    for (let n = 0; n < this.atoms; n++) {
      this.attemptDisplacement(beta);
      this.attemptSwap(beta);
    }
  }

  /** Moves the step toward the acceptance band, given the displacement acceptance of the last stretch. */
  tuneStep(acceptance: number): void {
    if (acceptance > DISPLACEMENT_ACCEPTANCE_TARGET.high)
      this.stepAngstrom = Math.min(MAX_STEP_ANGSTROM, this.stepAngstrom * 1.15);
    else if (acceptance < DISPLACEMENT_ACCEPTANCE_TARGET.low)
      this.stepAngstrom = Math.max(0.002, this.stepAngstrom / 1.15);
  }
}
