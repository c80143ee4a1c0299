/**
 * The model review of a campaign: leave-one-pair-out validation of the learned model (the headline; every
 * outcome of a pair held out together, standardisation and fit inside each fold) beside the physics
 * prediction alone and the "always the most common class" baseline; leave-one-out shown only as "known
 * pairs, new conditions"; a weekly timeline; the prior weight (tuned by leave-one-pair-out log-loss once
 * 30 outcomes exist); the LDA view (shrinkage 'auto'; structure correlations of the descriptors with the
 * discriminant scores); and the final fitted model with the ids of the outcomes it was trained on.
 */
import { DomainError } from '../api/result';
import { describeClass, type ClassKey } from './classes';
import { buildCandidates, candidateConditions, DEFAULT_GRID, type Candidate, type CandidateGrid } from './candidates';
import {
  crossValidate,
  groupKFold,
  kFold,
  leaveOneGroupOut,
  leaveOneOut,
  PAIR_GROUPS,
  type Fold,
} from './cross-validation';
import { FEATURE_LABELS, FEATURE_NAMES } from './features';
import { fitLda, ldaTransform, structureCorrelations } from './lda';
import { classifierFigures, type ClassifierFigures } from './metrics';
import {
  classifierProbabilities,
  DEFAULT_PRIOR_WEIGHT,
  fitClassifier,
  fitSuccessModel,
  floorProbabilities,
  LEARN_MODEL_VERSION,
  MIN_OUTCOMES,
  prepareOutcomes,
  PRIOR_WEIGHT_CHOICES,
  TUNE_PRIOR_FROM,
  type FittedClassifier,
  type LearningOutcome,
  type PreparedOutcome,
  type PreparedSet,
  type PseudoOutcome,
  type SuccessModel,
} from './outcome-model';
import { physicsProbabilities } from './physics';
import { priorPseudoOutcomes, type MonteCarloLabel, type PriorSources } from './screen-prior';
import { applyColumnScaler, fitColumnScaler } from './standardise';

export interface ReviewSettings {
  C: number;
  /** A fixed prior weight, or 'tune'. */
  priorWeight: number | 'tune';
  grid: CandidateGrid;
  /** Largest pseudo-outcome set used inside cross-validation folds (every k-th candidate). */
  maxPseudoInFolds: number;
  /** Finished Monte Carlo runs of the campaign: they label the prior where they match (screen-prior.ts). */
  monteCarloRuns?: readonly MonteCarloLabel[];
}

export const DEFAULT_REVIEW_SETTINGS: ReviewSettings = {
  C: 1,
  priorWeight: 'tune',
  grid: DEFAULT_GRID,
  maxPseudoInFolds: 200,
};

/**
 * Caps on the validation work (each fold is one Newton fit over the outcomes plus the pseudo-outcomes):
 * "known pairs, new conditions" is leave-one-out up to this many labelled outcomes, a seeded 10-fold over
 * outcomes above it.
 */
export const LEAVE_ONE_OUT_UP_TO = 100;
export const KNOWN_PAIRS_FOLDS = 10;
const KNOWN_PAIRS_SEED = 11;
/** The timeline covers at most the last this many weeks. */
export const TIMELINE_WEEKS = 12;

export interface ReviewProgress {
  fraction: number;
  stage: string;
}

export interface ReviewHooks {
  onProgress?: (progress: ReviewProgress) => void;
  shouldCancel?: () => boolean;
}

export interface TimelinePoint {
  /** Monday of the week (ISO date). */
  week: string;
  outcomes: number;
  model: { accuracy: number; logLoss: number } | null;
  physics: { accuracy: number; logLoss: number } | null;
}

export interface LdaView {
  axes: number;
  explainedVarianceRatio: number[];
  points: { id: string; pair: string; classKey: ClassKey; x: number; y: number }[];
  /** Structure correlations with the first (and second) discriminant axis, strongest first. */
  loadings: { descriptor: string; label: string; weight: number; weight2: number | null }[];
}

