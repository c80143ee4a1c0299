import { describe, expect, it } from 'vitest';
import { buildCuboctahedron, buildIcosahedron, buildSphere } from '../../../shared-model/clusters/shapes';
import { buildNeighbourList, FIVE_SHELL_CUTOFF_FACTOR } from '../../../shared-model/clusters/neighbours';
import { createRandom } from '../../../shared-model/random';

const NN = 2.8;

describe('neighbour lists (CSR, distance classes)', () => {
  it('an fcc cluster has exactly the five shells √1..√5 × nn, with 12, 6, 24, 12, 24 neighbours around a bulk site', () => {
    const c = buildCuboctahedron(6, NN);
    const list = buildNeighbourList(c.positions, FIVE_SHELL_CUTOFF_FACTOR * NN);
    expect(Array.from(list.classDistancesAngstrom)).toHaveLength(5);
    list.classDistancesAngstrom.forEach((d, k) => expect(d).toBeCloseTo(NN * Math.sqrt(k + 1), 10));
    // The central atom (at the origin) sees full bulk shells: fcc shell multiplicities (Kittel ISSP, Ch. 1; common knowledge).
    let centre = -1;
    for (let i = 0; i < c.atoms; i++)
      if (Math.hypot(c.positions[3 * i]!, c.positions[3 * i + 1]!, c.positions[3 * i + 2]!) < 1e-9) centre = i;
    const perShell = [0, 0, 0, 0, 0];
    for (let e = list.offsets[centre]!; e < list.offsets[centre + 1]!; e++) perShell[list.distanceClass[e]!]!++;
    expect(perShell).toEqual([12, 6, 24, 12, 24]);
  });

  it('matches a brute-force O(N²) pair search, symmetric rows, no self pairs (random cloud and clusters)', () => {
    const rng = createRandom(11);
    const cloud = new Float64Array(3 * 400).map(() => rng.next() * 20);
    for (const positions of [cloud, buildIcosahedron(4, NN).positions, buildSphere(4, NN).positions]) {
      const cutoff = 6.1;
      const list = buildNeighbourList(positions, cutoff);
      const n = positions.length / 3;
      for (let i = 0; i < n; i++) {
        const expected: number[] = [];
        for (let j = 0; j < n; j++) {
          if (j === i) continue;
          const d = Math.hypot(
            positions[3 * i]! - positions[3 * j]!,
            positions[3 * i + 1]! - positions[3 * j + 1]!,
            positions[3 * i + 2]! - positions[3 * j + 2]!,
          );
          if (d < cutoff) expected.push(j);
        }
        const row = Array.from(list.neighbours.subarray(list.offsets[i]!, list.offsets[i + 1]!));
        expect(row).toEqual(expected);
        for (let e = list.offsets[i]!; e < list.offsets[i + 1]!; e++) {
          const j = list.neighbours[e]!;
          const d = Math.hypot(
            positions[3 * i]! - positions[3 * j]!,
            positions[3 * i + 1]! - positions[3 * j + 1]!,
            positions[3 * i + 2]! - positions[3 * j + 2]!,
          );
          expect(Math.abs(list.classDistancesAngstrom[list.distanceClass[e]!]! - d)).toBeLessThan(1e-9 * d);
        }
      }
    }
  });
});
