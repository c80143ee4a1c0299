/** TEM sizes of a batch: import a CSV of diameters; statistics, log-normal fit and histogram with the fitted curve. */
import { useState, type FormEvent } from 'react';
import {
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceArea,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { BatchOutcome, SizeRecord, RecordedOutcome } from '../../../../shared-model/api/outcomes';
import { call } from '../../api/client';
import { niceTicks, plusMinus } from '../../charts/chart-numbers';
import { chartLegend } from '../../charts/ChartLegend';
import { DATA_STYLE, FIT_STYLE, seriesColour } from '../../charts/palette';
import { useFieldErrors } from '../../api/hooks';
import { fieldNumber, optionalFieldNumber, readForm } from '../../forms/typed-numbers';
import { Banner } from '../../components/Banner';
import { ConfirmDialog } from '../../components/ConfirmDialog';
import { Field } from '../../components/Field';
import { CsvFileField } from './CsvFileField';
import { partError } from './part-error';
import { fixed, num } from './format';

function SizeChart(props: { record: SizeRecord }) {
  const { histogram } = props.record;
  const lo = histogram.bins[0]?.fromNm ?? 0;
  const hi = histogram.bins[histogram.bins.length - 1]?.toNm ?? 1;
  // the axis runs between round ticks just outside one bin width either side of the bins
  const xTicks = niceTicks(Math.max(0, lo - histogram.binWidthNm), hi + histogram.binWidthNm, 7).filter((t) => t >= 0);
  const from = xTicks[0] ?? 0;
  const to = xTicks[xTicks.length - 1] ?? hi + histogram.binWidthNm;
  const curve = histogram.curve.filter((c) => c.diameterNm >= from && c.diameterNm <= to);
  const top = Math.max(1, ...histogram.bins.map((b) => b.count), ...curve.map((c) => c.expectedCount)) * 1.1;
  const yTicks = niceTicks(0, Math.ceil(top), 6).filter((t) => Number.isInteger(t));
  // Bins (pale) and the fitted density scaled to counts (solid line) share one colour.
  const colour = seriesColour(0);
  return (
    <>
      <div className="chart-box" data-testid="size-histogram">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={curve} margin={{ top: 10, right: 20, bottom: 20, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis
              dataKey="diameterNm"
              type="number"
              domain={[from, to]}
              ticks={xTicks}
              tickFormatter={(v: number) => String(Number(v.toPrecision(3)))}
              label={{ value: 'diameter (nm)', position: 'insideBottom', offset: -10 }}
            />
            <YAxis
              domain={[0, Math.max(Math.ceil(top), yTicks[yTicks.length - 1] ?? 1)]}
              ticks={yTicks}
              allowDecimals={false}
              label={{ value: 'particles', angle: -90, position: 'insideLeft' }}
            />
            <Tooltip
              formatter={(value) => (typeof value === 'number' ? value.toFixed(2) : String(value))}
              labelFormatter={(v) => `${Number(v).toFixed(2)} nm`}
            />
            {chartLegend([
              {
                label: `particles per ${num(histogram.binWidthNm, 2)} nm bin (n = ${props.record.statistics.n})`,
                colour,
                marker: 'bar',
              },
              { label: 'log-normal fit (maximum likelihood)', colour, marker: 'line' },
            ])}
            {histogram.bins.map((b) =>
              b.count > 0 ? (
                <ReferenceArea
                  key={b.fromNm}
                  x1={b.fromNm}
                  x2={b.toNm}
                  y1={0}
                  y2={b.count}
                  fill={colour}
                  fillOpacity={DATA_STYLE.barOpacity}
                  stroke={colour}
                  ifOverflow="visible"
                />
              ) : null,
            )}
            <Line
              dataKey="expectedCount"
              name="log-normal fit (ML)"
              stroke={colour}
              dot={false}
              strokeWidth={FIT_STYLE.width}
              isAnimationActive={false}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <p className="muted small">
        Bars: particles per {num(histogram.binWidthNm, 2)} nm bin. Line: fitted log-normal density × n × bin width.
      </p>
    </>
  );
}

function SizeSummary(props: { record: SizeRecord; onRemove: () => void }) {
  const record = props.record;
  const s = record.statistics;
  const ln = record.lognormal;
  return (
    <div className="card" data-testid="size-summary" aria-label={`Size import ${record.id}`}>
      <h3 className="card__title">
        {record.sourceFile ?? 'pasted diameters'}{' '}
        <span className="muted small">
          ({record.createdAt.slice(0, 16).replace('T', ' ')}, {record.analysisVersion})
        </span>
      </h3>
      <dl className="stat-list">
        <dt>particles</dt>
        <dd data-stat="n">{s.n}</dd>
        <dt>mean ± SD</dt>
        <dd data-stat="mean">{plusMinus(s.meanNm, s.sdNm)} nm</dd>
        <dt>SEM · 95 % CI of mean</dt>
        <dd>
          {fixed(s.semNm, 3)} nm · [{fixed(s.meanInterval[0])}, {fixed(s.meanInterval[1])}] nm
        </dd>
        <dt>median · CV</dt>
        <dd>
          {fixed(s.medianNm)} nm · {fixed(s.cvPercent, 1)} %
        </dd>
        <dt>log-normal μ of ln(d/nm)</dt>
        <dd>
          {num(ln.mu, 4)} [{num(ln.muInterval[0], 4)}, {num(ln.muInterval[1], 4)}]
        </dd>
        <dt>log-normal σ</dt>
        <dd>
          {num(ln.sigma, 3)} [{num(ln.sigmaInterval[0], 3)}, {num(ln.sigmaInterval[1], 3)}] (95 %)
        </dd>
        {s.target ? (
          <>
            <dt>target {fixed(s.target.diameterNm)} nm</dt>
            <dd>
              mean {s.target.deviationNm >= 0 ? '+' : ''}
              {fixed(s.target.deviationNm)} nm ({s.target.deviationPercent >= 0 ? '+' : ''}
              {fixed(s.target.deviationPercent, 1)} %){s.target.withinInterval ? ', within the 95 % CI' : ''}
            </dd>
          </>
        ) : null}
        {s.precision ? (
          <>
            <dt>for ±{fixed(s.precision.halfWidthNm, 2)} nm on the mean</dt>
            <dd data-stat="more">
              {s.precision.particlesNeeded} particles in all —{' '}
              {s.precision.moreParticles === 0 ? 'reached' : `${s.precision.moreParticles} more to count`}
            </dd>
          </>
        ) : null}
      </dl>
      <SizeChart record={record} />
      {record.importNotes.map((note) => (
        <p className="muted small" key={note}>
          {note}
        </p>
      ))}
      <button type="button" className="button--quiet" onClick={props.onRemove}>
        Remove this import
      </button>
    </div>
  );
}

export function SizesPanel(props: { outcome: BatchOutcome; onChanged: (recorded?: RecordedOutcome) => void }) {
  const [csvText, setCsvText] = useState('');
  const [sourceFile, setSourceFile] = useState<string | null>(null);
  const [column, setColumn] = useState('');
  const [target, setTarget] = useState(
    props.outcome.targetDiameterNm !== null ? String(props.outcome.targetDiameterNm) : '',
  );
  const [precision, setPrecision] = useState('2');
  const [removing, setRemoving] = useState<number | null>(null);
  const { errors, general, show, clear } = useFieldErrors();

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const numbers = readForm(() => ({
      targetNm: optionalFieldNumber(target, 'targetDiameterNm', 'target diameter, nm'),
      precisionPercent: fieldNumber(precision, 'precisionPercent', 'precision of the mean, ± %'),
    }));
    if (!numbers.ok) {
      show(numbers.error);
      return;
    }
    const { targetNm, precisionPercent } = numbers.value;
    const result = await call('outcomes.record', {
      batchId: props.outcome.batchId,
      sizes: {
        csvText,
        sourceFile,
        ...(column.trim() ? { column: /^\d+$/.test(column.trim()) ? Number(column.trim()) : column.trim() } : {}),
        targetDiameterNm: targetNm,
        precisionPercent,
      },
    });
    if (!result.ok) {
      show(partError(result.error, 'sizes'));
      return;
    }
    clear();
    setCsvText('');
    setSourceFile(null);
    props.onChanged(result.value);
  };

  const latest = props.outcome.sizes[props.outcome.sizes.length - 1];
  return (
    <section className="card" aria-label="TEM sizes">
      <h2 className="card__title">TEM sizes</h2>
      <form className="form-grid" onSubmit={submit} aria-label="Import sizes" noValidate>
        <Field
          label="Diameters (CSV, nm)"
          name="csvText"
          error={errors.csvText}
          hint="paste a column of diameters or pick a file; header, ; or tab and decimal commas are fine"
          wide
        >
          <textarea
            className="csv-input"
            name="csvText"
            value={csvText}
            onChange={(event) => setCsvText(event.target.value)}
            spellCheck={false}
          />
        </Field>
        <CsvFileField
          name="file"
          onPicked={(picked) => {
            setCsvText(picked.text);
            setSourceFile(picked.name);
          }}
        />
        <Field label="Column" name="column" error={errors.column} hint="name or number; blank = automatic">
          <input name="column" value={column} onChange={(event) => setColumn(event.target.value)} autoComplete="off" />
        </Field>
        <Field label="Target diameter (nm)" name="targetDiameterNm" error={errors.targetDiameterNm}>
          <input
            name="targetDiameterNm"
            value={target}
            onChange={(event) => setTarget(event.target.value)}
            inputMode="decimal"
          />
        </Field>
        <Field label="Precision of the mean (± %)" name="precisionPercent" error={errors.precisionPercent}>
          <input
            name="precisionPercent"
            value={precision}
            onChange={(event) => setPrecision(event.target.value)}
            inputMode="decimal"
          />
        </Field>
        <div className="form-actions">
          <button type="submit" className="button--primary">
            Import sizes
          </button>
        </div>
        {general ? <Banner tone="error">{general}</Banner> : null}
      </form>
      {latest ? (
        <SizeSummary record={latest} onRemove={() => setRemoving(latest.id)} />
      ) : (
        <p className="muted">No sizes recorded for this batch yet.</p>
      )}
      {props.outcome.sizes.length > 1 ? (
        <p className="muted small">{props.outcome.sizes.length - 1} earlier import(s) kept; the newest is shown.</p>
      ) : null}
      {removing !== null ? (
        <ConfirmDialog
          title="Remove size import?"
          message="The diameters and their analysis are deleted from this workspace."
          confirmLabel="Remove import"
          onCancel={() => setRemoving(null)}
          onConfirm={async () => {
            const result = await call('outcomes.removeSizes', { id: removing, confirm: true });
            setRemoving(null);
            if (!result.ok) show(result.error);
            props.onChanged();
          }}
        />
      ) : null}
    </section>
  );
}
