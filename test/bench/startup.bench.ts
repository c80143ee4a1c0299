/**
 * Start-up: `npm run serve` (scripts/serve.mjs) to a usable page when the builds are current, and the CLI
 * called as the installed bin (./node_modules/.bin/pairwright) and through npx. Each figure is the wall time
 * from spawning the process; the median of several starts is printed beside its target (issue 9).
 */
import { spawn, spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { removeTempDir, tempDir } from '../support/temp-dirs';

const root = process.cwd();

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] as number;
}

/** Spawns serve.mjs; resolves with the ms until the printed login address has given a logged-in page. */
function timeServeToPage(dataDir: string): Promise<number> {
  return new Promise((resolve, reject) => {
    const start = performance.now();
    const child = spawn(process.execPath, ['scripts/serve.mjs', '--port', '0', '--data', dataDir], {
      cwd: root,
      stdio: ['ignore', 'pipe', 'inherit'],
    });
    let out = '';
    let asked = false;
    child.on('error', reject);
    child.on('exit', (code) => {
      if (!asked) reject(new Error(`serve exited with code ${code} before printing its address:\n${out}`));
    });
    child.stdout.on('data', (chunk: Buffer) => {
      out += chunk.toString('utf8');
      const address = /(http:\/\/127\.0\.0\.1:\d+\/\S*)/.exec(out)?.[1];
      if (address === undefined || asked) return;
      asked = true;
      void (async () => {
        try {
          const login = await fetch(address, { redirect: 'manual' });
          const cookie = login.headers.get('set-cookie')?.split(';')[0] ?? '';
          const page = await fetch(new URL('/', address), { headers: { cookie } });
          const html = await page.text();
          const elapsed = performance.now() - start;
          if (page.status !== 200 || !html.includes('<div id="root">')) throw new Error(`page answered ${page.status}`);
          resolve(elapsed);
        } catch (error) {
          reject(error instanceof Error ? error : new Error(String(error)));
        } finally {
          child.kill('SIGTERM');
        }
      })();
    });
  });
}

function timeCommand(command: string, args: string[]): number {
  const start = performance.now();
  const run = spawnSync(command, args, { cwd: root, encoding: 'utf8' });
  const elapsed = performance.now() - start;
  if (run.status !== 0) throw new Error(`${command} ${args.join(' ')} failed: ${run.stderr}`);
  return elapsed;
}

export async function run(): Promise<void> {
  const dataDir = tempDir('pairwright-bench-serve-');
  try {
    const first = await timeServeToPage(dataDir); // builds the renderer and the host bundle if a source changed
    const serve: number[] = [];
    for (let i = 0; i < 5; i++) serve.push(await timeServeToPage(dataDir));
    console.log(`${'npm run serve: first start (builds only what is stale)'.padEnd(58)} ${first.toFixed(0)} ms`);
    console.log(
      `${'npm run serve: start to a usable page, builds current'.padEnd(58)} ${median(serve).toFixed(0)} ms ` +
        `(median of 5, min ${Math.min(...serve).toFixed(0)}); target < 1500 ms`,
    );
  } finally {
    removeTempDir(dataDir);
  }
  const bin = join(root, 'node_modules', '.bin', 'pairwright');
  timeCommand(bin, ['--help']); // warm the file cache
  const cli: number[] = [];
  for (let i = 0; i < 7; i++) cli.push(timeCommand(bin, ['--help']));
  console.log(
    `${'CLI start, ./node_modules/.bin/pairwright --help'.padEnd(58)} ${median(cli).toFixed(0)} ms ` +
      `(median of 7, min ${Math.min(...cli).toFixed(0)}); target < 300 ms`,
  );
  const bare: number[] = [];
  for (let i = 0; i < 7; i++) bare.push(timeCommand(process.execPath, ['-e', '0']));
  console.log(`${'node -e 0 (the floor on this machine now)'.padEnd(58)} ${median(bare).toFixed(0)} ms`);
  const npx = timeCommand('npx', ['pairwright', '--help']);
  console.log(`${'CLI start through npx pairwright --help (for comparison)'.padEnd(58)} ${npx.toFixed(0)} ms`);
}
