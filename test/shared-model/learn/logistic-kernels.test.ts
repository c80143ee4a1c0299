/**
 * The fast paths of the logistic fit leave its optimum alone: the in-place Cholesky factor equals
 * ml-matrix's CholeskyDecomposition (the library the rest of the learning code uses); a warm start (the
 * all-rows fit, restandardised for the fold) and `posterior: false` reach the same optimum as a cold fit
 * with the Laplace factor.
 */
import fc from 'fast-check';
import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { choleskyFactor, fitLogistic } from '../../../shared-model/learn/logistic';
import { classifierProbabilities, fitClassifier } from '../../../shared-model/learn/outcome-model';
import type { ClassKey } from '../../../shared-model/learn/classes';
import { createRandom } from '../../../shared-model/random';

describe('logistic fit kernels', () => {
  it('the Cholesky factor equals ml-matrix CholeskyDecomposition on random SPD matrices', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1_000_000 }), fc.integer({ min: 1, max: 30 }), (seed, d) => {
        const r = createRandom(seed);
        const a = Array.from({ length: d }, () => Array.from({ length: d }, () => r.nextNormal()));
        // A Aᵀ + d I is symmetric positive definite.
        const m = new Matrix(a).mmul(new Matrix(a).transpose()).add(Matrix.eye(d).mul(d));
        const ours = choleskyFactor(Float64Array.from(m.to1DArray()), d);
        const theirs = new CholeskyDecomposition(m).lowerTriangularMatrix;
        for (let i = 0; i < d; i++)
          for (let j = 0; j < d; j++)
            expect(Math.abs((ours[i * d + j] as number) - theirs.get(i, j))).toBeLessThan(1e-10 * d);
      }),
      { numRuns: 30 },
    );
  });

  it('refuses a matrix that is not positive definite with a message', () => {
    expect(() => choleskyFactor(Float64Array.from([1, 2, 2, 1]), 2)).toThrow(/not positive definite/);
  });

  it('posterior: false gives the same optimum and no factor', () => {
    const r = createRandom(7);
    const x = Array.from({ length: 60 }, () => Array.from({ length: 3 }, () => r.nextNormal()));
    const y = x.map((row, i) => (i < 3 ? i : (row[0] as number) + 0.5 * r.nextNormal() > 0 ? 1 : i % 3));
    const full = fitLogistic(x, y, 3, { C: 1 });
    const bare = fitLogistic(x, y, 3, { C: 1, posterior: false });
    expect(bare.hessianCholesky).toHaveLength(0);
    expect(full.hessianCholesky).toHaveLength(3 * 4 * 3 * 4);
    expect(bare.objective).toBe(full.objective);
    expect(bare.weights).toEqual(full.weights);
  });

  it('a fold warm-started from the all-rows fit reaches the cold optimum', () => {
    const r = createRandom(11);
    const classes: ClassKey[] = ['alloy', 'Janus', 'intermetallic'];
    const rows = Array.from({ length: 90 }, (_, i) => {
      const features = [r.nextNormal() * 4 + 10, r.nextNormal() * 0.1, r.nextNormal() + 300];
      const k = i < 3 ? i : (features[0] as number) > 10 ? 1 : (features[1] as number) > 0 ? 0 : 2;
      return { features, classKey: classes[k] as ClassKey };
    });
    const pseudo = rows.slice(0, 20).map((row) => ({ ...row, features: row.features.map((v) => v * 1.01) }));
    const all = fitClassifier(rows, pseudo, 0.1, classes, 1);
    const train = rows.slice(10);
    const cold = fitClassifier(train, pseudo, 0.1, classes, 1);
    const warm = fitClassifier(train, pseudo, 0.1, classes, 1, all, { posterior: false });
    expect(Math.abs(warm.objective - cold.objective)).toBeLessThan(1e-9 * Math.abs(cold.objective));
    const test = rows.slice(0, 10).map((row) => row.features);
    const pc = classifierProbabilities(cold, test);
    classifierProbabilities(warm, test).forEach((p, i) =>
      p.forEach((v, k) => expect(Math.abs(v - ((pc[i] as number[])[k] as number))).toBeLessThan(1e-8)),
    );
  });
});
