/**
 * Reference tier: Pairwright's log-normal fit against scipy.stats.lognorm.fit(data, floc=0) (Debian
 * python3-scipy), and its t / χ² quantiles against scipy.stats.t.ppf / chi2.ppf.
 */
import { describe, expect, it } from 'vitest';
import { fitLogNormal } from '../../shared-model/characterization/lognormal';
import { chiSquareQuantile, studentTQuantile } from '../../shared-model/characterization/distributions';
import { createRandom } from '../../shared-model/random';
import { referenceAvailable, runPythonJson } from '../support/reference-tools';

const available = referenceAvailable({ python: 'scipy' });

const SCRIPT = `
import json, sys
from scipy import stats
inp = json.load(sys.stdin)
fits = []
for d in inp["samples"]:
    s, loc, scale = stats.lognorm.fit(d, floc=0)
    fits.append({"s": s, "loc": loc, "scale": scale})
q = [{"t": stats.t.ppf(p, df), "chi2": stats.chi2.ppf(p, df)} for p, df in inp["quantiles"]]
print(json.dumps({"fits": fits, "quantiles": q}))
`;

describe.skipIf(!available)('log-normal fit vs scipy.stats.lognorm.fit(floc=0)', () => {
  it('agrees on several samples', () => {
    const rng = createRandom(2024);
    const specs = [
      { n: 5, mu: Math.log(3), sigma: 0.3 },
      { n: 40, mu: Math.log(8), sigma: 0.1 },
      { n: 250, mu: Math.log(15), sigma: 0.25 },
      { n: 1000, mu: Math.log(2.2), sigma: 0.6 },
    ];
    const samples = specs.map((s) => Array.from({ length: s.n }, () => Math.exp(s.mu + s.sigma * rng.nextNormal())));
    // A hand-typed set of diameters as an image tool would export them.
    samples.push([4.8, 5.1, 5.3, 5.3, 5.6, 5.9, 6.0, 6.4, 7.2, 8.1]);
    const quantiles: [number, number][] = [
      [0.975, 4],
      [0.975, 39],
      [0.025, 39],
      [0.995, 249],
      [0.9, 2],
    ];
    const ref = runPythonJson<{
      fits: { s: number; loc: number; scale: number }[];
      quantiles: { t: number; chi2: number }[];
    }>(SCRIPT, { samples, quantiles });
    samples.forEach((sample, i) => {
      const ours = fitLogNormal(sample);
      const theirs = ref.fits[i]!;
      expect(theirs.loc).toBe(0);
      expect(ours.sigma).toBeCloseTo(theirs.s, 6);
      expect(ours.medianNm / theirs.scale).toBeCloseTo(1, 6);
    });
    quantiles.forEach(([p, df], i) => {
      expect(studentTQuantile(p, df)).toBeCloseTo(ref.quantiles[i]!.t, 6);
      expect(chiSquareQuantile(p, df) / ref.quantiles[i]!.chi2).toBeCloseTo(1, 9);
    });
  });
});
