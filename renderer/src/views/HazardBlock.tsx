/** Hazard cautions: signal word, pictograms, H-statements, incompatibilities, waste streams, the standing caution. */
import type { HazardSummary } from '../../../shared-model/hazards/summary';

const SEVERITY_LABEL: Record<string, string> = { danger: 'Danger', caution: 'Caution', info: 'Note' };

export function HazardBlock(props: { summary: HazardSummary; title?: string; perReagent?: boolean }) {
  const { summary } = props;
  return (
    <section className="card hazard-block" aria-label={props.title ?? 'Hazard cautions'}>
      <h2 className="card__title">{props.title ?? 'Hazard cautions'}</h2>
      <p className="hazard-block__headline">
        <span
          className={`signal-word signal-word--${(summary.signalWord ?? 'none').toLowerCase()}`}
          data-testid="signal-word"
        >
          {summary.signalWord ?? 'No signal word'}
        </span>
        {summary.pictograms.map((p) => (
          <span key={p.code} className="pictogram" title={p.name}>
            {p.code} <span className="muted small">{p.name}</span>
          </span>
        ))}
      </p>
      {summary.hazards.length > 0 ? (
        <table className="data-table hazard-table" aria-label="Hazard statements">
          <thead>
            <tr>
              <th>Code</th>
              <th>Statement (UN GHS)</th>
              <th>From</th>
            </tr>
          </thead>
          <tbody>
            {summary.hazards.map((h) => (
              <tr key={h.code} data-hcode={h.code}>
                <td className="hcode">{h.code}</td>
                <td>{h.text}</td>
                <td className="muted small">{h.reagents.join(', ')}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="muted">None of these reagents carries a GHS hazard statement in its typical classification.</p>
      )}
      {summary.warnings.length > 0 ? (
        <ul className="warning-list" aria-label="Incompatibilities and cautions">
          {summary.warnings.map((w) => (
            <li key={w.id} className={`warning warning--${w.severity}`} data-warning={w.id}>
              <strong>{SEVERITY_LABEL[w.severity] ?? w.severity}:</strong> {w.message}
            </li>
          ))}
        </ul>
      ) : null}
      {props.perReagent ? (
        <details className="per-reagent">
          <summary>Per reagent</summary>
          <ul>
            {summary.perReagent.map((r) => (
              <li key={r.key}>
                <strong>{r.name}</strong> — {r.signalWord ?? 'no signal word'}
                {r.pictograms.length ? `; ${r.pictograms.map((p) => p.code).join(' ')}` : ''}
                {r.hazards.length ? `; ${r.hazards.map((h) => h.code).join(' ')}` : ''}. Waste: {r.wasteStream.label}.
                {r.note ? ` ${r.note}` : ''} <span className="muted small">({r.source})</span>
              </li>
            ))}
          </ul>
        </details>
      ) : null}
      {summary.wasteStreams.length > 0 ? (
        <div className="waste">
          <h3 className="small">Waste streams</h3>
          <ul>
            {summary.wasteStreams.map((w) => (
              <li key={w.id}>
                <strong>{w.label}:</strong> {w.instruction}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      <p className="standing-caution" data-testid="standing-caution">
        {summary.caution}
      </p>
    </section>
  );
}
