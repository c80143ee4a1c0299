/** EDX line scans of a batch: import, the four model fits over the data, the chosen model with radius, core and shell. */
import { useState, type FormEvent } from 'react';
import { CartesianGrid, ComposedChart, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { BatchOutcome, LineScanRecord, RecordedOutcome } from '../../../../shared-model/api/outcomes';
import { call } from '../../api/client';
import { chartLegend, type LegendEntry } from '../../charts/ChartLegend';
import { niceTicks } from '../../charts/chart-numbers';
import { DATA_STYLE, dashPattern, ELEMENT, FIT_STYLE } from '../../charts/palette';
import { useFieldErrors } from '../../api/hooks';
import { optionalFieldNumber, readForm } from '../../forms/typed-numbers';
import { Banner } from '../../components/Banner';
import { ConfirmDialog } from '../../components/ConfirmDialog';
import { Field } from '../../components/Field';
import { CsvFileField } from './CsvFileField';
import { estimate, fixed } from './format';
import { partError } from './part-error';

function LineScanChart(props: { scan: LineScanRecord; shown: string }) {
  const { scan, shown } = props;
  const a = scan.analysis;
  const models = a.models.filter((m) => shown === 'all' || m.label === shown);
  const data = scan.points.map((p, i) => {
    const row: Record<string, number> = { x: p.positionNm, dataA: p.a, dataB: p.b };
    for (const m of models) {
      row[`${m.label}:A`] = m.fittedA[i] as number;
      row[`${m.label}:B`] = m.fittedB[i] as number;
    }
    return row;
  });
  // round ticks from 0 (or the lowest value, when noise or a fitted background goes below 0) to the highest
  const values = data.flatMap((row) =>
    Object.entries(row)
      .filter(([k]) => k !== 'x')
      .map(([, v]) => v),
  );
  const finite = values.filter(Number.isFinite);
  const yTicks = finite.length > 0 ? niceTicks(Math.min(0, ...finite), Math.max(...finite), 6) : [];
  // Each element's data and its fits share the element's colour; the models differ by dash (chosen: solid, wider).
  const element = { A: a.elementA, B: a.elementB };
  const others = a.models.filter((m) => m.label !== a.chosenModel);
  const dash = (label: string) =>
    label === a.chosenModel ? '' : dashPattern(1 + others.findIndex((m) => m.label === label));
  const legend: LegendEntry[] = [
    ...(['A', 'B'] as const).map((side): LegendEntry => ({
      label: `${element[side]} data`,
      colour: ELEMENT[side],
      marker: 'dot',
    })),
    ...models.flatMap((m) =>
      (['A', 'B'] as const).map((side): LegendEntry => ({
        label: `${m.label} fit, ${element[side]}${m.label === a.chosenModel ? ' (chosen)' : ''}`,
        colour: ELEMENT[side],
        marker: 'line',
        dash: dash(m.label),
        thin: m.label !== a.chosenModel,
      })),
    ),
  ];
  return (
    <div className="chart-box" data-testid="line-scan-chart">
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={data} margin={{ top: 10, right: 20, bottom: 20, left: 0 }}>
          <CartesianGrid strokeDasharray="3 3" />
          <XAxis
            dataKey="x"
            type="number"
            domain={['dataMin', 'dataMax']}
            tickFormatter={(v: number) => v.toFixed(0)}
            label={{ value: 'position (nm)', position: 'insideBottom', offset: -10 }}
          />
          <YAxis
            domain={yTicks.length > 1 ? [yTicks[0] as number, yTicks[yTicks.length - 1] as number] : ['auto', 'auto']}
            ticks={yTicks.length > 1 ? yTicks : undefined}
            label={{ value: scan.unit === 'counts' ? 'counts' : 'at.%', angle: -90, position: 'insideLeft' }}
          />
          <Tooltip
            formatter={(value) => (typeof value === 'number' ? value.toFixed(1) : String(value))}
            labelFormatter={(v) => `${Number(v).toFixed(2)} nm`}
          />
          {chartLegend(legend)}
          {(['A', 'B'] as const).map((side) => (
            <Line
              key={`data${side}`}
              dataKey={`data${side}`}
              name={`${element[side]} data`}
              stroke="none"
              dot={{ r: DATA_STYLE.dotRadius, fill: ELEMENT[side], fillOpacity: DATA_STYLE.dotOpacity, stroke: 'none' }}
              isAnimationActive={false}
            />
          ))}
          {models.flatMap((m) =>
            (['A', 'B'] as const).map((side) => (
              <Line
                key={`${m.label}:${side}`}
                dataKey={`${m.label}:${side}`}
                name={`${m.label} fit ${element[side]}`}
                stroke={ELEMENT[side]}
                strokeDasharray={dash(m.label) || undefined}
                strokeWidth={m.label === a.chosenModel ? FIT_STYLE.width : FIT_STYLE.otherWidth}
                dot={false}
                isAnimationActive={false}
              />
            )),
          )}
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}

function LineScanResult(props: { scan: LineScanRecord; onChanged: () => void; onRemove: () => void }) {
  const { scan } = props;
  const a = scan.analysis;
  const [shown, setShown] = useState(a.chosenModel);
  const [sigma, setSigma] = useState(scan.probeSigmaNm !== null ? String(scan.probeSigmaNm) : '');
  const { errors, general, show, clear } = useFieldErrors();
  const refit = async (event: FormEvent) => {
    event.preventDefault();
    const sigmaReading = readForm(() => optionalFieldNumber(sigma, 'probeSigmaNm', 'probe σ, nm'));
    if (!sigmaReading.ok) {
      show(sigmaReading.error);
      return;
    }
    const result = await call('outcomes.refitLineScan', { id: scan.id, probeSigmaNm: sigmaReading.value });
    if (!result.ok) {
      show(result.error);
      return;
    }
    clear();
    props.onChanged();
  };
  return (
    <div className="card" data-testid="line-scan-result" aria-label={`Line scan ${scan.name || scan.id}`}>
      <h3 className="card__title">
        {scan.name || scan.sourceFile || `line scan ${scan.id}`}{' '}
        <span className="muted small">
          ({a.points} points, {scan.unit}, {a.analysisVersion})
        </span>
      </h3>
      <p data-testid="chosen-model">
        Chosen by BIC: <strong>{a.chosenModel}</strong> — {a.evidence} evidence (ΔBIC {fixed(a.deltaBicToNext, 1)} to
        the next model).
      </p>
      <label className="toggle">
        show fits of{' '}
        <select value={shown} onChange={(event) => setShown(event.target.value)} aria-label="Model fits shown">
          <option value="all">all models</option>
          {a.models.map((m) => (
            <option key={m.label} value={m.label}>
              {m.label}
            </option>
          ))}
        </select>
      </label>
      <LineScanChart scan={scan} shown={shown} />
      <table className="data-table" aria-label="Line-scan models">
        <thead>
          <tr>
            <th>model</th>
            <th>ΔBIC</th>
            <th>weight</th>
            <th>radius (nm)</th>
            <th>core radius (nm)</th>
            <th>shell (nm)</th>
            <th>shell (monolayers)</th>
            <th>probe σ (nm)</th>
          </tr>
        </thead>
        <tbody>
          {a.models.map((m) => (
            <tr key={m.label} className={m.label === a.chosenModel ? 'model-chosen' : undefined} data-model={m.label}>
              <td>
                {m.label}
                {m.label === a.chosenModel ? ' ✓' : ''}
                {m.model === 'Janus' && m.janusALow !== null ? (
                  <span className="muted small"> ({m.janusALow ? a.elementA : a.elementB} on the low side)</span>
                ) : null}
                {m.atBounds.length > 0 ? (
                  <span className="muted small" title="a parameter on its bound has no meaningful uncertainty">
                    {' '}
                    (on bound: {m.atBounds.join(', ')})
                  </span>
                ) : null}
              </td>
              <td>{fixed(m.deltaBic, 1)}</td>
              <td>{fixed(m.bicWeight, 3)}</td>
              <td>{estimate(m.radiusNm)}</td>
              <td>{estimate(m.coreRadiusNm)}</td>
              <td>{estimate(m.shellThicknessNm)}</td>
              <td>{estimate(m.shellMonolayers, 1)}</td>
              <td>
                {estimate(m.probeSigmaNm)}
                {m.probeFitted ? '' : ' (given)'}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {[...scan.importNotes, ...a.notes].map((note) => (
        <p className="muted small" key={note}>
          {note}
        </p>
      ))}
      <p className="muted small">
        Geometry: a sphere scanned through its centre; each element's signal ∝ the beam's path through its region (chord
        length), blurred by a Gaussian probe, plus a background per channel. Janus = two hemispheres split by a plane
        containing the beam, perpendicular to the scan. Monolayer = a/√3 of the shell metal.
      </p>
      <form className="inline-form" onSubmit={refit} aria-label="Refit line scan" noValidate>
        <Field label="Probe σ (nm)" name="probeSigmaNm" error={errors.probeSigmaNm} hint="blank = fit it">
          <input
            name="probeSigmaNm"
            value={sigma}
            onChange={(event) => setSigma(event.target.value)}
            inputMode="decimal"
          />
        </Field>
        <button type="submit">Fit again</button>
        <button type="button" className="button--quiet" onClick={props.onRemove}>
          Remove scan
        </button>
      </form>
      {general ? <Banner tone="error">{general}</Banner> : null}
    </div>
  );
}

export function LineScanPanel(props: { outcome: BatchOutcome; onChanged: (recorded?: RecordedOutcome) => void }) {
  const { outcome } = props;
  const [csvText, setCsvText] = useState('');
  const [sourceFile, setSourceFile] = useState<string | null>(null);
  const [name, setName] = useState('');
  const [unit, setUnit] = useState<'auto' | 'counts' | 'atPercent'>('auto');
  const [sigma, setSigma] = useState('');
  const [removing, setRemoving] = useState<number | null>(null);
  const { errors, general, show, clear } = useFieldErrors();
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const sigmaReading = readForm(() => optionalFieldNumber(sigma, 'probeSigmaNm', 'probe σ, nm'));
    if (!sigmaReading.ok) {
      show(sigmaReading.error);
      return;
    }
    const result = await call('outcomes.record', {
      batchId: outcome.batchId,
      lineScan: { csvText, name, sourceFile, unit, probeSigmaNm: sigmaReading.value },
    });
    if (!result.ok) {
      show(partError(result.error, 'lineScan'), { positionsNm: 'csvText', signalA: 'csvText', signalB: 'csvText' });
      return;
    }
    clear();
    setCsvText('');
    setSourceFile(null);
    setName('');
    props.onChanged(result.value);
  };
  return (
    <section className="card" aria-label="EDX line scans">
      <h2 className="card__title">EDX line scans</h2>
      <form className="form-grid" onSubmit={submit} aria-label="Import line scan" noValidate>
        <Field
          label={`Line scan (CSV: position nm, ${outcome.elementA}, ${outcome.elementB})`}
          name="csvText"
          error={errors.csvText}
          hint="counts (or at.%) per element; headers naming the elements are matched"
          wide
        >
          <textarea
            className="csv-input"
            name="lineScanCsv"
            value={csvText}
            onChange={(event) => setCsvText(event.target.value)}
            spellCheck={false}
          />
        </Field>
        <CsvFileField
          name="lineScanFile"
          onPicked={(picked) => {
            setCsvText(picked.text);
            setSourceFile(picked.name);
          }}
        />
        <Field label="Name" name="name" error={errors.name}>
          <input
            name="scanName"
            value={name}
            onChange={(event) => setName(event.target.value)}
            placeholder="e.g. particle 3"
          />
        </Field>
        <Field label="Unit" name="unit" error={errors.unit}>
          <select
            name="unit"
            value={unit}
            onChange={(event) => setUnit(event.target.value as 'auto' | 'counts' | 'atPercent')}
          >
            <option value="auto">auto</option>
            <option value="counts">counts</option>
            <option value="atPercent">at.%</option>
          </select>
        </Field>
        <Field label="Probe σ (nm)" name="probeSigmaNm" error={errors.probeSigmaNm} hint="blank = fit it">
          <input
            name="importProbeSigma"
            value={sigma}
            onChange={(event) => setSigma(event.target.value)}
            inputMode="decimal"
          />
        </Field>
        <div className="form-actions">
          <button type="submit" className="button--primary">
            Import and fit
          </button>
        </div>
        {general ? <Banner tone="error">{general}</Banner> : null}
      </form>
      {outcome.lineScans.length === 0 ? <p className="muted">No line scans yet.</p> : null}
      {outcome.lineScans.map((scan) => (
        <LineScanResult
          key={`${scan.id}:${scan.analysis.chosenModel}:${scan.probeSigmaNm}`}
          scan={scan}
          onChanged={props.onChanged}
          onRemove={() => setRemoving(scan.id)}
        />
      ))}
      {removing !== null ? (
        <ConfirmDialog
          title="Remove line scan?"
          message="Its points and fits are deleted from this workspace."
          confirmLabel="Remove scan"
          onCancel={() => setRemoving(null)}
          onConfirm={async () => {
            const result = await call('outcomes.removeLineScan', { id: removing, confirm: true });
            setRemoving(null);
            if (!result.ok) show(result.error);
            props.onChanged();
          }}
        />
      ) : null}
    </section>
  );
}
