import { describe, expect, it } from 'vitest';
import {
  BlurredChordGrid,
  chordAntiderivative,
  regionChordsNm,
  sphereChordNm,
  type LineScanModelKind,
} from '../../../shared-model/characterization/chord-profile';
import { exactBlurredProfiles, positions } from './synthetic-line-scan';

/** Composite Simpson rule of f over [a, b] with `panels` (even) panels. */
function simpson(f: (x: number) => number, a: number, b: number, panels: number): number {
  const h = (b - a) / panels;
  let s = f(a) + f(b);
  for (let i = 1; i < panels; i++) s += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}

describe('chord-length geometry', () => {
  it('the chord profile of a sphere integrates to πR² (its central cross-section)', () => {
    // Exact geometry: ∫ 2√(R² − u²) du over [−R, R] = πR².
    for (const R of [1, 3.7, 12]) {
      const integral = simpson((u) => sphereChordNm(u, R), -R, R, 20000);
      expect(integral / (Math.PI * R * R)).toBeCloseTo(1, 5);
      expect(chordAntiderivative(R, R)).toBeCloseTo(Math.PI * R * R, 12);
      expect(chordAntiderivative(0, R)).toBeCloseTo((Math.PI * R * R) / 2, 12);
    }
  });

  it('the antiderivative matches numerical integration at interior points', () => {
    const R = 4;
    for (const u of [-3.5, -1, 0.3, 2.9]) {
      expect(chordAntiderivative(u, R)).toBeCloseTo(
        simpson((t) => sphereChordNm(t, R), -R, u, 20000),
        4,
      );
    }
  });

  it('the two channels of core@shell and Janus profiles add up to the sphere profile', () => {
    const kinds: LineScanModelKind[] = ['A@B', 'B@A', 'Janus'];
    for (const kind of kinds) {
      for (let x = -6; x <= 6; x += 0.37) {
        const c = regionChordsNm({ kind, centerNm: 0.2, radiusNm: 5, coreRadiusNm: 3, janusALow: true }, x);
        expect(c.a + c.b).toBeCloseTo(sphereChordNm(x - 0.2, 5), 12);
        expect(Math.min(c.a, c.b)).toBeGreaterThanOrEqual(0);
      }
    }
    const alloy = regionChordsNm({ kind: 'alloy', centerNm: 0, radiusNm: 5, coreRadiusNm: 0, janusALow: true }, 1);
    expect(alloy.a).toBe(alloy.b);
  });
});

describe('probe blur on the grid', () => {
  const pos = positions(-10, 10, 0.25);
  const x = Float64Array.from(pos);
  const grid = new BlurredChordGrid(x, 0.125, 11, 3);
  const a = new Float64Array(x.length);
  const b = new Float64Array(x.length);

  it('conserves the area πR² of each region (blur moves signal, never adds any)', () => {
    grid.evaluate({ kind: 'A@B', centerNm: 0.3, radiusNm: 5, coreRadiusNm: 3, janusALow: true }, 0.7, a, b);
    const sum = (v: Float64Array) => v.reduce((s, y) => s + y, 0) * 0.25;
    expect(sum(a) / (Math.PI * 9)).toBeCloseTo(1, 3);
    expect(sum(b) / (Math.PI * (25 - 9))).toBeCloseTo(1, 3);
  });

  it('agrees with direct quadrature of the Gaussian convolution', () => {
    for (const kind of ['alloy', 'A@B', 'B@A', 'Janus'] as const) {
      const spec = {
        kind,
        centerNm: 0.3,
        radiusNm: 5,
        coreRadiusNm: 3,
        janusALow: false,
        probeSigmaNm: 0.6,
        amplitudeA: 1,
        amplitudeB: 1,
        backgroundA: 0,
        backgroundB: 0,
        positionsNm: pos,
      };
      grid.evaluate({ ...spec }, spec.probeSigmaNm, a, b);
      const exact = exactBlurredProfiles(spec);
      // Peak chord is 10 nm; the cell discretisation (h = R/40) should stay within 0.5 % of it.
      for (let i = 0; i < pos.length; i++) {
        expect(Math.abs((a[i] as number) - (exact.a[i] as number))).toBeLessThan(0.05);
        expect(Math.abs((b[i] as number) - (exact.b[i] as number))).toBeLessThan(0.05);
      }
    }
  });

  it('data between cell centres are interpolated, not snapped', () => {
    const offset = Float64Array.from(pos.map((p) => p + 0.05));
    const g2 = new BlurredChordGrid(offset, 0.125, 11, 3);
    const a2 = new Float64Array(offset.length);
    const b2 = new Float64Array(offset.length);
    g2.evaluate({ kind: 'alloy', centerNm: 0.3, radiusNm: 5, coreRadiusNm: 0, janusALow: true }, 0.6, a2, b2);
    const exact = exactBlurredProfiles({
      kind: 'alloy',
      centerNm: 0.3,
      radiusNm: 5,
      coreRadiusNm: 0,
      probeSigmaNm: 0.6,
      amplitudeA: 1,
      amplitudeB: 1,
      backgroundA: 0,
      backgroundB: 0,
      positionsNm: [...offset],
    });
    for (let i = 0; i < offset.length; i++)
      expect(Math.abs((a2[i] as number) - (exact.a[i] as number))).toBeLessThan(0.05);
  });
});
