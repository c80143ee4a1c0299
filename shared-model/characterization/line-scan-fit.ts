/**
 * Fits the four line-scan models of chord-profile.ts to an EDX line scan and chooses between them by BIC.
 *
 * Signal model per channel c ∈ {A, B}:  y_c(x) = k_c · (G_σ * L_c)(x) + b_c, with L_c the chord through c's
 * region, G_σ the Gaussian probe, k_c ≥ 0 an amplitude (density × detector sensitivity) and b_c a background.
 * For given geometry (x0, R, core fraction f = rc/R, σ) the amplitudes and backgrounds are linear and are
 * solved exactly (variable projection, Golub & Pereyra, SIAM J. Numer. Anal. 10, 413 (1973)); the geometry
 * is fitted by Levenberg–Marquardt (ml-levenberg-marquardt) within bounds, from starting values read off the
 * data (half-maximum widths of each channel), with two starts per core@shell model and both Janus
 * orientations. Residuals are weighted by each channel's noise: Poisson variance for raw counts (non-negative
 * integers), otherwise a constant per channel estimated from second differences (MAD).
 *
 * Choice: BIC = N·ln(WRSS/N) + k·ln N (Schwarz, Ann. Stat. 6, 461 (1978)), N = 2 × points, k = all fitted
 * parameters (geometry, 4 linear, 1 noise scale). Evidence from the BIC gap to the runner-up follows Kass &
 * Raftery, J. Am. Stat. Assoc. 90, 773 (1995): < 2 weak, 2–6 positive, 6–10 strong, > 10 very strong.
 * Uncertainties: covariance s²(JᵀJ)⁻¹ of all parameters at the optimum (J by central differences for the
 * geometry, exact for the linear ones), s² = WRSS/(N − k); core radius fR and shell R(1 − f) by the delta method.
 */
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { Matrix, inverse } from 'ml-matrix';
import { coreShellLabel, type ArchitectureLabel } from '../architecture/labels';
import { invalid } from '../api/result';
import { monolayerThicknessNm } from '../geometry/fcc';
import {
  BlurredChordGrid,
  KERNEL_HALF_WIDTH_SIGMAS,
  LINE_SCAN_MODELS,
  type LineScanModelKind,
  type ProfileGeometry,
} from './chord-profile';
import { MIN_LINE_SCAN_POINTS, type LineScanData } from './csv-import';
import { median } from './size-statistics';
import { ANALYSIS_VERSION } from './version';
import { BudgetExceeded, BudgetMeter, type Clock, type ComputeBudget } from '../compute-budget';

export interface LineScanFitOptions {
  elementA: string;
  elementB: string;
  /** Probe σ (nm) when known; fitted when omitted or null. */
  probeSigmaNm?: number | null;
  /** Lattice constants (nm) used to express a shell of A or of B in monolayers. */
  latticeANm?: number | null;
  latticeBNm?: number | null;
  /** Levenberg–Marquardt iterations per start (default 60). */
  maxIterations?: number;
  /** Model evaluations and wall time of the whole fit, every model and start (default LINE_SCAN_FIT_BUDGET). */
  budget?: ComputeBudget;
  /** The budget's clock (tests pass their own). */
  clock?: Clock;
}

/**
 * A whole fit (four models, up to three starts each, 60 Levenberg–Marquardt steps of 2·p + 1 evaluations) takes
 * at most ~3,500 model evaluations; 20,000 leaves room for the covariances. 30 s is far above the ~0.1 s a
 * scan of a few hundred points takes (npm run bench), and keeps a pathological scan from holding a core.
 */
/** Model grid plus blur kernel cells: 4 million (~100 MB of work arrays) is ~20 cells per point of 200,000 points. */
export const MAX_GRID_CELLS = 4_000_000;

export const LINE_SCAN_FIT_BUDGET: ComputeBudget = Object.freeze({ maxIterations: 20_000, maxWallMs: 30_000 });

export interface Estimate {
  value: number;
  /** One standard uncertainty, or null when the covariance could not be formed. */
  sd: number | null;
}

export interface LineScanModelFit {
  model: LineScanModelKind;
  /** "alloy", "Au@Pd", "Pd@Au" or "Janus". */
  label: ArchitectureLabel;
  parameterCount: number;
  weightedRss: number;
  bic: number;
  /** BIC − smallest BIC over the models. */
  deltaBic: number;
  /** Approximate posterior probability from BIC, exp(−ΔBIC/2) normalised. */
  bicWeight: number;
  centerNm: Estimate;
  radiusNm: Estimate;
  coreRadiusNm: Estimate | null;
  shellThicknessNm: Estimate | null;
  shellMonolayers: Estimate | null;
  probeSigmaNm: Estimate;
  probeFitted: boolean;
  amplitudeA: number;
  amplitudeB: number;
  backgroundA: number;
  backgroundB: number;
  /** Janus only: true when A occupies the low-position hemisphere. */
  janusALow: boolean | null;
  /** Fitted signals at the scan positions. */
  fittedA: number[];
  fittedB: number[];
  /** Parameters that ended on a bound (their uncertainties are not meaningful). */
  atBounds: string[];
  iterations: number;
}