export interface FittedCampaignModel {
  modelVersion: string;
  classes: ClassKey[];
  classifier: FittedClassifier;
  success: SuccessModel;
  priorWeight: number;
  trainedOn: string[];
  elements: string[];
}

export type ModelReview =
  | {
      status: 'too-few';
      /** What to log next. */
      message: string;
      minOutcomes: number;
      outcomes: number;
      failed: number;
      classes: { key: ClassKey; description: string; count: number }[];
      left: { id: string; reason: string }[];
      physics: ClassifierFigures | null;
      trainedOn: string[];
    }
  | {
      status: 'ready';
      minOutcomes: number;
      outcomes: number;
      failed: number;
      classes: { key: ClassKey; description: string; count: number }[];
      left: { id: string; reason: string }[];
      validation: 'leave-one-pair-out';
      pairs: number;
      priorWeight: number;
      priorWeightTuning: { weight: number; logLoss: number }[];
      /** How the prior weight was chosen, in words (tuned or not; the tuning is not nested). */
      priorWeightNote: string;
      /** Which source labelled the prior's pseudo-outcomes (absent in models stored before it was kept). */
      prior?: PriorSources;
      model: ClassifierFigures;
      physics: ClassifierFigures;
      majority: ClassifierFigures;
      knownPairsNewConditions: {
        model: ClassifierFigures;
        physics: ClassifierFigures;
        /** How outcomes were held out, in words (absent in reviews stored before it was written). */
        heldOut?: string;
      };
      /** The validation schemes and their caps, in words (absent in reviews stored before it was written). */
      validationNote?: string;
      timeline: TimelinePoint[];
      lda: LdaView | null;
      ldaNote: string | null;
      fitted: FittedCampaignModel;
      trainedOn: string[];
    };

function cancelled(hooks: ReviewHooks): void {
  if (hooks.shouldCancel?.()) throw new DomainError('cancelled', 'the retrain was cancelled');
}

function thin<T>(items: readonly T[], max: number): T[] {
  if (items.length <= max) return [...items];
  const step = items.length / max;
  return Array.from({ length: max }, (_, i) => items[Math.floor(i * step)] as T);
}

function majorityProbabilities(train: readonly PreparedOutcome[], classes: readonly ClassKey[]): number[] {
  // Class frequencies of the training fold with add-one smoothing (the most common class on top).
  const counts = classes.map((k) => train.filter((o) => o.classKey === k).length + 1);
  const total = counts.reduce((a, b) => a + b, 0);
  return floorProbabilities(
    counts.map((c) => c / total),
    classes.length,
  );
}

interface FoldPredictions {
  model: number[][];
  physics: number[][];
  majority: number[][];
  /** The fit on all rows of the validation (the folds' warm start). */
  warm: FittedClassifier;
}

function pairsOf(outcomes: readonly PreparedOutcome[]): string[] {
  return outcomes.map((o) => o.condition.pair);
}

function validate(
  labelled: readonly PreparedOutcome[],
  folds: readonly Fold[],
  pseudo: readonly PseudoOutcome[],
  weight: number,
  classes: readonly ClassKey[],
  C: number,
  hooks: ReviewHooks,
  progress: (done: number) => void,
  /** A starting point for the all-rows fit (the previous prior weight's or week's); the optimum is the same. */
  start?: FittedClassifier,
): FoldPredictions {
  let done = 0;
  const warm = fitClassifier(
    labelled.map((o) => ({ features: o.features, classKey: o.classKey as ClassKey })),
    pseudo,
    weight,
    classes,
    C,
    start,
    { posterior: false },
  );
  const model = crossValidate(labelled.length, folds, (train, test) => {
    cancelled(hooks);
    const rows = train
      .map((i) => labelled[i] as PreparedOutcome)
      .map((o) => ({ features: o.features, classKey: o.classKey as ClassKey }));
    const fit = fitClassifier(rows, pseudo, weight, classes, C, warm, { posterior: false });
    progress(++done);
    return classifierProbabilities(
      fit,
      test.map((i) => (labelled[i] as PreparedOutcome).features),
    );
  });
  const physics = labelled.map((o) => floorProbabilities(physicsProbabilities(o.physics, classes), classes.length));
  const majority = crossValidate(labelled.length, folds, (train, test) =>
    test.map(() =>
      majorityProbabilities(
        train.map((i) => labelled[i] as PreparedOutcome),
        classes,
      ),
    ),
  );
  return { model, physics, majority, warm };
}

