/**
 * Migration 0011 on a real SQLite file: a store saved at schema version 10, when the computed batch design
 * stated the composition in at.% (xBPct), opens with each saved design stating the atomic fraction (xB, 0–1),
 * as the inputs, predictions and outcomes do; the rest of the design is kept as saved.
 */
import { cpSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultMigrationsDir } from '../../db/migrate';
import { getBatchForOutcome } from '../../db/repositories/batches';
import { openStore } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import type { SavedBatch } from '../../shared-model/api/batches';
import { designBatch } from '../../shared-model/recipes/design';
import { batchDesignInputSchema } from '../../shared-model/recipes/design-input';
import { dispatchValue } from '../support/dispatch';
import { seededCatalog } from '../support/design-stages';
import { tempDir } from '../support/temp-dirs';
import { auPd, auSeeds, ptNi } from '../support/sample-batches';

/** A store at schema version 10, the last whose computed designs stated xBPct. */
function storeAtVersion10(dataDir: string) {
  const dir = tempDir('pairwright-migrations-');
  for (const file of readdirSync(defaultMigrationsDir()).filter((f) => /^00(0\d|10)_/.test(f))) {
    cpSync(join(defaultMigrationsDir(), file), join(dir, file));
  }
  return openStore({ dataDir, migrationsDir: dir });
}

/** The design as the earlier version saved it: the composition in at.% under xBPct, no xB. */
function oldComputed(request: object): { json: string; rest: Record<string, unknown> } {
  const design = designBatch(batchDesignInputSchema.parse(request), { catalog: seededCatalog });
  const { xB, ...rest } = design;
  return { json: JSON.stringify({ ...rest, xBPct: xB * 100 }), rest };
}

describe('migration 0011: the computed batch design states x_B', () => {
  it('rewrites saved designs from xBPct (at.%) to xB (fraction); the outcome lookup reads the fraction', async () => {
    const dataDir = tempDir('pairwright-test-');
    const old = storeAtVersion10(dataDir);
    expect(old.db.pragma('user_version', { simple: true })).toBe(10);
    const insert = old.db.prepare(
      `INSERT INTO batches (name, element_a, element_b, target, route, inputs, computed, model_version,
         catalog_revisions, created_at, updated_at)
       VALUES (?, ?, ?, ?, ?, ?, ?, 'recipes-1', '{}', '2025-03-01T09:00:00.000Z', '2025-03-01T09:00:00.000Z')`,
    );
    const saved = [ptNi, auPd, auSeeds].map((request) => {
      const input = batchDesignInputSchema.parse(request);
      const computed = oldComputed(request);
      const { elementA, elementB, target, route } = input;
      insert.run(`${elementA}${elementB}`, elementA, elementB, target, route, JSON.stringify(input), computed.json);
      return computed.rest;
    });
    const before = old.db.prepare('SELECT computed FROM batches ORDER BY id').all() as { computed: string }[];
    // the old rows state at.% (test/support/sample-batches.ts): PtNi 25 at.% Ni, AuPd 50 at.% Pd, Au seeds no B
    expect(before.map((r) => (JSON.parse(r.computed) as { xBPct: number }).xBPct)).toEqual([25, 50, 0]);
    old.close();

    const store = openStore({ dataDir });
    try {
      // 0011 runs first; later migrations (0012 onward) follow it
      expect(store.migration.applied[0]).toBe('0011_batch_design_composition_fraction');
      const context: ServiceContext = { store };
      const read = await Promise.all([1, 2, 3].map((id) => dispatchValue<SavedBatch>(context, 'batches.get', { id })));
      // 25 / 100 in SQLite is the same double as in JavaScript
      expect(read.map((b) => b.design.xB)).toEqual([0.25, 0.5, 0]);
      read.forEach((batch, i) => {
        expect(JSON.stringify(batch.design)).not.toContain('xBPct');
        const { xB: _fraction, ...rest } = batch.design;
        expect(rest).toEqual(saved[i]);
      });
      expect(getBatchForOutcome(store.db, 1).nominalXB).toBe(0.25);
    } finally {
      store.close();
    }
  });
});
