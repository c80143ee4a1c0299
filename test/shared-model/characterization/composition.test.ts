import { describe, expect, it } from 'vitest';
import { compareComposition } from '../../../shared-model/characterization/composition';
import { detectorFwhmEv, lineOverlaps, suggestedLine } from '../../../shared-model/characterization/xray-lines';

describe('composition comparison', () => {
  it('flags deviations beyond the stated uncertainty only', () => {
    const r = compareComposition({
      elementA: 'Au',
      elementB: 'Pd',
      nominalXB: 0.5,
      measurements: [
        { method: 'ICP-OES', xB: 0.48, uncertaintyXB: 0.03 },
        { method: 'EDX particle', xB: 0.41, uncertaintyXB: 0.05 },
        { method: 'EDX area', xB: 0.6, uncertaintyXB: null },
      ],
    });
    expect(r.rows.map((row) => row.flagged)).toEqual([false, true, null]);
    expect(r.rows[1]!.deviationFromNominal).toBeCloseTo(-0.09, 12);
    expect(r.rows[1]!.comment).toMatch(/below nominal by 9.0 at.%/);
    // EDX particle vs ICP: 7 at.% apart, combined uncertainty √(3² + 5²) = 5.8 at.% → warned.
    expect(r.warnings.some((w) => w.code === 'edx-vs-bulk')).toBe(true);
  });

  it('warns when the grid is one of the pair metals', () => {
    const cu = compareComposition({
      elementA: 'Cu',
      elementB: 'Pt',
      nominalXB: 0.25,
      measurements: [],
      gridMetal: 'Cu',
    });
    const grid = cu.warnings.find((w) => w.code === 'grid-metal');
    expect(grid?.message).toMatch(/grid is Cu/);
    expect(grid?.message).not.toMatch(/use a Cu/);
    const unknown = compareComposition({ elementA: 'Ni', elementB: 'Pt', nominalXB: 0.25, measurements: [] });
    expect(unknown.warnings.some((w) => w.code === 'grid-unknown')).toBe(true);
    const fine = compareComposition({
      elementA: 'Au',
      elementB: 'Pd',
      nominalXB: 0.5,
      measurements: [],
      gridMetal: 'Cu',
    });
    expect(fine.warnings.filter((w) => w.code.startsWith('grid'))).toEqual([]);
  });

  it('rejects fractions outside 0–1', () => {
    expect(() => compareComposition({ elementA: 'Au', elementB: 'Pd', nominalXB: 50, measurements: [] })).toThrow(
      /nominalXB/,
    );
    expect(() =>
      compareComposition({
        elementA: 'Au',
        elementB: 'Pd',
        nominalXB: 0.5,
        measurements: [{ method: 'ICP-MS', xB: 0.5, uncertaintyXB: -1 }],
      }),
    ).toThrow(/uncertainty/);
  });
});

describe('X-ray line overlaps', () => {
  it('detector resolution is 129 eV at Mn Kα by construction and narrower below', () => {
    expect(detectorFwhmEv(5.899)).toBeCloseTo(129, 6);
    expect(detectorFwhmEv(2.1)).toBeLessThan(100);
  });

  it('finds the overlaps practitioners know (Pt-M/Au-M, Pd-L/Ag-L, Ni-Kβ/Cu-Kα)', () => {
    // Well-known EDX overlaps (common practice; energies from memory).
    const ptAu = lineOverlaps('Pt', 'Au').map((o) => `${o.lineA.line}/${o.lineB.line}`);
    expect(ptAu).toContain('Mα/Mα');
    expect(lineOverlaps('Pd', 'Ag').map((o) => `${o.lineA.line}/${o.lineB.line}`)).toContain('Lβ1/Lα');
    expect(lineOverlaps('Ni', 'Cu').map((o) => `${o.lineA.line}/${o.lineB.line}`)).toContain('Kβ/Kα');
    expect(lineOverlaps('Au', 'Pd')).toEqual([]);
    const w = compareComposition({ elementA: 'Pt', elementB: 'Au', nominalXB: 0.5, measurements: [] }).warnings;
    expect(w.some((x) => x.code === 'line-overlap' && x.fromMemory && /Pt Mα/.test(x.message))).toBe(true);
  });

  it('suggests lines clear of the other element', () => {
    expect(suggestedLine('Pt', 'Au')?.line).toBe('Lα');
    expect(suggestedLine('Pd', 'Ag')?.line).toBe('Kα');
    expect(suggestedLine('Ni', 'Cu')?.line).toBe('Kα');
  });
});

describe('composition edge', () => {
  it('a deviation exactly equal to the uncertainty is within it (0.48 vs 0.50 ± 0.02)', () => {
    const r = compareComposition({
      elementA: 'Au',
      elementB: 'Pd',
      nominalXB: 0.5,
      measurements: [{ method: 'ICP-OES', xB: 0.48, uncertaintyXB: 0.02 }],
    });
    expect(r.rows[0]!.flagged).toBe(false);
  });
});
