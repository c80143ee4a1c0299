/**
 * Monte Carlo runs in the physics prior. A candidate of the prior (pair, xB, diameter, temperature) that a
 * finished Monte Carlo run of the campaign matches takes its pseudo-outcome label from the run's classified
 * architecture (the shared classifier of architecture/classify.ts, Janus rule included, as the run stored
 * it) instead of the analytic prediction; the other candidates keep the analytic label.
 *
 * Matching rule (MONTE_CARLO_MATCH): the same two elements in either order (compared in canonical roles);
 * the run's composition within 0.05 of the candidate's xB (the tolerance of `sameCondition`; a screen at
 * 25/50/75 at.% labels the grid's 20/50/80 %); the same diameter (within 0.05 nm: the value as typed, to
 * rounding); the run's temperature within 100 K of the candidate's (the route's usual temperature; the
 * route itself does not enter: a swap Monte Carlo finds the equilibrium arrangement whatever the flask).
 * Among several matching runs: the nearest composition, then the nearest temperature, then the newest run.
 * A matched candidate whose Monte Carlo class is not a class of the model (for example a "Janus" run while
 * no outcome was Janus) gives no pseudo-outcome, as an analytic call outside the classes gives none.
 */
import { classOfLabel, type ClassKey } from './classes';
import { canonicalPair, type CanonicalCondition } from './conditions';
import type { PseudoOutcome } from './outcome-model';
import type { PhysicsCall } from './physics';

/** A finished Monte Carlo run as the prior reads it (the architecture as the run's classifier stored it). */
export interface MonteCarloLabel {
  runId: number;
  elementA: string;
  elementB: string;
  /** Atomic fraction of elementB. */
  xB: number;
  diameterNm: number;
  temperatureK: number;
  architecture: string;
  /** ISO time the run was queued (newest wins among equals). */
  createdAt: string;
}

export const MONTE_CARLO_MATCH = { xBTolerance: 0.05, diameterToleranceNm: 0.05, temperatureToleranceK: 100 };

export const MONTE_CARLO_MATCH_TEXT =
  'same pair, nearest composition within 0.05 in xB, same diameter (within 0.05 nm), temperature within 100 K';

const EPS = 1e-9;

interface CanonicalRun {
  run: MonteCarloLabel;
  xB: number;
  classKey: ClassKey | null;
}

/** Runs grouped by canonical pair "A-B", with xB in canonical roles and the class of the run's label. */
export type MonteCarloIndex = ReadonlyMap<string, readonly CanonicalRun[]>;

export function indexMonteCarloRuns(runs: readonly MonteCarloLabel[]): MonteCarloIndex {
  const index = new Map<string, CanonicalRun[]>();
  for (const run of runs) {
    const { a, b, swapped } = canonicalPair(run.elementA, run.elementB);
    const key = `${a}-${b}`;
    const list = index.get(key) ?? [];
    list.push({ run, xB: swapped ? 1 - run.xB : run.xB, classKey: classOfLabel(run.architecture, a, b) });
    index.set(key, list);
  }
  return index;
}

function better(a: CanonicalRun, b: CanonicalRun, c: CanonicalCondition): boolean {
  const dx = Math.abs(a.xB - c.xB) - Math.abs(b.xB - c.xB);
  if (Math.abs(dx) > EPS) return dx < 0;
  const dt = Math.abs(a.run.temperatureK - c.temperatureK) - Math.abs(b.run.temperatureK - c.temperatureK);
  if (Math.abs(dt) > EPS) return dt < 0;
  if (a.run.createdAt !== b.run.createdAt) return a.run.createdAt > b.run.createdAt;
  return a.run.runId > b.run.runId;
}

/** The run that labels a candidate under MONTE_CARLO_MATCH, or null. */
export function matchMonteCarloRun(
  condition: CanonicalCondition,
  runs: readonly MonteCarloLabel[] | MonteCarloIndex,
): { run: MonteCarloLabel; classKey: ClassKey | null } | null {
  const index = Array.isArray(runs) ? indexMonteCarloRuns(runs) : (runs as MonteCarloIndex);
  let best: CanonicalRun | null = null;
  for (const r of index.get(condition.pair) ?? []) {
    if (Math.abs(r.xB - condition.xB) > MONTE_CARLO_MATCH.xBTolerance + EPS) continue;
    if (Math.abs(r.run.diameterNm - condition.diameterNm) > MONTE_CARLO_MATCH.diameterToleranceNm + EPS) continue;
    if (Math.abs(r.run.temperatureK - condition.temperatureK) > MONTE_CARLO_MATCH.temperatureToleranceK + EPS) continue;
    if (best === null || better(r, best, condition)) best = r;
  }
  return best ? { run: best.run, classKey: best.classKey } : null;
}

/** A candidate where the Monte Carlo run and the analytic prediction give different classes. */
export interface PriorDisagreement {
  pair: string;
  xB: number;
  diameterNm: number;
  temperatureK: number;
  runId: number;
  monteCarlo: string;
  analytic: string;
}

/** Which source labelled the prior's pseudo-outcomes. */
export interface PriorSources {
  pseudoOutcomes: number;
  fromMonteCarlo: number;
  fromAnalytic: number;
  /** Candidates a run matched but whose Monte Carlo class is not a model class (no pseudo-outcome). */
  monteCarloOutsideClasses: number;
  /** Ids of the runs that labelled at least one pseudo-outcome, ascending. */
  runIds: number[];
  /** Runs offered to the prior (finished runs of the campaign with a diameter). */
  runsAvailable: number;
  /** Matched candidates where the run's class differs from the analytic class. */
  disagreements: number;
  /** The first few of those (candidate order). */
  disagreementExamples: PriorDisagreement[];
  matchRule: string;
}

