/**
 * Where the Candidates view starts: the elements of the current campaign's pairs (or a default set when
 * no campaign has pairs), with every metal one click away; and when typing waits before recomputing.
 */
import { METAL_SYMBOLS } from '../../../../shared-model/elements/symbols';

/** The set shown when no campaign is chosen or the campaign has no pairs yet. */
export const DEFAULT_ELEMENTS_TEXT = 'Pt, Pd, Au, Ag, Ni, Cu, Co';
export const ALL_METALS_TEXT = 'all';

/** The distinct elements of a campaign's pairs, in the order they first appear ("Pt, Ni, Au, Pd"); '' for none. */
export function campaignElementsText(pairs: ReadonlyArray<{ elementA: string; elementB: string }>): string {
  const seen: string[] = [];
  for (const pair of pairs) {
    for (const symbol of [pair.elementA, pair.elementB]) if (!seen.includes(symbol)) seen.push(symbol);
  }
  return seen.join(', ');
}

/** The pair names of a campaign, both orders ("Pt-Ni" and "Ni-Pt"), to mark the campaign's own rows. */
export function campaignPairNames(pairs: ReadonlyArray<{ elementA: string; elementB: string }>): Set<string> {
  const names = new Set<string>();
  for (const pair of pairs) {
    names.add(`${pair.elementA}-${pair.elementB}`);
    names.add(`${pair.elementB}-${pair.elementA}`);
  }
  return names;
}

/** How many pairs an elements field asks for ("all" = every metal), counting distinct symbols only. */
export function pairCountOf(elements: readonly string[] | 'all'): number {
  const n = elements === 'all' ? METAL_SYMBOLS.length : new Set(elements).size;
  return (n * (n - 1)) / 2;
}

/**
 * From this many pairs on, typing waits for a pause before the ranking is recomputed: 45 pairs (ten
 * elements) rank in a few milliseconds, 435 (all 30 metals) took 107–207 ms a keystroke when measured.
 */
export const LARGE_PAIR_COUNT = 100;
/** The pause after the last keystroke before a large set is recomputed. */
export const TYPING_PAUSE_MS = 250;

/** The pause to wait before recomputing a set of this many pairs (0: at once). */
export function recomputeDelayMs(pairCount: number): number {
  return pairCount >= LARGE_PAIR_COUNT ? TYPING_PAUSE_MS : 0;
}