export type BicEvidence = 'weak' | 'positive' | 'strong' | 'very strong';

export interface LineScanAnalysis {
  analysisVersion: string;
  elementA: string;
  elementB: string;
  unit: LineScanData['unit'];
  points: number;
  chosenModel: ArchitectureLabel;
  chosenKind: LineScanModelKind;
  models: LineScanModelFit[];
  evidence: BicEvidence;
  /** BIC gap between the chosen model and the runner-up. */
  deltaBicToNext: number;
  /** Suggested observed architecture (labels.ts), with the reason. */
  suggestion: { label: ArchitectureLabel; reason: string };
  noise: { a: number; b: number; model: 'poisson' | 'constant' };
  notes: string[];
}

export function modelLabel(kind: LineScanModelKind, elementA: string, elementB: string): ArchitectureLabel {
  switch (kind) {
    case 'alloy':
      return 'alloy';
    case 'A@B':
      return coreShellLabel(elementA, elementB);
    case 'B@A':
      return coreShellLabel(elementB, elementA);
    case 'Janus':
      return 'Janus';
  }
}

export function bicEvidence(deltaBic: number): BicEvidence {
  if (deltaBic > 10) return 'very strong';
  if (deltaBic > 6) return 'strong';
  if (deltaBic > 2) return 'positive';
  return 'weak';
}

// ---------------------------------------------------------------- input checks and noise

function checkScan(scan: LineScanData, options: LineScanFitOptions): void {
  const { positionsNm: x, signalA, signalB } = scan;
  const n = x.length;
  if (n !== signalA.length || n !== signalB.length)
    throw invalid(
      'signalA',
      `positions (${n}) and signals (${signalA.length}, ${signalB.length}) must have the same length`,
    );
  if (n < MIN_LINE_SCAN_POINTS)
    throw invalid(
      'positionsNm',
      `a line scan needs at least ${MIN_LINE_SCAN_POINTS} points to compare the four models, got ${n}`,
    );
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(x[i])) throw invalid('positionsNm', `position #${i + 1} is not a number`);
    if (i > 0 && !((x[i] as number) > (x[i - 1] as number)))
      throw invalid('positionsNm', `positions must increase; #${i + 1} (${x[i]} nm) does not`);
    if (!Number.isFinite(signalA[i])) throw invalid('signalA', `${options.elementA} signal #${i + 1} is not a number`);
    if (!Number.isFinite(signalB[i])) throw invalid('signalB', `${options.elementB} signal #${i + 1} is not a number`);
  }
  const allZero = (s: readonly number[]) => s.every((v) => v === 0);
  if (allZero(signalA))
    throw invalid(
      'signalA',
      `the ${options.elementA} channel is zero at every point; check the column or the X-ray line chosen`,
    );
  if (allZero(signalB))
    throw invalid(
      'signalB',
      `the ${options.elementB} channel is zero at every point; check the column or the X-ray line chosen`,
    );
  if (scan.unit === 'atPercent') {
    let normalised = 0;
    for (let i = 0; i < n; i++) if (Math.abs((signalA[i] as number) + (signalB[i] as number) - 100) < 5) normalised++;
    if (normalised >= 0.8 * n) {
      throw invalid(
        'unit',
        `the at.% of ${options.elementA} and ${options.elementB} add up to 100 at ${normalised} of ${n} points (normalised to the two metals): such a profile carries no thickness information; export counts or net intensities instead`,
      );
    }
  }
}

/** Noise SD of a channel from second differences: var(y[i+1] − 2y[i] + y[i−1]) = 6σ² for white noise. */
function secondDifferenceNoise(y: Float64Array, peak: number): number {
  const d: number[] = [];
  for (let i = 1; i < y.length - 1; i++)
    d.push(Math.abs((y[i + 1] as number) - 2 * (y[i] as number) + (y[i - 1] as number)));
  d.sort((p, q) => p - q);
  const mad = median(d);
  if (mad > 0) return (1.4826 * mad) / Math.sqrt(6);
  const meanAbs = d.reduce((s, v) => s + v, 0) / d.length;
  if (meanAbs > 0) return (meanAbs * Math.sqrt(Math.PI / 2)) / Math.sqrt(6);
  return Math.max(Math.abs(peak), 1) * 1e-6;
}

