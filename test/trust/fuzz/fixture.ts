/**
 * The store every operation is fuzzed against: the demo campaign (pairs, batches made and characterized, sizes,
 * compositions, line scans, observations, inventory, predictions), the demo history table imported into it, a
 * retrained model and a stored proposal set, a metal price, a recorded file and a finished 13-atom Monte Carlo run.
 * It is built once per test file, closed, and copied into a fresh folder for each operation, so every operation
 * starts from the same store and each test runs alone.
 */
import { copyFileSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { openStore, STORE_FILE_NAME, type Store } from '../../../db/store';
import type { ServiceContext } from '../../../electron/services/context';
import { dispatch } from '../../../electron/services/dispatch';
import { shutdownServices } from '../../../electron/services/lifecycle';
import type { SavedBatch, BatchSummary, CatalogReagent, InventoryRecord } from '../../../shared-model/api/batches';
import type { Campaign } from '../../../shared-model/api/campaigns';
import type { HistoryImportResult, LearnJob } from '../../../shared-model/api/learn';
import type { BatchOutcome } from '../../../shared-model/api/outcomes';
import type { CandidatePair } from '../../../shared-model/api/pairs';
import type { SimulationRunSummary, XyzExport } from '../../../shared-model/api/simulation';
import { tempDir } from '../../support/temp-dirs';

export interface FixtureIds {
  campaignId: number;
  pairId: number;
  pairText: string;
  batchIds: number[];
  batch: SavedBatch;
  outcomeBatchId: number;
  sizeImportId: number;
  lineScanId: number;
  fileId: number;
  importId: number;
  jobId: number;
  runId: number;
  inventoryId: number;
  reagent: CatalogReagent;
  xyz: string;
  historyCsv: string;
  sizeCsv: string;
  lineScanCsv: string;
  dataDir: string;
}

async function value<T>(context: ServiceContext, name: string, input: unknown): Promise<T> {
  const result = await dispatch(context, name, input);
  if (!result.ok) throw new Error(`fixture: ${name}: ${result.error.message}`);
  return result.value as T;
}

export async function waitFor<T>(read: () => Promise<T>, done: (value: T) => boolean, what: string): Promise<T> {
  const until = Date.now() + 30_000;
  for (;;) {
    const current = await read();
    if (done(current)) return current;
    if (Date.now() > until) throw new Error(`fixture: ${what} did not finish within 30 s`);
    await new Promise((r) => setTimeout(r, 20));
  }
}

/** 60 diameters (nm) from a fixed sequence around 8 nm, one per line under a header. */
export function sizeCsvText(): string {
  const lines = ['diameter_nm'];
  for (let i = 0; i < 60; i++) lines.push((8 + 1.5 * Math.sin(i * 1.7) + 0.3 * Math.cos(i * 0.9)).toFixed(2));
  return lines.join('\n') + '\n';
}

/** A 24-point Au/Pd line scan across a 10 nm alloy particle (counts), position in nm. */
export function lineScanCsvText(): string {
  const lines = ['position_nm,Au,Pd'];
  for (let i = 0; i < 24; i++) {
    const x = i * 0.6;
    const chord = Math.sqrt(Math.max(0, 25 - (x - 7) ** 2));
    lines.push(`${x.toFixed(2)},${(5 + 40 * chord).toFixed(1)},${(4 + 38 * chord).toFixed(1)}`);
  }
  return lines.join('\n') + '\n';
}

export interface FixtureTemplate {
  file: string;
  ids: Omit<FixtureIds, 'dataDir'>;
}

export async function buildTemplate(): Promise<FixtureTemplate> {
  const dataDir = tempDir('pairwright-fuzz-template-');
  const store = openStore({ dataDir, dailyBackup: false });
  const context = { store };
  try {
    const campaign = await value<Campaign>(context, 'campaigns.loadDemo', {});
    const pairs = await value<CandidatePair[]>(context, 'pairs.list', { campaignId: campaign.id });
    const pair = pairs[0]!;
    const batches = await value<BatchSummary[]>(context, 'batches.list', { includeArchived: true });
    let outcome: BatchOutcome | null = null;
    for (const b of batches) {
      const o = await value<BatchOutcome>(context, 'outcomes.get', { batchId: b.id });
      if (o.sizes.length > 0 && o.lineScans.length > 0) outcome = o;
    }
    if (!outcome) throw new Error('fixture: the demo has no batch with sizes and a line scan');
    await value(context, 'outcomes.record', {
      batchId: outcome.batchId,
      files: [{ path: '/data/tem/batch-1.tif', kind: 'image', note: 'fuzz fixture' }],
    });
    const withFile = await value<BatchOutcome>(context, 'outcomes.get', { batchId: outcome.batchId });
    const batch = await value<SavedBatch>(context, 'batches.get', { id: batches[0]!.id });
    const historyCsv = readFileSync(join(import.meta.dirname, '../../../docs/demo-history.csv'), 'utf8');
    const imported = await value<HistoryImportResult>(context, 'learn.importHistory', {
      campaignId: campaign.id,
      csvText: historyCsv,
      fileName: 'demo-history.csv',
    });
    await value(context, 'learn.setPrice', { symbol: 'Pt', pricePerGram: 30, pricedOn: '2026-11-02' });
    const job = await value<LearnJob>(context, 'learn.retrain', { campaignId: campaign.id });
    await waitFor(
      () => value<LearnJob>(context, 'learn.job', { jobId: job.id }),
      (j) => j.status !== 'running',
      'the retrain job',
    );
    await value(context, 'learn.propose', { campaignId: campaign.id, target: 'alloy', count: 3 });
    const run = await value<SimulationRunSummary>(context, 'simulation.start', {
      elementA: 'Au',
      elementB: 'Pd',
      xB: 0.5,
      shape: 'cuboctahedron',
      shells: 1,
      temperatureK: 600,
      sweeps: 20,
    });
    const finished = await waitFor(
      () => value<SimulationRunSummary>(context, 'simulation.status', { id: run.id }),
      (r) => r.status !== 'queued' && r.status !== 'running',
      'the fixture Monte Carlo run',
    );
    if (finished.status !== 'done') throw new Error(`fixture: the Monte Carlo run ended ${finished.status}`);
    const xyz = await value<XyzExport>(context, 'simulation.exportXyz', { id: run.id });
    const inventory = await value<InventoryRecord[]>(context, 'inventory.list', {});
    const catalog = await value<CatalogReagent[]>(context, 'reagents.catalog', {});
    const ids: FixtureTemplate['ids'] = {
      campaignId: campaign.id,
      pairId: pair.id,
      pairText: `${pair.elementA}-${pair.elementB}`,
      batchIds: batches.map((b) => b.id),
      batch,
      outcomeBatchId: outcome.batchId,
      sizeImportId: outcome.sizes[0]!.id,
      lineScanId: outcome.lineScans[0]!.id,
      fileId: withFile.files[0]!.id,
      importId: imported.import.id,
      jobId: job.id,
      runId: run.id,
      inventoryId: inventory[0]!.id,
      reagent: catalog.find((r) => r.metal)!,
      xyz: xyz.content,
      historyCsv,
      sizeCsv: sizeCsvText(),
      lineScanCsv: lineScanCsvText(),
    };
    return { file: join(dataDir, STORE_FILE_NAME), ids };
  } finally {
    await shutdownServices(store);
  }
}

/** A fresh copy of the template store in its own folder (removed after the test that made it). */
export function openCopy(template: FixtureTemplate): { store: Store; ids: FixtureIds } {
  const dataDir = tempDir('pairwright-fuzz-');
  copyFileSync(template.file, join(dataDir, STORE_FILE_NAME));
  const store = openStore({ dataDir, dailyBackup: false });
  return { store, ids: { ...template.ids, dataDir } };
}
