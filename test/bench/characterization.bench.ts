/**
 * Characterization throughput: a full four-model line-scan fit (7 Levenberg–Marquardt runs with probe σ
 * fitted) for scans of 51, 101 and 201 points, and the log-normal fit of 10 000 diameters.
 * Median of several timed runs after a warm-up.
 */
import { performance } from 'node:perf_hooks';
import { fitLineScan } from '../../shared-model/characterization/line-scan-fit';
import { fitLogNormal } from '../../shared-model/characterization/lognormal';
import { createRandom } from '../../shared-model/random';
import { positions, syntheticScan } from '../shared-model/characterization/synthetic-line-scan';

function medianMs(fn: () => void, runs: number): number {
  fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(runs / 2)] as number;
}

export async function run(): Promise<void> {
  for (const step of [0.4, 0.2, 0.1]) {
    const scan = syntheticScan(
      {
        kind: 'A@B',
        centerNm: 10,
        radiusNm: 5,
        coreRadiusNm: 3.5,
        probeSigmaNm: 0.6,
        amplitudeA: 10,
        amplitudeB: 8,
        backgroundA: 5,
        backgroundB: 3,
        positionsNm: positions(0, 20, step),
      },
      10,
      1,
    );
    const ms = medianMs(() => fitLineScan(scan, { elementA: 'Au', elementB: 'Pd' }), 7);
    console.log(`line-scan fit, ${scan.positionsNm.length} points, four models, σ fitted: ${ms.toFixed(1)} ms`);
  }
  const rng = createRandom(1);
  const diameters = Array.from({ length: 10_000 }, () => Math.exp(Math.log(8) + 0.2 * rng.nextNormal()));
  console.log(
    `log-normal fit with intervals, 10 000 diameters: ${medianMs(() => fitLogNormal(diameters), 21).toFixed(2)} ms`,
  );
}
