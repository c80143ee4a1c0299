/** A ranking answers the question asked: only the pairs that meet the target, the rest marked with why. */
import { describe, expect, it } from 'vitest';
import {
  missReason,
  parseRankTarget,
  qualifiesFor,
  rankPairs,
  splitByTarget,
} from '../../../shared-model/prediction/rank';

const BASE = { xB: 0.5, diameterNm: 3, shape: 'cuboctahedron' as const, temperatureK: 600 };
const SEVEN = ['Pt', 'Pd', 'Au', 'Ag', 'Ni', 'Cu', 'Co'];

describe('splitByTarget', () => {
  it('core@shell:Au keeps only Au-shelled pairs, best score first, ranked 1..n; the rest follow with why', () => {
    const target = parseRankTarget('core@shell:Au');
    const { meeting, missing } = splitByTarget(rankPairs(SEVEN, target, BASE), target);
    expect(meeting.length).toBeGreaterThan(0);
    expect(meeting.length + missing.length).toBe(21);
    meeting.forEach((row, i) => {
      expect(row.rank).toBe(i + 1);
      expect(row.prediction.architectureKind).toBe('core@shell');
      expect(row.prediction.surfaceElement).toBe('Au');
      if (i > 0) expect(row.score).toBeLessThanOrEqual((meeting[i - 1] as { score: number }).score);
    });
    missing.forEach((row, i) => {
      expect(row.rank).toBe(meeting.length + i + 1);
      expect(qualifiesFor(target, row.prediction)).toBe(false);
      expect(row.miss).not.toBe('');
    });
    // Ag has the lower surface energy of Au–Ag (Tyson & Miller 1977, from memory): Ag, not Au, goes out
    expect(missing.find((row) => row.pair === 'Au-Ag')?.miss).toBe('Ag goes to the surface, not Au');
  });

  it('core@shell:Pt: no pair of the seven meets it; the misses are closest first (highest score first)', () => {
    const target = parseRankTarget('core@shell:Pt');
    const { meeting, missing } = splitByTarget(rankPairs(SEVEN, target, BASE), target);
    expect(meeting).toHaveLength(0);
    for (let i = 1; i < missing.length; i++) expect(missing[i]?.score).toBeLessThanOrEqual(missing[i - 1]?.score ?? 1);
    expect(missing.filter((row) => row.pair.includes('Pt')).every((row) => /Pt|shell/.test(row.miss))).toBe(true);
  });

  it('every target: meeting rows all qualify, missing rows none, and together they are every pair', () => {
    for (const text of ['alloy', 'core@shell', 'core@shell:Cu', 'Janus', 'intermetallic']) {
      const target = parseRankTarget(text);
      const ranked = rankPairs(SEVEN, target, BASE);
      const { meeting, missing } = splitByTarget(ranked, target);
      expect(
        meeting.every((row) => qualifiesFor(target, row.prediction)),
        text,
      ).toBe(true);
      expect(
        missing.every((row) => !qualifiesFor(target, row.prediction)),
        text,
      ).toBe(true);
      expect(new Set([...meeting, ...missing].map((row) => row.pair)).size, text).toBe(21);
    }
  });

  it('missReason names the target kind that was not met', () => {
    const [row] = rankPairs(['Pt', 'Pd'], 'Janus', BASE);
    expect(row).toBeDefined();
    if (row === undefined) return;
    expect(missReason({ kind: 'Janus' }, row.prediction)).toMatch(/^predicted .+: not two exposed lobes$/);
    expect(missReason({ kind: 'intermetallic' }, row.prediction)).toMatch(/no ordered compound/);
  });
});
