/** `pairwright screen` as a child process on a temporary store (removed afterwards). */
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { tempDataDir } from '../support/host-fixture';

const dir = tempDataDir('pairwright-cli-screen-');
const data = ['--data', join(dir, 'store')];
afterAll(() => rmSync(dir, { recursive: true, force: true }));

interface ScreenJson {
  runs: {
    runId: number;
    elementA: string;
    elementB: string;
    xB: number;
    status: string;
    architecture: string | null;
  }[];
  cells: { row: string; column: string; x: number; architecture: string | null; prediction: string | null }[];
  skipped: { pair: string; reason: string }[];
  concurrency: number;
  wallTimeMs: number;
}

describe('pairwright screen', () => {
  it(
    'screens a campaign (compositions in at.%), prints JSON with runs, matrix cells and skipped pairs',
    { timeout: 120_000 },
    () => {
      expect(runPairwright(['campaigns', 'create', 'Screened', ...data]).status).toBe(0);
      expect(runPairwright(['pairs', 'add', 'Screened', 'Ag-Pd', ...data]).status).toBe(0);
      expect(runPairwright(['pairs', 'add', 'Screened', 'Pd-Fe', ...data]).status).toBe(0);
      const out = runPairwrightJson<ScreenJson>([
        'screen',
        'Screened',
        '--xB',
        '25,50',
        '--diameter-nm',
        '1.2',
        '--temperature-k',
        '600',
        '--sweeps',
        '150',
        ...data,
      ]);
      expect(out.runs).toHaveLength(2);
      expect(out.runs.map((r) => r.xB)).toEqual([0.25, 0.5]);
      expect(out.runs.every((r) => r.status === 'done' && r.architecture)).toBe(true);
      expect(out.cells.find((c) => c.row === 'Ag' && c.column === 'Pd' && c.x === 0.5)?.prediction).toBeTruthy();
      expect(out.skipped.map((s) => s.pair).sort()).toEqual(['Ag-Fe', 'Pd-Fe']);
      expect(out.wallTimeMs).toBeGreaterThan(0);
      const text = runPairwright([
        'screen',
        'Screened',
        '--xB',
        '50',
        '--diameter-nm',
        '1.2',
        '--temperature-k',
        '600',
        '--sweeps',
        '150',
        ...data,
      ]);
      expect(text.status).toBe(0);
      expect(text.stdout).toMatch(/Monte Carlo \/ analytic prediction/);
      expect(text.stdout).toMatch(/skipped Ag-Fe: Fe has no tight-binding/);
      const bad = runPairwright(['screen', 'Screened', '--xB', '50', '--temperature-k', '600', ...data]);
      expect(bad.status).toBe(2);
      expect(bad.stderr).toMatch(/--diameter-nm is required/);
    },
  );
});
