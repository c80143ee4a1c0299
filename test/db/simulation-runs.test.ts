/** Stored Monte Carlo runs (migration 0003) on a real SQLite file. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  getRun,
  getRunSummary,
  insertRun,
  listRuns,
  markEnded,
  markRunning,
  saveProgress,
  saveResult,
} from '../../db/repositories/simulation';
import { openStore, type Store } from '../../db/store';
import { DomainError } from '../../shared-model/api/result';
import { ENGINE_VERSION, runSimulation, type SimulationSpec } from '../../shared-model/montecarlo/simulate';
import { createRandom } from '../../shared-model/random';
import { tempDataDir } from '../support/host-fixture';

let store: Store;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
});
afterEach(() => store.close());

const spec: SimulationSpec = {
  elementA: 'Au',
  elementB: 'Pt',
  xB: 0.5,
  shape: 'icosahedron',
  shells: 2,
  temperatureK: 800,
  sweeps: 20,
  seed: 3,
};
const newRun = (pairId: number | null = null) => ({
  spec,
  label: 'test',
  pairId,
  engineVersion: ENGINE_VERSION,
  plannedAtoms: 55,
  totalSweeps: 20,
  owner: 'me',
});

describe('simulation_runs', () => {
  it('keeps inputs, seed, engine version, progress, result and occupations, and re-attaches the occupation', () => {
    const queued = insertRun(store.db, newRun());
    expect(queued).toMatchObject({
      status: 'queued',
      atoms: 55,
      spec,
      label: 'test',
      pairId: null,
      engineVersion: ENGINE_VERSION,
    });
    markRunning(store.db, queued.id);
    saveProgress(store.db, queued.id, {
      sweep: 10,
      totalSweeps: 20,
      phase: 'production',
      temperatureK: 800,
      energyEv: -1,
      energyPerAtomEv: -0.1,
      surfaceXB: 0.4,
      acceptance: 0.3,
    });
    expect(getRunSummary(store.db, queued.id)).toMatchObject({ status: 'running', progress: { sweep: 10 } });
    const result = runSimulation(spec, createRandom(3));
    saveResult(store.db, queued.id, result);
    const stored = getRun(store.db, queued.id);
    expect(stored.status).toBe('done');
    expect(stored.result?.finalOccupation).toBe(result.finalOccupation);
    expect(stored.result?.energyEv).toBe(result.energyEv);
    expect(listRuns(store.db, 10)[0]).toMatchObject({
      id: queued.id,
      architecture: result.architecture,
      surfaceXB: result.surfaceXB,
    });
    // The occupation is stored once, in its own column.
    const row = store.db
      .prepare('SELECT result_json, final_occupation, seed FROM simulation_runs WHERE id = ?')
      .get(queued.id) as { result_json: string; final_occupation: string; seed: number };
    expect(row.result_json).not.toContain(result.finalOccupation);
    expect(row.final_occupation).toHaveLength(55);
    expect(row.seed).toBe(3);
    // An ended run does not change state again.
    markEnded(store.db, queued.id, 'cancelled', 'late');
    expect(getRunSummary(store.db, queued.id).status).toBe('done');
  });

  it("refuses a done run without a result, and a pair that is not the run's pair", () => {
    const run = insertRun(store.db, newRun());
    expect(() => store.db.prepare("UPDATE simulation_runs SET status = 'done' WHERE id = ?").run(run.id)).toThrow(
      /CHECK constraint/,
    );
    const now = new Date().toISOString();
    const campaign = store.db
      .prepare('INSERT INTO campaigns (name, created_at, updated_at) VALUES (?, ?, ?)')
      .run('C', now, now);
    const pair = store.db
      .prepare(
        'INSERT INTO pairs (campaign_id, element_a, element_b, target, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?)',
      )
      .run(campaign.lastInsertRowid, 'Ag', 'Pd', 'alloy', now, now);
    try {
      insertRun(store.db, newRun(Number(pair.lastInsertRowid)));
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(DomainError);
      expect((error as DomainError).field).toBe('pairId');
    }
    const matching = store.db
      .prepare(
        'INSERT INTO pairs (campaign_id, element_a, element_b, target, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?)',
      )
      .run(campaign.lastInsertRowid, 'Pt', 'Au', 'alloy', now, now);
    expect(insertRun(store.db, newRun(Number(matching.lastInsertRowid))).pairId).toBe(Number(matching.lastInsertRowid));
  });
});
