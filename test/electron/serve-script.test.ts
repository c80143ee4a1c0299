/** `npm run serve` (scripts/serve.mjs): rebuilds only what is stale, starts the host bundle, serves a logged-in page. */
import { spawn } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { staleHostSource, staleRendererSource } from '../../scripts/serve.mjs';
import { tempDataDir } from '../support/host-fixture';
import { TIMEOUTS } from '../support/timeouts';

/** Starts serve.mjs and returns what it printed once its login address gave a page, with that page. */
function serveOnce(dataDir: string): Promise<{ printed: string; status: number; html: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['scripts/serve.mjs', '--port', '0', '--data', dataDir], {
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let printed = '';
    let asked = false;
    child.stderr.on('data', (chunk: Buffer) => (printed += chunk.toString('utf8')));
    child.on('exit', (code) => {
      if (!asked) reject(new Error(`serve exited (${code}) before printing an address:\n${printed}`));
    });
    child.stdout.on('data', (chunk: Buffer) => {
      printed += chunk.toString('utf8');
      const address = /(http:\/\/127\.0\.0\.1:\d+\/\S*)/.exec(printed)?.[1];
      if (address === undefined || asked) return;
      asked = true;
      void (async () => {
        try {
          const login = await fetch(address, { redirect: 'manual' });
          const cookie = login.headers.get('set-cookie')?.split(';')[0] ?? '';
          const page = await fetch(new URL('/', address), { headers: { cookie } });
          resolve({ printed, status: page.status, html: await page.text() });
        } catch (error) {
          reject(error instanceof Error ? error : new Error(String(error)));
        } finally {
          child.kill('SIGTERM');
        }
      })();
    });
  });
}

describe('npm run serve', () => {
  it(
    'builds what is stale once; a second start builds nothing and serves the page',
    async () => {
      const dataDir = tempDataDir();
      await serveOnce(dataDir); // builds the renderer or the host bundle if a source is newer
      expect(staleRendererSource()).toBeNull();
      expect(staleHostSource()).toBeNull();
      const second = await serveOnce(dataDir);
      expect(second.printed).not.toMatch(/Building the renderer|Bundling the host/);
      expect(second.printed).toMatch(/Pairwright is running/);
      expect(second.status).toBe(200);
      expect(second.html).toContain('<div id="root"></div>');
    },
    TIMEOUTS.longWaitMs,
  );
});
