import { describe, expect, it } from 'vitest';
import { detectEquilibration } from '../../../shared-model/montecarlo/equilibration';
import { createRandom } from '../../../shared-model/random';

describe('equilibration by block averages', () => {
  it('a relaxing trace is equilibrated after its transient; the mean excludes the transient', () => {
    const rng = createRandom(1);
    // E(t) = −100 + 20 exp(−t/40) + noise(σ = 0.5): the transient is gone (< 0.1 σ) after ~200 samples.
    const trace = Array.from({ length: 2000 }, (_, t) => -100 + 20 * Math.exp(-t / 40) + 0.5 * rng.nextNormal());
    const report = detectEquilibration(trace);
    expect(report.equilibrated).toBe(true);
    expect(report.equilibratedFromSample).toBeGreaterThan(50);
    expect(report.equilibratedFromSample).toBeLessThanOrEqual(400);
    expect(report.mean).toBeCloseTo(-100, 1);
    expect(report.standardError).toBeGreaterThan(0);
    expect(report.standardError).toBeLessThan(0.1);
  });

  it('stationary noise is equilibrated from the start', () => {
    const rng = createRandom(2);
    const report = detectEquilibration(Array.from({ length: 1000 }, () => 5 + rng.nextNormal()));
    expect(report.equilibrated).toBe(true);
    expect(report.equilibratedFromSample).toBe(0);
    expect(report.blockMeans).toHaveLength(20);
  });

  it('a steady drift is reported as not equilibrated', () => {
    const rng = createRandom(3);
    const report = detectEquilibration(Array.from({ length: 1000 }, (_, t) => -0.05 * t + rng.nextNormal()));
    expect(report.equilibrated).toBe(false);
    expect(Math.abs(report.lateDrift)).toBeGreaterThan(report.driftTolerance);
  });

  it('refuses an empty trace', () => {
    expect(() => detectEquilibration([])).toThrow(/empty/);
  });
});
