/**
 * The workspace store: one SQLite file per workspace, WAL mode, foreign keys on, migrated on open.
 * Node (tests, CLI, browser host) and Electron each load their own build of better-sqlite3; Electron
 * passes `nativeBinding` (see DEVELOPERS.md, "Two native builds").
 */
import Database from 'better-sqlite3';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { migrate, type MigrationReport } from './migrate';

export type SqliteDatabase = Database.Database;

export const STORE_FILE_NAME = 'pairwright.sqlite';

export interface Store {
  db: SqliteDatabase;
  /** Absolute path of the SQLite file. */
  path: string;
  dataDir: string;
  migration: MigrationReport;
  close(): void;
}

export interface OpenStoreOptions {
  dataDir: string;
  /** Path to a better_sqlite3.node built for the running runtime (Electron); Node uses the default build. */
  nativeBinding?: string;
  migrationsDir?: string;
}

export function openStore(options: OpenStoreOptions): Store {
  const dataDir = resolve(options.dataDir);
  mkdirSync(dataDir, { recursive: true });
  const path = join(dataDir, STORE_FILE_NAME);
  const db = new Database(path, options.nativeBinding ? { nativeBinding: options.nativeBinding } : {});
  try {
    db.pragma('journal_mode = WAL');
    db.pragma('foreign_keys = ON');
    db.pragma('busy_timeout = 5000');
    const migration = migrate(db, { dbPath: path, migrationsDir: options.migrationsDir });
    return { db, path, dataDir, migration, close: () => db.close() };
  } catch (error) {
    db.close();
    throw error;
  }
}

/** ISO timestamp used for created_at / updated_at columns. */
export function nowIso(): string {
  return new Date().toISOString();
}
