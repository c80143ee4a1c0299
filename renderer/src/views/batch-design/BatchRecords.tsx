/** Lots and stock-solution dates of a saved batch (what makes it reproducible); amounts stay as saved. */
import { useState } from 'react';
import type { SavedBatch } from '../../../../shared-model/api/batches';
import type { ApiError } from '../../../../shared-model/api/result';
import { call } from '../../api/client';
import { Banner } from '../../components/Banner';
import { localDateTimeText, stockAgeText, stocksFromDates } from './records-form';

export function BatchRecords(props: { batch: SavedBatch; onSaved: (batch: SavedBatch) => void }) {
  const { batch } = props;
  const reagents = batch.design.reagents.filter((r) => r.role !== 'seeds' && r.massMg !== null);
  const [lots, setLots] = useState<Record<string, string>>(() =>
    Object.fromEntries(batch.lots.map((l) => [l.reagentKey, l.lot])),
  );
  const [dates, setDates] = useState<Record<string, string>>(() =>
    Object.fromEntries(batch.stockAges.map((s) => [s.reagentKey, localDateTimeText(s.preparedAt)])),
  );
  const [error, setError] = useState<ApiError | null>(null);
  const save = async () => {
    const result = await call('batches.record', {
      id: batch.id,
      lots: Object.entries(lots).map(([reagentKey, lot]) => ({ reagentKey, lot })),
      stocks: stocksFromDates(dates),
    });
    if (!result.ok) {
      setError(result.error);
      return;
    }
    setError(null);
    props.onSaved(result.value);
  };
  const ages = new Map(batch.stockAges.map((s) => [s.reagentKey, s]));
  return (
    <section className="card" aria-label="Lots and stock solutions">
      <h2 className="card__title">Lots and stock solutions of batch #{batch.id}</h2>
      <table className="data-table">
        <thead>
          <tr>
            <th>Reagent</th>
            <th>Lot</th>
            <th>Stock prepared</th>
            <th>Age</th>
          </tr>
        </thead>
        <tbody>
          {reagents.map((r) => {
            const age = ages.get(r.key);
            return (
              <tr key={r.key} data-record={r.key}>
                <td>{r.name}</td>
                <td>
                  <input
                    aria-label={`Lot of ${r.name}`}
                    value={lots[r.key] ?? ''}
                    onChange={(e) => setLots((s) => ({ ...s, [r.key]: e.target.value }))}
                  />
                </td>
                <td>
                  <input
                    type="datetime-local"
                    aria-label={`Stock of ${r.name} prepared`}
                    value={dates[r.key] ?? ''}
                    onChange={(e) => setDates((s) => ({ ...s, [r.key]: e.target.value }))}
                  />
                </td>
                <td className={age?.stale ? 'stale' : undefined}>{stockAgeText(age)}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <div className="form-actions">
        <button type="button" onClick={() => void save()}>
          Save lots and dates
        </button>
      </div>
      {error ? <Banner tone="error">{error.message}</Banner> : null}
    </section>
  );
}
