/**
 * The physics-prior weight (issue 11: "tune by leave-one-pair-out log-loss once 30+ outcomes exist; show
 * the weight"): with 30 or more labelled outcomes it is the grid weight of lowest log-loss with pairs held out
 * together in at most PAIR_GROUPS groups (exactly leave-one-pair-out up to that many pairs; a cap that keeps
 * the retrain short), scored leave-one-pair-out, and the review says so and that the choice is not nested;
 * with fewer it is the default and the review says when it will be tuned; a weight given is used as given.
 * On the demo history (demo data, invented; 16 pairs).
 */
import { describe, expect, it } from 'vitest';
import { DEMO_HISTORY_ELEMENTS, demoHistoryCsv } from '../../../shared-model/learn/demo-history';
import { parseHistoryTable } from '../../../shared-model/learn/history-table';
import {
  DEFAULT_PRIOR_WEIGHT,
  PRIOR_WEIGHT_CHOICES,
  TUNE_PRIOR_FROM,
  type LearningOutcome,
} from '../../../shared-model/learn/outcome-model';
import { PAIR_GROUPS } from '../../../shared-model/learn/cross-validation';
import { reviewCampaign, type ModelReview, type ReviewSettings } from '../../../shared-model/learn/review';

const history: LearningOutcome[] = parseHistoryTable(demoHistoryCsv()).rows.map((r, i) => ({ ...r, id: `h${i + 1}` }));
const elements = [...DEMO_HISTORY_ELEMENTS];
const settings = (priorWeight: ReviewSettings['priorWeight']): ReviewSettings => ({
  C: 1,
  priorWeight,
  grid: { xB: [0.25, 0.5, 0.75], diametersNm: [4, 8], routes: ['co-reduction', 'seed-mediated', 'polyol', 'organic'] },
  maxPseudoInFolds: 60,
});
const ready = (r: ModelReview) => {
  if (r.status !== 'ready') throw new Error(`expected a ready review, got: ${r.message}`);
  return r;
};

describe('the physics-prior weight', () => {
  it('is tuned over the grid once 30 labelled outcomes exist: the lowest log-loss, said not to be nested', () => {
    const r = ready(reviewCampaign(history, elements, settings('tune')));
    expect(r.outcomes).toBeGreaterThanOrEqual(TUNE_PRIOR_FROM);
    expect(PRIOR_WEIGHT_CHOICES[0]).toBe(0.01);
    expect(PRIOR_WEIGHT_CHOICES.at(-1)).toBe(0.5);
    expect(r.priorWeightTuning.map((t) => t.weight)).toEqual(PRIOR_WEIGHT_CHOICES);
    const lowest = Math.min(...r.priorWeightTuning.map((t) => t.logLoss));
    expect(r.priorWeightTuning.find((t) => t.weight === r.priorWeight)?.logLoss).toBe(lowest);
    expect(r.fitted.priorWeight).toBe(r.priorWeight);
    // 16 pairs > PAIR_GROUPS: tuned over the groups, the headline is the chosen weight's leave-one-pair-out
    // log-loss, i.e. what the same weight given as set scores (that review validates leave-one-pair-out only)
    expect(r.pairs).toBeGreaterThan(PAIR_GROUPS);
    const asSet = ready(reviewCampaign(history, elements, settings(r.priorWeight)));
    expect(r.model.logLoss).toBeCloseTo(asSet.model.logLoss, 9);
    expect(r.priorWeightNote).toContain(`prior weight ${r.priorWeight}`);
    expect(r.priorWeightNote).toContain(`${r.pairs} pairs held out together in ${PAIR_GROUPS} groups`);
    expect(r.priorWeightNote).toContain('then scored leave-one-pair-out');
    expect(r.priorWeightNote).toContain('not nested');
  });

  it(`with at most ${PAIR_GROUPS} pairs is tuned leave-one-pair-out, and the headline is the lowest log-loss`, () => {
    const key = (o: LearningOutcome) => [o.elementA, o.elementB].sort().join('-');
    const firstPairs = [...new Set(history.map(key))].slice(0, PAIR_GROUPS);
    const few = history.filter((o) => firstPairs.includes(key(o)));
    const r = ready(reviewCampaign(few, elements, settings('tune')));
    expect(r.pairs).toBe(PAIR_GROUPS);
    expect(r.outcomes).toBeGreaterThanOrEqual(TUNE_PRIOR_FROM);
    const lowest = Math.min(...r.priorWeightTuning.map((t) => t.logLoss));
    expect(r.model.logLoss).toBeCloseTo(lowest, 12);
    expect(r.priorWeightNote).toContain('the lowest leave-one-pair-out log-loss');
  });

  it('below 30 labelled outcomes is the default, and the review says when it will be tuned', () => {
    const r = ready(reviewCampaign(history.slice(0, 24), elements, settings('tune')));
    expect(r.outcomes).toBeLessThan(TUNE_PRIOR_FROM);
    expect(r.priorWeight).toBe(DEFAULT_PRIOR_WEIGHT);
    expect(r.priorWeightTuning).toHaveLength(1);
    expect(r.priorWeightNote).toContain(`once ${TUNE_PRIOR_FROM} labelled outcomes`);
  });

  it('a weight given is used as given', () => {
    const r = ready(reviewCampaign(history, elements, settings(0.2)));
    expect(r.priorWeight).toBe(0.2);
    expect(r.priorWeightNote).toContain('as set');
  });
});
