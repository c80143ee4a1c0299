/**
 * Temporary folders for tests. Every folder made here is removed when the test that made it ends (or, when
 * made outside a test: at module level or in beforeAll, when its file ends). test/support/setup-temp-dirs.ts
 * installs the hooks; test/support/global-temp-root.ts fails the run if a `pairwright-*` folder is left.
 * No vitest import here: benchmarks (run by tsx) use tempDir too and remove their folders with removeTempDir.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

type Scope = 'test' | 'file';

const made: Array<{ dir: string; scope: Scope }> = [];
let current: Scope = 'file';

/** A new empty folder in the OS temp folder; the prefix must start with "pairwright-" (the leak check counts those). */
export function tempDir(prefix = 'pairwright-test-'): string {
  if (!prefix.startsWith('pairwright-'))
    throw new Error(`temp folder prefix must start with "pairwright-", got "${prefix}"`);
  const dir = mkdtempSync(join(tmpdir(), prefix));
  made.push({ dir, scope: current });
  return dir;
}

/** A temporary folder the caller removes itself (with removeTempDir), e.g. a host's store: closed, then removed. */
export function tempDirRemovedByCaller(prefix: string): string {
  if (!prefix.startsWith('pairwright-'))
    throw new Error(`temp folder prefix must start with "pairwright-", got "${prefix}"`);
  return mkdtempSync(join(tmpdir(), prefix));
}

export function removeTempDir(dir: string): void {
  rmSync(dir, { recursive: true, force: true });
  const index = made.findIndex((entry) => entry.dir === dir);
  if (index >= 0) made.splice(index, 1);
}

function removeScope(scope: Scope): void {
  for (const entry of made.filter((e) => e.scope === scope)) removeTempDir(entry.dir);
}

/** Called before each test: folders made from now on belong to the test. */
export function enterTest(): void {
  current = 'test';
}

/** Called after each test (after the test's own afterEach hooks have closed its stores): removes its folders. */
export function leaveTest(): void {
  removeScope('test');
  current = 'file';
}

/** Called when a test file ends: removes folders made at module level or in beforeAll. */
export function leaveFile(): void {
  removeScope('file');
}
