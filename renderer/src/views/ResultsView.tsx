/**
 * Results: what characterization showed for each made batch (TEM sizes, composition, EDX line scans, the
 * observed architecture) and, per campaign, predictions against outcomes with a confusion matrix, and the
 * import of a history table of past syntheses (Import history).
 */
import { useCallback, useEffect, useState } from 'react';
import type { RecordedOutcome } from '../../../shared-model/api/outcomes';
import { useQuery } from '../api/hooks';
import { useAppState } from '../app-state';
import { Banner } from '../components/Banner';
import { CampaignResults } from './results/CampaignResults';
import { CompositionPanel } from './results/CompositionPanel';
import { HistoryImportPanel } from './results/HistoryImportPanel';
import { LineScanPanel } from './results/LineScanPanel';
import { ObservedPanel } from './results/ObservedPanel';
import { SizesPanel } from './results/SizesPanel';
import { statusChangeText } from './results/status-change';
import './results/results.css';

function BatchResults(props: { batchId: number; revision: number; onChanged: () => void }) {
  const outcome = useQuery('outcomes.get', { batchId: props.batchId }, `${props.batchId}:${props.revision}`);
  // what the last record moved (batch and campaign pair to characterized), shown until another batch opens
  const [moved, setMoved] = useState<{ batchId: number; text: string } | null>(null);
  const o = outcome.data;
  const recorded = useCallback(
    (value?: RecordedOutcome) => {
      if (value && o) {
        const text = statusChangeText(value.statusChanges, o.batchName, `${o.elementA}–${o.elementB}`);
        if (text !== null) setMoved({ batchId: o.batchId, text });
      }
      props.onChanged();
    },
    [o, props],
  );
  if (outcome.error) return <Banner tone="error">{outcome.error.message}</Banner>;
  if (!o || o.batchId !== props.batchId) return <p className="muted">Loading…</p>;
  const onChanged = recorded;
  return (
    <>
      {moved && moved.batchId === o.batchId ? (
        <div data-testid="status-moves">
          <Banner tone="info">{moved.text}</Banner>
        </div>
      ) : null}
      <p className="muted" data-testid="batch-heading">
        {o.batchName}: {o.elementA}–{o.elementB}, target {o.targetLabel ?? '–'}
        {o.targetDiameterNm !== null ? `, ${o.targetDiameterNm} nm` : ''}
        {o.nominalXB !== null ? `, ${(o.nominalXB * 100).toFixed(1)} at.% ${o.elementB} in the feed` : ''}
      </p>
      <div className="results-grid">
        <SizesPanel key={`sizes:${o.batchId}`} outcome={o} onChanged={onChanged} />
        <CompositionPanel key={`composition:${o.batchId}`} outcome={o} onChanged={onChanged} />
      </div>
      <LineScanPanel key={`scans:${o.batchId}`} outcome={o} onChanged={onChanged} />
      <ObservedPanel key={`observed:${o.batchId}:${o.observed?.updatedAt ?? ''}`} outcome={o} onChanged={onChanged} />
    </>
  );
}

export function ResultsView() {
  const { campaignId, revision, bumpRevision } = useAppState();
  const [mode, setMode] = useState<'batch' | 'campaign' | 'history'>('batch');
  const [batchId, setBatchId] = useState<number | null>(null);
  const batches = useQuery('batches.list', campaignId !== null ? { campaignId } : {}, `${campaignId}:${revision}`);
  const list = batches.data ?? [];
  const firstId = list[0]?.id ?? null;
  useEffect(() => {
    if (batches.data && (batchId === null || !batches.data.some((b) => b.id === batchId))) setBatchId(firstId);
  }, [batches.data, batchId, firstId]);
  const openBatch = useCallback((id: number) => {
    setBatchId(id);
    setMode('batch');
  }, []);

  return (
    <section className="view" aria-labelledby="results-title">
      <header className="view__header">
        <h1 id="results-title">Results</h1>
        <div className="results-tabs" role="group" aria-label="Results scope">
          <button type="button" aria-pressed={mode === 'batch'} onClick={() => setMode('batch')}>
            Per batch
          </button>
          <button
            type="button"
            aria-pressed={mode === 'campaign'}
            onClick={() => setMode('campaign')}
            disabled={campaignId === null}
          >
            Per campaign
          </button>
          <button
            type="button"
            aria-pressed={mode === 'history'}
            onClick={() => setMode('history')}
            disabled={campaignId === null}
          >
            Import history
          </button>
        </div>
      </header>
      {batches.error ? <Banner tone="error">{batches.error.message}</Banner> : null}
      {mode === 'batch' ? (
        <>
          {batches.data && list.length === 0 ? (
            <div className="card muted" data-testid="no-batches">
              No saved batches {campaignId !== null ? 'in this campaign ' : ''}yet. Save a batch in Batch design; its
              TEM sizes, composition and line scans are recorded here once it is made.
            </div>
          ) : null}
          {list.length > 0 ? (
            <label className="toggle">
              Batch{' '}
              <select
                name="batch"
                value={batchId ?? ''}
                onChange={(event) => setBatchId(Number(event.target.value))}
                aria-label="Batch"
              >
                {list.map((b) => (
                  <option key={b.id} value={b.id}>
                    {b.name} ({b.elementA}–{b.elementB}, {b.status})
                  </option>
                ))}
              </select>
            </label>
          ) : null}
          {batchId !== null ? <BatchResults batchId={batchId} revision={revision} onChanged={bumpRevision} /> : null}
        </>
      ) : mode === 'history' && campaignId !== null ? (
        <HistoryImportPanel campaignId={campaignId} revision={revision} onChanged={bumpRevision} />
      ) : campaignId !== null ? (
        <CampaignResults campaignId={campaignId} revision={revision} onOpenBatch={openBatch} />
      ) : (
        <p className="muted">Choose a campaign first.</p>
      )}
    </section>
  );
}
