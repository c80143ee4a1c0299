/** Settings stored in the store (table `settings`): read with a default, written with a timestamp. */
import { nowIso, type SqliteDatabase } from '../store';

export const BACKUPS_KEPT_KEY = 'backups_kept';
/** How many backups the backups folder keeps by default (common practice: a couple of weeks of daily copies). */
export const DEFAULT_BACKUPS_KEPT = 14;

export function readSetting(db: SqliteDatabase, key: string): unknown {
  // A store opened with an older set of migrations (tests of migrations) has no settings table yet.
  const table = db.prepare("SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = 'settings'").get();
  if (table === undefined) return undefined;
  const row = db.prepare('SELECT value_json FROM settings WHERE key = ?').get(key) as
    { value_json: string } | undefined;
  return row === undefined ? undefined : (JSON.parse(row.value_json) as unknown);
}

export function writeSetting(db: SqliteDatabase, key: string, value: unknown): void {
  db.prepare(
    'INSERT INTO settings (key, value_json, updated_at) VALUES (?, ?, ?) ' +
      'ON CONFLICT (key) DO UPDATE SET value_json = excluded.value_json, updated_at = excluded.updated_at',
  ).run(key, JSON.stringify(value), nowIso());
}

export function backupsKept(db: SqliteDatabase): number {
  const value = readSetting(db, BACKUPS_KEPT_KEY);
  return typeof value === 'number' && Number.isInteger(value) && value >= 1 ? value : DEFAULT_BACKUPS_KEPT;
}
