/**
 * Checking a store file before anyone writes to it: SQLite's `PRAGMA quick_check` on every open (fast: page
 * structure and constraints, no index cross-check) and `PRAGMA integrity_check` on demand (SQLite documentation,
 * "PRAGMA integrity_check"). A store that fails is refused with a message naming the backups folder and the
 * restore command — never repaired, migrated or backed up in place.
 */
import type Database from 'better-sqlite3';
import { join } from 'node:path';

export type CheckLevel = 'quick' | 'full';
export type StoreProblem = 'damaged' | 'empty' | 'not_a_store' | 'newer' | 'unreadable';

export const BACKUPS_DIR_NAME = 'backups';

/** A store that cannot be opened safely; the message is for the user (no stack trace needed). */
export class StoreOpenError extends Error {
  readonly problem: StoreProblem;
  readonly path: string;
  constructor(problem: StoreProblem, path: string, message: string) {
    super(message);
    this.name = 'StoreOpenError';
    this.problem = problem;
    this.path = path;
  }
}

export function backupsDirOf(dataDir: string): string {
  return join(dataDir, BACKUPS_DIR_NAME);
}

/** The sentence every refusal ends with: where the backups are and how to restore one. */
export function restoreAdvice(dataDir: string): string {
  return `Nothing was changed. Backups are in ${backupsDirOf(dataDir)}; restore one with "pairwright restore <backup file>" (or move the damaged file away to start an empty store).`;
}

/** Problems SQLite reports (empty when the file is sound). Throws what SQLite throws for a non-database file. */
export function integrityProblems(db: Database.Database, level: CheckLevel): string[] {
  const rows = db.pragma(level === 'full' ? 'integrity_check' : 'quick_check') as Record<string, unknown>[];
  const messages = rows.map((row) => String(Object.values(row)[0]));
  return messages.length === 1 && messages[0] === 'ok' ? [] : messages;
}

function describeSqliteFailure(error: unknown): string {
  const code = (error as { code?: unknown }).code;
  const message = error instanceof Error ? error.message : String(error);
  return typeof code === 'string' ? `${message} (${code})` : message;
}

/** Runs the check and throws a StoreOpenError naming what is wrong; SQLite's own refusals are translated too. */
export function assertSound(db: Database.Database, path: string, dataDir: string, level: CheckLevel): void {
  let problems: string[];
  try {
    problems = integrityProblems(db, level);
  } catch (error) {
    const code = (error as { code?: unknown }).code;
    const notDb = code === 'SQLITE_NOTADB';
    const corrupt = code === 'SQLITE_CORRUPT';
    const problem: StoreProblem = notDb ? 'not_a_store' : corrupt ? 'damaged' : 'unreadable';
    const what = notDb ? 'is not an SQLite database' : corrupt ? 'is damaged' : 'cannot be read';
    throw new StoreOpenError(
      problem,
      path,
      `The store ${path} ${what}: ${describeSqliteFailure(error)}. ${restoreAdvice(dataDir)}`,
    );
  }
  if (problems.length > 0) {
    const shown = problems.slice(0, 3).join('; ');
    const more = problems.length > 3 ? ` (and ${problems.length - 3} more)` : '';
    throw new StoreOpenError(
      'damaged',
      path,
      `The store ${path} is damaged (SQLite ${level} check: ${shown}${more}). ${restoreAdvice(dataDir)}`,
    );
  }
}
