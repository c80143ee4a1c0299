/**
 * One lattice Monte Carlo run of a binary particle, from inputs to the analysed result: build the
 * cluster, place the atoms at random (seeded), optionally anneal from a high temperature down, run
 * Metropolis swap sweeps, detect equilibration by block averages, analyse and classify.
 *
 * A sweep is one swap attempt per atom (common practice). The lattice spacing of the particle is
 * Vegard's law between the two metals' fitted nearest-neighbour distances; sites stay fixed (no
 * relaxation), which is the known limit of a rigid-lattice model for size-mismatched pairs.
 */
import { DomainError, invalid } from '../api/result';
import { DEFAULT_THRESHOLDS, type Classification, type ClassificationThresholds } from '../architecture/classify';
import { buildNeighbourList, FIVE_SHELL_CUTOFF_FACTOR } from '../clusters/neighbours';
import { buildCluster, predictedAtomCount, type ClusterGeometry, type ClusterSize } from '../clusters/shapes';
import { isParticleShape, PARTICLE_SHAPES, type ParticleShape } from '../geometry/shapes';
import type { SeededRandom } from '../random';
import { analyseParticle, classifyParticle, describeSites, neighbourOrder, type ParticleAnalysis, type RadialLayer } from './analysis';
import { detectEquilibration, type EquilibrationReport } from './equilibration';
import { GUPTA_ELEMENTS, guptaElement, guptaPair, type PairRule } from './gupta-parameters';
import { binaryTables, configurationEnergyEv, SwapEngine } from './swap-engine';

export const ENGINE_VERSION = 'gupta-swap-mc-1';