function smooth3(y: Float64Array): Float64Array {
  const n = y.length;
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const a = y[Math.max(0, i - 1)] as number;
    const c = y[Math.min(n - 1, i + 1)] as number;
    out[i] = (a + (y[i] as number) + c) / 3;
  }
  return out;
}

/** Positions where a profile crosses half its maximum (outermost crossings, linearly interpolated). */
function halfMaximumExtent(x: Float64Array, profile: Float64Array): { left: number; right: number } {
  let peak = 0;
  let peakIndex = 0;
  for (let i = 0; i < profile.length; i++)
    if ((profile[i] as number) > peak) {
      peak = profile[i] as number;
      peakIndex = i;
    }
  const half = peak / 2;
  let l = peakIndex;
  while (l > 0 && (profile[l - 1] as number) >= half) l--;
  let r = peakIndex;
  while (r < profile.length - 1 && (profile[r + 1] as number) >= half) r++;
  const interp = (i: number, j: number) => {
    const yi = profile[i] as number;
    const yj = profile[j] as number;
    const t = yj === yi ? 0.5 : (half - yi) / (yj - yi);
    return (x[i] as number) + t * ((x[j] as number) - (x[i] as number));
  };
  const left = l > 0 ? interp(l - 1, l) : (x[0] as number);
  const right = r < profile.length - 1 ? interp(r, r + 1) : (x[profile.length - 1] as number);
  return { left, right };
}

// ---------------------------------------------------------------- the fit problem

interface Problem {
  n: number;
  x: Float64Array;
  yA: Float64Array;
  yB: Float64Array;
  /** Per-point noise SD. */
  sA: Float64Array;
  sB: Float64Array;
  grid: BlurredChordGrid;
  stepNm: number;
  sigmaMinNm: number;
  sigmaMaxNm: number;
  radiusMinNm: number;
  radiusMaxNm: number;
  scaleNm: number;
  // work buffers
  phiA: Float64Array;
  phiB: Float64Array;
  /** Counts every model evaluation against the fit's budget. */
  meter: BudgetMeter;
}

interface LinearSolution {
  kA: number;
  bA: number;
  kB: number;
  bB: number;
  wrss: number;
}

function solveChannel(phi: Float64Array, y: Float64Array, s: Float64Array): { k: number; b: number; rss: number } {
  let sw = 0;
  let sp = 0;
  let sy = 0;
  let spp = 0;
  let spy = 0;
  for (let i = 0; i < phi.length; i++) {
    const w = 1 / ((s[i] as number) * (s[i] as number));
    const p = phi[i] as number;
    const v = y[i] as number;
    sw += w;
    sp += w * p;
    sy += w * v;
    spp += w * p * p;
    spy += w * p * v;
  }
  const det = sw * spp - sp * sp;
  let k = det > 1e-12 * sw * spp ? (sw * spy - sp * sy) / det : 0;
  let b: number;
  if (!(k > 0)) {
    k = 0;
    b = sy / sw;
  } else b = (sy - k * sp) / sw;
  let rss = 0;
  for (let i = 0; i < phi.length; i++) {
    const r = ((y[i] as number) - k * (phi[i] as number) - b) / (s[i] as number);
    rss += r * r;
  }
  return { k, b, rss };
}

function solveLinear(problem: Problem): LinearSolution {
  const a = solveChannel(problem.phiA, problem.yA, problem.sA);
  const b = solveChannel(problem.phiB, problem.yB, problem.sB);
  return { kA: a.k, bA: a.b, kB: b.k, bB: b.b, wrss: a.rss + b.rss };
}

interface ModelSetup {
  kind: LineScanModelKind;
  janusALow: boolean;
  hasCore: boolean;
  fitSigma: boolean;
  fixedSigmaNm: number;
}

/** Geometry and σ from a nonlinear parameter vector in scaled units [x0/L, R/L, (f), (σ/L)]. */
function decode(
  setup: ModelSetup,
  p: ArrayLike<number>,
  scaleNm: number,
): { geometry: ProfileGeometry; sigmaNm: number; f: number } {
  const radiusNm = (p[1] as number) * scaleNm;
  const f = setup.hasCore ? (p[2] as number) : 1;
  const sigmaNm = setup.fitSigma ? (p[setup.hasCore ? 3 : 2] as number) * scaleNm : setup.fixedSigmaNm;
  return {
    geometry: {
      kind: setup.kind,
      centerNm: (p[0] as number) * scaleNm,
      radiusNm,
      coreRadiusNm: f * radiusNm,
      janusALow: setup.janusALow,
    },
    sigmaNm,
    f,
  };
}

