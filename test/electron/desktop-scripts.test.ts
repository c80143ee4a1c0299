/** The desktop start script and bundle: a clear message without Electron, and a preload that needs only 'electron'. */
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { tempDataDir } from '../support/host-fixture';

describe('npm start without the Electron binary', () => {
  it('explains what is missing and points to the browser host', () => {
    const run = spawnSync(process.execPath, ['scripts/start-electron.mjs'], {
      encoding: 'utf8',
      env: { ...process.env, PAIRWRIGHT_ELECTRON_DIR: tempDataDir('pairwright-no-electron-') },
    });
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/Electron is not installed/);
    expect(run.stderr).toMatch(/npm run serve/);
  });
});

describe('desktop bundle', () => {
  it('bundles main and preload; the preload requires nothing but electron', async () => {
    const { buildDesktop } = await import('../../scripts/build-desktop.mjs');
    await buildDesktop();
    const out = join(process.cwd(), 'dist-electron');
    expect(existsSync(join(out, 'main.mjs'))).toBe(true);
    expect(existsSync(join(out, 'migrations', '0001_foundation.sql'))).toBe(true);
    const preload = readFileSync(join(out, 'preload.cjs'), 'utf8');
    const required = [...preload.matchAll(/require\("([^"]+)"\)/g)].map((match) => match[1]);
    expect(new Set(required)).toEqual(new Set(['electron']));
    expect(preload).toContain('exposeInMainWorld("pairwright"');
  }, 60_000);
});
