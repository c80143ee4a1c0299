/**
 * One lattice Monte Carlo run of a binary particle, from inputs to the analysed result: build the
 * cluster, place the atoms at random (seeded), optionally anneal from a high temperature down, run
 * Metropolis swap sweeps, detect equilibration by block averages, analyse and classify.
 *
 * Two kinds of run (`relaxation`):
 * - rigid: atoms swap on fixed sites of a lattice at the Vegard spacing between the two metals' fitted
 *   nearest-neighbour distances; a sweep is one swap attempt per atom (common practice). Exact and fast
 *   for matched pairs; for size-mismatched pairs it favours mixing (it cannot relax the strain).
 * - relaxed: the same start, first quenched (FIRE) on the off-lattice energy, then per sweep N rounds of
 *   one displacement attempt and one swap attempt (`relaxed-engine.ts`); the displacement step is tuned
 *   to 40–50 % acceptance during annealing and the first production sweeps, then held fixed; the final
 *   configuration is quenched again for the reported relaxed energies.
 * By default pairs whose nearest-neighbour distances differ by more than RELAXATION_MISMATCH_THRESHOLD
 * run relaxed. A `stopping` rule ends the production in chunks once the energy trace is equilibrated and
 * the standard error of the surface composition is below its target.
 */
import { DomainError, invalid } from '../api/result';
import {
  classifyArchitecture,
  DEFAULT_THRESHOLDS,
  type Classification,
  type ClassificationThresholds,
} from '../architecture/classify';
import { buildNeighbourList, FIVE_SHELL_CUTOFF_FACTOR } from '../clusters/neighbours';
import { buildCluster, predictedAtomCount, type ClusterGeometry, type ClusterSize } from '../clusters/shapes';
import { isParticleShape, PARTICLE_SHAPES, type ParticleShape } from '../geometry/shapes';
import type { SeededRandom } from '../random';
import { analyseParticle, describeSites, neighbourOrder, type ParticleAnalysis, type RadialLayer } from './analysis';
import { detectEquilibration, type EquilibrationReport } from './equilibration';
import { GUPTA_ELEMENTS, guptaElement, guptaPair, type PairRule } from './gupta-parameters';
import { binaryTables, configurationEnergyEv, SwapEngine } from './swap-engine';
import { minimiseInPlace } from './minimise';
import { OffLatticeGupta } from './offlattice-gupta';
import { RelaxedEngine } from './relaxed-engine';
import { analyseSeparation, type SeparationAnalysis } from './separation';

/**
 * Engine versions, stored with every run. -2: every reported average (surface share, energy, order) starts at
 * one sweep, the detected equilibration point, which now also cuts a transient shorter than one block.
 */
export const ENGINE_VERSION = 'gupta-swap-mc-2';
export const RELAXED_ENGINE_VERSION = 'gupta-relaxed-mc-2';

export const RELAXATION_MODES = ['rigid', 'relaxed'] as const;
export type RelaxationMode = (typeof RELAXATION_MODES)[number];

/** Pairs whose nearest-neighbour distances differ by more than this share of their mean run relaxed by default. */
export const RELAXATION_MISMATCH_THRESHOLD = 0.06;

export const RIGID_DESIGN =
  'rigid lattice: swap moves on fixed fcc/icosahedral sites at the Vegard spacing, five-shell Gupta sum; exact for size-matched pairs';
export const RELAXED_DESIGN =
  'relaxed: off-lattice Gupta energy (quintic per-pair switch between the 5th and 6th shells); the random start is quenched (FIRE), ' +
  'then each sweep offers every atom one displacement (uniform in a cube, step tuned to 40–50 % acceptance during equilibration, then fixed) ' +
  'and one swap; the final configuration is quenched again for the relaxed energies';
export const SWAP_REALISM_NOTE =
  'Swap moves exchange atoms anywhere in the particle: they find the equilibrium arrangement, which a real synthesis at low temperature may not reach in its time.';

/** Engine version a run of `spec` records (rigid and relaxed runs are different engines). */
export function engineVersionFor(spec: Pick<SimulationSpec, 'elementA' | 'elementB' | 'relaxation'>): string {
  const mode = spec.relaxation ?? defaultRelaxation(spec.elementA, spec.elementB).mode;
  return mode === 'relaxed' ? RELAXED_ENGINE_VERSION : ENGINE_VERSION;
}

/** Relative nearest-neighbour mismatch |r0_A − r0_B| / mean of the two Gupta metals. */
export function sizeMismatch(elementA: string, elementB: string): number {
  const a = guptaElement(elementA, 'elementA').r0Angstrom;
  const b = guptaElement(elementB, 'elementB').r0Angstrom;
  return Math.abs(a - b) / ((a + b) / 2);
}

