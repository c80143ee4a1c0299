/** Campaign screen service on a real SQLite store in a temporary folder (removed afterwards). */
import { rmSync } from 'node:fs';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { dispatch } from '../../electron/services/dispatch';
import { queueFor } from '../../electron/workers/montecarlo-queue';
import type { ScreenStarted, ScreenStatus } from '../../shared-model/api/screen';
import type { SimulationRun } from '../../shared-model/api/simulation';
import { dispatchValue } from '../support/dispatch';
import { tempDataDir } from '../support/host-fixture';

let dir: string;
let store: Store;
let context: ServiceContext;
beforeEach(() => {
  dir = tempDataDir('pairwright-screen-');
  store = openStore({ dataDir: dir });
  context = { store };
});
afterEach(async () => {
  await queueFor(store).close();
  store.close();
  rmSync(dir, { recursive: true, force: true });
});

const value = <T>(name: string, input: unknown): Promise<T> => dispatchValue<T>(context, name, input);

async function campaignWith(pairs: string[]): Promise<number> {
  const campaign = await value<{ id: number }>('campaigns.create', { name: 'Screen test' });
  for (const pair of pairs) await value('pairs.add', { campaignId: campaign.id, pair });
  return campaign.id;
}

async function waitForScreen(runIds: number[], timeoutMs = 120_000): Promise<ScreenStatus> {
  const start = Date.now();
  for (;;) {
    const status = await value<ScreenStatus>('screen.status', { runIds });
    if (status.finished === status.total) return status;
    if (Date.now() - start > timeoutMs) throw new Error(`screen still running after ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

describe('campaign screen', () => {
  it(
    'runs every pair of the elements with parameters × composition, skips the others with why, fills the matrix',
    { timeout: 180_000 },
    async () => {
      // Elements Ag, Pd, Au (+ Fe without Gupta parameters): pairs Ag–Pd, Ag–Au, Pd–Au run; Fe pairs are skipped.
      const campaignId = await campaignWith(['Ag-Pd', 'Au-Fe']);
      const started = await value<ScreenStarted>('screen.start', {
        campaignId,
        xB: [0.25, 0.75],
        diameterNm: [1.2],
        temperatureK: 600,
        sweeps: 150,
      });
      expect(started.elements).toEqual(['Ag', 'Pd', 'Au', 'Fe']);
      expect(started.runs).toHaveLength(3 * 2);
      expect(started.skipped.map((s) => s.pair).sort()).toEqual(['Ag-Fe', 'Au-Fe', 'Pd-Fe']);
      expect(started.skipped[0]!.reason).toMatch(/Fe has no tight-binding \(Gupta\) parameters/);
      expect(started.concurrency).toBeGreaterThanOrEqual(1);
      const status = await waitForScreen(started.runs.map((r) => r.runId));
      expect(status.runs.every((r) => r.status === 'done')).toBe(true);
      expect(status.progress).toBe(1);
      expect(status.elapsedMs).toBeGreaterThan(0);
      // Each run fills its cell and the mirrored one (Ag–Pd at x(Pd) = 0.25 is Pd–Ag at x(Ag) = 0.75, also listed):
      // 3 pairs × 2 compositions × 2 triangles.
      expect(status.cells).toHaveLength(12);
      const mirror = status.cells.find((c) => c.row === 'Pd' && c.column === 'Ag' && c.x === 0.75)!;
      const agPd = status.cells.find((c) => c.row === 'Ag' && c.column === 'Pd' && c.x === 0.25)!;
      expect(agPd.architecture).toBeTruthy();
      expect(agPd.prediction).toBeTruthy();
      expect(mirror.runId).toBe(agPd.runId);
      // A cell opens its stored run, linked to the campaign's pair when the campaign has it.
      const run = await value<SimulationRun>('simulation.get', { id: agPd.runId });
      expect(run.spec).toMatchObject({ elementA: 'Ag', elementB: 'Pd', xB: 0.25, diameterNm: 1.2 });
      expect(run.pairId).not.toBeNull();
      expect(run.label).toMatch(/^screen Screen test /);
    },
  );

  it('cancel stops the queued and running runs; bad input names the field', { timeout: 120_000 }, async () => {
    const campaignId = await campaignWith(['Ag-Pd', 'Pt-Cu']);
    const started = await value<ScreenStarted>('screen.start', {
      campaignId,
      xB: [0.5],
      diameterNm: [4],
      temperatureK: 600,
      sweeps: 50_000,
    });
    const runIds = started.runs.map((r) => r.runId);
    const cancelled = await value<{ cancelled: number }>('screen.cancel', { runIds });
    expect(cancelled.cancelled).toBe(runIds.length);
    const status = await waitForScreen(runIds);
    expect(status.runs.every((r) => r.status === 'cancelled')).toBe(true);
    expect(
      await dispatch(context, 'screen.start', { campaignId, xB: [], diameterNm: [3], temperatureK: 600 }),
    ).toMatchObject({ ok: false, error: { field: 'xB' } });
    expect(
      await dispatch(context, 'screen.start', { campaignId, xB: [0.5], diameterNm: [3], temperatureK: -1 }),
    ).toMatchObject({ ok: false, error: { field: 'temperatureK' } });
    const lonely = await value<{ id: number }>('campaigns.create', { name: 'One metal with parameters' });
    await value('pairs.add', { campaignId: lonely.id, pair: 'Au-Fe' });
    expect(
      await dispatch(context, 'screen.start', { campaignId: lonely.id, xB: [0.5], diameterNm: [3], temperatureK: 600 }),
    ).toMatchObject({ ok: false, error: { field: 'campaignId' } });
  });
});
