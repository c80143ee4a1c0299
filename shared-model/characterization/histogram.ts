/**
 * Histogram bins of particle diameters and the fitted log-normal curve scaled to the same counts, for charts.
 * Default bin width: Freedman–Diaconis, 2·IQR·n^(−1/3) (Freedman & Diaconis, Z. Wahrscheinlichkeitstheorie
 * verw. Gebiete 57, 453 (1981)), rounded to a 1-2-5 step and kept between 5 and 40 bins.
 */
import { invalid } from '../api/result';
import { checkDiameters } from './diameters';
import { logNormalPdf } from './lognormal';

export interface HistogramBin {
  fromNm: number;
  toNm: number;
  centerNm: number;
  count: number;
}

export interface SizeHistogram {
  binWidthNm: number;
  bins: HistogramBin[];
  /** Log-normal density × n × bin width: expected count per bin, sampled finely for a smooth line. */
  curve: { diameterNm: number; expectedCount: number }[];
}

function quantileSorted(sorted: readonly number[], q: number): number {
  const pos = (sorted.length - 1) * q;
  const lo = Math.floor(pos);
  const hi = Math.ceil(pos);
  return (sorted[lo] as number) + ((sorted[hi] as number) - (sorted[lo] as number)) * (pos - lo);
}

function niceStep(raw: number): number {
  const exponent = Math.floor(Math.log10(raw));
  const base = 10 ** exponent;
  const fraction = raw / base;
  const nice = fraction < 1.5 ? 1 : fraction < 3.5 ? 2 : fraction < 7.5 ? 5 : 10;
  return nice * base;
}

export function sizeHistogram(
  diametersNm: readonly number[],
  fit: { mu: number; sigma: number } | null,
  options: { binWidthNm?: number; curvePoints?: number } = {},
): SizeHistogram {
  checkDiameters(diametersNm);
  const sorted = [...diametersNm].sort((a, b) => a - b);
  const n = sorted.length;
  const min = sorted[0] as number;
  const max = sorted[n - 1] as number;
  const range = Math.max(max - min, 1e-9 * max);
  let width = options.binWidthNm;
  if (width !== undefined) {
    if (!(Number.isFinite(width) && width > 0))
      throw invalid('binWidthNm', `bin width must be a positive number of nm, got ${width}`);
    if (range / width > 500)
      throw invalid('binWidthNm', `bin width ${width} nm gives more than 500 bins for this range; choose a wider bin`);
  } else {
    const iqr = quantileSorted(sorted, 0.75) - quantileSorted(sorted, 0.25);
    const fd = iqr > 0 ? (2 * iqr) / Math.cbrt(n) : range / Math.max(5, Math.ceil(Math.log2(n) + 1));
    width = niceStep(Math.min(Math.max(fd, range / 40), range / 5));
  }
  // Bins are integer multiples of the width; a diameter's bin is ⌊d / width⌋ minus the first bin's number, with a
  // tiny relative allowance so a value on an edge (6.8 / 0.1 = 67.99999999999999) counts in the bin starting there.
  const binNumber = (d: number): number => Math.floor(d / width + 1e-9);
  const firstBin = binNumber(min);
  const binCount = binNumber(max) - firstBin + 1;
  const edge = (k: number): number => Number(((firstBin + k) * width).toPrecision(12));
  const bins: HistogramBin[] = [];
  for (let i = 0; i < binCount; i++) {
    const fromNm = edge(i);
    const toNm = edge(i + 1);
    bins.push({ fromNm, toNm, centerNm: (fromNm + toNm) / 2, count: 0 });
  }
  for (const d of sorted) {
    const index = Math.min(binCount - 1, Math.max(0, binNumber(d) - firstBin));
    (bins[index] as HistogramBin).count++;
  }
  const start = edge(0);
  const curve: SizeHistogram['curve'] = [];
  if (fit) {
    const points = options.curvePoints ?? 120;
    const lo = Math.max(start - width, width / 10);
    const hi = start + (binCount + 1) * width;
    for (let i = 0; i < points; i++) {
      const d = lo + ((hi - lo) * i) / (points - 1);
      curve.push({ diameterNm: d, expectedCount: n * width * logNormalPdf(d, fit.mu, fit.sigma) });
    }
  }
  return { binWidthNm: width, bins, curve };
}