/** The mode a pair runs in when the user does not choose, and why. */
export function defaultRelaxation(elementA: string, elementB: string): { mode: RelaxationMode; reason: string } {
  const mismatch = sizeMismatch(elementA, elementB);
  const percent = (100 * mismatch).toFixed(1);
  const limit = (100 * RELAXATION_MISMATCH_THRESHOLD).toFixed(0);
  return mismatch > RELAXATION_MISMATCH_THRESHOLD
    ? {
        mode: 'relaxed',
        reason: `nearest-neighbour distances differ by ${percent} % (more than ${limit} %): relaxed by default`,
      }
    : {
        mode: 'rigid',
        reason: `nearest-neighbour distances differ by ${percent} % (at most ${limit} %): rigid lattice by default`,
      };
}

export interface StoppingRule {
  /** Stop once the standard error of the surface composition is below this (fraction, e.g. 0.005). */
  surfaceStandardError: number;
  /** Never stop before this many production sweeps. */
  minSweeps: number;
}

export const DEFAULT_STOPPING: StoppingRule = Object.freeze({ surfaceStandardError: 0.005, minSweeps: 100 });
/** Production sweeps between two checks of the stopping rule. */
export const STOPPING_CHUNK_SWEEPS = 20;
/** Production sweeps of a relaxed run during which the displacement step is still tuned. */
export const RELAXED_TUNING_SWEEPS = 20;

/** Limits checked before any work starts (stated to the user in messages and docs). */
export const SIMULATION_LIMITS = Object.freeze({
  /** Memory: neighbour lists take ~0.5 kB per atom, so 50,000 atoms stay near 25 MB. */
  maxAtoms: 50_000,
  maxSweeps: 100_000,
  /** Attempts (atoms × all sweeps): 2 × 10⁹ is about half an hour at 10⁶ attempts/s. */
  maxAttempts: 2_000_000_000,
  /** Relaxed runs: site-sweeps (atoms × sweeps) at ~10⁵/s is about half an hour at 2 × 10⁸. */
  maxRelaxedAttempts: 200_000_000,
  /** Above this the rigid-lattice model has no meaning (every metal here melts far below it). */
  maxTemperatureK: 5000,
});

export interface AnnealSchedule {
  /** Temperature of the first annealing sweep (K); cooled geometrically to the run temperature. */
  startTemperatureK: number;
  /** Sweeps spent cooling, before the production sweeps. */
  sweeps: number;
}

export interface SimulationSpec {
  elementA: string;
  elementB: string;
  /** Atomic fraction of B, 0 < xB < 1. */
  xB: number;
  shape: ParticleShape;
  /** Give exactly one of shells and diameterNm. */
  shells?: number | undefined;
  diameterNm?: number | undefined;
  /** Production (final) temperature (K). */
  temperatureK: number;
  /** Production sweeps at temperatureK. */
  sweeps: number;
  anneal?: AnnealSchedule | null | undefined;
  seed: number;
  /** Progress callback period (sweeps); default: about 200 reports per run, at least one per 2 × 10⁵ attempts. */
  progressEverySweeps?: number | undefined;
  thresholds?: ClassificationThresholds | undefined;
  /** Rigid or relaxed; omitted: by the size-mismatch rule (`defaultRelaxation`). */
  relaxation?: RelaxationMode | undefined;
  /** Stop the production at the answer (sweeps is then the cap); omitted or null: run all sweeps. */
  stopping?: StoppingRule | null | undefined;
}

export interface SimulationPlan {
  atoms: number;
  countB: number;
  totalSweeps: number;
  attempts: number;
  nearestNeighbourAngstrom: number;
  size: ClusterSize;
}

export interface SimulationProgress {
  sweep: number;
  totalSweeps: number;
  phase: 'anneal' | 'production';
  temperatureK: number;
  energyEv: number;
  energyPerAtomEv: number;
  surfaceXB: number;
  /** Acceptance ratio since the previous report. */
  acceptance: number;
}

export interface SimulationCallbacks {
  onProgress?: (progress: SimulationProgress) => void;
  /** Polled every sweep; returning true stops the run with a DomainError of code 'cancelled'. */
  shouldCancel?: () => boolean;
  /** Milliseconds clock for the speed figure (default Date.now). */
  now?: () => number;
}

export interface SimulationTraces {
  sweep: number[];
  temperatureK: number[];
  energyEv: number[];
  surfaceXB: number[];
}

