/**
 * "Screen this campaign": Monte Carlo for every pair of the current campaign's elements that has
 * tight-binding parameters × each composition × each size, queued over all cores but one. Shows the overall
 * progress, each run's status, Cancel, the pairs skipped with why, and per size and composition a
 * pair × pair matrix (colour = architecture, named in the legend) with the analytic prediction in each
 * cell; a cell opens its stored run.
 */
import { useEffect, useState, type FormEvent } from 'react';
import type { ScreenStarted, ScreenStatus } from '../../../../shared-model/api/screen';
import {
  describeArchitecture,
  parseArchitecture,
  type ArchitectureKind,
} from '../../../../shared-model/architecture/labels';
import { readUserNumber } from '../../../../shared-model/text/user-number';
import { call } from '../../api/client';
import { useAppState } from '../../app-state';
import { Banner } from '../../components/Banner';
import { architectureColour, architectureTint } from '../../charts/palette';

function kindOf(label: string | null): ArchitectureKind | null {
  return label === null ? null : (parseArchitecture(label)?.kind ?? null);
}

type ScreenField = 'screenXB' | 'screenDiameter' | 'screenTemperature';

/** What to say, in the user's words, when a field is left empty. */
const EMPTY_FIELD: Record<ScreenField, string> = {
  screenXB: 'Give at least one composition, e.g. 25 50 75 (at.% of the column element).',
  screenDiameter: 'Give at least one diameter in nm, e.g. 3 or 2 4.',
  screenTemperature: 'Give the temperature in K, e.g. 600.',
};

class FieldProblem extends Error {
  constructor(
    readonly field: ScreenField,
    message: string,
  ) {
    super(message);
  }
}

/** Numbers separated by spaces or semicolons (a comma may be a decimal comma). */
function readList(text: string, field: ScreenField, label: string): number[] {
  const pieces = text.split(/[;\s]+/).filter((p) => p !== '');
  if (pieces.length === 0) throw new FieldProblem(field, EMPTY_FIELD[field]);
  return pieces.map((piece) => {
    const read = readUserNumber(piece, label);
    if (!read.ok) throw new FieldProblem(field, read.message);
    return read.value;
  });
}

function FieldError(props: { field: ScreenField; problem: FieldProblem | null }) {
  if (props.problem?.field !== props.field) return null;
  return (
    <span className="field__error" role="alert" data-error-for={props.field}>
      {props.problem.message}
    </span>
  );
}

