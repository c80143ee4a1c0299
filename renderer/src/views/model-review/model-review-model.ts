/**
 * The Model review view as a pure model (no React, no DOM): the stored review turned into what the view
 * draws — the headline table (learned model / physics alone / always the most common class, all under
 * leave-one-pair-out), the "known pairs, new conditions" line, per-class recall, the reliability diagram's
 * points (empty bins left out, never NaN), the weekly timeline, the discriminant scatter grouped by observed
 * architecture and the structure-correlation bars. Colours of the architectures follow the Descriptor map.
 */
import type { ReviewView } from '../../../../shared-model/api/learn';
import { architectureColour, NEUTRAL, seriesColour, tint } from '../../charts/palette';
import type { ClassKey } from '../../../../shared-model/learn/classes';
import { describeClass } from '../../../../shared-model/learn/classes';
import { PAIR_GROUPS } from '../../../../shared-model/learn/cross-validation';
import type { ClassifierFigures } from '../../../../shared-model/learn/metrics';

type Ready = Extract<ReviewView, { status: 'ready' }>;

/**
 * One colour per class from the shared palette (charts/palette.ts), the Descriptor map's where the kind is the
 * same; B@A is the core@shell hue lighter, so the two core@shell classes read as one kind, two ways round.
 */
export const CLASS_COLOURS: Record<ClassKey, string> = {
  alloy: architectureColour('alloy'),
  'surface-enriched alloy': architectureColour('surface-enriched alloy'),
  'A@B': architectureColour('core@shell'),
  'B@A': tint(architectureColour('core@shell'), 0.55),
  Janus: architectureColour('Janus'),
  intermetallic: architectureColour('intermetallic'),
  hollow: architectureColour('hollow'),
  other: architectureColour('other'),
};

/** The three predictors of the table and charts, with their colours (the same in every chart). */
export const PREDICTOR_COLOURS = {
  model: seriesColour(0),
  physics: seriesColour(1),
  majority: NEUTRAL.reference,
} as const;
export const PREDICTOR_LABELS = {
  model: 'Learned model',
  physics: 'Physics alone',
  majority: 'Always the most common class',
} as const;

const finite = (x: number | null | undefined): x is number => typeof x === 'number' && Number.isFinite(x);

/** A fraction as a percentage with one decimal ("83.3 %"), a dash when not a number. */
export function percentText(x: number | null | undefined): string {
  return finite(x) ? `${(x * 100).toFixed(1)} %` : '–';
}

/** A loss or score with three decimals, a dash when not a number. */
export function figureText(x: number | null | undefined): string {
  return finite(x) ? x.toFixed(3) : '–';
}

export interface FigureRow {
  key: keyof typeof PREDICTOR_LABELS;
  label: string;
  accuracy: string;
  errors: string;
  balancedAccuracy: string;
  logLoss: string;
  brier: string;
}

function row(key: FigureRow['key'], f: ClassifierFigures): FigureRow {
  return {
    key,
    label: PREDICTOR_LABELS[key],
    accuracy: percentText(f.accuracy),
    errors: `${f.errors} of ${f.rows}`,
    balancedAccuracy: percentText(f.balancedAccuracy),
    logLoss: figureText(f.logLoss),
    brier: figureText(f.brier),
  };
}

/** Rows of the table model / physics / majority (leave-one-pair-out). */
export function headlineRows(review: Ready): FigureRow[] {
  return [row('model', review.model), row('physics', review.physics), row('majority', review.majority)];
}

/** The sentence under the table: does the learned model beat physics on new pairs, honestly. */
export function verdictText(review: Ready): string {
  const m = review.model;
  const p = review.physics;
  const better = m.logLoss < p.logLoss;
  const moreRight = m.accuracy > p.accuracy;
  const uniform = m.uniformLogLoss;
  const vsUniform =
    m.logLoss < uniform
      ? `below the ${figureText(uniform)} of a uniform guess over ${review.classes.length} classes (ln ${review.classes.length})`
      : `not below the ${figureText(uniform)} of a uniform guess over ${review.classes.length} classes (ln ${review.classes.length})`;
  const head =
    better && moreRight
      ? 'On pairs it has not seen, the learned model beats physics alone'
      : better
        ? 'On pairs it has not seen, the learned model has a lower log-loss than physics alone but is not more often right'
        : moreRight
          ? 'On pairs it has not seen, the learned model is more often right than physics alone but its probabilities are worse'
          : 'On pairs it has not seen, the learned model does not beat physics alone';
  return (
    `${head}: ${percentText(m.accuracy)} vs ${percentText(p.accuracy)} right, log-loss ` +
    `${figureText(m.logLoss)} vs ${figureText(p.logLoss)}; the model's log-loss is ${vsUniform}.`
  );
}

/** "Known pairs, new conditions" (plain leave-one-out: optimistic, since a pair's other rows stay in training). */
export function knownPairsText(review: Ready): string {
  const k = review.knownPairsNewConditions;
  return (
    `Known pairs, new conditions (${k.heldOut ?? 'each outcome held out alone'}, its pair's other outcomes kept): learned model ` +
    `${percentText(k.model.accuracy)} right, log-loss ${figureText(k.model.logLoss)}; physics alone ` +
    `${percentText(k.physics.accuracy)}, ${figureText(k.physics.logLoss)}. Optimistic for new pairs.`
  );
}

