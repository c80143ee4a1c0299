import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import {
  buildCluster,
  buildCuboctahedron,
  buildIcosahedron,
  buildSphere,
  buildTruncatedOctahedron,
  equivalentDiameterNm,
  shellsForDiameter,
} from '../../../shared-model/clusters/shapes';
import {
  buildNeighbourList,
  coordinationNumbers,
  FIVE_SHELL_CUTOFF_FACTOR,
  pairsWithin,
} from '../../../shared-model/clusters/neighbours';
import {
  magicClusterAtoms,
  magicClusterSurfaceAtoms,
  truncatedOctahedronAtoms,
  truncatedOctahedronSurfaceAtoms,
} from '../../../shared-model/geometry/magic-numbers';
import { layersFromSurface } from '../../../shared-model/montecarlo/analysis';

const NN = 2.75; // Å, any positive spacing; counts do not depend on it

function surfaceCount(positions: Float64Array, nn: number): number {
  const list = buildNeighbourList(positions, FIVE_SHELL_CUTOFF_FACTOR * nn);
  return Array.from(coordinationNumbers(list, nn)).filter((cn) => cn < 12).length;
}

function minimumDistance(positions: Float64Array): number {
  const n = positions.length / 3;
  let best = Infinity;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      best = Math.min(
        best,
        Math.hypot(
          positions[3 * i]! - positions[3 * j]!,
          positions[3 * i + 1]! - positions[3 * j + 1]!,
          positions[3 * i + 2]! - positions[3 * j + 2]!,
        ),
      );
    }
  }
  return best;
}