const EXAMPLES = 10;

/**
 * Pseudo-outcomes of the physics prior: per candidate the Monte Carlo class where a run matches, the
 * analytic class otherwise; kept when the class is one of the model's. With no runs this is exactly
 * `physicsPseudoOutcomes` of outcome-model.ts.
 */
export function priorPseudoOutcomes(
  candidates: readonly { condition: CanonicalCondition; features: number[]; physics: PhysicsCall }[],
  classes: readonly ClassKey[],
  runs: readonly MonteCarloLabel[],
): { pseudo: PseudoOutcome[]; sources: PriorSources } {
  const index = indexMonteCarloRuns(runs);
  const pseudo: PseudoOutcome[] = [];
  const used = new Set<number>();
  const examples: PriorDisagreement[] = [];
  let fromMonteCarlo = 0;
  let outside = 0;
  let disagreements = 0;
  for (const c of candidates) {
    const match = index.size > 0 ? matchMonteCarloRun(c.condition, index) : null;
    if (match) {
      if (match.classKey !== c.physics.classKey) {
        disagreements++;
        if (examples.length < EXAMPLES)
          examples.push({
            pair: c.condition.pair,
            xB: c.condition.xB,
            diameterNm: c.condition.diameterNm,
            temperatureK: c.condition.temperatureK,
            runId: match.run.runId,
            monteCarlo: match.run.architecture,
            analytic: c.physics.label,
          });
      }
      if (match.classKey && classes.includes(match.classKey)) {
        pseudo.push({ features: c.features, classKey: match.classKey });
        fromMonteCarlo++;
        used.add(match.run.runId);
      } else outside++;
      continue;
    }
    if (c.physics.classKey && classes.includes(c.physics.classKey))
      pseudo.push({ features: c.features, classKey: c.physics.classKey });
  }
  return {
    pseudo,
    sources: {
      pseudoOutcomes: pseudo.length,
      fromMonteCarlo,
      fromAnalytic: pseudo.length - fromMonteCarlo,
      monteCarloOutsideClasses: outside,
      runIds: [...used].sort((a, b) => a - b),
      runsAvailable: runs.length,
      disagreements,
      disagreementExamples: examples,
      matchRule: MONTE_CARLO_MATCH_TEXT,
    },
  };
}

const count = (n: number) => n.toLocaleString('en-US');

/** "prior: 3,000 pseudo-outcomes, 90 from Monte Carlo screen runs, the rest from the analytic prediction". */
export function priorSourcesText(s: PriorSources): string {
  const head = `prior: ${count(s.pseudoOutcomes)} pseudo-outcome${s.pseudoOutcomes === 1 ? '' : 's'}`;
  if (s.fromMonteCarlo === 0) {
    const why =
      s.runsAvailable === 0
        ? 'no finished Monte Carlo run of the campaign'
        : `none of the campaign's ${count(s.runsAvailable)} finished Monte Carlo runs matches a candidate ` +
          `(${s.matchRule})`;
    return `${head}, all from the analytic prediction (${why})`;
  }
  const rest = s.fromAnalytic === 0 ? 'none' : 'the rest';
  const runs = `${count(s.runIds.length)} run${s.runIds.length === 1 ? '' : 's'}`;
  const disagree =
    s.disagreements > 0
      ? `; Monte Carlo and the analytic prediction disagree at ${count(s.disagreements)} of the ` +
        `${count(s.fromMonteCarlo + s.monteCarloOutsideClasses)} matched candidates`
      : '; Monte Carlo and the analytic prediction agree wherever both label a candidate';
  const outside =
    s.monteCarloOutsideClasses > 0
      ? `; ${count(s.monteCarloOutsideClasses)} matched candidates left out (their Monte Carlo architecture is ` +
        'not a class of the model)'
      : '';
  return (
    `${head}, ${count(s.fromMonteCarlo)} from Monte Carlo screen runs (${runs}), ${rest} from the analytic ` +
    `prediction${disagree}${outside}`
  );
}

/**
 * Candidates whose physics call comes from a matching Monte Carlo run (MONTE_CARLO_MATCH), for proposals: the
 * class is the run's, the label names the run and, where they differ, the analytic call ("Ni@Pt by Monte Carlo
 * run 12 (analytic: surface-enriched alloy)"), so a reason's "physics predicts …" and the exploration rule
 * "physics and model disagree" read the run. The confidence stays the analytic one (a run gives none).
 * A run whose architecture is not a class (unknown) leaves the analytic call.
 */
export function withMonteCarloPhysics<C extends { condition: CanonicalCondition; physics: PhysicsCall }>(
  candidates: readonly C[],
  runs: readonly MonteCarloLabel[],
): C[] {
  if (runs.length === 0) return [...candidates];
  const index = indexMonteCarloRuns(runs);
  return candidates.map((c) => {
    const match = matchMonteCarloRun(c.condition, index);
    if (!match || match.classKey === null) return c;
    const run = `Monte Carlo run ${match.run.runId}`;
    const label =
      match.classKey === c.physics.classKey
        ? `${match.run.architecture} (analytic and ${run})`
        : `${match.run.architecture} by ${run} (analytic: ${c.physics.label})`;
    return { ...c, physics: { classKey: match.classKey, label, confidence: c.physics.confidence } };
  });
}
