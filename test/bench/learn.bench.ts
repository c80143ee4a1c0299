/**
 * Learning from outcomes (issue 11) on 500 outcomes with about 3,000 candidates, the retrain target < 2 s, in
 * two figures: (a) fitting the models that proposals and predictions use (classifier on the outcomes plus the
 * physics pseudo-outcomes over every candidate, and the success model) at a given prior weight; (b) the
 * whole retrain job, i.e. (a) plus the Model review validation (leave-one-pair-out with the prior weight
 * tuned, known pairs / new conditions, weekly timeline, LDA view), printed by stage with its CPU time. And a
 * proposal set from the fitted model over those candidates (< 200 ms). The outcomes are invented (physics labels with 15 %
 * noise and 10 % failures, seeded), not measurements.
 */
import { cpus, loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { buildCandidates, candidateConditions, type CandidateGrid } from '../../shared-model/learn/candidates';
import { canonicalCondition, LEARN_ROUTES } from '../../shared-model/learn/conditions';
import type { LearningOutcome } from '../../shared-model/learn/outcome-model';
import { prepareOutcomes } from '../../shared-model/learn/outcome-model';
import { physicsPrediction } from '../../shared-model/learn/physics';
import { proposeBatches } from '../../shared-model/learn/proposals';
import {
  DEFAULT_REVIEW_SETTINGS,
  fitCampaignModel,
  reviewCampaign,
  type ReviewSettings,
} from '../../shared-model/learn/review';
import { createRandom } from '../../shared-model/random';

/** 11 metals: 55 pairs × 5 compositions × 3 sizes × 4 routes = 3,300 candidates. */
const ELEMENTS = ['Ag', 'Au', 'Co', 'Cu', 'Fe', 'Ir', 'Ni', 'Pd', 'Pt', 'Rh', 'Ru'];
const GRID: CandidateGrid = { xB: [0.2, 0.35, 0.5, 0.65, 0.8], diametersNm: [3, 5, 8], routes: LEARN_ROUTES };
const OUTCOMES = 500;
const NOISE = ['alloy', 'Janus', 'surface-enriched alloy'];

export function syntheticOutcomes(count: number, seed = 5): LearningOutcome[] {
  const random = createRandom(seed);
  const pairs: [string, string][] = [];
  for (let i = 0; i < ELEMENTS.length; i++)
    for (let j = i + 1; j < ELEMENTS.length; j++) pairs.push([ELEMENTS[i] as string, ELEMENTS[j] as string]);
  const out: LearningOutcome[] = [];
  for (let n = 0; n < count; n++) {
    const [a, b] = pairs[random.nextInt(pairs.length)] as [string, string];
    const route = LEARN_ROUTES[random.nextInt(LEARN_ROUTES.length)] as (typeof LEARN_ROUTES)[number];
    const condition = canonicalCondition({
      elementA: a,
      elementB: b,
      xB: [0.15, 0.25, 0.5, 0.75, 0.85][random.nextInt(5)] as number,
      diameterNm: [3, 4, 5, 8, 10][random.nextInt(5)] as number,
      temperatureK: 300 + 100 * random.nextInt(3),
      route,
    });
    const physics = physicsPrediction(condition).label;
    let observed = physics === 'unknown' ? 'alloy' : physics;
    if (random.next() < 0.15) observed = NOISE[random.nextInt(NOISE.length)] as string;
    if (random.next() < 0.1) observed = 'failed';
    const week = Math.floor(n / 50);
    out.push({
      ...condition,
      id: `b${n}`,
      observed,
      madeOn: `2026-${String(1 + week).padStart(2, '0')}-0${1 + (n % 7)}`,
    });
  }
  return out;
}

function median(values: number[]): number {
  const sorted = [...values].sort((x, y) => x - y);
  return sorted[Math.floor(sorted.length / 2)] as number;
}

export async function run(): Promise<void> {
  const outcomes = syntheticOutcomes(OUTCOMES);
  const settings: ReviewSettings = { ...DEFAULT_REVIEW_SETTINGS, grid: GRID };
  const candidates = buildCandidates(candidateConditions(ELEMENTS, GRID));
  // Warm-up (JIT) on a fifth of the outcomes, then one timed review.
  reviewCampaign(outcomes.slice(0, OUTCOMES / 5), ELEMENTS, settings);
  const stages = new Map<string, number>();
  let stage = 'start';
  let last = performance.now();
  const t0 = last;
  const cpu0 = process.cpuUsage();
  const review = reviewCampaign(outcomes, ELEMENTS, settings, {
    onProgress: (progress) => {
      const now = performance.now();
      stages.set(stage, (stages.get(stage) ?? 0) + now - last);
      stage = progress.stage;
      last = now;
    },
  });
  const reviewMs = performance.now() - t0;
  const reviewCpu = process.cpuUsage(cpu0);
  const reviewCpuMs = (reviewCpu.user + reviewCpu.system) / 1000;
  if (review.status !== 'ready') throw new Error(`the bench review is not ready: ${review.message}`);
  // (a) The models proposals and predictions use, at the review's prior weight (median of 5).
  const fitTimes: number[] = [];
  for (let i = 0; i < 6; i++) {
    const t = performance.now();
    fitCampaignModel(outcomes, ELEMENTS, review.priorWeight, settings);
    if (i > 0) fitTimes.push(performance.now() - t);
  }
  const prepared = prepareOutcomes(outcomes).all;
  const propose = () =>
    proposeBatches(review.fitted, candidates, prepared, [], {
      target: { kind: 'core@shell' },
      count: 6,
      explorationSlots: 1,
      includeFailed: false,
      metalMmolPerBatch: 0.1,
      seed: 1,
    });
  propose();
  const proposal: number[] = [];
  for (let i = 0; i < 9; i++) {
    const t0 = performance.now();
    propose();
    proposal.push(performance.now() - t0);
  }
  const a = median(fitTimes);
  const b = reviewMs;
  const p = median(proposal);
  const verdict = (ms: number, target: number) => `target < ${target} ms ${ms < target ? 'MET' : 'MISSED'}`;
  console.log(
    `retrain (a) fit the models proposals and predictions use — ${OUTCOMES} outcomes + physics pseudo-outcomes ` +
      `over ${candidates.length} candidates, prior weight ${review.priorWeight}: ${a.toFixed(0)} ms median of 5 — ` +
      verdict(a, 2000),
  );
  console.log(
    `retrain (b) the whole job: Model review validation (${review.pairs} pairs; ${review.validationNote ?? ''}) ` +
      `plus (a): ${b.toFixed(0)} ms wall, ${reviewCpuMs.toFixed(0)} ms CPU (one run) — ${verdict(b, 2000)}`,
  );
  console.log(`  by stage: ${[...stages].map(([name, ms]) => `${name} ${ms.toFixed(0)} ms`).join(', ')}`);
  console.log(`propose 6 of ${candidates.length} candidates: ${p.toFixed(1)} ms median of 9 — ${verdict(p, 200)}`);
  console.log(`(${cpus().length} cores, load ${loadavg()[0]?.toFixed(2)})`);
}
