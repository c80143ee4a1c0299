/**
 * Multinomial logistic regression with an L2 penalty on the weights and unpenalised intercepts, as
 * scikit-learn's LogisticRegression(multi_class='multinomial'): minimises
 *   f(W, b) = Σ_i s_i · (−log softmax(W x_i + b)_{y_i}) + ‖W‖² / (2C)
 * over all K rows (sample weights s_i; at the optimum the weight columns sum to 0). Fitted by Newton's method
 * with the exact Hessian and a backtracking line search. The objective does not change when every intercept
 * moves by the same amount; the Hessian is made invertible by adding u uᵀ along that direction (u = the
 * intercepts' unit vector), which leaves the step in every other direction unchanged, and the intercepts are
 * kept at zero sum (the point scikit-learn's lbfgs reaches from zero).
 *
 * The inverse of the Hessian at the optimum is the Laplace approximation of the posterior covariance of the
 * parameters (the penalty read as a Gaussian prior with variance C), used for uncertainty and for Thompson
 * sampling.
 */
import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import type { SeededRandom } from '../random';

export interface LogisticFitOptions {
  /** Inverse penalty strength C = 1/λ (scikit-learn's convention). */
  C: number;
  /** Per-row weights (default 1). */
  sampleWeights?: readonly number[];
  maxIterations?: number;
  /** Stop when the largest gradient component falls below this. */
  gradientTolerance?: number;
  /** Starting point (e.g. the fit on all rows, for cross-validation folds); zeros by default. */
  initial?: Pick<LogisticModel, 'weights' | 'intercepts'>;
}

export interface LogisticModel {
  classCount: number;
  featureCount: number;
  /** K × p weights. */
  weights: number[][];
  /** K intercepts. */
  intercepts: number[];
  objective: number;
  iterations: number;
  converged: boolean;
  /** Lower-triangular Cholesky factor of the (made invertible) Hessian at the optimum, row-major. */
  hessianCholesky: Float64Array;
  C: number;
}

function softmaxInto(scores: Float64Array, out: Float64Array): number {
  let max = -Infinity;
  for (const s of scores) if (s > max) max = s;
  let sum = 0;
  for (let k = 0; k < scores.length; k++) {
    const e = Math.exp((scores[k] as number) - max);
    out[k] = e;
    sum += e;
  }
  for (let k = 0; k < scores.length; k++) out[k] = (out[k] as number) / sum;
  return max + Math.log(sum);
}

interface Problem {
  x: Float64Array;
  n: number;
  p: number;
  K: number;
  y: Int32Array;
  s: Float64Array;
  C: number;
}

/** θ layout: class k's intercept at k(p+1), its weights at k(p+1)+1 … k(p+1)+p. */
function objective(problem: Problem, theta: Float64Array): number {
  const { x, n, p, K, y, s, C } = problem;
  const q = p + 1;
  const scores = new Float64Array(K);
  const probs = new Float64Array(K);
  let f = 0;
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < K; k++) {
      let z = theta[k * q] as number;
      for (let j = 0; j < p; j++) z += (theta[k * q + 1 + j] as number) * (x[i * p + j] as number);
      scores[k] = z;
    }
    const logSum = softmaxInto(scores, probs);
    f += (s[i] as number) * (logSum - (scores[y[i] as number] as number));
  }
  for (let k = 0; k < K; k++) for (let j = 0; j < p; j++) f += (theta[k * q + 1 + j] as number) ** 2 / (2 * C);
  return f;
}

