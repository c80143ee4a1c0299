/**
 * The workspace store: one SQLite file per workspace, WAL mode, foreign keys on, migrated on open.
 * Node (tests, CLI, browser host) and Electron each load their own build of better-sqlite3; Electron
 * passes `nativeBinding` (see DEVELOPERS.md, "Two native builds").
 */
import Database from 'better-sqlite3';
import { chmodSync, closeSync, existsSync, mkdirSync, openSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { dailyBackupDue, pruneBackups, snapshotToBackups } from './backup';
import { assertSound, restoreAdvice, StoreOpenError, type CheckLevel } from './integrity';
import { loadMigrations, migrate, type MigrationReport } from './migrate';
import { backupsKept } from './repositories/settings';

export { StoreOpenError } from './integrity';

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
  /** 'quick' (default, every open) or 'full' (`PRAGMA integrity_check`, on demand). */
  check?: CheckLevel;
  /** Take the day's first backup on open (default true). */
  dailyBackup?: boolean;
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

/** Latest schema version this build knows (the number of migrations). */
function latestVersion(migrationsDir: string | undefined): number {
  return loadMigrations(migrationsDir).length;
}

function refuseNewer(path: string, dataDir: string, version: number, latest: number): StoreOpenError {
  return new StoreOpenError(
    'newer',
    path,
    `The store ${path} is at schema version ${version}, newer than this Pairwright (${latest}); it was written by a newer ` +
      `Pairwright. Update Pairwright to open it. ${restoreAdvice(dataDir)}`,
  );
}

/**
 * Opens the store in `options.dataDir`: refuses an empty file it did not just create, a file that is not SQLite,
 * a damaged one (`PRAGMA quick_check`, or the full `integrity_check` with `check: 'full'`) and one from a newer
 * Pairwright — each with a StoreOpenError naming the backups folder and the restore command — then migrates
 * (with a backup first), takes the day's first backup and prunes the backups folder to the kept count.
 */
export function openStore(options: OpenStoreOptions): Store {
  const dataDir = resolve(options.dataDir);
  ensurePrivateDir(dataDir);
  const path = join(dataDir, STORE_FILE_NAME);
  const justCreated = !existsSync(path);
  if (justCreated) createPrivateFile(path);
  else if (statSync(path).size === 0 && !existsSync(`${path}-wal`)) {
    throw new StoreOpenError(
      'empty',
      path,
      `The store ${path} is an empty file (0 bytes), not a Pairwright store: it may have been truncated. ${restoreAdvice(dataDir)}`,
    );
  }
  restrictStoreFiles(path);
  let db: SqliteDatabase;
  try {
    db = new Database(path, options.nativeBinding ? { nativeBinding: options.nativeBinding } : {});
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    throw new StoreOpenError(
      'unreadable',
      path,
      `The store ${path} cannot be opened: ${reason}. ${restoreAdvice(dataDir)}`,
    );
  }
  try {
    db.pragma('busy_timeout = 5000');
    assertSound(db, path, dataDir, options.check ?? 'quick');
    const version = db.pragma('user_version', { simple: true }) as number;
    const latest = latestVersion(options.migrationsDir);
    if (version > latest) throw refuseNewer(path, dataDir, version, latest);
    db.pragma('journal_mode = WAL');
    restrictStoreFiles(path);
    db.pragma('foreign_keys = ON');
    const migration = migrate(db, { dbPath: path, migrationsDir: options.migrationsDir });
    if (migration.backupPath !== null) pruneBackups(dataDir, backupsKept(db));
    if (!justCreated && migration.fromVersion > 0 && options.dailyBackup !== false)
      takeDailyBackup(db, dataDir, migration.toVersion);
    return { db, path, dataDir, migration, close: () => db.close() };
  } catch (error) {
    db.close();
    throw error;
  }
}

function takeDailyBackup(db: SqliteDatabase, dataDir: string, version: number): void {
  if (!dailyBackupDue(dataDir)) return;
  snapshotToBackups(db, dataDir, version, 'daily');
  pruneBackups(dataDir, backupsKept(db));
}

/** ISO timestamp used for created_at / updated_at columns. */
export function nowIso(): string {
  return new Date().toISOString();
}