/** How a run treated the positions of the atoms (stored with every result). */
export interface RelaxationReport {
  mode: RelaxationMode;
  /** Why this mode: the user's choice or the size-mismatch rule. */
  reason: string;
  design: string;
  sizeMismatch: number;
  /** Relaxed runs only (null for rigid ones). */
  displacementStepAngstrom: number | null;
  displacementAcceptance: number | null;
  swapAcceptance: number;
  /** Energy of the final occupation quenched to its local minimum (relaxed runs; null for rigid). */
  quenchedEnergyEv: number | null;
  neighbourListBuilds: number | null;
}

export interface StoppingReport {
  rule: StoppingRule | null;
  /** Production sweeps actually run. */
  sweepsTaken: number;
  /** True when the rule was met before the cap. */
  stoppedAtAnswer: boolean;
  capSweeps: number;
}

export interface SimulationResult {
  engineVersion: string;
  spec: SimulationSpec;
  elementA: string;
  elementB: string;
  pairRule: PairRule;
  geometry: {
    shape: ParticleShape;
    shells: number;
    atoms: number;
    nearestNeighbourAngstrom: number;
    cutoffAngstrom: number;
    equivalentDiameterNm: number;
  };
  atoms: number;
  countA: number;
  countB: number;
  xB: number;
  /** Final configuration energy (eV) and per atom. */
  energyEv: number;
  energyPerAtomEv: number;
  /** Mean energy over the equilibrated production samples (eV). */
  meanEnergyEv: number;
  /**
   * Mixing energy per atom (eV): E/N − (1 − x)·e_A − x·e_B, with e_A, e_B the per-atom energies of the
   * same cluster made of pure A or pure B, each at its own nearest-neighbour distance.
   */
  mixingEnergyPerAtomEv: number;
  pureClusterEnergyPerAtomEv: Record<string, number>;
  surfaceSites: number;
  /** Surface share of B averaged over the equilibrated samples (the equilibrium surface composition). */
  surfaceXB: number;
  surfaceXBStandardError: number;
  /** Share of surface sites per element, from the averaged surface composition. */
  surfaceFraction: Record<string, number>;
  /** Final configuration. */
  final: ParticleAnalysis;
  radialProfile: RadialLayer[];
  /** First-shell Warren–Cowley α averaged over equilibrated samples (0 random, > 0 like atoms cluster, < 0 ordering). */
  warrenCowley: number;
  unlikeNeighbourRatio: number;
  classification: Classification;
  architecture: string;
  attempts: number;
  accepted: number;
  acceptance: number;
  attemptsPerSecond: number;
  elapsedMs: number;
  /** Energy bookkeeping: accumulated local ΔE minus the recomputed final − initial energy (eV). */
  energyDriftEv: number;
  equilibration: EquilibrationReport;
  traces: SimulationTraces;
  /** 'A'/'B' per site, in the site order of the rebuilt geometry. */
  finalOccupation: string;
  relaxation: RelaxationReport;
  stopping: StoppingReport;
  /** Centre-of-mass offset, interface and domains of the final configuration. */
  separation: SeparationAnalysis;
  /** Final positions (Å, x y z per atom, rounded to 1e-4) of a relaxed run; null for rigid runs (the sites). */
  finalPositionsAngstrom: number[] | null;
  kineticNote: string;
}

function requireFiniteNumber(field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value))
    throw invalid(field, `${field} must be a number, got ${String(value)}`);
  return value;
}

