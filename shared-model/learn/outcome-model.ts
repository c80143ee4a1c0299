/**
 * The outcome model of a campaign: multinomial logistic regression (logistic.ts) on standardised feature
 * rows (features.ts, standardise.ts), trained on the observed outcomes plus physics-labelled
 * pseudo-outcomes over the candidate set, each with a small weight (the physics prior), and a separate
 * success model (same code, two classes: made vs failed).
 *
 * Every probability the model gives is mixed with 0.1 % of the uniform distribution (the same for the
 * physics and majority baselines), so a class a training fold never saw does not make a log-loss infinite.
 */
import { DomainError } from '../api/result';
import { CLASS_KEYS, RARE_CLASSES, classOfLabel, type ClassKey } from './classes';
import { canonicalCondition, type CanonicalCondition, type SynthesisCondition } from './conditions';
import { featureRow } from './features';
import { fitLogisticFlat, predictLogistic, type LogisticModel } from './logistic';
import { physicsPrediction, type PhysicsCall } from './physics';
import { applyColumnScaler, applyColumnScalerFlat, fitColumnScaler, type ColumnScaler } from './standardise';

export const LEARN_MODEL_VERSION = 'learn-1.0';
/** Fewest labelled (not failed) outcomes before a learned model is shown. */
export const MIN_OUTCOMES = 12;
/** Outcomes from which the prior weight is tuned by log-loss with pairs held out (see review.ts). */
export const TUNE_PRIOR_FROM = 30;
export const DEFAULT_PRIOR_WEIGHT = 0.05;
/** The grid the prior weight is tuned over (per pseudo-outcome; a real outcome weighs 1). */
export const PRIOR_WEIGHT_CHOICES: readonly number[] = [0.01, 0.05, 0.15, 0.5];
export const UNIFORM_FLOOR = 0.001;

/** One outcome as the learning code reads it: a condition, the observed label (or "failed") and its date. */
export interface LearningOutcome extends SynthesisCondition {
  id: string;
  observed: string;
  /** ISO date the batch was made, or null. */
  madeOn: string | null;
}

export interface PreparedOutcome {
  id: string;
  condition: CanonicalCondition;
  features: number[];
  /** null for a failed synthesis. */
  classKey: ClassKey | null;
  failed: boolean;
  madeOn: string | null;
  physics: PhysicsCall;
}

export interface PreparedSet {
  /** Labelled outcomes whose class is in `classes`. */
  labelled: PreparedOutcome[];
  /** Every outcome with a made/failed answer (for the success model). */
  all: PreparedOutcome[];
  classes: ClassKey[];
  left: { id: string; reason: string }[];
}

export function prepareOutcomes(outcomes: readonly LearningOutcome[]): PreparedSet {
  const left: PreparedSet['left'] = [];
  const all: PreparedOutcome[] = [];
  for (const o of outcomes) {
    const condition = canonicalCondition(o);
    const failed = o.observed.trim().toLowerCase() === 'failed';
    const classKey = failed ? null : classOfLabel(o.observed, condition.elementA, condition.elementB);
    if (!failed && classKey === null) {
      left.push({ id: o.id, reason: `label "${o.observed}" is unknown or names other metals` });
      continue;
    }
    all.push({
      id: o.id,
      condition,
      features: featureRow(condition, `outcome ${o.id}`),
      classKey,
      failed,
      madeOn: o.madeOn,
      physics: physicsPrediction(condition),
    });
  }
  const counts = new Map<ClassKey, number>();
  for (const o of all) if (o.classKey) counts.set(o.classKey, (counts.get(o.classKey) ?? 0) + 1);
  const classes = CLASS_KEYS.filter((k) => (counts.get(k) ?? 0) >= (RARE_CLASSES.includes(k) ? 2 : 1));
  const labelled: PreparedOutcome[] = [];
  for (const o of all) {
    if (!o.classKey) continue;
    if (classes.includes(o.classKey)) labelled.push(o);
    else left.push({ id: o.id, reason: `"${o.classKey}" is seen once; it becomes a class when seen twice` });
  }
  return { labelled, all, classes, left };
}

export interface PseudoOutcome {
  features: number[];
  classKey: ClassKey;
}

/** Physics pseudo-outcomes over candidate conditions (those whose physics class is a model class). */
export function physicsPseudoOutcomes(
  candidates: readonly { features: number[]; physics: PhysicsCall }[],
  classes: readonly ClassKey[],
): PseudoOutcome[] {
  const out: PseudoOutcome[] = [];
  for (const c of candidates)
    if (c.physics.classKey && classes.includes(c.physics.classKey))
      out.push({ features: c.features, classKey: c.physics.classKey });
  return out;
}

/** Fitted model, serialisable as JSON (stored with its version and the outcomes it was trained on). */
export interface FittedClassifier {
  classes: ClassKey[];
  scaler: ColumnScaler;
  weights: number[][];
  intercepts: number[];
  /** Cholesky factor of the Hessian (row-major, lower triangle) for posterior draws. */
  hessianCholesky: number[];
  featureCount: number;
  C: number;
  objective: number;
}

/**
 * The starting point for a fit standardised by `scaler`, from a fit standardised by another scaler on the
 * same kept columns: the same linear scores on raw rows (w'_j = w_j σ'_j / σ_j, b' = b + Σ_j w_j (μ'_j − μ_j) /
 * σ_j), so a cross-validation fold starts at the all-rows optimum as its own standardisation sees it.
 */
