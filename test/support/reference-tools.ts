/**
 * Reference tier: checks against external tools from Debian's packages (Debian's /usr/bin/python3 with
 * scipy, scikit-learn, ASE, pymatgen; LAMMPS's `lmp`). On a user's machine without them the tier
 * skips with a printed reason; with CI=true a missing tool is a failure, never a skip.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const DEBIAN_PYTHON = '/usr/bin/python3';
export const inCi = process.env.CI === 'true';

function pythonHas(module: string): boolean {
  if (!existsSync(DEBIAN_PYTHON)) return false;
  const probe = spawnSync(DEBIAN_PYTHON, ['-c', `import ${module}`], { encoding: 'utf8' });
  return probe.status === 0;
}

function commandExists(command: string): boolean {
  const probe = spawnSync('sh', ['-c', `command -v ${command}`], { encoding: 'utf8' });
  return probe.status === 0 && probe.stdout.trim().length > 0;
}

/**
 * Returns true when the tool is present. When absent: throws under CI=true, otherwise prints why the
 * tier is skipped and returns false (use with `describe.skipIf(!available)`).
 */
export function referenceAvailable(tool: { python?: string; command?: string }): boolean {
  const missing: string[] = [];
  if (tool.python && !pythonHas(tool.python))
    missing.push(`python module "${tool.python}" in ${DEBIAN_PYTHON} (apt-get install python3-${tool.python})`);
  if (tool.command && !commandExists(tool.command)) missing.push(`command "${tool.command}"`);
  if (missing.length === 0) return true;
  const reason = `reference tier needs ${missing.join(' and ')}; .ci/run installs it`;
  if (inCi) throw new Error(`CI=true but ${reason}`);
  console.warn(`[skipped] ${reason}`);
  return false;
}

/** Runs a Python snippet with Debian's interpreter, feeding JSON on stdin, and parses JSON from stdout. */
export function runPythonJson<T>(script: string, input: unknown): T {
  const out = execFileSync(DEBIAN_PYTHON, ['-c', script], {
    input: JSON.stringify(input),
    encoding: 'utf8',
    maxBuffer: 64 * 1024 * 1024,
    env: { ...process.env, PYTHONWARNINGS: 'ignore' },
  });
  return JSON.parse(out) as T;
}
