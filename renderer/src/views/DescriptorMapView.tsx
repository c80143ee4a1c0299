/**
 * Descriptor map: every pair of an element set placed by two chosen descriptors, coloured by its
 * predicted architecture (legend in words). Computed in the page with the shared model, so it follows
 * the conditions as they are typed. Clicking a point opens the pair detail. The current campaign's
 * logged outcomes (batches with an observed architecture) are drawn on top of their pair's point as
 * square outlines coloured by the OBSERVED architecture, one square per batch.
 */
import { useMemo, useState } from 'react';
import {
  CartesianGrid,
  ResponsiveContainer,
  Scatter,
  ScatterChart,
  Tooltip,
  usePlotArea,
  useXAxisScale,
  useYAxisScale,
  XAxis,
  YAxis,
  ZAxis,
} from 'recharts';
import { DomainError } from '../../../shared-model/api/result';
import type { OutcomeRow } from '../../../shared-model/api/outcomes';
import {
  describeArchitecture,
  parseArchitecture,
  type ArchitectureKind,
} from '../../../shared-model/architecture/labels';
import {
  DESCRIPTOR_KEYS,
  DESCRIPTOR_LABELS,
  relativeDifference,
  type DescriptorKey,
} from '../../../shared-model/prediction/descriptors';
import { recordProperty } from '../../../shared-model/elements/element-table';
import { predictWithContext } from '../../../shared-model/prediction/predict';
import { checkElementList, pairContexts } from '../../../shared-model/prediction/rank';
import { useQuery } from '../api/hooks';
import { niceTicks } from '../charts/chart-numbers';
import { chartLegend, type LegendEntry } from '../charts/ChartLegend';
import { placeLabels } from '../charts/label-placement';
import { architectureColour } from '../charts/palette';
import { useAppState } from '../app-state';
import { Banner } from '../components/Banner';
import { Field } from '../components/Field';
import { PairDetail } from './PairDetail';
import { ConditionsBar, parseElementList, useConditions } from './prediction-conditions';

type AxisKey = DescriptorKey | 'segregationBinA' | 'segregationAinB' | 'enrichment' | 'unlikeNeighbourRatio';

const SHORT: Record<DescriptorKey, string> = {
  cohesiveEnergy: 'Δ cohesive energy (rel.)',
  metallicRadius: 'Δ metallic radius (rel.)',
  surfaceEnergy: 'Δ surface energy (rel.)',
  electronegativity: 'Δ electronegativity (rel.)',
  bulkModulus: 'Δ bulk modulus (rel.)',
  shearModulus: 'Δ shear modulus (rel.)',
  latticeConstant: 'Δ lattice constant (rel.)',
  mixingEnthalpyKjPerMol: 'ΔHmix, kJ/mol',
  mixingChemicalKjPerMol: 'ΔHmix chemical, kJ/mol',
  mixingElasticKjPerMol: 'ΔHmix elastic, kJ/mol',
};

const AXES: Array<{ key: AxisKey; short: string; label: string }> = [
  ...DESCRIPTOR_KEYS.map((key) => ({ key: key as AxisKey, short: SHORT[key], label: DESCRIPTOR_LABELS[key] })),
  {
    key: 'segregationBinA',
    short: 'ΔH_seg B in A, eV',
    label: 'segregation enthalpy of dilute B at the surface of A, eV',
  },
  {
    key: 'segregationAinB',
    short: 'ΔH_seg A in B, eV',
    label: 'segregation enthalpy of dilute A at the surface of B, eV',
  },
  { key: 'enrichment', short: 'surface enrichment E', label: 'predicted surface enrichment E' },
  { key: 'unlikeNeighbourRatio', short: 'unlike neighbours / random', label: 'unlike neighbours relative to random' },
];

/** At most this many pair names are written on the map; the rest show on hover. */
const MAX_LABELS = 40;
/** Above this many points only the campaign's logged pairs are candidates for a written name. */
const LABEL_ALL_UP_TO = 60;