function gradientAndHessian(problem: Problem, theta: Float64Array): { g: Float64Array; h: Float64Array } {
  const { x, n, p, K, y, s, C } = problem;
  const q = p + 1;
  const d = K * q;
  const g = new Float64Array(d);
  const h = new Float64Array(d * d);
  const scores = new Float64Array(K);
  const probs = new Float64Array(K);
  const xt = new Float64Array(q);
  // Per class pair (k ≤ l), accumulate Σ_i a_i x̃_i x̃_iᵀ in an upper triangle.
  const blocks = new Float64Array(((K * (K + 1)) / 2) * q * q);
  for (let i = 0; i < n; i++) {
    xt[0] = 1;
    for (let j = 0; j < p; j++) xt[j + 1] = x[i * p + j] as number;
    for (let k = 0; k < K; k++) {
      let z = 0;
      for (let j = 0; j < q; j++) z += (theta[k * q + j] as number) * (xt[j] as number);
      scores[k] = z;
    }
    softmaxInto(scores, probs);
    const si = s[i] as number;
    const yi = y[i] as number;
    let block = 0;
    for (let k = 0; k < K; k++) {
      const pk = probs[k] as number;
      const r = si * (pk - (k === yi ? 1 : 0));
      for (let j = 0; j < q; j++) g[k * q + j] = (g[k * q + j] as number) + r * (xt[j] as number);
      for (let l = k; l < K; l++) {
        const a = si * pk * ((k === l ? 1 : 0) - (probs[l] as number));
        const base = block * q * q;
        if (a !== 0) {
          for (let j = 0; j < q; j++) {
            const ax = a * (xt[j] as number);
            const row = base + j * q;
            for (let m = j; m < q; m++) blocks[row + m] = (blocks[row + m] as number) + ax * (xt[m] as number);
          }
        }
        block++;
      }
    }
  }
  let block = 0;
  for (let k = 0; k < K; k++) {
    for (let l = k; l < K; l++) {
      const base = block * q * q;
      for (let j = 0; j < q; j++) {
        for (let m = j; m < q; m++) {
          const v = blocks[base + j * q + m] as number;
          const r1 = k * q + j;
          const c1 = l * q + m;
          const r2 = k * q + m;
          const c2 = l * q + j;
          h[r1 * d + c1] = v;
          h[c1 * d + r1] = v;
          h[r2 * d + c2] = v;
          h[c2 * d + r2] = v;
        }
      }
      block++;
    }
  }
  for (let k = 0; k < K; k++) {
    for (let j = 1; j < q; j++) {
      const index = k * q + j;
      g[index] = (g[index] as number) + (theta[index] as number) / C;
      h[index * d + index] = (h[index * d + index] as number) + 1 / C;
    }
  }
  // Along u (all intercepts together) the objective is flat: add u uᵀ, u = intercept indicator / √K.
  for (let k = 0; k < K; k++)
    for (let l = 0; l < K; l++) h[k * q * d + l * q] = (h[k * q * d + l * q] as number) + 1 / K;
  return { g, h };
}

function choleskyOf(h: Float64Array, d: number): CholeskyDecomposition {
  const rows: number[][] = [];
  for (let r = 0; r < d; r++) rows.push(Array.from(h.subarray(r * d, r * d + d)));
  const chol = new CholeskyDecomposition(new Matrix(rows));
  if (!chol.isPositiveDefinite())
    throw new RangeError('the Hessian of the logistic objective is not positive definite');
  return chol;
}

function centreIntercepts(theta: Float64Array, K: number, q: number): void {
  let mean = 0;
  for (let k = 0; k < K; k++) mean += theta[k * q] as number;
  mean /= K;
  for (let k = 0; k < K; k++) theta[k * q] = (theta[k * q] as number) - mean;
}

