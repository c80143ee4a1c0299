/** Migration 0007 on a real SQLite file: predictions stored with the older shape spelling read the one spelling. */
import { cpSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { defaultMigrationsDir } from '../../db/migrate';
import { openStore } from '../../db/store';
import { tempDataDir } from '../support/host-fixture';

const folders: string[] = [];
afterEach(() => {
  for (const folder of folders.splice(0)) rmSync(folder, { recursive: true, force: true });
});

describe('migration 0007: one shape spelling', () => {
  it('rewrites "truncated octahedron" in stored predictions and leaves other shapes and fields alone', () => {
    const dataDir = tempDataDir();
    const before = mkdtempSync(join(tmpdir(), 'pairwright-migrations-'));
    folders.push(dataDir, before);
    for (const file of readdirSync(defaultMigrationsDir()).filter((name) => name < '0007')) {
      cpSync(join(defaultMigrationsDir(), file), join(before, file));
    }
    const old = openStore({ dataDir, migrationsDir: before });
    const insert = old.db.prepare(
      `INSERT INTO predictions (element_a, element_b, inputs_json, settings_json, model_version, result_json, created_at)
       VALUES ('Pt', 'Ni', ?, '{}', 'segregation-1.0', ?, 'x')`,
    );
    const stored = (shape: string) => [
      JSON.stringify({
        elementA: 'Pt',
        elementB: 'Ni',
        conditions: { xB: 0.25, diameterNm: 3, shape, temperatureK: 700 },
      }),
      JSON.stringify({ pair: 'Pt-Ni', shape, architecture: 'alloy' }),
    ];
    insert.run(...stored('truncated octahedron'));
    insert.run(...stored('icosahedron'));
    old.close();

    const store = openStore({ dataDir });
    expect(store.migration.applied).toContain('0007_one_shape_spelling');
    const rows = store.db.prepare('SELECT inputs_json, result_json FROM predictions ORDER BY id').all() as {
      inputs_json: string;
      result_json: string;
    }[];
    const read = rows.map((row) => ({ inputs: JSON.parse(row.inputs_json), result: JSON.parse(row.result_json) }));
    expect(read[0]).toEqual({
      inputs: {
        elementA: 'Pt',
        elementB: 'Ni',
        conditions: { xB: 0.25, diameterNm: 3, shape: 'truncated-octahedron', temperatureK: 700 },
      },
      result: { pair: 'Pt-Ni', shape: 'truncated-octahedron', architecture: 'alloy' },
    });
    expect(read[1]?.inputs.conditions.shape).toBe('icosahedron');
    expect(read[1]?.result.shape).toBe('icosahedron');
    store.close();
  });
});
