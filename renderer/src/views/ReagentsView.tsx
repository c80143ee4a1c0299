/**
 * Reagents: pick the current campaign's planned batches → totals per reagent against the inventory (shortfalls highlighted),
 * hazard summary across the list, CSV export and a printable page; the inventory and the catalog are
 * edited here too. The parts live in ./reagents/ (the form models in reagent-form.ts and inventory-form.ts,
 * testable without a browser).
 */
import { useMemo, useState } from 'react';
import { call, printPage } from '../api/client';
import { useQuery } from '../api/hooks';
import { useAppState } from '../app-state';
import { Banner } from '../components/Banner';
import { HazardBlock } from './HazardBlock';
import { BatchPicker } from './reagents/BatchPicker';
import { CatalogEditor } from './reagents/CatalogEditor';
import { downloadText } from './reagents/download';
import { InventoryPanel } from './reagents/InventoryPanel';
import { ReagentTotals } from './reagents/ReagentTotals';
import './batches.css';

export function ReagentsView() {
  const { campaignId, revision, bumpRevision } = useAppState();
  const [showAll, setShowAll] = useState(false);
  const [everyCampaign, setEveryCampaign] = useState(false);
  const scope = everyCampaign || campaignId === null ? { includeArchived: everyCampaign } : { campaignId };
  const batchFilter = showAll ? scope : { ...scope, status: 'planned' as const };
  const batchesQuery = useQuery(
    'batches.list',
    batchFilter,
    `reagents-batches:${JSON.stringify(batchFilter)}:${revision}`,
  );
  const campaignsQuery = useQuery('campaigns.list', { includeArchived: true }, `reagents-campaigns:${revision}`);
  const campaignNames = useMemo(
    () => new Map((campaignsQuery.data ?? []).map((c) => [c.id, c.name])),
    [campaignsQuery.data],
  );
  const catalogQuery = useQuery('reagents.catalog', {}, `reagents-catalog:${revision}`);
  const inventoryQuery = useQuery('inventory.list', {}, `inventory:${revision}`);
  const [selected, setSelected] = useState<number[]>([]);
  const visibleIds = useMemo(() => new Set((batchesQuery.data ?? []).map((b) => b.id)), [batchesQuery.data]);
  const chosen = selected.filter((id) => visibleIds.has(id));
  const listQuery = useQuery(
    'reagents.list',
    chosen.length > 0 ? { batchIds: chosen } : null,
    `reagent-list:${chosen.join(',')}:${revision}`,
  );
  const [message, setMessage] = useState<string | null>(null);
  const list = listQuery.data;

  const toggle = (id: number) => setSelected((s) => (s.includes(id) ? s.filter((x) => x !== id) : [...s, id]));
  const exportCsv = async () => {
    const result = await call('reagents.csv', { batchIds: chosen });
    if (!result.ok) {
      setMessage(result.error.message);
      return;
    }
    downloadText(result.value.filename, result.value.csv);
    setMessage(`Exported ${result.value.filename}.`);
  };
  const print = async () => {
    try {
      const savedTo = await printPage(`pairwright-reagents-${chosen.join('-')}.pdf`);
      setMessage(savedTo ? `Saved ${savedTo}.` : null);
    } catch (error) {
      setMessage(error instanceof Error ? error.message : String(error));
    }
  };
  const removeItem = async (id: number) => {
    const result = await call('inventory.remove', { id });
    if (!result.ok) setMessage(result.error.message);
    else bumpRevision();
  };

  return (
    <section className="view reagents-view" aria-labelledby="reagents-title">
      <header className="view__header">
        <h1 id="reagents-title">Reagents</h1>
        <span className="muted">Totals for the batches you choose, against your inventory</span>
      </header>
      <div className="split">
        <div className="split__side no-print">
          <BatchPicker
            batches={batchesQuery.data ?? []}
            error={batchesQuery.error}
            showAll={showAll}
            onShowAll={setShowAll}
            everyCampaign={everyCampaign}
            onEveryCampaign={setEveryCampaign}
            campaignName={campaignId !== null ? (campaignNames.get(campaignId) ?? null) : null}
            selected={selected}
            onToggle={toggle}
          />
          <InventoryPanel
            catalog={catalogQuery.data ?? []}
            items={inventoryQuery.data ?? []}
            onSaved={bumpRevision}
            onRemove={(id) => void removeItem(id)}
          />
        </div>

        <div className="stack printable">
          <section className="card" aria-label="Reagent list">
            <div className="card__header">
              <h2 className="card__title">
                Reagent list{chosen.length > 0 ? ` for batches ${chosen.map((id) => `#${id}`).join(', ')}` : ''}
              </h2>
              <span className="no-print card__actions">
                <button type="button" onClick={() => void exportCsv()} disabled={chosen.length === 0}>
                  Export CSV
                </button>
                <button type="button" onClick={() => void print()} disabled={chosen.length === 0}>
                  Print / PDF
                </button>
              </span>
            </div>
            {chosen.length > 0 ? (
              <ul className="small" aria-label="Batches in this list">
                {(batchesQuery.data ?? [])
                  .filter((b) => chosen.includes(b.id))
                  .map((b) => (
                    <li key={b.id}>
                      #{b.id} {b.name}, saved {b.createdAt.slice(0, 10)} —{' '}
                      {b.campaignId !== null
                        ? `campaign ${campaignNames.get(b.campaignId) ?? `#${b.campaignId}`}`
                        : 'no campaign'}
                    </li>
                  ))}
              </ul>
            ) : null}
            {message ? (
              <div className="no-print">
                <Banner tone="info">{message}</Banner>
              </div>
            ) : null}
            {listQuery.error ? <Banner tone="error">{listQuery.error.message}</Banner> : null}
            {!list ? (
              <p className="muted">Tick the batches you will make to total their reagents.</p>
            ) : (
              <ReagentTotals list={list} />
            )}
          </section>
          {list ? (
            <HazardBlock
              summary={list.hazardSummary}
              title="Hazard summary across the list (incompatibilities batch by batch)"
              perReagent
            />
          ) : null}
          <CatalogEditor catalog={catalogQuery.data ?? []} onSaved={bumpRevision} />
        </div>
      </div>
    </section>
  );
}
