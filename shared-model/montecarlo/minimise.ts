/**
 * Local energy minimisation of a cluster on the off-lattice Gupta energy: FIRE, the fast inertial
 * relaxation engine of Bitzek, Koskinen, Gähler, Moseler & Gumbsch, Phys. Rev. Lett. 97, 170201 (2006),
 * with the parameters proposed there (N_min 5, f_inc 1.1, f_dec 0.5, α_start 0.1, f_α 0.99), unit masses,
 * and a cap on the largest single-atom step. It stops when the largest force on any atom is below
 * `forceToleranceEvPerAngstrom`.
 *
 * Overlapping atoms are refused before the first step; an energy or force that stops being finite, or an
 * energy below any metal's cohesion, stops the minimisation with a message naming the atoms.
 */
import { invalid } from '../api/result';
import { BudgetMeter, type Clock } from '../compute-budget';
import type { AtomicStructure } from './gupta-energy';
import {
  assertNoOverlap,
  DEFAULT_SKIN_ANGSTROM,
  energyAndForces,
  explodedError,
  OffLatticeGupta,
  VerletList,
} from './offlattice-gupta';

export interface MinimiseOptions {
  /** Stop when every atom's force is below this (eV/Å); default 1e-3. */
  forceToleranceEvPerAngstrom?: number;
  /** Give up after this many steps; default 20,000. */
  maxIterations?: number;
  /** Largest step of any atom per iteration (Å); default 0.1. */
  maxStepAngstrom?: number;
  /**
   * Wall-time budget (ms) of the whole minimisation; none when omitted (the Monte Carlo's own quenches). The
   * iteration budget is maxIterations: reaching it ends the run unconverged, and the result says so.
   */
  maxWallMs?: number;
  clock?: Clock;
}

/** `simulation.relax`: 2 minutes of FIRE steps (~20,000 steps of a 1,000-atom cluster take a few seconds). */
export const RELAX_WALL_BUDGET_MS = 120_000;

export interface MinimiseResult {
  initialEnergyEv: number;
  energyEv: number;
  iterations: number;
  maxForceEvPerAngstrom: number;
  converged: boolean;
  neighbourListBuilds: number;
}

export const FIRE_DESCRIPTION =
  'FIRE minimisation (Bitzek et al., Phys. Rev. Lett. 97, 170201 (2006)) on the off-lattice Gupta energy with a quintic per-pair switch between the 5th and 6th neighbour shells';

/** Energy per atom below which a configuration is called exploded: no metal here binds by more than ~7 eV/atom. */
const EXPLODED_ENERGY_PER_ATOM_EV = -20;
const FIRE = Object.freeze({ dtStart: 0.1, dtMax: 1.0, nMin: 5, fInc: 1.1, fDec: 0.5, alphaStart: 0.1, fAlpha: 0.99 });

function maxForceOf(forces: Float64Array, atoms: number): number {
  let max = 0;
  for (let i = 0; i < atoms; i++) {
    const f = Math.hypot(forces[3 * i]!, forces[3 * i + 1]!, forces[3 * i + 2]!);
    if (!(f <= max)) max = f; // NaN propagates to the caller's finiteness check
  }
  return max;
}

/**
 * Minimises the energy of atoms of `types` at `positions` (changed in place) with `model`.
 */
