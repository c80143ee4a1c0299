/**
 * The batches to total: the current campaign's planned ones (or all its batches; or every campaign's,
 * archived too); ticking one adds it to the reagent list.
 */
import type { BatchSummary } from '../../../../shared-model/api/batches';
import type { ApiError } from '../../../../shared-model/api/result';
import { Banner } from '../../components/Banner';

export function BatchPicker(props: {
  batches: BatchSummary[];
  error: ApiError | null;
  showAll: boolean;
  onShowAll: (showAll: boolean) => void;
  everyCampaign: boolean;
  onEveryCampaign: (everyCampaign: boolean) => void;
  campaignName: string | null;
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
      <label className="toggle">
        <input
          type="checkbox"
          checked={props.everyCampaign}
          onChange={(e) => props.onEveryCampaign(e.target.checked)}
        />{' '}
        every campaign’s batches, archived ones too
      </label>
      <p className="muted small">
        {props.everyCampaign
          ? 'All batches.'
          : props.campaignName
            ? `Batches of ${props.campaignName}.`
            : 'No campaign chosen: batches of the open campaigns.'}
      </p>
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
