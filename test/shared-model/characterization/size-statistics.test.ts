import { describe, expect, it } from 'vitest';
import { sizeHistogram } from '../../../shared-model/characterization/histogram';
import { fitLogNormal } from '../../../shared-model/characterization/lognormal';
import { particlesForHalfWidth, sizeStatistics } from '../../../shared-model/characterization/size-statistics';
import { studentTQuantile } from '../../../shared-model/characterization/distributions';
import { createRandom } from '../../../shared-model/random';

describe('size statistics', () => {
  it('computes the textbook figures of a small sample', () => {
    // 2, 4, 4, 4, 5, 5, 7, 9: mean 5, sample SD √(32/7) — worked by hand.
    const s = sizeStatistics([2, 4, 4, 4, 5, 5, 7, 9]);
    expect(s.n).toBe(8);
    expect(s.meanNm).toBeCloseTo(5, 12);
    expect(s.sdNm).toBeCloseTo(Math.sqrt(32 / 7), 12);
    expect(s.semNm).toBeCloseTo(Math.sqrt(32 / 7) / Math.sqrt(8), 12);
    expect(s.medianNm).toBe(4.5);
    expect(s.cvPercent).toBeCloseTo((100 * Math.sqrt(32 / 7)) / 5, 10);
    expect(s.minNm).toBe(2);
    expect(s.maxNm).toBe(9);
    // 95 % interval half-width t(0.975, 7) = 2.365 (t table, from memory) × SEM.
    expect(s.meanInterval[1] - s.meanNm).toBeCloseTo(2.365 * s.semNm, 2);
  });

  it('reports the deviation from the target size', () => {
    const s = sizeStatistics([9, 10, 11, 10], { targetDiameterNm: 8 });
    expect(s.target?.deviationNm).toBeCloseTo(2, 12);
    expect(s.target?.deviationPercent).toBeCloseTo(25, 12);
    expect(s.target?.withinInterval).toBe(false);
  });

  it('counts how many more particles a precision of the mean needs', () => {
    const rng = createRandom(3);
    const d = Array.from({ length: 40 }, () => 10 + 1.5 * rng.nextNormal());
    const s = sizeStatistics(d, { precision: { relativePercent: 1 } });
    const p = s.precision!;
    const e = 0.01 * s.meanNm;
    const halfWidth = (n: number) => (studentTQuantile(0.975, n - 1) * s.sdNm) / Math.sqrt(n);
    // By definition: the smallest n whose t interval is at most ±1 % of the mean.
    expect(halfWidth(p.particlesNeeded)).toBeLessThanOrEqual(e);
    expect(halfWidth(p.particlesNeeded - 1)).toBeGreaterThan(e);
    expect(p.moreParticles).toBe(p.particlesNeeded - 40);
    // Normal-theory estimate (z·CV/precision)², z = 1.96: within a few particles for large n.
    const approx = ((1.96 * s.cvPercent) / 1) ** 2;
    expect(Math.abs(p.particlesNeeded - approx)).toBeLessThan(0.05 * approx + 5);
    expect(particlesForHalfWidth(1, 100, 0.95)).toBe(2);
  });

  it('rejects negative diameters and too few particles', () => {
    expect(() => sizeStatistics([3, 4])).toThrow(/at least 3/);
    expect(() => sizeStatistics([3, 0, 4])).toThrow(/must be positive/);
    expect(() => sizeStatistics([3, 4, 5], { targetDiameterNm: -2 })).toThrow(/target size/);
  });
});

describe('histogram with fitted curve', () => {
  it('bins every particle once and scales the curve to counts', () => {
    const rng = createRandom(9);
    const d = Array.from({ length: 300 }, () => Math.exp(Math.log(12) + 0.12 * rng.nextNormal()));
    const fit = fitLogNormal(d);
    const h = sizeHistogram(d, fit);
    expect(h.bins.reduce((s, b) => s + b.count, 0)).toBe(300);
    expect(h.bins.length).toBeGreaterThanOrEqual(5);
    expect(h.bins.length).toBeLessThanOrEqual(41);
    // The curve is n × width × pdf: its integral over d divided by the bin width is ≈ n (trapezoid rule).
    let area = 0;
    for (let i = 1; i < h.curve.length; i++) {
      const a = h.curve[i - 1]!;
      const b = h.curve[i]!;
      area += 0.5 * (a.expectedCount + b.expectedCount) * (b.diameterNm - a.diameterNm);
    }
    expect(area / h.binWidthNm).toBeGreaterThan(0.97 * 300);
    expect(area / h.binWidthNm).toBeLessThan(1.01 * 300);
  });

  it('honours a chosen bin width and refuses absurd ones', () => {
    const h = sizeHistogram([4, 5, 6, 7], null, { binWidthNm: 1 });
    expect(h.bins.map((b) => b.count)).toEqual([1, 1, 1, 1]);
    expect(h.curve).toEqual([]);
    expect(() => sizeHistogram([4, 5, 600], null, { binWidthNm: 0.1 })).toThrow(/500 bins/);
  });
});
