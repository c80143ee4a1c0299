import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import { computeIsotherm } from '../../../shared-model/prediction/isotherm';
import { predictPair } from '../../../shared-model/prediction/predict';
import { parseRankTarget, rankPairs, targetScore } from '../../../shared-model/prediction/rank';

const BASE = { xB: 0.5, diameterNm: 3, shape: 'cuboctahedron' as const, temperatureK: 600 };
const SEVEN = ['Pt', 'Pd', 'Au', 'Ag', 'Ni', 'Cu', 'Co'];

describe('rankPairs', () => {
  it('ranks all 21 pairs of seven metals, best first, with ranks 1..21 and scores in [0, 1]', () => {
    const rows = rankPairs(SEVEN, 'alloy', BASE);
    expect(rows).toHaveLength(21);
    rows.forEach((row, i) => {
      expect(row.rank).toBe(i + 1);
      expect(row.score).toBeGreaterThanOrEqual(0);
      expect(row.score).toBeLessThanOrEqual(1);
      if (i > 0) expect(row.score).toBeLessThanOrEqual((rows[i - 1] as { score: number }).score);
    });
  });

  it('scores agree with the full prediction of each row (fast path ≡ predictPair)', () => {
    for (const target of ['alloy', 'core@shell', 'core@shell:Au', 'janus', 'intermetallic']) {
      const parsed = parseRankTarget(target);
      for (const row of rankPairs(SEVEN, parsed, BASE)) {
        const [a, b] = row.pair.split('-') as [string, string];
        const direct = predictPair(a, b, BASE);
        expect(row.prediction.surfaceXB).toBeCloseTo(direct.surfaceXB, 12);
        expect(row.score).toBeCloseTo(targetScore(parsed, direct), 12);
      }
    }
  });

  it('core@shell with Au in the shell puts Au-shell pairs first and scores the others 0', () => {
    const rows = rankPairs(SEVEN, 'core@shell:Au', BASE);
    const withAu = rows.filter((r) => r.prediction.surfaceElement === 'Au');
    expect(withAu.length).toBeGreaterThan(0);
    expect(rows.slice(0, withAu.length).every((r) => r.prediction.surfaceElement === 'Au')).toBe(true);
    for (const row of rows.slice(withAu.length)) expect(row.score).toBe(0);
  });

  it('gives a reason built from the dominant terms for each row', () => {
    for (const row of rankPairs(SEVEN, 'core@shell', BASE).slice(0, 5)) {
      expect(row.prediction.reason).toMatch(/to the surface|no surface enrichment/);
      expect(row.prediction.reason).toMatch(/kJ\/mol/);
    }
  });

  it('"all" ranks the 435 pairs of the 30 metals', () => {
    expect(rankPairs('all', 'Janus', BASE)).toHaveLength(435);
  });

  it('reads targets and rejects bad ones naming the field', () => {
    expect(parseRankTarget('alloy')).toEqual({ kind: 'alloy' });
    expect(parseRankTarget('Janus')).toEqual({ kind: 'Janus' });
    expect(parseRankTarget('core@shell')).toEqual({ kind: 'core@shell' });
    expect(parseRankTarget('core@shell:pt')).toEqual({ kind: 'core@shell', shellElement: 'Pt' });
    expect(parseRankTarget('@Ag')).toEqual({ kind: 'core@shell', shellElement: 'Ag' });
    expect(() => parseRankTarget('hollow')).toThrow(DomainError);
    expect(() => parseRankTarget('shell:Xx')).toThrow(/unknown shell element/);
    expect(() => rankPairs(['Pt'], 'alloy', BASE)).toThrow(/at least two/);
    expect(() => rankPairs(['Pt', 'Xx'], 'alloy', BASE)).toThrow(/unknown element "Xx"/);
    expect(() => rankPairs(SEVEN, 'core@shell:Rh', BASE)).toThrow(/not among the elements/);
    expect(() => rankPairs(SEVEN, 'alloy', { ...BASE, xB: 2 })).toThrow(/xB/);
  });
});

describe('computeIsotherm', () => {
  it('vs composition: surface B fraction rises with xB and stays in [0, 1]; Ag-rich surface on Pd–Ag', () => {
    const iso = computeIsotherm('Pd', 'Ag', BASE, 'xB', 21);
    expect(iso.points).toHaveLength(21);
    for (let i = 1; i < iso.points.length; i++) {
      const p = iso.points[i] as { surfaceXB: number; xB: number };
      expect(p.surfaceXB).toBeGreaterThan((iso.points[i - 1] as { surfaceXB: number }).surfaceXB);
      expect(p.surfaceXB).toBeGreaterThanOrEqual(p.xB);
    }
    expect(iso.points[0]?.xB).toBeGreaterThan(0);
    expect(iso.points.at(-1)?.xB).toBeLessThan(1);
  });

  it('vs diameter: large particles approach the semi-infinite value, small ones deplete the core', () => {
    const iso = computeIsotherm('Pd', 'Ag', { ...BASE, xB: 0.2 }, 'diameter', 15);
    const first = iso.points[0] as { coreXB: number; diameterNm: number };
    const last = iso.points.at(-1) as { coreXB: number; diameterNm: number };
    expect(first.diameterNm).toBeCloseTo(1, 10);
    expect(last.diameterNm).toBeCloseTo(100, 8);
    expect(first.coreXB).toBeLessThan(last.coreXB);
    expect(last.coreXB).toBeGreaterThan(0.19);
  });

  it('vs temperature: enrichment falls as T rises', () => {
    const iso = computeIsotherm('Pt', 'Au', { ...BASE, xB: 0.1, diameterNm: 20 }, 'temperature', 11);
    expect((iso.points[0] as { enrichment: number }).enrichment).toBeGreaterThan(
      (iso.points.at(-1) as { enrichment: number }).enrichment,
    );
  });

  it('rejects a bad sweep or number of points', () => {
    expect(() => computeIsotherm('Pd', 'Ag', BASE, 'pressure' as never)).toThrow(/sweep/);
    expect(() => computeIsotherm('Pd', 'Ag', BASE, 'xB', 2)).toThrow(/points/);
  });
});
