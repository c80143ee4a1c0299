import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import {
  ELEMENT_COLUMN_SOURCES,
  ELEMENT_RECORDS,
  NUMERIC_ELEMENT_PROPERTIES,
  cellAtomicVolumeAngstrom3,
  elementProperty,
  getElement,
  isFccElement,
  latticeConstantNm,
  miedemaParameters,
  recordProperty,
  type ElementRecord,
} from '../../../shared-model/elements/element-table';
import { METAL_SYMBOLS } from '../../../shared-model/elements/symbols';

describe('element table: coverage and accessors', () => {
  it('has every metal of symbols.ts with every numeric property finite and positive', () => {
    expect(ELEMENT_RECORDS.map((r) => r.symbol)).toEqual([...METAL_SYMBOLS]);
    for (const symbol of METAL_SYMBOLS) {
      for (const property of NUMERIC_ELEMENT_PROPERTIES) {
        // the second surface-energy source lists only the metals it was recalled for
        if (property === 'surfaceEnergyDftJPerM2' && getElement(symbol).surfaceEnergyDftJPerM2 === null) continue;
        const value = elementProperty(symbol, property);
        expect(Number.isFinite(value), `${symbol}.${property}`).toBe(true);
        expect(value, `${symbol}.${property}`).toBeGreaterThan(0);
      }
      expect(getElement(symbol).oxidationStates.length).toBeGreaterThan(0);
    }
  });

  it('names a source for every column', () => {
    for (const column of ELEMENT_COLUMN_SOURCES) expect(column.source.length).toBeGreaterThan(10);
    const named = ELEMENT_COLUMN_SOURCES.map((c) => c.column).join(' ');
    for (const word of [
      'lattice',
      'cohesive',
      'metallicRadius',
      'surfaceEnergy',
      'electronegativity',
      'bulkModulus',
      'shearModulus',
      'atomicMass',
      'miedema',
      'oxidation',
    ]) {
      expect(named).toContain(word);
    }
  });

  it('throws a DomainError naming the value for an unknown symbol', () => {
    expect(() => getElement('Xx')).toThrow(DomainError);
    expect(() => getElement('Xx')).toThrow(/unknown element "Xx"/);
    expect(() => elementProperty('pt', 'atomicMass')).toThrow(/unknown element "pt"/);
    try {
      getElement('Q', 'elementB');
    } catch (error) {
      expect(error).toBeInstanceOf(DomainError);
      expect((error as DomainError).field).toBe('elementB');
      expect((error as DomainError).code).toBe('invalid_input');
    }
  });

  it('throws (never NaN) for a missing property of a record', () => {
    const pt = getElement('Pt');
    const withoutMiedema: ElementRecord = { ...pt, miedema: null, surfaceEnergyJPerM2: null };
    expect(() => recordProperty(withoutMiedema, 'miedemaPhiStarV')).toThrow(/no miedemaPhiStarV for Pt/);
    expect(() => recordProperty(withoutMiedema, 'surfaceEnergyJPerM2')).toThrow(/no surfaceEnergyJPerM2 for Pt/);
    expect(() => recordProperty(pt, 'colour' as never)).toThrow(/unknown element property "colour"/);
    expect(() => miedemaParameters('Zz')).toThrow(DomainError);
  });
});

describe('element table: derived geometry', () => {
  it('latticeConstantNm is a/10 for fcc metals and the equal-volume fcc edge otherwise', () => {
    expect(latticeConstantNm('Pt')).toBeCloseTo(0.39242, 6);
    expect(isFccElement('Pt')).toBe(true);
    expect(isFccElement('Fe')).toBe(false);
    // bcc Fe: Ω = a³/2; fcc edge with the same Ω is (4Ω)^(1/3) = a·2^(1/3)
    expect(latticeConstantNm('Fe')).toBeCloseTo((2.87 * Math.cbrt(2)) / 10, 6);
    // hcp with ideal c/a = √(8/3) has exactly the fcc density: a_fcc = √2·a_hcp (pure geometry)
    const ideal = cellAtomicVolumeAngstrom3({
      structure: 'hcp',
      aAngstrom: 2.5,
      cAngstrom: 2.5 * Math.sqrt(8 / 3),
      atomsPerCell: 2,
    });
    expect(Math.cbrt(4 * ideal)).toBeCloseTo(2.5 * Math.SQRT2, 10);
  });

  it('metallic radius of fcc metals ≈ half the nearest-neighbour distance a/(2√2) (geometry of CN12)', () => {
    for (const symbol of ['Al', 'Ni', 'Cu', 'Rh', 'Pd', 'Ag', 'Ir', 'Pt', 'Au', 'Pb']) {
      const a = elementProperty(symbol, 'latticeConstantAngstrom');
      expect(elementProperty(symbol, 'metallicRadiusAngstrom'), symbol).toBeCloseTo(a / (2 * Math.SQRT2), 1);
    }
  });

  it('Miedema V^(2/3) agrees with the molar volume of the crystal cell within 1 % (Bi: known 7 % gap)', () => {
    // V^(2/3) of de Boer is (molar volume)^(2/3) in cm²; Avogadro constant N_A = 6.02214076e23 (SI exact).
    // Two independent columns (Kittel cells, de Boer volumes) so a recalled digit gone wrong shows here.
    // Bi: de Boer's 7.20 cm² is 19.3 cm³/mol against 21.4 for the open rhombohedral crystal; kept as
    // de Boer's fitted value (docs/known-limits-prediction.md).
    for (const symbol of METAL_SYMBOLS) {
      const molarCm3 = elementProperty(symbol, 'atomicVolumeAngstrom3') * 1e-24 * 6.02214076e23;
      const v23 = elementProperty(symbol, 'miedemaV23Cm2');
      const gap = Math.abs(molarCm3 ** (2 / 3) / v23 - 1);
      if (symbol === 'Bi') expect(gap).toBeLessThan(0.08);
      else expect(gap, symbol).toBeLessThan(0.01);
    }
  });
});

