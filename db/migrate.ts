/**
 * Numbered SQL migrations (`db/migrations/NNNN_name.sql`), each applied in its own transaction and
 * recorded in `PRAGMA user_version`. Before the first pending migration touches an existing store, the
 * file is copied (SQLite `VACUUM INTO`, a consistent snapshot) into `backups/` beside it (see backup.ts).
 */
import type Database from 'better-sqlite3';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { snapshotToBackups } from './backup';

export interface Migration {
  version: number;
  name: string;
  sql: string;
}

export interface MigrationReport {
  fromVersion: number;
  toVersion: number;
  applied: string[];
  /** Path of the copy taken before migrating, when the store already held data. */
  backupPath: string | null;
}

export function defaultMigrationsDir(): string {
  return join(dirname(fileURLToPath(import.meta.url)), 'migrations');
}

export function loadMigrations(dir: string = defaultMigrationsDir()): Migration[] {
  const files = readdirSync(dir)
    .filter((file) => /^\d{4}_[a-z0-9_]+\.sql$/.test(file))
    .sort();
  const migrations = files.map((file) => ({
    version: Number.parseInt(file.slice(0, 4), 10),
    name: file.replace(/\.sql$/, ''),
    sql: readFileSync(join(dir, file), 'utf8'),
  }));
  migrations.forEach((migration, index) => {
    if (migration.version !== index + 1) {
      throw new Error(
        `migrations must be numbered 0001, 0002, … without gaps; found ${migration.name} at position ${index + 1}`,
      );
    }
  });
  return migrations;
}

function backupBeforeMigrating(db: Database.Database, dbPath: string, fromVersion: number): string | null {
  if (fromVersion === 0 || !existsSync(dbPath) || statSync(dbPath).size === 0) return null;
  // The caller has run the integrity check: a damaged file never gets here (its copy would be worthless).
  return snapshotToBackups(db, dirname(dbPath), fromVersion, 'migration');
}

export function migrate(
  db: Database.Database,
  options: { dbPath: string; migrationsDir?: string | undefined },
): MigrationReport {
  const migrations = loadMigrations(options.migrationsDir);
  const fromVersion = db.pragma('user_version', { simple: true }) as number;
  const latest = migrations.length;
  if (fromVersion > latest) {
    throw new Error(
      `the store ${options.dbPath} is at schema version ${fromVersion}, newer than this Pairwright (${latest}); update Pairwright instead of opening it with an older one`,
    );
  }
  const pending = migrations.filter((migration) => migration.version > fromVersion);
  const report: MigrationReport = { fromVersion, toVersion: fromVersion, applied: [], backupPath: null };
  if (pending.length === 0) return report;
  report.backupPath = backupBeforeMigrating(db, options.dbPath, fromVersion);
  for (const migration of pending) {
    const apply = db.transaction(() => {
      db.exec(migration.sql);
      db.pragma(`user_version = ${migration.version}`);
    });
    try {
      apply();
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      throw new Error(`migration ${migration.name} failed and was rolled back: ${reason}`, { cause: error });
    }
    report.applied.push(migration.name);
    report.toVersion = migration.version;
  }
  const violations = db.pragma('foreign_key_check') as unknown[];
  if (violations.length > 0) throw new Error(`after migrating, ${violations.length} rows break foreign keys`);
  return report;
}
