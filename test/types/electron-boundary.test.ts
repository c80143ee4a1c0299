/**
 * Type tier: electron/desktop/electron-boundary.ts (our own types for the part of Electron main.ts and the
 * preload use) checked against Electron's own electron.d.ts of the pinned version. The d.ts comes from the
 * installed package or from `node scripts/electron-types.mjs --fetch` (.ci/run runs it). Without it the tier
 * skips with a printed reason; with CI=true a missing d.ts fails.
 */
import { spawnSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { findElectronTypes, pinnedElectronVersion } from '../../scripts/electron-types.mjs';
import { inCi } from '../support/reference-tools';
import { tempDir } from '../support/temp-dirs';

const electronTypes = findElectronTypes();
if (electronTypes === null) {
  const reason = `electron.d.ts ${pinnedElectronVersion()} not found (node scripts/electron-types.mjs --fetch)`;
  if (inCi) throw new Error(`CI=true but ${reason}`);
  console.warn(`[skipped] electron boundary type test: ${reason}`);
}

const fixtures = join(process.cwd(), 'test', 'fixtures', 'electron-types');

describe.skipIf(electronTypes === null)('the Electron boundary against electron.d.ts', () => {
  it('Electron satisfies the boundary; a boundary that disagrees does not compile', () => {
    const dir = tempDir('pairwright-electron-types-');
    const tsconfig = {
      compilerOptions: {
        strict: true,
        noEmit: true,
        target: 'ES2022',
        module: 'ESNext',
        moduleResolution: 'Bundler',
        skipLibCheck: true,
        lib: ['ES2022', 'DOM'],
        types: ['node'],
        typeRoots: [join(process.cwd(), 'node_modules', '@types')],
        paths: { electron: [electronTypes] },
      },
      files: [join(fixtures, 'boundary-check.ts'), join(fixtures, 'boundary-mismatch.ts')],
    };
    writeFileSync(join(dir, 'tsconfig.json'), JSON.stringify(tsconfig));
    const tsc = join(process.cwd(), 'node_modules', 'typescript', 'bin', 'tsc');
    const run = spawnSync(process.execPath, [tsc, '-p', dir, '--pretty', 'false'], { encoding: 'utf8' });
    const errors = run.stdout.split('\n').filter((line) => /error TS\d+/.test(line));
    expect(errors.filter((line) => line.includes('boundary-check.ts'))).toEqual([]);
    expect(errors.some((line) => line.includes('boundary-mismatch.ts') && /TS2322/.test(line))).toBe(true);
    expect(errors.every((line) => line.includes('boundary-mismatch.ts'))).toBe(true);
  });
});
