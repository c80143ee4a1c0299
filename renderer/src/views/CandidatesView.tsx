/**
 * Candidates: every pair of an element set scored for a target architecture, recomputed as the user
 * types (the model runs here, in the page; it is the same shared-model code the API runs). Sortable,
 * filterable table; ↑/↓ move through the rows, Enter (or a click) opens the pair detail with its isotherms,
 * scrolled into view. Starts from the current campaign's elements, its own pairs marked; every metal is one
 * click away. A large set (all 30 metals: 435 pairs) is recomputed after a pause in typing, not on each key.
 */
import { useEffect, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { DomainError } from '../../../shared-model/api/result';
import { METAL_SYMBOLS } from '../../../shared-model/elements/symbols';
import type { Prediction } from '../../../shared-model/prediction/predict';
import { describeRankTarget, rankPairs, splitByTarget, type RankTarget } from '../../../shared-model/prediction/rank';
import { useQuery } from '../api/hooks';
import { useAppState } from '../app-state';
import { Banner } from '../components/Banner';
import { Field } from '../components/Field';
import {
  ALL_METALS_TEXT,
  campaignElementsText,
  campaignPairNames,
  DEFAULT_ELEMENTS_TEXT,
  pairCountOf,
  recomputeDelayMs,
} from './candidates/candidates-scope';
import { PairDetail } from './PairDetail';
import { ConditionsBar, parseElementList, useConditions } from './prediction-conditions';

interface Row {
  rank: number;
  score: number;
  p: Prediction;
  /** Why the pair does not meet the target; null when it does. */
  miss: string | null;
}

type SortKey =
  | 'rank'
  | 'pair'
  | 'score'
  | 'architecture'
  | 'asMade'
  | 'confidence'
  | 'surface'
  | 'enrichment'
  | 'surfaceEnergy'
  | 'chemical'
  | 'elastic'
  | 'adsorbate'
  | 'mixing'
  | 'air';

const COLUMNS: Array<{ key: SortKey; label: string; numeric: boolean; value: (r: Row) => number | string }> = [
  { key: 'rank', label: '#', numeric: true, value: (r) => r.rank },
  { key: 'pair', label: 'pair', numeric: false, value: (r) => r.p.pair },
  { key: 'score', label: 'score', numeric: true, value: (r) => r.score },
  { key: 'architecture', label: 'predicted', numeric: false, value: (r) => r.p.architecture },
  { key: 'confidence', label: 'confidence', numeric: true, value: (r) => r.p.confidence },
  { key: 'surface', label: 'at surface', numeric: false, value: (r) => r.p.surfaceElement ?? '' },
  { key: 'enrichment', label: 'E', numeric: true, value: (r) => r.p.enrichment },
  { key: 'asMade', label: 'as made', numeric: false, value: (r) => r.p.verdicts.asMade },
  { key: 'surfaceEnergy', label: 'γ term, eV', numeric: true, value: (r) => r.p.terms.surfaceEnergy },
  { key: 'chemical', label: 'chemical, eV', numeric: true, value: (r) => r.p.terms.chemical },
  { key: 'elastic', label: 'elastic, eV', numeric: true, value: (r) => r.p.terms.elastic },
  { key: 'adsorbate', label: 'adsorbate, eV', numeric: true, value: (r) => r.p.terms.adsorbate },
  { key: 'mixing', label: 'ΔHmix, kJ/mol', numeric: true, value: (r) => r.p.mixingEnthalpyKjPerMol },
  { key: 'air', label: 'in air', numeric: false, value: (r) => airText(r) },
];

function airText(r: Row): string {
  return r.p.oxidation.oxidisingInAir.length === 0
    ? '—'
    : r.p.oxidation.oxidisingInAir.map((e) => `${e} oxide`).join(', ');
}

const TARGET_KINDS = ['alloy', 'core@shell any', 'core@shell with', 'Janus', 'intermetallic'] as const;
type TargetKind = (typeof TARGET_KINDS)[number];

function toTarget(kind: TargetKind, shell: string): RankTarget {
  switch (kind) {
    case 'alloy':
      return { kind: 'alloy' };
    case 'core@shell any':
      return { kind: 'core@shell' };
    case 'core@shell with':
      return { kind: 'core@shell', shellElement: shell };
    case 'Janus':
      return { kind: 'Janus' };
    case 'intermetallic':
      return { kind: 'intermetallic' };
  }
}

interface Ranking {
  meeting: Row[];
  missing: Row[];
  errors: Record<string, string>;
  target: string;
}

/** How many of the closest pairs are shown when none meets the target. */
const CLOSEST = 3;

const fmt = (x: number, digits = 2) => (x >= 0 ? '+' : '−') + Math.abs(x).toFixed(digits);

/** `value`, held back until it has not changed for `delayMs` (at once when `delayMs` is 0). */
function useSettled<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    if (delayMs === 0) {
      setSettled(value);
      return;
    }
    const timer = window.setTimeout(() => setSettled(value), delayMs);
    return () => window.clearTimeout(timer);
  }, [value, delayMs]);
  return delayMs === 0 ? value : settled;
}

