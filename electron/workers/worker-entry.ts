/**
 * How to start a worker thread of ours: the bundled .mjs beside the desktop bundle when it exists; otherwise
 * (tests, CLI, browser host, all run through tsx) a small bootstrap that registers tsx in the worker thread
 * and imports the TypeScript source.
 */
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

/** `name` is the worker's file name without extension, e.g. "montecarlo-worker". */
export function workerEntry(name: string): { url: URL } | { code: string } {
  const bundled = new URL(`./${name}.mjs`, import.meta.url);
  if (bundled.protocol === 'file:' && existsSync(fileURLToPath(bundled))) return { url: bundled };
  const source = new URL(`./${name}.ts`, import.meta.url).href;
  const tsxPackage = createRequire(import.meta.url).resolve('tsx/package.json');
  const manifest = JSON.parse(readFileSync(tsxPackage, 'utf8')) as {
    exports: Record<string, { import?: { default?: string } }>;
  };
  const apiPath = manifest.exports['./esm/api']?.import?.default;
  if (!apiPath) throw new Error(`tsx/esm/api has no ESM entry; cannot start the ${name} from source`);
  const api = pathToFileURL(join(dirname(tsxPackage), apiPath)).href;
  const code =
    `import(${JSON.stringify(api)}).then((tsx) => { tsx.register(); return import(${JSON.stringify(source)}); })` +
    '.catch((error) => { console.error(error); process.exit(1); });';
  return { code };
}
