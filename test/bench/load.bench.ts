/**
 * Load figures on a large store: 50 campaigns, 5,000 batches (100 a campaign) and 20,000 outcome records with their
 * raw data (per batch: a size import with its diameters, a composition with its measurements, a line scan with its
 * points, an observed architecture), plus the demo history table in every campaign (70 rows, each also stored as a
 * characterized batch: 8,500 batches in all). The store is built fast: the demo campaign is loaded through dispatch,
 * then its rows are copied by direct inserts in one transaction. Then the heaviest view queries, ranking and proposals
 * are timed through dispatch (median of 5, target < 100 ms each), and the peak resident memory of a queue of 20 Monte
 * Carlo runs is read. Figures only; nothing is asserted.
 */
import { readFileSync } from 'node:fs';
import os from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import type { Statement } from 'better-sqlite3';
import { z } from 'zod';
import { openStore, type SqliteDatabase, type Store } from '../../db/store';
import { dispatchKnown } from '../../electron/services/dispatch';
import type { OperationName, OperationOutput } from '../../shared-model/api/contract';
import { shutdownServices } from '../../electron/services/lifecycle';
import { removeTempDir, tempDir } from '../support/temp-dirs';

const CAMPAIGNS = 50;
const BATCHES_PER_CAMPAIGN = 100;
const TARGET_MS = 100;

async function value<Name extends OperationName>(
  store: Store,
  name: Name,
  input: unknown,
): Promise<OperationOutput<Name>> {
  const result = await dispatchKnown({ store }, name, input);
  if (!result.ok) throw new Error(`${name}: ${result.error.message}`);
  return result.value;
}

/** Rows read back by the bench, checked with zod rather than cast. */
const idRow = z.object({ id: z.number() });
const countRow = z.object({ n: z.number() });
const anyRow = z.record(z.string(), z.unknown());

function all<T>(db: SqliteDatabase, sql: string, schema: z.ZodType<T>, ...params: unknown[]): T[] {
  return z.array(schema).parse(db.prepare<unknown[]>(sql).all(...params));
}

function one<T>(db: SqliteDatabase, sql: string, schema: z.ZodType<T>, ...params: unknown[]): T {
  return schema.parse(db.prepare<unknown[]>(sql).get(...params));
}

const ids = (db: SqliteDatabase, sql: string, ...params: unknown[]): number[] =>
  all(db, sql, idRow, ...params).map((r) => r.id);

/** Copies the rows of `table` matching `where` with some columns replaced; returns the new row ids in order. */
function copier(db: SqliteDatabase, table: string, where: string) {
  const columns = all(db, `PRAGMA table_info("${table}")`, z.object({ name: z.string() }));
  const rows = db.prepare<unknown[]>(`SELECT * FROM "${table}" WHERE ${where}`);
  const cache = new Map<string, Statement<unknown[]>>();
  return (params: unknown[], overrides: Record<string, unknown>, dropId = true): number[] => {
    const ids: number[] = [];
    for (const row of z.array(anyRow).parse(rows.all(...params))) {
      const names = columns.map((c) => c.name).filter((n) => !(dropId && n === 'id'));
      const key = names.join(',');
      let insert = cache.get(key);
      if (!insert) {
        insert = db.prepare<unknown[]>(
          `INSERT INTO "${table}" (${names.map((n) => `"${n}"`).join(', ')}) VALUES (${names.map(() => '?').join(', ')})`,
        );
        cache.set(key, insert);
      }
      const info = insert.run(...names.map((n) => (n in overrides ? overrides[n] : row[n])));
      ids.push(Number(info.lastInsertRowid));
    }
    return ids;
  };
}

interface Built {
  store: Store;
  dataDir: string;
  counts: Record<string, number>;
  buildMs: number;
}

