/** `pairwright relax` run as a child process: minimises an XYZ cluster, prints the numbers, writes the result. */
import { readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { buildCluster } from '../../shared-model/clusters/shapes';
import { readExtendedXyz, writeExtendedXyz } from '../../shared-model/montecarlo/extended-xyz';
import { guptaElement } from '../../shared-model/montecarlo/gupta-parameters';
import { offLatticeEnergyEv } from '../../shared-model/montecarlo/offlattice-gupta';
import { createRandom } from '../../shared-model/random';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { tempDataDir } from '../support/host-fixture';

const dir = tempDataDir('pairwright-cli-relax-');
const data = ['--data', join(dir, 'store')];
afterAll(() => rmSync(dir, { recursive: true, force: true }));

interface RelaxJson {
  atoms: number;
  initialEnergyEv: number;
  relaxedEnergyEv: number;
  maxForceEvPerAngstrom: number;
  iterations: number;
  converged: boolean;
  xyzFile: string | null;
}

describe('pairwright relax', () => {
  it(
    'minimises a random Au–Ni cluster and writes the relaxed structure, whose energy is the reported one',
    { timeout: 60_000 },
    () => {
      const rng = createRandom(3);
      const nn = (guptaElement('Au').r0Angstrom + guptaElement('Ni').r0Angstrom) / 2;
      const geometry = buildCluster('cuboctahedron', { shells: 3 }, nn);
      const symbols = Array.from({ length: geometry.atoms }, () => (rng.next() < 0.5 ? 'Ni' : 'Au'));
      const input = join(dir, 'in.xyz');
      writeFileSync(input, writeExtendedXyz({ symbols, positions: geometry.positions }));
      const output = join(dir, 'out.xyz');
      const out = runPairwrightJson<RelaxJson>(['relax', input, '--xyz', output, ...data]);
      expect(out.atoms).toBe(147);
      expect(out.converged).toBe(true);
      expect(out.maxForceEvPerAngstrom).toBeLessThan(1e-3);
      expect(out.iterations).toBeGreaterThan(0);
      expect(out.relaxedEnergyEv).toBeLessThan(out.initialEnergyEv);
      expect(Math.abs(out.initialEnergyEv - offLatticeEnergyEv(symbols, geometry.positions))).toBeLessThan(1e-9);
      const frame = readExtendedXyz(readFileSync(output, 'utf8'));
      expect(frame.symbols).toEqual(symbols);
      expect(Math.abs(offLatticeEnergyEv(frame.symbols, frame.positions) - out.relaxedEnergyEv)).toBeLessThan(1e-5);
    },
  );

  it('refuses overlapping atoms, naming them', { timeout: 60_000 }, () => {
    const input = join(dir, 'overlap.xyz');
    writeFileSync(input, '3\n\nAu 0 0 0\nAu 2.8 0 0\nPt 2.9 0.2 0\n');
    const run = runPairwright(['relax', input, ...data]);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/atoms 2 \(Au\) and 3 \(Pt\)/);
  });
});