export function CandidatesView() {
  const conditionsState = useConditions();
  const { campaignId, revision } = useAppState();
  const campaign = useQuery(
    'campaigns.list',
    campaignId === null ? null : { includeArchived: true },
    `c-${campaignId}-${revision}`,
  );
  const campaignName = (campaign.data ?? []).find((c) => c.id === campaignId)?.name ?? null;
  const pairs = useQuery('pairs.list', campaignId === null ? null : { campaignId }, `p-${campaignId}-${revision}`);
  const campaignPairs = campaignId === null ? [] : (pairs.data ?? []);
  const ownElements = campaignElementsText(campaignPairs);
  const ownPairs = useMemo(() => campaignPairNames(campaignPairs), [campaignPairs]);
  const [elementsText, setElementsText] = useState(DEFAULT_ELEMENTS_TEXT);
  // the campaign's elements become the set whenever the campaign (or its list of elements) changes
  const started = useRef<string | null>(null);
  useEffect(() => {
    if (pairs.data === null && campaignId !== null) return;
    const key = `${campaignId}:${ownElements}`;
    if (started.current === key) return;
    started.current = key;
    if (ownElements.split(',').length >= 2) setElementsText(ownElements);
  }, [campaignId, ownElements, pairs.data]);
  const [targetKind, setTargetKind] = useState<TargetKind>('alloy');
  const [shell, setShell] = useState('Pt');
  const [filter, setFilter] = useState('');
  const [sort, setSort] = useState<{ key: SortKey; direction: 1 | -1 }>({ key: 'rank', direction: 1 });
  const [cursor, setCursor] = useState(0);
  const [open, setOpen] = useState<{ a: string; b: string } | null>(null);
  const [showRest, setShowRest] = useState(false);
  const detailRef = useRef<HTMLDivElement | null>(null);
  // the question as typed, recomputed at once for a small set, after a pause in typing for a large one
  const typed = useMemo(
    () => ({ conditions: conditionsState.conditions, elementsText, targetKind, shell }),
    [conditionsState.conditions, elementsText, targetKind, shell],
  );
  const typedElements = parseElementList(elementsText);
  const settled = useSettled(typed, recomputeDelayMs(pairCountOf(typedElements)));
  const conditions = settled.conditions;
  const pending = settled !== typed;

  useEffect(() => {
    if (open) detailRef.current?.scrollIntoView({ block: 'start', behavior: 'auto' });
  }, [open]);

  const ranking = useMemo((): Ranking => {
    const none: Ranking = { meeting: [], missing: [], errors: {}, target: '' };
    if (conditions === null) return none;
    try {
      const target = toTarget(settled.targetKind, settled.shell);
      // the question asked: only the pairs that meet the target (as the API answers); the rest on request
      const ranked = rankPairs(parseElementList(settled.elementsText), target, conditions);
      const { meeting, missing } = splitByTarget(ranked, target);
      return {
        meeting: meeting.map((r) => ({ rank: r.rank, score: r.score, p: r.prediction, miss: null })),
        missing: missing.map((r) => ({ rank: r.rank, score: r.score, p: r.prediction, miss: r.miss })),
        errors: {},
        target: describeRankTarget(target),
      };
    } catch (error) {
      if (!(error instanceof DomainError)) throw error;
      const field = error.field === 'target' ? 'shell' : 'elements';
      return { ...none, errors: { [field]: error.message } };
    }
  }, [conditions, settled]);

  const noneMeets = ranking.target !== '' && ranking.meeting.length === 0;
  const shown = useMemo(
    () => [...ranking.meeting, ...(showRest ? ranking.missing : noneMeets ? ranking.missing.slice(0, CLOSEST) : [])],
    [ranking, showRest, noneMeets],
  );

  const visible = useMemo(() => {
    const needle = filter.trim().toLowerCase();
    const kept =
      needle === ''
        ? shown
        : shown.filter((r) =>
            `${r.p.pair} ${r.p.architecture} ${r.p.surfaceElement ?? ''}`.toLowerCase().includes(needle),
          );
    const column = COLUMNS.find((c) => c.key === sort.key) ?? COLUMNS[0];
    if (!column) return kept;
    return [...kept].sort((x, y) => {
      const a = column.value(x);
      const b = column.value(y);
      const order = typeof a === 'number' && typeof b === 'number' ? a - b : String(a).localeCompare(String(b));
      return sort.direction * order || x.rank - y.rank;
    });
  }, [shown, filter, sort]);

  const active = Math.min(cursor, Math.max(0, visible.length - 1));
  const onKey = (event: KeyboardEvent<HTMLDivElement>) => {
    if (event.key === 'ArrowDown') setCursor(Math.min(visible.length - 1, active + 1));
    else if (event.key === 'ArrowUp') setCursor(Math.max(0, active - 1));
    else if (event.key === 'Home') setCursor(0);
    else if (event.key === 'End') setCursor(Math.max(0, visible.length - 1));
    else if (event.key === 'Enter') {
      const row = visible[active];
      if (row) setOpen({ a: row.p.elementA, b: row.p.elementB });
    } else if (event.key === 'Escape') setOpen(null);
    else return;
    event.preventDefault();
  };
  const sortBy = (key: SortKey) =>
    setSort((current) => ({
      key,
      direction: current.key === key ? (current.direction === 1 ? -1 : 1) : key === 'rank' || key === 'pair' ? 1 : -1,
    }));

  return (
    <div className="stack" data-testid="candidates-view">
      <div className="view__header">
        <h1>Candidates</h1>
        <p className="muted">
          Which element goes to the surface of each pair, how much, and why — Miedema mixing, Wynblatt–Ku segregation
          terms and a Langmuir–McLean surface/core balance for a particle of this size. Recomputed as you type (for a
          large set, after a short pause).
        </p>
      </div>
      <p className="small" data-testid="candidates-scope">
        {elementsText.trim().toLowerCase() === ALL_METALS_TEXT ? (
          <>Every pair of all {METAL_SYMBOLS.length} metals. </>
        ) : campaignName !== null && ownElements !== '' && elementsText === ownElements ? (
          <>
            The elements of <strong>{campaignName}</strong> ({campaignPairs.length}{' '}
            {campaignPairs.length === 1 ? 'pair' : 'pairs'} of its own, marked “in campaign”).{' '}
          </>
        ) : campaignId === null ? (
          <>No campaign chosen: a default set of seven metals. </>
        ) : ownElements === '' ? (
          <>This campaign has no pairs yet: a default set of seven metals. </>
        ) : null}
        {elementsText.trim().toLowerCase() !== ALL_METALS_TEXT ? (
          <button type="button" className="button--quiet" onClick={() => setElementsText(ALL_METALS_TEXT)}>
            All {METAL_SYMBOLS.length} metals
          </button>
        ) : null}
        {ownElements !== '' && elementsText !== ownElements ? (
          <button type="button" className="button--quiet" onClick={() => setElementsText(ownElements)}>
            Back to the campaign&apos;s elements ({ownElements})
          </button>
        ) : null}
      </p>
      <div className="card">
        <div className="form-grid" role="group" aria-label="Pairs and target">
          <Field
            label="Elements"
            name="elements"
            error={ranking.errors.elements}
            hint={`symbols, or "all" (${METAL_SYMBOLS.length} metals)`}
            wide
          >
            <input
              name="elements"
              value={elementsText}
              onChange={(e) => setElementsText(e.target.value)}
              autoComplete="off"
            />
          </Field>
          <Field label="Target" name="target">
            <select name="target" value={targetKind} onChange={(e) => setTargetKind(e.target.value as TargetKind)}>
              {TARGET_KINDS.map((kind) => (
                <option key={kind} value={kind}>
                  {kind === 'core@shell with' ? 'core@shell with … in the shell' : kind}
                </option>
              ))}
            </select>
          </Field>
          {targetKind === 'core@shell with' ? (
            <Field label="Shell element" name="shell" error={ranking.errors.shell}>
              <input name="shell" value={shell} onChange={(e) => setShell(e.target.value.trim())} autoComplete="off" />
            </Field>
          ) : null}
          <Field label="Filter" name="filter" hint="pair, element or label">
            <input name="filter" value={filter} onChange={(e) => setFilter(e.target.value)} autoComplete="off" />
          </Field>
        </div>
        <ConditionsBar state={conditionsState} />
      </div>
      {conditions === null ? <Banner tone="error">Fix the highlighted condition to see the ranking.</Banner> : null}
      <div className="card">
        <h2 className="card__title">
          {ranking.target ? `Best for ${ranking.target}` : 'Ranking'}{' '}
          <span className="muted small" data-testid="ranking-count">
            ({ranking.meeting.length} of {ranking.meeting.length + ranking.missing.length} pairs meet the target;{' '}
            {visible.length} shown; ↑/↓ to move, Enter to open)
          </span>
          {pending ? (
            <span className="muted small" data-testid="ranking-pending">
              {' '}
              recomputing when you pause…
            </span>
          ) : null}
        </h2>
        {noneMeets ? (
          <Banner tone="info">
            No pair of these elements meets {ranking.target} under these conditions;{' '}
            {showRest ? 'all pairs' : `the closest ${Math.min(CLOSEST, ranking.missing.length)}`} are shown, each with
            why it misses.
          </Banner>
        ) : null}
        {ranking.missing.length > 0 ? (
          <p>
            <button
              type="button"
              className="button--quiet"
              aria-pressed={showRest}
              onClick={() => setShowRest((v) => !v)}
            >
              {showRest
                ? 'Hide the pairs that miss the target'
                : `Show the rest (${ranking.missing.length} pairs that miss the target)`}
            </button>
          </p>
        ) : null}
        <div
          style={{ maxHeight: 480, overflow: 'auto' }}
          tabIndex={0}
          onKeyDown={onKey}
          role="region"
          aria-label="Ranked pairs, use arrow keys"
          data-testid="ranking-region"
        >
          <table className="data-table" aria-label="Ranked candidates" aria-rowcount={visible.length}>
            <thead>
              <tr>
                {COLUMNS.map((c) => (
                  <th
                    key={c.key}
                    scope="col"
                    aria-sort={sort.key === c.key ? (sort.direction === 1 ? 'ascending' : 'descending') : 'none'}
                  >
                    <button type="button" className="button--quiet" onClick={() => sortBy(c.key)}>
                      {c.label}
                      {sort.key === c.key ? (sort.direction === 1 ? ' ▲' : ' ▼') : ''}
                    </button>
                  </th>
                ))}
                <th scope="col">meets the target?</th>
                <th scope="col">why</th>
              </tr>
            </thead>
            <tbody>
              {visible.map((row, index) => (
                <tr
                  key={row.p.pair}
                  aria-selected={index === active}
                  style={
                    index === active
                      ? { background: 'rgba(59, 130, 246, 0.14)', cursor: 'pointer' }
                      : { cursor: 'pointer' }
                  }
                  data-pair={row.p.pair}
                  data-meets={row.miss === null ? 'yes' : 'no'}
                  className={row.miss === null ? undefined : 'muted'}
                  onClick={() => {
                    setCursor(index);
                    setOpen({ a: row.p.elementA, b: row.p.elementB });
                  }}
                >
                  <td>{row.rank}</td>
                  <th scope="row" className="pair-symbol">
                    {row.p.pair}
                    {ownPairs.has(row.p.pair) ? (
                      <span className="tag" data-testid="in-campaign" style={{ marginLeft: 6 }}>
                        in campaign
                      </span>
                    ) : null}
                  </th>
                  <td>{row.score.toFixed(3)}</td>
                  <td>{row.p.architecture}</td>
                  <td>
                    {row.p.confidence.toFixed(2)}
                    {row.p.certainty.uncertain ? <span className="small muted"> uncertain</span> : null}
                  </td>
                  <td>{row.p.surfaceElement ?? '—'}</td>
                  <td>{row.p.enrichment.toFixed(2)}</td>
                  <td>{row.p.verdicts.asMade}</td>
                  <td>{fmt(row.p.terms.surfaceEnergy)}</td>
                  <td>{fmt(row.p.terms.chemical)}</td>
                  <td>{fmt(row.p.terms.elastic)}</td>
                  <td>{fmt(row.p.terms.adsorbate)}</td>
                  <td>{fmt(row.p.mixingEnthalpyKjPerMol, 1)}</td>
                  <td>{airText(row)}</td>
                  <td className="small" data-testid="meets" style={{ minWidth: 150 }}>
                    {row.miss === null ? 'yes' : `no: ${row.miss}`}
                  </td>
                  {/* Wide enough to read as lines, not a word a line (which made each row ~500 px tall). */}
                  <td className="notes-cell small" style={{ minWidth: 480 }}>
                    {row.p.reason}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </div>
      <div ref={detailRef} style={{ scrollMarginTop: 8 }} data-testid="pair-detail-anchor">
        {open && conditions ? (
          <PairDetail elementA={open.a} elementB={open.b} conditions={conditions} onClose={() => setOpen(null)} />
        ) : null}
      </div>
    </div>
  );
}