const CORE_FRACTION_BOUNDS = [0.05, 0.98] as const;
const LM_CHUNK = 8;
/**
 * A channel whose smoothed peak over background is below 2.5 noise SDs holds no particle signal (for pure
 * noise the largest 3-point mean of ~50 points is about 1.4 SD).
 */
const NO_SIGNAL_RATIO = 2.5;
const LM_RELATIVE_TOLERANCE = 1e-7;

function parameterNames(setup: ModelSetup): string[] {
  const names = ['centre', 'radius'];
  if (setup.hasCore) names.push('core fraction');
  if (setup.fitSigma) names.push('probe σ');
  return names;
}

function bounds(setup: ModelSetup, problem: Problem): { min: number[]; max: number[] } {
  const L = problem.scaleNm;
  const x = problem.x;
  const min = [(x[0] as number) / L, problem.radiusMinNm / L];
  const max = [(x[problem.n - 1] as number) / L, problem.radiusMaxNm / L];
  if (setup.hasCore) {
    min.push(CORE_FRACTION_BOUNDS[0]);
    max.push(CORE_FRACTION_BOUNDS[1]);
  }
  if (setup.fitSigma) {
    min.push(problem.sigmaMinNm / L);
    max.push(problem.sigmaMaxNm / L);
  }
  return { min, max };
}

function evaluateModel(problem: Problem, setup: ModelSetup, p: ArrayLike<number>): LinearSolution {
  problem.meter.spend(1);
  const { geometry, sigmaNm } = decode(setup, p, problem.scaleNm);
  problem.grid.evaluate(geometry, sigmaNm, problem.phiA, problem.phiB);
  return solveLinear(problem);
}

interface RawFit {
  setup: ModelSetup;
  params: number[];
  linear: LinearSolution;
  iterations: number;
}

function runLevenbergMarquardt(problem: Problem, setup: ModelSetup, start: number[], maxIterations: number): RawFit {
  const n = problem.n;
  const xs = new Float64Array(2 * n);
  const ys = new Float64Array(2 * n);
  for (let i = 0; i < 2 * n; i++) {
    xs[i] = i;
    ys[i] =
      i < n
        ? (problem.yA[i] as number) / (problem.sA[i] as number)
        : (problem.yB[i - n] as number) / (problem.sB[i - n] as number);
  }
  // The library compares errors as Σ r²·w² but steps with weights 1/w², which disagree unless w = 1:
  // the data and model are therefore passed already divided by their noise SD, with unit weights.
  const model = (p: number[]) => {
    const lin = evaluateModel(problem, setup, p);
    const values = new Float64Array(2 * n);
    for (let i = 0; i < n; i++) {
      values[i] = (lin.kA * (problem.phiA[i] as number) + lin.bA) / (problem.sA[i] as number);
      values[i + n] = (lin.kB * (problem.phiB[i] as number) + lin.bB) / (problem.sB[i] as number);
    }
    return (index: number) => values[index] as number;
  };
  const { min, max } = bounds(setup, problem);
  const clampedStart = start.map((v, i) => Math.min(Math.max(v, min[i] as number), max[i] as number));
  // The library has no relative stopping rule, so it runs in chunks until a chunk no longer improves the fit.
  let params = clampedStart;
  let wrss = evaluateModel(problem, setup, params).wrss;
  let iterations = 0;
  while (iterations < maxIterations) {
    const chunk = Math.min(LM_CHUNK, maxIterations - iterations);
    const result = levenbergMarquardt({ x: xs, y: ys }, model, {
      initialValues: params,
      minValues: min,
      maxValues: max,
      damping: 1e-2,
      gradientDifference: params.map(() => 1e-4),
      centralDifference: true,
      maxIterations: chunk,
      errorTolerance: 1e-10,
    });
    iterations += chunk;
    const next = evaluateModel(problem, setup, result.parameterValues).wrss;
    const improved = wrss - next;
    if (next < wrss) {
      params = result.parameterValues;
      wrss = next;
    }
    if (!(improved > LM_RELATIVE_TOLERANCE * wrss)) break;
  }
  return { setup, params, linear: evaluateModel(problem, setup, params), iterations };
}

// ---------------------------------------------------------------- uncertainties

