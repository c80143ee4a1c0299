#!/usr/bin/env node
// The `pairwright` command (package.json "bin"). Runs the CLI bundle (dist-electron/cli.mjs, made by
// `npm run build`) when it is newer than every source file; otherwise runs the TypeScript sources through tsx,
// so a fresh edit is never hidden behind a stale bundle.
import { existsSync, readdirSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const bundle = join(root, 'dist-electron', 'cli.mjs');

function newestSourceMs(dir) {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestSourceMs(path));
    else if (/\.(ts|cts|sql)$/.test(entry.name)) newest = Math.max(newest, statSync(path).mtimeMs);
  }
  return newest;
}

function bundleIsFresh() {
  if (!existsSync(bundle)) return false;
  const built = statSync(bundle).mtimeMs;
  return ['shared-model', 'electron', 'db'].every((dir) => newestSourceMs(join(root, dir)) <= built);
}

if (bundleIsFresh()) {
  await import(pathToFileURL(bundle).href);
} else {
  const { register } = await import('tsx/esm/api');
  register();
  await import('../electron/cli/bin.ts');
}
