/** Input checks, noise estimates and the half-maximum widths the starting values are read from. */
import { invalid } from '../../api/result';
import { MIN_LINE_SCAN_POINTS, type LineScanData } from '../csv-import';
import { median } from '../size-statistics';
import type { LineScanFitOptions } from './types';

export function checkScan(scan: LineScanData, options: LineScanFitOptions): void {
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
export function secondDifferenceNoise(y: Float64Array, peak: number): number {
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

export function smooth3(y: Float64Array): Float64Array {
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
export function halfMaximumExtent(x: Float64Array, profile: Float64Array): { left: number; right: number } {
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
