/**
 * Ranking of every pair of an element set for a target architecture. Each pair is predicted in both
 * orders' sense at once (the prediction covers A at the surface of B and B at the surface of A); the score
 * in [0, 1] says how well the predicted particle matches the target:
 *   alloy:            (1 − E) · min(ρ, 1/ρ)            E enrichment, ρ unlike-neighbour ratio
 *   core@shell (X):   E when X is the surface element, else 0
 *   core@shell (any): E
 *   Janus:            (1 − ρ)⁺ · (1 − E)              like atoms cluster, both elements exposed
 * A demixing pair whose spreading coefficient is negative (wetting.ts) is scored with E = 0: both
 * elements stay exposed. `qualifiesFor` says whether a prediction is of the target's kind.
 *   intermetallic:    min(1, (ρ − 1)⁺) · (1 − E)
 * Ties are broken by the pair name. The reason string comes from the prediction's dominant terms.
 */
import { invalid } from '../api/result';
import { getElement } from '../elements/element-table';
import { METAL_SYMBOLS, isMetalSymbol } from '../elements/symbols';
import { surfaceEnrichment } from '../architecture/classify';
import {
  resolveConditions,
  pairContext,
  predictCore,
  predictionFromCore,
  type PairContext,
  type Prediction,
  type PredictionConditions,
  type ResolvedConditions,
  type PredictionCore,
} from './predict';

export type RankTarget =
  { kind: 'alloy' } | { kind: 'core@shell'; shellElement?: string } | { kind: 'Janus' } | { kind: 'intermetallic' };

export interface RankedPair {
  rank: number;
  score: number;
  pair: string;
  /** The full prediction (terms, label, confidence, flags, reason); built when first read. */
  readonly prediction: Prediction;
}

/** A ranked row; its full prediction is assembled from the solved numbers on first read. */
class RankedRow implements RankedPair {
  rank = 0;
  #prediction: Prediction | undefined;
  constructor(
    readonly score: number,
    readonly pair: string,
    private readonly ctx: PairContext,
    private readonly conditions: ResolvedConditions,
    private readonly core: PredictionCore,
  ) {}

