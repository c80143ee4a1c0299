/**
 * `npm run serve [-- --port N --data DIR]`: runs Pairwright in a browser tab, served on 127.0.0.1 only.
 */
import { parseArgs } from 'node:util';
import { startHost } from './server';
import { defaultDataDir, rendererDistDir } from '../paths';
import { closeWorkspace, openWorkspace } from '../services/workspace';

function parsePort(text: string | undefined): number {
  if (text === undefined) return 5178;
  const port = Number(text);
  if (!Number.isInteger(port) || port < 0 || port > 65535) throw new Error(`--port must be a whole number from 0 to 65535, got "${text}"`);
  return port;
}

async function main(): Promise<void> {
  const { values } = parseArgs({
    options: { port: { type: 'string' }, data: { type: 'string' }, help: { type: 'boolean' } },
    strict: true,
  });
  if (values.help) {
    console.log('usage: npm run serve -- [--port N] [--data DIR]\n  --port N    port on 127.0.0.1 (default 5178, 0 = any free port)\n  --data DIR  folder of the store (default: the desktop app\'s data folder)');
    return;
  }
  const dataDir = values.data ?? defaultDataDir();
  const context = openWorkspace({ dataDir });
  const host = await startHost({ context, rendererDir: rendererDistDir(), port: parsePort(values.port) });
  const address = `${host.url}`;
  console.log(`Pairwright is running. Open ${address} in your browser.`);
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
