/** The whole fit: data and noise, starting values, every model's fit and covariance, and the choice by BIC. */
import { invalid } from '../../api/result';
import { BudgetExceeded, BudgetMeter } from '../../compute-budget';
import { BlurredChordGrid, KERNEL_HALF_WIDTH_SIGMAS, LINE_SCAN_MODELS, type LineScanModelKind } from '../chord-profile';
import type { LineScanData } from '../csv-import';
import { median } from '../size-statistics';
import { ANALYSIS_VERSION } from '../version';
import { alloyStarts } from './alloy';
import { coreShellEstimates, coreShellStarts } from './core-shell';
import { covariance } from './covariance';
import { janusStarts } from './janus';
import { bestOfStarts } from './levenberg-marquardt';
import { bounds, decode, parameterNames, type ModelStart, type Problem, type StartValues } from './residual';
import { checkScan, halfMaximumExtent, secondDifferenceNoise, smooth3 } from './scan';
import { bicOf, bicWeights, modelLabel, rankModels, suggestArchitecture } from './selection';
import {
  LINE_SCAN_FIT_BUDGET,
  MAX_GRID_CELLS,
  type LineScanAnalysis,
  type LineScanFitOptions,
  type LineScanModelFit,
} from './types';

/**
 * A channel whose smoothed peak over background is below 2.5 noise SDs holds no particle signal (for pure
 * noise the largest 3-point mean of ~50 points is about 1.4 SD).
 */
const NO_SIGNAL_RATIO = 2.5;