describe('closed-shell clusters match the closed-form magic numbers (Mackay, Acta Cryst. 15, 916 (1962))', () => {
  it('cuboctahedron: (10n³+15n²+11n+3)/3 atoms and 10n²+2 surface sites', () => {
    for (let n = 1; n <= 8; n++) {
      const c = buildCuboctahedron(n, NN);
      expect(c.atoms).toBe(magicClusterAtoms(n));
      expect(surfaceCount(c.positions, NN)).toBe(magicClusterSurfaceAtoms(n));
    }
    // The textbook sequence (Mackay 1962): 13, 55, 147, 309, 561.
    expect([1, 2, 3, 4, 5].map((n) => buildCuboctahedron(n, NN).atoms)).toEqual([13, 55, 147, 309, 561]);
  });

  it('Mackay icosahedron: same counts, mean nearest-neighbour bond equals the requested spacing', () => {
    for (let n = 1; n <= 7; n++) {
      const c = buildIcosahedron(n, NN);
      expect(c.atoms).toBe(magicClusterAtoms(n));
      expect(surfaceCount(c.positions, NN)).toBe(magicClusterSurfaceAtoms(n));
      const bonds = pairsWithin(c.positions, 1.2 * NN);
      let sum = 0;
      for (let k = 0; k < bonds.count; k++) sum += bonds.distanceAngstrom[k]!;
      expect(sum / bonds.count).toBeCloseTo(NN, 10);
    }
    // Radial bonds are shorter than in-shell bonds by the icosahedron's circumradius/edge ratio,
    // sin(2π/5) = 0.9511 (geometry of the regular icosahedron).
    const c = buildIcosahedron(3, NN);
    const bonds = pairsWithin(c.positions, 1.2 * NN);
    let shortest = Infinity;
    let longest = 0;
    for (let k = 0; k < bonds.count; k++) {
      shortest = Math.min(shortest, bonds.distanceAngstrom[k]!);
      longest = Math.max(longest, bonds.distanceAngstrom[k]!);
    }
    expect(shortest / longest).toBeCloseTo(Math.sin((2 * Math.PI) / 5), 10);
  });

  it('regular truncated octahedron: 16L³−33L²+24L−6 atoms and 30L²−60L+32 surface sites (L = shells + 1)', () => {
    // 38 and 201 atoms are the well-known first truncated octahedra (e.g. Baletto & Ferrando, Rev. Mod. Phys. 77, 371 (2005), from memory).
    expect(buildTruncatedOctahedron(1, NN).atoms).toBe(38);
    expect(buildTruncatedOctahedron(2, NN).atoms).toBe(201);
    for (let n = 1; n <= 6; n++) {
      const c = buildTruncatedOctahedron(n, NN);
      expect(c.atoms).toBe(truncatedOctahedronAtoms(n + 1));
      expect(surfaceCount(c.positions, NN)).toBe(truncatedOctahedronSurfaceAtoms(n + 1));
    }
  });

  it('every shape keeps the nearest-neighbour distance it was built with (fcc shapes exactly)', () => {
    expect(minimumDistance(buildCuboctahedron(3, NN).positions)).toBeCloseTo(NN, 12);
    expect(minimumDistance(buildTruncatedOctahedron(2, NN).positions)).toBeCloseTo(NN, 12);
    expect(minimumDistance(buildSphere(3, NN).positions)).toBeCloseTo(NN, 12);
  });

  it('sphere cut: atom count follows the bulk density 4/a³ up to a surface term', () => {
    for (const diameterNm of [2, 3, 4, 6]) {
      const c = buildCluster('sphere', { diameterNm }, NN);
      const a = (NN * Math.SQRT2) / 10;
      const bulk = (Math.PI / 6) * diameterNm ** 3 * (4 / a ** 3);
      // Lattice-point counting error in a sphere grows like the surface area (common practice: ~N^(2/3)).
      expect(Math.abs(c.atoms - bulk)).toBeLessThan(2 * bulk ** (2 / 3));
      const r = (diameterNm * 10) / 2;
      for (let i = 0; i < c.atoms; i++)
        expect(Math.hypot(c.positions[3 * i]!, c.positions[3 * i + 1]!, c.positions[3 * i + 2]!)).toBeLessThanOrEqual(
          r * (1 + 1e-9),
        );
    }
  });

  it('by diameter: chooses the shell count whose volume-equivalent diameter is nearest', () => {
    for (const shape of ['cuboctahedron', 'icosahedron', 'truncated-octahedron'] as const) {
      for (const target of [1.5, 2.7, 4.2]) {
        const n = shellsForDiameter(shape, target, NN);
        const gap = (m: number) =>
          Math.abs(equivalentDiameterNm(buildCluster(shape, { shells: m }, NN).atoms, NN) - target);
        expect(gap(n)).toBeLessThanOrEqual(gap(n + 1));
        if (n > 1) expect(gap(n)).toBeLessThanOrEqual(gap(n - 1));
      }
    }
  });

  it('onion layers of a cuboctahedron are its geometric shells (10k²+2 atoms each)', () => {
    const c = buildCuboctahedron(5, NN);
    const list = buildNeighbourList(c.positions, FIVE_SHELL_CUTOFF_FACTOR * NN);
    const layers = layersFromSurface(list, NN);
    const counts = new Map<number, number>();
    for (const l of layers) counts.set(l, (counts.get(l) ?? 0) + 1);
    for (let depth = 0; depth < 5; depth++) expect(counts.get(depth)).toBe(magicClusterSurfaceAtoms(5 - depth));
    expect(counts.get(5)).toBe(1);
  });

  it('refuses bad sizes with the field named', () => {
    expect(() => buildCuboctahedron(-1, NN)).toThrow(DomainError);
    expect(() => buildCuboctahedron(1.5, NN)).toThrow(/shells/);
    expect(() => buildIcosahedron(2, 0)).toThrow(/nearest-neighbour/);
    expect(() => buildCluster('sphere', { diameterNm: -2 }, NN)).toThrow(/diameter/);
    try {
      buildCluster('dodecahedron' as never, { shells: 2 }, NN);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(DomainError);
      expect((error as DomainError).field).toBe('shape');
    }
  });
});
