/**
 * Equilibration detection by block averages (common practice in Monte Carlo; see e.g. Flyvbjerg &
 * Petersen, J. Chem. Phys. 91, 461 (1989) for block averaging of correlated samples).
 *
 * The trace (one sample per sweep) is cut into `blocks` equal blocks. The second half of the blocks is
 * taken as the reference: its mean and the spread of its block means. The run is called equilibrated
 * when the third and fourth quarters agree within three combined standard errors (no drift left), and
 * the equilibration point is the first block from which every later block mean stays within three
 * block standard deviations of the reference mean; within that first block, leading samples more than three
 * sample standard deviations from the reference mean (the last of a transient shorter than a block, such as
 * the first sweeps of a random start) are cut as well. Averages reported with a result use the samples from
 * that point on.
 */

export interface EquilibrationReport {
  /** True when the last two quarters show no drift beyond 3 standard errors. */
  equilibrated: boolean;
  /** Index (0-based, within the trace) of the first sample counted as equilibrated. */
  equilibratedFromSample: number;
  blockSize: number;
  blockMeans: number[];
  /** Mean of the samples from `equilibratedFromSample` on. */
  mean: number;
  /** Standard error of that mean from the spread of its block means. */
  standardError: number;
  /** Mean of the fourth quarter minus the mean of the third. */
  lateDrift: number;
  /** Three combined standard errors of the two quarter means: the drift allowed. */
  driftTolerance: number;
}

function meanOf(values: ArrayLike<number>, from: number, to: number): number {
  let sum = 0;
  for (let k = from; k < to; k++) sum += values[k]!;
  return to > from ? sum / (to - from) : NaN;
}

function standardErrorOfMeans(means: number[]): number {
  const n = means.length;
  if (n < 2) return 0;
  const m = means.reduce((s, v) => s + v, 0) / n;
  const variance = means.reduce((s, v) => s + (v - m) ** 2, 0) / (n - 1);
  return Math.sqrt(variance / n);
}

export function detectEquilibration(trace: ArrayLike<number>, blocks = 20): EquilibrationReport {
  const samples = trace.length;
  if (samples === 0) throw new RangeError('an empty trace has no equilibrium');
  const usable = Math.max(4, Math.min(blocks, Math.floor(samples / 2)));
  if (samples < 8) {
    const mean = meanOf(trace, 0, samples);
    return {
      equilibrated: false,
      equilibratedFromSample: 0,
      blockSize: samples,
      blockMeans: [mean],
      mean,
      standardError: 0,
      lateDrift: 0,
      driftTolerance: 0,
    };
  }
  const blockSize = Math.floor(samples / usable);
  const offset = samples - blockSize * usable; // leftover samples at the start are dropped from the blocks
  const blockMeans: number[] = [];
  for (let b = 0; b < usable; b++) blockMeans.push(meanOf(trace, offset + b * blockSize, offset + (b + 1) * blockSize));

  const half = Math.floor(usable / 2);
  const reference = blockMeans.slice(half);
  const refMean = reference.reduce((s, v) => s + v, 0) / reference.length;
  const refSd = standardErrorOfMeans(reference) * Math.sqrt(reference.length);
  const scale = Math.max(Math.abs(refMean), 1) * 1e-12;
  const band = Math.max(3 * refSd, scale);
  let firstBlock = usable - 1;
  for (let b = usable - 1; b >= 0; b--) {
    if (Math.abs(blockMeans[b]! - refMean) <= band) firstBlock = b;
    else break;
  }

  const quarter = Math.floor(usable / 4);
  const third = blockMeans.slice(usable - 2 * quarter, usable - quarter);
  const fourth = blockMeans.slice(usable - quarter);
  const m3 = third.reduce((s, v) => s + v, 0) / third.length;
  const m4 = fourth.reduce((s, v) => s + v, 0) / fourth.length;
  const se3 = standardErrorOfMeans(third);
  const se4 = standardErrorOfMeans(fourth);
  const driftTolerance = Math.max(3 * Math.sqrt(se3 * se3 + se4 * se4), scale);
  const lateDrift = m4 - m3;

  // Within the first kept block, a short transient (a random start relaxes in a few sweeps, well inside one
  // block, and moves the block mean too little to reject the block) is cut too: the point is the first sample of
  // that block inside three standard deviations of the reference samples.
  const blockStart = firstBlock === 0 ? 0 : offset + firstBlock * blockSize;
  const referenceFrom = offset + half * blockSize;
  let sumSq = 0;
  for (let k = referenceFrom; k < samples; k++) sumSq += (trace[k]! - refMean) ** 2;
  const sampleBand = Math.max(3 * Math.sqrt(sumSq / Math.max(1, samples - referenceFrom - 1)), scale);
  let from = blockStart;
  const blockEnd = Math.min(samples - 1, offset + (firstBlock + 1) * blockSize - 1);
  while (from < blockEnd && Math.abs(trace[from]! - refMean) > sampleBand) from++;
  const kept = blockMeans.slice(firstBlock);
  return {
    equilibrated: Math.abs(lateDrift) <= driftTolerance,
    equilibratedFromSample: from,
    blockSize,
    blockMeans,
    mean: meanOf(trace, from, samples),
    standardError: standardErrorOfMeans(kept),
    lateDrift,
    driftTolerance,
  };
}