export interface RecallRow {
  label: string;
  description: string;
  support: number;
  model: string;
  physics: string;
  majority: string;
}

/** Per-class recall of the three predictors, one row per class. */
export function recallRows(review: Ready): RecallRow[] {
  return review.model.perClassRecall.map((r, i) => ({
    label: r.label,
    description: describeClass(r.label as ClassKey),
    support: r.support,
    model: percentText(r.recall),
    physics: percentText(review.physics.perClassRecall[i]?.recall ?? null),
    majority: percentText(review.majority.perClassRecall[i]?.recall ?? null),
  }));
}

export interface ReliabilityPoint {
  confidence: number;
  observed: number;
  count: number;
}

/** Points of the reliability diagram for one predictor: non-empty bins only (no NaN, no gaps drawn as 0). */
export function reliabilityPoints(figures: ClassifierFigures): ReliabilityPoint[] {
  return figures.reliability
    .filter((b) => b.count > 0 && finite(b.meanConfidence) && finite(b.observedAccuracy))
    .map((b) => ({ confidence: b.meanConfidence as number, observed: b.observedAccuracy as number, count: b.count }));
}

export interface TimelineRow {
  week: string;
  outcomes: number;
  modelAccuracy: number | null;
  physicsAccuracy: number | null;
  modelLogLoss: number | null;
  physicsLogLoss: number | null;
}

/** The timeline as chart rows; a week before the model could be validated has no model point (null, not NaN). */
export function timelineRows(review: Ready): TimelineRow[] {
  return review.timeline.map((t) => ({
    week: t.week,
    outcomes: t.outcomes,
    modelAccuracy: finite(t.model?.accuracy) ? (t.model?.accuracy ?? null) : null,
    physicsAccuracy: finite(t.physics?.accuracy) ? (t.physics?.accuracy ?? null) : null,
    modelLogLoss: finite(t.model?.logLoss) ? (t.model?.logLoss ?? null) : null,
    physicsLogLoss: finite(t.physics?.logLoss) ? (t.physics?.logLoss ?? null) : null,
  }));
}

export interface ScatterGroup {
  classKey: ClassKey;
  name: string;
  colour: string;
  points: { x: number; y: number; pair: string; id: string }[];
}

/** The discriminant scatter: one group per observed architecture, finite points only. */
export function ldaGroups(review: Ready): ScatterGroup[] {
  if (!review.lda) return [];
  const groups = new Map<ClassKey, ScatterGroup>();
  for (const p of review.lda.points) {
    if (!finite(p.x) || !finite(p.y)) continue;
    let g = groups.get(p.classKey);
    if (!g) {
      g = { classKey: p.classKey, name: describeClass(p.classKey), colour: CLASS_COLOURS[p.classKey], points: [] };
      groups.set(p.classKey, g);
    }
    g.points.push({ x: p.x, y: p.y, pair: p.pair, id: p.id });
  }
  return [...groups.values()];
}

/** Names of the scatter's axes with the share of between-class variance each explains. */
export function ldaAxisLabels(review: Ready): { x: string; y: string } {
  const r = review.lda?.explainedVarianceRatio ?? [];
  const name = (i: number) => `discriminant axis ${i + 1}${finite(r[i]) ? ` (${percentText(r[i])})` : ''}`;
  return { x: name(0), y: review.lda && review.lda.axes > 1 ? name(1) : 'composition xB (one axis only)' };
}

/** The loadings bars, strongest first, at most `max`, finite only. */
export function loadingBars(review: Ready, max = 12): { label: string; axis1: number; axis2: number | null }[] {
  return (review.lda?.loadings ?? [])
    .filter((l) => finite(l.weight))
    .slice(0, max)
    .map((l) => ({ label: l.label, axis1: l.weight, axis2: finite(l.weight2) ? l.weight2 : null }));
}

/** Round ticks from lo to hi by step (inclusive), for axes on [0, 1] and similar. */
export function roundTicks(lo: number, hi: number, step: number): number[] {
  const n = Math.round((hi - lo) / step);
  return Array.from({ length: n + 1 }, (_, i) => Number((lo + i * step).toFixed(10)));
}

/** The prior weight in words. */
export function priorWeightText(review: Ready): string {
  const tuned = review.priorWeightTuning.length > 1;
  return (
    `Physics prior: each physics pseudo-outcome weighs ${review.priorWeight} of an observed outcome` +
    (tuned
      ? `, chosen by log-loss with pairs held out together (in at most ${PAIR_GROUPS} groups) among ` +
        `${review.priorWeightTuning.map((t) => t.weight).join(', ')}, then scored leave-one-pair-out.` +
        ' Not nested: the same outcomes chose the weight and score the model, so the figures may be slightly' +
        ' optimistic.'
      : ' (the starting weight; tuned once 30 outcomes exist).')
  );
}
