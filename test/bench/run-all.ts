/**
 * `npm run bench`: runs every benchmark in this folder (files ending in .bench.ts, each exporting
 * `run(): Promise<void>` that prints its figures). Benchmarks print numbers; they never fail a test run.
 */
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const only = process.argv[2];
const files = readdirSync(here)
  .filter((file) => file.endsWith('.bench.ts'))
  .filter((file) => !only || file.includes(only))
  .sort();

console.log(`node ${process.version}, ${process.platform}/${process.arch}`);
for (const file of files) {
  console.log(`\n== ${file}`);
  const module = (await import(pathToFileURL(join(here, file)).href)) as { run: () => Promise<void> };
  await module.run();
}
