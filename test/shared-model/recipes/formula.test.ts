import { MF } from 'mf-parser';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import {
  atomicMassGPerMol,
  molarMassGPerMol,
  normalizeFormula,
  parseFormula,
} from '../../../shared-model/recipes/formula';
import { REAGENT_SEED } from '../../../shared-model/recipes/reagent-seed';

/**
 * Molar masses (g/mol) as tabulated in the CRC Handbook of Chemistry and Physics, "Physical Constants of
 * Inorganic Compounds" / "… of Organic Compounds" (values from memory, two decimals as printed).
 */
const CRC_MOLAR_MASSES: [string, number][] = [
  ['HAuCl4·3H2O', 393.83],
  ['H2PtCl6·6H2O', 517.9],
  ['K2PtCl4', 415.09],
  ['K2PtCl6', 485.99],
  ['Na2PdCl4', 294.21],
  ['AgNO3', 169.87],
  ['NaBH4', 37.83],
  ['CuCl2·2H2O', 170.48],
  ['Cu(NO3)2·3H2O', 241.6],
  ['NiCl2·6H2O', 237.69],
  ['CoCl2·6H2O', 237.93],
  ['C6H8O6', 176.12],
  ['N2H4·H2O', 50.06],
  ['C2H6O2', 62.07],
  ['Na3C6H5O7·2H2O', 294.1],
  ['C19H42BrN', 364.45],
  ['Fe(CO)5', 195.9],
  ['NaOH', 40.0],
];

describe('molar masses vs CRC Handbook', () => {
  it.each(CRC_MOLAR_MASSES)('%s = %f g/mol (±0.02)', (formula, crc) => {
    expect(Math.abs(molarMassGPerMol(formula) - crc)).toBeLessThanOrEqual(0.02);
  });

  it('covers at least ten catalog reagents', () => {
    const catalogFormulas = new Set(REAGENT_SEED.map((r) => r.formula));
    expect(CRC_MOLAR_MASSES.filter(([f]) => catalogFormulas.has(f)).length).toBeGreaterThanOrEqual(10);
  });

  it('Pt(acac)2 by hand with IUPAC standard atomic weights: Pt 195.084 + 2 × (5 × 12.011 + 7 × 1.008 + 2 × 15.999) = 393.302', () => {
    const byHand = 195.084 + 2 * (5 * 12.011 + 7 * 1.008 + 2 * 15.999);
    expect(byHand).toBeCloseTo(393.302, 3);
    expect(Math.abs(molarMassGPerMol('Pt(C5H7O2)2') - byHand)).toBeLessThan(0.01);
  });

  it('atomic weights agree with IUPAC standard atomic weights (Au 196.966570, Pt 195.084, Ag 107.8682, Pd 106.42)', () => {
    expect(atomicMassGPerMol('Au')).toBeCloseTo(196.96657, 3);
    expect(atomicMassGPerMol('Pt')).toBeCloseTo(195.084, 2);
    expect(atomicMassGPerMol('Ag')).toBeCloseTo(107.8682, 2);
    expect(Math.abs(atomicMassGPerMol('Pd') - 106.42)).toBeLessThan(0.01);
  });
});

describe('hydrate notation', () => {
  it('mf-parser alone misreads "HAuCl4.3H2O" as a decimal Cl count — the reason formulas are normalised', () => {
    const raw = new MF('HAuCl4.3H2O').getInfo() as { mass: number };
    expect(Math.abs(raw.mass - 393.83)).toBeGreaterThan(20);
  });

  it.each(['HAuCl4·3H2O', 'HAuCl4.3H2O', 'HAuCl4•3H2O', 'HAuCl4*3H2O', 'HAuCl4 . 3H2O', 'HAuCl4∙3H2O'])(
    '%s → 393.83 g/mol',
    (formula) => {
      expect(molarMassGPerMol(formula)).toBeCloseTo(393.83, 1);
      expect(normalizeFormula(formula)).toBe('HAuCl4 . 3H2O');
    },
  );

  it('counts the water of hydration in the atoms', () => {
    expect(parseFormula('CuCl2·2H2O').atoms).toEqual({ Cu: 1, Cl: 2, H: 4, O: 2 });
  });
});

describe('bad formulas name the field', () => {
  it.each([
    ['', 'must not be empty'],
    ['Xx2', 'Xx'],
    ['Pt(acac)2', 'not a chemical formula'],
    ['H2O)', 'not a chemical formula'],
  ])('"%s"', (formula, fragment) => {
    let caught: unknown;
    try {
      parseFormula(formula, 'formula');
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(DomainError);
    expect((caught as DomainError).field).toBe('formula');
    expect((caught as DomainError).message).toContain(fragment);
  });
});
