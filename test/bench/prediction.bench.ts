/**
 * Ranking throughput: all pairs of the 30 metals (435) × 11 compositions × 5 diameters ≈ 24k predictions.
 * Target (issue 3): under 50 ms. Warm-up first, then the median of several timed runs.
 */
import { cpus, loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { METAL_SYMBOLS } from '../../shared-model/elements/symbols';
import { pairContexts, rankContexts, rankPairs } from '../../shared-model/prediction/rank';

const COMPOSITIONS = [0.05, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 0.95];
const DIAMETERS_NM = [1.5, 2, 3, 5, 10];

function sweepAll(): number {
  const contexts = pairContexts(METAL_SYMBOLS);
  let count = 0;
  for (const xB of COMPOSITIONS) {
    for (const diameterNm of DIAMETERS_NM) {
      const rows = rankContexts(
        contexts,
        { kind: 'alloy' },
        { xB, diameterNm, shape: 'cuboctahedron', temperatureK: 600 },
      );
      count += rows.length;
    }
  }
  return count;
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? (sorted[mid] as number) : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

export async function run(): Promise<void> {
  let predictions = 0;
  for (let i = 0; i < 3; i++) predictions = sweepAll(); // warm-up (JIT)
  const times: number[] = [];
  const cpuTimes: number[] = [];
  for (let i = 0; i < 9; i++) {
    const cpu0 = process.cpuUsage();
    const t0 = performance.now();
    sweepAll();
    times.push(performance.now() - t0);
    const cpu = process.cpuUsage(cpu0);
    cpuTimes.push((cpu.user + cpu.system) / 1000);
  }
  const med = median(times);
  console.log(
    `rank 30 metals × ${COMPOSITIONS.length} compositions × ${DIAMETERS_NM.length} sizes = ${predictions} predictions`,
  );
  console.log(
    `  median ${med.toFixed(1)} ms wall over ${times.length} runs (min ${Math.min(...times).toFixed(1)}, max ${Math.max(...times).toFixed(1)}); ${((med * 1000) / predictions).toFixed(2)} µs per prediction; target < 50 ms`,
  );
  // CPU time of this process (user + system, includes the garbage collector's threads): less sensitive
  // than wall time when other processes share the cores
  console.log(
    `  median CPU time ${median(cpuTimes).toFixed(1)} ms (min ${Math.min(...cpuTimes).toFixed(1)}); load average ${loadavg()
      .map((x) => x.toFixed(1))
      .join(' ')} on ${cpus().length} cores`,
  );
  const t0 = performance.now();
  rankPairs('all', 'alloy', { xB: 0.5, diameterNm: 3, shape: 'cuboctahedron', temperatureK: 600 });
  console.log(`  one rankPairs('all') call incl. pair set-up: ${(performance.now() - t0).toFixed(2)} ms`);
}
