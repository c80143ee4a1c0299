/**
 * Size histogram: every diameter lands in exactly one bin whose edges hold it, for ordinary TEM data. A floating-
 * point bin start above the smallest diameter once gave an index of −1 ("Cannot read properties of undefined").
 * The property runs over 10,000 realistic samples: log-normal diameters (median 1.5–40 nm, σ 0.05–0.5; typical of
 * colloidal metal nanoparticles, common practice), rounded to a 0.01–0.1 nm reading step, n from 20 to 2,000
 * (log-uniform).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sizeHistogram } from '../../../shared-model/characterization/histogram';
import { createRandom } from '../../../shared-model/random';

function roundTo(value: number, step: number): number {
  return Number((Math.round(value / step) * step).toFixed(6));
}

function logNormalSample(seed: number, n: number, medianNm: number, sigma: number, stepNm: number): number[] {
  const random = createRandom(seed);
  const out: number[] = [];
  while (out.length < n) {
    const d = roundTo(medianNm * Math.exp(sigma * random.nextNormal()), stepNm);
    if (d > 0) out.push(d);
  }
  return out;
}

/**
 * The first inconsistency between the bins and the data, or null: each bin as wide as the width, each count equal
 * to the diameters inside its half-open edges, all diameters counted. Plain comparisons (this runs ~10^7 times).
 */
function inconsistency(diameters: number[], binWidthNm?: number): string | null {
  const histogram = sizeHistogram(diameters, null, binWidthNm === undefined ? {} : { binWidthNm });
  const sorted = [...diameters].sort((a, b) => a - b);
  const width = histogram.binWidthNm;
  const tolerance = 1e-6 * width;
  let cursor = 0;
  for (const [index, bin] of histogram.bins.entries()) {
    if (Math.abs(bin.toNm - bin.fromNm - width) > tolerance) return `bin ${index} is ${bin.toNm - bin.fromNm} nm wide`;
    const last = index === histogram.bins.length - 1;
    let inside = 0;
    while (cursor < sorted.length && (last || (sorted[cursor] as number) < bin.toNm - tolerance)) {
      const d = sorted[cursor] as number;
      if (d < bin.fromNm - tolerance || d >= bin.toNm + tolerance)
        return `${d} nm counted in [${bin.fromNm}, ${bin.toNm})`;
      inside++;
      cursor++;
    }
    if (bin.count !== inside) return `bin ${index} [${bin.fromNm}, ${bin.toNm}) counts ${bin.count}, holds ${inside}`;
  }
  return cursor === sorted.length ? null : `${sorted.length - cursor} diameters outside every bin`;
}

function expectConsistent(diameters: number[], binWidthNm?: number): void {
  expect(inconsistency(diameters, binWidthNm)).toBeNull();
}

describe('size histogram bins', () => {
  it('holds 72 diameters from 6.8 to 9.66 nm (the failing import: 6.8 / 0.1 × 0.1 = 6.800000000000001)', () => {
    const diameters = Array.from({ length: 72 }, (_, i) => roundTo(6.8 + (2.86 * i) / 71, 0.01));
    expect(Math.min(...diameters)).toBe(6.8);
    expect(Math.max(...diameters)).toBe(9.66);
    expectConsistent(diameters);
    for (const width of [0.05, 0.1, 0.2]) expectConsistent(diameters, width);
  });

  it('puts a diameter on an edge into the bin that starts there', () => {
    const histogram = sizeHistogram([0.3, 0.6, 0.7, 0.9, 1.2], null, { binWidthNm: 0.1 });
    const binOf = (d: number) => histogram.bins.find((bin) => Math.abs(bin.fromNm - d) < 1e-12);
    expect(binOf(0.3)?.count).toBe(1);
    expect(binOf(0.6)?.count).toBe(1);
    expect(binOf(0.7)?.count).toBe(1);
    expect(histogram.bins.reduce((sum, bin) => sum + bin.count, 0)).toBe(5);
  });

  it('bins 10,000 realistic log-normal samples without losing or misplacing a diameter', () => {
    const sample = fc.record({
      seed: fc.integer({ min: 1, max: 2 ** 31 - 1 }),
      // Log-uniform n (20 … 2,000): small counts are as common as large ones in practice, and it keeps the run fast.
      n: fc.double({ min: 0, max: 1, noNaN: true }).map((u) => Math.round(20 * 100 ** u)),
      medianNm: fc.double({ min: 1.5, max: 40, noNaN: true }),
      sigma: fc.double({ min: 0.05, max: 0.5, noNaN: true }),
      stepNm: fc.constantFrom(0.01, 0.02, 0.05, 0.1),
    });
    fc.assert(
      fc.property(sample, ({ seed, n, medianNm, sigma, stepNm }) => {
        const problem = inconsistency(logNormalSample(seed, n, medianNm, sigma, stepNm));
        if (problem !== null) throw new Error(problem);
      }),
      { numRuns: 10_000, seed: 20261202 },
    );
  });
});