/** Validates a run's inputs (naming the field at fault) and states its size, before any work starts. */
export function planSimulation(spec: SimulationSpec): SimulationPlan {
  const a = guptaElement(spec.elementA, 'elementA');
  const b = guptaElement(spec.elementB, 'elementB');
  if (a.symbol === b.symbol) throw invalid('elementB', `a pair needs two different metals, got ${a.symbol} twice`);
  const xB = requireFiniteNumber('xB', spec.xB);
  if (xB <= 0 || xB >= 1) throw invalid('xB', `xB must lie strictly between 0 and 1, got ${xB}`);
  if (!isParticleShape(spec.shape))
    throw invalid('shape', `unknown shape "${String(spec.shape)}"; use one of ${PARTICLE_SHAPES.join(', ')}`);
  const hasShells = spec.shells !== undefined && spec.shells !== null;
  const hasDiameter = spec.diameterNm !== undefined && spec.diameterNm !== null;
  if (hasShells === hasDiameter)
    throw invalid('shells', 'give the size either as shells or as diameterNm (exactly one)');
  let size: ClusterSize;
  if (hasShells) {
    const shells = requireFiniteNumber('shells', spec.shells);
    if (!Number.isInteger(shells) || shells < 1)
      throw invalid('shells', `shells must be a whole number ≥ 1, got ${shells}`);
    if (shells > 60)
      throw invalid(
        'shells',
        `shells must be at most 60 (the atom cap is ${SIMULATION_LIMITS.maxAtoms}), got ${shells}`,
      );
    size = { shells };
  } else {
    const diameterNm = requireFiniteNumber('diameterNm', spec.diameterNm);
    if (diameterNm <= 0) throw invalid('diameterNm', `diameterNm must be > 0, got ${diameterNm}`);
    if (diameterNm > 30)
      throw invalid(
        'diameterNm',
        `diameterNm must be at most 30 nm (the atom cap is ${SIMULATION_LIMITS.maxAtoms}), got ${diameterNm}`,
      );
    size = { diameterNm };
  }
  const nn = (1 - xB) * a.r0Angstrom + xB * b.r0Angstrom;
  const atoms = predictedAtomCount(spec.shape, size, nn);
  if (atoms > SIMULATION_LIMITS.maxAtoms) {
    throw invalid(
      hasShells ? 'shells' : 'diameterNm',
      `this size gives about ${atoms} atoms; the limit is ${SIMULATION_LIMITS.maxAtoms} atoms (memory)`,
    );
  }
  if (atoms < 2) throw invalid(hasShells ? 'shells' : 'diameterNm', 'the particle must hold at least two atoms');
  const countB = Math.round(xB * atoms);
  if (countB < 1 || countB > atoms - 1) {
    throw invalid(
      'xB',
      `xB = ${xB} leaves ${countB} of ${atoms} atoms as ${b.symbol}; at least one atom of each metal is needed`,
    );
  }
  const temperatureK = requireFiniteNumber('temperatureK', spec.temperatureK);
  if (temperatureK <= 0) throw invalid('temperatureK', `temperatureK must be > 0 K, got ${temperatureK}`);
  if (temperatureK > SIMULATION_LIMITS.maxTemperatureK)
    throw invalid(
      'temperatureK',
      `temperatureK must be at most ${SIMULATION_LIMITS.maxTemperatureK} K, got ${temperatureK}`,
    );
  const sweeps = requireFiniteNumber('sweeps', spec.sweeps);
  if (!Number.isInteger(sweeps) || sweeps < 1)
    throw invalid('sweeps', `sweeps must be a whole number ≥ 1, got ${sweeps}`);
  if (sweeps > SIMULATION_LIMITS.maxSweeps)
    throw invalid('sweeps', `sweeps must be at most ${SIMULATION_LIMITS.maxSweeps}, got ${sweeps}`);
  let annealSweeps = 0;
  if (spec.anneal) {
    const start = requireFiniteNumber('anneal.startTemperatureK', spec.anneal.startTemperatureK);
    if (start <= temperatureK)
      throw invalid(
        'anneal.startTemperatureK',
        `the annealing start (${start} K) must be above the run temperature (${temperatureK} K)`,
      );
    if (start > SIMULATION_LIMITS.maxTemperatureK)
      throw invalid(
        'anneal.startTemperatureK',
        `anneal.startTemperatureK must be at most ${SIMULATION_LIMITS.maxTemperatureK} K, got ${start}`,
      );
    annealSweeps = requireFiniteNumber('anneal.sweeps', spec.anneal.sweeps);
    if (!Number.isInteger(annealSweeps) || annealSweeps < 1)
      throw invalid('anneal.sweeps', `anneal.sweeps must be a whole number ≥ 1, got ${annealSweeps}`);
    if (annealSweeps > SIMULATION_LIMITS.maxSweeps)
      throw invalid(
        'anneal.sweeps',
        `anneal.sweeps must be at most ${SIMULATION_LIMITS.maxSweeps}, got ${annealSweeps}`,
      );
  }
  if (spec.relaxation !== undefined && !(RELAXATION_MODES as readonly string[]).includes(spec.relaxation)) {
    throw invalid(
      'relaxation',
      `relaxation must be one of ${RELAXATION_MODES.join(', ')}, got "${String(spec.relaxation)}"`,
    );
  }
  if (spec.stopping) {
    const target = requireFiniteNumber('stopping.surfaceStandardError', spec.stopping.surfaceStandardError);
    if (target <= 0 || target >= 0.5)
      throw invalid(
        'stopping.surfaceStandardError',
        `the target standard error must lie between 0 and 0.5, got ${target}`,
      );
    const floor = requireFiniteNumber('stopping.minSweeps', spec.stopping.minSweeps);
    if (!Number.isInteger(floor) || floor < 10)
      throw invalid('stopping.minSweeps', `stopping.minSweeps must be a whole number ≥ 10, got ${floor}`);
  }
  const seed = requireFiniteNumber('seed', spec.seed);
  if (!Number.isInteger(seed)) throw invalid('seed', `seed must be a whole number, got ${seed}`);
  if (spec.progressEverySweeps !== undefined) {
    const every = requireFiniteNumber('progressEverySweeps', spec.progressEverySweeps);
    if (!Number.isInteger(every) || every < 1)
      throw invalid('progressEverySweeps', `progressEverySweeps must be a whole number ≥ 1, got ${every}`);
  }
  const totalSweeps = sweeps + annealSweeps;
  const attempts = totalSweeps * atoms;
  const relaxed = (spec.relaxation ?? defaultRelaxation(a.symbol, b.symbol).mode) === 'relaxed';
  if (relaxed && attempts > SIMULATION_LIMITS.maxRelaxedAttempts) {
    throw invalid(
      'sweeps',
      `${totalSweeps} sweeps × ${atoms} atoms = ${attempts.toExponential(2)} relaxed site-sweeps; the limit is ${SIMULATION_LIMITS.maxRelaxedAttempts.toExponential(0)} (about half an hour)`,
    );
  }
  if (attempts > SIMULATION_LIMITS.maxAttempts) {
    throw invalid(
      'sweeps',
      `${totalSweeps} sweeps × ${atoms} atoms = ${attempts.toExponential(2)} attempts; the limit is ${SIMULATION_LIMITS.maxAttempts.toExponential(0)} (about half an hour)`,
    );
  }
  return { atoms, countB, totalSweeps, attempts, nearestNeighbourAngstrom: nn, size };
}

