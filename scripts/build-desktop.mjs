// Bundles the Electron main process, the preload, the Monte Carlo worker, the `pairwright` CLI and the browser host into
// dist-electron/, and copies the SQL migrations beside them. Used by `npm start`, `npm run dist` and `npm run build`
// (bin/pairwright.mjs runs the CLI bundle when it is newer than the sources: it starts several times faster than
// running the TypeScript through tsx). The renderer is built separately by vite (dist/renderer).
import { build } from 'esbuild';
import { cpSync, mkdirSync, rmSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const out = join(root, 'dist-electron');

export async function buildDesktop() {
  rmSync(join(out, 'main.mjs'), { force: true });
  mkdirSync(out, { recursive: true });
  const common = {
    bundle: true,
    platform: 'node',
    target: 'node20',
    sourcemap: true,
    logLevel: 'warning',
    external: ['electron', 'better-sqlite3', 'playwright-core'],
  };
  await build({
    ...common,
    entryPoints: [join(root, 'electron', 'desktop', 'entry.ts')],
    outfile: join(out, 'main.mjs'),
    format: 'esm',
    banner: {
      js: "import { createRequire as __pairwrightRequire } from 'node:module'; const require = __pairwrightRequire(import.meta.url);",
    },
  });
  await build({
    ...common,
    entryPoints: [join(root, 'electron', 'desktop', 'preload.cts')],
    outfile: join(out, 'preload.cjs'),
    format: 'cjs',
  });
  await build({
    ...common,
    entryPoints: [join(root, 'electron', 'cli', 'bin.ts')],
    outfile: join(out, 'cli.mjs'),
    format: 'esm',
    sourcemap: false,
    banner: {
      js: "import { createRequire as __pairwrightRequire } from 'node:module'; const require = __pairwrightRequire(import.meta.url);",
    },
  });
  // the browser host of `npm run serve` (scripts/serve.mjs runs it when it is newer than the sources)
  await build({
    ...common,
    entryPoints: [join(root, 'electron', 'host', 'serve.ts')],
    outfile: join(out, 'serve.mjs'),
    format: 'esm',
    sourcemap: false,
    banner: {
      js: "import { createRequire as __pairwrightRequire } from 'node:module'; const require = __pairwrightRequire(import.meta.url);",
    },
  });
  await build({
    ...common,
    entryPoints: [join(root, 'electron', 'workers', 'montecarlo-worker.ts')],
    outfile: join(out, 'montecarlo-worker.mjs'),
    format: 'esm',
  });
  await build({
    ...common,
    entryPoints: [join(root, 'electron', 'workers', 'learn-worker.ts')],
    outfile: join(out, 'learn-worker.mjs'),
    format: 'esm',
  });
  await build({
    ...common,
    entryPoints: [join(root, 'electron', 'workers', 'compute-worker.ts')],
    outfile: join(out, 'compute-worker.mjs'),
    format: 'esm',
  });
  rmSync(join(out, 'migrations'), { recursive: true, force: true });
  cpSync(join(root, 'db', 'migrations'), join(out, 'migrations'), { recursive: true });
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  await buildDesktop();
  console.log(`desktop bundle written to ${out}`);
}
