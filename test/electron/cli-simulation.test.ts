/** `pairwright simulate`, `energy` and `simulations` run as child processes on a temporary store. */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readExtendedXyz } from '../../shared-model/montecarlo/extended-xyz';
import { bruteForceEnergyEv } from '../../shared-model/montecarlo/gupta-energy';
import { magicClusterAtoms, magicClusterSurfaceAtoms } from '../../shared-model/geometry/magic-numbers';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { tempDataDir } from '../support/host-fixture';

const dir = tempDataDir('pairwright-cli-simulation-');
const data = ['--data', join(dir, 'store')];

interface SimulateJson {
  runId: number;
  atoms: number;
  energyEv: number;
  surfaceSites: number;
  surfaceFraction: Record<string, number>;
  radialProfile: { layerFromSurface: number; atoms: number; xB: number }[];
  warrenCowley: number;
  architecture: string;
  acceptance: number;
  attemptsPerSecond: number;
  xyzFile: string | null;
}

describe('pairwright simulate', () => {
  it(
    'runs the issue example (smaller), prints the fields as JSON and writes the final structure',
    { timeout: 120_000 },
    () => {
      const xyz = join(dir, 'out.xyz');
      const out = runPairwrightJson<SimulateJson>([
        'simulate',
        'Ag-Pd',
        '--xB',
        '0.5',
        '--shape',
        'cuboctahedron',
        '--shells',
        '4',
        '--temperature-k',
        '600',
        '--sweeps',
        '300',
        '--seed',
        '7',
        '--xyz',
        xyz,
        ...data,
      ]);
      expect(out.atoms).toBe(magicClusterAtoms(4));
      expect(out.surfaceSites).toBe(magicClusterSurfaceAtoms(4));
      expect(out.surfaceFraction.Ag! + out.surfaceFraction.Pd!).toBeCloseTo(1, 12);
      expect(out.surfaceFraction.Ag).toBeGreaterThan(0.7); // Ag covers Ag–Pd particles (see the model tests for sources)
      expect(out.radialProfile.map((l) => l.atoms)).toEqual([1, 12, 42, 92, 162]);
      expect(out.architecture).toMatch(/Ag|alloy/);
      expect(out.acceptance).toBeGreaterThan(0);
      expect(out.attemptsPerSecond).toBeGreaterThan(0);
      expect(Number.isFinite(out.warrenCowley)).toBe(true);
      expect(out.xyzFile).toBe(xyz);
      // The written file holds the final structure; its energy, summed pair by pair, is the reported one.
      const frame = readExtendedXyz(readFileSync(xyz, 'utf8'));
      expect(frame.symbols).toHaveLength(309);
      const cutoff = Number(frame.info.cutoffAngstrom);
      expect(Math.abs(bruteForceEnergyEv(frame, cutoff) - out.energyEv)).toBeLessThan(1e-5);

      const energy = runPairwrightJson<{ energyEv: number; atoms: number }>(['energy', xyz, ...data]);
      expect(energy.atoms).toBe(309);
      expect(Math.abs(energy.energyEv - out.energyEv)).toBeLessThan(1e-5);

      const list = runPairwrightJson<{ id: number; status: string }[]>(['simulations', ...data]);
      expect(list[0]).toMatchObject({ id: out.runId, status: 'done' });
      const text = runPairwright(['simulations', ...data]);
      expect(text.stdout).toMatch(/Ag-Pd/);
    },
  );

  it('prints a human summary with the radial profile', { timeout: 60_000 }, () => {
    const run = runPairwright([
      'simulate',
      'Au-Pt',
      '--xB',
      '0.3',
      '--shape',
      'icosahedron',
      '--shells',
      '3',
      '--temperature-k',
      '800',
      '--sweeps',
      '100',
      ...data,
    ]);
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/architecture: /);
    expect(run.stdout).toMatch(/surface/);
    expect(run.stdout).toMatch(/mixing rule/);
  });

  it('refuses bad input with one line naming the field, exit code 2', { timeout: 120_000 }, () => {
    const bad = (args: string[], pattern: RegExp) => {
      const run = runPairwright([...args, ...data]);
      expect(run.status, run.stderr).toBe(2);
      expect(run.stderr).toMatch(pattern);
    };
    bad(
      ['simulate', 'Fe-Pt', '--xB', '0.5', '--temperature-k', '600', '--sweeps', '10'],
      /Fe has no tight-binding parameters.*\(input field elementA\)/,
    );
    bad(
      ['simulate', 'Ag-Pd', '--xB', '0.5', '--temperature-k', '0', '--sweeps', '10'],
      /temperature \(K\) must .*\(option --temperature-k\)/,
    );
    bad(['simulate', 'Ag-Pd', '--xB', '0.5', '--temperature-k', '600', '--sweeps', '0'], /sweeps/);
    bad(
      ['simulate', 'Ag-Pd', '--xB', '0.5', '--temperature-k', '600', '--sweeps', '10', '--shells', '45'],
      /limit is 50000 atoms.*\(option --shells\)/,
    );
    bad(['simulate', 'Ag-Pd', '--temperature-k', '600', '--sweeps', '10'], /--xB is required/);
    bad(['simulate', 'AgPdX', '--xB', '0.5', '--temperature-k', '600', '--sweeps', '10'], /not a pair/);
    bad(['energy', join(dir, 'missing.xyz')], /cannot read/);
  });
});