function covariance(problem: Problem, fit: RawFit): { cov: Matrix | null; names: string[]; parameterCount: number } {
  const { setup, params, linear } = fit;
  const n = problem.n;
  const L = problem.scaleNm;
  const nonlinear = params.length;
  const linearNames = ['kA', 'bA', 'kB', 'bB'].filter(
    (name) => !(name === 'kA' && linear.kA === 0) && !(name === 'kB' && linear.kB === 0),
  );
  const p = nonlinear + linearNames.length;
  const J = new Matrix(2 * n, p);
  const plus = new Float64Array(2 * n);
  const weightedModel = (q: number[], out: Float64Array) => {
    problem.meter.spend(1);
    const { geometry, sigmaNm } = decode(setup, q, L);
    problem.grid.evaluate(geometry, sigmaNm, problem.phiA, problem.phiB);
    for (let i = 0; i < n; i++) {
      out[i] = (linear.kA * (problem.phiA[i] as number) + linear.bA) / (problem.sA[i] as number);
      out[i + n] = (linear.kB * (problem.phiB[i] as number) + linear.bB) / (problem.sB[i] as number);
    }
  };
  const minus = new Float64Array(2 * n);
  for (let j = 0; j < nonlinear; j++) {
    const step = 1e-4 * Math.max(Math.abs(params[j] as number), 0.05);
    const up = params.slice();
    const down = params.slice();
    up[j] = (up[j] as number) + step;
    down[j] = (down[j] as number) - step;
    weightedModel(up, plus);
    weightedModel(down, minus);
    // Column in physical units: centre, radius and σ are scaled by L, the core fraction is not.
    const unit = setup.hasCore && j === 2 ? 1 : L;
    for (let i = 0; i < 2 * n; i++) J.set(i, j, ((plus[i] as number) - (minus[i] as number)) / (2 * step * unit));
  }
  // Restore the basis at the optimum for the linear columns.
  const { geometry, sigmaNm } = decode(setup, params, L);
  problem.grid.evaluate(geometry, sigmaNm, problem.phiA, problem.phiB);
  linearNames.forEach((name, c) => {
    const col = nonlinear + c;
    for (let i = 0; i < n; i++) {
      const sa = problem.sA[i] as number;
      const sb = problem.sB[i] as number;
      J.set(i, col, name === 'kA' ? (problem.phiA[i] as number) / sa : name === 'bA' ? 1 / sa : 0);
      J.set(i + n, col, name === 'kB' ? (problem.phiB[i] as number) / sb : name === 'bB' ? 1 / sb : 0);
    }
  });
  const names = [...parameterNames(setup), ...linearNames];
  const dof = 2 * n - p;
  if (dof <= 0) return { cov: null, names, parameterCount: p };
  const s2 = linear.wrss / dof;
  try {
    const cov = inverse(J.transpose().mmul(J)).mul(s2);
    for (let j = 0; j < p; j++)
      if (!(cov.get(j, j) >= 0) || !Number.isFinite(cov.get(j, j))) return { cov: null, names, parameterCount: p };
    return { cov, names, parameterCount: p };
  } catch (error) {
    if (error instanceof Error) return { cov: null, names, parameterCount: p };
    throw error;
  }
}

// ---------------------------------------------------------------- public entry

