/**
 * Model review: how well the campaign's learned model predicts pairs it has not seen, beside physics alone
 * and the "always the most common class" baseline. Headline validation is leave-one-pair-out (every outcome
 * of a pair held out together); plain leave-one-out appears only as "known pairs, new conditions". Retrain
 * runs as a job (progress, cancel). With too few outcomes the view says what to log next and shows physics
 * only. The derivations are model-review/model-review-model.ts.
 */
import {
  Bar,
  BarChart,
  CartesianGrid,
  LabelList,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Scatter,
  ScatterChart,
  Tooltip,
  XAxis,
  YAxis,
  ZAxis,
} from 'recharts';
import type { ReviewView } from '../../../shared-model/api/learn';
import { priorSourcesText } from '../../../shared-model/learn/screen-prior';
import { useQuery } from '../api/hooks';
import { useAppState } from '../app-state';
import { Banner } from '../components/Banner';
import { chartLegend } from '../charts/ChartLegend';
import { DATA_STYLE, NEUTRAL, seriesColour } from '../charts/palette';
import { ChartCard } from './model-review/ChartCard';
import { ModelStatus } from './next-batches/ModelStatus';
import {
  figureText,
  headlineRows,
  knownPairsText,
  ldaAxisLabels,
  ldaGroups,
  loadingBars,
  percentText,
  PREDICTOR_COLOURS,
  PREDICTOR_LABELS,
  priorWeightText,
  recallRows,
  reliabilityPoints,
  roundTicks,
  timelineRows,
  verdictText,
} from './model-review/model-review-model';

type Ready = Extract<ReviewView, { status: 'ready' }>;
type TooFew = Extract<ReviewView, { status: 'too-few' }>;

const UNIT_TICKS = roundTicks(0, 1, 0.2);
const pctTick = (v: number) => `${Math.round(v * 100)} %`;
/** Width of a value axis: room for the ticks and, left of them, the rotated axis title. */
const Y_AXIS_WIDTH = 72;
/** A value axis's title, rotated, centred on the axis at its left edge (clear of the tick labels). */
const yLabel = (value: string) =>
  ({ value, angle: -90, position: 'insideLeft', style: { textAnchor: 'middle' } }) as const;
const sentence = (text: string) => `${text.charAt(0).toUpperCase()}${text.slice(1)}.`;

function HeadlineTable(props: { review: Ready }) {
  return (
    <table className="data-table" aria-label="Validation figures" data-testid="headline-table">
      <thead>
        <tr>
          <th>Predictor</th>
          <th>Accuracy</th>
          <th>Errors</th>
          <th>Balanced accuracy</th>
          <th title={`uniform guess: ln K = ${figureText(props.review.model.uniformLogLoss)}`}>Log-loss</th>
          <th title="multiclass: mean of Σ (p − observed)², 0 best, 2 worst">Brier score</th>
        </tr>
      </thead>
      <tbody>
        {headlineRows(props.review).map((r) => (
          <tr key={r.key} data-predictor={r.key}>
            <td>{r.label}</td>
            <td data-cell="accuracy">{r.accuracy}</td>
            <td data-cell="errors">{r.errors}</td>
            <td data-cell="balanced">{r.balancedAccuracy}</td>
            <td data-cell="logloss">{r.logLoss}</td>
            <td data-cell="brier">{r.brier}</td>
          </tr>
        ))}
        <tr className="muted">
          <td>Uniform guess (ln {props.review.classes.length})</td>
          <td />
          <td />
          <td />
          <td data-cell="uniform">{figureText(props.review.model.uniformLogLoss)}</td>
          <td />
        </tr>
      </tbody>
    </table>
  );
}

