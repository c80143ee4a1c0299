/**
 * Leakage check (issue 11): when each pair has one random label at five compositions, plain leave-one-out
 * "knows" the pair from its descriptors (ten pairs: few enough for a linear model on ~15 descriptors to
 * tell them apart) and scores high, while leave-one-pair-out falls to about the majority baseline; a table
 * whose label follows the composition (xB below or above ½, with a gap) is separable and scores 100 %.
 */
import { describe, expect, it } from 'vitest';
import { crossValidate, leaveOneGroupOut, leaveOneOut } from '../../../shared-model/learn/cross-validation';
import {
  classifierProbabilities,
  fitClassifier,
  prepareOutcomes,
  type LearningOutcome,
} from '../../../shared-model/learn/outcome-model';
import { argMax } from '../../../shared-model/learn/pipeline';
import { createRandom } from '../../../shared-model/random';

const METALS = ['Ag', 'Au', 'Cu', 'Ni', 'Pt'];
const PAIRS: [string, string][] = [];
for (let i = 0; i < METALS.length; i++)
  for (let j = i + 1; j < METALS.length; j++) PAIRS.push([METALS[i] as string, METALS[j] as string]);
const COMPOSITIONS = [0.1, 0.2, 0.3, 0.7, 0.9];

function table(
  label: (a: string, b: string, r: ReturnType<typeof createRandom>, xB: number) => string,
): LearningOutcome[] {
  const r = createRandom(7);
  return PAIRS.flatMap(([a, b]) => {
    const observed = label(a, b, r, 0);
    return COMPOSITIONS.map((xB, i) => ({
      id: `${a}${b}${i}`,
      elementA: a,
      elementB: b,
      xB,
      diameterNm: 5,
      temperatureK: 400,
      route: 'polyol' as const,
      observed: observed || label(a, b, r, xB),
      madeOn: null,
    }));
  });
}

function accuracies(outcomes: LearningOutcome[], C: number): { lopo: number; loo: number; majority: number } {
  const set = prepareOutcomes(outcomes);
  const rows = set.labelled.map((o) => ({ features: o.features, classKey: o.classKey! }));
  const observed = rows.map((r) => set.classes.indexOf(r.classKey));
  const predict = (train: number[], test: number[]) => {
    const fit = fitClassifier(
      train.map((i) => rows[i]!),
      [],
      0,
      set.classes,
      C,
    );
    return classifierProbabilities(
      fit,
      test.map((i) => rows[i]!.features),
    ).map(argMax);
  };
  const score = (pred: number[]) => pred.filter((p, i) => p === observed[i]).length / pred.length;
  const counts = set.classes.map((_, k) => observed.filter((y) => y === k).length);
  return {
    lopo: score(crossValidate(rows.length, leaveOneGroupOut(set.labelled.map((o) => o.condition.pair)), predict)),
    loo: score(crossValidate(rows.length, leaveOneOut(rows.length), predict)),
    majority: Math.max(...counts) / rows.length,
  };
}

describe('leave-one-pair-out vs leave-one-out', () => {
  it('a random label per pair: leave-one-out is high, leave-one-pair-out near the majority baseline', () => {
    const labels = ['alloy', 'Janus', 'intermetallic'];
    const result = accuracies(
      table((_a, _b, r) => labels[r.nextInt(labels.length)] as string),
      1000,
    );
    expect(result.loo).toBeGreaterThan(0.9);
    expect(result.lopo).toBeLessThan(result.majority + 0.15);
    expect(result.loo - result.lopo).toBeGreaterThan(0.4);
  });

  it('a label that follows the composition is learned on new pairs (100 %)', () => {
    const result = accuracies(
      table((_a, _b, _r, xB) => (xB === 0 ? '' : xB < 0.5 ? 'alloy' : 'Janus')),
      100,
    );
    expect(result.lopo).toBe(1);
    expect(result.loo).toBe(1);
  });
});
