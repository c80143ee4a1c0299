/**
 * The fit problem shared by every model: the data and their noise, the geometry decoded from a parameter vector,
 * and the residual for a geometry with the amplitudes and backgrounds solved exactly (variable projection).
 */
import type { BudgetMeter } from '../../compute-budget';
import type { BlurredChordGrid, LineScanModelKind, ProfileGeometry } from '../chord-profile';

export interface Problem {
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

export interface LinearSolution {
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

export function solveLinear(problem: Problem): LinearSolution {
  const a = solveChannel(problem.phiA, problem.yA, problem.sA);
  const b = solveChannel(problem.phiB, problem.yB, problem.sB);
  return { kA: a.k, bA: a.b, kB: b.k, bB: b.b, wrss: a.rss + b.rss };
}

export interface ModelSetup {
  kind: LineScanModelKind;
  janusALow: boolean;
  hasCore: boolean;
  fitSigma: boolean;
  fixedSigmaNm: number;
}

/** Geometry and σ from a nonlinear parameter vector in scaled units [x0/L, R/L, (f), (σ/L)]. */
export function decode(
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

export function parameterNames(setup: ModelSetup): string[] {
  const names = ['centre', 'radius'];
  if (setup.hasCore) names.push('core fraction');
  if (setup.fitSigma) names.push('probe σ');
  return names;
}

export function bounds(setup: ModelSetup, problem: Problem): { min: number[]; max: number[] } {
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

export function evaluateModel(problem: Problem, setup: ModelSetup, p: ArrayLike<number>): LinearSolution {
  problem.meter.spend(1);
  const { geometry, sigmaNm } = decode(setup, p, problem.scaleNm);
  problem.grid.evaluate(geometry, sigmaNm, problem.phiA, problem.phiB);
  return solveLinear(problem);
}

/** The model at the scan positions divided by each point's noise SD: A's points, then B's. */
export function writeWeightedModel(problem: Problem, lin: Omit<LinearSolution, 'wrss'>, out: Float64Array): void {
  const n = problem.n;
  for (let i = 0; i < n; i++) {
    out[i] = (lin.kA * (problem.phiA[i] as number) + lin.bA) / (problem.sA[i] as number);
    out[i + n] = (lin.kB * (problem.phiB[i] as number) + lin.bB) / (problem.sB[i] as number);
  }
}

/** Starting values read off the data, in nm, shared by the models' starts. */
export interface StartValues {
  x0: number;
  r0: number;
  sigma0: number;
  /** Core fractions from the half-maximum widths of A's and B's channels. */
  fA: number;
  fB: number;
  fixedSigma: number | null;
}

export interface ModelStart {
  setup: ModelSetup;
  p: number[];
}

export function modelSetup(kind: LineScanModelKind, janusALow: boolean, start: StartValues): ModelSetup {
  return {
    kind,
    janusALow,
    hasCore: kind === 'A@B' || kind === 'B@A',
    fitSigma: start.fixedSigma === null,
    fixedSigmaNm: start.fixedSigma ?? 0,
  };
}

/** A start vector in scaled units [x0/L, 1, (core fraction), (σ/L)] with L = r0. */
export function startVector(setup: ModelSetup, start: StartValues, coreFraction?: number): number[] {
  const base = [start.x0 / start.r0, 1];
  const tail = setup.fitSigma ? [start.sigma0 / start.r0] : [];
  return coreFraction === undefined ? [...base, ...tail] : [...base, coreFraction, ...tail];
}
