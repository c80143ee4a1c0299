/**
 * The layer rules of DEVELOPERS.md must bite: each fixture breaks one rule and is linted as if it lived
 * in the folder it would break, with the project's real eslint config. A rule that stops reporting fails here.
 * The type-level rule (shared-model compiles without Node types) is checked by compiling a fixture too.
 */
import { ESLint } from 'eslint';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const eslint = new ESLint({ cwd: process.cwd() });
const fixture = (name: string) => readFileSync(join('test', 'fixtures', 'layer-rules', name), 'utf8');

async function lintAs(pretendPath: string, source: string): Promise<string[]> {
  const [result] = await eslint.lintText(source, { filePath: join(process.cwd(), pretendPath) });
  return (result?.messages ?? []).map((message) => `${message.ruleId}: ${message.message}`);
}

describe('layer rules', () => {
  it('refuses node:fs in shared-model', async () => {
    const messages = await lintAs('shared-model/prediction/broken.ts', fixture('shared-model-imports-fs.ts'));
    expect(messages.some((m) => m.startsWith('no-restricted-imports') && m.includes('pure'))).toBe(true);
  });

  it('refuses the store in shared-model', async () => {
    const messages = await lintAs('shared-model/broken.ts', fixture('shared-model-imports-db.ts'));
    expect(messages.some((m) => m.startsWith('no-restricted-imports'))).toBe(true);
  });

  it('refuses the global process in shared-model', async () => {
    const messages = await lintAs('shared-model/broken.ts', fixture('shared-model-uses-process.ts'));
    expect(messages.some((m) => m.startsWith('no-restricted-globals'))).toBe(true);
  });

  it('refuses db imports in the renderer', async () => {
    const messages = await lintAs('renderer/src/views/Broken.tsx', fixture('renderer-imports-db.ts'));
    expect(messages.some((m) => m.startsWith('no-restricted-imports'))).toBe(true);
  });

  it("refuses 'electron' in services but allows it in main.ts", async () => {
    const inService = await lintAs('electron/services/broken.ts', fixture('service-imports-electron.ts'));
    expect(inService.some((m) => m.startsWith('no-restricted-imports'))).toBe(true);
    const inMain = await lintAs('electron/main.ts', fixture('service-imports-electron.ts'));
    expect(inMain.filter((m) => m.startsWith('no-restricted-imports'))).toEqual([]);
  });

  it('the same pure file lints clean in shared-model (the rules do not refuse everything)', async () => {
    const messages = await lintAs('shared-model/fine.ts', 'export const twice = (x: number): number => 2 * x;\n');
    expect(messages).toEqual([]);
  });

  it('shared-model compiler settings reject Node globals', () => {
    const dir = mkdtempSync(join(tmpdir(), 'pairwright-layer-'));
    writeFileSync(join(dir, 'uses-process.ts'), fixture('shared-model-uses-process.ts'));
    const config = JSON.parse(readFileSync('shared-model/tsconfig.json', 'utf8')) as { compilerOptions: { lib: string[]; types: string[] } };
    writeFileSync(
      join(dir, 'tsconfig.json'),
      JSON.stringify({ compilerOptions: { ...config.compilerOptions, strict: true, noEmit: true, skipLibCheck: true, outDir: undefined, rootDir: undefined }, include: ['*.ts'] }),
    );
    let output = '';
    try {
      execFileSync(process.execPath, [join(process.cwd(), 'node_modules', 'typescript', 'bin', 'tsc'), '-p', dir], { encoding: 'utf8' });
    } catch (error) {
      output = String((error as { stdout?: string }).stdout ?? error);
    }
    expect(output).toMatch(/Cannot find name 'process'/);
  });
});