/** Temperature of sweep `s` (0-based): geometric cooling during annealing, then the run temperature. */
export function scheduledTemperatureK(spec: SimulationSpec, sweep: number): number {
  if (!spec.anneal || sweep >= spec.anneal.sweeps) return spec.temperatureK;
  const fraction = sweep / spec.anneal.sweeps;
  return spec.anneal.startTemperatureK * (spec.temperatureK / spec.anneal.startTemperatureK) ** fraction;
}

/** Rebuilds the site geometry of a stored run (deterministic from its inputs). */
export function rebuildGeometry(spec: SimulationSpec): ClusterGeometry {
  const plan = planSimulation(spec);
  return buildCluster(spec.shape, plan.size, plan.nearestNeighbourAngstrom);
}

function downsample(length: number, maxPoints: number): number[] {
  const step = Math.max(1, Math.ceil(length / maxPoints));
  const picks: number[] = [];
  for (let k = 0; k < length; k += step) picks.push(k);
  if (picks[picks.length - 1] !== length - 1) picks.push(length - 1);
  return picks;
}

/** What the sweep loop needs from either engine. */
interface SweepEngine {
  runSweep(temperatureK: number): void;
  readonly energyEv: number;
  readonly surfaceXB: number;
  readonly species: Uint8Array;
  readonly surfaceSites: number;
  /** Attempts and accepted moves so far (all kinds). */
  attempts(): number;
  accepted(): number;
}

function rigidSweeps(engine: SwapEngine): SweepEngine {
  return {
    runSweep: (temperatureK) => void engine.runAttempts(engine.atoms, temperatureK),
    get energyEv() {
      return engine.energyEv;
    },
    get surfaceXB() {
      return engine.surfaceXB;
    },
    species: engine.species,
    surfaceSites: engine.surfaceSites,
    attempts: () => engine.stats.attempts,
    accepted: () => engine.stats.accepted,
  };
}

function relaxedSweeps(engine: RelaxedEngine): SweepEngine {
  return {
    runSweep: (temperatureK) => engine.runSweep(temperatureK),
    get energyEv() {
      return engine.energyEv;
    },
    get surfaceXB() {
      return engine.surfaceXB;
    },
    species: engine.species,
    surfaceSites: engine.surfaceSites,
    attempts: () => engine.stats.swapAttempts + engine.stats.displacementAttempts,
    accepted: () => engine.stats.swapAccepted + engine.stats.displacementAccepted,
  };
}

/** Energy per atom of the given positions made entirely of `symbol`, relaxed to the local minimum (eV). */
function relaxedPureEnergyPerAtomEv(symbol: string, positions: Float64Array): number {
  const model = new OffLatticeGupta([symbol]);
  const copy = Float64Array.from(positions);
  const atoms = positions.length / 3;
  return minimiseInPlace(model, copy, new Uint8Array(atoms), { forceToleranceEvPerAngstrom: 1e-3 }).energyEv / atoms;
}

