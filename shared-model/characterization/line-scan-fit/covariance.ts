/**
 * Uncertainties: covariance s²(JᵀJ)⁻¹ of all parameters at the optimum, J by central differences for the
 * geometry and exact for the linear amplitudes and backgrounds, s² = WRSS/(N − k).
 */
import { Matrix, inverse } from 'ml-matrix';
import type { RawFit } from './levenberg-marquardt';
import { decode, parameterNames, writeWeightedModel, type Problem } from './residual';

export function covariance(
  problem: Problem,
  fit: RawFit,
): { cov: Matrix | null; names: string[]; parameterCount: number } {
  const { setup, params, linear } = fit;
  const n = problem.n;
  const L = problem.scaleNm;
  const nonlinear = params.length;
  const linearNames = ['kA', 'bA', 'kB', 'bB'].filter(
    (name) => !(name === 'kA' && linear.kA === 0) && !(name === 'kB' && linear.kB === 0),
  );
  const p = nonlinear + linearNames.length;
  const J = new Matrix(2 * n, p);
  const plus = new Float64Array(2 * n);
  const weightedModel = (q: number[], out: Float64Array) => {
    problem.meter.spend(1);
    const { geometry, sigmaNm } = decode(setup, q, L);
    problem.grid.evaluate(geometry, sigmaNm, problem.phiA, problem.phiB);
    writeWeightedModel(problem, linear, out);
  };
  const minus = new Float64Array(2 * n);
  for (let j = 0; j < nonlinear; j++) {
    const step = 1e-4 * Math.max(Math.abs(params[j] as number), 0.05);
    const up = params.slice();
    const down = params.slice();
    up[j] = (up[j] as number) + step;
    down[j] = (down[j] as number) - step;
    weightedModel(up, plus);
    weightedModel(down, minus);
    // Column in physical units: centre, radius and σ are scaled by L, the core fraction is not.
    const unit = setup.hasCore && j === 2 ? 1 : L;
    for (let i = 0; i < 2 * n; i++) J.set(i, j, ((plus[i] as number) - (minus[i] as number)) / (2 * step * unit));
  }
  // Restore the basis at the optimum for the linear columns.
  const { geometry, sigmaNm } = decode(setup, params, L);
  problem.grid.evaluate(geometry, sigmaNm, problem.phiA, problem.phiB);
  linearNames.forEach((name, c) => {
    const col = nonlinear + c;
    for (let i = 0; i < n; i++) {
      const sa = problem.sA[i] as number;
      const sb = problem.sB[i] as number;
      J.set(i, col, name === 'kA' ? (problem.phiA[i] as number) / sa : name === 'bA' ? 1 / sa : 0);
      J.set(i + n, col, name === 'kB' ? (problem.phiB[i] as number) / sb : name === 'bB' ? 1 / sb : 0);
    }
  });
  const names = [...parameterNames(setup), ...linearNames];
  const dof = 2 * n - p;
  if (dof <= 0) return { cov: null, names, parameterCount: p };
  const s2 = linear.wrss / dof;
  try {
    const cov = inverse(J.transpose().mmul(J)).mul(s2);
    for (let j = 0; j < p; j++)
      if (!(cov.get(j, j) >= 0) || !Number.isFinite(cov.get(j, j))) return { cov: null, names, parameterCount: p };
    return { cov, names, parameterCount: p };
  } catch (error) {
    if (error instanceof Error) return { cov: null, names, parameterCount: p };
    throw error;
  }
}
