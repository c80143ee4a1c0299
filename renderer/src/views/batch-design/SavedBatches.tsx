/**
 * The saved batches: open one, move it planned → made (its reagents leave the inventory) → characterized
 * (with measured values), undo made (they come back), use as seeds.
 */
import { useState } from 'react';
import type { BatchSummary, StatusChange } from '../../../../shared-model/api/batches';
import { call } from '../../api/client';
import { Banner } from '../../components/Banner';
import { formatNumber } from '../../../../shared-model/text/number-format';
import { InventoryEffectNote } from './InventoryEffectNote';
import { readMeasured } from './records-form';

type Measured = { diameterNm?: number; particlesPerMl?: number };

export function SavedBatches(props: {
  batches: BatchSummary[];
  onOpen: (id: number) => void;
  onUseAsSeeds: (batch: BatchSummary) => void;
  onChanged: () => void;
}) {
  const [error, setError] = useState<string | null>(null);
  const [measuring, setMeasuring] = useState<number | null>(null);
  const [diameter, setDiameter] = useState('');
  const [conc, setConc] = useState('');
  const [changed, setChanged] = useState<StatusChange | null>(null);
  const move = async (batch: BatchSummary, status: 'made' | 'characterized' | 'planned', measured?: Measured) => {
    const result = await call('batches.setStatus', { id: batch.id, status, ...(measured ? { measured } : {}) });
    if (!result.ok) setError(result.error.message);
    else {
      setError(null);
      setMeasuring(null);
      setChanged(result.value);
      props.onChanged();
    }
  };
  const characterize = (batch: BatchSummary) => {
    const reading = readMeasured(diameter, conc);
    if (!reading.ok) setError(reading.message);
    else void move(batch, 'characterized', reading.measured);
  };
  if (props.batches.length === 0) {
    return <p className="muted">No saved batches here yet. Compute a batch and save it as planned.</p>;
  }
  return (
    <>
      {error ? <Banner tone="error">{error}</Banner> : null}
      {changed ? <InventoryEffectNote change={changed} /> : null}
      <table className="data-table" aria-label="Saved batches">
        <thead>
          <tr>
            <th className="num">#</th>
            <th>Name</th>
            <th>Pair</th>
            <th>Target</th>
            <th>Route</th>
            <th className="num">nm</th>
            <th>Status</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {props.batches.map((b) => (
            <tr key={b.id} data-batch={b.name}>
              <td className="num">{b.id}</td>
              <td>
                {b.name}
                {b.seedBatchId ? <span className="tag tag--muted">seeds #{b.seedBatchId}</span> : null}
                {b.catalogChanged ? <span className="tag tag--caution">catalog changed since</span> : null}
              </td>
              <td className="pair-symbol">
                {b.elementA}–{b.elementB}
              </td>
              <td>{b.target}</td>
              <td>{b.route}</td>
              <td className="num">{formatNumber(b.diameterNm, 3)}</td>
              <td data-status={b.status}>{b.status}</td>
              <td className="row-actions">
                <button type="button" className="button--quiet" onClick={() => props.onOpen(b.id)}>
                  Open
                </button>
                {b.status === 'planned' ? (
                  <button type="button" className="button--quiet" onClick={() => void move(b, 'made')}>
                    Mark made
                  </button>
                ) : null}
                {b.status === 'made' ? (
                  <button type="button" className="button--quiet" onClick={() => void move(b, 'planned')}>
                    Undo made
                  </button>
                ) : null}
                {b.status === 'characterized' ? (
                  <button type="button" className="button--quiet" onClick={() => void move(b, 'planned')}>
                    Back to planned
                  </button>
                ) : null}
                {b.status === 'made' && measuring !== b.id ? (
                  <button type="button" className="button--quiet" onClick={() => setMeasuring(b.id)}>
                    Characterized…
                  </button>
                ) : null}
                {measuring === b.id ? (
                  <span className="inline-form">
                    <input
                      aria-label="Measured diameter (nm)"
                      placeholder="d, nm"
                      value={diameter}
                      onChange={(e) => setDiameter(e.target.value)}
                      size={6}
                    />
                    <input
                      aria-label="Measured particles per mL"
                      placeholder="particles/mL"
                      value={conc}
                      onChange={(e) => setConc(e.target.value)}
                      size={10}
                    />
                    <button type="button" onClick={() => characterize(b)}>
                      Save
                    </button>
                  </span>
                ) : null}
                {b.route !== 'seed-mediated' && b.status !== 'planned' ? (
                  <button type="button" className="button--quiet" onClick={() => props.onUseAsSeeds(b)}>
                    Use as seeds
                  </button>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}
