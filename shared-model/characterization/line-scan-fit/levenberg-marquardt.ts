/**
 * The Levenberg–Marquardt driver (ml-levenberg-marquardt) over a model's geometry, within bounds, run in chunks
 * with a relative stopping rule; the best of a model's starts is kept.
 */
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import {
  bounds,
  evaluateModel,
  writeWeightedModel,
  type LinearSolution,
  type ModelSetup,
  type ModelStart,
  type Problem,
} from './residual';

const LM_CHUNK = 8;
const LM_RELATIVE_TOLERANCE = 1e-7;

export interface RawFit {
  setup: ModelSetup;
  params: number[];
  linear: LinearSolution;
  iterations: number;
}

export function runLevenbergMarquardt(
  problem: Problem,
  setup: ModelSetup,
  start: number[],
  maxIterations: number,
): RawFit {
  const n = problem.n;
  const xs = new Float64Array(2 * n);
  const ys = new Float64Array(2 * n);
  for (let i = 0; i < 2 * n; i++) {
    xs[i] = i;
    ys[i] =
      i < n
        ? (problem.yA[i] as number) / (problem.sA[i] as number)
        : (problem.yB[i - n] as number) / (problem.sB[i - n] as number);
  }
  // The library compares errors as Σ r²·w² but steps with weights 1/w², which disagree unless w = 1:
  // the data and model are therefore passed already divided by their noise SD, with unit weights.
  const model = (p: number[]) => {
    const lin = evaluateModel(problem, setup, p);
    const values = new Float64Array(2 * n);
    writeWeightedModel(problem, lin, values);
    return (index: number) => values[index] as number;
  };
  const { min, max } = bounds(setup, problem);
  const clampedStart = start.map((v, i) => Math.min(Math.max(v, min[i] as number), max[i] as number));
  // The library has no relative stopping rule, so it runs in chunks until a chunk no longer improves the fit.
  let params = clampedStart;
  let wrss = evaluateModel(problem, setup, params).wrss;
  let iterations = 0;
  while (iterations < maxIterations) {
    const chunk = Math.min(LM_CHUNK, maxIterations - iterations);
    const result = levenbergMarquardt({ x: xs, y: ys }, model, {
      initialValues: params,
      minValues: min,
      maxValues: max,
      damping: 1e-2,
      gradientDifference: params.map(() => 1e-4),
      centralDifference: true,
      maxIterations: chunk,
      errorTolerance: 1e-10,
    });
    iterations += chunk;
    const next = evaluateModel(problem, setup, result.parameterValues).wrss;
    const improved = wrss - next;
    if (next < wrss) {
      params = result.parameterValues;
      wrss = next;
    }
    if (!(improved > LM_RELATIVE_TOLERANCE * wrss)) break;
  }
  return { setup, params, linear: evaluateModel(problem, setup, params), iterations };
}

/** Runs every start and keeps the fit with the smallest weighted RSS (the first one on a tie). */
export function bestOfStarts(problem: Problem, starts: readonly ModelStart[], maxIterations: number): RawFit {
  let best: RawFit | null = null;
  for (const start of starts) {
    const fit = runLevenbergMarquardt(problem, start.setup, start.p, maxIterations);
    if (!best || fit.linear.wrss < best.linear.wrss) best = fit;
  }
  return best as RawFit;
}