function warmStartFor(
  warm: FittedClassifier,
  scaler: ColumnScaler,
): Pick<LogisticModel, 'weights' | 'intercepts'> | null {
  if (warm.scaler.kept.length !== scaler.kept.length || !warm.scaler.kept.every((c, i) => c === scaler.kept[i]))
    return null;
  if (!warm.intercepts.every((b) => Number.isFinite(b))) return null;
  const weights = warm.weights.map((w) =>
    w.map((v, j) => (v * (scaler.scales[j] as number)) / (warm.scaler.scales[j] as number)),
  );
  const intercepts = warm.intercepts.map((b, k) => {
    let shift = 0;
    (warm.weights[k] as number[]).forEach((v, j) => {
      shift +=
        (v * ((scaler.means[j] as number) - (warm.scaler.means[j] as number))) / (warm.scaler.scales[j] as number);
    });
    return b + shift;
  });
  return { weights, intercepts };
}

/**
 * Fits the classifier on labelled rows plus weighted pseudo rows. The classes are `classes`; any class
 * without a row in this training set (real or pseudo) is left out of the fit and gets only the floor.
 * `warmStart` (a fit on the same classes, e.g. on all rows) only moves the starting point of Newton's
 * method; `posterior: false` skips the Hessian factor at the optimum (a cross-validation fold needs only
 * its predictions; `hessianCholesky` is then empty).
 */
export function fitClassifier(
  rows: readonly { features: number[]; classKey: ClassKey }[],
  pseudo: readonly PseudoOutcome[],
  priorWeight: number,
  classes: readonly ClassKey[],
  C = 1,
  warmStart?: FittedClassifier,
  options: { posterior?: boolean } = {},
): FittedClassifier {
  const present = classes.filter(
    (k) => rows.some((r) => r.classKey === k) || (priorWeight > 0 && pseudo.some((r) => r.classKey === k)),
  );
  if (present.length < 2)
    throw new DomainError(
      'invalid_input',
      'the training rows hold fewer than two architectures; log outcomes of a second architecture',
      'outcomes',
    );
  const all = priorWeight > 0 ? [...rows, ...pseudo.filter((r) => present.includes(r.classKey))] : [...rows];
  const weights = Float64Array.from(all, (_, i) => (i < rows.length ? 1 : priorWeight));
  const features = all.map((r) => r.features);
  const scaler = fitColumnScaler(features);
  const z = applyColumnScalerFlat(scaler, features);
  const initial =
    warmStart !== undefined && present.length === classes.length && warmStart.classes.length === classes.length
      ? warmStartFor(warmStart, scaler)
      : null;
  const model: LogisticModel = fitLogisticFlat(
    z,
    all.length,
    scaler.kept.length,
    Int32Array.from(all, (r) => present.indexOf(r.classKey)),
    present.length,
    {
      C,
      sampleWeights: weights,
      ...(initial ? { initial } : {}),
      ...(options.posterior === false ? { posterior: false } : {}),
    },
  );
  // Expand to the full class list: absent classes get −∞ scores (only the floor remains).
  const weightsFull = classes.map((k) =>
    present.includes(k)
      ? (model.weights[present.indexOf(k)] as number[])
      : new Array<number>(scaler.kept.length).fill(0),
  );
  const interceptsFull = classes.map((k) =>
    present.includes(k) ? (model.intercepts[present.indexOf(k)] as number) : -Infinity,
  );
  return {
    classes: [...classes],
    scaler,
    weights: weightsFull,
    intercepts: interceptsFull,
    hessianCholesky: present.length === classes.length ? Array.from(model.hessianCholesky) : [],
    featureCount: scaler.kept.length,
    C,
    objective: model.objective,
  };
}

/** Floored class probabilities of feature rows. */
export function classifierProbabilities(
  fit: Pick<FittedClassifier, 'scaler' | 'weights' | 'intercepts'>,
  featureRows: readonly (readonly number[])[],
): number[][] {
  const K = fit.intercepts.length;
  return applyColumnScaler(fit.scaler, featureRows).map((row) => floorProbabilities(predictFinite(fit, row), K));
}

function predictFinite(fit: Pick<FittedClassifier, 'weights' | 'intercepts'>, row: readonly number[]): number[] {
  const finite = fit.intercepts.map((b) => Number.isFinite(b));
  const probs = predictLogistic(
    { weights: fit.weights.filter((_, k) => finite[k]), intercepts: fit.intercepts.filter((_, k) => finite[k]) },
    row,
  );
  let j = 0;
  return fit.intercepts.map((_, k) => (finite[k] ? (probs[j++] as number) : 0));
}

export function floorProbabilities(probs: readonly number[], K: number): number[] {
  return probs.map((p) => (1 - UNIFORM_FLOOR) * p + UNIFORM_FLOOR / K);
}

/** The success model: made vs failed; a smoothed rate when only one of the two has been seen. */
export type SuccessModel =
  | { kind: 'model'; fit: FittedClassifier; made: number; failed: number }
  | { kind: 'rate'; rate: number; made: number; failed: number };

export function fitSuccessModel(all: readonly PreparedOutcome[], C = 1): SuccessModel {
  const failed = all.filter((o) => o.failed).length;
  const made = all.length - failed;
  if (failed < 2 || made < 2) return { kind: 'rate', rate: (made + 1) / (all.length + 2), made, failed };
  const rows = all.map((o) => ({ features: o.features, classKey: (o.failed ? 'other' : 'alloy') as ClassKey }));
  const fit = fitClassifier(rows, [], 0, ['alloy', 'other'], C);
  return { kind: 'model', fit, made, failed };
}

/** P(success) of feature rows. */
export function successProbabilities(model: SuccessModel, featureRows: readonly (readonly number[])[]): number[] {
  if (model.kind === 'rate') return featureRows.map(() => model.rate);
  return classifierProbabilities(model.fit, featureRows).map((p) => p[0] as number);
}