  get prediction(): Prediction {
    if (this.#prediction === undefined) this.#prediction = predictionFromCore(this.ctx, this.conditions, this.core);
    return this.#prediction;
  }

  toJSON(): { rank: number; score: number; pair: string; prediction: Prediction } {
    return { rank: this.rank, score: this.score, pair: this.pair, prediction: this.prediction };
  }
}

/** Reads "alloy", "janus", "intermetallic", "core@shell", "core@shell:Pt", "shell:Pt" or "@Pt". */
export function parseRankTarget(text: string): RankTarget {
  const t = String(text).trim();
  const lower = t.toLowerCase();
  if (lower === 'alloy') return { kind: 'alloy' };
  if (lower === 'janus') return { kind: 'Janus' };
  if (lower === 'intermetallic') return { kind: 'intermetallic' };
  if (lower === 'core@shell' || lower === 'core@shell any' || lower === 'core-shell') return { kind: 'core@shell' };
  const m = /^(?:core@shell[:\s]+|shell[:\s]+|@)([A-Za-z]{1,2})$/i.exec(t);
  if (m) {
    const raw = m[1] as string;
    const symbol = raw.charAt(0).toUpperCase() + raw.slice(1).toLowerCase();
    if (!isMetalSymbol(symbol)) throw invalid('target', `unknown shell element "${raw}"`);
    return { kind: 'core@shell', shellElement: symbol };
  }
  throw invalid(
    'target',
    `target must be alloy, core@shell, core@shell:X (X in the shell), Janus or intermetallic; got "${t}"`,
  );
}

export function describeRankTarget(target: RankTarget): string {
  if (target.kind === 'core@shell')
    return target.shellElement ? `core@shell with ${target.shellElement} in the shell` : 'core@shell (any)';
  return target.kind;
}

/** Score of a prediction's numbers for a target, in [0, 1]. */
export function scoreFromNumbers(
  target: RankTarget,
  enrichedElement: string | null,
  enrichment: number,
  unlikeNeighbourRatio: number,
): number {
  const e = Math.min(1, Math.max(0, enrichment));
  const rho = unlikeNeighbourRatio;
  switch (target.kind) {
    case 'alloy':
      return (1 - e) * Math.min(rho, 1 / rho);
    case 'core@shell':
      if (target.shellElement) return enrichedElement === target.shellElement ? e : 0;
      return e;
    case 'Janus':
      return Math.max(0, 1 - rho) * (1 - e);
    case 'intermetallic':
      return Math.min(1, Math.max(0, rho - 1)) * (1 - e);
  }
}

/**
 * Whether the predicted architecture is the kind the target asks for (core@shell:X: X in the shell; alloy:
 * a random or surface-enriched alloy).
 */
export function qualifiesFor(target: RankTarget, p: Prediction): boolean {
  if (target.kind === 'core@shell')
    return (
      p.architectureKind === 'core@shell' &&
      (target.shellElement === undefined || p.surfaceElement === target.shellElement)
    );
  // a surface-enriched alloy is still one mixed phase; its score counts the enrichment against it
  if (target.kind === 'alloy') return p.architectureKind === 'alloy' || p.architectureKind === 'surface-enriched alloy';
  return p.architectureKind === target.kind;
}

export function targetScore(target: RankTarget, p: Prediction): number {
  return scoreFromNumbers(target, p.surfaceElement, p.enrichment, p.unlikeNeighbourRatio);
}

/** The distinct elements of a list, checked (DomainError naming `elements`). */
export function checkElementList(elements: readonly string[] | 'all'): string[] {
  if (elements === 'all') return [...METAL_SYMBOLS];
  if (!Array.isArray(elements)) throw invalid('elements', 'elements must be a list of symbols or "all"');
  const out: string[] = [];
  for (const symbol of elements) {
    getElement(symbol, 'elements');
    if (!out.includes(symbol)) out.push(symbol);
  }
  if (out.length < 2) throw invalid('elements', 'give at least two different elements to rank');
  return out;
}

/** Pair contexts for every unordered pair (A before B in the list order), reusable across conditions. */
export function pairContexts(elements: readonly string[]): PairContext[] {
  const contexts: PairContext[] = [];
  for (let i = 0; i < elements.length; i++) {
    for (let j = i + 1; j < elements.length; j++)
      contexts.push(pairContext(elements[i] as string, elements[j] as string));
  }
  return contexts;
}

/**
 * Ranks precomputed pairs (fast path; conditions are checked once). Every pair's equilibrium is solved
 * here; its full prediction record is assembled when a row's `prediction` is first read. Ties of score
 * are broken by the pair name (stable, repeatable order).
 */
export function rankContexts(
  contexts: readonly PairContext[],
  target: RankTarget,
  conditions: PredictionConditions,
): RankedPair[] {
  if (target.kind === 'core@shell' && target.shellElement !== undefined) getElement(target.shellElement, 'target');
  const checked = resolveConditions(conditions);
  const rows: RankedRow[] = new Array(contexts.length);
  for (let i = 0; i < contexts.length; i++) {
    const ctx = contexts[i] as PairContext;
    const core = predictCore(ctx, checked);
    const { enriched, enrichment: isothermEnrichment } = surfaceEnrichment(checked.xB, core.surfaceXB);
    // a partially wetting (Janus) particle exposes both elements: no shell to score
    const enrichment = core.spreadingJPerM2 !== null && core.spreadingJPerM2 < 0 ? 0 : isothermEnrichment;
    const enrichedElement = enriched === 'A' ? ctx.a.symbol : enriched === 'B' ? ctx.b.symbol : null;
    rows[i] = new RankedRow(
      scoreFromNumbers(target, enrichedElement, enrichment, core.unlikeNeighbourRatio),
      ctx.pairName,
      ctx,
      checked,
      core,
    );
  }
  rows.sort((p, q) => q.score - p.score || (p.pair < q.pair ? -1 : p.pair > q.pair ? 1 : 0));
  for (let i = 0; i < rows.length; i++) (rows[i] as RankedRow).rank = i + 1;
  return rows;
}

/** Scores every pair of `elements` (or all 30 metals) for `target` under `conditions`, best first. */
export function rankPairs(
  elements: readonly string[] | 'all',
  target: RankTarget | string,
  conditions: PredictionConditions,
): RankedPair[] {
  const list = checkElementList(elements);
  const parsed = typeof target === 'string' ? parseRankTarget(target) : target;
  if (parsed.kind === 'core@shell' && parsed.shellElement !== undefined && !list.includes(parsed.shellElement)) {
    throw invalid('target', `the shell element ${parsed.shellElement} is not among the elements to rank`);
  }
  return rankContexts(pairContexts(list), parsed, conditions);
}

/** Why a prediction does not meet the target, in the user's words (e.g. "Ag goes to the surface, not Pt"). */
export function missReason(target: RankTarget, p: Prediction): string {
  const predicted = `predicted ${p.architecture}`;
  if (target.kind === 'core@shell') {
    if (target.shellElement !== undefined && p.surfaceElement !== null && p.surfaceElement !== target.shellElement) {
      return `${p.surfaceElement} goes to the surface, not ${target.shellElement}`;
    }
    if (p.architectureKind === 'core@shell') return predicted;
    if (p.surfaceElement !== null)
      return `${predicted}: ${p.surfaceElement} enriched at the surface (E = ${p.enrichment.toFixed(2)}), no full shell`;
    return `${predicted}: no shell forms`;
  }
  if (target.kind === 'alloy') return `${predicted}: the elements do not stay mixed`;
  if (target.kind === 'Janus') return `${predicted}: not two exposed lobes`;
  return `${predicted}: no ordered compound`;
}

export interface MissedPair extends RankedPair {
  /** Why the pair does not meet the target. */
  readonly miss: string;
}

export interface TargetRanking {
  /** The pairs whose prediction meets the target, best score first, ranked 1..n. */
  meeting: RankedPair[];
  /** The other pairs, closest first (score, then the prediction's confidence), ranked after the meeting ones. */
  missing: MissedPair[];
}

/**
 * Splits a ranking into the pairs that meet the target and the rest: a ranking answers the question asked,
 * so the rest are shown only on request (or, when nothing meets the target, as the closest).
 */
export function splitByTarget(rows: readonly RankedPair[], target: RankTarget): TargetRanking {
  const meeting: RankedPair[] = [];
  const missed: Array<{ row: RankedPair; miss: string }> = [];
  for (const row of rows) {
    if (qualifiesFor(target, row.prediction)) meeting.push(row);
    else missed.push({ row, miss: missReason(target, row.prediction) });
  }
  meeting.forEach((row, i) => Object.assign(row, { rank: i + 1 }));
  // closest first: the higher score, then (for equal scores, often 0) the less certain miss
  missed.sort(
    (x, y) =>
      y.row.score - x.row.score ||
      x.row.prediction.confidence - y.row.prediction.confidence ||
      (x.row.pair < y.row.pair ? -1 : 1),
  );
  const missing = missed.map(({ row, miss }, i) => {
    Object.assign(row, { rank: meeting.length + i + 1 });
    return Object.assign(row, { miss }) as MissedPair;
  });
  return { meeting, missing };
}
