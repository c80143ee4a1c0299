#!/usr/bin/env node
// `npm run serve`: builds the renderer only when one of its sources is newer than the build (a fresh checkout,
// an edit, a dependency change), and the host bundle (dist-electron/serve.mjs, scripts/build-desktop.mjs) only
// when a main-process source is newer than it; then runs the host bundle in this process (electron/host/serve.ts,
// bundled: it starts about a second sooner than through tsx). Arguments after `--` go to the host
// (`npm run serve -- --port 8080 --data DIR`).
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const builtIndex = join(root, 'dist', 'renderer', 'index.html');
const hostBundle = join(root, 'dist-electron', 'serve.mjs');
const HOST_SOURCE_DIRS = ['electron', 'db', 'shared-model'];
// What the renderer build is made of: its own sources, the pure model it imports, and the toolchain's pins.
const SOURCE_DIRS = ['renderer', 'shared-model'];
const SOURCE_FILES = ['package-lock.json', 'package.json'];

function newestMs(dir) {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestMs(path));
    else newest = Math.max(newest, statSync(path).mtimeMs);
  }
  return newest;
}

/** The source newer than the build, or null when the build is current. */
export function staleRendererSource() {
  if (!existsSync(builtIndex)) return 'no build yet';
  const built = statSync(builtIndex).mtimeMs;
  for (const dir of SOURCE_DIRS) if (newestMs(join(root, dir)) > built) return `${dir}/ changed`;
  for (const file of SOURCE_FILES)
    if (existsSync(join(root, file)) && statSync(join(root, file)).mtimeMs > built) return `${file} changed`;
  return null;
}

/** Why the host bundle must be rebuilt, or null when it is current. */
export function staleHostSource() {
  if (!existsSync(hostBundle)) return 'no bundle yet';
  const built = statSync(hostBundle).mtimeMs;
  for (const dir of HOST_SOURCE_DIRS) if (newestMs(join(root, dir)) > built) return `${dir}/ changed`;
  return null;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const stale = staleRendererSource();
  if (stale !== null) {
    console.log(`Building the renderer (${stale})…`);
    const vite = join(root, 'node_modules', 'vite', 'bin', 'vite.js');
    const build = spawnSync(
      process.execPath,
      [vite, 'build', '--config', join(root, 'renderer', 'vite.config.ts'), '--logLevel', 'warn'],
      {
        cwd: root,
        stdio: 'inherit',
      },
    );
    if (build.status !== 0) process.exit(build.status ?? 1);
  }
  const staleHost = staleHostSource();
  if (staleHost !== null) {
    console.log(`Bundling the host (${staleHost})…`);
    const { buildDesktop } = await import('./build-desktop.mjs');
    await buildDesktop();
  }
  await import(pathToFileURL(hostBundle).href);
}