async function buildStore(): Promise<Built> {
  const started = performance.now();
  const dataDir = tempDir('pairwright-bench-load-');
  const store = openStore({ dataDir, dailyBackup: false });
  const demo = await value(store, 'campaigns.loadDemo', {});
  const db = store.db;
  const withOutcomes = ids(
    db,
    `SELECT b.id FROM batches b WHERE b.campaign_id = ? AND EXISTS (SELECT 1 FROM outcome_size_imports s WHERE s.batch_id = b.id)
       AND EXISTS (SELECT 1 FROM outcome_line_scans l WHERE l.batch_id = b.id)`,
    demo.id,
  );
  const model = withOutcomes[0];
  if (model === undefined) throw new Error('the demo has no batch with sizes and a line scan');
  const copy = {
    campaign: copier(db, 'campaigns', 'id = ?'),
    pairs: copier(db, 'pairs', 'campaign_id = ?'),
    batch: copier(db, 'batches', 'id = ?'),
    sizes: copier(db, 'outcome_size_imports', 'id = ?'),
    diameters: copier(db, 'outcome_diameters', 'import_id = ?'),
    compositions: copier(db, 'outcome_compositions', 'id = ?'),
    measurements: copier(db, 'outcome_composition_measurements', 'composition_id = ?'),
    scans: copier(db, 'outcome_line_scans', 'id = ?'),
    points: copier(db, 'outcome_line_scan_points', 'scan_id = ?'),
    observation: copier(db, 'outcome_observations', 'batch_id = ?'),
    predictions: copier(db, 'predictions', 'pair_id = ?'),
  };
  const modelBatch = one(
    db,
    'SELECT pair_id FROM batches WHERE id = ?',
    z.object({ pair_id: z.number().nullable() }),
    model,
  );
  const sizeIds = ids(db, 'SELECT id FROM outcome_size_imports WHERE batch_id = ?', model);
  const compositionIds = ids(db, 'SELECT id FROM outcome_compositions WHERE batch_id = ?', model);
  const scanIds = ids(db, 'SELECT id FROM outcome_line_scans WHERE batch_id = ?', model);
  const demoPairs = all(db, 'SELECT id FROM pairs WHERE campaign_id = ?', idRow, demo.id);
  const modelPair = demoPairs.findIndex((p) => p.id === modelBatch.pair_id);
  const stamp = new Date().toISOString();
  db.transaction(() => {
    for (let c = 0; c < CAMPAIGNS; c++) {
      const campaignId =
        c === 0
          ? demo.id
          : copy.campaign([demo.id], { name: `Load campaign ${c + 1}`, is_demo: 0, created_at: stamp })[0]!;
      const pairIds = c === 0 ? demoPairs.map((p) => p.id) : copy.pairs([demo.id], { campaign_id: campaignId });
      if (c > 0) pairIds.forEach((pairId, i) => copy.predictions([demoPairs[i]!.id], { pair_id: pairId }));
      const pairId = modelPair >= 0 ? pairIds[modelPair]! : null;
      const existing = one(db, 'SELECT count(*) AS n FROM batches WHERE campaign_id = ?', countRow, campaignId).n;
      for (let b = existing; b < BATCHES_PER_CAMPAIGN; b++) {
        const batchId = copy.batch([model], {
          campaign_id: campaignId,
          pair_id: pairId,
          name: `C${c + 1} batch ${b + 1}`,
          seed_batch_id: null,
        })[0]!;
        for (const id of sizeIds)
          for (const newId of copy.sizes([id], { batch_id: batchId }))
            copy.diameters([id], { import_id: newId }, false);
        for (const id of compositionIds)
          for (const newId of copy.compositions([id], { batch_id: batchId }))
            copy.measurements([id], { composition_id: newId }, false);
        for (const id of scanIds)
          for (const newId of copy.scans([id], { batch_id: batchId })) copy.points([id], { scan_id: newId }, false);
        copy.observation([model], { batch_id: batchId }, false);
      }
    }
  })();
  const historyCsv = readFileSync(join(import.meta.dirname, '../../docs/demo-history.csv'), 'utf8');
  for (const id of ids(db, 'SELECT id FROM campaigns'))
    await value(store, 'learn.importHistory', { campaignId: id, csvText: historyCsv, fileName: 'demo-history.csv' });
  const counts: Record<string, number> = {};
  for (const table of [
    'campaigns',
    'pairs',
    'batches',
    'outcome_size_imports',
    'outcome_diameters',
    'outcome_compositions',
    'outcome_line_scans',
    'outcome_line_scan_points',
    'outcome_observations',
    'history_outcomes',
  ])
    counts[table] = one(db, `SELECT count(*) AS n FROM ${table}`, countRow).n;
  return { store, dataDir, counts, buildMs: performance.now() - started };
}

