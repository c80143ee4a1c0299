/** The data folder is owner-only (0700); the store, its WAL/SHM and backups are 0600, also for an older store. */
import { chmodSync, cpSync, mkdirSync, mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { defaultMigrationsDir } from '../../db/migrate';
import { openStore, STORE_FILE_NAME } from '../../db/store';

const mode = (path: string) => statSync(path).mode & 0o777;
let parent = '';
afterEach(() => rmSync(parent, { recursive: true, force: true }));

describe.skipIf(process.platform === 'win32')('store file permissions', () => {
  it('creates the data folder 0700 and the store, WAL and SHM 0600', () => {
    parent = mkdtempSync(join(tmpdir(), 'pairwright-perm-'));
    const dataDir = join(parent, 'nested', 'data');
    const store = openStore({ dataDir });
    store.db.prepare("INSERT INTO campaigns (name, created_at, updated_at) VALUES ('p', 'now', 'now')").run();
    expect(mode(dataDir)).toBe(0o700);
    for (const suffix of ['', '-wal', '-shm']) expect(mode(join(dataDir, STORE_FILE_NAME + suffix))).toBe(0o600);
    store.close();
  });

  it('tightens an existing open folder and store, and writes migration backups 0600 in a 0700 folder', () => {
    parent = mkdtempSync(join(tmpdir(), 'pairwright-perm-'));
    const oldMigrations = join(parent, 'migrations-v1');
    mkdirSync(oldMigrations);
    cpSync(join(defaultMigrationsDir(), '0001_foundation.sql'), join(oldMigrations, '0001_foundation.sql'));
    // A store from an older Pairwright (schema 1), so the next open migrates and backs up first.
    openStore({ dataDir: parent, migrationsDir: oldMigrations }).close();
    chmodSync(parent, 0o755);
    chmodSync(join(parent, STORE_FILE_NAME), 0o644);
    const store = openStore({ dataDir: parent });
    expect(mode(parent)).toBe(0o700);
    expect(mode(join(parent, STORE_FILE_NAME))).toBe(0o600);
    const backups = join(parent, 'backups');
    expect(mode(backups)).toBe(0o700);
    const files = readdirSync(backups);
    expect(files.length).toBe(1);
    expect(mode(join(backups, files[0] ?? ''))).toBe(0o600);
    store.close();
  });
});
