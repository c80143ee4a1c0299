/** Migrations on real SQLite files: from empty, from a previous version (with a backup), and failure rollback. */
import Database from 'better-sqlite3';
import { cpSync, existsSync, readdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultMigrationsDir, loadMigrations, migrate } from '../../db/migrate';
import { openStore, STORE_FILE_NAME } from '../../db/store';
import { tempDataDir } from '../support/host-fixture';
import { tempDir } from '../support/temp-dirs';

describe('migrations', () => {
  it('bring an empty store to the latest version with WAL and foreign keys on', () => {
    const store = openStore({ dataDir: tempDataDir() });
    const latest = loadMigrations().length;
    expect(store.migration.fromVersion).toBe(0);
    expect(store.migration.toVersion).toBe(latest);
    expect(store.db.pragma('user_version', { simple: true })).toBe(latest);
    expect(store.db.pragma('journal_mode', { simple: true })).toBe('wal');
    expect(store.db.pragma('foreign_keys', { simple: true })).toBe(1);
    expect(store.migration.backupPath).toBeNull();
    store.close();
  });

  it('migrate a store left at version 1 to the latest version, keeping its data', () => {
    const dataDir = tempDataDir();
    const partialDir = tempDir('pairwright-migrations-');
    cpSync(join(defaultMigrationsDir(), '0001_foundation.sql'), join(partialDir, '0001_foundation.sql'));
    const old = openStore({ dataDir, migrationsDir: partialDir });
    old.db.prepare("INSERT INTO campaigns (name, created_at, updated_at) VALUES ('Kept', 'x', 'x')").run();
    old.close();

    const store = openStore({ dataDir });
    expect(store.migration.fromVersion).toBe(1);
    expect(store.migration.toVersion).toBe(loadMigrations().length);
    expect(store.db.prepare('SELECT name FROM campaigns').all()).toEqual([{ name: 'Kept' }]);
    store.close();
  });

  it('back up the file before applying a pending migration', () => {
    const dataDir = tempDataDir();
    const dir = tempDir('pairwright-migrations-');
    cpSync(join(defaultMigrationsDir(), '0001_foundation.sql'), join(dir, '0001_foundation.sql'));
    const old = openStore({ dataDir, migrationsDir: dir });
    old.db.prepare("INSERT INTO campaigns (name, created_at, updated_at) VALUES ('Kept', 'x', 'x')").run();
    old.close();
    writeFileSync(
      join(dir, '0002_campaign_colour.sql'),
      "ALTER TABLE campaigns ADD COLUMN colour TEXT NOT NULL DEFAULT 'teal';\n",
    );
    const store = openStore({ dataDir, migrationsDir: dir });
    expect(store.migration.applied).toEqual(['0002_campaign_colour']);
    expect(store.db.prepare('SELECT name, colour FROM campaigns').all()).toEqual([{ name: 'Kept', colour: 'teal' }]);
    const backupPath = store.migration.backupPath;
    expect(backupPath).not.toBeNull();
    expect(existsSync(backupPath ?? '')).toBe(true);
    const backup = new Database(backupPath ?? '', { readonly: true });
    expect(backup.pragma('user_version', { simple: true })).toBe(1);
    expect(backup.prepare('SELECT name FROM campaigns').all()).toEqual([{ name: 'Kept' }]);
    backup.close();
    store.close();
  });

  it('roll back a failing migration whole and leave the version where it was', () => {
    const dataDir = tempDataDir();
    const dir = tempDir('pairwright-migrations-');
    cpSync(join(defaultMigrationsDir(), '0001_foundation.sql'), join(dir, '0001_foundation.sql'));
    openStore({ dataDir, migrationsDir: dir }).close();
    writeFileSync(
      join(dir, '0002_broken.sql'),
      'CREATE TABLE half_done (id INTEGER);\nINSERT INTO no_such_table VALUES (1);\n',
    );
    expect(() => openStore({ dataDir, migrationsDir: dir })).toThrow(/0002_broken failed and was rolled back/);
    const db = new Database(join(dataDir, STORE_FILE_NAME));
    expect(db.pragma('user_version', { simple: true })).toBe(1);
    expect(db.prepare("SELECT count(*) AS n FROM sqlite_master WHERE name = 'half_done'").get()).toEqual({ n: 0 });
    db.close();
    expect(readdirSync(join(dataDir, 'backups')).length).toBe(1);
  });

  it('refuse a store from a newer Pairwright', () => {
    const dataDir = tempDataDir();
    openStore({ dataDir }).close();
    const db = new Database(join(dataDir, STORE_FILE_NAME));
    db.pragma('user_version = 999');
    db.close();
    expect(() => openStore({ dataDir })).toThrow(/newer than this Pairwright/);
  });

  it('numbered files have no gaps', () => {
    const versions = loadMigrations().map((m) => m.version);
    expect(versions).toEqual(versions.map((_, index) => index + 1));
    expect(() => migrate(new Database(':memory:'), { dbPath: ':memory:' })).not.toThrow();
  });
});
