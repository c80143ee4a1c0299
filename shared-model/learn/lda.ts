/**
 * Fisher's linear discriminant analysis with scikit-learn's `solver='eigen'` convention (the explanation view
 * and the reference tier): within-class scatter Sw = Σ_k prior_k · cov_k (biased covariances, priors = class
 * frequencies), total scatter St with the same shrinkage, between-class Sb = St − Sw, and the generalised
 * symmetric eigenproblem Sb v = λ Sw v with vᵀ Sw v = 1 (Cholesky Sw = L Lᵀ, then the ordinary symmetric
 * problem L⁻¹ Sb L⁻ᵀ). explained_variance_ratio_ = the top K − 1 eigenvalues over the sum of all of them;
 * `transform` = X · scalings without centring.
 */
import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, solve } from 'ml-matrix';
import { shrunkCovariance } from './ledoit-wolf';

export interface LdaModel {
  classCount: number;
  /** p × p, columns are discriminant directions sorted by eigenvalue, largest first. */
  scalings: number[][];
  eigenvalues: number[];
  /** Top min(K − 1, p) eigenvalues over the sum of all eigenvalues. */
  explainedVarianceRatio: number[];
  /** Shrinkage coefficient used per class and for the total scatter (0 without shrinkage). */
  shrinkage: { perClass: number[]; total: number };
  components: number;
}

export function fitLda(
  x: readonly (readonly number[])[],
  y: readonly number[],
  classCount: number,
  options: { shrinkage: null | number | 'auto' },
): LdaModel {
  const n = x.length;
  const p = (x[0] as readonly number[]).length;
  const sw = Matrix.zeros(p, p);
  const perClass: number[] = [];
  for (let k = 0; k < classCount; k++) {
    const rows = x.filter((_, i) => y[i] === k);
    if (rows.length === 0) throw new RangeError(`class ${k} has no rows`);
    const { covariance, shrinkage } = shrunkCovariance(rows, options.shrinkage);
    perClass.push(shrinkage);
    sw.add(new Matrix(covariance).mul(rows.length / n));
  }
  const total = shrunkCovariance(x, options.shrinkage);
  const sb = new Matrix(total.covariance).sub(sw);
  // Round-off leaves the scatter matrices a few ulps from symmetric; average with the transpose.
  const swSym = sw.clone().add(sw.transpose()).mul(0.5);
  const chol = new CholeskyDecomposition(swSym);
  if (!chol.isPositiveDefinite())
    throw new RangeError('the within-class scatter is singular (constant or collinear descriptors)');
  const L = chol.lowerTriangularMatrix;
  const Linv = solve(L, Matrix.eye(p));
  const c = Linv.mmul(sb).mmul(Linv.transpose());
  const sym = c.add(c.transpose()).mul(0.5);
  const eig = new EigenvalueDecomposition(sym, { assumeSymmetric: true });
  const values = eig.realEigenvalues;
  const order = values.map((_, i) => i).sort((a, b) => (values[b] as number) - (values[a] as number));
  const vectors = Linv.transpose().mmul(eig.eigenvectorMatrix);
  const scalings = Array.from({ length: p }, (_, r) => order.map((i) => vectors.get(r, i)));
  const eigenvalues = order.map((i) => values[i] as number);
  const sum = eigenvalues.reduce((a, b) => a + b, 0);
  const components = Math.min(classCount - 1, p);
  return {
    classCount,
    scalings,
    eigenvalues,
    explainedVarianceRatio: eigenvalues.slice(0, components).map((v) => v / sum),
    shrinkage: { perClass, total: total.shrinkage },
    components,
  };
}

/** Rows projected on the first `components` discriminant axes (X · scalings, no centring). */
export function ldaTransform(
  model: LdaModel,
  x: readonly (readonly number[])[],
  components = model.components,
): number[][] {
  return x.map((row) => {
    const out: number[] = [];
    for (let c = 0; c < components; c++) {
      let s = 0;
      for (let j = 0; j < row.length; j++) s += (row[j] as number) * ((model.scalings[j] as number[])[c] as number);
      out.push(s);
    }
    return out;
  });
}

/** Pearson correlation of each column of `x` with each discriminant score ("structure correlations"). */
export function structureCorrelations(
  model: LdaModel,
  x: readonly (readonly number[])[],
  components = model.components,
): number[][] {
  const scores = ldaTransform(model, x, components);
  const p = (x[0] as readonly number[]).length;
  const corr = (a: readonly number[], b: readonly number[]): number => {
    const n = a.length;
    const ma = a.reduce((s, v) => s + v, 0) / n;
    const mb = b.reduce((s, v) => s + v, 0) / n;
    let sab = 0;
    let saa = 0;
    let sbb = 0;
    for (let i = 0; i < n; i++) {
      sab += ((a[i] as number) - ma) * ((b[i] as number) - mb);
      saa += ((a[i] as number) - ma) ** 2;
      sbb += ((b[i] as number) - mb) ** 2;
    }
    return saa === 0 || sbb === 0 ? 0 : sab / Math.sqrt(saa * sbb);
  };
  return Array.from({ length: p }, (_, j) =>
    Array.from({ length: components }, (_, c) =>
      corr(
        x.map((r) => r[j] as number),
        scores.map((s) => s[c] as number),
      ),
    ),
  );
}
