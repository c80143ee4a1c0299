/**
 * Self-check of the Gupta parameter table (DOMAIN.md Models 4): Cleri & Rosato fitted each metal with
 * five-shell sums at its experimental lattice constant, so the bulk fcc energy must (1) have its
 * minimum there and (2) equal minus the cohesive energy. A wrongly recalled digit shows up here.
 */
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import { bulkEnergyPerAtomEv } from '../../../shared-model/montecarlo/gupta-energy';
import {
  GUPTA_ELEMENTS,
  guptaElement,
  guptaPair,
  GUPTA_TABLE,
} from '../../../shared-model/montecarlo/gupta-parameters';

/** Cohesive energies, eV/atom: Kittel, Introduction to Solid State Physics, 8th ed., Ch. 3 Table 1 (from memory). */
const KITTEL_COHESIVE_EV: Record<string, number> = {
  Ni: 4.44,
  Cu: 3.49,
  Rh: 5.75,
  Pd: 3.89,
  Ag: 2.95,
  Ir: 6.94,
  Pt: 5.84,
  Au: 3.81,
  Al: 3.39,
  Pb: 2.03,
};

/** fcc lattice constants, Å: Kittel, ISSP 8th ed., Ch. 1 Table 4 (room temperature; from memory). */
const KITTEL_LATTICE_ANGSTROM: Record<string, number> = {
  Ni: 3.52,
  Cu: 3.61,
  Rh: 3.8,
  Pd: 3.89,
  Ag: 4.09,
  Ir: 3.84,
  Pt: 3.92,
  Au: 4.08,
  Al: 4.05,
  Pb: 4.95,
};

/** Bulk moduli, GPa: Kittel, ISSP 8th ed., Ch. 3 Table 3 (from memory, 10¹¹ N/m² × 100). */
const KITTEL_BULK_MODULUS_GPA: Record<string, number> = {
  Ni: 186,
  Cu: 137,
  Rh: 270,
  Pd: 181,
  Ag: 100.7,
  Ir: 355,
  Pt: 278.3,
  Au: 173.2,
  Al: 72.2,
  Pb: 43,
};

const EV_PER_A3_IN_GPA = 160.21766; // 1 eV/Å³ = 160.2 GPa (CODATA conversion)

function minimumLattice(symbol: string): number {
  // Golden-section search on E(a) within ±10 % of the fitted lattice constant.
  const a0 = guptaElement(symbol).latticeAngstrom;
  let lo = 0.9 * a0;
  let hi = 1.1 * a0;
  const g = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - g * (hi - lo);
  let x2 = lo + g * (hi - lo);
  let f1 = bulkEnergyPerAtomEv(symbol, x1);
  let f2 = bulkEnergyPerAtomEv(symbol, x2);
  while (hi - lo > 1e-7) {
    if (f1 < f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - g * (hi - lo);
      f1 = bulkEnergyPerAtomEv(symbol, x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + g * (hi - lo);
      f2 = bulkEnergyPerAtomEv(symbol, x2);
    }
  }
  return (lo + hi) / 2;
}

describe('Gupta bulk self-check against Kittel', () => {
  it('covers exactly the ten fcc metals of Cleri & Rosato', () => {
    expect([...GUPTA_ELEMENTS].sort()).toEqual(Object.keys(KITTEL_COHESIVE_EV).sort());
  });

  for (const symbol of Object.keys(KITTEL_COHESIVE_EV)) {
    it(`${symbol}: five-shell cohesive energy within 0.06 eV of Kittel`, () => {
      // The fit targeted slightly older cohesive energies for some metals (Cu 3.54, Pd 3.94, Al 3.34,
      // Au 3.78 eV in the compilations of that time, from memory), hence "a few hundredths".
      expect(Math.abs(-bulkEnergyPerAtomEv(symbol) - KITTEL_COHESIVE_EV[symbol]!)).toBeLessThan(0.06);
    });

    it(`${symbol}: bulk energy minimum at the experimental lattice constant`, () => {
      const aMin = minimumLattice(symbol);
      // Kittel rounds to 0.01 Å (Cu 3.61 vs the fitted 3.615), hence 0.2 %.
      expect(Math.abs(aMin - KITTEL_LATTICE_ANGSTROM[symbol]!) / KITTEL_LATTICE_ANGSTROM[symbol]!).toBeLessThan(2e-3);
      // And, tighter, at the constant the parameters were fitted at (the fit imposed equilibrium).
      expect(Math.abs(aMin / guptaElement(symbol).latticeAngstrom - 1)).toBeLessThan(1e-4);
    });

    it(`${symbol}: bulk modulus within 20 % of Kittel (checks the range exponents p, q)`, () => {
      // B = V d²E/dV² = (1/(9 V)) d²E/dλ² at λ = 1 for a uniform scale a = λ a0; V = a0³/4 per atom.
      const a0 = guptaElement(symbol).latticeAngstrom;
      const h = 1e-4;
      const e = (lambda: number) => bulkEnergyPerAtomEv(symbol, lambda * a0);
      const d2 = (e(1 + h) - 2 * e(1) + e(1 - h)) / (h * h);
      const modulusGpa = (d2 / (9 * (a0 ** 3 / 4))) * EV_PER_A3_IN_GPA;
      // Cleri & Rosato fitted elastic constants by least squares; Ir (strong Cauchy violation) deviates most, ~17 %.
      expect(Math.abs(modulusGpa / KITTEL_BULK_MODULUS_GPA[symbol]! - 1)).toBeLessThan(0.2);
    });
  }

  it('the Pb digit corrected by this self-check is flagged for verification', () => {
    expect(GUPTA_TABLE.Pb!.recallNote).toMatch(/3\.648/);
    // With the originally recalled q = 3.648 the minimum sits 0.7 % below the lattice constant: the check would fail.
    expect(GUPTA_TABLE.Pb!.q).toBe(3.468);
  });
});

describe('pair parameters', () => {
  it('unlike pairs use the mixing rule: arithmetic means of p, q, r0; geometric means of A, ξ', () => {
    const ag = guptaElement('Ag');
    const pd = guptaElement('Pd');
    const pair = guptaPair('Ag', 'Pd');
    expect(pair.p).toBeCloseTo((ag.p + pd.p) / 2, 12);
    expect(pair.q).toBeCloseTo((ag.q + pd.q) / 2, 12);
    expect(pair.r0Angstrom).toBeCloseTo((ag.r0Angstrom + pd.r0Angstrom) / 2, 12);
    expect(pair.aEv).toBeCloseTo(Math.sqrt(ag.aEv * pd.aEv), 12);
    expect(pair.xiEv).toBeCloseTo(Math.sqrt(ag.xiEv * pd.xiEv), 12);
    expect(pair.rule.kind).toBe('mixing-rule');
    expect(pair.rule.description).toMatch(/mixing rule/);
    expect(guptaPair('Pt', 'Pt').rule.kind).toBe('pure');
  });

  it('an element outside the table is a DomainError naming the element and field, never a fallback', () => {
    for (const [a, b, field] of [
      ['Fe', 'Pt', 'elementA'],
      ['Pt', 'Co', 'elementB'],
    ] as const) {
      try {
        guptaPair(a, b);
        expect.unreachable();
      } catch (error) {
        expect(error).toBeInstanceOf(DomainError);
        expect((error as DomainError).field).toBe(field);
        expect((error as DomainError).message).toContain(field === 'elementA' ? a : b);
      }
    }
  });
});
