/**
 * The physics prediction as the learning code uses it — the one place that calls the prediction chain
 * (prediction/predict.ts), so it can switch to an "as-made" prediction later. Gives the predicted class in
 * canonical roles and the physics-only class probabilities used as a baseline:
 *   p(predicted class) = 1/K + (0.9 − 1/K) · confidence, the rest shared evenly by the other classes
 * (our convention: the prediction's confidence in [0, 1] read as a probability between a guess and 0.9);
 * when the predicted label is not one of the model's classes the physics probabilities are uniform.
 */
import { pairContext, predictWithContext, resolveConditions, type PairContext } from '../prediction/predict';
import { classOfLabel, type ClassKey } from './classes';
import type { CanonicalCondition } from './conditions';

export interface PhysicsCall {
  classKey: ClassKey | null;
  label: string;
  confidence: number;
}

/** Particle shape the physics prediction assumes for learning and proposals. */
export const PHYSICS_SHAPE = 'cuboctahedron';

const contexts = new Map<string, PairContext>();

export function physicsPrediction(c: CanonicalCondition): PhysicsCall {
  let ctx = contexts.get(c.pair);
  if (!ctx) {
    ctx = pairContext(c.elementA, c.elementB);
    contexts.set(c.pair, ctx);
  }
  const xB = Math.min(0.999, Math.max(0.001, c.xB));
  const prediction = predictWithContext(
    ctx,
    resolveConditions({ xB, diameterNm: c.diameterNm, temperatureK: c.temperatureK, shape: PHYSICS_SHAPE }),
  );
  return {
    classKey: classOfLabel(prediction.architecture, c.elementA, c.elementB),
    label: prediction.architecture,
    confidence: prediction.confidence,
  };
}

export function physicsProbabilities(call: PhysicsCall, classes: readonly ClassKey[]): number[] {
  const K = classes.length;
  const index = call.classKey === null ? -1 : classes.indexOf(call.classKey);
  if (index < 0) return new Array<number>(K).fill(1 / K);
  const top = 1 / K + (0.9 - 1 / K) * Math.min(1, Math.max(0, call.confidence));
  return classes.map((_, k) => (k === index ? top : (1 - top) / (K - 1)));
}
