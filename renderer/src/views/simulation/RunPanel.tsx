/** One run, polled while queued or running: progress bar, live traces and Cancel; its result once done. */
import { useEffect, useState } from 'react';
import type { SimulationRun } from '../../../../shared-model/api/simulation';
import { shapeLabel } from '../../../../shared-model/geometry/shapes';
import { call } from '../../api/client';
import { Banner } from '../../components/Banner';
import { pct } from './format';
import { ResultPanel } from './ResultPanel';
import { Traces } from './Traces';
import { progressPoints } from './traces';

function progressText(run: SimulationRun): string {
  if (run.status === 'queued') return 'Waiting for a free worker…';
  const p = run.progress;
  if (!p) return 'Starting…';
  const where = `sweep ${p.sweep} of ${p.totalSweeps} (${p.phase}, ${p.temperatureK.toFixed(0)} K)`;
  const surface = `surface ${run.spec.elementB} ${pct(p.surfaceXB)}`;
  return `${where}, E/N ${p.energyPerAtomEv.toFixed(4)} eV, ${surface}, acceptance ${pct(p.acceptance)}`;
}

export function RunPanel(props: { id: number; onChanged: () => void }) {
  const { id, onChanged } = props;
  const [run, setRun] = useState<SimulationRun | null>(null);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    let live = true;
    let timer: ReturnType<typeof setTimeout> | null = null;
    const load = async () => {
      const result = await call('simulation.get', { id });
      if (!live) return;
      if (!result.ok) {
        setError(result.error.message);
        return;
      }
      setRun(result.value);
      setError(null);
      if (result.value.status === 'queued' || result.value.status === 'running') timer = setTimeout(load, 400);
      else onChanged();
    };
    setRun(null);
    void load();
    return () => {
      live = false;
      if (timer) clearTimeout(timer);
    };
  }, [id, onChanged]);

  const cancel = async () => {
    const result = await call('simulation.cancel', { id });
    if (!result.ok) setError(result.error.message);
  };

  if (error) return <Banner tone="error">{error}</Banner>;
  if (!run) return <p className="muted">Loading run {id}…</p>;
  const active = run.status === 'queued' || run.status === 'running';
  const fraction = run.progress ? run.progress.sweep / run.progress.totalSweeps : 0;
  const spec = run.spec;
  return (
    <section className="card" aria-label={`Run ${run.id}`} data-testid="sim-run">
      <div className="view__header" style={{ marginBottom: 8 }}>
        <h2 className="card__title">
          Run {run.id}: {spec.elementA}-{spec.elementB}, x({spec.elementB}) = {spec.xB}, {shapeLabel(spec.shape)},{' '}
          {run.atoms} atoms, {spec.anneal ? `${spec.anneal.startTemperatureK} → ` : ''}
          {spec.temperatureK} K
        </h2>
        <span className="tag tag--muted" data-testid="sim-status">
          {run.status}
        </span>
      </div>
      {active ? (
        <div className="stack">
          <div
            className="sim-progress"
            role="progressbar"
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={Math.round(100 * fraction)}
            data-testid="sim-progress"
          >
            <div className="sim-progress__bar" style={{ width: `${(100 * fraction).toFixed(1)}%` }} />
          </div>
          <p className="small">{progressText(run)}</p>
          <div className="form-actions">
            <button type="button" className="button--danger" onClick={cancel}>
              Cancel
            </button>
          </div>
          {run.progressHistory.length > 0 ? (
            <Traces points={progressPoints(run.progressHistory)} elementB={spec.elementB} xB={spec.xB} />
          ) : null}
        </div>
      ) : null}
      {run.status === 'done' && run.result ? <ResultPanel run={run} result={run.result} /> : null}
      {run.status === 'failed' || run.status === 'cancelled' ? (
        <Banner tone={run.status === 'failed' ? 'error' : 'info'}>{run.error ?? run.status}</Banner>
      ) : null}
    </section>
  );
}