const LABEL_STYLE = { fontSize: 11, fill: '#1f2937', stroke: '#ffffff', strokeWidth: 3, paintOrder: 'stroke' } as const;

/**
 * Pair names beside their points, placed so that no two overlap and none covers a marker
 * (renderer/src/charts/label-placement.ts); the hovered pair's name is always written, on top.
 */
function PairLabels(props: {
  labelled: Point[];
  all: Point[];
  hovered: Point | null;
  /** Half-size of the outermost outcome square round a pair's point, px. */
  outlines: Map<string, number>;
}) {
  const xScale = useXAxisScale();
  const yScale = useYAxisScale();
  const area = usePlotArea();
  if (!xScale || !yScale || !area) return null;
  const px = (p: Point) => ({
    x: xScale(p.x) ?? NaN,
    y: yScale(p.y) ?? NaN,
    text: p.pair,
    radius: props.outlines.get(p.pair),
  });
  const bounds = { left: area.x, top: area.y, width: area.width, height: area.height };
  const labelled = new Set(props.labelled);
  const placed = placeLabels(props.labelled.map(px), {
    bounds,
    obstacles: props.all.filter((p) => !labelled.has(p)).map(px),
    maxLabels: MAX_LABELS,
  });
  const hover = props.hovered ? placeLabels([px(props.hovered)], { bounds })[0] : undefined;
  return (
    <g data-testid="pair-labels" pointerEvents="none">
      {placed.map((label) => (
        <text
          key={label.text}
          x={label.textX}
          y={label.textY}
          textAnchor="middle"
          dominantBaseline="central"
          data-label-box={`${label.box.left.toFixed(1)} ${label.box.top.toFixed(1)} ${label.box.width.toFixed(1)} ${label.box.height.toFixed(1)}`}
          {...LABEL_STYLE}
        >
          {label.text}
        </text>
      ))}
      {hover ? (
        <text
          x={hover.textX}
          y={hover.textY}
          textAnchor="middle"
          dominantBaseline="central"
          data-testid="hovered-label"
          fontWeight={600}
          {...LABEL_STYLE}
        >
          {hover.text}
        </text>
      ) : null}
    </g>
  );
}

interface Point {
  x: number;
  y: number;
  pair: string;
  elementA: string;
  elementB: string;
  label: string;
  kind: ArchitectureKind;
}

/** A batch of the campaign with an observed architecture, placed at its pair's point on the map. */
interface OutcomePoint {
  x: number;
  y: number;
  outcome: true;
  batchName: string;
  pair: string;
  elementA: string;
  elementB: string;
  observed: string;
  observedKind: ArchitectureKind;
  predicted: string | null;
  /** 0 for the first batch of a pair, 1 for the second …: nested squares stay visible. */
  stack: number;
}

/** Square outline drawn around a pair's point; larger for each further batch of the same pair. */
function OutcomeSquare(props: { cx?: number; cy?: number; payload?: OutcomePoint }) {
  const { cx, cy, payload } = props;
  if (cx === undefined || cy === undefined || !payload) return null;
  const half = 8 + 4 * payload.stack;
  return (
    <rect
      x={cx - half}
      y={cy - half}
      width={2 * half}
      height={2 * half}
      fill="none"
      stroke={architectureColour(payload.observedKind)}
      strokeWidth={2.5}
      data-testid="outcome-marker"
      data-batch={payload.batchName}
    />
  );
}

const pairKey = (a: string, b: string) => (a < b ? `${a}|${b}` : `${b}|${a}`);

const RELATIVE_PROPERTIES = {
  cohesiveEnergy: 'cohesiveEnergyEv',
  metallicRadius: 'metallicRadiusAngstrom',
  surfaceEnergy: 'surfaceEnergyJPerM2',
  electronegativity: 'electronegativityPauling',
  bulkModulus: 'bulkModulusGpa',
  shearModulus: 'shearModulusGpa',
  latticeConstant: 'fccEquivalentLatticeAngstrom',
} as const;

