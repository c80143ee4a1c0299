import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import { sphereDiameterForAtoms } from '../../../shared-model/geometry/fcc';
import {
  magicClusterAtoms,
  magicClusterSurfaceAtoms,
  truncatedOctahedronAtoms,
  truncatedOctahedronSurfaceAtoms,
} from '../../../shared-model/geometry/magic-numbers';
import { PARTICLE_SHAPES, particleSiteCounts } from '../../../shared-model/geometry/particle-sites';

const A_PT_NM = 0.39242;

describe('closed-shell cluster counts (Mackay, Acta Cryst. 15, 916 (1962))', () => {
  // Mackay's closed forms written out here independently: N = (10n³ + 15n² + 11n + 3)/3, Ns = 10n² + 2
  const mackay = (n: number) => (10 * n * n * n + 15 * n * n + 11 * n + 3) / 3;
  // the familiar sequence 13, 55, 147, 309, 561, 923, 1415, 2057 (n = 1..8)
  const KNOWN = [13, 55, 147, 309, 561, 923, 1415, 2057];
  const KNOWN_SURFACE = [12, 42, 92, 162, 252, 362, 492, 642];

  it.each([1, 2, 3, 4, 5, 6, 7, 8])('n = %i: atoms and surface sites', (n) => {
    expect(magicClusterAtoms(n)).toBe(mackay(n));
    expect(magicClusterAtoms(n)).toBe(KNOWN[n - 1]);
    expect(magicClusterSurfaceAtoms(n)).toBe(10 * n * n + 2);
    expect(magicClusterSurfaceAtoms(n)).toBe(KNOWN_SURFACE[n - 1]);
    // the shell n is what n − 1 lacks
    expect(magicClusterAtoms(n) - magicClusterAtoms(n - 1)).toBe(magicClusterSurfaceAtoms(n));
  });

  it('truncated octahedra 38, 201, 586, 1289 atoms (common in the cluster literature, from memory)', () => {
    expect([2, 3, 4, 5].map(truncatedOctahedronAtoms)).toEqual([38, 201, 586, 1289]);
    // TO38: 32 of 38 atoms on the surface (6-atom octahedral core), from memory
    expect(truncatedOctahedronSurfaceAtoms(2)).toBe(32);
  });
});

describe('particleSiteCounts', () => {
  it('is exact at every magic size for cuboctahedra/icosahedra and truncated octahedra', () => {
    for (let n = 1; n <= 8; n++) {
      const atoms = magicClusterAtoms(n);
      const d = sphereDiameterForAtoms(atoms, A_PT_NM);
      for (const shape of ['cuboctahedron', 'icosahedron'] as const) {
        const counts = particleSiteCounts(d, A_PT_NM, shape);
        expect(counts.atoms).toBeCloseTo(atoms, 6);
        expect(counts.surfaceSites).toBeCloseTo(magicClusterSurfaceAtoms(n), 6);
        expect(counts.shellIndex).toBeCloseTo(n, 6);
      }
    }
    for (let l = 2; l <= 6; l++) {
      const atoms = truncatedOctahedronAtoms(l);
      const counts = particleSiteCounts(sphereDiameterForAtoms(atoms, A_PT_NM), A_PT_NM, 'truncated-octahedron');
      expect(counts.surfaceSites).toBeCloseTo(truncatedOctahedronSurfaceAtoms(l), 6);
    }
  });

  it('takes the nearest closed shell between magic sizes (the rule of closed-shells.ts, as the Monte Carlo)', () => {
    // half-way in N between 147 and 309 atoms: the volume-equivalent diameter is nearer the 309-atom shell
    const atoms = (magicClusterAtoms(3) + magicClusterAtoms(4)) / 2;
    const counts = particleSiteCounts(sphereDiameterForAtoms(atoms, A_PT_NM), A_PT_NM, 'cuboctahedron');
    expect(counts).toMatchObject({ atoms: 309, surfaceSites: 162, shellIndex: 4 });
  });

  it('N grows as d³ for a sphere; closed shells step up in whole atoms; the surface share never rises with size', () => {
    for (const shape of PARTICLE_SHAPES) {
      let previousShare = 1.01;
      let previousAtoms = 0;
      for (const d of [1, 1.5, 2, 3, 5, 8, 13, 20, 50, 100]) {
        const counts = particleSiteCounts(d, A_PT_NM, shape);
        const sphereAtoms = ((Math.PI / 6) * d ** 3 * 4) / A_PT_NM ** 3;
        if (shape === 'sphere') expect(counts.atoms).toBeCloseTo(sphereAtoms, 6);
        else {
          expect(Number.isInteger(counts.atoms)).toBe(true);
          // the nearest closed shell is within one shell of the sphere's count: a few per cent in diameter
          expect(Math.abs(Math.cbrt(counts.atoms / sphereAtoms) - 1), `${shape} ${d} nm`).toBeLessThan(0.25);
        }
        // two diameters may pick the same closed shell (1 and 1.5 nm: the 201-atom truncated octahedron)
        expect(counts.atoms).toBeGreaterThanOrEqual(previousAtoms);
        const share = counts.surfaceSites / counts.atoms;
        expect(share, `${shape} ${d} nm`).toBeLessThanOrEqual(previousShare);
        expect(share).toBeGreaterThan(0);
        previousShare = share;
        previousAtoms = counts.atoms;
      }
    }
  });

  it('shapes agree on the surface share to within 25 % at 5 nm (geometry, not a fit)', () => {
    const shares = PARTICLE_SHAPES.map((shape) => {
      const c = particleSiteCounts(5, A_PT_NM, shape);
      return c.surfaceSites / c.atoms;
    });
    expect(Math.max(...shares) / Math.min(...shares)).toBeLessThan(1.25);
  });

  it('a 3 nm Pt cuboctahedron has about 900 atoms, ~40 % on the surface (common rule of thumb)', () => {
    const c = particleSiteCounts(3, A_PT_NM, 'cuboctahedron');
    // the 6-shell closed cuboctahedron (Mackay 1962), the cluster the Monte Carlo builds for 3 nm
    expect(c.atoms).toBe(923);
    expect(c.surfaceSites / c.atoms).toBeGreaterThan(0.35);
    expect(c.surfaceSites / c.atoms).toBeLessThan(0.45);
  });

  it('huge particles stay finite, tiny ones are nearly all surface', () => {
    const big = particleSiteCounts(1e5, A_PT_NM, 'cuboctahedron');
    expect(Number.isFinite(big.atoms)).toBe(true);
    expect(big.surfaceSites / big.atoms).toBeLessThan(1e-4);
    const tiny = particleSiteCounts(0.5, A_PT_NM, 'cuboctahedron');
    expect(tiny.surfaceSites / tiny.atoms).toBeGreaterThan(0.9);
  });

  it('rejects bad input naming the field', () => {
    expect(() => particleSiteCounts(0, A_PT_NM, 'sphere')).toThrow(DomainError);
    expect(() => particleSiteCounts(-1, A_PT_NM, 'sphere')).toThrow(/diameter/);
    expect(() => particleSiteCounts(Number.NaN, A_PT_NM, 'sphere')).toThrow(/diameter/);
    expect(() => particleSiteCounts(0.2, A_PT_NM, 'sphere')).toThrow(/fewer than 2 atoms/);
    expect(() => particleSiteCounts(3, A_PT_NM, 'cube' as never)).toThrow(/shape/);
  });
});
