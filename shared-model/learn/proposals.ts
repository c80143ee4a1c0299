/**
 * Next-batch proposals (DOMAIN.md "Proposals"): every untested candidate is scored by
 *   P(target) × P(success) ÷ metal cost per batch,
 * with P(target) drawn from the model's Laplace posterior (Thompson sampling: one posterior draw per slot,
 * the best candidate under that draw fills it), at most one proposal per pair, and the last
 * `explorationSlots` slots kept for exploration (untried pairs, or conditions where physics and the model
 * disagree), marked as such. A condition where a synthesis failed is left out unless asked.
 * P(target) ± is the mean and standard deviation over 64 posterior draws.
 *
 * The answer says plainly whether anything is likely to reach the target: a candidate meets it when its
 * posterior mean P(target) is at least TARGET_PROBABILITY_THRESHOLD (0.5: the target more likely than not).
 * Only those fill the proposal slots; when fewer pairs than slots have one, the remaining slots show the
 * closest candidates (highest mean P(target), one per pair), marked `meetsTarget: false`, and `meetingNote`
 * says how many are likely, in the words of rank's "nothing meets the target; the closest are shown".
 * Order: proposals that meet the target, then the closest, then the exploration slots (which keep their own
 * rule and carry `meetsTarget` too).
 */
import { getElement } from '../elements/element-table';
import { describeRankTarget, type RankTarget } from '../prediction/rank';
import { createRandom } from '../random';
import { formatNumber } from '../text/number-format';
import { classesForTarget, labelOfClass, type ClassKey } from './classes';
import { sameCondition, type Candidate } from './candidates';
import type { CanonicalCondition } from './conditions';
import { logisticParameterDraw } from './posterior';
import {
  classifierProbabilities,
  floorProbabilities,
  successProbabilities,
  UNIFORM_FLOOR,
  type PreparedOutcome,
} from './outcome-model';
import { physicsProbabilities } from './physics';
import type { FittedCampaignModel } from './review';
import { applyColumnScaler } from './standardise';

export interface MetalPrice {
  symbol: string;
  pricePerGram: number;
  currency: string;
  pricedOn: string;
}

export interface ProposalSettings {
  target: RankTarget;
  count: number;
  explorationSlots: number;
  /** Propose again where a synthesis failed. */
  includeFailed: boolean;
  /** Total metal per batch, mmol (cost basis). */
  metalMmolPerBatch: number;
  seed: number;
}

export const DEFAULT_METAL_MMOL_PER_BATCH = 0.1;
/** Posterior mean P(target) from which a candidate counts as likely to reach the target. */
export const TARGET_PROBABILITY_THRESHOLD = 0.5;
const POSTERIOR_DRAWS = 64;

export interface Proposal {
  pair: string;
  elementA: string;
  elementB: string;
  xB: number;
  diameterNm: number;
  temperatureK: number;
  route: CanonicalCondition['route'];
  /** Posterior mean of P(target) and its standard deviation. */
  probability: number;
  probabilitySd: number;
  successProbability: number;
  /** Metal cost of one batch in the prices' currency; null when a price is missing. */
  costPerBatch: number | null;
  currency: string | null;
  exploration: boolean;
  /** Whether the posterior mean P(target) reaches the threshold (TARGET_PROBABILITY_THRESHOLD). */
  meetsTarget: boolean;
  /** The architecture label the target means for this pair (e.g. "Ni@Pt"). */
  targetLabel: string;
  physicsLabel: string;
  modelLabel: string;
  reason: string;
}

export interface ProposalResult {
  proposals: Proposal[];
  candidatesConsidered: number;
  excludedTested: number;
  excludedFailed: number;
  costNote: string | null;
  targetNote: string | null;
  /** P(target) from which a candidate meets the target. */
  threshold: number;
  /** Proposals (exploration slots included) that meet the target. */
  meeting: number;
  /** Null when every non-exploration slot meets the target; otherwise how many do and what fills the rest. */
  meetingNote: string | null;
}

