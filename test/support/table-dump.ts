/** Every row of every table of a store, in a stable order: to compare a store before and after something. */
import type { SqliteDatabase } from '../../db/store';

export function tableNames(db: SqliteDatabase): string[] {
  const rows = db
    .prepare("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name")
    .all();
  return (rows as { name: string }[]).map((row) => row.name);
}

export function dumpTables(db: SqliteDatabase): Record<string, unknown[]> {
  const dump: Record<string, unknown[]> = {};
  for (const table of tableNames(db)) {
    const columns = (db.prepare(`PRAGMA table_info("${table}")`).all() as { name: string }[]).map((c) => `"${c.name}"`);
    dump[table] = db.prepare(`SELECT * FROM "${table}" ORDER BY ${columns.join(', ')}`).all();
  }
  return dump;
}
