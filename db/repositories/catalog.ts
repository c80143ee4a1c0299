/**
 * The reagent catalog (migration 0004: `reagents`, `reagent_revisions`): one row per reagent key, seeded
 * from the built-in reagent list the first time it is read; every edit bumps the revision and keeps the
 * earlier one, so a saved batch can show what changed since it was computed.
 */
import type { CatalogReagent } from '../../shared-model/api/batches';
import { DomainError } from '../../shared-model/api/result';
import { prepareReagent, type Reagent } from '../../shared-model/recipes/reagent';
import { REAGENT_SEED } from '../../shared-model/recipes/reagent-seed';
import { nowIso, type SqliteDatabase } from '../store';

interface ReagentRow {
  key: string;
  data: string;
  revision: number;
  built_in: number;
  updated_at: string;
}

const REAGENT_SELECT = 'SELECT key, data, revision, built_in, updated_at FROM reagents';

let preparedSeed: Reagent[] | null = null;
function seedReagents(): Reagent[] {
  preparedSeed ??= REAGENT_SEED.map((reagent) => prepareReagent(reagent));
  return preparedSeed;
}

function toCatalogReagent(row: ReagentRow): CatalogReagent {
  return {
    ...(JSON.parse(row.data) as Reagent),
    revision: row.revision,
    builtIn: row.built_in === 1,
    updatedAt: row.updated_at,
  };
}

/** Writes the built-in reagents that are not in the catalog yet (first use, or a newer Pairwright). */
export function ensureCatalogSeeded(db: SqliteDatabase): void {
  const present = db.prepare('SELECT count(*) AS n FROM reagents WHERE built_in = 1').get() as { n: number };
  if (present.n >= REAGENT_SEED.length) return;
  const now = nowIso();
  const insert = db.prepare(
    'INSERT OR IGNORE INTO reagents (key, data, revision, built_in, created_at, updated_at) VALUES (?, ?, 1, 1, ?, ?)',
  );
  const history = db.prepare(
    'INSERT OR IGNORE INTO reagent_revisions (reagent_key, revision, data, saved_at) VALUES (?, 1, ?, ?)',
  );
  db.transaction(() => {
    for (const reagent of seedReagents()) {
      const data = JSON.stringify(reagent);
      const info = insert.run(reagent.key, data, now, now);
      if (info.changes > 0) history.run(reagent.key, data, now);
    }
  })();
}

export function listCatalog(db: SqliteDatabase): CatalogReagent[] {
  ensureCatalogSeeded(db);
  const rows = db.prepare(`${REAGENT_SELECT} ORDER BY key`).all() as ReagentRow[];
  return rows.map(toCatalogReagent);
}

export function findCatalogReagent(db: SqliteDatabase, key: string): CatalogReagent | null {
  ensureCatalogSeeded(db);
  const row = db.prepare(`${REAGENT_SELECT} WHERE key = ?`).get(key) as ReagentRow | undefined;
  return row ? toCatalogReagent(row) : null;
}

function requireCatalogReagent(db: SqliteDatabase, key: string): CatalogReagent {
  const reagent = findCatalogReagent(db, key);
  if (!reagent) throw new Error(`reagent "${key}" vanished from the catalog while it was being saved`);
  return reagent;
}

export function addCatalogReagent(db: SqliteDatabase, reagent: Reagent): CatalogReagent {
  ensureCatalogSeeded(db);
  if (findCatalogReagent(db, reagent.key)) {
    const message = `a reagent with key "${reagent.key}" is already in the catalog; edit it instead`;
    throw new DomainError('conflict', message, 'key');
  }
  const now = nowIso();
  const data = JSON.stringify(reagent);
  db.transaction(() => {
    db.prepare(
      'INSERT INTO reagents (key, data, revision, built_in, created_at, updated_at) VALUES (?, ?, 1, 0, ?, ?)',
    ).run(reagent.key, data, now, now);
    db.prepare('INSERT INTO reagent_revisions (reagent_key, revision, data, saved_at) VALUES (?, 1, ?, ?)').run(
      reagent.key,
      data,
      now,
    );
  })();
  return requireCatalogReagent(db, reagent.key);
}

/** Saves a new revision of a catalog reagent; batches saved earlier keep their values. */
export function editCatalogReagent(db: SqliteDatabase, reagent: Reagent): CatalogReagent {
  const current = findCatalogReagent(db, reagent.key);
  if (!current) throw new DomainError('not_found', `no reagent "${reagent.key}" in the catalog`, 'key');
  const now = nowIso();
  const data = JSON.stringify(reagent);
  const revision = current.revision + 1;
  db.transaction(() => {
    db.prepare('UPDATE reagents SET data = ?, revision = ?, updated_at = ? WHERE key = ?').run(
      data,
      revision,
      now,
      reagent.key,
    );
    db.prepare('INSERT INTO reagent_revisions (reagent_key, revision, data, saved_at) VALUES (?, ?, ?, ?)').run(
      reagent.key,
      revision,
      data,
      now,
    );
  })();
  return requireCatalogReagent(db, reagent.key);
}

/** The current revision of every catalog reagent, by key. */
export function currentRevisions(db: SqliteDatabase): Map<string, number> {
  const rows = db.prepare('SELECT key, revision FROM reagents').all() as { key: string; revision: number }[];
  return new Map(rows.map((r) => [r.key, r.revision]));
}
