/** The batches to total: planned ones, or all of them; ticking one adds it to the reagent list. */
import type { BatchSummary } from '../../../../shared-model/api/batches';
import type { ApiError } from '../../../../shared-model/api/result';
import { Banner } from '../../components/Banner';

export function BatchPicker(props: {
  batches: BatchSummary[];
  error: ApiError | null;
  showAll: boolean;
  onShowAll: (showAll: boolean) => void;
  selected: number[];
  onToggle: (id: number) => void;
}) {
  return (
    <section className="card" aria-label="Choose batches">
      <h2 className="card__title">Batches</h2>
      <label className="toggle">
        <input type="checkbox" checked={props.showAll} onChange={(e) => props.onShowAll(e.target.checked)} /> include
        made and characterized
      </label>
      {props.error ? <Banner tone="error">{props.error.message}</Banner> : null}
      {props.batches.length === 0 ? (
        <p className="muted">No {props.showAll ? '' : 'planned '}batches. Save one in Batch design.</p>
      ) : null}
      <ul className="batch-picker">
        {props.batches.map((b) => (
          <li key={b.id}>
            <label>
              <input
                type="checkbox"
                checked={props.selected.includes(b.id)}
                onChange={() => props.onToggle(b.id)}
                aria-label={`Batch ${b.id} ${b.name}`}
              />{' '}
              #{b.id} {b.name}{' '}
              <span className="muted small">
                {b.elementA}–{b.elementB}, {b.status}
              </span>
            </label>
          </li>
        ))}
      </ul>
    </section>
  );
}
