/**
 * The workspace store: one SQLite file per workspace, WAL mode, foreign keys on, migrated on open.
 * Node (tests, CLI, browser host) and Electron each load their own build of better-sqlite3; Electron
 * passes `nativeBinding` (see DEVELOPERS.md, "Two native builds").
 */
import Database from 'better-sqlite3';
import { chmodSync, closeSync, existsSync, mkdirSync, openSync } from 'node:fs';
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

/** Owner-only modes: the data folder and backups folder 0700, the store, its WAL/SHM and backups 0600. */
export const PRIVATE_DIR_MODE = 0o700;
export const PRIVATE_FILE_MODE = 0o600;

/** Creates `dir` (and parents) if needed and makes it owner-only. */
export function ensurePrivateDir(dir: string): void {
  mkdirSync(dir, { recursive: true, mode: PRIVATE_DIR_MODE });
  chmodSync(dir, PRIVATE_DIR_MODE);
}

/** Creates an empty owner-only file (fails if it exists); SQLite gives the WAL and SHM files the same mode. */
export function createPrivateFile(path: string): void {
  closeSync(openSync(path, 'wx', PRIVATE_FILE_MODE));
}

function restrictStoreFiles(path: string): void {
  for (const file of [path, `${path}-wal`, `${path}-shm`]) if (existsSync(file)) chmodSync(file, PRIVATE_FILE_MODE);
}

export function openStore(options: OpenStoreOptions): Store {
  const dataDir = resolve(options.dataDir);
  ensurePrivateDir(dataDir);
  const path = join(dataDir, STORE_FILE_NAME);
  if (!existsSync(path)) createPrivateFile(path);
  restrictStoreFiles(path);
  const db = new Database(path, options.nativeBinding ? { nativeBinding: options.nativeBinding } : {});
  try {
    db.pragma('journal_mode = WAL');
    restrictStoreFiles(path);
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