/** Limits checked before any work starts (stated to the user in messages and docs). */
export const SIMULATION_LIMITS = Object.freeze({
  /** Memory: neighbour lists take ~0.5 kB per atom, so 50,000 atoms stay near 25 MB. */
  maxAtoms: 50_000,
  maxSweeps: 100_000,
  /** Attempts (atoms × all sweeps): 2 × 10⁹ is about half an hour at 10⁶ attempts/s. */
  maxAttempts: 2_000_000_000,
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

export interface SimulationResult {
  engineVersion: string;
  spec: SimulationSpec;
  elementA: string;
  elementB: string;
  pairRule: PairRule;
  geometry: { shape: ParticleShape; shells: number; atoms: number; nearestNeighbourAngstrom: number; cutoffAngstrom: number; equivalentDiameterNm: number };
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
}

function requireFiniteNumber(field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw invalid(field, `${field} must be a number, got ${String(value)}`);
  return value;
}

/** Validates a run's inputs (naming the field at fault) and states its size, before any work starts. */
export function planSimulation(spec: SimulationSpec): SimulationPlan {
  const a = guptaElement(spec.elementA, 'elementA');
  const b = guptaElement(spec.elementB, 'elementB');
  if (a.symbol === b.symbol) throw invalid('elementB', `a pair needs two different metals, got ${a.symbol} twice`);
  const xB = requireFiniteNumber('xB', spec.xB);
  if (xB <= 0 || xB >= 1) throw invalid('xB', `xB must lie strictly between 0 and 1, got ${xB}`);
  if (!isParticleShape(spec.shape)) throw invalid('shape', `unknown shape "${String(spec.shape)}"; use one of ${PARTICLE_SHAPES.join(', ')}`);
  const hasShells = spec.shells !== undefined && spec.shells !== null;
  const hasDiameter = spec.diameterNm !== undefined && spec.diameterNm !== null;
  if (hasShells === hasDiameter) throw invalid('shells', 'give the size either as shells or as diameterNm (exactly one)');
  let size: ClusterSize;
  if (hasShells) {
    const shells = requireFiniteNumber('shells', spec.shells);
    if (!Number.isInteger(shells) || shells < 1) throw invalid('shells', `shells must be a whole number ≥ 1, got ${shells}`);
    if (shells > 60) throw invalid('shells', `shells must be at most 60 (the atom cap is ${SIMULATION_LIMITS.maxAtoms}), got ${shells}`);
    size = { shells };
  } else {
    const diameterNm = requireFiniteNumber('diameterNm', spec.diameterNm);
    if (diameterNm <= 0) throw invalid('diameterNm', `diameterNm must be > 0, got ${diameterNm}`);
    if (diameterNm > 30) throw invalid('diameterNm', `diameterNm must be at most 30 nm (the atom cap is ${SIMULATION_LIMITS.maxAtoms}), got ${diameterNm}`);
    size = { diameterNm };
  }
  const nn = (1 - xB) * a.r0Angstrom + xB * b.r0Angstrom;
  const atoms = predictedAtomCount(spec.shape, size, nn);
  if (atoms > SIMULATION_LIMITS.maxAtoms) {
    throw invalid(hasShells ? 'shells' : 'diameterNm', `this size gives about ${atoms} atoms; the limit is ${SIMULATION_LIMITS.maxAtoms} atoms (memory)`);
  }
  if (atoms < 2) throw invalid(hasShells ? 'shells' : 'diameterNm', 'the particle must hold at least two atoms');
  const countB = Math.round(xB * atoms);
  if (countB < 1 || countB > atoms - 1) {
    throw invalid('xB', `xB = ${xB} leaves ${countB} of ${atoms} atoms as ${b.symbol}; at least one atom of each metal is needed`);
  }
  const temperatureK = requireFiniteNumber('temperatureK', spec.temperatureK);
  if (temperatureK <= 0) throw invalid('temperatureK', `temperatureK must be > 0 K, got ${temperatureK}`);
  if (temperatureK > SIMULATION_LIMITS.maxTemperatureK) throw invalid('temperatureK', `temperatureK must be at most ${SIMULATION_LIMITS.maxTemperatureK} K, got ${temperatureK}`);
  const sweeps = requireFiniteNumber('sweeps', spec.sweeps);
  if (!Number.isInteger(sweeps) || sweeps < 1) throw invalid('sweeps', `sweeps must be a whole number ≥ 1, got ${sweeps}`);
  if (sweeps > SIMULATION_LIMITS.maxSweeps) throw invalid('sweeps', `sweeps must be at most ${SIMULATION_LIMITS.maxSweeps}, got ${sweeps}`);
  let annealSweeps = 0;
  if (spec.anneal) {
    const start = requireFiniteNumber('anneal.startTemperatureK', spec.anneal.startTemperatureK);
    if (start <= temperatureK) throw invalid('anneal.startTemperatureK', `the annealing start (${start} K) must be above the run temperature (${temperatureK} K)`);
    if (start > SIMULATION_LIMITS.maxTemperatureK) throw invalid('anneal.startTemperatureK', `anneal.startTemperatureK must be at most ${SIMULATION_LIMITS.maxTemperatureK} K, got ${start}`);
    annealSweeps = requireFiniteNumber('anneal.sweeps', spec.anneal.sweeps);
    if (!Number.isInteger(annealSweeps) || annealSweeps < 1) throw invalid('anneal.sweeps', `anneal.sweeps must be a whole number ≥ 1, got ${annealSweeps}`);
    if (annealSweeps > SIMULATION_LIMITS.maxSweeps) throw invalid('anneal.sweeps', `anneal.sweeps must be at most ${SIMULATION_LIMITS.maxSweeps}, got ${annealSweeps}`);
  }
  const seed = requireFiniteNumber('seed', spec.seed);
  if (!Number.isInteger(seed)) throw invalid('seed', `seed must be a whole number, got ${seed}`);
  if (spec.progressEverySweeps !== undefined) {
    const every = requireFiniteNumber('progressEverySweeps', spec.progressEverySweeps);
    if (!Number.isInteger(every) || every < 1) throw invalid('progressEverySweeps', `progressEverySweeps must be a whole number ≥ 1, got ${every}`);
  }
  const totalSweeps = sweeps + annealSweeps;
  const attempts = totalSweeps * atoms;
  if (attempts > SIMULATION_LIMITS.maxAttempts) {
    throw invalid('sweeps', `${totalSweeps} sweeps × ${atoms} atoms = ${attempts.toExponential(2)} attempts; the limit is ${SIMULATION_LIMITS.maxAttempts.toExponential(0)} (about half an hour)`);
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

export function runSimulation(spec: SimulationSpec, random: SeededRandom, callbacks: SimulationCallbacks = {}): SimulationResult {
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

  const tables = binaryTables(elementA.symbol, elementB.symbol, list);
  const engine = new SwapEngine(list, geometry.positions, tables, species, sites.surface, random);
  const initialEnergy = engine.energyEv;
  const annealSweeps = spec.anneal ? spec.anneal.sweeps : 0;
  const totalSweeps = plan.totalSweeps;
  // Default report period: about 200 reports per run, but at least one per 2 × 10⁵ attempts (~0.2 s) for live traces.
  const every = spec.progressEverySweeps ?? Math.max(1, Math.min(Math.round(totalSweeps / 200), Math.round(200_000 / n)));
  const orderEvery = Math.max(1, Math.floor(spec.sweeps / 200));

  const energyTrace = new Float64Array(totalSweeps);
  const surfaceTrace = new Float64Array(totalSweeps);
  const temperatureTrace = new Float64Array(totalSweeps);
  const orderSweeps: number[] = [];
  const orderRatios: number[] = [];
  let lastReportAttempts = 0;
  let lastReportAccepted = 0;
  const started = now();
  for (let sweep = 0; sweep < totalSweeps; sweep++) {
    if (callbacks.shouldCancel?.()) throw new DomainError('cancelled', `the run was cancelled after ${sweep} of ${totalSweeps} sweeps`);
    const temperatureK = scheduledTemperatureK(spec, sweep);
    engine.runAttempts(n, temperatureK);
    energyTrace[sweep] = engine.energyEv;
    surfaceTrace[sweep] = engine.surfaceXB;
    temperatureTrace[sweep] = temperatureK;
    if (sweep >= annealSweeps && (sweep - annealSweeps) % orderEvery === orderEvery - 1) {
      orderSweeps.push(sweep);
      orderRatios.push(neighbourOrder(list, nn, engine.species).unlikeNeighbourRatio);
    }
    if ((sweep + 1) % every === 0 || sweep === totalSweeps - 1) {
      const attempts = engine.stats.attempts - lastReportAttempts;
      const accepted = engine.stats.accepted - lastReportAccepted;
      lastReportAttempts = engine.stats.attempts;
      lastReportAccepted = engine.stats.accepted;
      callbacks.onProgress?.({
        sweep: sweep + 1,
        totalSweeps,
        phase: sweep < annealSweeps ? 'anneal' : 'production',
        temperatureK,
        energyEv: engine.energyEv,
        energyPerAtomEv: engine.energyEv / n,
        surfaceXB: engine.surfaceXB,
        acceptance: attempts > 0 ? accepted / attempts : 0,
      });
    }
  }
  const elapsedMs = Math.max(now() - started, 1e-3);
  const accumulated = engine.energyEv;
  const finalEnergy = engine.recomputeEnergy();
  const energyDriftEv = accumulated - initialEnergy - (finalEnergy - initialEnergy);

  const production = energyTrace.subarray(annealSweeps);
  const equilibration = detectEquilibration(production);
  const fromSweep = annealSweeps + equilibration.equilibratedFromSample;
  let surfaceSum = 0;
  for (let s = fromSweep; s < totalSweeps; s++) surfaceSum += surfaceTrace[s]!;
  const samples = totalSweeps - fromSweep;
  const surfaceXB = surfaceSum / samples;
  const surfaceReport = detectEquilibration(surfaceTrace.subarray(fromSweep));
  let ratioSum = 0;
  let ratioCount = 0;
  for (let k = 0; k < orderSweeps.length; k++) {
    if (orderSweeps[k]! >= fromSweep) {
      ratioSum += orderRatios[k]!;
      ratioCount++;
    }
  }
  const final = analyseParticle(sites, engine.species, elementA.symbol, elementB.symbol);
  const unlikeNeighbourRatio = ratioCount > 0 ? ratioSum / ratioCount : final.order.unlikeNeighbourRatio;
  const thresholds = spec.thresholds ?? DEFAULT_THRESHOLDS;
  const classification = classifyParticle(elementA.symbol, elementB.symbol, countB / n, surfaceXB, unlikeNeighbourRatio, thresholds);

  const pureA = configurationEnergyEv(list, binaryTables(elementA.symbol, elementA.symbol, list, elementA.r0Angstrom / nn), new Uint8Array(n)) / n;
  const pureB = configurationEnergyEv(list, binaryTables(elementB.symbol, elementB.symbol, list, elementB.r0Angstrom / nn), new Uint8Array(n)) / n;
  const x = countB / n;
  const mixingEnergyPerAtomEv = finalEnergy / n - (1 - x) * pureA - x * pureB;

  const picks = downsample(totalSweeps, 500);
  const traces: SimulationTraces = {
    sweep: picks.map((k) => k + 1),
    temperatureK: picks.map((k) => temperatureTrace[k]!),
    energyEv: picks.map((k) => energyTrace[k]!),
    surfaceXB: picks.map((k) => surfaceTrace[k]!),
  };
  let occupation = '';
  for (let i = 0; i < n; i++) occupation += engine.species[i] ? 'B' : 'A';

  const attempts = engine.stats.attempts;
  return {
    engineVersion: ENGINE_VERSION,
    spec: { ...spec },
    elementA: elementA.symbol,
    elementB: elementB.symbol,
    pairRule: guptaPair(elementA.symbol, elementB.symbol).rule,
    geometry: {
      shape: geometry.shape,
      shells: geometry.shells,
      atoms: n,
      nearestNeighbourAngstrom: nn,
      cutoffAngstrom: cutoff,
      equivalentDiameterNm: geometry.equivalentDiameterNm,
    },
    atoms: n,
    countA: n - countB,
    countB,
    xB: x,
    energyEv: finalEnergy,
    energyPerAtomEv: finalEnergy / n,
    meanEnergyEv: equilibration.mean,
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
    accepted: engine.stats.accepted,
    acceptance: attempts > 0 ? engine.stats.accepted / attempts : 0,
    attemptsPerSecond: attempts / (elapsedMs / 1000),
    elapsedMs,
    energyDriftEv,
    equilibration,
    traces,
    finalOccupation: occupation,
  };
}

export { GUPTA_ELEMENTS };
