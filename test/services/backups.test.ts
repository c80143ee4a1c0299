/**
 * Backups and restore on real SQLite files: backup → restore gives back every row of every table; the current
 * store is kept aside; damaged, foreign and newer files are refused before anything changes; a store in use is
 * not swapped; daily backups on the first open of a day; the folder keeps the newest N (a setting in the store).
 */
import Database from 'better-sqlite3';
import { existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, STORE_FILE_NAME, type Store } from '../../db/store';
import { runCli } from '../../electron/cli/main';
import { dispatch } from '../../electron/services/dispatch';
import { restoreWorkspace } from '../../electron/services/workspace';
import { dispatchValue } from '../support/dispatch';
import { dumpTables } from '../support/table-dump';

let dataDir = '';
let outside = '';
let store: Store | null = null;
beforeEach(() => {
  dataDir = mkdtempSync(join(tmpdir(), 'pairwright-backups-'));
  outside = mkdtempSync(join(tmpdir(), 'pairwright-backup-target-'));
});
afterEach(() => {
  store?.close();
  store = null;
  rmSync(dataDir, { recursive: true, force: true });
  rmSync(outside, { recursive: true, force: true });
});

const open = () => (store = openStore({ dataDir, dailyBackup: false }));
const closeStore = () => {
  store?.close();
  store = null;
};
const backupFiles = () => (existsSync(join(dataDir, 'backups')) ? readdirSync(join(dataDir, 'backups')).sort() : []);

describe('backup and restore', () => {
  it('round-trips every table through pairwright backup --to and pairwright restore', async () => {
    const context = { store: open() };
    await dispatchValue(context, 'campaigns.loadDemo', {});
    await dispatchValue(context, 'backups.setKeep', { keep: 9 });
    const before = dumpTables(context.store.db);
    const filled = Object.entries(before)
      .filter(([, rows]) => rows.length > 0)
      .map(([table]) => table);
    expect(filled).toEqual(
      expect.arrayContaining(['campaigns', 'pairs', 'predictions', 'batches', 'outcome_diameters', 'settings']),
    );
    closeStore();

    const file = join(outside, 'copy.sqlite');
    const made = await runCli(['backup', '--to', file, '--data', dataDir, '--json']);
    expect(made.exitCode).toBe(0);
    expect(JSON.parse(made.stdout)).toMatchObject({ path: file });

    const later = open();
    await dispatchValue({ store: later }, 'campaigns.create', { name: 'Written after the backup' });
    closeStore();

    const restored = await runCli(['restore', file, '--data', dataDir, '--json']);
    expect(restored.stderr).toBe('');
    const report = JSON.parse(restored.stdout) as { previousStoreKeptAt: string };
    const after = dumpTables(open().db);
    expect(after).toEqual(before);
    closeStore();
    const aside = new Database(report.previousStoreKeptAt, { readonly: true });
    expect(aside.prepare("SELECT count(*) AS n FROM campaigns WHERE name = 'Written after the backup'").get()).toEqual({
      n: 1,
    });
    aside.close();
    expect(report.previousStoreKeptAt).toMatch(/backups[/\\]pairwright-v\d+-.*-before-restore\.sqlite$/);
  });

  it('refuses a damaged, foreign, empty or newer file and changes nothing', async () => {
    const context = { store: open() };
    await dispatchValue(context, 'campaigns.create', { name: 'Current' });
    const before = dumpTables(context.store.db);
    closeStore();
    const notSqlite = join(outside, 'notes.sqlite');
    writeFileSync(notSqlite, 'just text\n'.repeat(100));
    const empty = join(outside, 'empty.sqlite');
    writeFileSync(empty, '');
    const foreign = join(outside, 'foreign.sqlite');
    const other = new Database(foreign);
    other.exec('CREATE TABLE t (x)');
    other.pragma('user_version = 3');
    other.close();
    const newer = join(outside, 'newer.sqlite');
    const newerDb = new Database(newer);
    newerDb.exec('CREATE TABLE campaigns (id INTEGER)');
    newerDb.pragma('user_version = 99');
    newerDb.close();
    const expectations: [string, RegExp][] = [
      [notSqlite, /not a readable SQLite database/],
      [empty, /empty \(0 bytes\)/],
      [foreign, /not a Pairwright store/],
      [newer, /schema version 99, newer than this Pairwright/],
      [join(outside, 'missing.sqlite'), /does not exist/],
    ];
    for (const [file, message] of expectations) {
      const run = await runCli(['restore', file, '--data', dataDir]);
      expect(run.exitCode).toBe(2);
      expect(run.stderr).toMatch(message);
      expect(run.stderr).not.toMatch(/\n\s+at /);
    }
    expect(dumpTables(open().db)).toEqual(before);
    expect(backupFiles()).toEqual([]);
  });

  it('does not swap a store another program has open', async () => {
    const context = { store: open() };
    await dispatchValue(context, 'campaigns.create', { name: 'In use' });
    const file = join(outside, 'copy.sqlite');
    await dispatchValue(context, 'backups.create', { to: file });
    await expect(restoreWorkspace(dataDir, file)).rejects.toThrow(/in use by another program/);
    expect(existsSync(join(dataDir, STORE_FILE_NAME))).toBe(true);
    expect(backupFiles()).toEqual([]);
  });

  it('takes a daily backup on the first open of a day only, and keeps the newest N', async () => {
    openStore({ dataDir }).close(); // just created: nothing to back up
    expect(backupFiles()).toEqual([]);
    openStore({ dataDir }).close();
    expect(backupFiles()).toEqual([expect.stringMatching(/^pairwright-v\d+-.*-daily\.sqlite$/)]);
    openStore({ dataDir }).close();
    expect(backupFiles().length).toBe(1);

    const context = { store: open() };
    await dispatchValue(context, 'backups.setKeep', { keep: 2 });
    for (let i = 0; i < 3; i++) await dispatchValue(context, 'backups.create', {});
    const overview = await dispatchValue<{ keep: number; backups: { reason: string }[] }>(context, 'backups.list', {});
    expect(overview.keep).toBe(2);
    expect(overview.backups.map((b) => b.reason)).toEqual(['manual', 'manual']);
    expect(backupFiles().length).toBe(2);
  });

  it('refuses an overwrite, a relative path and an absurd kept count, naming the field', async () => {
    const context = { store: open() };
    const taken = join(outside, 'taken.sqlite');
    writeFileSync(taken, 'x');
    await expect(dispatchValue(context, 'backups.create', { to: taken })).rejects.toThrow(/already exists/);
    await expect(dispatchValue(context, 'backups.create', { to: 'relative.sqlite' })).rejects.toThrow(/absolute path/);
    await expect(dispatchValue(context, 'backups.setKeep', { keep: 0 })).rejects.toThrow(/at least 1/);
  });

  it('refuses a backup into a folder that does not exist as a field error, not an internal one', async () => {
    const context = { store: open() };
    const folder = join(outside, 'no-such-folder');
    const answer = await dispatch(context, 'backups.create', { to: join(folder, 'b.sqlite') });
    expect(answer).toEqual({
      ok: false,
      error: {
        code: 'invalid_input',
        field: 'to',
        message: `the folder ${folder} does not exist; create it first or choose another`,
      },
    });
  });
});
