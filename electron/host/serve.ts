/**
 * `npm run serve [-- --port N --data DIR --open]`: runs Pairwright in a browser tab, served on 127.0.0.1 only.
 * The address printed here carries a one-time login key; only whoever sees this terminal can log in.
 */
import { spawn } from 'node:child_process';
import { parseArgs } from 'node:util';
import { startHost } from './server';
import { defaultDataDir, rendererDistDir } from '../paths';
import { closeWorkspace, openWorkspace } from '../services/workspace';

function parsePort(text: string | undefined): number {
  if (text === undefined) return 5178;
  const port = Number(text);
  if (!Number.isInteger(port) || port < 0 || port > 65535)
    throw new Error(`--port must be a whole number from 0 to 65535, got "${text}"`);
  return port;
}

function openInBrowser(url: string): void {
  const windows = process.platform === 'win32';
  const command = windows ? 'cmd' : process.platform === 'darwin' ? 'open' : 'xdg-open';
  const args = windows ? ['/c', 'start', '""', url] : [url];
  const child = spawn(command, args, { stdio: 'ignore', detached: true });
  child.on('error', (error) =>
    console.error(`could not open a browser (${error.message}); open the address above yourself`),
  );
  child.unref();
}

async function main(): Promise<void> {
  const { values } = parseArgs({
    options: {
      port: { type: 'string' },
      data: { type: 'string' },
      open: { type: 'boolean' },
      help: { type: 'boolean' },
    },
    strict: true,
  });
  if (values.help) {
    console.log(
      [
        'usage: npm run serve -- [--port N] [--data DIR] [--open]',
        '  --port N    port on 127.0.0.1 (default 5178, 0 = any free port)',
        "  --data DIR  folder of the store (default: the desktop app's data folder)",
        '  --open      open the login address in the default browser',
      ].join('\n'),
    );
    return;
  }
  const dataDir = values.data ?? defaultDataDir();
  const context = openWorkspace({ dataDir });
  let issueNext: () => string = () => '';
  const host = await startHost({
    context,
    rendererDir: rendererDistDir(),
    port: parsePort(values.port),
    onLogin: () => console.log(`A browser logged in. Address for another browser (one-time): ${issueNext()}`),
  });
  issueNext = () => host.issueLoginUrl();
  console.log(`Pairwright is running. Open this address in your browser (it logs you in once; keep it private):`);
  console.log(`  ${host.url}`);
  if (values.open) openInBrowser(host.url);
  console.log(`Data: ${context.store.path}`);
  console.log('Press Ctrl+C to stop.');
  const stop = (): void => {
    host
      .close()
      .then(() => closeWorkspace(context))
      .then(() => process.exit(0))
      .catch((error: unknown) => {
        console.error('error while stopping:', error);
        process.exit(1);
      });
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((error: unknown) => {
  console.error(`pairwright serve: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
