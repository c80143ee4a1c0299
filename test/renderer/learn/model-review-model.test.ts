/**
 * The Model review view's pure model: the table model / physics / majority, the honest verdict, recall rows,
 * reliability points without empty bins, the timeline with no model point before validation is possible,
 * the discriminant scatter grouped by architecture with non-finite points dropped, and round ticks.
 * Figures are hand-made (from memory: accuracy = right / rows; ln 3 = 1.0986).
 */
import { describe, expect, it } from 'vitest';
import type { ReviewView } from '../../../shared-model/api/learn';
import type { ClassifierFigures } from '../../../shared-model/learn/metrics';
import {
  headlineRows,
  ldaGroups,
  loadingBars,
  priorWeightText,
  recallRows,
  reliabilityPoints,
  roundTicks,
  timelineRows,
  verdictText,
} from '../../../renderer/src/views/model-review/model-review-model';

type Ready = Extract<ReviewView, { status: 'ready' }>;

function figures(accuracy: number, logLoss: number, rows = 30): ClassifierFigures {
  return {
    rows,
    accuracy,
    errors: Math.round(rows * (1 - accuracy)),
    balancedAccuracy: accuracy - 0.05,
    logLoss,
    uniformLogLoss: Math.log(3),
    brier: 0.4,
    perClassRecall: [
      { label: 'alloy', recall: 0.9, support: 10 },
      { label: 'A@B', recall: null, support: 0 },
    ],
    reliability: [
      { from: 0, to: 0.1, count: 0, meanConfidence: null, observedAccuracy: null },
      { from: 0.6, to: 0.7, count: 5, meanConfidence: 0.65, observedAccuracy: 0.6 },
    ],
  };
}

function review(model: ClassifierFigures, physics: ClassifierFigures): Ready {
  return {
    status: 'ready',
    minOutcomes: 12,
    outcomes: 30,
    failed: 0,
    classes: [
      { key: 'alloy', description: 'alloy', count: 10 },
      { key: 'A@B', description: 'core@shell', count: 10 },
      { key: 'Janus', description: 'Janus', count: 10 },
    ],
    left: [],
    validation: 'leave-one-pair-out',
    pairs: 8,
    priorWeight: 0.05,
    priorWeightTuning: [{ weight: 0.05, logLoss: 0.8 }],
    priorWeightNote: 'chosen by leave-one-pair-out log-loss; not nested',
    model,
    physics,
    majority: figures(1 / 3, 1.1),
    knownPairsNewConditions: { model, physics },
    timeline: [
      { week: '2026-09-07', outcomes: 5, model: null, physics: { accuracy: 0.4, logLoss: 1.2 } },
      {
        week: '2026-09-14',
        outcomes: 30,
        model: { accuracy: 0.8, logLoss: 0.6 },
        physics: { accuracy: 0.5, logLoss: 1 },
      },
    ],
    lda: {
      axes: 2,
      explainedVarianceRatio: [0.7, 0.3],
      points: [
        { id: 'a', pair: 'Ag-Au', classKey: 'alloy', x: 1, y: 2 },
        { id: 'b', pair: 'Cu-Ag', classKey: 'A@B', x: -1, y: 0 },
        { id: 'c', pair: 'Cu-Ag', classKey: 'A@B', x: Number.NaN, y: 0 },
      ],
      loadings: [
        { descriptor: 'd1', label: 'size mismatch', weight: 0.9, weight2: -0.2 },
        { descriptor: 'd2', label: 'broken', weight: Number.NaN, weight2: null },
      ],
    },
    ldaNote: null,
    trainedOn: [],
  };
}

describe('model review model', () => {
  it('lists model, physics and majority with accuracy, errors and losses', () => {
    const rows = headlineRows(review(figures(0.8, 0.6), figures(0.5, 1)));
    expect(rows.map((r) => r.key)).toEqual(['model', 'physics', 'majority']);
    expect(rows[0]).toMatchObject({ accuracy: '80.0 %', errors: '6 of 30', logLoss: '0.600', brier: '0.400' });
  });

  it('says honestly whether the model beats physics on new pairs', () => {
    expect(verdictText(review(figures(0.8, 0.6), figures(0.5, 1)))).toMatch(/beats physics alone.*below the 1\.099/);
    expect(verdictText(review(figures(0.4, 1.3), figures(0.5, 1)))).toMatch(/does not beat physics.*not below/);
  });

  it('shows a dash for the recall of a class never observed, never NaN', () => {
    const rows = recallRows(review(figures(0.8, 0.6), figures(0.5, 1)));
    expect(rows[1]?.model).toBe('–');
    expect(rows[0]?.model).toBe('90.0 %');
  });

  it('draws only the non-empty reliability bins', () => {
    expect(reliabilityPoints(figures(0.8, 0.6))).toEqual([{ confidence: 0.65, observed: 0.6, count: 5 }]);
  });

  it('has no model point in a week before the model could be validated', () => {
    const rows = timelineRows(review(figures(0.8, 0.6), figures(0.5, 1)));
    expect(rows[0]?.modelAccuracy).toBeNull();
    expect(rows[1]?.modelAccuracy).toBe(0.8);
  });

  it('groups the discriminant scatter by architecture and drops non-finite points and loadings', () => {
    const r = review(figures(0.8, 0.6), figures(0.5, 1));
    const groups = ldaGroups(r);
    expect(groups.map((g) => [g.classKey, g.points.length])).toEqual([
      ['alloy', 1],
      ['A@B', 1],
    ]);
    expect(loadingBars(r)).toEqual([{ label: 'size mismatch', axis1: 0.9, axis2: -0.2 }]);
  });

  it('makes round ticks and states the prior weight', () => {
    expect(roundTicks(0, 1, 0.2)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(priorWeightText(review(figures(0.8, 0.6), figures(0.5, 1)))).toMatch(/weighs 0\.05.*tuned once 30/);
    // Tuned: the weight is chosen with pairs held out in groups, then scored leave-one-pair-out (review.ts).
    const tuned: Ready = {
      ...review(figures(0.8, 0.6), figures(0.5, 1)),
      priorWeight: 0.15,
      priorWeightTuning: [
        { weight: 0.05, logLoss: 0.8 },
        { weight: 0.15, logLoss: 0.7 },
      ],
    };
    expect(priorWeightText(tuned)).toMatch(
      /weighs 0\.15 .*pairs held out together \(in at most 10 groups\) among 0\.05, 0\.15, then scored leave-one-pair-out/,
    );
  });
});
