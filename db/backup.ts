/**
 * Backups of the store, all owner-only (0600) in `backups/` beside it (0700):
 * - automatic: before each migration and once a day on the first open, as consistent snapshots (`VACUUM INTO`);
 * - on request: `backupToFile` with SQLite's online backup API (safe while the app writes);
 * - the folder keeps the newest N (the `backups_kept` setting); older ones are removed after each new one.
 * File names: pairwright-v<schema>-<UTC time>-<reason>.sqlite.
 */
import type Database from 'better-sqlite3';
import { chmodSync, closeSync, existsSync, mkdirSync, openSync, readdirSync, rmSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { backupsDirOf } from './integrity';

export type BackupReason = 'migration' | 'daily' | 'manual' | 'before-restore';

export interface BackupFile {
  path: string;
  fileName: string;
  schemaVersion: number;
  createdAt: string;
  reason: BackupReason;
  bytes: number;
}

const BACKUP_NAME =
  /^pairwright-v(\d+)-(\d{4}-\d{2}-\d{2})T(\d{2})-(\d{2})-(\d{2})-(\d{3})Z-(migration|daily|manual|before-restore)\.sqlite$/;

export function ensureBackupsDir(dataDir: string): string {
  const dir = backupsDirOf(dataDir);
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  chmodSync(dir, 0o700);
  return dir;
}

/** Creates `path` empty and owner-only; refuses to overwrite anything. */
function createOwnerOnlyFile(path: string): void {
  closeSync(openSync(path, 'wx', 0o600));
}

export function backupFileName(schemaVersion: number, reason: BackupReason, at: Date = new Date()): string {
  return `pairwright-v${schemaVersion}-${at.toISOString().replace(/[:.]/g, '-')}-${reason}.sqlite`;
}

/** A consistent snapshot of `db` into the backups folder (VACUUM INTO accepts an existing empty file). */
export function snapshotToBackups(
  db: Database.Database,
  dataDir: string,
  schemaVersion: number,
  reason: BackupReason,
): string {
  const target = join(ensureBackupsDir(dataDir), backupFileName(schemaVersion, reason));
  createOwnerOnlyFile(target);
  try {
    db.prepare('VACUUM INTO ?').run(target);
  } catch (error) {
    rmSync(target, { force: true });
    throw error;
  }
  return target;
}

/** SQLite's online backup API into a new file (which must not exist yet), owner-only. */
export async function backupToFile(db: Database.Database, target: string): Promise<number> {
  if (existsSync(target)) throw new Error(`${target} already exists; choose a new file name`);
  createOwnerOnlyFile(target);
  try {
    await db.backup(target);
  } catch (error) {
    rmSync(target, { force: true });
    throw error;
  }
  chmodSync(target, 0o600);
  return statSync(target).size;
}

/** Backups in the folder, newest first (only files named as Pairwright names them). */
export function listBackups(dataDir: string): BackupFile[] {
  const dir = backupsDirOf(dataDir);
  if (!existsSync(dir)) return [];
  const found: BackupFile[] = [];
  for (const fileName of readdirSync(dir)) {
    const match = BACKUP_NAME.exec(fileName);
    if (!match) continue;
    const [, version, day, hh, mm, ss, ms, reason] = match;
    const path = join(dir, fileName);
    found.push({
      path,
      fileName,
      schemaVersion: Number(version),
      createdAt: `${day}T${hh}:${mm}:${ss}.${ms}Z`,
      reason: reason as BackupReason,
      bytes: statSync(path).size,
    });
  }
  return found.sort((a, b) => (a.createdAt < b.createdAt ? 1 : a.createdAt > b.createdAt ? -1 : 0));
}

/** Removes all but the newest `keep` backups; returns the removed paths. */
export function pruneBackups(dataDir: string, keep: number): string[] {
  const removed = listBackups(dataDir).slice(Math.max(1, keep));
  for (const backup of removed) rmSync(backup.path);
  return removed.map((backup) => backup.path);
}

/** True when no backup was written on this UTC day yet. */
export function dailyBackupDue(dataDir: string, now: Date = new Date()): boolean {
  const newest = listBackups(dataDir)[0];
  return newest === undefined || newest.createdAt.slice(0, 10) !== now.toISOString().slice(0, 10);
}
