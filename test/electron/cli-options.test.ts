/** Global options before the command (`pairwright --data DIR demo`), and no stack trace unless --debug. */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { runCli } from '../../electron/cli/main';

let dataDir = '';
afterEach(() => rmSync(dataDir, { recursive: true, force: true }));

describe('pairwright command line options', () => {
  it('accepts --data DIR before the command', async () => {
    dataDir = mkdtempSync(join(tmpdir(), 'pairwright-cli-options-'));
    const demo = await runCli(['--data', dataDir, 'demo', '--json']);
    expect(demo.stderr).toBe('');
    expect(demo.exitCode).toBe(0);
    expect(JSON.parse(demo.stdout)).toMatchObject({ isDemo: true });
    const list = await runCli(['--json', '--data', dataDir, 'campaigns', 'list']);
    expect(JSON.parse(list.stdout)).toHaveLength(1);
    const equals = await runCli([`--data=${dataDir}`, 'campaigns', 'list', '--json']);
    expect(JSON.parse(equals.stdout)).toHaveLength(1);
  });

  it('prints a store refusal and an unexpected failure without a stack trace, the stack only with --debug', async () => {
    dataDir = mkdtempSync(join(tmpdir(), 'pairwright-cli-options-'));
    writeFileSync(join(dataDir, 'pairwright.sqlite'), 'not a store');
    const refused = await runCli(['campaigns', 'list', '--data', dataDir]);
    expect(refused.exitCode).toBe(2);
    expect(refused.stderr.split('\n')).toHaveLength(1);
    const notAFolder = join(dataDir, 'pairwright.sqlite'); // a file where a folder must be: an OS error
    const failed = await runCli(['campaigns', 'list', '--data', notAFolder]);
    expect(failed.exitCode).toBe(1);
    expect(failed.stderr).toMatch(/run again with --debug/);
    expect(failed.stderr).not.toMatch(/\n\s+at /);
    const debug = await runCli(['campaigns', 'list', '--data', notAFolder, '--debug']);
    expect(debug.stderr).toMatch(/\n\s+at /);
  });
});
