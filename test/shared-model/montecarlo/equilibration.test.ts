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

  it('a transient shorter than one block (a random start) is still cut from the mean', () => {
    const rng = createRandom(4);
    // Three samples 6, 5 and 4 σ above the level, then stationary noise (σ = 1): they move the first block's
    // mean (50 samples) by 0.3, inside its band of 3 block SDs (≈ 0.42), yet they are not equilibrium samples.
    const start = [6, 5, 4];
    const trace = Array.from({ length: 1000 }, (_, t) => start[t] ?? rng.nextNormal());
    const report = detectEquilibration(trace);
    expect(report.equilibrated).toBe(true);
    expect(report.blockSize).toBe(50);
    expect(report.equilibratedFromSample).toBe(3);
    expect(report.mean).toBeCloseTo(0, 1);
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