/** Fits the model to rows `x` (n × p) and class indices `y` in 0…K−1. */
export function fitLogistic(
  x: readonly (readonly number[])[],
  y: readonly number[],
  classCount: number,
  options: LogisticFitOptions,
): LogisticModel {
  const n = x.length;
  if (n === 0) throw new RangeError('no rows to fit');
  if (y.length !== n) throw new RangeError('one class index per row is needed');
  if (!(options.C > 0)) throw new RangeError('C must be positive');
  const p = (x[0] as readonly number[]).length;
  const K = classCount;
  if (K < 2) throw new RangeError('a classifier needs at least two classes');
  const problem: Problem = {
    x: Float64Array.from(x.flatMap((row) => [...row])),
    n,
    p,
    K,
    y: Int32Array.from(y),
    s: Float64Array.from(options.sampleWeights ?? new Array<number>(n).fill(1)),
    C: options.C,
  };
  const q = p + 1;
  const d = K * q;
  let theta = new Float64Array(d);
  if (
    options.initial &&
    options.initial.intercepts.length === K &&
    options.initial.weights.every((w) => w.length === p)
  ) {
    for (let k = 0; k < K; k++) {
      theta[k * q] = options.initial.intercepts[k] as number;
      for (let j = 0; j < p; j++) theta[k * q + 1 + j] = (options.initial.weights[k] as number[])[j] as number;
    }
    if (!theta.every(Number.isFinite)) theta = new Float64Array(d);
  }
  let f = objective(problem, theta);
  const maxIterations = options.maxIterations ?? 100;
  const tolerance = options.gradientTolerance ?? 1e-10;
  let iterations = 0;
  let converged = false;
  let chol: CholeskyDecomposition | null = null;
  for (; iterations < maxIterations; iterations++) {
    const { g, h } = gradientAndHessian(problem, theta);
    chol = choleskyOf(h, d);
    let maxGradient = 0;
    for (const v of g) maxGradient = Math.max(maxGradient, Math.abs(v));
    if (
      maxGradient <
      tolerance *
        Math.max(
          1,
          problem.s.reduce((a, b) => a + b, 0),
        )
    ) {
      converged = true;
      break;
    }
    const step = chol.solve(Matrix.columnVector(Array.from(g))).getColumn(0);
    let t = 1;
    let next = theta;
    let fNext = f;
    for (let halvings = 0; halvings < 60; halvings++) {
      next = theta.map((v, i) => v - t * (step[i] as number));
      fNext = objective(problem, next);
      if (fNext <= f) break;
      t /= 2;
    }
    if (!(fNext <= f)) {
      converged = true;
      break;
    }
    const decrease = f - fNext;
    theta = next;
    centreIntercepts(theta, K, q);
    f = fNext;
    if (decrease <= 1e-15 * Math.max(1, Math.abs(f)) && t < 1) {
      converged = true;
      break;
    }
  }
  if (!chol || !converged) {
    const { h } = gradientAndHessian(problem, theta);
    chol = choleskyOf(h, d);
  }
  const weights: number[][] = [];
  const intercepts: number[] = [];
  for (let k = 0; k < K; k++) {
    intercepts.push(theta[k * q] as number);
    weights.push(Array.from(theta.subarray(k * q + 1, k * q + q)));
  }
  const L = chol.lowerTriangularMatrix;
  const hessianCholesky = new Float64Array(d * d);
  for (let r = 0; r < d; r++) for (let c = 0; c <= r; c++) hessianCholesky[r * d + c] = L.get(r, c);
  return {
    classCount: K,
    featureCount: p,
    weights,
    intercepts,
    objective: f,
    iterations,
    converged,
    hessianCholesky,
    C: options.C,
  };
}

/** Class probabilities of one row. */
export function predictLogistic(
  model: Pick<LogisticModel, 'weights' | 'intercepts'>,
  row: readonly number[],
): number[] {
  const K = model.intercepts.length;
  const scores = new Float64Array(K);
  for (let k = 0; k < K; k++) {
    let z = model.intercepts[k] as number;
    const w = model.weights[k] as number[];
    for (let j = 0; j < w.length; j++) z += (w[j] as number) * (row[j] as number);
    scores[k] = z;
  }
  const out = new Float64Array(K);
  softmaxInto(scores, out);
  return Array.from(out);
}

/** The objective f(W, b) of a given parameter set on given data (for comparing solutions). */
export function logisticObjective(
  model: Pick<LogisticModel, 'weights' | 'intercepts'>,
  x: readonly (readonly number[])[],
  y: readonly number[],
  C: number,
  sampleWeights?: readonly number[],
): number {
  let f = 0;
  x.forEach((row, i) => {
    const probs = predictLogistic(model, row);
    f += (sampleWeights?.[i] ?? 1) * -Math.log(probs[y[i] as number] as number);
  });
  for (const w of model.weights) for (const v of w) f += (v * v) / (2 * C);
  return f;
}

/**
 * One draw of the parameters from the Laplace posterior N(θ̂, H⁻¹): θ = θ̂ + L⁻ᵀ z with H = L Lᵀ and z
 * standard normal (back substitution on Lᵀ).
 */
export function samplePosterior(
  model: LogisticModel,
  random: SeededRandom,
): Pick<LogisticModel, 'weights' | 'intercepts'> {
  const K = model.classCount;
  const q = model.featureCount + 1;
  const d = K * q;
  const L = model.hessianCholesky;
  const z = Float64Array.from({ length: d }, () => random.nextNormal());
  const delta = new Float64Array(d);
  for (let r = d - 1; r >= 0; r--) {
    let sum = z[r] as number;
    for (let c = r + 1; c < d; c++) sum -= (L[c * d + r] as number) * (delta[c] as number);
    delta[r] = sum / (L[r * d + r] as number);
  }
  const weights = model.weights.map((w, k) => w.map((v, j) => v + (delta[k * q + 1 + j] as number)));
  const intercepts = model.intercepts.map((b, k) => b + (delta[k * q] as number));
  return { weights, intercepts };
}
