/**
 * One synthesis condition as the learning code sees it (an outcome or a candidate), and its canonical A/B
 * order. Canonical order: the two symbols in alphabetical order (A first), so "Pt-Ni" at 30 at.% Ni is
 * the same condition as "Ni-Pt" at 70 at.% Pt; core@shell labels become the roles "A@B" / "B@A".
 */
import { ROUTES, type SynthesisRoute } from '../recipes/design-input';

export const LEARN_ROUTES: readonly SynthesisRoute[] = ROUTES;

export interface SynthesisCondition {
  elementA: string;
  elementB: string;
  /** Atomic fraction of B, 0 < xB < 1. */
  xB: number;
  diameterNm: number;
  temperatureK: number;
  route: SynthesisRoute;
}

export interface CanonicalCondition extends SynthesisCondition {
  /** "A-B" in canonical order. */
  pair: string;
  /** Whether the input had B first (its xB was turned into 1 − xB). */
  swapped: boolean;
}

export function canonicalPair(elementA: string, elementB: string): { a: string; b: string; swapped: boolean } {
  return elementA <= elementB
    ? { a: elementA, b: elementB, swapped: false }
    : { a: elementB, b: elementA, swapped: true };
}

export function canonicalCondition(c: SynthesisCondition): CanonicalCondition {
  const { a, b, swapped } = canonicalPair(c.elementA, c.elementB);
  return { ...c, elementA: a, elementB: b, xB: swapped ? 1 - c.xB : c.xB, pair: `${a}-${b}`, swapped };
}
