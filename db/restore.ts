/**
 * Restoring a backup: the candidate must be a sound SQLite file (full `integrity_check`) holding a Pairwright
 * schema this build can open; the current store is moved aside into the backups folder first (never deleted),
 * then the candidate is copied in with SQLite's online backup API and opened (migrated if older).
 * The current store must not be in use: switching it out of WAL mode needs the only connection, so an open
 * desktop app or browser host is detected and the restore refused.
 */
import Database from 'better-sqlite3';
import { existsSync, renameSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { backupFileName, ensureBackupsDir } from './backup';
import { integrityProblems } from './integrity';
import { loadMigrations } from './migrate';
import { createPrivateFile, openStore, STORE_FILE_NAME, type OpenStoreOptions, type Store } from './store';

export interface RestoreReport {
  restoredFrom: string;
  /** Where the previous store was put (null when there was none). */
  previousStoreKeptAt: string | null;
  fromSchemaVersion: number;
  store: Store;
}

/** A restore refused before anything changed; the message is for the user. */
export class RestoreError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'RestoreError';
  }
}

function checkCandidate(file: string, migrationsDir: string | undefined): { version: number; db: Database.Database } {
  if (!existsSync(file)) throw new RestoreError(`${file} does not exist`);
  if (statSync(file).size === 0) throw new RestoreError(`${file} is empty (0 bytes), not a backup`);
  let db: Database.Database;
  try {
    db = new Database(file, { readonly: true, fileMustExist: true });
  } catch (error) {
    throw new RestoreError(`${file} cannot be opened: ${error instanceof Error ? error.message : String(error)}`);
  }
  try {
    const problems = integrityProblems(db, 'full');
    if (problems.length > 0)
      throw new RestoreError(
        `${file} is damaged (SQLite integrity check: ${problems.slice(0, 3).join('; ')}); choose another backup`,
      );
    const version = db.pragma('user_version', { simple: true }) as number;
    const latest = loadMigrations(migrationsDir).length;
    if (version > latest)
      throw new RestoreError(
        `${file} is at schema version ${version}, newer than this Pairwright (${latest}); update Pairwright first`,
      );
    const hasCampaigns = db
      .prepare("SELECT count(*) AS n FROM sqlite_master WHERE type = 'table' AND name = 'campaigns'")
      .get() as { n: number };
    if (version < 1 || hasCampaigns.n === 0)
      throw new RestoreError(
        `${file} is an SQLite file but not a Pairwright store (no schema version or campaigns table)`,
      );
    return { version, db };
  } catch (error) {
    db.close();
    if (error instanceof RestoreError) throw error;
    const code = (error as { code?: unknown }).code;
    throw new RestoreError(`${file} is not a readable SQLite database${typeof code === 'string' ? ` (${code})` : ''}`);
  }
}

/**
 * Takes the current store out of WAL mode (folding the WAL into the file) and returns its schema version;
 * refuses when another program has it open. A damaged store gives version 0 and is moved aside as it is.
 */
function quiesceCurrent(path: string): number {
  const db = new Database(path, { fileMustExist: true });
  try {
    db.pragma('busy_timeout = 0');
    const mode = db.pragma('journal_mode = DELETE', { simple: true });
    if (mode !== 'delete') throw new RestoreError(`the store ${path} is in use (journal mode stayed ${String(mode)})`);
    return db.pragma('user_version', { simple: true }) as number;
  } catch (error) {
    if (error instanceof RestoreError) throw error;
    const code = (error as { code?: unknown }).code;
    if (code === 'SQLITE_BUSY' || code === 'SQLITE_LOCKED') {
      throw new RestoreError(
        `the store ${path} is in use by another program; close the desktop app and stop the browser host, then restore`,
      );
    }
    // A damaged current store cannot be checkpointed; it is moved aside as it is (with its WAL).
    console.warn(`[pairwright] the current store could not be checkpointed before the restore: ${String(error)}`);
    return 0;
  } finally {
    db.close();
  }
}

export async function restoreStore(
  dataDir: string,
  file: string,
  options: Omit<OpenStoreOptions, 'dataDir'> = {},
): Promise<RestoreReport> {
  const source = resolve(file);
  const candidate = checkCandidate(source, options.migrationsDir);
  try {
    const root = resolve(dataDir);
    const path = join(root, STORE_FILE_NAME);
    if (source === path) throw new RestoreError('that file is the current store; choose a backup');
    let keptAt: string | null = null;
    if (existsSync(path)) {
      const version = statSync(path).size > 0 ? quiesceCurrent(path) : 0;
      keptAt = join(ensureBackupsDir(root), backupFileName(version, 'before-restore'));
      renameSync(path, keptAt);
      for (const suffix of ['-wal', '-shm']) {
        if (existsSync(path + suffix)) renameSync(path + suffix, keptAt + suffix);
      }
    }
    createPrivateFile(path);
    await candidate.db.backup(path);
    const store = openStore({ ...options, dataDir: root, check: 'full', dailyBackup: false });
    return { restoredFrom: source, previousStoreKeptAt: keptAt, fromSchemaVersion: candidate.version, store };
  } finally {
    candidate.db.close();
  }
}
