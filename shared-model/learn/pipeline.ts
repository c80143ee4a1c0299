/**
 * Standardise-then-classify pipelines fitted on a training set only (as scikit-learn's
 * make_pipeline(StandardScaler(), …)), so cross-validation never sees the held-out rows' statistics.
 */
import { fitLda, ldaTransform, type LdaModel } from './lda';
import { fitLogistic, predictLogistic, type LogisticModel } from './logistic';
import { applyColumnScaler, fitColumnScaler, type ColumnScaler } from './standardise';

export interface StandardisedLogistic {
  scaler: ColumnScaler;
  model: LogisticModel;
}

export function fitStandardisedLogistic(
  x: readonly (readonly number[])[],
  y: readonly number[],
  classCount: number,
  options: { C: number; sampleWeights?: readonly number[]; dropCollinear?: boolean },
): StandardisedLogistic {
  const scaler = fitColumnScaler(x, { dropCollinear: options.dropCollinear ?? true });
  const z = applyColumnScaler(scaler, x);
  const model = fitLogistic(z, y, classCount, {
    C: options.C,
    ...(options.sampleWeights ? { sampleWeights: options.sampleWeights } : {}),
  });
  return { scaler, model };
}

export function predictStandardisedLogistic(
  fit: StandardisedLogistic,
  rows: readonly (readonly number[])[],
): number[][] {
  return applyColumnScaler(fit.scaler, rows).map((row) => predictLogistic(fit.model, row));
}

/** Index of the largest entry (first on ties). */
export function argMax(values: readonly number[]): number {
  let best = 0;
  for (let k = 1; k < values.length; k++) if ((values[k] as number) > (values[best] as number)) best = k;
  return best;
}

/**
 * LDA class prediction (scikit-learn's eigen solver: decision = X·coef + intercept with
 * coef = means·S·Sᵀ, intercept = −½ diag(means·coefᵀ) + ln priors), S the scalings.
 */
export function ldaPredictClasses(
  model: LdaModel,
  trainX: readonly (readonly number[])[],
  trainY: readonly number[],
  rows: readonly (readonly number[])[],
): number[] {
  const K = model.classCount;
  const p = (trainX[0] as readonly number[]).length;
  const means = Array.from({ length: K }, () => new Array<number>(p).fill(0));
  const counts = new Array<number>(K).fill(0);
  trainX.forEach((row, i) => {
    const k = trainY[i] as number;
    counts[k] = (counts[k] as number) + 1;
    row.forEach((v, j) => ((means[k] as number[])[j] = ((means[k] as number[])[j] as number) + v));
  });
  means.forEach((m, k) => m.forEach((_, j) => (m[j] = (m[j] as number) / (counts[k] as number))));
  const projectedMeans = ldaTransform(model, means, p);
  const projectedRows = ldaTransform(model, rows, p);
  const n = trainX.length;
  return projectedRows.map((r) => {
    const scores = projectedMeans.map((m, k) => {
      let dot = 0;
      let self = 0;
      for (let c = 0; c < p; c++) {
        dot += (r[c] as number) * (m[c] as number);
        self += (m[c] as number) ** 2;
      }
      return dot - self / 2 + Math.log((counts[k] as number) / n);
    });
    return argMax(scores);
  });
}

export { fitLda };
