import { describe, expect, it } from 'vitest';
import { fitLogNormal, logNormalPdf } from '../../../shared-model/characterization/lognormal';
import { createRandom } from '../../../shared-model/random';

function logNormalSample(n: number, mu: number, sigma: number, seed: number): number[] {
  const rng = createRandom(seed);
  return Array.from({ length: n }, () => Math.exp(mu + sigma * rng.nextNormal()));
}

function logLikelihood(d: readonly number[], mu: number, sigma: number): number {
  return d.reduce((s, x) => s + Math.log(logNormalPdf(x, mu, sigma)), 0);
}

describe('log-normal maximum likelihood', () => {
  const sample = logNormalSample(120, Math.log(8), 0.15, 11);

  it('equals the closed form on the log data', () => {
    const fit = fitLogNormal(sample);
    const logs = sample.map(Math.log);
    const mu = logs.reduce((s, v) => s + v, 0) / logs.length;
    const sigma = Math.sqrt(logs.reduce((s, v) => s + (v - mu) ** 2, 0) / logs.length);
    expect(fit.mu).toBeCloseTo(mu, 12);
    expect(fit.sigma).toBeCloseTo(sigma, 12);
    expect(fit.medianNm).toBeCloseTo(Math.exp(mu), 10);
  });

  it('sits at the maximum of the likelihood computed from the density', () => {
    const fit = fitLogNormal(sample);
    const best = logLikelihood(sample, fit.mu, fit.sigma);
    expect(best).toBeCloseTo(fit.logLikelihood, 8);
    for (const [dm, ds] of [
      [0.002, 0],
      [-0.002, 0],
      [0, 0.002],
      [0, -0.002],
    ] as const) {
      expect(logLikelihood(sample, fit.mu + dm, fit.sigma + ds)).toBeLessThan(best);
    }
  });

  it('its confidence intervals cover the true parameters at about the stated rate', () => {
    // 400 seeded samples of 30 particles from a known log-normal; the 95 % intervals should cover the true
    // mu and sigma in 95 % of them. Binomial(400, 0.95) has SD 4.4 trials: accept 362–398 (within about 7 SD below and the upper tail).
    const trueMu = Math.log(5);
    const trueSigma = 0.2;
    let coverMu = 0;
    let coverSigma = 0;
    for (let trial = 0; trial < 400; trial++) {
      const fit = fitLogNormal(logNormalSample(30, trueMu, trueSigma, 1000 + trial));
      if (fit.muInterval[0] <= trueMu && trueMu <= fit.muInterval[1]) coverMu++;
      if (fit.sigmaInterval[0] <= trueSigma && trueSigma <= fit.sigmaInterval[1]) coverSigma++;
    }
    expect(coverMu).toBeGreaterThanOrEqual(362);
    expect(coverMu).toBeLessThanOrEqual(398);
    expect(coverSigma).toBeGreaterThanOrEqual(362);
    expect(coverSigma).toBeLessThanOrEqual(398);
  });

  it('rejects bad input with a message naming the problem', () => {
    expect(() => fitLogNormal([5, 6])).toThrow(/at least 3/);
    expect(() => fitLogNormal([5, -1, 6])).toThrow(/-1 nm; diameters must be positive/);
    expect(() => fitLogNormal([4, 4, 4])).toThrow(/spread/);
    expect(() => fitLogNormal([4, 5, 6], 1.5)).toThrow(/confidence level/);
  });
});