function Matrix(props: { status: ScreenStatus; diameterNm: number; x: number; onOpen: (runId: number) => void }) {
  const { status } = props;
  const cells = status.cells.filter((c) => c.diameterNm === props.diameterNm && Math.abs(c.x - props.x) < 1e-9);
  return (
    <table className="small" data-testid={`screen-matrix-${props.diameterNm}-${Math.round(props.x * 100)}`}>
      <caption style={{ textAlign: 'left' }}>
        {props.diameterNm} nm, column element at {Math.round(props.x * 100)} at.% (row element the rest)
      </caption>
      <thead>
        <tr>
          <th />
          {status.elements.map((e) => (
            <th key={e}>{e}</th>
          ))}
        </tr>
      </thead>
      <tbody>
        {status.elements.map((row) => (
          <tr key={row}>
            <th>{row}</th>
            {status.elements.map((column) => {
              const cell = cells.find((c) => c.row === row && c.column === column);
              if (!cell) return <td key={column}>{row === column ? '·' : ''}</td>;
              const kind = kindOf(cell.status === 'done' ? cell.architecture : null);
              return (
                <td key={column} style={{ background: kind ? architectureTint(kind) : undefined, padding: 4 }}>
                  <button
                    type="button"
                    className="button--link"
                    onClick={() => props.onOpen(cell.runId)}
                    title={`open run ${cell.runId}`}
                  >
                    {cell.status === 'done' ? cell.architecture : cell.status}
                  </button>
                  <div className="muted">analytic: {cell.prediction ?? '–'}</div>
                </td>
              );
            })}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function ScreenPanel(props: { onOpen: (runId: number) => void }) {
  const { campaignId } = useAppState();
  const [xText, setXText] = useState('25 50 75');
  const [dText, setDText] = useState('3');
  const [tText, setTText] = useState('600');
  const [started, setStarted] = useState<ScreenStarted | null>(null);
  const [status, setStatus] = useState<ScreenStatus | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [fieldProblem, setFieldProblem] = useState<FieldProblem | null>(null);
  const runIds = started?.runs.map((r) => r.runId) ?? [];
  const active = status === null ? started !== null : status.finished < status.total;

  useEffect(() => {
    if (!started || started.runs.length === 0) return;
    let stop = false;
    const ids = started.runs.map((r) => r.runId);
    const poll = async () => {
      const result = await call('screen.status', { runIds: ids });
      if (stop) return;
      if (!result.ok) setError(result.error.message);
      else setStatus(result.value);
    };
    void poll();
    const timer = setInterval(() => void poll(), 1000);
    return () => {
      stop = true;
      clearInterval(timer);
    };
  }, [started]);
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (campaignId === null) return;
    setError(null);
    setFieldProblem(null);
    let xB: number[];
    let diameterNm: number[];
    let temperatureK: number;
    try {
      const percents = readList(xText, 'screenXB', 'compositions, at.%');
      xB = percents.map((v) => v / 100);
      diameterNm = readList(dText, 'screenDiameter', 'diameters, nm');
      temperatureK = readList(tText, 'screenTemperature', 'temperature, K')[0]!;
    } catch (problem) {
      if (problem instanceof FieldProblem) setFieldProblem(problem);
      else setError(problem instanceof Error ? problem.message : String(problem));
      return;
    }
    const result = await call('screen.start', { campaignId, xB, diameterNm, temperatureK });
    if (!result.ok) {
      setError(`${result.error.field ? `${result.error.field}: ` : ''}${result.error.message}`);
      return;
    }
    setStatus(null);
    setStarted(result.value);
  };

  const cancel = async () => {
    const result = await call('screen.cancel', { runIds });
    if (!result.ok) setError(result.error.message);
  };

  // All runs finished reads 100 %, whatever the last sweep count said.
  const fraction = status === null ? 0 : status.finished >= status.total ? 1 : Math.min(1, status.progress);
  const kinds = status
    ? [
        ...new Set(
          status.cells.map((c) => kindOf(c.status === 'done' ? c.architecture : null)).filter((k) => k !== null),
        ),
      ]
    : [];
  return (
    <section className="card stack" aria-label="Campaign screen" data-testid="screen-panel">
      <h2 className="card__title">Screen this campaign</h2>
      {campaignId === null ? (
        <p className="muted">Choose a campaign first: the screen runs every pair of its elements.</p>
      ) : (
        <form className="form-grid" onSubmit={submit} noValidate>
          <label>
            Compositions, at.% of the column element
            <input
              name="screenXB"
              value={xText}
              onChange={(e) => setXText(e.target.value)}
              aria-invalid={fieldProblem?.field === 'screenXB' ? true : undefined}
            />
            <FieldError field="screenXB" problem={fieldProblem} />
          </label>
          <label>
            Diameters, nm
            <input
              name="screenDiameter"
              value={dText}
              onChange={(e) => setDText(e.target.value)}
              aria-invalid={fieldProblem?.field === 'screenDiameter' ? true : undefined}
            />
            <FieldError field="screenDiameter" problem={fieldProblem} />
          </label>
          <label>
            Temperature, K
            <input
              name="screenTemperature"
              value={tText}
              onChange={(e) => setTText(e.target.value)}
              aria-invalid={fieldProblem?.field === 'screenTemperature' ? true : undefined}
            />
            <FieldError field="screenTemperature" problem={fieldProblem} />
          </label>
          <p className="small muted" style={{ gridColumn: '1 / -1', margin: 0 }}>
            Separate values by spaces. Every run stops at the answer and runs relaxed when the metals differ in size by
            more than 6 %. Swap moves find the equilibrium arrangement, which a low-temperature synthesis may not reach.
          </p>
          <div className="form-actions">
            <button type="submit" className="button--primary" disabled={active}>
              Screen this campaign
            </button>
            {active ? (
              <button type="button" onClick={() => void cancel()}>
                Cancel the screen
              </button>
            ) : null}
          </div>
        </form>
      )}
      {error ? <Banner tone="error">{error}</Banner> : null}
      {started ? (
        <div className="stack">
          <p className="small" data-testid="screen-summary">
            {started.runs.length} run{started.runs.length === 1 ? '' : 's'} for {started.elements.join(', ')} on{' '}
            {started.concurrency} worker(s)
            {status ? `: ${status.finished} of ${status.total} finished` : ''}
            {status?.elapsedMs ? `, ${(status.elapsedMs / 1000).toFixed(1)} s` : ''}.
          </p>
          <div
            className="sim-progress"
            role="progressbar"
            data-testid="screen-progress"
            aria-valuenow={Math.round(100 * fraction)}
            aria-valuemin={0}
            aria-valuemax={100}
          >
            <div className="sim-progress__bar" style={{ width: `${(100 * fraction).toFixed(1)}%` }} />
          </div>
          {started.skipped.length > 0 ? (
            <ul className="small" data-testid="screen-skipped">
              {started.skipped.map((s) => (
                <li key={s.pair}>
                  skipped {s.pair}: {s.reason}
                </li>
              ))}
            </ul>
          ) : null}
          {status ? (
            <>
              <details>
                <summary className="small">Runs</summary>
                <ul className="small" data-testid="screen-runs">
                  {status.runs.map((r) => (
                    <li key={r.runId}>
                      {r.elementA}-{r.elementB} x({r.elementB}) {Math.round(100 * r.xB)} %, {r.diameterNm} nm:{' '}
                      {r.status}
                      {r.architecture ? ` → ${r.architecture}` : ''}
                      {r.error ? ` (${r.error})` : ''}
                    </li>
                  ))}
                </ul>
              </details>
              {status.diameters.flatMap((d) =>
                status.compositions.map((x) => (
                  <Matrix key={`${d}-${x}`} status={status} diameterNm={d} x={x} onOpen={props.onOpen} />
                )),
              )}
              <p className="small" aria-label="Legend" data-testid="screen-legend">
                {kinds.map((k) => (
                  <span key={k} style={{ marginRight: 16 }}>
                    <span
                      style={{
                        display: 'inline-block',
                        width: 12,
                        height: 12,
                        background: architectureTint(k),
                        border: `1px solid ${architectureColour(k)}`,
                        verticalAlign: 'middle',
                        marginRight: 4,
                      }}
                    />
                    {k === 'core@shell'
                      ? 'core@shell (A@B: A core under a B shell)'
                      : `${k}: ${describeArchitecture(k)}`}
                  </span>
                ))}
              </p>
            </>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
