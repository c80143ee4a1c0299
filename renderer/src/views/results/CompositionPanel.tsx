/** Composition of a batch: nominal (feed), bulk (ICP) and EDX values kept apart, deviations flagged, EDX warnings. */
import { useState, type FormEvent } from 'react';
import type { BatchOutcome, CompositionRecord, RecordedOutcome } from '../../../../shared-model/api/outcomes';
import { COMPOSITION_METHODS, type CompositionMethod } from '../../../../shared-model/characterization/composition';
import { call } from '../../api/client';
import { useFieldErrors } from '../../api/hooks';
import { Banner } from '../../components/Banner';
import { Field } from '../../components/Field';
import { atPct } from './format';
import { emptyRow, readCompositionForm, type RowDraft } from './composition-form';
import { partError } from './part-error';

function CompositionTable(props: { record: CompositionRecord; elementB: string }) {
  const { comparison } = props.record;
  return (
    <div data-testid="composition-table">
      <table className="data-table" aria-label="Composition">
        <thead>
          <tr>
            <th>source</th>
            <th>{props.elementB} (at.%)</th>
            <th>± (at.%)</th>
            <th>vs nominal</th>
            <th>check</th>
          </tr>
        </thead>
        <tbody>
          <tr>
            <td>nominal (feed)</td>
            <td>{atPct(comparison.nominalXB)}</td>
            <td>–</td>
            <td>–</td>
            <td />
          </tr>
          {comparison.rows.map((row, i) => (
            <tr key={i} data-flagged={String(row.flagged)}>
              <td>
                {row.method}
                {row.lines ? <span className="muted small"> ({row.lines})</span> : null}
              </td>
              <td>{atPct(row.xB)}</td>
              <td>{row.uncertaintyXB === null ? '–' : atPct(row.uncertaintyXB)}</td>
              <td>
                {row.deviationFromNominal === null
                  ? '–'
                  : `${row.deviationFromNominal >= 0 ? '+' : ''}${atPct(row.deviationFromNominal)}`}
              </td>
              <td
                className={row.flagged === true ? 'flag--over' : row.flagged === false ? 'flag--ok' : 'flag--unknown'}
                title={row.comment}
              >
                {row.flagged === true ? 'beyond uncertainty' : row.flagged === false ? 'within' : 'cannot judge'}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {comparison.warnings.map((warning, i) => (
        <Banner tone="caution" key={i} testId={`composition-warning-${warning.code}`}>
          {warning.message}
          {warning.fromMemory ? <span className="tag tag--muted">line energies from memory</span> : null}
        </Banner>
      ))}
      <p className="muted small">
        Lines clear of overlaps: {comparison.elementA} {comparison.suggestedLines.elementA?.line ?? 'none'}
        {comparison.suggestedLines.elementA
          ? ` (${comparison.suggestedLines.elementA.energyKev.toFixed(3)} keV)`
          : ''}, {comparison.elementB} {comparison.suggestedLines.elementB?.line ?? 'none'}
        {comparison.suggestedLines.elementB ? ` (${comparison.suggestedLines.elementB.energyKev.toFixed(3)} keV)` : ''}.
        K lines above ~10 keV need a TEM; an SEM at 20–30 kV reaches only L and M lines there.
      </p>
    </div>
  );
}

export function CompositionPanel(props: { outcome: BatchOutcome; onChanged: (recorded?: RecordedOutcome) => void }) {
  const { outcome } = props;
  const [nominal, setNominal] = useState(outcome.nominalXB !== null ? (outcome.nominalXB * 100).toFixed(1) : '');
  const [grid, setGrid] = useState('');
  const [rows, setRows] = useState<RowDraft[]>([emptyRow('ICP-OES'), emptyRow('EDX particle')]);
  const { errors, general, show, clear } = useFieldErrors();
  const setRow = (index: number, change: Partial<RowDraft>) =>
    setRows((current) => current.map((row, i) => (i === index ? { ...row, ...change } : row)));

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const filled = rows.filter((row) => row.xBPct.trim() !== '');
    const reading = readCompositionForm(nominal, grid, rows);
    if (!reading.ok) {
      show(reading.error);
      return;
    }
    const answer = await call('outcomes.record', { batchId: outcome.batchId, composition: reading.value });
    const result = answer.ok ? answer : { ...answer, error: partError(answer.error, 'composition') };
    if (!result.ok) {
      // measurements.N.field refers to the N-th filled row; map it back to the row shown.
      const match = /^measurements\.(\d+)\.(\w+)$/.exec(result.error.field ?? '');
      if (match) {
        const shownIndex = rows.indexOf(filled[Number(match[1])] as RowDraft);
        show({ ...result.error, field: `measurements.${shownIndex}.${match[2]}` });
      } else show(result.error);
      return;
    }
    clear();
    props.onChanged(result.value);
  };

  const latest = outcome.compositions[outcome.compositions.length - 1];
  return (
    <section className="card" aria-label="Composition">
      <h2 className="card__title">Composition ({outcome.elementB} content)</h2>
      <form onSubmit={submit} aria-label="Record composition" noValidate>
        <div className="form-grid">
          <Field
            label={`Nominal ${outcome.elementB} (at.%)`}
            name="nominalXB"
            error={errors.nominalXB}
            hint="feed composition; from the batch design"
          >
            <input
              name="nominalXB"
              value={nominal}
              onChange={(event) => setNominal(event.target.value)}
              inputMode="decimal"
            />
          </Field>
          <Field label="TEM grid metal" name="gridMetal" error={errors.gridMetal} hint="e.g. Cu, Ni, Au, Mo">
            <input name="gridMetal" value={grid} onChange={(event) => setGrid(event.target.value)} autoComplete="off" />
          </Field>
        </div>
        {rows.map((row, i) => (
          <div className="measurement-row" key={i} data-row={i}>
            <Field label="Method" name={`measurements.${i}.method`} error={errors[`measurements.${i}.method`]}>
              <select
                name={`method-${i}`}
                value={row.method}
                onChange={(event) => setRow(i, { method: event.target.value as CompositionMethod })}
              >
                {COMPOSITION_METHODS.map((m) => (
                  <option key={m}>{m}</option>
                ))}
              </select>
            </Field>
            <Field
              label={`${outcome.elementB} (at.%)`}
              name={`measurements.${i}.xB`}
              error={errors[`measurements.${i}.xB`]}
            >
              <input
                name={`xB-${i}`}
                value={row.xBPct}
                onChange={(event) => setRow(i, { xBPct: event.target.value })}
                inputMode="decimal"
              />
            </Field>
            <Field
              label="± (at.%)"
              name={`measurements.${i}.uncertaintyXB`}
              error={errors[`measurements.${i}.uncertaintyXB`]}
            >
              <input
                name={`uncertainty-${i}`}
                value={row.uncertaintyPct}
                onChange={(event) => setRow(i, { uncertaintyPct: event.target.value })}
                inputMode="decimal"
              />
            </Field>
            <Field label="Lines used" name={`measurements.${i}.lines`} error={errors[`measurements.${i}.lines`]}>
              <input
                name={`lines-${i}`}
                value={row.lines}
                onChange={(event) => setRow(i, { lines: event.target.value })}
                placeholder="e.g. Pt L, Ni K"
              />
            </Field>
            <button
              type="button"
              className="button--quiet"
              onClick={() => setRows((current) => current.filter((_, j) => j !== i))}
              aria-label={`Remove row ${i + 1}`}
            >
              ×
            </button>
          </div>
        ))}
        <div className="form-actions">
          <button type="button" onClick={() => setRows((current) => [...current, emptyRow('EDX area')])}>
            Add measurement
          </button>
          <button type="submit" className="button--primary">
            Record composition
          </button>
        </div>
        {general ? <Banner tone="error">{general}</Banner> : null}
      </form>
      {latest ? (
        <CompositionTable record={latest} elementB={outcome.elementB} />
      ) : (
        <p className="muted">No composition recorded yet.</p>
      )}
    </section>
  );
}