function RecallTable(props: { review: Ready }) {
  return (
    <table className="data-table" aria-label="Per-class recall">
      <thead>
        <tr>
          <th>Observed architecture</th>
          <th>Outcomes</th>
          <th>{PREDICTOR_LABELS.model}</th>
          <th>{PREDICTOR_LABELS.physics}</th>
          <th>{PREDICTOR_LABELS.majority}</th>
        </tr>
      </thead>
      <tbody>
        {recallRows(props.review).map((r) => (
          <tr key={r.label}>
            <td>{r.description}</td>
            <td>{r.support}</td>
            <td>{r.model}</td>
            <td>{r.physics}</td>
            <td>{r.majority}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function ReliabilityChart(props: { review: Ready }) {
  const model = reliabilityPoints(props.review.model);
  const physics = reliabilityPoints(props.review.physics);
  return (
    <div className="chart-box" data-testid="reliability-chart">
      <ResponsiveContainer width="100%" height="100%">
        <ScatterChart margin={{ top: 10, right: 20, bottom: 24, left: 10 }}>
          <CartesianGrid strokeDasharray="3 3" />
          <XAxis
            dataKey="confidence"
            type="number"
            domain={[0, 1]}
            ticks={UNIT_TICKS}
            tickFormatter={pctTick}
            name="stated probability"
            label={{ value: 'probability given to the top class', position: 'insideBottom', offset: -14 }}
          />
          <YAxis
            dataKey="observed"
            type="number"
            domain={[0, 1]}
            ticks={UNIT_TICKS}
            tickFormatter={pctTick}
            name="observed"
            width={Y_AXIS_WIDTH}
            label={yLabel('right (fraction)')}
          />
          <ZAxis dataKey="count" range={[30, 200]} name="outcomes" />
          <Tooltip formatter={(v) => (typeof v === 'number' ? Number(v.toFixed(3)) : String(v))} />
          {chartLegend(
            [
              { label: PREDICTOR_LABELS.model, colour: PREDICTOR_COLOURS.model, marker: 'line' },
              { label: PREDICTOR_LABELS.physics, colour: PREDICTOR_COLOURS.physics, marker: 'line' },
              { label: 'perfectly calibrated', colour: NEUTRAL.reference, marker: 'line', dash: '4 4', thin: true },
            ],
            'reliability-legend',
          )}
          <ReferenceLine
            segment={[
              { x: 0, y: 0 },
              { x: 1, y: 1 },
            ]}
            stroke={NEUTRAL.reference}
            strokeDasharray="4 4"
          />
          <Scatter
            name={PREDICTOR_LABELS.model}
            data={model}
            fill={PREDICTOR_COLOURS.model}
            line
            isAnimationActive={false}
          />
          <Scatter
            name={PREDICTOR_LABELS.physics}
            data={physics}
            fill={PREDICTOR_COLOURS.physics}
            line
            isAnimationActive={false}
          />
        </ScatterChart>
      </ResponsiveContainer>
    </div>
  );
}

function TimelineChart(props: { review: Ready }) {
  const rows = timelineRows(props.review);
  if (rows.length === 0)
    return <p className="muted small">No outcome has a date (made_on): the weekly timeline needs dated outcomes.</p>;
  return (
    <div className="chart-box" data-testid="timeline-chart">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={rows} margin={{ top: 10, right: 20, bottom: 24, left: 10 }}>
          <CartesianGrid strokeDasharray="3 3" />
          <XAxis
            dataKey="week"
            label={{ value: 'outcomes up to the week of', position: 'insideBottom', offset: -14 }}
          />
          <YAxis
            domain={[0, 1]}
            ticks={UNIT_TICKS}
            tickFormatter={pctTick}
            width={Y_AXIS_WIDTH}
            label={yLabel('accuracy (new pairs)')}
          />
          <Tooltip
            formatter={(v) => (typeof v === 'number' ? percentText(v) : String(v))}
            labelFormatter={(w) => {
              const r = rows.find((x) => x.week === w);
              return `week of ${String(w)}${r ? ` (${r.outcomes} outcomes)` : ''}`;
            }}
          />
          {chartLegend(
            [
              { label: PREDICTOR_LABELS.model, colour: PREDICTOR_COLOURS.model, marker: 'line' },
              { label: PREDICTOR_LABELS.physics, colour: PREDICTOR_COLOURS.physics, marker: 'line' },
            ],
            'timeline-legend',
          )}
          <Line
            dataKey="modelAccuracy"
            name={PREDICTOR_LABELS.model}
            stroke={PREDICTOR_COLOURS.model}
            strokeWidth={2}
            connectNulls={false}
            isAnimationActive={false}
          />
          <Line
            dataKey="physicsAccuracy"
            name={PREDICTOR_LABELS.physics}
            stroke={PREDICTOR_COLOURS.physics}
            strokeWidth={2}
            isAnimationActive={false}
          />
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}

/** The loadings chart's two discriminant axes, in palette colours. */
const LOADING_AXES = [
  { key: 'axis1', name: 'axis 1', colour: seriesColour(0) },
  { key: 'axis2', name: 'axis 2', colour: seriesColour(4) },
] as const;

function LdaPanel(props: { review: Ready }) {
  const { review } = props;
  if (!review.lda) return <p className="muted">{review.ldaNote ?? 'No discriminant view for these outcomes.'}</p>;
  const groups = ldaGroups(review);
  const axes = ldaAxisLabels(review);
  const bars = loadingBars(review);
  const once = review.classes.filter((c) => c.count < 2).map((c) => c.description);
  return (
    <>
      <div className="chart-box" data-testid="lda-scatter" style={{ height: 400 }}>
        <ResponsiveContainer width="100%" height="100%">
          <ScatterChart margin={{ top: 10, right: 20, bottom: 24, left: 10 }}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis
              dataKey="x"
              type="number"
              name={axes.x}
              tickFormatter={(v: number) => String(Number(v.toFixed(1)))}
              label={{ value: axes.x, position: 'insideBottom', offset: -14 }}
            />
            <YAxis
              dataKey="y"
              type="number"
              name={axes.y}
              tickFormatter={(v: number) => String(Number(v.toFixed(1)))}
              width={Y_AXIS_WIDTH}
              label={yLabel(axes.y)}
            />
            <Tooltip formatter={(v) => (typeof v === 'number' ? Number(v.toFixed(2)) : String(v))} />
            {chartLegend(
              groups.map((g) => ({ label: g.name, colour: g.colour, marker: 'dot' as const })),
              'lda-legend',
            )}
            {groups.map((g) => (
              <Scatter key={g.classKey} name={g.name} data={g.points} fill={g.colour} isAnimationActive={false} />
            ))}
          </ScatterChart>
        </ResponsiveContainer>
      </div>
      {once.length > 0 ? (
        <p className="muted small" data-testid="lda-left-out">
          Architectures seen only once are left out of the discriminant view: {once.join(', ')}.
        </p>
      ) : null}
      <h3>Which descriptors separate the architectures</h3>
      <p className="muted small">
        Correlation of each standardised descriptor with the discriminant scores (structure correlations, −1 to 1),
        strongest first.
      </p>
      <div className="chart-box" data-testid="loadings-chart" style={{ height: Math.max(240, bars.length * 44 + 70) }}>
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={bars} layout="vertical" margin={{ top: 10, right: 20, bottom: 10, left: 10 }}>
            <CartesianGrid strokeDasharray="3 3" />
            {/* Room beyond ±1 for the value labels at the bar ends. */}
            <XAxis type="number" domain={[-1.25, 1.25]} ticks={roundTicks(-1, 1, 0.5)} />
            <YAxis type="category" dataKey="label" width={300} interval={0} tick={{ fontSize: 12 }} />
            <Tooltip formatter={(v) => (typeof v === 'number' ? Number(v.toFixed(3)) : String(v))} />
            {chartLegend(
              LOADING_AXES.slice(0, review.lda.axes > 1 ? 2 : 1).map((a) => ({
                label: a.name,
                colour: a.colour,
                marker: 'bar' as const,
              })),
              'loadings-legend',
            )}
            <ReferenceLine x={0} stroke={NEUTRAL.reference} />
            {LOADING_AXES.slice(0, review.lda.axes > 1 ? 2 : 1).map((a) => (
              <Bar
                key={a.key}
                dataKey={a.key}
                name={a.name}
                fill={a.colour}
                fillOpacity={DATA_STYLE.barOpacity}
                stroke={a.colour}
                isAnimationActive={false}
              >
                <LabelList
                  dataKey={a.key}
                  position="right"
                  fontSize={11}
                  fill={NEUTRAL.text}
                  formatter={(v: unknown) => (typeof v === 'number' ? v.toFixed(2) : '')}
                />
              </Bar>
            ))}
          </BarChart>
        </ResponsiveContainer>
      </div>
    </>
  );
}

function ReadyReview(props: { review: Ready }) {
  const { review } = props;
  return (
    <>
      <ChartCard
        label="Validation on new pairs"
        title={
          <>
            Validation on new pairs (leave-one-pair-out: {review.outcomes} outcomes, {review.pairs} pairs,{' '}
            {review.classes.length} classes)
          </>
        }
      >
        <p data-testid="verdict">{verdictText(review)}</p>
        <HeadlineTable review={review} />
        <p className="muted small" data-testid="prior-weight">
          {priorWeightText(review)}
        </p>
        {review.prior ? (
          <p className="muted small" data-testid="prior-sources">
            {sentence(priorSourcesText(review.prior))}
          </p>
        ) : null}
        <p className="muted small" data-testid="known-pairs">
          {knownPairsText(review)}
        </p>
        {review.failed > 0 ? (
          <p className="muted small">
            {review.failed} failed syntheses train the success model, not the architecture model.
          </p>
        ) : null}
        {review.left.length > 0 ? (
          <p className="muted small">
            {review.left.length} outcome{review.left.length === 1 ? '' : 's'} left out:{' '}
            {review.left
              .slice(0, 3)
              .map((l) => l.reason)
              .join('; ')}
            {review.left.length > 3 ? '; …' : ''}
          </p>
        ) : null}
      </ChartCard>
      <ChartCard label="Per-class recall" title="Per-class recall (leave-one-pair-out)">
        <RecallTable review={review} />
      </ChartCard>
      <ChartCard
        label="Reliability"
        title="Are the probabilities honest? (10 bins, pooled over the folds)"
        note="Points on the dashed diagonal: a stated 70 % is right 70 % of the time."
      >
        <ReliabilityChart review={review} />
      </ChartCard>
      <ChartCard label="Timeline" title="Week by week: accuracy on new pairs with the outcomes up to each week">
        <TimelineChart review={review} />
      </ChartCard>
      <ChartCard label="Discriminant view" title="The outcomes on the first two discriminant axes">
        <LdaPanel review={review} />
      </ChartCard>
    </>
  );
}

function TooFewReview(props: { review: TooFew }) {
  const { review } = props;
  return (
    <section className="card" aria-label="Too few outcomes">
      <Banner tone="caution" testId="too-few">
        Not enough to learn from yet: {review.message} The learned model needs at least {review.minOutcomes} labelled
        outcomes of at least two architectures; until then predictions are physics alone.
      </Banner>
      {review.physics ? (
        <p data-testid="physics-only">
          Physics alone on the {review.outcomes} outcomes so far: {percentText(review.physics.accuracy)} right (
          {review.physics.errors} errors), log-loss {figureText(review.physics.logLoss)} (uniform guess{' '}
          {figureText(review.physics.uniformLogLoss)}).
        </p>
      ) : (
        <p className="muted" data-testid="physics-only">
          Physics predictions for each pair are in Candidates; no outcome can score them yet.
        </p>
      )}
      {review.classes.length > 0 ? (
        <p className="muted small">
          Seen so far: {review.classes.map((c) => `${c.description} ×${c.count}`).join(', ')}.
        </p>
      ) : null}
    </section>
  );
}

export function ModelReviewView() {
  const { campaignId, revision, bumpRevision } = useAppState();
  const review = useQuery('learn.review', campaignId ? { campaignId } : null, `review:${campaignId}:${revision}`);
  const stored = review.data?.stored ?? null;
  return (
    <section className="view" aria-labelledby="model-review-title">
      <header className="view__header">
        <h1 id="model-review-title">Model review</h1>
        <span className="muted">How well the learned model predicts pairs it has not seen, beside physics</span>
      </header>
      {campaignId === null ? (
        <p className="muted">Choose a campaign first; the model learns from its outcomes.</p>
      ) : (
        <div className="stack">
          <ModelStatus campaignId={campaignId} revision={revision} onTrained={bumpRevision} />
          {review.error ? <Banner tone="error">{review.error.message}</Banner> : null}
          {stored === null ? null : stored.review.status === 'ready' ? (
            <ReadyReview review={stored.review} />
          ) : (
            <TooFewReview review={stored.review} />
          )}
        </div>
      )}
    </section>
  );
}
