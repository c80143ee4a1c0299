/** Simulation service through the dispatcher, on a real SQLite file, with runs in real worker threads. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { dispatch } from '../../electron/services/dispatch';
import { queueFor } from '../../electron/workers/montecarlo-queue';
import type { SimulationRun, SimulationRunSummary, XyzExport } from '../../shared-model/api/simulation';
import type { StructureEnergy } from '../../shared-model/montecarlo/gupta-energy';
import { readExtendedXyz } from '../../shared-model/montecarlo/extended-xyz';
import { DEFAULT_STOPPING, RELAXED_ENGINE_VERSION } from '../../shared-model/montecarlo/simulate';
import { magicClusterAtoms } from '../../shared-model/geometry/magic-numbers';
import { dispatchValue } from '../support/dispatch';
import { tempDataDir } from '../support/host-fixture';

let store: Store;
let context: ServiceContext;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  context = { store };
});
afterEach(async () => {
  await queueFor(store).close();
  store.close();
});

const value = <T>(name: string, input: unknown): Promise<T> => dispatchValue<T>(context, name, input);

async function waitForEnd(id: number, timeoutMs = 60_000): Promise<SimulationRunSummary> {
  const start = Date.now();
  for (;;) {
    const status = await value<SimulationRunSummary>('simulation.status', { id });
    if (status.status !== 'queued' && status.status !== 'running') return status;
    if (Date.now() - start > timeoutMs) throw new Error(`run ${id} still ${status.status} after ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

const small = {
  elementA: 'Ag',
  elementB: 'Pd',
  xB: 0.5,
  shape: 'cuboctahedron',
  shells: 3,
  temperatureK: 600,
  sweeps: 150,
  seed: 7,
  stopping: null,
};

describe('simulation service', () => {
  it('by default a run stops at the answer (the default rule is stored) and a size-mismatched pair runs relaxed', async () => {
    const { stopping: _fixed, ...byDefault } = small;
    const started = await value<SimulationRunSummary>('simulation.start', { ...byDefault, sweeps: 2000 });
    const ended = await waitForEnd(started.id);
    expect(ended.status).toBe('done');
    const run = await value<SimulationRun>('simulation.get', { id: started.id });
    expect(run.spec.stopping).toEqual(DEFAULT_STOPPING);
    expect(run.result?.stopping.stoppedAtAnswer).toBe(true);
    expect(run.result?.stopping.sweepsTaken).toBeLessThan(2000);
    expect(run.result?.surfaceXBStandardError).toBeLessThan(DEFAULT_STOPPING.surfaceStandardError);
    const mismatched = await value<SimulationRunSummary>('simulation.start', {
      ...small,
      elementA: 'Au',
      elementB: 'Ni',
      shells: 2,
      sweeps: 30,
    });
    expect(mismatched.engineVersion).toBe(RELAXED_ENGINE_VERSION);
    expect((await waitForEnd(mismatched.id)).status).toBe('done');
    const relaxed = await value<SimulationRun>('simulation.get', { id: mismatched.id });
    expect(relaxed.result?.relaxation.mode).toBe('relaxed');
    expect(relaxed.result?.engineVersion).toBe(RELAXED_ENGINE_VERSION);
    // The export writes where the atoms ended, not the lattice sites.
    const xyz = await value<{ content: string }>('simulation.exportXyz', { id: mismatched.id });
    const frame = readExtendedXyz(xyz.content);
    expect(frame.info.relaxation).toBe('relaxed');
    expect(frame.positions[0]).toBeCloseTo(relaxed.result!.finalPositionsAngstrom![0]!, 6);
  });

  it('start returns at once with a queued/running run; the worker finishes it; get, list and export read it back', async () => {
    const started = await value<SimulationRunSummary>('simulation.start', { ...small, label: 'first' });
    expect(['queued', 'running']).toContain(started.status);
    expect(started.atoms).toBe(magicClusterAtoms(3));
    const ended = await waitForEnd(started.id);
    expect(ended.status).toBe('done');
    expect(ended.architecture).toBeTruthy();

    const run = await value<SimulationRun>('simulation.get', { id: started.id });
    expect(run.result?.atoms).toBe(147);
    expect(run.result?.finalOccupation).toHaveLength(147);
    expect(run.result?.engineVersion).toBe(run.engineVersion);
    expect(run.progressHistory.length).toBeGreaterThan(0);
    expect(run.progressHistory[run.progressHistory.length - 1]?.sweep).toBe(150);
    expect(run.spec).toMatchObject({ elementA: 'Ag', elementB: 'Pd', seed: 7 });

    // Runs repeat from their seed: a second identical run ends in the same configuration.
    const second = await value<SimulationRunSummary>('simulation.start', small);
    await waitForEnd(second.id);
    const again = await value<SimulationRun>('simulation.get', { id: second.id });
    expect(again.result?.finalOccupation).toBe(run.result?.finalOccupation);

    const list = await value<SimulationRunSummary[]>('simulation.list', {});
    expect(list.map((r) => r.id)).toEqual([second.id, started.id]);
    expect(list[1]).toMatchObject({ label: 'first', status: 'done' });

    const xyz = await value<XyzExport>('simulation.exportXyz', { id: started.id });
    expect(xyz.fileName).toBe(`pairwright-run-${started.id}-AgPd.xyz`);
    expect(xyz.content.split('\n')[0]).toBe('147');
    // The exported structure has the run's energy when recomputed from the file (the `energy` path).
    const energy = await value<StructureEnergy>('simulation.energy', { xyz: xyz.content });
    expect(Math.abs(energy.energyEv - (run.result?.energyEv ?? 0))).toBeLessThan(1e-6);
    expect(energy.pairRules[0]?.kind).toBe('mixing-rule');
  });

  it('several runs queue, and cancel stops a queued and a running run', async () => {
    const long = { ...small, shells: 6, sweeps: 50_000, stopping: null };
    const first = await value<SimulationRunSummary>('simulation.start', long);
    const queued: SimulationRunSummary[] = [];
    const concurrency = queueFor(store).concurrency;
    for (let k = 0; k < concurrency; k++) queued.push(await value<SimulationRunSummary>('simulation.start', long));
    const waiting = queued[queued.length - 1]!;
    expect(waiting.status).toBe('queued');
    const cancelledWaiting = await value<SimulationRunSummary>('simulation.cancel', { id: waiting.id });
    expect(cancelledWaiting.status).toBe('cancelled');

    // Wait until the first run reports progress, then cancel it.
    for (let k = 0; k < 400; k++) {
      const s = await value<SimulationRunSummary>('simulation.status', { id: first.id });
      if (s.progress) break;
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    await value('simulation.cancel', { id: first.id });
    const ended = await waitForEnd(first.id, 20_000);
    expect(ended.status).toBe('cancelled');
    expect(ended.error).toMatch(/cancelled after \d+ of 50000 sweeps/);
    for (const run of queued.slice(0, -1)) await value('simulation.cancel', { id: run.id });
    await queueFor(store).whenIdle();

    expect(await dispatch(context, 'simulation.cancel', { id: first.id })).toMatchObject({
      ok: false,
      error: { code: 'conflict' },
    });
    expect(await dispatch(context, 'simulation.exportXyz', { id: first.id })).toMatchObject({
      ok: false,
      error: { code: 'conflict' },
    });
  });

  it('refuses bad input before any work, naming the field', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ elementA: 'Fe' }, 'elementA'],
      [{ elementB: 'W' }, 'elementB'],
      [{ temperatureK: 0 }, 'temperatureK'],
      [{ temperatureK: -5 }, 'temperatureK'],
      [{ sweeps: 0 }, 'sweeps'],
      [{ sweeps: 1_000_000 }, 'sweeps'],
      [{ shells: 40 }, 'shells'],
      [{ shells: undefined, diameterNm: 28 }, 'diameterNm'],
      [{ xB: 1.2 }, 'xB'],
      [{ shape: 'cube' }, 'shape'],
      [{ anneal: { startTemperatureK: 300, sweeps: 10 } }, 'anneal.startTemperatureK'],
    ];
    for (const [change, field] of cases) {
      const result = await dispatch(context, 'simulation.start', { ...small, ...change });
      expect(result, JSON.stringify(change)).toMatchObject({ ok: false, error: { code: 'invalid_input', field } });
    }
    const fe = await dispatch(context, 'simulation.start', { ...small, elementA: 'Fe' });
    expect(fe.ok ? '' : fe.error.message).toMatch(
      /Fe has no tight-binding parameters; the simulation supports Ni, Cu, Rh, Pd, Ag, Ir, Pt, Au, Al, Pb/,
    );
    expect(await value<SimulationRunSummary[]>('simulation.list', {})).toEqual([]);
    expect(await dispatch(context, 'simulation.get', { id: 99 })).toMatchObject({
      ok: false,
      error: { code: 'not_found', field: 'id' },
    });
  });

  it('computes the energy of a given structure and names what is wrong in a bad one', async () => {
    const xyz = '2\nProperties=species:S:1:pos:R:3\nAu 0 0 0\nAu 0 0 2.885\n';
    const energy = await value<StructureEnergy>('simulation.energy', { xyz });
    expect(energy.atoms).toBe(2);
    expect(energy.energyEv).toBeLessThan(0);
    expect(await dispatch(context, 'simulation.energy', { xyz: '2\n\nFe 0 0 0\nAu 0 0 2.5\n' })).toMatchObject({
      ok: false,
      error: { code: 'invalid_input', field: 'atoms[1].species' },
    });
    expect(await dispatch(context, 'simulation.energy', { xyz: '3\n\nAu 0 0 0\n' })).toMatchObject({
      ok: false,
      error: { field: 'xyz' },
    });
  });

  it('a run left behind by a process that ended is reported as interrupted', async () => {
    const started = await value<SimulationRunSummary>('simulation.start', {
      ...small,
      shells: 6,
      sweeps: 50_000,
      stopping: null,
    });
    await value('simulation.cancel', { id: started.id });
    await queueFor(store).whenIdle();
    // Simulate a dead owner: a queued row whose heartbeat is old.
    store.db
      .prepare(
        "UPDATE simulation_runs SET status = 'running', error = NULL, finished_at = NULL, owner = 'gone', heartbeat_at = '2000-01-01T00:00:00.000Z' WHERE id = ?",
      )
      .run(started.id);
    const status = await value<SimulationRunSummary>('simulation.status', { id: started.id });
    expect(status.status).toBe('failed');
    expect(status.error).toMatch(/interrupted/);
  });
});
