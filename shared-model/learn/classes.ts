/**
 * Learning classes: architecture labels in canonical roles. A core@shell label naming the pair's elements
 * becomes "A@B" (core = canonical A) or "B@A"; the plain labels stay as they are. `hollow` and `other` are
 * classes only once seen twice and are never targets; `unknown` and labels that fit neither form are left out.
 */
import { parseArchitecture, coreShellLabel } from '../architecture/labels';
import type { RankTarget } from '../prediction/rank';

export const CLASS_KEYS = [
  'alloy',
  'surface-enriched alloy',
  'A@B',
  'B@A',
  'Janus',
  'intermetallic',
  'hollow',
  'other',
] as const;
export type ClassKey = (typeof CLASS_KEYS)[number];

/** Outcome-only classes that need two sightings to enter a model. */
export const RARE_CLASSES: readonly ClassKey[] = ['hollow', 'other'];

/** The class of a label for a canonical pair (a, b); null when it is unknown or names other elements. */
export function classOfLabel(label: string, a: string, b: string): ClassKey | null {
  const parsed = parseArchitecture(label, [a, b]);
  if (!parsed || parsed.kind === 'unknown') return null;
  if (parsed.kind === 'core@shell') return parsed.core === a ? 'A@B' : 'B@A';
  return parsed.kind;
}

/** The label of a class for a canonical pair ("A@B" for Ni-Pt → "Ni@Pt"). */
export function labelOfClass(key: ClassKey, a: string, b: string): string {
  if (key === 'A@B') return coreShellLabel(a, b);
  if (key === 'B@A') return coreShellLabel(b, a);
  return key;
}

/** Human name of a class in role terms for legends. */
export function describeClass(key: ClassKey): string {
  if (key === 'A@B') return 'core@shell, A (first symbol alphabetically) in the core';
  if (key === 'B@A') return 'core@shell, B (second symbol alphabetically) in the core';
  return key;
}

/** Which classes satisfy a target for a canonical pair (a, b). */
export function classesForTarget(target: RankTarget, a: string, b: string): ClassKey[] {
  switch (target.kind) {
    case 'alloy':
      return ['alloy'];
    case 'Janus':
      return ['Janus'];
    case 'intermetallic':
      return ['intermetallic'];
    case 'core@shell':
      if (!target.shellElement) return ['A@B', 'B@A'];
      if (target.shellElement === b) return ['A@B'];
      if (target.shellElement === a) return ['B@A'];
      return [];
  }
}