export function DescriptorMapView() {
  const conditionsState = useConditions();
  const [elementsText, setElementsText] = useState('all');
  const [xKey, setXKey] = useState<AxisKey>('surfaceEnergy');
  const [yKey, setYKey] = useState<AxisKey>('metallicRadius');
  const [open, setOpen] = useState<{ a: string; b: string } | null>(null);
  const [hovered, setHovered] = useState<Point | null>(null);
  const conditions = conditionsState.conditions;
  const { campaignId, revision } = useAppState();
  const outcomeRows = useQuery(
    'outcomes.listByCampaign',
    campaignId === null ? null : { campaignId },
    `map-outcomes-${campaignId}-${revision}`,
  );

  const result = useMemo((): { points: Point[]; error: string | null } => {
    if (conditions === null) return { points: [], error: null };
    try {
      const contexts = pairContexts(checkElementList(parseElementList(elementsText)));
      const points = contexts.map((ctx): Point => {
        const p = predictWithContext(ctx, conditions);
        const value = (key: AxisKey): number => {
          switch (key) {
            case 'mixingEnthalpyKjPerMol':
              return p.mixingEnthalpyKjPerMol;
            case 'mixingChemicalKjPerMol':
              return p.mixingChemicalKjPerMol;
            case 'mixingElasticKjPerMol':
              return p.mixingElasticKjPerMol;
            case 'segregationBinA':
              return p.segregation.bInA.total;
            case 'segregationAinB':
              return p.segregation.aInB.total;
            case 'enrichment':
              return p.enrichment;
            case 'unlikeNeighbourRatio':
              return p.unlikeNeighbourRatio;
            default: {
              const property = RELATIVE_PROPERTIES[key];
              return relativeDifference(recordProperty(ctx.a, property), recordProperty(ctx.b, property));
            }
          }
        };
        return {
          x: value(xKey),
          y: value(yKey),
          pair: p.pair,
          elementA: p.elementA,
          elementB: p.elementB,
          label: p.architecture,
          kind: p.architectureKind,
        };
      });
      return { points, error: null };
    } catch (error) {
      if (!(error instanceof DomainError)) throw error;
      return { points: [], error: error.message };
    }
  }, [conditions, elementsText, xKey, yKey]);

  const groups = useMemo(() => {
    const byKind = new Map<ArchitectureKind, Point[]>();
    for (const point of result.points) {
      const list = byKind.get(point.kind) ?? [];
      list.push(point);
      byKind.set(point.kind, list);
    }
    return [...byKind.entries()];
  }, [result.points]);

  const overlay = useMemo(() => {
    const logged = (outcomeRows.data ?? []).filter(
      (row): row is OutcomeRow & { observed: string } => row.observed !== null,
    );
    const onMap = new Map(result.points.map((point) => [pairKey(point.elementA, point.elementB), point]));
    const stacks = new Map<string, number>();
    const points: OutcomePoint[] = [];
    const offMap: string[] = [];
    for (const row of logged) {
      const key = pairKey(row.elementA, row.elementB);
      const point = onMap.get(key);
      if (!point) {
        offMap.push(`${row.batchName} (${row.elementA}-${row.elementB})`);
        continue;
      }
      const stack = stacks.get(key) ?? 0;
      stacks.set(key, stack + 1);
      const observedKind = parseArchitecture(row.observed)?.kind ?? 'other';
      points.push({
        x: point.x,
        y: point.y,
        outcome: true,
        batchName: row.batchName,
        pair: point.pair,
        elementA: point.elementA,
        elementB: point.elementB,
        observed: row.observed,
        observedKind,
        predicted: row.predicted,
        stack,
      });
    }
    const byKind = new Map<ArchitectureKind, OutcomePoint[]>();
    for (const point of points) byKind.set(point.observedKind, [...(byKind.get(point.observedKind) ?? []), point]);
    return { logged: logged.length, groups: [...byKind.entries()], offMap };
  }, [outcomeRows.data, result.points]);

  // round ticks on both axes, the domain from the first to the last tick
  const ticks = useMemo(() => {
    const xs = result.points.map((p) => p.x).filter(Number.isFinite);
    const ys = result.points.map((p) => p.y).filter(Number.isFinite);
    const of = (values: number[]) => (values.length > 0 ? niceTicks(Math.min(...values), Math.max(...values), 7) : []);
    return { x: of(xs), y: of(ys) };
  }, [result.points]);
  const domainOf = (t: number[]): [number, number] | ['auto', 'auto'] =>
    t.length > 1 ? [t[0] as number, t[t.length - 1] as number] : ['auto', 'auto'];

  // the outcome squares (OutcomeSquare: half 8 + 4 per further batch, 2.5 px stroke) keep names clear of them
  const outlines = useMemo(() => {
    const map = new Map<string, number>();
    for (const [, points] of overlay.groups)
      for (const p of points) map.set(p.pair, Math.max(map.get(p.pair) ?? 0, 8 + 4 * p.stack + 2));
    return map;
  }, [overlay.groups]);

  // names written on the map: the campaign's logged pairs first, then (on a small map) every other pair
  const labelled = useMemo(() => {
    const logged = new Set(overlay.groups.flatMap(([, points]) => points.map((p) => p.pair)));
    const first = result.points.filter((p) => logged.has(p.pair));
    const rest = result.points.length <= LABEL_ALL_UP_TO ? result.points.filter((p) => !logged.has(p.pair)) : [];
    return [...first, ...rest];
  }, [overlay.groups, result.points]);

  const axisLabel = (key: AxisKey) => AXES.find((a) => a.key === key)?.label ?? key;
  const legendWords = (kind: ArchitectureKind, count: number) =>
    `${kind === 'core@shell' ? 'core@shell (one element covers the other)' : `${kind}: ${describeArchitecture(kind)}`} — ${count}`;

  return (
    <div className="stack" data-testid="descriptor-map-view">
      <div className="view__header">
        <h1>Descriptor map</h1>
        <p className="muted">
          Pairs placed by two descriptors (B relative to A for element properties), coloured by the predicted
          architecture at the conditions below.
        </p>
      </div>
      <div className="card">
        <div className="form-grid" role="group" aria-label="Map axes">
          <Field label="Elements" name="elements" error={result.error ?? undefined} hint='symbols, or "all"' wide>
            <input
              name="elements"
              value={elementsText}
              onChange={(e) => setElementsText(e.target.value)}
              autoComplete="off"
            />
          </Field>
          <Field label="x axis" name="xAxis">
            <select name="xAxis" value={xKey} onChange={(e) => setXKey(e.target.value as AxisKey)}>
              {AXES.map((a) => (
                <option key={a.key} value={a.key} title={a.label}>
                  {a.short}
                </option>
              ))}
            </select>
          </Field>
          <Field label="y axis" name="yAxis">
            <select name="yAxis" value={yKey} onChange={(e) => setYKey(e.target.value as AxisKey)}>
              {AXES.map((a) => (
                <option key={a.key} value={a.key} title={a.label}>
                  {a.short}
                </option>
              ))}
            </select>
          </Field>
        </div>
        <ConditionsBar state={conditionsState} />
      </div>
      {conditions === null ? <Banner tone="error">Fix the highlighted condition to see the map.</Banner> : null}
      <div className="card" data-testid="descriptor-chart">
        <h2 className="card__title">
          {result.points.length} pairs{' '}
          <span className="muted small">
            (names written where they fit without overlapping; hover a point for its name, click it for its detail)
          </span>
        </h2>
        <ResponsiveContainer width="100%" height={460}>
          <ScatterChart margin={{ left: 24, right: 24, top: 16, bottom: 32 }}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis
              dataKey="x"
              type="number"
              name={axisLabel(xKey)}
              label={{ value: axisLabel(xKey), position: 'insideBottom', offset: -16 }}
              domain={domainOf(ticks.x)}
              ticks={ticks.x.length > 1 ? ticks.x : undefined}
              tickFormatter={(v: number) => Number(v.toPrecision(3)).toString()}
            />
            <YAxis
              dataKey="y"
              type="number"
              name={axisLabel(yKey)}
              width={72}
              label={{ value: axisLabel(yKey), angle: -90, position: 'insideLeft', style: { textAnchor: 'middle' } }}
              domain={domainOf(ticks.y)}
              ticks={ticks.y.length > 1 ? ticks.y : undefined}
              tickFormatter={(v: number) => Number(v.toPrecision(3)).toString()}
            />
            <ZAxis range={[50, 50]} />
            <Tooltip
              cursor={{ strokeDasharray: '3 3' }}
              content={({ payload }) => {
                const point = payload?.[0]?.payload as Point | OutcomePoint | undefined;
                if (!point) return null;
                if ('outcome' in point) {
                  return (
                    <div className="card small" data-testid="outcome-tooltip">
                      <strong>batch {point.batchName}</strong> ({point.pair})
                      <br />
                      observed {point.observed}, predicted at planning {point.predicted ?? '(none recorded)'}
                      <br />
                      map prediction at these conditions:{' '}
                      {result.points.find((p) => p.pair === point.pair)?.label ?? '–'}
                    </div>
                  );
                }
                return (
                  <div className="card small">
                    <strong>{point.pair}</strong>: {point.label}
                    <br />x = {point.x.toPrecision(3)}, y = {point.y.toPrecision(3)}
                  </div>
                );
              }}
            />
            {chartLegend([
              ...groups.map(([kind, points]): LegendEntry => ({
                label: legendWords(kind, points.length),
                colour: architectureColour(kind),
                marker: 'dot',
              })),
              ...overlay.groups.map(([kind, points]): LegendEntry => ({
                label: `logged outcome: observed ${kind} — ${points.length}`,
                colour: architectureColour(kind),
                marker: 'square',
              })),
            ])}
            {groups.map(([kind, points]) => (
              <Scatter
                key={kind}
                name={legendWords(kind, points.length)}
                data={points}
                fill={architectureColour(kind)}
                isAnimationActive={false}
                onClick={(data: unknown) => {
                  const point = (data as { payload?: Point }).payload;
                  if (point) setOpen({ a: point.elementA, b: point.elementB });
                }}
                onMouseEnter={(data: unknown) => setHovered((data as { payload?: Point }).payload ?? null)}
                onMouseLeave={() => setHovered(null)}
              />
            ))}
            {overlay.groups.map(([kind, points]) => (
              <Scatter
                key={`outcome-${kind}`}
                name={`logged outcome: observed ${kind} — ${points.length}`}
                data={points}
                fill={architectureColour(kind)}
                legendType="square"
                shape={OutcomeSquare}
                isAnimationActive={false}
                onClick={(data: unknown) => {
                  const point = (data as { payload?: OutcomePoint }).payload;
                  if (point) setOpen({ a: point.elementA, b: point.elementB });
                }}
              />
            ))}
            <PairLabels labelled={labelled} all={result.points} hovered={hovered} outlines={outlines} />
          </ScatterChart>
        </ResponsiveContainer>
        <p className="small muted" data-testid="outcome-overlay-note">
          {campaignId === null
            ? 'No campaign chosen: choose one in Campaigns to see its logged outcomes here.'
            : outcomeRows.error
              ? `Logged outcomes could not be read: ${outcomeRows.error.message}`
              : overlay.logged === 0
                ? 'No logged outcomes in this campaign yet.'
                : `Squares: ${overlay.logged} logged outcome${overlay.logged === 1 ? '' : 's'} of this campaign, coloured by the observed architecture (dots keep the predicted colours); hover a square for batch, observed and predicted label.${
                    overlay.offMap.length > 0
                      ? ` Not on this map (pair outside the element set): ${overlay.offMap.join(', ')}.`
                      : ''
                  }`}
        </p>
      </div>
      {open && conditions ? (
        <PairDetail elementA={open.a} elementB={open.b} conditions={conditions} onClose={() => setOpen(null)} />
      ) : null}
    </div>
  );
}
