/**
 * Model review and proposals on the demo history (demo data, invented): finite figures beside the
 * physics and majority baselines, a too-few answer that states N, clear messages for bad input, and
 * proposals that are one per pair, leave tested and failed conditions out, mark exploration, and repeat
 * from their seed.
 */
import { describe, expect, it } from 'vitest';
import { buildCandidates, candidateConditions, sameCondition } from '../../../shared-model/learn/candidates';
import { DEMO_HISTORY_ELEMENTS, demoHistoryCsv } from '../../../shared-model/learn/demo-history';
import { parseHistoryTable } from '../../../shared-model/learn/history-table';
import { MIN_OUTCOMES, prepareOutcomes, type LearningOutcome } from '../../../shared-model/learn/outcome-model';
import {
  formatCostPerBatch,
  meetingNoteText,
  proposeBatches,
  TARGET_PROBABILITY_THRESHOLD,
  type ProposalSettings,
} from '../../../shared-model/learn/proposals';
import { reviewCampaign, type ModelReview } from '../../../shared-model/learn/review';
import { parseRankTarget } from '../../../shared-model/prediction/rank';
import { domainErrorOf } from '../../support/domain-error';

const history: LearningOutcome[] = parseHistoryTable(demoHistoryCsv()).rows.map((r, i) => ({ ...r, id: `h${i + 1}` }));
// One failed synthesis exactly at a candidate condition (Au-Pt, 50 at.% Pt, 4 nm, polyol).
const outcomes: LearningOutcome[] = [
  ...history,
  {
    id: 'f1',
    elementA: 'Au',
    elementB: 'Pt',
    xB: 0.5,
    diameterNm: 4,
    temperatureK: 433.15,
    route: 'polyol',
    observed: 'failed',
    madeOn: null,
  },
];
const elements = [...DEMO_HISTORY_ELEMENTS];
const FAST = {
  C: 1,
  priorWeight: 0.05,
  grid: {
    xB: [0.25, 0.5, 0.75],
    diametersNm: [4, 8],
    routes: ['co-reduction', 'seed-mediated', 'polyol', 'organic'] as const,
  },
  maxPseudoInFolds: 120,
};

const review: ModelReview = reviewCampaign(outcomes, elements, FAST);

describe('reviewCampaign', () => {
  it('gives leave-one-pair-out figures for the model, physics and majority, all finite', () => {
    if (review.status !== 'ready') throw new Error(`expected a ready review, got: ${review.message}`);
    expect(review.validation).toBe('leave-one-pair-out');
    expect(review.outcomes + review.failed + review.left.length).toBe(outcomes.length);
    for (const f of [review.model, review.physics, review.majority, review.knownPairsNewConditions.model]) {
      for (const v of [f.accuracy, f.balancedAccuracy, f.logLoss, f.brier]) expect(Number.isFinite(v)).toBe(true);
      expect(f.errors).toBe(Math.round(f.rows * (1 - f.accuracy)));
      expect(f.uniformLogLoss).toBeCloseTo(Math.log(review.classes.length), 12);
      expect(f.reliability).toHaveLength(10);
      expect(f.reliability.reduce((s, b) => s + b.count, 0)).toBe(f.rows);
    }
    expect(review.timeline.length).toBeGreaterThan(3);
    expect(review.timeline.every((t) => t.physics === null || Number.isFinite(t.physics.accuracy))).toBe(true);
    expect(review.lda).not.toBeNull();
    expect(review.lda!.points.every((p) => Number.isFinite(p.x) && Number.isFinite(p.y))).toBe(true);
    // The Miedema total (= chemical + elastic) is exactly collinear and is dropped inside the fit.
    expect(review.lda!.loadings.map((l) => l.descriptor)).not.toContain('mixingElasticKjPerMol');
    expect(review.fitted.trainedOn).toHaveLength(review.outcomes + review.failed);
    expect(review.priorWeight).toBe(0.05);
  });

  it('too few outcomes: says how many are needed and shows no learned figures', () => {
    const few = reviewCampaign(outcomes.slice(0, 6), elements, FAST);
    expect(few.status).toBe('too-few');
    if (few.status !== 'too-few') return;
    expect(few.message).toContain(`at least ${MIN_OUTCOMES}`);
  });

  it('a single architecture: asks for a second one', () => {
    const single = outcomes.filter((o) => o.observed !== 'failed').map((o) => ({ ...o, observed: 'alloy' }));
    const r = reviewCampaign(single, elements, FAST);
    expect(r.status).toBe('too-few');
    if (r.status === 'too-few') expect(r.message).toContain('second architecture');
  });

  it('an element without descriptor data is named', () => {
    const error = domainErrorOf(() =>
      reviewCampaign([{ ...(outcomes[0] as LearningOutcome), elementA: 'Xx' }], elements, FAST),
    );
    expect(error.message).toContain('Xx');
  });
});

