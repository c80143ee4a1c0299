/**
 * vitest globalSetup: the whole run gets its own temp folder (TMPDIR, inherited by the test workers and by
 * every child process: CLI, tsc, Python tools, Chromium). At the end every `pairwright-*` folder still in it
 * is a leak: the run fails, naming them. The run's folder is removed either way.
 */
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export default function setup(): (() => void) | undefined {
  // With several projects each runs its global setup; the first one owns the run's folder.
  if (process.env.PAIRWRIGHT_TEST_TMP !== undefined) return undefined;
  const root = mkdtempSync(join(tmpdir(), 'pairwright-run-'));
  const previous = process.env.TMPDIR;
  process.env.TMPDIR = root;
  process.env.PAIRWRIGHT_TEST_TMP = root;
  return () => {
    const left = readdirSync(root).filter((name) => name.startsWith('pairwright-'));
    rmSync(root, { recursive: true, force: true });
    if (previous === undefined) delete process.env.TMPDIR;
    else process.env.TMPDIR = previous;
    delete process.env.PAIRWRIGHT_TEST_TMP;
    if (left.length > 0) {
      // vitest reports a throwing teardown but keeps exit code 0: set it, then throw for the message
      process.exitCode = 1;
      throw new Error(
        `${left.length} temporary folder(s) left by the tests (make them with tempDir() from test/support/temp-dirs.ts, ` +
          `which removes them after each test): ${left.slice(0, 20).join(', ')}${left.length > 20 ? ', …' : ''}`,
      );
    }
  };
}