function mondayOf(isoDate: string): string {
  const d = new Date(`${isoDate.slice(0, 10)}T00:00:00Z`);
  const day = (d.getUTCDay() + 6) % 7;
  d.setUTCDate(d.getUTCDate() - day);
  return d.toISOString().slice(0, 10);
}

function classSummary(
  outcomes: readonly PreparedOutcome[],
  classes: readonly ClassKey[],
): { key: ClassKey; description: string; count: number }[] {
  return classes.map((key) => ({
    key,
    description: describeClass(key),
    count: outcomes.filter((o) => o.classKey === key).length,
  }));
}

function fitFinalModels(
  prepared: PreparedSet,
  pseudoAll: readonly PseudoOutcome[],
  priorWeight: number,
  C: number,
  warm?: FittedClassifier,
): { classifier: FittedClassifier; success: SuccessModel } {
  const classifier = fitClassifier(
    prepared.labelled.map((o) => ({ features: o.features, classKey: o.classKey as ClassKey })),
    pseudoAll,
    priorWeight,
    prepared.classes,
    C,
    warm,
  );
  return { classifier, success: fitSuccessModel(prepared.all, C) };
}

/**
 * The models that proposals and predictions use, at a given prior weight: the classifier on every labelled
 * outcome plus the physics pseudo-outcomes over the whole candidate set, and the success model — the fit
 * part of a retrain, without the validation that reviewCampaign adds. Null when there are too few data
 * for a model (reviewCampaign says what is missing).
 */
export function fitCampaignModel(
  outcomes: readonly LearningOutcome[],
  elements: readonly string[],
  priorWeight: number,
  settings: Pick<ReviewSettings, 'C' | 'grid' | 'monteCarloRuns'> = DEFAULT_REVIEW_SETTINGS,
): FittedCampaignModel | null {
  const prepared = prepareOutcomes(outcomes);
  const { labelled, classes } = prepared;
  if (labelled.length < MIN_OUTCOMES || classes.length < 2) return null;
  const allElements = [
    ...new Set([...elements, ...labelled.flatMap((o) => [o.condition.elementA, o.condition.elementB])]),
  ];
  const candidates = buildCandidates(candidateConditions(allElements, settings.grid));
  const pseudoAll = priorPseudoOutcomes(candidates, classes, settings.monteCarloRuns ?? []).pseudo;
  const { classifier, success } = fitFinalModels(prepared, pseudoAll, priorWeight, settings.C);
  const trainedOn = prepared.all.map((o) => o.id);
  return {
    modelVersion: LEARN_MODEL_VERSION,
    classes,
    classifier,
    success,
    priorWeight,
    trainedOn,
    elements: allElements.sort(),
  };
}

