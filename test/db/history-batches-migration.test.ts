/**
 * Migration 0012 on a real SQLite file: history rows imported before it (schema version 11) get their
 * batches — characterized, marked imported history, the observed label as the observation (a failed row:
 * a note, no label) — and deleting the import then removes those batches.
 */
import { cpSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { listBatchSummaries } from '../../db/repositories/batches';
import { getObservation } from '../../db/repositories/outcome-observations';
import { defaultMigrationsDir } from '../../db/migrate';
import { openStore } from '../../db/store';
import { tempDir } from '../support/temp-dirs';

describe('migration 0012: imported history rows become batches', () => {
  it('writes a batch and an observation for every row imported before it', () => {
    const dataDir = tempDir('pairwright-test-');
    const dir = tempDir('pairwright-migrations-');
    for (const file of readdirSync(defaultMigrationsDir()).filter((f) => /^00(0\d|1[01])_/.test(f))) {
      cpSync(join(defaultMigrationsDir(), file), join(dir, file));
    }
    const old = openStore({ dataDir, migrationsDir: dir });
    expect(old.db.pragma('user_version', { simple: true })).toBe(11);
    const at = '2026-11-01T10:00:00.000Z';
    old.db
      .prepare("INSERT INTO campaigns (id, name, created_at, updated_at) VALUES (4, 'Old history', ?, ?)")
      .run(at, at);
    old.db
      .prepare(
        "INSERT INTO history_imports (id, campaign_id, file_name, fingerprint, row_count, created_at) VALUES (2, 4, 'h.csv', 'f', 2, ?)",
      )
      .run(at);
    const row = old.db.prepare(
      `INSERT INTO history_outcomes (id, import_id, campaign_id, line, element_a, element_b, xb, diameter_nm,
         temperature_k, route, observed, made_on, notes) VALUES (?, 2, 4, ?, 'Pt', 'Ni', 0.25, 5, 473.15, 'organic', ?, NULL, '')`,
    );
    row.run(7, 2, 'Ni@Pt');
    row.run(8, 3, 'failed');
    old.close();

    const store = openStore({ dataDir });
    try {
      const batches = listBatchSummaries(store.db, { campaignId: 4 });
      expect(batches.map((b) => [b.name, b.status, b.importedHistory, b.diameterNm, b.route])).toEqual([
        ['History Pt-Ni line 3', 'characterized', true, 5, 'organic'],
        ['History Pt-Ni line 2', 'characterized', true, 5, 'organic'],
      ]);
      const [failed, made] = batches as [(typeof batches)[0], (typeof batches)[0]];
      expect(getObservation(store.db, made.id).observed?.label).toBe('Ni@Pt');
      expect(getObservation(store.db, failed.id).observed).toBeNull();
      expect(getObservation(store.db, failed.id).notes).toContain('failed');
      store.db.prepare('DELETE FROM history_imports WHERE id = 2').run();
      expect(listBatchSummaries(store.db, { campaignId: 4 })).toEqual([]);
    } finally {
      store.close();
    }
  });
});
