/**
 * Properties of the learning code (fast-check): probabilities sum to 1; the fit does not depend on row
 * order; swapping A and B in every row maps A@B to B@A; rescaling a feature does not change standardised
 * results. The optimum itself is checked against SciPy/scikit-learn in test/reference/sklearn-learn.test.ts.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  classifierProbabilities,
  fitClassifier,
  prepareOutcomes,
  type LearningOutcome,
} from '../../../shared-model/learn/outcome-model';
import { labelOfClass } from '../../../shared-model/learn/classes';
import { canonicalCondition } from '../../../shared-model/learn/conditions';
import { featureRow } from '../../../shared-model/learn/features';
import { fitStandardisedLogistic, predictStandardisedLogistic } from '../../../shared-model/learn/pipeline';
import { createRandom } from '../../../shared-model/random';

const table = fc.record({
  seed: fc.integer({ min: 1, max: 1_000_000 }),
  n: fc.integer({ min: 8, max: 40 }),
  p: fc.integer({ min: 1, max: 5 }),
  K: fc.integer({ min: 2, max: 4 }),
});

function randomTable(seed: number, n: number, p: number, K: number): { x: number[][]; y: number[] } {
  const r = createRandom(seed);
  const x = Array.from({ length: n }, () => Array.from({ length: p }, () => r.nextNormal() * 3 + 1));
  // Every class at least once.
  const y = x.map((_, i) => (i < K ? i : r.nextInt(K)));
  return { x, y };
}

describe('logistic regression properties', () => {
  it('class probabilities sum to 1 and lie in [0, 1]', () => {
    fc.assert(
      fc.property(table, ({ seed, n, p, K }) => {
        const { x, y } = randomTable(seed, n, p, K);
        const fit = fitStandardisedLogistic(x, y, K, { C: 1 });
        for (const probs of predictStandardisedLogistic(fit, x)) {
          expect(Math.abs(probs.reduce((a, b) => a + b, 0) - 1)).toBeLessThan(1e-12);
          for (const v of probs) expect(v >= 0 && v <= 1).toBe(true);
        }
      }),
      { numRuns: 40 },
    );
  });

  it('row order does not change the fit', () => {
    fc.assert(
      fc.property(table, fc.integer({ min: 1, max: 10_000 }), ({ seed, n, p, K }, shuffleSeed) => {
        const { x, y } = randomTable(seed, n, p, K);
        const r = createRandom(shuffleSeed);
        const order = x.map((_, i) => i);
        for (let i = order.length - 1; i > 0; i--) {
          const j = r.nextInt(i + 1);
          [order[i], order[j]] = [order[j] as number, order[i] as number];
        }
        const a = fitStandardisedLogistic(x, y, K, { C: 1 });
        const b = fitStandardisedLogistic(
          order.map((i) => x[i] as number[]),
          order.map((i) => y[i] as number),
          K,
          { C: 1 },
        );
        a.model.weights.forEach((w, k) =>
          w.forEach((v, j) => expect(Math.abs(v - ((b.model.weights[k] as number[])[j] as number))).toBeLessThan(1e-7)),
        );
        a.model.intercepts.forEach((v, k) =>
          expect(Math.abs(v - (b.model.intercepts[k] as number))).toBeLessThan(1e-7),
        );
      }),
      { numRuns: 30 },
    );
  });

  it('rescaling a feature does not change standardised results', () => {
    fc.assert(
      fc.property(
        table,
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.double({ min: -100, max: 100, noNaN: true }),
        ({ seed, n, p, K }, scale, shift) => {
          const { x, y } = randomTable(seed, n, p, K);
          const rescaled = x.map((row) => row.map((v, j) => (j === 0 ? v * scale + shift : v)));
          const a = predictStandardisedLogistic(fitStandardisedLogistic(x, y, K, { C: 1 }), x);
          const b = predictStandardisedLogistic(fitStandardisedLogistic(rescaled, y, K, { C: 1 }), rescaled);
          a.forEach((row, i) =>
            row.forEach((v, k) => expect(Math.abs(v - ((b[i] as number[])[k] as number))).toBeLessThan(1e-7)),
          );
        },
      ),
      { numRuns: 30 },
    );
  });
});

describe('canonical A/B order', () => {
  const PAIRS: [string, string][] = [
    ['Pt', 'Ni'],
    ['Au', 'Pd'],
    ['Ag', 'Cu'],
    ['Pd', 'Ag'],
    ['Rh', 'Pt'],
  ];
  const outcomes = (swap: boolean): LearningOutcome[] =>
    PAIRS.flatMap(([a, b], p) =>
      [0.2, 0.5, 0.8].map((xB, i) => {
        const core = (p + i) % 2 === 0 ? a : b;
        const shell = core === a ? b : a;
        const label = i === 1 && p % 2 === 0 ? 'alloy' : `${core}@${shell}`;
        const row = {
          id: `${p}-${i}`,
          elementA: a,
          elementB: b,
          xB,
          diameterNm: 4 + i,
          temperatureK: 300 + 50 * p,
          route: 'co-reduction' as const,
          observed: label,
          madeOn: null,
        };
        return swap ? { ...row, elementA: b, elementB: a, xB: 1 - xB } : row;
      }),
    );

  it('swapping A and B in every row maps A@B to B@A (same labels in element terms)', () => {
    const plain = prepareOutcomes(outcomes(false));
    const swapped = prepareOutcomes(outcomes(true));
    expect(swapped.classes).toEqual(plain.classes);
    const fitOf = (set: typeof plain) =>
      fitClassifier(
        set.labelled.map((o) => ({ features: o.features, classKey: o.classKey! })),
        [],
        0,
        set.classes,
        1,
      );
    const fa = fitOf(plain);
    const fb = fitOf(swapped);
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: PAIRS.length - 1 }),
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        fc.boolean(),
        (pairIndex, xB, swapQuery) => {
          const [a, b] = PAIRS[pairIndex] as [string, string];
          const query = canonicalCondition(
            swapQuery
              ? { elementA: b, elementB: a, xB: 1 - xB, diameterNm: 5, temperatureK: 350, route: 'co-reduction' }
              : { elementA: a, elementB: b, xB, diameterNm: 5, temperatureK: 350, route: 'co-reduction' },
          );
          const pa = classifierProbabilities(fa, [featureRow(query)])[0] as number[];
          const pb = classifierProbabilities(fb, [featureRow(query)])[0] as number[];
          const labelsA = Object.fromEntries(
            plain.classes.map((k, i) => [labelOfClass(k, query.elementA, query.elementB), pa[i]]),
          );
          const labelsB = Object.fromEntries(
            swapped.classes.map((k, i) => [labelOfClass(k, query.elementA, query.elementB), pb[i]]),
          );
          for (const [label, p] of Object.entries(labelsA))
            expect(Math.abs((p as number) - (labelsB[label] as number))).toBeLessThan(1e-7);
        },
      ),
      { numRuns: 25 },
    );
  });
});