/** Cost of one batch with two significant digits ("0.26 EUR", "5.7 × 10⁻⁵ EUR"); "–" without a price. */
export function formatCostPerBatch(cost: number | null, currency: string | null): string {
  if (cost === null) return '–';
  return `${formatNumber(cost, 2)} ${currency ?? ''}`.trim();
}

/** "yes", or "no (P < 0.5)" for one of the closest shown in place of a proposal that meets the target. */
export function meetsTargetText(meetsTarget: boolean, threshold: number): string {
  return meetsTarget ? 'yes' : `no (P < ${threshold})`;
}

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

/** The sentence for a shortfall: `likely` slots met the target of `slots`; `closest` were filled by the closest. */
export function meetingNoteText(target: string, likely: number, closest: number, threshold: number): string {
  const rule = `P(target) ≥ ${threshold}`;
  const rest =
    closest === 0
      ? 'no other untested candidate comes close'
      : `the closest ${plural(closest, 'candidate is', 'candidates are')} shown${likely > 0 ? ' after them' : ''}, ` +
        'marked as not meeting it';
  if (likely === 0) return `No untested candidate is likely to reach ${target} (${rule}); ${rest}.`;
  return `Only ${plural(likely, 'candidate is', 'candidates are')} likely to reach ${target} (${rule}, one per pair); ${rest}.`;
}

function metalCost(c: CanonicalCondition, prices: ReadonlyMap<string, MetalPrice>, mmol: number): number | null {
  const pa = prices.get(c.elementA);
  const pb = prices.get(c.elementB);
  if (!pa || !pb) return null;
  const massA = mmol * 1e-3 * (1 - c.xB) * getElement(c.elementA).atomicMass;
  const massB = mmol * 1e-3 * c.xB * getElement(c.elementB).atomicMass;
  return massA * pa.pricePerGram + massB * pb.pricePerGram;
}

function targetProbability(
  probs: readonly number[],
  classes: readonly ClassKey[],
  wanted: readonly ClassKey[],
): number {
  let p = 0;
  classes.forEach((k, i) => {
    if (wanted.includes(k)) p += probs[i] as number;
  });
  return p;
}

/**
 * targetProbability(floorProbabilities(predictLogistic(params, row))) for one drawn parameter set, with the
 * same operations in the same order, into preallocated arrays (the proposal's inner loop).
 */
function drawnTargetProbability(
  params: { weights: number[][]; intercepts: number[] },
  row: readonly number[],
  wanted: Uint8Array,
  scores: Float64Array,
  probs: Float64Array,
): number {
  const K = params.intercepts.length;
  let max = -Infinity;
  for (let k = 0; k < K; k++) {
    let z = params.intercepts[k] as number;
    const w = params.weights[k] as number[];
    for (let j = 0; j < w.length; j++) z += (w[j] as number) * (row[j] as number);
    scores[k] = z;
    if (z > max) max = z;
  }
  let sum = 0;
  for (let k = 0; k < K; k++) {
    const e = Math.exp((scores[k] as number) - max);
    probs[k] = e;
    sum += e;
  }
  let p = 0;
  for (let k = 0; k < K; k++) {
    if (wanted[k] !== 1) continue;
    p += (1 - UNIFORM_FLOOR) * ((probs[k] as number) / sum) + UNIFORM_FLOOR / K;
  }
  return p;
}

function formatP(p: number): string {
  return p.toFixed(2);
}

