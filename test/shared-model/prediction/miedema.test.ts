import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import { METAL_SYMBOLS } from '../../../shared-model/elements/symbols';
import { miedemaMixingEnthalpy } from '../../../shared-model/prediction/miedema';

/**
 * Takeuchi & Inoue, Mater. Trans. 46, 2817 (2005), Table of Miedema-model mixing enthalpies of equiatomic
 * liquid pairs (kJ/mol), values from memory. Their table is rounded to whole kJ/mol and they used the
 * liquid form (hybridization term × 0.73, no elastic term), so we compare our 'liquid' state.
 * Tolerance: ±2 kJ/mol or 8 %, whichever is larger — the rounding (±0.5), P = 14.1 vs 14.2 and the
 * charge-transfer volume correction details of different implementations move values by about 1 kJ/mol.
 */
const TAKEUCHI_INOUE: Array<[string, string, number]> = [
  ['Ni', 'Zr', -49],
  ['Cu', 'Zr', -23],
  ['Ni', 'Ti', -35],
  ['Al', 'Ni', -22],
  ['Al', 'Zr', -44],
  ['Al', 'Ti', -30],
  ['Cu', 'Ni', 4],
  ['Ag', 'Cu', 2],
  ['Cu', 'Fe', 13],
  ['Co', 'Cu', 6],
  ['Ag', 'Ni', 15],
  ['Fe', 'Ni', -2],
  ['Cr', 'Ni', -7],
  ['Al', 'Fe', -11],
  ['Al', 'Co', -19],
  ['Cu', 'Ti', -9],
  ['Co', 'Zr', -41],
  ['Fe', 'Zr', -25],
  ['Nb', 'Ni', -30],
  ['Au', 'Cu', -9],
  ['Ag', 'Au', -6],
  ['Cu', 'Pd', -14],
];

/**
 * Known disagreement (docs/known-limits-prediction.md): Al–Cu, Takeuchi & Inoue −1 kJ/mol (from memory);
 * we get about −8 because de Boer's hybridization factor for Cu (0.3) applies to Al–Cu in our reading.
 */
const KNOWN_DISAGREEMENTS: Array<[string, string, number]> = [['Al', 'Cu', -1]];

function tolerance(expected: number): number {
  return Math.max(2, 0.08 * Math.abs(expected));
}

describe('Miedema mixing enthalpy', () => {
  it.each(TAKEUCHI_INOUE)('%s-%s equiatomic liquid ≈ %d kJ/mol (Takeuchi & Inoue 2005)', (a, b, expected) => {
    const value = miedemaMixingEnthalpy(a, b, 0.5, 'liquid').totalKjPerMol;
    expect(Math.abs(value - expected)).toBeLessThanOrEqual(tolerance(expected));
  });

  it('still disagrees where we said it does (update the known-limits file if this fails)', () => {
    for (const [a, b, expected] of KNOWN_DISAGREEMENTS) {
      const value = miedemaMixingEnthalpy(a, b, 0.5, 'liquid').totalKjPerMol;
      expect(Math.abs(value - expected)).toBeGreaterThan(tolerance(expected));
    }
  });

  it('is symmetric: A(1−x)B(x) equals B(x)A(1−x), and vanishes for the pure metals', () => {
    for (const [a, b] of [
      ['Pt', 'Ni'],
      ['Ag', 'Cu'],
      ['Al', 'Zr'],
      ['Au', 'Pd'],
    ] as const) {
      for (const x of [0.1, 0.37, 0.5, 0.8]) {
        const ab = miedemaMixingEnthalpy(a, b, x);
        const ba = miedemaMixingEnthalpy(b, a, 1 - x);
        expect(ab.chemicalKjPerMol).toBeCloseTo(ba.chemicalKjPerMol, 10);
        expect(ab.elasticKjPerMol).toBeCloseTo(ba.elasticKjPerMol, 10);
      }
      expect(miedemaMixingEnthalpy(a, b, 0).totalKjPerMol).toBe(0);
      expect(miedemaMixingEnthalpy(a, b, 1).totalKjPerMol).toBe(0);
    }
  });

  it('solid = liquid chemical part (without hybridization) plus a non-negative elastic part', () => {
    for (const [a, b] of [
      ['Pt', 'Ni'],
      ['Ag', 'Cu'],
      ['Au', 'Pd'],
      ['Fe', 'Co'],
    ] as const) {
      const solid = miedemaMixingEnthalpy(a, b, 0.3, 'solid');
      const liquid = miedemaMixingEnthalpy(a, b, 0.3, 'liquid');
      expect(solid.hybridizationRtoP).toBe(0);
      expect(solid.chemicalKjPerMol).toBeCloseTo(liquid.chemicalKjPerMol, 10);
      expect(solid.elasticKjPerMol).toBeGreaterThanOrEqual(0);
      expect(liquid.elasticKjPerMol).toBe(0);
    }
    // hybridization (R) applies for a transition metal with Al, Zn, Cd, In, Sn, Pb or Bi, R/P = 1.9 × 1.0 for Al–Ni
    expect(miedemaMixingEnthalpy('Al', 'Ni', 0.5).hybridizationRtoP).toBeCloseTo(1.9, 10);
    expect(miedemaMixingEnthalpy('Al', 'Pb', 0.5).hybridizationRtoP).toBe(0);
  });

  it('is finite for every pair of the table at several compositions', () => {
    for (const a of METAL_SYMBOLS) {
      for (const b of METAL_SYMBOLS) {
        if (a === b) continue;
        for (const x of [1e-9, 0.5, 1 - 1e-9])
          expect(Number.isFinite(miedemaMixingEnthalpy(a, b, x).totalKjPerMol)).toBe(true);
      }
    }
  });

  it('rules of the trade: Ag–Ni and Cu–Fe demix (+), Ni–Al and Pt–Sn mix strongly (−) (common practice)', () => {
    expect(miedemaMixingEnthalpy('Ag', 'Ni', 0.5).totalKjPerMol).toBeGreaterThan(10);
    expect(miedemaMixingEnthalpy('Cu', 'Fe', 0.5).totalKjPerMol).toBeGreaterThan(5);
    expect(miedemaMixingEnthalpy('Ni', 'Al', 0.5).totalKjPerMol).toBeLessThan(-15);
    expect(miedemaMixingEnthalpy('Pt', 'Sn', 0.5).totalKjPerMol).toBeLessThan(-15);
  });

  it('rejects bad input with a DomainError naming the field', () => {
    expect(() => miedemaMixingEnthalpy('Pt', 'Pt', 0.5)).toThrow(/two different elements/);
    expect(() => miedemaMixingEnthalpy('Pt', 'Xx', 0.5)).toThrow(DomainError);
    expect(() => miedemaMixingEnthalpy('Pt', 'Ni', 1.5)).toThrow(/xB/);
    expect(() => miedemaMixingEnthalpy('Pt', 'Ni', Number.NaN)).toThrow(/xB/);
  });
});