describe('proposeBatches', () => {
  if (review.status !== 'ready') throw new Error('demo history should give a model');
  const candidates = buildCandidates(candidateConditions(elements, FAST.grid));
  const prepared = prepareOutcomes(outcomes).all;
  const settings: ProposalSettings = {
    target: parseRankTarget('core@shell'),
    count: 6,
    explorationSlots: 2,
    includeFailed: false,
    metalMmolPerBatch: 0.1,
    seed: 3,
  };
  const prices = elements.map((symbol, i) => ({
    symbol,
    pricePerGram: 1 + 10 * i,
    currency: 'EUR',
    pricedOn: '2026-11-20',
  }));

  it('six proposals, one per pair, untested, not where a synthesis failed; exploration slots marked', () => {
    const result = proposeBatches(review.fitted, candidates, prepared, prices, settings);
    expect(result.proposals).toHaveLength(6);
    expect(new Set(result.proposals.map((p) => p.pair)).size).toBe(6);
    expect(result.proposals.filter((p) => p.exploration)).toHaveLength(2);
    expect(result.excludedFailed).toBeGreaterThan(0);
    for (const p of result.proposals) {
      const c = candidates.find(
        (x) =>
          x.condition.pair === p.pair &&
          x.condition.xB === p.xB &&
          x.condition.diameterNm === p.diameterNm &&
          x.condition.route === p.route,
      )!;
      expect(prepared.some((o) => sameCondition(o.condition, c.condition))).toBe(false);
      expect(p.probability).toBeGreaterThanOrEqual(0);
      expect(p.probability).toBeLessThanOrEqual(1);
      expect(p.costPerBatch).toBeGreaterThan(0);
      expect(p.reason).toMatch(/^P\(.+\) \d\.\d\d ± \d\.\d\d; /);
    }
    expect(result.costNote).toBeNull();
  });

  it('repeats from its seed; asking for failed conditions brings them back into the candidate pool', () => {
    const a = proposeBatches(review.fitted, candidates, prepared, prices, settings);
    const b = proposeBatches(review.fitted, candidates, prepared, prices, settings);
    expect(b).toEqual(a);
    const withFailed = proposeBatches(review.fitted, candidates, prepared, prices, {
      ...settings,
      includeFailed: true,
    });
    expect(withFailed.excludedFailed).toBe(0);
    expect(withFailed.candidatesConsidered).toBeGreaterThan(a.candidatesConsidered);
  });

  it('without prices: ranked without cost, and says which prices are missing', () => {
    const result = proposeBatches(review.fitted, candidates, prepared, prices.slice(1), settings);
    expect(result.costNote).toContain(elements[0]);
  });

  it('lists first the proposals whose mean P(target) reaches the threshold, then the closest, marked', () => {
    // On the demo history (5 alloys among 61 labelled outcomes) no untested condition reaches P(alloy) 0.5,
    // so every slot but exploration is one of the closest, marked as not meeting it.
    for (const target of ['alloy', 'core@shell', 'Janus']) {
      const result = proposeBatches(review.fitted, candidates, prepared, prices, {
        ...settings,
        target: parseRankTarget(target),
      });
      expect(result.threshold).toBe(TARGET_PROBABILITY_THRESHOLD);
      const main = result.proposals.filter((p) => !p.exploration);
      for (const p of result.proposals) expect(p.meetsTarget).toBe(p.probability >= TARGET_PROBABILITY_THRESHOLD);
      // meeting ones before the closest
      const firstMiss = main.findIndex((p) => !p.meetsTarget);
      if (firstMiss >= 0) expect(main.slice(firstMiss).every((p) => !p.meetsTarget)).toBe(true);
      // the closest are ordered by P(target), highest first
      const closest = main.filter((p) => !p.meetsTarget).map((p) => p.probability);
      expect(closest).toEqual([...closest].sort((a, b) => b - a));
      expect(result.meeting).toBe(result.proposals.filter((p) => p.meetsTarget).length);
      expect(result.meetingNote === null).toBe(main.every((p) => p.meetsTarget));
    }
    const alloy = proposeBatches(review.fitted, candidates, prepared, prices, {
      ...settings,
      target: parseRankTarget('alloy'),
    });
    expect(alloy.proposals.filter((p) => !p.exploration && p.meetsTarget)).toHaveLength(0);
    expect(alloy.meetingNote).toMatch(/^No untested candidate is likely to reach alloy \(P\(target\) ≥ 0\.5\); /);
  });

  it('states the shortfall and the cost in words people read', () => {
    expect(meetingNoteText('alloy', 0, 4, 0.5)).toBe(
      'No untested candidate is likely to reach alloy (P(target) ≥ 0.5); ' +
        'the closest 4 candidates are shown, marked as not meeting it.',
    );
    expect(meetingNoteText('Janus', 1, 3, 0.5)).toBe(
      'Only 1 candidate is likely to reach Janus (P(target) ≥ 0.5, one per pair); ' +
        'the closest 3 candidates are shown after them, marked as not meeting it.',
    );
    expect(formatCostPerBatch(0.000076, 'EUR')).toBe('7.6 × 10⁻⁵ EUR');
    expect(formatCostPerBatch(0.26, 'EUR')).toBe('0.26 EUR');
    expect(formatCostPerBatch(null, null)).toBe('–');
  });
});
