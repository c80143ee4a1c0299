/** Runs the real `pairwright` command (bin/pairwright.mjs) as a child process. */
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';

export const CLI_PATH = join(process.cwd(), 'bin', 'pairwright.mjs');

export interface CliRun {
  status: number | null;
  stdout: string;
  stderr: string;
}

export function runPairwright(
  args: readonly string[],
  options: { cwd?: string; env?: NodeJS.ProcessEnv } = {},
): CliRun {
  const result = spawnSync(process.execPath, [CLI_PATH, ...args], {
    cwd: options.cwd ?? process.cwd(),
    env: { ...process.env, ...options.env },
    encoding: 'utf8',
    timeout: 60_000,
  });
  if (result.error) throw result.error;
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** Runs a command with --json and parses stdout; fails the test with stderr when the exit code is not 0. */
export function runPairwrightJson<T>(
  args: readonly string[],
  options: { cwd?: string; env?: NodeJS.ProcessEnv } = {},
): T {
  const run = runPairwright([...args, '--json'], options);
  if (run.status !== 0) throw new Error(`pairwright ${args.join(' ')} exited ${run.status}: ${run.stderr}`);
  return JSON.parse(run.stdout) as T;
}