/** Builds the review; `elements` are the campaign's elements (the candidate set for the physics prior). */
export function reviewCampaign(
  outcomes: readonly LearningOutcome[],
  elements: readonly string[],
  settings: ReviewSettings = DEFAULT_REVIEW_SETTINGS,
  hooks: ReviewHooks = {},
): ModelReview {
  const report = (fraction: number, stage: string) => hooks.onProgress?.({ fraction: Math.min(1, fraction), stage });
  report(0, 'reading outcomes');
  const prepared = prepareOutcomes(outcomes);
  const { labelled, classes, left } = prepared;
  const failed = prepared.all.filter((o) => o.failed).length;
  const trainedOn = [...prepared.all.map((o) => o.id)];
  const summary = classSummary(labelled, classes);
  const pairs = new Set(labelled.map((o) => o.condition.pair));
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  const tooFew =
    labelled.length < MIN_OUTCOMES
      ? `${plural(labelled.length, 'labelled outcome')}; the learned model needs at least ${MIN_OUTCOMES}. ` +
        `Log ${MIN_OUTCOMES - labelled.length} more (new pairs teach the most).`
      : classes.length < 2
        ? `every labelled outcome is "${classes[0] ?? 'none'}"; ` +
          'log an outcome of a second architecture before a model can separate them.'
        : pairs.size < 3
          ? `outcomes cover ${plural(pairs.size, 'pair')}; leave-one-pair-out validation needs at least 3 pairs.`
          : null;
  if (tooFew) {
    const physics =
      labelled.length > 0 && classes.length >= 2
        ? classifierFigures(
            labelled.map((o) => floorProbabilities(physicsProbabilities(o.physics, classes), classes.length)),
            labelled.map((o) => classes.indexOf(o.classKey as ClassKey)),
            classes,
          )
        : null;
    return {
      status: 'too-few',
      message: tooFew,
      minOutcomes: MIN_OUTCOMES,
      outcomes: labelled.length,
      failed,
      classes: summary,
      left,
      physics,
      trainedOn,
    };
  }
  cancelled(hooks);
  report(0.05, 'physics over the candidate set');
  const allElements = [
    ...new Set([...elements, ...labelled.flatMap((o) => [o.condition.elementA, o.condition.elementB])]),
  ];
  const candidates: Candidate[] = buildCandidates(candidateConditions(allElements, settings.grid));
  const prior = priorPseudoOutcomes(candidates, classes, settings.monteCarloRuns ?? []);
  const pseudoAll = prior.pseudo;
  const pseudoFolds = thin(pseudoAll, settings.maxPseudoInFolds);
  const observed = labelled.map((o) => classes.indexOf(o.classKey as ClassKey));
  const lopo = leaveOneGroupOut(pairsOf(labelled));
  const plainLoo = labelled.length <= LEAVE_ONE_OUT_UP_TO;
  const loo = plainLoo ? leaveOneOut(labelled.length) : kFold(labelled.length, KNOWN_PAIRS_FOLDS, KNOWN_PAIRS_SEED);
  const knownPairsHeldOut = plainLoo
    ? 'each outcome held out alone'
    : `outcomes held out in ${loo.length} folds (seeded shuffle; leave-one-out up to ${LEAVE_ONE_OUT_UP_TO} outcomes)`;

  const weights =
    settings.priorWeight === 'tune'
      ? labelled.length >= TUNE_PRIOR_FROM
        ? PRIOR_WEIGHT_CHOICES
        : [DEFAULT_PRIOR_WEIGHT]
      : [settings.priorWeight];
  // Tuning holds pairs out in at most PAIR_GROUPS groups (one fit per group and weight); the chosen weight is then
  // scored leave-one-pair-out, which the grouping already is up to PAIR_GROUPS pairs.
  const pairGroups = weights.length > 1 ? groupKFold(pairsOf(labelled), PAIR_GROUPS) : lopo;
  const headlineRefit = pairGroups.length !== lopo.length;
  const totalFits = weights.length * pairGroups.length + (headlineRefit ? lopo.length : 0) + loo.length;
  let fitsDone = 0;
  const step = () => report(0.1 + (0.75 * ++fitsDone) / totalFits, 'cross-validation');
  const tuning: { weight: number; logLoss: number; predictions: FoldPredictions }[] = [];
  for (const w of weights) {
    const start = tuning.at(-1)?.predictions.warm;
    const predictions = validate(labelled, pairGroups, pseudoFolds, w, classes, settings.C, hooks, step, start);
    tuning.push({ weight: w, logLoss: classifierFigures(predictions.model, observed, classes).logLoss, predictions });
  }
  const chosen = tuning.reduce((a, b) => (b.logLoss < a.logLoss - 1e-12 ? b : a));
  const best = {
    weight: chosen.weight,
    predictions: headlineRefit
      ? validate(labelled, lopo, pseudoFolds, chosen.weight, classes, settings.C, hooks, step, chosen.predictions.warm)
      : chosen.predictions,
  };
  const tunedBy =
    pairGroups.length < lopo.length
      ? `log-loss with the ${lopo.length} pairs held out together in ${pairGroups.length} groups`
      : 'leave-one-pair-out log-loss';
  const priorWeightNote =
    settings.priorWeight !== 'tune'
      ? `prior weight ${best.weight} per physics pseudo-outcome, as set`
      : weights.length === 1
        ? `prior weight ${best.weight} per physics pseudo-outcome (the default); it is tuned (log-loss with ` +
          `pairs held out together) once ${TUNE_PRIOR_FROM} labelled outcomes are logged (${labelled.length} now)`
        : `prior weight ${best.weight} per physics pseudo-outcome, the lowest ${tunedBy} of ` +
          `${weights.join(', ')}, then scored leave-one-pair-out; not nested: the same outcomes chose the weight ` +
          'and score the model, so its figures may be slightly optimistic';
  const looPredictions = validate(
    labelled,
    loo,
    pseudoFolds,
    best.weight,
    classes,
    settings.C,
    hooks,
    step,
    best.predictions.warm,
  );

  report(0.86, 'weekly timeline');
  const timeline: TimelinePoint[] = [];
  const dated = labelled.filter((o) => o.madeOn);
  const allWeeks = [...new Set(dated.map((o) => mondayOf(o.madeOn as string)))].sort();
  const weeks = allWeeks.slice(-TIMELINE_WEEKS);
  let previousWarm: FittedClassifier = best.predictions.warm;
  for (const week of weeks) {
    cancelled(hooks);
    const end = new Date(`${week}T00:00:00Z`);
    end.setUTCDate(end.getUTCDate() + 7);
    const endIso = end.toISOString().slice(0, 10);
    const subset = dated.filter((o) => (o.madeOn as string).slice(0, 10) < endIso);
    const subsetPairs = new Set(subset.map((o) => o.condition.pair));
    const subsetClasses = classes.filter((k) => subset.some((o) => o.classKey === k));
    const subObserved = subset.map((o) => classes.indexOf(o.classKey as ClassKey));
    const physicsFigures = classifierFigures(
      subset.map((o) => floorProbabilities(physicsProbabilities(o.physics, classes), classes.length)),
      subObserved,
      classes,
    );
    let model: TimelinePoint['model'] = null;
    if (subset.length >= MIN_OUTCOMES && subsetClasses.length >= 2 && subsetPairs.size >= 3) {
      const p = validate(
        subset,
        groupKFold(pairsOf(subset), PAIR_GROUPS),
        pseudoFolds,
        best.weight,
        classes,
        settings.C,
        hooks,
        () => undefined,
        previousWarm,
      );
      previousWarm = p.warm;
      const f = classifierFigures(p.model, subObserved, classes);
      model = { accuracy: f.accuracy, logLoss: f.logLoss };
    }
    timeline.push({
      week,
      outcomes: subset.length,
      model,
      physics: { accuracy: physicsFigures.accuracy, logLoss: physicsFigures.logLoss },
    });
  }

  report(0.92, 'discriminant view');
  let lda: LdaView | null = null;
  let ldaNote: string | null = null;
  const ldaClasses = classes.filter((k) => labelled.filter((o) => o.classKey === k).length >= 2);
  const ldaRows = labelled.filter((o) => ldaClasses.includes(o.classKey as ClassKey));
  if (ldaClasses.length < 2) ldaNote = 'the discriminant view needs two architectures seen at least twice each';
  else {
    try {
      const scaler = fitColumnScaler(ldaRows.map((o) => o.features));
      const z = applyColumnScaler(
        scaler,
        ldaRows.map((o) => o.features),
      );
      const yIdx = ldaRows.map((o) => ldaClasses.indexOf(o.classKey as ClassKey));
      const model = fitLda(z, yIdx, ldaClasses.length, { shrinkage: 'auto' });
      const axes = Math.min(2, model.components);
      const scores = ldaTransform(model, z, axes);
      const corr = structureCorrelations(model, z, axes);
      lda = {
        axes,
        explainedVarianceRatio: model.explainedVarianceRatio.slice(0, axes),
        points: ldaRows.map((o, i) => ({
          id: o.id,
          pair: o.condition.pair,
          classKey: o.classKey as ClassKey,
          x: (scores[i] as number[])[0] as number,
          y: axes > 1 ? ((scores[i] as number[])[1] as number) : o.condition.xB,
        })),
        loadings: scaler.kept
          .map((column, j) => ({
            descriptor: FEATURE_NAMES[column] as string,
            label: FEATURE_LABELS[FEATURE_NAMES[column] as string] ?? (FEATURE_NAMES[column] as string),
            weight: (corr[j] as number[])[0] as number,
            weight2: axes > 1 ? ((corr[j] as number[])[1] as number) : null,
          }))
          .sort((a, b) => Math.abs(b.weight) - Math.abs(a.weight)),
      };
      if (lda.points.some((p) => !Number.isFinite(p.x) || !Number.isFinite(p.y))) {
        lda = null;
        ldaNote = 'the discriminant axes are not defined for these outcomes (too little spread in the descriptors)';
      }
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      ldaNote = `the discriminant view cannot be computed: ${error.message}`;
    }
  }

  report(0.96, 'final model');
  cancelled(hooks);
  const { classifier, success } = fitFinalModels(prepared, pseudoAll, best.weight, settings.C, best.predictions.warm);
  report(1, 'done');
  return {
    status: 'ready',
    minOutcomes: MIN_OUTCOMES,
    outcomes: labelled.length,
    failed,
    classes: summary,
    left,
    validation: 'leave-one-pair-out',
    pairs: pairs.size,
    priorWeight: best.weight,
    priorWeightTuning: tuning.map((t) => ({ weight: t.weight, logLoss: t.logLoss })),
    priorWeightNote,
    prior: prior.sources,
    model: classifierFigures(best.predictions.model, observed, classes),
    physics: classifierFigures(best.predictions.physics, observed, classes),
    majority: classifierFigures(best.predictions.majority, observed, classes),
    knownPairsNewConditions: {
      model: classifierFigures(looPredictions.model, observed, classes),
      physics: classifierFigures(looPredictions.physics, observed, classes),
      heldOut: knownPairsHeldOut,
    },
    validationNote:
      `headline: leave-one-pair-out over ${lopo.length} pairs; known pairs, new conditions: ${knownPairsHeldOut}; ` +
      `timeline: ${weeks.length < allWeeks.length ? `the last ${weeks.length} of ${allWeeks.length} weeks` : 'every week'}, ` +
      `each week's model with pairs held out together in at most ${PAIR_GROUPS} groups ` +
      `(leave-one-pair-out up to ${PAIR_GROUPS} pairs); prior weight tuned with the same grouping`,
    timeline,
    lda,
    ldaNote,
    fitted: {
      modelVersion: LEARN_MODEL_VERSION,
      classes,
      classifier,
      success,
      priorWeight: best.weight,
      trainedOn,
      elements: allElements.sort(),
    },
    trainedOn,
  };
}
