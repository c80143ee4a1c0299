/**
 * Ledoit–Wolf shrinkage of a covariance matrix (O. Ledoit & M. Wolf, "A well-conditioned estimator for
 * large-dimensional covariance matrices", J. Multivar. Anal. 88, 365 (2004)), written as scikit-learn's
 * `ledoit_wolf_shrinkage` / `ledoit_wolf`: shrink the biased (ddof 0) covariance toward μI with μ = trace/p.
 * `shrunkCovariance(…, 'auto')` is scikit-learn's LDA `_cov(X, shrinkage='auto')`: standardise the columns
 * (ddof 0), shrink the correlation matrix, and scale back.
 */

/** Centred copy of the rows. */
function centred(rows: readonly (readonly number[])[]): number[][] {
  const n = rows.length;
  const p = (rows[0] as readonly number[]).length;
  const mean = new Array<number>(p).fill(0);
  for (const row of rows) for (let j = 0; j < p; j++) mean[j] = (mean[j] as number) + (row[j] as number) / n;
  return rows.map((row) => row.map((v, j) => v - (mean[j] as number)));
}

/** Biased covariance (divides by n) of the rows. */
export function empiricalCovariance(rows: readonly (readonly number[])[]): number[][] {
  const x = centred(rows);
  const n = x.length;
  const p = (x[0] as number[]).length;
  const out = Array.from({ length: p }, () => new Array<number>(p).fill(0));
  for (const row of x) {
    for (let a = 0; a < p; a++) {
      const va = row[a] as number;
      const target = out[a] as number[];
      for (let b = a; b < p; b++) target[b] = (target[b] as number) + (va * (row[b] as number)) / n;
    }
  }
  for (let a = 0; a < p; a++) for (let b = 0; b < a; b++) (out[a] as number[])[b] = (out[b] as number[])[a] as number;
  return out;
}

/** The Ledoit–Wolf shrinkage coefficient in [0, 1] of the (centred here) rows. */
export function ledoitWolfShrinkage(rows: readonly (readonly number[])[]): number {
  const x = centred(rows);
  const n = x.length;
  const p = (x[0] as number[]).length;
  if (p === 1) return 0;
  const traceTerms = new Array<number>(p).fill(0);
  for (const row of x)
    for (let j = 0; j < p; j++) traceTerms[j] = (traceTerms[j] as number) + (row[j] as number) ** 2 / n;
  const mu = traceTerms.reduce((a, b) => a + b, 0) / p;
  let betaSum = 0;
  let deltaSum = 0;
  for (let a = 0; a < p; a++) {
    for (let b = 0; b < p; b++) {
      let x2x2 = 0;
      let xx = 0;
      for (const row of x) {
        const va = row[a] as number;
        const vb = row[b] as number;
        x2x2 += va * va * vb * vb;
        xx += va * vb;
      }
      betaSum += x2x2;
      deltaSum += xx * xx;
    }
  }
  deltaSum /= n * n;
  let beta = (betaSum / n - deltaSum) / (p * n);
  let delta = deltaSum - 2 * mu * traceTerms.reduce((a, b) => a + b, 0) + p * mu * mu;
  delta /= p;
  beta = Math.min(beta, delta);
  return beta === 0 ? 0 : beta / delta;
}

/** Covariance with shrinkage: none (biased empirical), a fixed coefficient in [0, 1], or 'auto' (Ledoit–Wolf). */
export function shrunkCovariance(
  rows: readonly (readonly number[])[],
  shrinkage: null | number | 'auto',
): { covariance: number[][]; shrinkage: number } {
  if (shrinkage === null) return { covariance: empiricalCovariance(rows), shrinkage: 0 };
  const p = (rows[0] as readonly number[]).length;
  const n = rows.length;
  const mean = new Array<number>(p).fill(0);
  for (const row of rows) for (let j = 0; j < p; j++) mean[j] = (mean[j] as number) + (row[j] as number) / n;
  const scale = mean.map((m, j) => {
    let s = 0;
    for (const row of rows) s += ((row[j] as number) - m) ** 2;
    const sd = Math.sqrt(s / n);
    return sd === 0 ? 1 : sd;
  });
  const z = rows.map((row) => row.map((v, j) => (v - (mean[j] as number)) / (scale[j] as number)));
  const coefficient = shrinkage === 'auto' ? ledoitWolfShrinkage(z) : shrinkage;
  const emp = empiricalCovariance(z);
  const mu = emp.reduce((s, row, j) => s + (row[j] as number), 0) / p;
  const covariance = emp.map((row, a) =>
    row.map(
      (v, b) =>
        ((1 - coefficient) * v + (a === b ? coefficient * mu : 0)) * (scale[a] as number) * (scale[b] as number),
    ),
  );
  return { covariance, shrinkage: coefficient };
}