export function proposeBatches(
  fitted: FittedCampaignModel,
  candidates: readonly Candidate[],
  outcomes: readonly PreparedOutcome[],
  prices: readonly MetalPrice[],
  settings: ProposalSettings,
): ProposalResult {
  const classes = fitted.classes;
  const priceMap = new Map(prices.map((p) => [p.symbol, p]));
  const triedPairs = new Set(outcomes.map((o) => o.condition.pair));
  const triedRoutes = new Set(outcomes.map((o) => `${o.condition.pair}|${o.condition.route}`));
  let excludedTested = 0;
  let excludedFailed = 0;
  const open: Candidate[] = [];
  // Outcomes by pair and route: a candidate is compared only with those (sameCondition needs both equal).
  const byPairRoute = new Map<string, PreparedOutcome[]>();
  for (const o of outcomes) {
    const key = `${o.condition.pair}|${o.condition.route}`;
    const list = byPairRoute.get(key);
    if (list) list.push(o);
    else byPairRoute.set(key, [o]);
  }
  for (const c of candidates) {
    const near = byPairRoute.get(`${c.condition.pair}|${c.condition.route}`) ?? [];
    const matches = near.filter((o) => sameCondition(o.condition, c.condition));
    if (matches.some((o) => o.failed) && !settings.includeFailed) {
      excludedFailed++;
      continue;
    }
    if (matches.some((o) => !o.failed)) {
      excludedTested++;
      continue;
    }
    open.push(c);
  }
  const wanted = open.map((c) => classesForTarget(settings.target, c.condition.elementA, c.condition.elementB));
  const modelKnowsTarget = open.some((_, i) => (wanted[i] as ClassKey[]).some((k) => classes.includes(k)));
  const targetNote = modelKnowsTarget
    ? null
    : 'no outcome has reached this target yet; P(target) comes from the physics prediction alone';
  const features = open.map((c) => c.features);
  const meanProbs = classifierProbabilities(fitted.classifier, features);
  const physicsProbs = open.map((c) => floorProbabilities(physicsProbabilities(c.physics, classes), classes.length));
  const success = successProbabilities(fitted.success, features);
  const costs = open.map((c) => metalCost(c.condition, priceMap, settings.metalMmolPerBatch));
  const allPriced = costs.every((c) => c !== null);
  const missing = [
    ...new Set(open.flatMap((c) => [c.condition.elementA, c.condition.elementB]).filter((s) => !priceMap.has(s))),
  ].sort();
  const costNote = allPriced
    ? null
    : `no price per gram for ${missing.join(', ')}; ranked without cost (enter prices to include it)`;

  // Posterior draws of P(target) for every open candidate.
  const random = createRandom(settings.seed);
  const z = applyColumnScaler(fitted.classifier.scaler, features);
  const canDraw = fitted.classifier.hessianCholesky.length > 0 && modelKnowsTarget;
  const draws: Float64Array[] = [];
  const wantedMask = wanted.map((w) => Uint8Array.from(classes, (k) => (w.includes(k) ? 1 : 0)));
  const scores = new Float64Array(classes.length);
  const probs = new Float64Array(classes.length);
  for (let d = 0; d < POSTERIOR_DRAWS; d++) {
    const out = new Float64Array(open.length);
    if (canDraw) {
      const params = logisticParameterDraw(fitted.classifier, random);
      z.forEach((row, i) => {
        out[i] = drawnTargetProbability(params, row, wantedMask[i] as Uint8Array, scores, probs);
      });
    } else {
      open.forEach((_, i) => {
        out[i] = targetProbability(
          modelKnowsTarget ? (meanProbs[i] as number[]) : (physicsProbs[i] as number[]),
          classes,
          wanted[i] as ClassKey[],
        );
      });
    }
    draws.push(out);
  }
  const mean = open.map((_, i) => draws.reduce((s, d) => s + (d[i] as number), 0) / POSTERIOR_DRAWS);
  const sd = open.map((_, i) =>
    Math.sqrt(draws.reduce((s, d) => s + ((d[i] as number) - (mean[i] as number)) ** 2, 0) / (POSTERIOR_DRAWS - 1)),
  );
  const modelTop = meanProbs.map((p) => classes[p.indexOf(Math.max(...p))] as ClassKey);
  const disagree = open.map((c, i) => c.physics.classKey !== null && c.physics.classKey !== modelTop[i]);
  const isExplorationCandidate = open.map((c, i) => !triedPairs.has(c.condition.pair) || (disagree[i] as boolean));

  const count = Math.max(0, Math.floor(settings.count));
  const exploreSlots = Math.min(count, Math.max(0, Math.floor(settings.explorationSlots)));
  const mainSlots = count - exploreSlots;
  const threshold = TARGET_PROBABILITY_THRESHOLD;
  const meets = mean.map((p) => p >= threshold);
  const usedPairs = new Set<string>();
  const chosen: { index: number; exploration: boolean }[] = [];
  const available = (i: number) =>
    !usedPairs.has((open[i] as Candidate).condition.pair) && (wanted[i] as ClassKey[]).length > 0;
  // One posterior draw per slot: the best P(target) × P(success) ÷ cost under that draw fills it.
  const drawPick = (slot: number, allowed: (i: number) => boolean): number => {
    const draw = draws[slot % POSTERIOR_DRAWS] as Float64Array;
    let best = -1;
    let bestScore = -Infinity;
    for (let i = 0; i < open.length; i++) {
      if (!available(i) || !allowed(i)) continue;
      const cost = allPriced ? (costs[i] as number) : 1;
      const score = ((draw[i] as number) * (success[i] as number)) / Math.max(cost, 1e-9);
      if (score > bestScore) {
        bestScore = score;
        best = i;
      }
    }
    return best;
  };
  const take = (index: number, exploration: boolean) => {
    usedPairs.add((open[index] as Candidate).condition.pair);
    chosen.push({ index, exploration });
  };
  let slot = 0;
  for (; slot < mainSlots; slot++) {
    const best = drawPick(slot, (i) => meets[i] as boolean);
    if (best < 0) break;
    take(best, false);
  }
  const likely = chosen.length;
  // The closest for the slots left: the highest mean P(target), one per pair.
  const byCloseness = open
    .map((_, i) => i)
    .filter((i) => !(meets[i] as boolean))
    .sort((i, j) => (mean[j] as number) - (mean[i] as number) || i - j);
  for (const i of byCloseness) {
    if (chosen.length >= mainSlots) break;
    if (available(i)) take(i, false);
  }
  const closest = chosen.length - likely;
  for (slot = mainSlots; slot < count; slot++) {
    const best = drawPick(slot, (i) => isExplorationCandidate[i] as boolean);
    if (best >= 0) take(best, true);
  }
  const meetingNote =
    likely < mainSlots ? meetingNoteText(describeRankTarget(settings.target), likely, closest, threshold) : null;

  const proposals = chosen.map(({ index, exploration }) => {
    const c = open[index] as Candidate;
    const { elementA: a, elementB: b } = c.condition;
    const wantedHere = wanted[index] as ClassKey[];
    const targetLabel = wantedHere.map((k) => labelOfClass(k, a, b)).join(' or ');
    const physicsAgrees = c.physics.classKey !== null && wantedHere.includes(c.physics.classKey);
    const parts = [`P(${targetLabel}) ${formatP(mean[index] as number)} ± ${formatP(sd[index] as number)}`];
    parts.push(physicsAgrees ? 'physics agrees' : `physics predicts ${c.physics.label}`);
    if (!triedPairs.has(c.condition.pair)) parts.push('pair untried');
    else if (!triedRoutes.has(`${c.condition.pair}|${c.condition.route}`)) parts.push('route untried here');
    if (exploration) parts.push(disagree[index] ? 'exploration: physics and model disagree' : 'exploration');
    const cost = costs[index] as number | null;
    return {
      pair: c.condition.pair,
      elementA: a,
      elementB: b,
      xB: c.condition.xB,
      diameterNm: c.condition.diameterNm,
      temperatureK: c.condition.temperatureK,
      route: c.condition.route,
      probability: mean[index] as number,
      probabilitySd: sd[index] as number,
      successProbability: success[index] as number,
      costPerBatch: cost,
      currency: cost === null ? null : (priceMap.get(a)?.currency ?? null),
      exploration,
      meetsTarget: meets[index] as boolean,
      targetLabel,
      physicsLabel: c.physics.label,
      modelLabel: labelOfClass(modelTop[index] as ClassKey, a, b),
      reason: parts.join('; '),
    };
  });
  return {
    proposals,
    candidatesConsidered: open.length,
    excludedTested,
    excludedFailed,
    costNote,
    targetNote,
    threshold,
    meeting: proposals.filter((p) => p.meetsTarget).length,
    meetingNote,
  };
}
