/** The stored runs, newest first; a click opens one. */
import type { SimulationRunSummary } from '../../../../shared-model/api/simulation';

function statusText(run: SimulationRunSummary): string {
  if (run.status === 'running' && run.progress)
    return `${Math.round((100 * run.progress.sweep) / run.progress.totalSweeps)} %`;
  return run.status;
}

export function StoredRuns(props: {
  runs: SimulationRunSummary[];
  selected: number | null;
  onSelect: (id: number) => void;
}) {
  return (
    <section className="card" aria-label="Stored runs">
      <h2 className="card__title">Stored runs</h2>
      {props.runs.length === 0 ? (
        <p className="muted small">No runs yet.</p>
      ) : (
        <table className="data-table sim-runs" aria-label="Simulation runs">
          <thead>
            <tr>
              <th scope="col">#</th>
              <th scope="col">pair</th>
              <th scope="col" className="num">
                atoms
              </th>
              <th scope="col" className="num">
                T, K
              </th>
              <th scope="col">status</th>
              <th scope="col">architecture</th>
            </tr>
          </thead>
          <tbody>
            {props.runs.map((r) => (
              <tr
                key={r.id}
                aria-selected={r.id === props.selected}
                onClick={() => props.onSelect(r.id)}
                data-run={r.id}
              >
                <td>{r.id}</td>
                <td>
                  {r.spec.elementA}-{r.spec.elementB} {Math.round(100 * r.spec.xB)} %
                </td>
                <td className="num">{r.atoms}</td>
                <td className="num">{r.spec.temperatureK}</td>
                <td>{statusText(r)}</td>
                <td>{r.architecture ?? '–'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
