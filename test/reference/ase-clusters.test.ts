/**
 * Reference tier: Pairwright's cluster builders and extended XYZ against ASE (Debian python3-ase):
 * ase.cluster.Icosahedron, Octahedron(length 2n+1, cutoff n) = cuboctahedron, Octahedron(length 3L−2,
 * cutoff L−1) = regular truncated octahedron; and ase.io.read of the extended XYZ we write.
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildCluster } from '../../shared-model/clusters/shapes';
import type { ParticleShape } from '../../shared-model/geometry/shapes';
import { writeExtendedXyz } from '../../shared-model/montecarlo/extended-xyz';
import { referenceAvailable, runPythonJson } from '../support/reference-tools';
import { tempDir } from '../support/temp-dirs';

const available = referenceAvailable({ python: 'ase' });

const CLUSTERS = `
import json, sys
import numpy as np
from ase.cluster import Icosahedron, Octahedron
inp = json.load(sys.stdin)
out = {}
for n in inp["shells"]:
    L = n + 1
    for name, atoms in (("icosahedron", Icosahedron("Cu", n + 1)), ("cuboctahedron", Octahedron("Cu", 2 * n + 1, cutoff=n)), ("truncated-octahedron", Octahedron("Cu", 3 * L - 2, cutoff=L - 1))):
        p = atoms.get_positions()
        p = p - p.mean(axis=0)
        d = np.linalg.norm(p[:, None, :] - p[None, :, :], axis=-1)
        nn = d[d > 1e-6].min()
        radii = sorted((np.linalg.norm(p, axis=1) / nn).round(6).tolist())
        out[f"{name}:{n}"] = {"atoms": len(atoms), "radii": radii}
print(json.dumps(out))
`;

const READ_XYZ = `
import json, sys
from ase.io import read
inp = json.load(sys.stdin)
atoms = read(inp["path"], format="extxyz")
print(json.dumps({"symbols": atoms.get_chemical_symbols(), "positions": atoms.get_positions().tolist(), "pbc": [bool(x) for x in atoms.pbc], "info": {k: str(v) for k, v in atoms.info.items()}}))
`;

function radiiOf(shape: ParticleShape, shells: number): number[] {
  const c = buildCluster(shape, { shells }, 1);
  const n = c.atoms;
  let cx = 0;
  let cy = 0;
  let cz = 0;
  for (let i = 0; i < n; i++) {
    cx += c.positions[3 * i]!;
    cy += c.positions[3 * i + 1]!;
    cz += c.positions[3 * i + 2]!;
  }
  cx /= n;
  cy /= n;
  cz /= n;
  let nn = Infinity;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      nn = Math.min(
        nn,
        Math.hypot(
          c.positions[3 * i]! - c.positions[3 * j]!,
          c.positions[3 * i + 1]! - c.positions[3 * j + 1]!,
          c.positions[3 * i + 2]! - c.positions[3 * j + 2]!,
        ),
      );
    }
  }
  return Array.from(
    { length: n },
    (_, i) =>
      Math.round(
        (Math.hypot(c.positions[3 * i]! - cx, c.positions[3 * i + 1]! - cy, c.positions[3 * i + 2]! - cz) / nn) * 1e6,
      ) / 1e6,
  ).sort((a, b) => a - b);
}

describe.skipIf(!available)('cluster builders and extended XYZ vs ASE', () => {
  it('same atom counts and the same set of site radii (in nearest-neighbour units) for every shape', () => {
    const shells = [1, 2, 3, 4];
    const ase = runPythonJson<Record<string, { atoms: number; radii: number[] }>>(CLUSTERS, { shells });
    for (const n of shells) {
      for (const shape of ['icosahedron', 'cuboctahedron', 'truncated-octahedron'] as const) {
        const reference = ase[`${shape}:${n}`]!;
        const ours = radiiOf(shape, n);
        expect(ours.length, `${shape} ${n}`).toBe(reference.atoms);
        // Both place the atoms at the same distances from the centre, measured in shortest-bond units.
        ours.forEach((r, k) => expect(Math.abs(r - reference.radii[k]!), `${shape} ${n} atom ${k}`).toBeLessThan(2e-6));
      }
    }
  });

  it('ase.io.read reads our extended XYZ with the same species, positions and info', () => {
    const c = buildCluster('cuboctahedron', { shells: 2 }, 2.78);
    const symbols = Array.from({ length: c.atoms }, (_, i) => (i % 4 === 0 ? 'Pt' : 'Ni'));
    const path = join(tempDir('pairwright-xyz-'), 'cluster.xyz');
    writeFileSync(
      path,
      writeExtendedXyz({ symbols, positions: c.positions }, { energy: -210.5, pair: 'Ni-Pt', note: 'a b' }),
    );
    const read = runPythonJson<{
      symbols: string[];
      positions: number[][];
      pbc: boolean[];
      info: Record<string, string>;
    }>(READ_XYZ, { path });
    expect(read.symbols).toEqual(symbols);
    read.positions.forEach((p, i) => p.forEach((v, d) => expect(v).toBeCloseTo(c.positions[3 * i + d]!, 7)));
    expect(read.pbc).toEqual([false, false, false]);
    expect(read.info.pair).toBe('Ni-Pt');
    expect(read.info.note).toBe('a b');
  });
});
