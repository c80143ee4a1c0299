/** What an opened saved batch was computed with: catalog changes since, stale stocks, lots. */
import type { SavedBatch } from '../../../../shared-model/api/batches';
import { Banner } from '../../components/Banner';
import { formatHours } from '../../../../shared-model/recipes/stocks';

export function OpenedBatchBanner({ batch }: { batch: SavedBatch }) {
  const changes = batch.catalogChanges;
  const changed = changes
    .map((c) => `${c.name} (revision ${c.savedRevision} → ${c.currentRevision ?? 'removed'})`)
    .join(', ');
  const savedAt = batch.createdAt.slice(0, 16).replace('T', ' ');
  return (
    <Banner tone={changes.length > 0 ? 'caution' : 'info'} testId="opened-batch">
      Batch #{batch.id} “{batch.name}”, {batch.status}, saved {savedAt} with the values shown.
      {changes.length > 0
        ? ` The catalog changed since: ${changed}. The amounts below are those saved; design again to use the new ` +
          'entries.'
        : ''}
      {batch.stockAges
        .filter((s) => s.stale)
        .map((s) => ` The ${s.name} stock is ${formatHours(s.ageHours)} old, beyond its limit.`)}
      {batch.lots.length > 0 ? ` Lots: ${batch.lots.map((l) => `${l.reagentKey} ${l.lot}`).join(', ')}.` : ''}
      {batch.history.length > 0 ? (
        <ol className="small" aria-label="Batch history">
          {batch.history.map((line) => (
            <li key={line.id}>
              {line.at.slice(0, 16).replace('T', ' ')} — {line.text}
            </li>
          ))}
        </ol>
      ) : null}
    </Banner>
  );
}