export function fitLineScan(scan: LineScanData, options: LineScanFitOptions): LineScanAnalysis {
  checkScan(scan, options);
  const notes: string[] = [];
  const n = scan.positionsNm.length;
  const meter = new BudgetMeter(
    options.budget ?? LINE_SCAN_FIT_BUDGET,
    {
      what: `the line-scan fit of ${n} points`,
      unit: 'model evaluations',
      advice:
        options.probeSigmaNm === null || options.probeSigmaNm === undefined
          ? 'bin the scan to fewer points, or give the probe σ so it is not fitted'
          : 'bin the scan to fewer points, or check the probe σ and the position unit (nm)',
    },
    options.clock,
  );
  const x = Float64Array.from(scan.positionsNm);
  const yA = Float64Array.from(scan.signalA);
  const yB = Float64Array.from(scan.signalB);
  const steps: number[] = [];
  for (let i = 1; i < n; i++) steps.push((x[i] as number) - (x[i - 1] as number));
  const stepNm = median([...steps].sort((p, q) => p - q));
  const rangeNm = (x[n - 1] as number) - (x[0] as number);

  // Backgrounds from the outer tenth of the scan on each side; net profiles for the starting values.
  const m = Math.max(2, Math.round(0.1 * n));
  const edgeValues = (y: Float64Array) => [...y.slice(0, m), ...y.slice(n - m)].sort((p, q) => p - q);
  const bgA = median(edgeValues(yA));
  const bgB = median(edgeValues(yB));
  const netA = smooth3(yA.map((v) => v - bgA));
  const netB = smooth3(yB.map((v) => v - bgB));
  const peakA = Math.max(...netA);
  const peakB = Math.max(...netB);
  const noiseA = secondDifferenceNoise(yA, peakA);
  const noiseB = secondDifferenceNoise(yB, peakB);
  const label = { A: options.elementA, B: options.elementB };
  if (!(peakA > NO_SIGNAL_RATIO * noiseA))
    throw invalid(
      'signalA',
      `the ${label.A} channel shows no particle signal above its noise (peak ${peakA.toPrecision(3)} over background, noise ${noiseA.toPrecision(3)})`,
    );
  if (!(peakB > NO_SIGNAL_RATIO * noiseB))
    throw invalid(
      'signalB',
      `the ${label.B} channel shows no particle signal above its noise (peak ${peakB.toPrecision(3)} over background, noise ${noiseB.toPrecision(3)})`,
    );
  const total = new Float64Array(n);
  for (let i = 0; i < n; i++) total[i] = (netA[i] as number) / peakA + (netB[i] as number) / peakB;
  const totalPeak = Math.max(...total);
  // Mean of the three outermost points on each side against the peak: above half means the scan stops
  // inside the particle (a chord falls to half its central length at 0.87 R). Milder cuts are caught after the fit.
  for (const [index, side] of [
    [0, 'start'],
    [n - 1, 'end'],
  ] as const) {
    const outer = side === 'start' ? [0, 1, 2] : [n - 3, n - 2, n - 1];
    const level =
      outer.reduce((s, i) => s + ((yA[i] as number) - bgA) / peakA + ((yB[i] as number) - bgB) / peakB, 0) / 3;
    if (level > 0.5 * totalPeak) {
      throw invalid(
        'positionsNm',
        `the line scan is shorter than the particle: at its ${side} (${(x[index] as number).toFixed(2)} nm) the signal is still ${((level / totalPeak) * 100).toFixed(0)} % of its peak; scan across the whole particle with background on both sides`,
      );
    }
  }

  // Noise model.
  const isCounts = scan.unit === 'counts' && [...yA, ...yB].every((v) => v >= 0 && Number.isInteger(v));
  const sA = new Float64Array(n);
  const sB = new Float64Array(n);
  if (isCounts) {
    const smA = smooth3(yA);
    const smB = smooth3(yB);
    for (let i = 0; i < n; i++) {
      sA[i] = Math.sqrt(Math.max(smA[i] as number, 1));
      sB[i] = Math.sqrt(Math.max(smB[i] as number, 1));
    }
  } else {
    sA.fill(noiseA);
    sB.fill(noiseB);
  }
  if (scan.unit === 'atPercent')
    notes.push('at.% values are fitted as signals proportional to the amount of each metal along the beam');

  // Starting values.
  const extent = halfMaximumExtent(x, total);
  const widthNm = Math.max(extent.right - extent.left, 2 * stepNm);
  const x0 = (extent.left + extent.right) / 2;
  const r0 = Math.min(widthNm / Math.sqrt(3), rangeNm / 2);
  const extentA = halfMaximumExtent(x, netA);
  const extentB = halfMaximumExtent(x, netB);
  const fA = Math.min(0.9, Math.max(0.2, (extentA.right - extentA.left) / widthNm));
  const fB = Math.min(0.9, Math.max(0.2, (extentB.right - extentB.left) / widthNm));

  const fixedSigma = options.probeSigmaNm ?? null;
  if (fixedSigma !== null && !(Number.isFinite(fixedSigma) && fixedSigma >= 0))
    throw invalid('probeSigmaNm', `probe σ must be a non-negative number of nm, got ${fixedSigma}`);
  const cellNm =
    stepNm /
    Math.max(
      2,
      Math.ceil(stepNm / Math.min(r0 / 25, fixedSigma !== null && fixedSigma > 0 ? fixedSigma / 2 : Infinity)),
    );
  const sigmaMaxNm = Math.max(r0, 2 * stepNm);
  // The grid and the blur kernel are sized by the cell; every model evaluation walks them. Refuse before sizing
  // arrays when they would pass MAX_GRID_CELLS (a probe σ of 1e-6 nm once asked for 10⁸ cells and ~1 GB).
  const padNm = rangeNm / 2 + stepNm;
  const kernelSigmaNm = Math.max(sigmaMaxNm, fixedSigma ?? 0);
  const gridCells = (rangeNm + 2 * padNm) / cellNm + (2 * KERNEL_HALF_WIDTH_SIGMAS * kernelSigmaNm) / cellNm;
  if (!(gridCells <= MAX_GRID_CELLS)) {
    throw new BudgetExceeded(
      `the line-scan fit would need a model grid of ${gridCells.toExponential(1)} cells (at most ` +
        `${MAX_GRID_CELLS.toLocaleString('en-GB')}): ${fixedSigma !== null ? `a probe σ of ${fixedSigma} nm over` : 'a particle this narrow in'} ` +
        `a scan of ${rangeNm.toPrecision(3)} nm at ${stepNm.toPrecision(3)} nm steps; ` +
        'check the probe σ and the position unit (nm), or bin the scan',
      fixedSigma !== null ? 'probeSigmaNm' : 'positionsNm',
      { iterations: 0, elapsedMs: meter.elapsedMs() },
    );
  }
  const problem: Problem = {
    n,
    x,
    yA,
    yB,
    sA,
    sB,
    grid: new BlurredChordGrid(x, cellNm, padNm, kernelSigmaNm),
    stepNm,
    sigmaMinNm: Math.max(cellNm / 2, 0.01),
    sigmaMaxNm,
    // A particle much smaller than its half-maximum extent would need a probe wider than the particle;
    // the bound keeps wrong models from collapsing into a blurred point.
    radiusMinNm: Math.max(stepNm, 2 * cellNm, 0.3 * r0),
    radiusMaxNm: rangeNm / 2,
    scaleNm: r0,
    phiA: new Float64Array(n),
    phiB: new Float64Array(n),
    meter,
  };
  const sigma0 = Math.min(Math.max(0.08 * r0, problem.sigmaMinNm * 2, stepNm / 2), sigmaMaxNm);
  const maxIterations = options.maxIterations ?? 60;

  const start: StartValues = { x0, r0, sigma0, fA, fB, fixedSigma };
  const startsOf = (kind: LineScanModelKind): ModelStart[] => {
    switch (kind) {
      case 'alloy':
        return alloyStarts(start);
      case 'A@B':
      case 'B@A':
        return coreShellStarts(kind, start);
      case 'Janus':
        return janusStarts(start);
    }
  };

  const N = 2 * n;
  const fits = LINE_SCAN_MODELS.map((kind) => {
    meter.stage = `model ${modelLabel(kind, options.elementA, options.elementB)}`;
    const raw = bestOfStarts(problem, startsOf(kind), maxIterations);
    const { cov, names, parameterCount } = covariance(problem, raw);
    const k = raw.params.length + 4 + 1;
    const bic = bicOf(raw.linear.wrss, N, k);
    return { raw, cov, names, parameterCount, k, bic };
  });
  const { minBic, weightOf } = bicWeights(fits.map((f) => f.bic));

  const models: LineScanModelFit[] = fits.map(({ raw, cov, names, k, bic }) => {
    const { setup, params, linear } = raw;
    const L = problem.scaleNm;
    const { geometry, sigmaNm, f } = decode(setup, params, L);
    const sdOf = (name: string): number | null => {
      const j = names.indexOf(name);
      return cov && j >= 0 ? Math.sqrt(cov.get(j, j)) : null;
    };
    const covOf = (p: string, q: string): number | null => {
      const i = names.indexOf(p);
      const j = names.indexOf(q);
      return cov && i >= 0 && j >= 0 ? cov.get(i, j) : null;
    };
    const R = geometry.radiusNm;
    const { coreRadiusNm, shellThicknessNm, shellMonolayers } = coreShellEstimates(setup, f, R, covOf, options);
    const { min, max } = bounds(setup, problem);
    const atBounds = parameterNames(setup).filter((_, j) => {
      const v = params[j] as number;
      const span = (max[j] as number) - (min[j] as number);
      return v <= (min[j] as number) + 1e-6 * span || v >= (max[j] as number) - 1e-6 * span;
    });
    if (linear.kA === 0) atBounds.push(`${options.elementA} amplitude`);
    if (linear.kB === 0) atBounds.push(`${options.elementB} amplitude`);
    problem.grid.evaluate(geometry, sigmaNm, problem.phiA, problem.phiB);
    const fittedA = Array.from(problem.phiA, (phi) => linear.kA * phi + linear.bA);
    const fittedB = Array.from(problem.phiB, (phi) => linear.kB * phi + linear.bB);
    return {
      model: setup.kind,
      label: modelLabel(setup.kind, options.elementA, options.elementB),
      parameterCount: k,
      weightedRss: linear.wrss,
      bic,
      deltaBic: bic - minBic,
      bicWeight: weightOf(bic),
      centerNm: { value: geometry.centerNm, sd: sdOf('centre') },
      radiusNm: { value: R, sd: sdOf('radius') },
      coreRadiusNm,
      shellThicknessNm,
      shellMonolayers,
      probeSigmaNm: { value: sigmaNm, sd: setup.fitSigma ? sdOf('probe σ') : null },
      probeFitted: setup.fitSigma,
      amplitudeA: linear.kA,
      amplitudeB: linear.kB,
      backgroundA: linear.bA,
      backgroundB: linear.bB,
      janusALow: setup.kind === 'Janus' ? setup.janusALow : null,
      fittedA,
      fittedB,
      atBounds,
      iterations: raw.iterations,
    };
  });

  const ranking = rankModels(models);
  const { chosen, deltaBicToNext, evidence } = ranking;

  const first = x[0] as number;
  const last = x[n - 1] as number;
  const lo = chosen.centerNm.value - chosen.radiusNm.value;
  const hi = chosen.centerNm.value + chosen.radiusNm.value;
  if (lo < first - stepNm || hi > last + stepNm) {
    throw invalid(
      'positionsNm',
      `the line scan (${first.toFixed(2)}–${last.toFixed(2)} nm) is shorter than the particle (fitted ${lo.toFixed(2)}–${hi.toFixed(2)} nm); scan across the whole particle with background on both sides`,
    );
  }

  const suggestion = suggestArchitecture(ranking, notes);

  return {
    analysisVersion: ANALYSIS_VERSION,
    elementA: options.elementA,
    elementB: options.elementB,
    unit: scan.unit,
    points: n,
    chosenModel: chosen.label,
    chosenKind: chosen.model,
    models,
    evidence,
    deltaBicToNext,
    suggestion,
    noise: {
      a: isCounts ? Math.sqrt(Math.max(peakA + bgA, 1)) : noiseA,
      b: isCounts ? Math.sqrt(Math.max(peakB + bgB, 1)) : noiseB,
      model: isCounts ? 'poisson' : 'constant',
    },
    notes,
  };
}