export function minimiseInPlace(
  model: OffLatticeGupta,
  positions: Float64Array,
  types: Uint8Array,
  options: MinimiseOptions = {},
): MinimiseResult {
  const atoms = types.length;
  const tolerance = options.forceToleranceEvPerAngstrom ?? 1e-3;
  const maxIterations = options.maxIterations ?? 20_000;
  const maxStep = options.maxStepAngstrom ?? 0.1;
  if (!(tolerance > 0))
    throw invalid('forceToleranceEvPerAngstrom', `the force tolerance must be > 0 eV/Å, got ${tolerance}`);
  if (!Number.isInteger(maxIterations) || maxIterations < 0)
    throw invalid('maxIterations', `maxIterations must be a whole number ≥ 0, got ${maxIterations}`);
  const list = new VerletList(atoms, model.maxCutoffAngstrom, DEFAULT_SKIN_ANGSTROM);
  list.build(positions);
  assertNoOverlap(model, positions, types, list);
  const forces = new Float64Array(3 * atoms);
  const velocity = new Float64Array(3 * atoms);
  let energy = energyAndForces(model, positions, types, list, forces);
  const initialEnergyEv = energy;
  let maxForce = maxForceOf(forces, atoms);
  if (!Number.isFinite(energy) || !Number.isFinite(maxForce))
    throw explodedError(model, positions, types, forces, list, 'the start');
  let dt: number = FIRE.dtStart;
  let alpha: number = FIRE.alphaStart;
  let sincePowerNegative = 0;
  let iterations = 0;
  const meter =
    options.maxWallMs === undefined
      ? null
      : new BudgetMeter(
          { maxIterations: Number.MAX_SAFE_INTEGER, maxWallMs: options.maxWallMs },
          {
            what: `the relaxation of ${atoms} atoms`,
            unit: 'FIRE steps',
            advice: 'relax a smaller cluster, or loosen the force tolerance (forceToleranceEvPerAngstrom)',
            field: 'xyz',
          },
          options.clock,
        );
  while (maxForce > tolerance && iterations < maxIterations) {
    meter?.spend(1);
    let power = 0;
    let vv = 0;
    let ff = 0;
    for (let k = 0; k < 3 * atoms; k++) {
      power += forces[k]! * velocity[k]!;
      vv += velocity[k]! * velocity[k]!;
      ff += forces[k]! * forces[k]!;
    }
    if (power > 0) {
      const mix = ff > 0 ? (alpha * Math.sqrt(vv)) / Math.sqrt(ff) : 0;
      for (let k = 0; k < 3 * atoms; k++) velocity[k] = (1 - alpha) * velocity[k]! + mix * forces[k]!;
      if (sincePowerNegative > FIRE.nMin) {
        dt = Math.min(dt * FIRE.fInc, FIRE.dtMax);
        alpha *= FIRE.fAlpha;
      }
      sincePowerNegative++;
    } else {
      velocity.fill(0);
      dt *= FIRE.fDec;
      alpha = FIRE.alphaStart;
      sincePowerNegative = 0;
    }
    let largest = 0;
    for (let i = 0; i < atoms; i++) {
      const vx = (velocity[3 * i] = velocity[3 * i]! + dt * forces[3 * i]!);
      const vy = (velocity[3 * i + 1] = velocity[3 * i + 1]! + dt * forces[3 * i + 1]!);
      const vz = (velocity[3 * i + 2] = velocity[3 * i + 2]! + dt * forces[3 * i + 2]!);
      largest = Math.max(largest, dt * Math.hypot(vx, vy, vz));
    }
    const scale = largest > maxStep ? maxStep / largest : 1;
    for (let k = 0; k < 3 * atoms; k++) positions[k]! += scale * dt * velocity[k]!;
    if (list.needsRebuild()) {
      list.refreshDisplacement(positions);
      if (list.needsRebuild()) list.build(positions);
    } else {
      list.maxDisplacementAngstrom += scale * largest;
    }
    energy = energyAndForces(model, positions, types, list, forces);
    maxForce = maxForceOf(forces, atoms);
    iterations++;
    if (!Number.isFinite(energy) || !Number.isFinite(maxForce) || energy / atoms < EXPLODED_ENERGY_PER_ATOM_EV) {
      throw explodedError(model, positions, types, forces, list, `step ${iterations}`);
    }
  }
  return {
    initialEnergyEv,
    energyEv: energy,
    iterations,
    maxForceEvPerAngstrom: maxForce,
    converged: maxForce <= tolerance,
    neighbourListBuilds: list.builds,
  };
}

export interface RelaxedStructure extends MinimiseResult {
  atoms: number;
  symbols: string[];
  positions: Float64Array;
  /** Element → atom count. */
  composition: Record<string, number>;
}

/** Minimises a structure (a copy; the input is not changed). */
export function relaxStructure(structure: AtomicStructure, options: MinimiseOptions = {}): RelaxedStructure {
  const atoms = structure.symbols.length;
  if (atoms === 0) throw invalid('structure', 'the structure holds no atoms');
  if (structure.positions.length !== 3 * atoms)
    throw invalid(
      'structure',
      `expected ${3 * atoms} coordinates for ${atoms} atoms, got ${structure.positions.length}`,
    );
  for (let k = 0; k < 3 * atoms; k++) {
    if (!Number.isFinite(structure.positions[k]!))
      throw invalid('structure', `atom ${Math.floor(k / 3) + 1} has a non-finite coordinate`);
  }
  const elements = [...new Set(structure.symbols)];
  const model = new OffLatticeGupta(elements);
  const types = model.typesOf(structure.symbols);
  const positions = Float64Array.from(structure.positions);
  const result = minimiseInPlace(model, positions, types, options);
  const composition: Record<string, number> = {};
  for (const symbol of structure.symbols) composition[symbol] = (composition[symbol] ?? 0) + 1;
  return { ...result, atoms, symbols: [...structure.symbols], positions, composition };
}
