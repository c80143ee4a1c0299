/**
 * Migration 0006 on a real SQLite file: a store saved while batch-design inputs stated the composition in
 * at.% (size.xBPct) opens, its inputs now state the atomic fraction (size.xB), and they read, validate and
 * design again as before.
 */
import { cpSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultMigrationsDir } from '../../db/migrate';
import { openStore } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import type { SavedBatch } from '../../shared-model/api/batches';
import { designBatch } from '../../shared-model/recipes/design';
import { batchDesignInputSchema } from '../../shared-model/recipes/design-input';
import { dispatchValue } from '../support/dispatch';
import { seededCatalog } from '../support/design-stages';
import { auSeeds, ptNi } from '../support/sample-batches';
import { tempDir } from '../support/temp-dirs';

/** A store at schema version 5, the last before inputs used x_B. */
function storeBeforeMigration6(dataDir: string) {
  const dir = tempDir('pairwright-migrations-');
  for (const file of readdirSync(defaultMigrationsDir()).filter((f) => /^000[1-5]_/.test(f))) {
    cpSync(join(defaultMigrationsDir(), file), join(dir, file));
  }
  return openStore({ dataDir, migrationsDir: dir });
}

/** Inputs as the earlier version saved them: the request with the composition in at.%. */
function oldInputs(request: object, xBPct: number | null): string {
  const parsed = batchDesignInputSchema.parse(request);
  if (xBPct === null || parsed.size.kind !== 'alloy') return JSON.stringify(parsed);
  const { xB: _fraction, ...size } = parsed.size;
  return JSON.stringify({ ...parsed, size: { ...size, xBPct } });
}

describe('migration 0006: batch composition as a fraction', () => {
  it('rewrites saved inputs from at.% to x_B; they read, validate and design as before', async () => {
    const dataDir = tempDir('pairwright-test-');
    const old = storeBeforeMigration6(dataDir);
    expect(old.db.pragma('user_version', { simple: true })).toBe(5);
    const insert = old.db.prepare(
      `INSERT INTO batches (name, element_a, element_b, target, route, inputs, computed, model_version,
         catalog_revisions, created_at, updated_at)
       VALUES (?, ?, ?, ?, ?, ?, ?, 'recipes-1', '{}', '2025-03-01T09:00:00.000Z', '2025-03-01T09:00:00.000Z')`,
    );
    const saved = [
      { name: 'PtNi 25 at.%', request: ptNi, xBPct: 25 },
      // the earlier version designed with xBPct / 100, the same double the migration writes
      { name: 'PtNi 33.3 at.%', request: { ...ptNi, size: { ...ptNi.size, xB: 33.3 / 100 } }, xBPct: 33.3 },
      { name: 'Au seeds', request: auSeeds, xBPct: null },
    ];
    for (const batch of saved) {
      const input = batchDesignInputSchema.parse(batch.request);
      const computed = designBatch(input, { catalog: seededCatalog });
      const inputs = oldInputs(batch.request, batch.xBPct);
      const { elementA, elementB, target, route } = input;
      insert.run(batch.name, elementA, elementB, target, route, inputs, JSON.stringify(computed));
    }
    old.close();

    const store = openStore({ dataDir });
    try {
      expect(store.migration.applied[0]).toBe('0006_batch_composition_fraction'); // later migrations follow it
      const context: ServiceContext = { store };
      const read = await Promise.all([1, 2, 3].map((id) => dispatchValue<SavedBatch>(context, 'batches.get', { id })));
      expect(read.map((b) => b.input.size)).toEqual([
        { kind: 'alloy', diameterNm: 4, xB: 0.25 },
        // SQLite divides as JavaScript does: 33.3 / 100 = 0.33299999999999996, and keeps every digit
        { kind: 'alloy', diameterNm: 4, xB: 33.3 / 100 },
        { kind: 'single-metal', element: 'Au', diameterNm: 15 },
      ]);
      for (const batch of read) {
        expect(JSON.stringify(batch.input)).not.toContain('xBPct');
        const input = batchDesignInputSchema.parse(batch.input);
        // the saved design is kept; designing the migrated input again gives the same particle and amounts
        const again = designBatch(input, { catalog: seededCatalog });
        expect(again.atomsPerParticle).toBe(batch.design.atomsPerParticle);
        expect(again.reagents.map((r) => r.massMg)).toEqual(batch.design.reagents.map((r) => r.massMg));
      }
      // the saved computed design states the fraction too (migration 0011, tested in its own file)
      expect(read[0]?.design.xB).toBeCloseTo(0.25, 12);
    } finally {
      store.close();
    }
  });
});
