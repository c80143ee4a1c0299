/**
 * Bench sheet: the printable page of one saved batch of the current campaign (reagents and volumes to pipette,
 * order of addition, GHS pictograms, H- and P-statements, in-batch incompatibilities, waste, record lines).
 * Printing gives a PDF in the desktop app and the browser's print dialog in a tab; the sidebar never prints.
 */
import { useEffect, useState } from 'react';
import { BENCH_SHEET_CSS, benchSheetSection } from '../../../shared-model/benchsheet/sheet-html';
import { printPage } from '../api/client';
import { useQuery } from '../api/hooks';
import { useAppState } from '../app-state';

export function BenchSheetView() {
  const { campaignId, revision } = useAppState();
  const batches = useQuery(
    'batches.list',
    campaignId === null ? null : { campaignId },
    `sheet-list:${campaignId}:${revision}`,
  );
  const [batchId, setBatchId] = useState<number | null>(null);
  const [printMessage, setPrintMessage] = useState<string | null>(null);
  useEffect(() => {
    const list = batches.data ?? [];
    if (list.length > 0 && !list.some((b) => b.id === batchId)) setBatchId(list[0]?.id ?? null);
  }, [batches.data, batchId]);
  const sheet = useQuery('batches.sheet', batchId === null ? null : { id: batchId }, `sheet:${batchId}:${revision}`);

  const print = async () => {
    try {
      const savedTo = await printPage(`bench-sheet-${sheet.data?.sheet.batchName ?? batchId}.pdf`);
      setPrintMessage(savedTo ? `Saved ${savedTo}` : null);
    } catch (error) {
      setPrintMessage(`Printing failed: ${error instanceof Error ? error.message : String(error)}`);
    }
  };

  return (
    <div className="view bench-sheet-view">
      <style>{BENCH_SHEET_CSS}</style>
      <header className="view__header no-print">
        <h1>Bench sheet</h1>
        <label>
          Batch{' '}
          <select
            aria-label="Batch"
            value={batchId ?? ''}
            onChange={(event) => setBatchId(Number(event.target.value))}
            disabled={(batches.data ?? []).length === 0}
          >
            {(batches.data ?? []).map((b) => (
              <option key={b.id} value={b.id}>
                {b.name} ({b.status}, {b.createdAt.slice(0, 10)})
              </option>
            ))}
          </select>
        </label>
        <button type="button" onClick={() => void print()} disabled={!sheet.data}>
          Print bench sheet
        </button>
        {printMessage ? <span className="muted">{printMessage}</span> : null}
      </header>
      {campaignId === null ? <p className="muted">Choose a campaign in Campaigns to see its batches.</p> : null}
      {campaignId !== null && batches.data && batches.data.length === 0 ? (
        <p className="muted">This campaign has no saved batches yet: save one in Batch design.</p>
      ) : null}
      {sheet.error ? <p className="banner banner--error">{sheet.error.message}</p> : null}
      {sheet.data ? (
        <div
          className="card bench-sheet-card printable"
          data-testid="bench-sheet"
          // The section is built by shared-model/benchsheet/sheet-html.ts, which escapes every user text.
          dangerouslySetInnerHTML={{ __html: benchSheetSection(sheet.data.sheet) }}
        />
      ) : null}
    </div>
  );
}
