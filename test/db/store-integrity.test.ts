/**
 * A damaged, empty, foreign or newer store is refused on open with a message naming the backups folder and the
 * restore command; nothing is written to it and no migration backup is taken from it.
 */
import Database from 'better-sqlite3';
import { createHash } from 'node:crypto';
import {
  closeSync,
  cpSync,
  existsSync,
  mkdtempSync,
  openSync,
  readdirSync,
  readFileSync,
  rmSync,
  statSync,
  writeFileSync,
  writeSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { defaultMigrationsDir, loadMigrations } from '../../db/migrate';
import { openStore, STORE_FILE_NAME, StoreOpenError } from '../../db/store';
import { runCli } from '../../electron/cli/main';

let dataDir = '';
afterEach(() => rmSync(dataDir, { recursive: true, force: true }));

const storePath = () => join(dataDir, STORE_FILE_NAME);
const digest = () => createHash('sha256').update(readFileSync(storePath())).digest('hex');

/** A closed store with rows in several pages (WAL folded into the file). */
function storeWithData(migrationsDir?: string): void {
  dataDir = mkdtempSync(join(tmpdir(), 'pairwright-integrity-'));
  const store = openStore(migrationsDir ? { dataDir, migrationsDir } : { dataDir });
  const insert = store.db.prepare(
    "INSERT INTO campaigns (name, description, created_at, updated_at) VALUES (?, ?, 'x', 'x')",
  );
  for (let i = 0; i < 400; i++) insert.run(`Campaign ${i}`, 'd'.repeat(200));
  store.db.pragma('wal_checkpoint(TRUNCATE)');
  store.close();
}

/** Overwrites the start of the last pages (where the 400 rows are), like a disk or copy fault would. */
function flipBytes(): void {
  const pages = Math.floor(statSync(storePath()).size / 4096);
  const fd = openSync(storePath(), 'r+');
  for (let page = pages - 12; page < pages; page += 2) writeSync(fd, Buffer.alloc(48, 0xa5), 0, 48, page * 4096 + 2);
  closeSync(fd);
}

function expectRefusal(open: () => unknown, problem: string): StoreOpenError {
  let caught: unknown = null;
  try {
    open();
  } catch (error) {
    caught = error;
  }
  expect(caught).toBeInstanceOf(StoreOpenError);
  const refusal = caught as StoreOpenError;
  expect(refusal.problem).toBe(problem);
  expect(refusal.message).toContain(join(dataDir, 'backups'));
  expect(refusal.message).toContain('pairwright restore');
  return refusal;
}

describe('opening a store that is not sound', () => {
  it('refuses a store with flipped bytes and leaves the file as it was', () => {
    storeWithData();
    flipBytes();
    const before = digest();
    expectRefusal(() => openStore({ dataDir }), 'damaged');
    expect(digest()).toBe(before);
  });

  it('takes no migration backup from a damaged store', () => {
    const oldMigrations = mkdtempSync(join(tmpdir(), 'pairwright-old-migrations-'));
    cpSync(join(defaultMigrationsDir(), '0001_foundation.sql'), join(oldMigrations, '0001_foundation.sql'));
    storeWithData(oldMigrations);
    rmSync(oldMigrations, { recursive: true });
    flipBytes();
    expectRefusal(() => openStore({ dataDir }), 'damaged');
    expect(existsSync(join(dataDir, 'backups')) ? readdirSync(join(dataDir, 'backups')) : []).toEqual([]);
  });

  it('refuses a 0-byte file it did not just create, but creates a new store where none was', () => {
    dataDir = mkdtempSync(join(tmpdir(), 'pairwright-integrity-'));
    writeFileSync(storePath(), '');
    expectRefusal(() => openStore({ dataDir }), 'empty');
    rmSync(storePath());
    const fresh = openStore({ dataDir });
    expect(fresh.migration.fromVersion).toBe(0);
    fresh.close();
  });

  it('refuses a file that is not SQLite', () => {
    dataDir = mkdtempSync(join(tmpdir(), 'pairwright-integrity-'));
    writeFileSync(storePath(), 'name,diameter\nA,4.1\n'.repeat(300));
    const refusal = expectRefusal(() => openStore({ dataDir }), 'not_a_store');
    expect(refusal.message).toMatch(/is not an SQLite database/);
  });

  it('refuses a store from a newer Pairwright with a clear message', () => {
    storeWithData();
    const db = new Database(storePath());
    db.pragma('user_version = 999');
    db.close();
    const refusal = expectRefusal(() => openStore({ dataDir }), 'newer');
    expect(refusal.message).toMatch(/schema version 999, newer than this Pairwright/);
  });

  it('the CLI prints the refusal as one line without a stack trace (exit 2)', async () => {
    storeWithData();
    flipBytes();
    const run = await runCli(['campaigns', 'list', '--data', dataDir]);
    expect(run.exitCode).toBe(2);
    expect(run.stderr).toMatch(/^pairwright: The store .* is damaged/);
    expect(run.stderr).toContain('pairwright restore');
    expect(run.stderr).not.toMatch(/\n\s+at /);
    const check = await runCli(['check', '--data', dataDir]);
    expect(check.exitCode).toBe(2);
  });

  it('the full check passes on a sound store', async () => {
    storeWithData();
    const check = await runCli(['check', '--data', dataDir, '--json']);
    expect(check.exitCode).toBe(0);
    expect(JSON.parse(check.stdout)).toMatchObject({ ok: true, schemaVersion: loadMigrations().length });
  });
});