describe('element table vs named sources (values recalled from the sources: "from memory")', () => {
  const cases: Array<[string, Parameters<typeof elementProperty>[1], number, number, string]> = [
    // Kittel, ISSP 8th ed., ch. 1 table of structures (from memory), 3 figures → ±0.01 Å
    ['Cu', 'latticeConstantAngstrom', 3.61, 0.01, 'Kittel ch.1'],
    ['Au', 'latticeConstantAngstrom', 4.08, 0.01, 'Kittel ch.1'],
    ['Pt', 'latticeConstantAngstrom', 3.92, 0.01, 'Kittel ch.1'],
    ['Al', 'latticeConstantAngstrom', 4.05, 0.01, 'Kittel ch.1'],
    ['W', 'latticeConstantAngstrom', 3.16, 0.01, 'Kittel ch.1'],
    // Kittel Table 3.1 cohesive energies (from memory), eV/atom
    ['Pt', 'cohesiveEnergyEv', 5.84, 0.005, 'Kittel Table 3.1'],
    ['Ag', 'cohesiveEnergyEv', 2.95, 0.005, 'Kittel Table 3.1'],
    ['W', 'cohesiveEnergyEv', 8.9, 0.005, 'Kittel Table 3.1'],
    ['Ni', 'cohesiveEnergyEv', 4.44, 0.005, 'Kittel Table 3.1'],
    ['Cu', 'cohesiveEnergyEv', 3.49, 0.005, 'Kittel Table 3.1'],
    // Tyson & Miller (1977) (from memory), J/m²
    ['Ag', 'surfaceEnergyJPerM2', 1.246, 0.001, 'Tyson & Miller'],
    ['Au', 'surfaceEnergyJPerM2', 1.506, 0.001, 'Tyson & Miller'],
    ['Pt', 'surfaceEnergyJPerM2', 2.489, 0.001, 'Tyson & Miller'],
    ['Pb', 'surfaceEnergyJPerM2', 0.593, 0.001, 'Tyson & Miller'],
    ['Ni', 'surfaceEnergyJPerM2', 2.38, 0.001, 'Tyson & Miller'],
    // Pauling electronegativity (CRC, from memory)
    ['Au', 'electronegativityPauling', 2.54, 0.005, 'Pauling/CRC'],
    ['Pt', 'electronegativityPauling', 2.28, 0.005, 'Pauling/CRC'],
    ['Ni', 'electronegativityPauling', 1.91, 0.005, 'Pauling/CRC'],
    ['Ag', 'electronegativityPauling', 1.93, 0.005, 'Pauling/CRC'],
    // CRC / IUPAC atomic weights (from memory)
    ['Pt', 'atomicMass', 195.08, 0.01, 'IUPAC'],
    ['Au', 'atomicMass', 196.97, 0.01, 'IUPAC'],
    ['Pd', 'atomicMass', 106.42, 0.01, 'IUPAC'],
    // Kittel Table 3.3 bulk moduli (from memory), 10^11 N/m² = 100 GPa
    ['Cu', 'bulkModulusGpa', 137, 1, 'Kittel Table 3.3'],
    ['Au', 'bulkModulusGpa', 173.2, 1, 'Kittel Table 3.3'],
    ['W', 'bulkModulusGpa', 323.2, 1, 'Kittel Table 3.3'],
    // de Boer et al. (1988) Miedema parameters (from memory)
    ['Ni', 'miedemaPhiStarV', 5.2, 0.005, 'de Boer'],
    ['Zr', 'miedemaNws13', 1.41, 0.005, 'de Boer'],
    ['Al', 'miedemaV23Cm2', 4.64, 0.005, 'de Boer'],
  ];
  it.each(cases)('%s %s ≈ %f (±%f, %s)', (symbol, property, expected, tolerance) => {
    expect(Math.abs(elementProperty(symbol, property) - expected)).toBeLessThanOrEqual(tolerance + 1e-12);
  });

  it('structures: fcc for the ten Cleri–Rosato metals, bcc for Fe Cr V Nb Mo Ta W, hcp for Ti Co Zn Zr Ru Cd Hf Re Os (Kittel ch.1)', () => {
    for (const s of ['Ni', 'Cu', 'Rh', 'Pd', 'Ag', 'Ir', 'Pt', 'Au', 'Al', 'Pb'])
      expect(getElement(s).cell.structure).toBe('fcc');
    for (const s of ['Fe', 'Cr', 'V', 'Nb', 'Mo', 'Ta', 'W']) expect(getElement(s).cell.structure).toBe('bcc');
    for (const s of ['Ti', 'Co', 'Zn', 'Zr', 'Ru', 'Cd', 'Hf', 'Re', 'Os'])
      expect(getElement(s).cell.structure).toBe('hcp');
  });
});
