#!/usr/bin/env node
// Electron's own type declarations (electron.d.ts) for the boundary type test (test/types/). Electron is an
// optional dependency whose install fails offline (its binary cannot be downloaded); the package's tarball
// still carries electron.d.ts. `node scripts/electron-types.mjs --fetch` unpacks it from `npm pack` (no install
// script runs) into .cache/electron-types/<version>/; .ci/run does that before `npm test`.
import { execFileSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');

/** The Electron version the project pins (package.json optionalDependencies). */
export function pinnedElectronVersion() {
  const manifest = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8'));
  const version = manifest.optionalDependencies?.electron;
  if (typeof version !== 'string') throw new Error('package.json has no optionalDependencies.electron');
  return version;
}

export function cachedTypesPath(version = pinnedElectronVersion()) {
  return join(root, '.cache', 'electron-types', version, 'electron.d.ts');
}

/** electron.d.ts of the pinned version: the installed package's, else the unpacked tarball's; null when neither. */
export function findElectronTypes() {
  const version = pinnedElectronVersion();
  const installed = join(root, 'node_modules', 'electron');
  if (existsSync(join(installed, 'electron.d.ts'))) {
    const installedVersion = JSON.parse(readFileSync(join(installed, 'package.json'), 'utf8')).version;
    if (installedVersion === version) return join(installed, 'electron.d.ts');
  }
  const cached = cachedTypesPath(version);
  return existsSync(cached) ? cached : null;
}

/** Unpacks electron.d.ts from `npm pack electron@<pinned>` into the cache; returns its path. */
export function fetchElectronTypes() {
  const version = pinnedElectronVersion();
  const target = cachedTypesPath(version);
  if (existsSync(target)) return target;
  const work = mkdtempSync(join(tmpdir(), 'pairwright-electron-types-'));
  try {
    const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
    const name = execFileSync(npm, ['pack', `electron@${version}`, '--pack-destination', work, '--silent'], {
      encoding: 'utf8',
    }).trim();
    execFileSync('tar', ['-xzf', join(work, name.split('\n').pop()), '-C', work, 'package/electron.d.ts']);
    mkdirSync(dirname(target), { recursive: true });
    copyFileSync(join(work, 'package', 'electron.d.ts'), target);
    return target;
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const path = process.argv.includes('--fetch') ? fetchElectronTypes() : findElectronTypes();
  if (path === null) {
    console.error(`electron.d.ts ${pinnedElectronVersion()} not found; run: node scripts/electron-types.mjs --fetch`);
    process.exit(1);
  }
  console.log(path);
}