export function fitLineScan(scan: LineScanData, options: LineScanFitOptions): LineScanAnalysis {
  checkScan(scan, options);
  const notes: string[] = [];
  const n = scan.positionsNm.length;
  const meter = new BudgetMeter(
    options.budget ?? LINE_SCAN_FIT_BUDGET,
    {
      what: `the line-scan fit of ${n} points`,
      unit: 'model evaluations',
      advice:
        options.probeSigmaNm === null || options.probeSigmaNm === undefined
          ? 'bin the scan to fewer points, or give the probe σ so it is not fitted'
          : 'bin the scan to fewer points, or check the probe σ and the position unit (nm)',
    },
    options.clock,
  );
  const x = Float64Array.from(scan.positionsNm);
  const yA = Float64Array.from(scan.signalA);
  const yB = Float64Array.from(scan.signalB);
  const steps: number[] = [];
  for (let i = 1; i < n; i++) steps.push((x[i] as number) - (x[i - 1] as number));
  const stepNm = median([...steps].sort((p, q) => p - q));
  const rangeNm = (x[n - 1] as number) - (x[0] as number);

  // Backgrounds from the outer tenth of the scan on each side; net profiles for the starting values.
  const m = Math.max(2, Math.round(0.1 * n));
  const edgeValues = (y: Float64Array) => [...y.slice(0, m), ...y.slice(n - m)].sort((p, q) => p - q);
  const bgA = median(edgeValues(yA));
  const bgB = median(edgeValues(yB));
  const netA = smooth3(yA.map((v) => v - bgA));
  const netB = smooth3(yB.map((v) => v - bgB));
  const peakA = Math.max(...netA);
  const peakB = Math.max(...netB);
  const noiseA = secondDifferenceNoise(yA, peakA);
  const noiseB = secondDifferenceNoise(yB, peakB);
  const label = { A: options.elementA, B: options.elementB };
  if (!(peakA > NO_SIGNAL_RATIO * noiseA))
    throw invalid(
      'signalA',
      `the ${label.A} channel shows no particle signal above its noise (peak ${peakA.toPrecision(3)} over background, noise ${noiseA.toPrecision(3)})`,
    );
  if (!(peakB > NO_SIGNAL_RATIO * noiseB))
    throw invalid(
      'signalB',
      `the ${label.B} channel shows no particle signal above its noise (peak ${peakB.toPrecision(3)} over background, noise ${noiseB.toPrecision(3)})`,
    );
  const total = new Float64Array(n);
  for (let i = 0; i < n; i++) total[i] = (netA[i] as number) / peakA + (netB[i] as number) / peakB;
  const totalPeak = Math.max(...total);
  // Mean of the three outermost points on each side against the peak: above half means the scan stops
  // inside the particle (a chord falls to half its central length at 0.87 R). Milder cuts are caught after the fit.
  for (const [index, side] of [
    [0, 'start'],
    [n - 1, 'end'],
  ] as const) {
    const outer = side === 'start' ? [0, 1, 2] : [n - 3, n - 2, n - 1];
    const level =
      outer.reduce((s, i) => s + ((yA[i] as number) - bgA) / peakA + ((yB[i] as number) - bgB) / peakB, 0) / 3;
    if (level > 0.5 * totalPeak) {
      throw invalid(
        'positionsNm',
        `the line scan is shorter than the particle: at its ${side} (${(x[index] as number).toFixed(2)} nm) the signal is still ${((level / totalPeak) * 100).toFixed(0)} % of its peak; scan across the whole particle with background on both sides`,
      );
    }
  }

  // Noise model.
  const isCounts = scan.unit === 'counts' && [...yA, ...yB].every((v) => v >= 0 && Number.isInteger(v));
  const sA = new Float64Array(n);
  const sB = new Float64Array(n);
  if (isCounts) {
    const smA = smooth3(yA);
    const smB = smooth3(yB);
    for (let i = 0; i < n; i++) {
      sA[i] = Math.sqrt(Math.max(smA[i] as number, 1));
      sB[i] = Math.sqrt(Math.max(smB[i] as number, 1));
    }
  } else {
    sA.fill(noiseA);
    sB.fill(noiseB);
  }
  if (scan.unit === 'atPercent')
    notes.push('at.% values are fitted as signals proportional to the amount of each metal along the beam');

  // Starting values.
  const extent = halfMaximumExtent(x, total);
  const widthNm = Math.max(extent.right - extent.left, 2 * stepNm);
  const x0 = (extent.left + extent.right) / 2;
  const r0 = Math.min(widthNm / Math.sqrt(3), rangeNm / 2);
  const extentA = halfMaximumExtent(x, netA);
  const extentB = halfMaximumExtent(x, netB);
  const fA = Math.min(0.9, Math.max(0.2, (extentA.right - extentA.left) / widthNm));
  const fB = Math.min(0.9, Math.max(0.2, (extentB.right - extentB.left) / widthNm));

  const fixedSigma = options.probeSigmaNm ?? null;
  if (fixedSigma !== null && !(Number.isFinite(fixedSigma) && fixedSigma >= 0))
    throw invalid('probeSigmaNm', `probe σ must be a non-negative number of nm, got ${fixedSigma}`);
  const cellNm =
    stepNm /
    Math.max(
      2,
      Math.ceil(stepNm / Math.min(r0 / 25, fixedSigma !== null && fixedSigma > 0 ? fixedSigma / 2 : Infinity)),
    );
  const sigmaMaxNm = Math.max(r0, 2 * stepNm);
  // The grid and the blur kernel are sized by the cell; every model evaluation walks them. Refuse before sizing
  // arrays when they would pass MAX_GRID_CELLS (a probe σ of 1e-6 nm once asked for 10⁸ cells and ~1 GB).
  const padNm = rangeNm / 2 + stepNm;
  const kernelSigmaNm = Math.max(sigmaMaxNm, fixedSigma ?? 0);
  const gridCells = (rangeNm + 2 * padNm) / cellNm + (2 * KERNEL_HALF_WIDTH_SIGMAS * kernelSigmaNm) / cellNm;
  if (!(gridCells <= MAX_GRID_CELLS)) {
    throw new BudgetExceeded(
      `the line-scan fit would need a model grid of ${gridCells.toExponential(1)} cells (at most ` +
        `${MAX_GRID_CELLS.toLocaleString('en-GB')}): ${fixedSigma !== null ? `a probe σ of ${fixedSigma} nm over` : 'a particle this narrow in'} ` +
        `a scan of ${rangeNm.toPrecision(3)} nm at ${stepNm.toPrecision(3)} nm steps; ` +
        'check the probe σ and the position unit (nm), or bin the scan',
      fixedSigma !== null ? 'probeSigmaNm' : 'positionsNm',
      { iterations: 0, elapsedMs: meter.elapsedMs() },
    );
  }
  const problem: Problem = {
    n,
    x,
    yA,
    yB,
    sA,
    sB,
    grid: new BlurredChordGrid(x, cellNm, padNm, kernelSigmaNm),
    stepNm,
    sigmaMinNm: Math.max(cellNm / 2, 0.01),
    sigmaMaxNm,
    // A particle much smaller than its half-maximum extent would need a probe wider than the particle;
    // the bound keeps wrong models from collapsing into a blurred point.
    radiusMinNm: Math.max(stepNm, 2 * cellNm, 0.3 * r0),
    radiusMaxNm: rangeNm / 2,
    scaleNm: r0,
    phiA: new Float64Array(n),
    phiB: new Float64Array(n),
    meter,
  };
  const sigma0 = Math.min(Math.max(0.08 * r0, problem.sigmaMinNm * 2, stepNm / 2), sigmaMaxNm);
  const maxIterations = options.maxIterations ?? 60;

  const fitModel = (kind: LineScanModelKind): RawFit => {
    const starts: { setup: ModelSetup; p: number[] }[] = [];
    const janusSides = kind === 'Janus' ? [true, false] : [true];
    for (const janusALow of janusSides) {
      const setup: ModelSetup = {
        kind,
        janusALow,
        hasCore: kind === 'A@B' || kind === 'B@A',
        fitSigma: fixedSigma === null,
        fixedSigmaNm: fixedSigma ?? 0,
      };
      const base = [x0 / r0, 1];
      const tail = setup.fitSigma ? [sigma0 / r0] : [];
      if (setup.hasCore) {
        const f0 = kind === 'A@B' ? fA : fB;
        starts.push({ setup, p: [...base, f0, ...tail] });
        if (Math.abs(f0 - 0.5) > 0.12) starts.push({ setup, p: [...base, 0.5, ...tail] });
      } else starts.push({ setup, p: [...base, ...tail] });
    }
    let best: RawFit | null = null;
    for (const start of starts) {
      const fit = runLevenbergMarquardt(problem, start.setup, start.p, maxIterations);
      if (!best || fit.linear.wrss < best.linear.wrss) best = fit;
    }
    return best as RawFit;
  };

  const N = 2 * n;
  const fits = LINE_SCAN_MODELS.map((kind) => {
    meter.stage = `model ${modelLabel(kind, options.elementA, options.elementB)}`;
    const raw = fitModel(kind);
    const { cov, names, parameterCount } = covariance(problem, raw);
    const k = raw.params.length + 4 + 1;
    const bic = N * Math.log(raw.linear.wrss / N) + k * Math.log(N);
    return { raw, cov, names, parameterCount, k, bic };
  });
  const minBic = Math.min(...fits.map((f) => f.bic));
  const weightSum = fits.reduce((s, f) => s + Math.exp(-(f.bic - minBic) / 2), 0);

  const models: LineScanModelFit[] = fits.map(({ raw, cov, names, k, bic }) => {
    const { setup, params, linear } = raw;
    const L = problem.scaleNm;
    const { geometry, sigmaNm, f } = decode(setup, params, L);
    const sdOf = (name: string): number | null => {
      const j = names.indexOf(name);
      return cov && j >= 0 ? Math.sqrt(cov.get(j, j)) : null;
    };
    const covOf = (p: string, q: string): number | null => {
      const i = names.indexOf(p);
      const j = names.indexOf(q);
      return cov && i >= 0 && j >= 0 ? cov.get(i, j) : null;
    };
    const R = geometry.radiusNm;
    let coreRadiusNm: Estimate | null = null;
    let shellThicknessNm: Estimate | null = null;
    let shellMonolayers: Estimate | null = null;
    if (setup.hasCore) {
      const vR = covOf('radius', 'radius');
      const vf = covOf('core fraction', 'core fraction');
      const cRf = covOf('radius', 'core fraction');
      const ok = vR !== null && vf !== null && cRf !== null;
      const varCore = ok ? f * f * vR + R * R * vf + 2 * f * R * cRf : null;
      const varShell = ok ? (1 - f) ** 2 * vR + R * R * vf - 2 * R * (1 - f) * cRf : null;
      coreRadiusNm = { value: f * R, sd: varCore !== null && varCore >= 0 ? Math.sqrt(varCore) : null };
      shellThicknessNm = { value: (1 - f) * R, sd: varShell !== null && varShell >= 0 ? Math.sqrt(varShell) : null };
      const shellLattice = setup.kind === 'A@B' ? options.latticeBNm : options.latticeANm;
      if (shellLattice !== undefined && shellLattice !== null) {
        const ml = monolayerThicknessNm(shellLattice);
        shellMonolayers = {
          value: shellThicknessNm.value / ml,
          sd: shellThicknessNm.sd === null ? null : shellThicknessNm.sd / ml,
        };
      }
    }
    const { min, max } = bounds(setup, problem);
    const atBounds = parameterNames(setup).filter((_, j) => {
      const v = params[j] as number;
      const span = (max[j] as number) - (min[j] as number);
      return v <= (min[j] as number) + 1e-6 * span || v >= (max[j] as number) - 1e-6 * span;
    });
    if (linear.kA === 0) atBounds.push(`${options.elementA} amplitude`);
    if (linear.kB === 0) atBounds.push(`${options.elementB} amplitude`);
    problem.grid.evaluate(geometry, sigmaNm, problem.phiA, problem.phiB);
    const fittedA = Array.from(problem.phiA, (phi) => linear.kA * phi + linear.bA);
    const fittedB = Array.from(problem.phiB, (phi) => linear.kB * phi + linear.bB);
    return {
      model: setup.kind,
      label: modelLabel(setup.kind, options.elementA, options.elementB),
      parameterCount: k,
      weightedRss: linear.wrss,
      bic,
      deltaBic: bic - minBic,
      bicWeight: Math.exp(-(bic - minBic) / 2) / weightSum,
      centerNm: { value: geometry.centerNm, sd: sdOf('centre') },
      radiusNm: { value: R, sd: sdOf('radius') },
      coreRadiusNm,
      shellThicknessNm,
      shellMonolayers,
      probeSigmaNm: { value: sigmaNm, sd: setup.fitSigma ? sdOf('probe σ') : null },
      probeFitted: setup.fitSigma,
      amplitudeA: linear.kA,
      amplitudeB: linear.kB,
      backgroundA: linear.bA,
      backgroundB: linear.bB,
      janusALow: setup.kind === 'Janus' ? setup.janusALow : null,
      fittedA,
      fittedB,
      atBounds,
      iterations: raw.iterations,
    };
  });

  const ranked = [...models].sort((p, q) => p.bic - q.bic);
  const chosen = ranked[0] as LineScanModelFit;
  const runnerUp = ranked[1] as LineScanModelFit;
  const deltaBicToNext = runnerUp.bic - chosen.bic;
  const evidence = bicEvidence(deltaBicToNext);

  const first = x[0] as number;
  const last = x[n - 1] as number;
  const lo = chosen.centerNm.value - chosen.radiusNm.value;
  const hi = chosen.centerNm.value + chosen.radiusNm.value;
  if (lo < first - stepNm || hi > last + stepNm) {
    throw invalid(
      'positionsNm',
      `the line scan (${first.toFixed(2)}–${last.toFixed(2)} nm) is shorter than the particle (fitted ${lo.toFixed(2)}–${hi.toFixed(2)} nm); scan across the whole particle with background on both sides`,
    );
  }

  let suggestion = {
    label: chosen.label,
    reason: `${chosen.label} has the lowest BIC (${evidence} evidence, ΔBIC ${deltaBicToNext.toFixed(1)} to ${runnerUp.label})`,
  };
  if (chosen.shellMonolayers && chosen.shellMonolayers.value < 1) {
    suggestion = {
      label: 'surface-enriched alloy',
      reason: `${chosen.label} fits best but its shell is ${chosen.shellMonolayers.value.toFixed(2)} monolayers thick, less than one complete layer (Pairwright's rule: call that a surface-enriched alloy)`,
    };
  }
  if (chosen.atBounds.length > 0)
    notes.push(`${chosen.label}: ${chosen.atBounds.join(', ')} ended on a bound; its uncertainty is not meaningful`);
  if (evidence === 'weak')
    notes.push(
      `the data hardly distinguish ${chosen.label} from ${runnerUp.label} (ΔBIC < 2); treat the choice as open`,
    );

  return {
    analysisVersion: ANALYSIS_VERSION,
    elementA: options.elementA,
    elementB: options.elementB,
    unit: scan.unit,
    points: n,
    chosenModel: chosen.label,
    chosenKind: chosen.model,
    models,
    evidence,
    deltaBicToNext,
    suggestion,
    noise: {
      a: isCounts ? Math.sqrt(Math.max(peakA + bgA, 1)) : noiseA,
      b: isCounts ? Math.sqrt(Math.max(peakB + bgB, 1)) : noiseB,
      model: isCounts ? 'poisson' : 'constant',
    },
    notes,
  };
}
