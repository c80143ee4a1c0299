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
 *
 * The work is in flat Float64Array kernels: one pass over the rows gives the objective and the class
 * probabilities, which the gradient and the Hessian reuse; the Hessian is accumulated block by block (its
 * K(K+1)/2 distinct q × q blocks Σ_i s_i p_ik (δ_kl − p_il) x̃_i x̃_iᵀ, upper triangles only) and factored by
 * an in-place Cholesky decomposition (the same factor as ml-matrix's CholeskyDecomposition; a unit test
 * compares them).
 */
import type { SeededRandom } from '../random';

export interface LogisticFitOptions {
  /** Inverse penalty strength C = 1/λ (scikit-learn's convention). */
  C: number;
  /** Per-row weights (default 1). */
  sampleWeights?: readonly number[] | Float64Array;
  maxIterations?: number;
  /** Stop when the largest gradient component falls below this (times max(1, Σ sample weights)). */
  gradientTolerance?: number;
  /** Starting point (e.g. the fit on all rows, for cross-validation folds); zeros by default. */
  initial?: Pick<LogisticModel, 'weights' | 'intercepts'>;
  /**
   * Whether to factor the Hessian at the optimum for the Laplace posterior (default true). A
   * cross-validation fold that only predicts its held-out rows does without it: the iterates and the
   * optimum are the same, the last Hessian is not formed, and `hessianCholesky` is empty.
   */
  posterior?: boolean;
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
  /**
   * Lower-triangular Cholesky factor of the (made invertible) Hessian at the optimum, row-major d × d with
   * d = K(p + 1); empty when fitted with `posterior: false`.
   */
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

/** A fitting problem on flat arrays: rows x (n × p, row-major), classes y, sample weights s. */
export interface FlatProblem {
  x: Float64Array;
  n: number;
  p: number;
  K: number;
  y: Int32Array;
  s: Float64Array;
  C: number;
}

/**
 * Objective at θ (layout: class k's intercept at k(p+1), its weights at k(p+1)+1 … k(p+1)+p); writes the
 * class probabilities of every row into `probs` (n × K), which the gradient and Hessian then reuse.
 */
function objectiveInto(problem: FlatProblem, theta: Float64Array, probs: Float64Array): number {
  const { x, n, p, K, y, s, C } = problem;
  const q = p + 1;
  const scores = new Float64Array(K);
  const row = new Float64Array(K);
  let f = 0;
  for (let i = 0; i < n; i++) {
    const xi = i * p;
    for (let k = 0; k < K; k++) {
      const tk = k * q;
      let z = theta[tk] as number;
      for (let j = 0; j < p; j++) z += (theta[tk + 1 + j] as number) * (x[xi + j] as number);
      scores[k] = z;
    }
    const logSum = softmaxInto(scores, row);
    probs.set(row, i * K);
    f += (s[i] as number) * (logSum - (scores[y[i] as number] as number));
  }
  for (let k = 0; k < K; k++) for (let j = 0; j < p; j++) f += (theta[k * q + 1 + j] as number) ** 2 / (2 * C);
  return f;
}

/** Gradient at θ from the probabilities `probs` at θ. */
function gradientOf(problem: FlatProblem, theta: Float64Array, probs: Float64Array): Float64Array {
  const { x, n, p, K, y, s, C } = problem;
  const q = p + 1;
  const g = new Float64Array(K * q);
  for (let i = 0; i < n; i++) {
    const si = s[i] as number;
    const yi = y[i] as number;
    const xi = i * p;
    for (let k = 0; k < K; k++) {
      const r = si * ((probs[i * K + k] as number) - (k === yi ? 1 : 0));
      if (r === 0) continue;
      const gk = k * q;
      g[gk] = (g[gk] as number) + r;
      for (let j = 0; j < p; j++) g[gk + 1 + j] = (g[gk + 1 + j] as number) + r * (x[xi + j] as number);
    }
  }
  for (let k = 0; k < K; k++)
    for (let j = 1; j < q; j++) g[k * q + j] = (g[k * q + j] as number) + (theta[k * q + j] as number) / C;
  return g;
}

/** Row i's upper-triangle outer products [1, x_i] ⊗ [1, x_i] (q = p + 1 entries per side) into `outer`. */
function rowOuterProducts(x: Float64Array, i: number, p: number, xt: Float64Array, outer: Float64Array): void {
  const q = p + 1;
  xt[0] = 1;
  for (let j = 0; j < p; j++) xt[j + 1] = x[i * p + j] as number;
  let t = 0;
  for (let j = 0; j < q; j++) {
    const xj = xt[j] as number;
    for (let m = j; m < q; m++) outer[t++] = xj * (xt[m] as number);
  }
}

/** blocks[b] += coefficients[b] · outer for every class-pair block b (each block an upper triangle). */
function addBlocks(blocks: Float64Array, coefficients: Float64Array, outer: Float64Array): void {
  const T = outer.length;
  for (let b = 0; b < coefficients.length; b++) {
    const a = coefficients[b] as number;
    if (a === 0) continue;
    const base = b * T;
    for (let t = 0; t < T; t++) blocks[base + t] = (blocks[base + t] as number) + a * (outer[t] as number);
  }
}

/** The symmetric (classes·q)² matrix from its class-pair blocks (k ≤ l), each stored as an upper triangle. */
function blocksToMatrix(blocks: Float64Array, classes: number, q: number): Float64Array {
  const T = (q * (q + 1)) / 2;
  const d = classes * q;
  const h = new Float64Array(d * d);
  let b = 0;
  for (let k = 0; k < classes; k++) {
    for (let l = k; l < classes; l++) {
      let t = b * T;
      for (let j = 0; j < q; j++) {
        for (let m = j; m < q; m++) {
          const v = blocks[t++] as number;
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
      b++;
    }
  }
  return h;
}

/**
 * Exact Hessian (d × d, d = K(p+1)) from the probabilities at θ. The data part is block structured:
 * block (k, l) = Σ_i s_i p_ik (δ_kl − p_il) x̃_i x̃_iᵀ with x̃ = (1, x); only the K(K+1)/2 blocks k ≤ l and
 * the upper triangle of each are accumulated (one packed outer product per row, added to every block with
 * its coefficient), then mirrored. Plus 1/C on the weights' diagonal and u uᵀ along the flat direction of
 * the intercepts (u = intercept indicator / √K).
 */
function hessianOf(problem: FlatProblem, probs: Float64Array): Float64Array {
  const { x, n, p, K, s, C } = problem;
  const q = p + 1;
  const d = K * q;
  const T = (q * (q + 1)) / 2;
  const blockCount = (K * (K + 1)) / 2;
  const blocks = new Float64Array(blockCount * T);
  const outer = new Float64Array(T);
  const xt = new Float64Array(q);
  const coefficients = new Float64Array(blockCount);
  for (let i = 0; i < n; i++) {
    const si = s[i] as number;
    if (si === 0) continue;
    rowOuterProducts(x, i, p, xt, outer);
    let b = 0;
    for (let k = 0; k < K; k++) {
      const pk = si * (probs[i * K + k] as number);
      for (let l = k; l < K; l++) coefficients[b++] = pk * ((k === l ? 1 : 0) - (probs[i * K + l] as number));
    }
    addBlocks(blocks, coefficients, outer);
  }
  const h = blocksToMatrix(blocks, K, q);
  for (let k = 0; k < K; k++) {
    for (let j = 1; j < q; j++) {
      const index = k * q + j;
      h[index * d + index] = (h[index * d + index] as number) + 1 / C;
    }
  }
  for (let k = 0; k < K; k++)
    for (let l = 0; l < K; l++) h[k * q * d + l * q] = (h[k * q * d + l * q] as number) + 1 / K;
  return h;
}

/**
 * Cholesky factor H = L Lᵀ of a symmetric d × d matrix (row-major; the lower triangle is read), returned as
 * the row-major lower triangle with zeros above.
 */
export function choleskyFactor(h: Float64Array, d: number): Float64Array {
  const L = new Float64Array(d * d);
  for (let r = 0; r < d; r++) {
    const rowR = r * d;
    for (let c = 0; c <= r; c++) {
      const rowC = c * d;
      let sum = h[rowR + c] as number;
      for (let k = 0; k < c; k++) sum -= (L[rowR + k] as number) * (L[rowC + k] as number);
      if (r === c) {
        if (!(sum > 0)) throw new RangeError('the Hessian of the logistic objective is not positive definite');
        L[rowR + r] = Math.sqrt(sum);
      } else L[rowR + c] = sum / (L[rowC + c] as number);
    }
  }
  return L;
}

/** Solves L Lᵀ x = g. */
function choleskySolve(L: Float64Array, d: number, g: Float64Array): Float64Array {
  const y = new Float64Array(d);
  for (let r = 0; r < d; r++) {
    let sum = g[r] as number;
    for (let c = 0; c < r; c++) sum -= (L[r * d + c] as number) * (y[c] as number);
    y[r] = sum / (L[r * d + r] as number);
  }
  const out = new Float64Array(d);
  for (let r = d - 1; r >= 0; r--) {
    let sum = y[r] as number;
    for (let c = r + 1; c < d; c++) sum -= (L[c * d + r] as number) * (out[c] as number);
    out[r] = sum / (L[r * d + r] as number);
  }
  return out;
}

function centreIntercepts(theta: Float64Array, K: number, q: number): void {
  let mean = 0;
  for (let k = 0; k < K; k++) mean += theta[k * q] as number;
  mean /= K;
  for (let k = 0; k < K; k++) theta[k * q] = (theta[k * q] as number) - mean;
}

/** Subtracts the mean over classes from the intercepts and from every weight column. */
function centreClasses(theta: Float64Array, K: number, q: number): void {
  for (let j = 0; j < q; j++) {
    let mean = 0;
    for (let k = 0; k < K; k++) mean += theta[k * q + j] as number;
    mean /= K;
    for (let k = 0; k < K; k++) theta[k * q + j] = (theta[k * q + j] as number) - mean;
  }
}

/**
 * The Newton step −H⁻¹g, computed in the sum-zero coordinates: the iterates keep every weight column and
 * the intercepts at zero sum over classes (the gradient has zero class sums and the Hessian keeps that
 * subspace), so θ = A φ with φ the first K − 1 classes and class K − 1 = −Σ φ_k. The reduced Hessian
 * Aᵀ H A has (K−1)K/2 distinct blocks instead of K(K+1)/2, per row with the coefficients
 * s_i [p_k δ_kl − p_k p_l + (p_k + p_l) p_K + p_K − p_K²] (K the last class), plus (I + 11ᵀ)/C on the weights;
 * it is positive definite, so no u uᵀ is needed. Newton's method is affine invariant: the step is the one the
 * full Hessian (made invertible along u) gives, at about (K−1)²/K² of the cost.
 */
function newtonStep(problem: FlatProblem, probs: Float64Array, g: Float64Array): Float64Array {
  const { x, n, p, K, s, C } = problem;
  const q = p + 1;
  const R = K - 1;
  const last = K - 1;
  const dr = R * q;
  const T = (q * (q + 1)) / 2;
  const blockCount = (R * (R + 1)) / 2;
  const blocks = new Float64Array(blockCount * T);
  const outer = new Float64Array(T);
  const xt = new Float64Array(q);
  const coefficients = new Float64Array(blockCount);
  for (let i = 0; i < n; i++) {
    const si = s[i] as number;
    if (si === 0) continue;
    rowOuterProducts(x, i, p, xt, outer);
    const pl = probs[i * K + last] as number;
    const tail = pl - pl * pl;
    let b = 0;
    for (let k = 0; k < R; k++) {
      const pk = probs[i * K + k] as number;
      for (let l = k; l < R; l++) {
        const pm = probs[i * K + l] as number;
        coefficients[b++] = si * ((k === l ? pk : 0) - pk * pm + (pk + pm) * pl + tail);
      }
    }
    addBlocks(blocks, coefficients, outer);
  }
  const h = blocksToMatrix(blocks, R, q);
  for (let k = 0; k < R; k++)
    for (let l = 0; l < R; l++)
      for (let j = 1; j < q; j++) {
        const index = (k * q + j) * dr + l * q + j;
        h[index] = (h[index] as number) + (k === l ? 2 : 1) / C;
      }
  const gr = new Float64Array(dr);
  for (let k = 0; k < R; k++)
    for (let j = 0; j < q; j++) gr[k * q + j] = (g[k * q + j] as number) - (g[last * q + j] as number);
  const phi = choleskySolve(choleskyFactor(h, dr), dr, gr);
  const step = new Float64Array(K * q);
  for (let j = 0; j < q; j++) {
    let sum = 0;
    for (let k = 0; k < R; k++) {
      const v = phi[k * q + j] as number;
      step[k * q + j] = v;
      sum += v;
    }
    step[last * q + j] = -sum;
  }
  return step;
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
  const p = (x[0] as readonly number[]).length;
  const flat = new Float64Array(n * p);
  x.forEach((row, i) => flat.set(row, i * p));
  return fitLogisticFlat(flat, n, p, Int32Array.from(y), classCount, options);
}

/** fitLogistic on a flat row-major table `x` (n × p) and class indices `y`. */
export function fitLogisticFlat(
  x: Float64Array,
  n: number,
  p: number,
  y: Int32Array,
  classCount: number,
  options: LogisticFitOptions,
): LogisticModel {
  if (n === 0) throw new RangeError('no rows to fit');
  if (y.length !== n) throw new RangeError('one class index per row is needed');
  if (x.length !== n * p) throw new RangeError('every row needs the same number of features');
  if (!(options.C > 0)) throw new RangeError('C must be positive');
  const K = classCount;
  if (K < 2) throw new RangeError('a classifier needs at least two classes');
  const s = options.sampleWeights ? Float64Array.from(options.sampleWeights) : new Float64Array(n).fill(1);
  if (s.length !== n) throw new RangeError('one sample weight per row is needed');
  const problem: FlatProblem = { x, n, p, K, y, s, C: options.C };
  const q = p + 1;
  const d = K * q;
  let theta = new Float64Array(d);
  if (
    options.initial &&
    options.initial.intercepts.length === K &&
    options.initial.weights.length === K &&
    options.initial.weights.every((w) => w.length === p)
  ) {
    for (let k = 0; k < K; k++) {
      theta[k * q] = options.initial.intercepts[k] as number;
      for (let j = 0; j < p; j++) theta[k * q + 1 + j] = (options.initial.weights[k] as number[])[j] as number;
    }
    if (!theta.every(Number.isFinite)) theta = new Float64Array(d);
  }
  // Onto the sum-zero subspace (below): same scores up to a per-row constant, so the same probabilities, and a
  // penalty no larger.
  centreClasses(theta, K, q);
  let probs = new Float64Array(n * K);
  let probsNext = new Float64Array(n * K);
  let f = objectiveInto(problem, theta, probs);
  const maxIterations = options.maxIterations ?? 100;
  let totalWeight = 0;
  for (const v of s) totalWeight += v;
  const tolerance = (options.gradientTolerance ?? 1e-10) * Math.max(1, totalWeight);
  let iterations = 0;
  let converged = false;
  for (; iterations < maxIterations; iterations++) {
    const g = gradientOf(problem, theta, probs);
    let maxGradient = 0;
    for (const v of g) maxGradient = Math.max(maxGradient, Math.abs(v));
    if (maxGradient < tolerance) {
      converged = true;
      break;
    }
    const step = newtonStep(problem, probs, g);
    let t = 1;
    let next = theta;
    let fNext = f;
    for (let halvings = 0; halvings < 60; halvings++) {
      next = theta.map((v, i) => v - t * (step[i] as number));
      fNext = objectiveInto(problem, next, probsNext);
      if (fNext <= f) break;
      t /= 2;
    }
    if (!(fNext <= f)) {
      converged = true;
      break;
    }
    const decrease = f - fNext;
    theta = next;
    // Centring the intercepts moves every score of a row by the same amount: the probabilities stand.
    centreIntercepts(theta, K, q);
    [probs, probsNext] = [probsNext, probs];
    f = fNext;
    if (decrease <= 1e-15 * Math.max(1, Math.abs(f)) && t < 1) {
      converged = true;
      break;
    }
  }
  const hessianCholesky =
    options.posterior === false ? new Float64Array(0) : choleskyFactor(hessianOf(problem, probs), d);
  const weights: number[][] = [];
  const intercepts: number[] = [];
  for (let k = 0; k < K; k++) {
    intercepts.push(theta[k * q] as number);
    weights.push(Array.from(theta.subarray(k * q + 1, k * q + q)));
  }
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
