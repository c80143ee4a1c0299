/**
 * The layer rules of DEVELOPERS.md must bite: each fixture breaks one rule and is linted as if it lived
 * in the folder it would break, with the project's real eslint config. A rule that stops reporting fails here.
 * The type-level rule (shared-model compiles without Node types) is checked by compiling a fixture too.
 */
import { ESLint } from 'eslint';
import { execFileSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { tempDir } from '../support/temp-dirs';

const eslint = new ESLint({ cwd: process.cwd() });
const fixture = (name: string) => readFileSync(join('test', 'fixtures', 'layer-rules', name), 'utf8');

/**
 * Lints `source` as if it were the file at `pretendPath`. The path must be a real file of the project: the
 * type-aware rules (no-floating-promises) need the file to belong to one of the project's tsconfigs.
 */
async function lintAs(pretendPath: string, source: string): Promise<string[]> {
  const [result] = await eslint.lintText(source, { filePath: join(process.cwd(), pretendPath) });
  return (result?.messages ?? []).map((message) => `${message.ruleId}: ${message.message}`);
}

describe('layer rules', () => {
  it('refuses node:fs in shared-model', async () => {
    const messages = await lintAs('shared-model/prediction/predict.ts', fixture('shared-model-imports-fs.ts'));
    expect(messages.some((m) => m.startsWith('no-restricted-imports') && m.includes('pure'))).toBe(true);
  });

  it('refuses the store in shared-model', async () => {
    const messages = await lintAs('shared-model/prediction/rank.ts', fixture('shared-model-imports-db.ts'));
    expect(messages.some((m) => m.startsWith('no-restricted-imports'))).toBe(true);
  });

  it('refuses the global process in shared-model', async () => {
    const messages = await lintAs('shared-model/prediction/rank.ts', fixture('shared-model-uses-process.ts'));
    expect(messages.some((m) => m.startsWith('no-restricted-globals'))).toBe(true);
  });

  it('refuses db imports in the renderer', async () => {
    const messages = await lintAs('renderer/src/views/CandidatesView.tsx', fixture('renderer-imports-db.ts'));
    expect(messages.some((m) => m.startsWith('no-restricted-imports'))).toBe(true);
  });

  it("refuses 'electron' in services, the CLI and the host, and allows it in electron/desktop/", async () => {
    for (const path of [
      'electron/services/campaigns.ts',
      'electron/cli/main.ts',
      'electron/host/server.ts',
      'electron/workers/montecarlo-queue.ts',
    ]) {
      const messages = await lintAs(path, fixture('service-imports-electron.ts'));
      expect(
        messages.some((m) => m.startsWith('no-restricted-imports')),
        path,
      ).toBe(true);
    }
    const inDesktop = await lintAs('electron/desktop/main.ts', fixture('service-imports-electron.ts'));
    expect(inDesktop.filter((m) => m.startsWith('no-restricted-imports'))).toEqual([]);
  });

  it('refuses db imports in the CLI and the host, and allows them in services', async () => {
    for (const path of ['electron/cli/main.ts', 'electron/host/serve.ts']) {
      const messages = await lintAs(path, fixture('cli-imports-db.ts'));
      expect(
        messages.some((m) => m.startsWith('no-restricted-imports') && m.includes('through services')),
        path,
      ).toBe(true);
    }
    const inService = await lintAs('electron/services/workspace.ts', fixture('cli-imports-db.ts'));
    expect(inService.filter((m) => m.startsWith('no-restricted-imports'))).toEqual([]);
  });

  it('refuses a promise nobody awaits or handles', async () => {
    const messages = await lintAs('electron/services/campaigns.ts', fixture('floating-promise.ts'));
    expect(messages.some((m) => m.startsWith('@typescript-eslint/no-floating-promises'))).toBe(true);
    const handled = await lintAs(
      'electron/services/campaigns.ts',
      fixture('floating-promise.ts').replace('  save();', '  void save();'),
    );
    expect(handled.filter((m) => m.startsWith('@typescript-eslint/no-floating-promises'))).toEqual([]);
  });

  it('the same pure file lints clean in shared-model (the rules do not refuse everything)', async () => {
    const messages = await lintAs(
      'shared-model/prediction/rank.ts',
      'export const twice = (x: number): number => 2 * x;\n',
    );
    expect(messages).toEqual([]);
  });

  it('shared-model compiler settings reject Node globals', () => {
    const dir = tempDir('pairwright-layer-');
    writeFileSync(join(dir, 'uses-process.ts'), fixture('shared-model-uses-process.ts'));
    const config = JSON.parse(readFileSync('shared-model/tsconfig.json', 'utf8')) as {
      compilerOptions: { lib: string[]; types: string[] };
    };
    writeFileSync(
      join(dir, 'tsconfig.json'),
      JSON.stringify({
        compilerOptions: {
          ...config.compilerOptions,
          strict: true,
          noEmit: true,
          skipLibCheck: true,
          outDir: undefined,
          rootDir: undefined,
        },
        include: ['*.ts'],
      }),
    );
    let output = '';
    try {
      execFileSync(process.execPath, [join(process.cwd(), 'node_modules', 'typescript', 'bin', 'tsc'), '-p', dir], {
        encoding: 'utf8',
      });
    } catch (error) {
      output = String((error as { stdout?: string }).stdout ?? error);
    }
    expect(output).toMatch(/Cannot find name 'process'/);
  });
});