async function timeIt(store: Store, name: OperationName, input: unknown): Promise<{ median: number; max: number }> {
  await value(store, name, input); // warm
  const times: number[] = [];
  for (let i = 0; i < 5; i++) {
    const start = performance.now();
    await value(store, name, input);
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return { median: times[2]!, max: times[4]! };
}

async function peakRssOfQueue(store: Store): Promise<{ peakMb: number; baseMb: number; wallMs: number }> {
  const baseMb = process.memoryUsage.rss() / 1024 ** 2;
  let peakMb = baseMb;
  const timer = setInterval(() => (peakMb = Math.max(peakMb, process.memoryUsage.rss() / 1024 ** 2)), 20);
  const started = performance.now();
  const ids: number[] = [];
  for (let i = 0; i < 20; i++) {
    const run = await value(store, 'simulation.start', {
      elementA: 'Au',
      elementB: 'Pd',
      xB: 0.5,
      shape: 'cuboctahedron',
      diameterNm: 3,
      temperatureK: 600,
      sweeps: 200,
      seed: i + 1,
      relaxation: 'rigid',
    });
    ids.push(run.id);
  }
  for (const id of ids) {
    for (;;) {
      const status = await value(store, 'simulation.status', { id });
      if (status.status !== 'queued' && status.status !== 'running') break;
      await new Promise((r) => setTimeout(r, 50));
    }
  }
  clearInterval(timer);
  return { peakMb, baseMb, wallMs: performance.now() - started };
}

export async function run(): Promise<void> {
  console.log(
    `load average ${os
      .loadavg()
      .map((v) => v.toFixed(2))
      .join(' ')} on ${os.cpus().length} cores`,
  );
  const built = await buildStore();
  const { store } = built;
  try {
    console.log(`store built in ${(built.buildMs / 1000).toFixed(1)} s: ${JSON.stringify(built.counts)}`);
    const firstCampaign = one(store.db, 'SELECT min(id) AS id FROM campaigns', idRow).id;
    const job = await value(store, 'learn.retrain', { campaignId: firstCampaign });
    for (;;) {
      const state = await value(store, 'learn.job', { jobId: job.id });
      if (state.status !== 'running') break;
      await new Promise((r) => setTimeout(r, 50));
    }
    const conditions = { xB: 0.5, diameterNm: 5, temperatureK: 473 };
    const cases: [string, OperationName, unknown][] = [
      ['batches.list (every campaign, archived too)', 'batches.list', { includeArchived: true }],
      ['batches.list (one campaign)', 'batches.list', { campaignId: firstCampaign }],
      ['batches.list (made and characterized)', 'batches.list', { statuses: ['made', 'characterized'] }],
      ['outcomes.listByCampaign (descriptor map overlay)', 'outcomes.listByCampaign', { campaignId: firstCampaign }],
      ['outcomes.confusion (vs prediction)', 'outcomes.confusion', { campaignId: firstCampaign }],
      [
        'outcomes.confusion (vs simulation)',
        'outcomes.confusion',
        { campaignId: firstCampaign, against: 'simulation' },
      ],
      ['learn.history (one campaign)', 'learn.history', { campaignId: firstCampaign }],
      ['campaigns.list (archived too)', 'campaigns.list', { includeArchived: true }],
      ['prediction.rank (all metals, alloy)', 'prediction.rank', { elements: 'all', target: 'alloy', conditions }],
      ['learn.propose (6 batches)', 'learn.propose', { campaignId: firstCampaign, target: 'alloy' }],
    ];
    for (const [label, name, input] of cases) {
      const { median, max } = await timeIt(store, name, input);
      const verdict = median <= TARGET_MS ? 'within' : 'OVER';
      console.log(
        `${label.padEnd(52)} ${median.toFixed(1).padStart(7)} ms (max ${max.toFixed(1)}; target < ${TARGET_MS} ms, ${verdict})`,
      );
    }
    const queue = await peakRssOfQueue(store);
    console.log(
      `${'queue of 20 Monte Carlo runs (3 nm Au-Pd, 200 sweeps)'.padEnd(52)} peak RSS ${queue.peakMb.toFixed(0)} MB ` +
        `(${queue.baseMb.toFixed(0)} MB before), all ended in ${(queue.wallMs / 1000).toFixed(1)} s`,
    );
  } finally {
    await shutdownServices(store);
    removeTempDir(built.dataDir);
  }
}
