/**
 * Migration 0009 on a real SQLite file: the inventory is rebuilt so a stock may go below zero (a batch
 * marked made may take more than was on hand); its rows keep their ids and values, and the batch history
 * table is there.
 */
import { cpSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ensureCatalogSeeded } from '../../db/repositories/catalog';
import { listInventory } from '../../db/repositories/inventory';
import { defaultMigrationsDir } from '../../db/migrate';
import { openStore } from '../../db/store';
import { tempDir } from '../support/temp-dirs';

describe('migration 0009: inventory may go below zero; batch history', () => {
  it('keeps every inventory row with its id and values', () => {
    const dataDir = tempDir('pairwright-test-');
    const dir = tempDir('pairwright-migrations-');
    for (const file of readdirSync(defaultMigrationsDir()).filter((f) => /^000[1-8]_/.test(f))) {
      cpSync(join(defaultMigrationsDir(), file), join(dir, file));
    }
    const old = openStore({ dataDir, migrationsDir: dir });
    expect(old.db.pragma('user_version', { simple: true })).toBe(8);
    ensureCatalogSeeded(old.db);
    old.db
      .prepare(
        `INSERT INTO inventory (id, reagent_key, amount, unit, location, lot, updated_at)
         VALUES (7, 'nabh4', 25, 'g', 'flammables', 'B1', '2026-01-05T10:00:00.000Z')`,
      )
      .run();
    expect(() =>
      old.db
        .prepare("INSERT INTO inventory (reagent_key, amount, unit, updated_at) VALUES ('nabh4', -1, 'g', 'x')")
        .run(),
    ).toThrow(/CHECK/);
    old.close();

    const store = openStore({ dataDir });
    try {
      expect(store.db.pragma('user_version', { simple: true })).toBeGreaterThanOrEqual(9);
      expect(listInventory(store.db)).toEqual([
        expect.objectContaining({
          id: 7,
          reagentKey: 'nabh4',
          amount: 25,
          unit: 'g',
          location: 'flammables',
          lot: 'B1',
        }),
      ]);
      store.db
        .prepare("INSERT INTO inventory (reagent_key, amount, unit, updated_at) VALUES ('nabh4', -1, 'g', 'x')")
        .run();
      expect(() =>
        store.db
          .prepare("INSERT INTO inventory (reagent_key, amount, unit, updated_at) VALUES ('nabh4', 1, 'lb', 'x')")
          .run(),
      ).toThrow(/CHECK/);
      expect(store.db.prepare('SELECT count(*) AS n FROM batch_history').get()).toEqual({ n: 0 });
    } finally {
      store.close();
    }
  });
});
