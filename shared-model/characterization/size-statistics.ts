/**
 * TEM size statistics of a set of particle diameters: n, mean ± SD, standard error of the mean, median,
 * coefficient of variation, the confidence interval of the mean (Student t), the deviation from a
 * target size, and how many particles a chosen precision of the mean needs.
 *
 * Particles needed: the half-width of the t interval of the mean is t(ν)·SD/√n. For a wanted half-width E
 * the smallest n with t(n−1)·SD/√n ≤ E is found by iteration, taking the present SD as the estimate of the
 * population SD (common practice for planning counts).
 */
import { invalid } from '../api/result';
import { checkDiameters } from './diameters';
import { studentTQuantile } from './distributions';

export interface SizePrecisionGoal {
  /** Wanted half-width of the confidence interval of the mean, as a percentage of the mean (e.g. 2 = ±2 %). */
  relativePercent?: number;
  /** Or the wanted half-width in nm. */
  absoluteNm?: number;
  /** Confidence level of that interval; default 0.95. */
  confidenceLevel?: number;
}

export interface SizeStatistics {
  n: number;
  meanNm: number;
  /** Sample standard deviation (divisor n−1). */
  sdNm: number;
  /** Standard error of the mean, SD/√n. */
  semNm: number;
  medianNm: number;
  minNm: number;
  maxNm: number;
  /** SD / mean × 100. */
  cvPercent: number;
  confidenceLevel: number;
  meanInterval: [number, number];
  target: { diameterNm: number; deviationNm: number; deviationPercent: number; withinInterval: boolean } | null;
  precision: {
    halfWidthNm: number;
    confidenceLevel: number;
    /** Particles needed in all for that half-width. */
    particlesNeeded: number;
    /** Particles still to count (0 when the present count suffices). */
    moreParticles: number;
    /** Half-width achieved now, nm. */
    currentHalfWidthNm: number;
  } | null;
}

export function median(sorted: readonly number[]): number {
  const n = sorted.length;
  const mid = Math.floor(n / 2);
  return n % 2 === 1 ? (sorted[mid] as number) : 0.5 * ((sorted[mid - 1] as number) + (sorted[mid] as number));
}

/** Smallest n ≥ 2 with t(1−α/2, n−1) · sd / √n ≤ halfWidth. */
export function particlesForHalfWidth(sdNm: number, halfWidthNm: number, confidenceLevel: number): number {
  if (!(halfWidthNm > 0)) throw invalid('precision', `the wanted precision must be positive, got ${halfWidthNm}`);
  const alpha = 1 - confidenceLevel;
  const halfWidthAt = (n: number) => (studentTQuantile(1 - alpha / 2, n - 1) * sdNm) / Math.sqrt(n);
  if (halfWidthAt(2) <= halfWidthNm) return 2;
  // Start from the normal-theory estimate and walk; half-width is decreasing in n.
  let hi = 4;
  while (halfWidthAt(hi) > halfWidthNm) {
    hi *= 2;
    if (hi > 1e9)
      throw invalid('precision', 'the wanted precision needs more than 10⁹ particles; choose a looser precision');
  }
  let lo = Math.max(2, hi / 2);
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (halfWidthAt(mid) <= halfWidthNm) hi = mid;
    else lo = mid;
  }
  return hi;
}

export function sizeStatistics(
  diametersNm: readonly number[],
  options: { targetDiameterNm?: number | null; precision?: SizePrecisionGoal | null; confidenceLevel?: number } = {},
): SizeStatistics {
  checkDiameters(diametersNm);
  const confidenceLevel = options.confidenceLevel ?? 0.95;
  if (!(confidenceLevel > 0 && confidenceLevel < 1))
    throw invalid('confidenceLevel', `confidence level must lie between 0 and 1, got ${confidenceLevel}`);
  const n = diametersNm.length;
  const sorted = [...diametersNm].sort((a, b) => a - b);
  let sum = 0;
  for (const d of sorted) sum += d;
  const meanNm = sum / n;
  let ss = 0;
  for (const d of sorted) ss += (d - meanNm) ** 2;
  const sdNm = Math.sqrt(ss / (n - 1));
  const semNm = sdNm / Math.sqrt(n);
  const t = studentTQuantile(1 - (1 - confidenceLevel) / 2, n - 1);
  const meanInterval: [number, number] = [meanNm - t * semNm, meanNm + t * semNm];

  let target: SizeStatistics['target'] = null;
  const targetNm = options.targetDiameterNm;
  if (targetNm !== undefined && targetNm !== null) {
    if (!(Number.isFinite(targetNm) && targetNm > 0))
      throw invalid('targetDiameterNm', `target size must be a positive number of nm, got ${targetNm}`);
    target = {
      diameterNm: targetNm,
      deviationNm: meanNm - targetNm,
      deviationPercent: ((meanNm - targetNm) / targetNm) * 100,
      withinInterval: targetNm >= meanInterval[0] && targetNm <= meanInterval[1],
    };
  }

  let precision: SizeStatistics['precision'] = null;
  const goal = options.precision;
  if (goal && (goal.relativePercent !== undefined || goal.absoluteNm !== undefined)) {
    const level = goal.confidenceLevel ?? 0.95;
    if (!(level > 0 && level < 1))
      throw invalid('precision.confidenceLevel', `confidence level must lie between 0 and 1, got ${level}`);
    let halfWidthNm: number;
    if (goal.absoluteNm !== undefined) {
      if (!(Number.isFinite(goal.absoluteNm) && goal.absoluteNm > 0))
        throw invalid('precision.absoluteNm', `precision must be a positive number of nm, got ${goal.absoluteNm}`);
      halfWidthNm = goal.absoluteNm;
    } else {
      const rel = goal.relativePercent as number;
      if (!(Number.isFinite(rel) && rel > 0))
        throw invalid('precision.relativePercent', `precision must be a positive percentage, got ${rel}`);
      halfWidthNm = (rel / 100) * meanNm;
    }
    const needed = particlesForHalfWidth(sdNm, halfWidthNm, level);
    const tNow = studentTQuantile(1 - (1 - level) / 2, n - 1);
    precision = {
      halfWidthNm,
      confidenceLevel: level,
      particlesNeeded: needed,
      moreParticles: Math.max(0, needed - n),
      currentHalfWidthNm: tNow * semNm,
    };
  }

  return {
    n,
    meanNm,
    sdNm,
    semNm,
    medianNm: median(sorted),
    minNm: sorted[0] as number,
    maxNm: sorted[n - 1] as number,
    cvPercent: (sdNm / meanNm) * 100,
    confidenceLevel,
    meanInterval,
    target,
    precision,
  };
}