export function runSimulation(
  spec: SimulationSpec,
  random: SeededRandom,
  callbacks: SimulationCallbacks = {},
): SimulationResult {
  const plan = planSimulation(spec);
  const now = callbacks.now ?? Date.now;
  const elementA = guptaElement(spec.elementA, 'elementA');
  const elementB = guptaElement(spec.elementB, 'elementB');
  const nn = plan.nearestNeighbourAngstrom;
  const geometry = buildCluster(spec.shape, plan.size, nn);
  const cutoff = FIVE_SHELL_CUTOFF_FACTOR * nn;
  const list = buildNeighbourList(geometry.positions, cutoff);
  const sites = describeSites(list, geometry.positions, nn);
  const n = geometry.atoms;
  const countB = Math.min(n - 1, Math.max(1, Math.round(spec.xB * n)));
  const chosen = spec.relaxation
    ? { mode: spec.relaxation, reason: `${spec.relaxation} run chosen by the user` }
    : defaultRelaxation(elementA.symbol, elementB.symbol);
  const relaxed = chosen.mode === 'relaxed';

  // Random initial placement (partial Fisher–Yates with the seeded generator).
  const order = new Int32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  for (let k = 0; k < countB; k++) {
    const pick = k + random.nextInt(n - k);
    const tmp = order[k]!;
    order[k] = order[pick]!;
    order[pick] = tmp;
  }
  const species = new Uint8Array(n);
  for (let k = 0; k < countB; k++) species[order[k]!] = 1;

  const started = now();
  let rigidEngine: SwapEngine | null = null;
  let relaxedEngine: RelaxedEngine | null = null;
  let model: OffLatticeGupta | null = null;
  let engine: SweepEngine;
  if (relaxed) {
    model = new OffLatticeGupta([elementA.symbol, elementB.symbol]);
    const start = Float64Array.from(geometry.positions);
    minimiseInPlace(model, start, species, { forceToleranceEvPerAngstrom: 1e-2, maxIterations: 2000 });
    relaxedEngine = new RelaxedEngine(model, start, species, sites.surface, random, 0.05);
    engine = relaxedSweeps(relaxedEngine);
  } else {
    const tables = binaryTables(elementA.symbol, elementB.symbol, list);
    rigidEngine = new SwapEngine(list, geometry.positions, tables, species, sites.surface, random);
    engine = rigidSweeps(rigidEngine);
  }
  const initialEnergy = engine.energyEv;
  const annealSweeps = spec.anneal ? spec.anneal.sweeps : 0;
  const capSweeps = plan.totalSweeps;
  const stopping = spec.stopping ?? null;
  // Default report period: about 200 reports per run, but at least one per 2 × 10⁵ attempts (~0.2 s) for live traces.
  const every =
    spec.progressEverySweeps ??
    Math.max(1, Math.min(Math.round(capSweeps / 200), Math.round((relaxed ? 20_000 : 200_000) / n)));
  const orderEvery = stopping ? 1 : Math.max(1, Math.floor(spec.sweeps / 200));
  const tuningEnd = annealSweeps + (relaxed ? RELAXED_TUNING_SWEEPS : 0);

  const energyTrace = new Float64Array(capSweeps);
  const surfaceTrace = new Float64Array(capSweeps);
  const temperatureTrace = new Float64Array(capSweeps);
  const orderSweeps: number[] = [];
  const orderRatios: number[] = [];
  let lastReportAttempts = 0;
  let lastReportAccepted = 0;
  let sweepsRun = 0;
  let stoppedAtAnswer = false;
  let reportedTotal = capSweeps;
  for (let sweep = 0; sweep < capSweeps; sweep++) {
    if (callbacks.shouldCancel?.())
      throw new DomainError('cancelled', `the run was cancelled after ${sweep} of ${capSweeps} sweeps`);
    const temperatureK = scheduledTemperatureK(spec, sweep);
    const movesBefore = relaxedEngine ? { ...relaxedEngine.stats } : null;
    engine.runSweep(temperatureK);
    if (relaxedEngine && movesBefore && sweep < tuningEnd) {
      const tried = relaxedEngine.stats.displacementAttempts - movesBefore.displacementAttempts;
      if (tried > 0)
        relaxedEngine.tuneStep((relaxedEngine.stats.displacementAccepted - movesBefore.displacementAccepted) / tried);
    }
    energyTrace[sweep] = engine.energyEv;
    surfaceTrace[sweep] = engine.surfaceXB;
    temperatureTrace[sweep] = temperatureK;
    sweepsRun = sweep + 1;
    if (sweep >= annealSweeps && (sweep - annealSweeps) % orderEvery === orderEvery - 1) {
      orderSweeps.push(sweep);
      orderRatios.push(neighbourOrder(list, nn, engine.species).unlikeNeighbourRatio);
    }
    const production = sweep + 1 - annealSweeps;
    let stopNow = false;
    if (
      stopping &&
      production >= stopping.minSweeps &&
      production % STOPPING_CHUNK_SWEEPS === 0 &&
      sweep + 1 >= tuningEnd
    ) {
      const energyReport = detectEquilibration(energyTrace.subarray(annealSweeps, sweep + 1));
      if (energyReport.equilibrated) {
        const from = Math.max(annealSweeps + energyReport.equilibratedFromSample, tuningEnd);
        if (sweep + 1 - from >= 20) {
          const surfaceReport = detectEquilibration(surfaceTrace.subarray(from, sweep + 1));
          stopNow = surfaceReport.standardError < stopping.surfaceStandardError;
        }
      }
    }
    if (stopNow) {
      stoppedAtAnswer = true;
      reportedTotal = sweep + 1;
    }
    if ((sweep + 1) % every === 0 || sweep === capSweeps - 1 || stopNow) {
      const attempts = engine.attempts() - lastReportAttempts;
      const accepted = engine.accepted() - lastReportAccepted;
      lastReportAttempts = engine.attempts();
      lastReportAccepted = engine.accepted();
      callbacks.onProgress?.({
        sweep: sweep + 1,
        totalSweeps: reportedTotal,
        phase: sweep < annealSweeps ? 'anneal' : 'production',
        temperatureK,
        energyEv: engine.energyEv,
        energyPerAtomEv: engine.energyEv / n,
        surfaceXB: engine.surfaceXB,
        acceptance: attempts > 0 ? accepted / attempts : 0,
      });
    }
    if (stopNow) break;
  }
  const totalSweeps = sweepsRun;
  const elapsedMs = Math.max(now() - started, 1e-3);
  const accumulated = engine.energyEv;
  const finalEnergy = rigidEngine ? rigidEngine.recomputeEnergy() : relaxedEngine!.recomputeEnergy();
  const energyDriftEv = accumulated - initialEnergy - (finalEnergy - initialEnergy);

  const production = energyTrace.subarray(annealSweeps, totalSweeps);
  const equilibration = detectEquilibration(production);
  const fromSweep = Math.min(
    totalSweeps - 1,
    Math.max(annealSweeps + equilibration.equilibratedFromSample, Math.min(tuningEnd, totalSweeps - 1)),
  );
  // Every average reported starts at the same sweep: the detected equilibration point (never sweep 1 of the
  // random start), and not before the end of step tuning for a relaxed run.
  let surfaceSum = 0;
  let energySum = 0;
  for (let s = fromSweep; s < totalSweeps; s++) {
    surfaceSum += surfaceTrace[s]!;
    energySum += energyTrace[s]!;
  }
  const samples = totalSweeps - fromSweep;
  const surfaceXB = surfaceSum / samples;
  const surfaceReport = detectEquilibration(surfaceTrace.subarray(fromSweep, totalSweeps));
  let ratioSum = 0;
  let ratioCount = 0;
  for (let k = 0; k < orderSweeps.length; k++) {
    if (orderSweeps[k]! >= fromSweep) {
      ratioSum += orderRatios[k]!;
      ratioCount++;
    }
  }
  const final = analyseParticle(sites, engine.species, elementA.symbol, elementB.symbol);
  const finalPositions = relaxedEngine ? relaxedEngine.positions : geometry.positions;
  const separation = analyseSeparation(list, nn, finalPositions, engine.species, elementA.symbol, elementB.symbol);
  const unlikeNeighbourRatio = ratioCount > 0 ? ratioSum / ratioCount : final.order.unlikeNeighbourRatio;
  const thresholds = spec.thresholds ?? DEFAULT_THRESHOLDS;
  const classification = classifyArchitecture(
    {
      elementA: elementA.symbol,
      elementB: elementB.symbol,
      xB: countB / n,
      surfaceXB,
      unlikeNeighbourRatio,
      separation: {
        centreOfMassOffset: separation.centreOfMassOffset,
        largestDomainShareA: separation.domains[elementA.symbol]!.largestDomainShare,
        largestDomainShareB: separation.domains[elementB.symbol]!.largestDomainShare,
      },
    },
    thresholds,
  );

  const x = countB / n;
  let pureA: number;
  let pureB: number;
  let quenchedEnergyEv: number | null = null;
  let mixingEnergyPerAtomEv: number;
  if (relaxedEngine && model) {
    const quenched = Float64Array.from(relaxedEngine.positions);
    quenchedEnergyEv = minimiseInPlace(model, quenched, relaxedEngine.species, {
      forceToleranceEvPerAngstrom: 1e-3,
    }).energyEv;
    pureA = relaxedPureEnergyPerAtomEv(
      elementA.symbol,
      Float64Array.from(geometry.positions, (v) => (v * elementA.r0Angstrom) / nn),
    );
    pureB = relaxedPureEnergyPerAtomEv(
      elementB.symbol,
      Float64Array.from(geometry.positions, (v) => (v * elementB.r0Angstrom) / nn),
    );
    mixingEnergyPerAtomEv = quenchedEnergyEv / n - (1 - x) * pureA - x * pureB;
  } else {
    pureA =
      configurationEnergyEv(
        list,
        binaryTables(elementA.symbol, elementA.symbol, list, elementA.r0Angstrom / nn),
        new Uint8Array(n),
      ) / n;
    pureB =
      configurationEnergyEv(
        list,
        binaryTables(elementB.symbol, elementB.symbol, list, elementB.r0Angstrom / nn),
        new Uint8Array(n),
      ) / n;
    mixingEnergyPerAtomEv = finalEnergy / n - (1 - x) * pureA - x * pureB;
  }

  const picks = downsample(totalSweeps, 500);
  const traces: SimulationTraces = {
    sweep: picks.map((k) => k + 1),
    temperatureK: picks.map((k) => temperatureTrace[k]!),
    energyEv: picks.map((k) => energyTrace[k]!),
    surfaceXB: picks.map((k) => surfaceTrace[k]!),
  };
  let occupation = '';
  for (let i = 0; i < n; i++) occupation += engine.species[i] ? 'B' : 'A';

  const attempts = engine.attempts();
  const accepted = engine.accepted();
  const moves = relaxedEngine?.stats;
  const relaxation: RelaxationReport = {
    mode: chosen.mode,
    reason: chosen.reason,
    design: relaxed ? RELAXED_DESIGN : RIGID_DESIGN,
    sizeMismatch: sizeMismatch(elementA.symbol, elementB.symbol),
    displacementStepAngstrom: relaxedEngine ? relaxedEngine.stepAngstrom : null,
    displacementAcceptance:
      moves && moves.displacementAttempts > 0 ? moves.displacementAccepted / moves.displacementAttempts : null,
    swapAcceptance: moves
      ? moves.swapAttempts > 0
        ? moves.swapAccepted / moves.swapAttempts
        : 0
      : attempts > 0
        ? accepted / attempts
        : 0,
    quenchedEnergyEv,
    neighbourListBuilds: relaxedEngine ? relaxedEngine.neighbourListBuilds : null,
  };
  return {
    engineVersion: relaxed ? RELAXED_ENGINE_VERSION : ENGINE_VERSION,
    spec: { ...spec },
    elementA: elementA.symbol,
    elementB: elementB.symbol,
    pairRule: guptaPair(elementA.symbol, elementB.symbol).rule,
    geometry: {
      shape: geometry.shape,
      shells: geometry.shells,
      atoms: n,
      nearestNeighbourAngstrom: nn,
      cutoffAngstrom: relaxed && model ? model.maxCutoffAngstrom : cutoff,
      equivalentDiameterNm: geometry.equivalentDiameterNm,
    },
    atoms: n,
    countA: n - countB,
    countB,
    xB: x,
    energyEv: finalEnergy,
    energyPerAtomEv: finalEnergy / n,
    meanEnergyEv: energySum / samples,
    mixingEnergyPerAtomEv,
    pureClusterEnergyPerAtomEv: { [elementA.symbol]: pureA, [elementB.symbol]: pureB },
    surfaceSites: engine.surfaceSites,
    surfaceXB,
    surfaceXBStandardError: surfaceReport.standardError,
    surfaceFraction: { [elementA.symbol]: 1 - surfaceXB, [elementB.symbol]: surfaceXB },
    final,
    radialProfile: final.radialProfile,
    warrenCowley: 1 - unlikeNeighbourRatio,
    unlikeNeighbourRatio,
    classification,
    architecture: classification.label,
    attempts,
    accepted,
    acceptance: attempts > 0 ? accepted / attempts : 0,
    attemptsPerSecond: attempts / (elapsedMs / 1000),
    elapsedMs,
    energyDriftEv,
    equilibration: { ...equilibration, equilibratedFromSample: fromSweep - annealSweeps },
    traces,
    finalOccupation: occupation,
    relaxation,
    stopping: { rule: stopping, sweepsTaken: totalSweeps - annealSweeps, stoppedAtAnswer, capSweeps: spec.sweeps },
    separation,
    finalPositionsAngstrom: relaxedEngine
      ? Array.from(relaxedEngine.positions, (v) => Math.round(v * 1e4) / 1e4)
      : null,
    kineticNote: SWAP_REALISM_NOTE,
  };
}

export { GUPTA_ELEMENTS };
