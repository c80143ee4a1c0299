/**
 * Stopping: a graceful stop stores a running Monte Carlo run as "cancelled (app closed)", not failed; runs of a
 * killed process are marked interrupted at the next start at once; the run queue refuses run 201 with a message.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { getRunSummary, insertRun, markRunning } from '../../db/repositories/simulation';
import { openStore, type Store } from '../../db/store';
import { closeWorkspace, openWorkspace } from '../../electron/services/workspace';
import { APP_CLOSED, MAX_QUEUED, MonteCarloQueue } from '../../electron/workers/montecarlo-queue';
import { simulationSpecSchema } from '../../shared-model/api/simulation';

let dataDir = '';
let store: Store | null = null;
afterEach(() => {
  store?.close();
  store = null;
  rmSync(dataDir, { recursive: true, force: true });
});

const spec = (sweeps: number) =>
  simulationSpecSchema.parse({
    elementA: 'Ag',
    elementB: 'Pd',
    xB: 0.5,
    shape: 'cuboctahedron',
    shells: 6,
    temperatureK: 600,
    sweeps,
    seed: 3,
    stopping: null,
  });

function freshStore(): Store {
  dataDir = mkdtempSync(join(tmpdir(), 'pairwright-stopping-'));
  store = openStore({ dataDir });
  return store;
}

describe('stopping Monte Carlo runs', () => {
  it('stores a running run as cancelled (app closed) when Pairwright closes', async () => {
    const db = freshStore();
    const queue = new MonteCarloQueue(db, { concurrency: 1 });
    const run = queue.enqueue(spec(50_000), 'long', null);
    await expect.poll(() => getRunSummary(db.db, run.id).status, { timeout: 15_000 }).toBe('running');
    await queue.close();
    const ended = getRunSummary(db.db, run.id);
    expect(ended.status).toBe('cancelled');
    expect(ended.error).toMatch(/^cancelled \(app closed\)/);
  });

  it('marks the runs of a killed process interrupted at the next start, without waiting for the heartbeat', async () => {
    const db = freshStore();
    const gone = spawnSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))'], { encoding: 'utf8' });
    const deadPid = Number(gone.stdout); // that process has exited: its pid is free
    const parsed = spec(100);
    const left = insertRun(db.db, {
      spec: parsed,
      label: 'left running',
      pairId: null,
      engineVersion: 'x',
      plannedAtoms: 1,
      totalSweeps: 100,
      owner: `${deadPid}-abcdef`,
    });
    markRunning(db.db, left.id);
    const alive = insertRun(db.db, {
      spec: parsed,
      label: 'other live process',
      pairId: null,
      engineVersion: 'x',
      plannedAtoms: 1,
      totalSweeps: 100,
      owner: `${process.ppid}-abcdef`,
    });
    db.close();
    store = null;
    const context = openWorkspace({ dataDir });
    const interrupted = getRunSummary(context.store.db, left.id);
    expect(interrupted.status).toBe('failed');
    expect(interrupted.error).toMatch(/^interrupted: the Pairwright process running it \(pid \d+\) ended/);
    expect(getRunSummary(context.store.db, alive.id).status).toBe('queued');
    await closeWorkspace(context);
  });

  it('refuses run 201 with a clear message and cancels the waiting ones on close', async () => {
    const db = freshStore();
    const queue = new MonteCarloQueue(db, { concurrency: 0 }); // nothing starts: every run waits
    const small = spec(10);
    for (let i = 0; i < MAX_QUEUED; i++) queue.enqueue(small, `run ${i}`, null);
    expect(() => queue.enqueue(small, 'one too many', null)).toThrow(/the run queue is full: 200 runs are waiting/);
    await queue.close();
    const statuses = db.db.prepare('SELECT status, error FROM simulation_runs').all() as {
      status: string;
      error: string;
    }[];
    expect(statuses).toHaveLength(MAX_QUEUED);
    expect(statuses.every((row) => row.status === 'cancelled' && row.error.startsWith(APP_CLOSED))).toBe(true);
  });
});
