/** Posterior draws of a stored classifier (Laplace approximation; see logistic.ts samplePosterior). */
import type { SeededRandom } from '../random';
import { samplePosterior } from './logistic';
import type { FittedClassifier } from './outcome-model';

export function logisticParameterDraw(
  fit: FittedClassifier,
  random: SeededRandom,
): { weights: number[][]; intercepts: number[] } {
  return samplePosterior(
    {
      classCount: fit.classes.length,
      featureCount: fit.featureCount,
      weights: fit.weights,
      intercepts: fit.intercepts,
      objective: fit.objective,
      iterations: 0,
      converged: true,
      hessianCholesky: Float64Array.from(fit.hessianCholesky),
      C: fit.C,
    },
    random,
  );
}
