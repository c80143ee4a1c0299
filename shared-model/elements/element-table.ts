/**
 * Element property table for the 30 metals of `symbols.ts` (DOMAIN.md "Element data").
 * One named source per column; `ELEMENT_COLUMN_SOURCES` says which, and whether the digits were recalled
 * ("from memory") rather than read from the source while writing. The reference tier
 * (test/reference/pymatgen-elements.test.ts) compares the columns pymatgen also tabulates.
 *
 * Units are in the property names. Nothing here is ever NaN: a missing value is `null`, and the
 * accessors throw a DomainError naming the element and the property instead of passing it on.
 */
import { invalid } from '../api/result';
import { METALS, isMetalSymbol, type MetalSymbol } from './symbols';

export type CrystalStructure = 'fcc' | 'bcc' | 'hcp' | 'tetragonal' | 'rhombohedral' | 'complex cubic';

/** Room-temperature crystal cell of the element's stable form (the numbers the lattice column comes from). */
export interface CrystalCell {
  structure: CrystalStructure;
  /** Conventional cell edge a, Å. */
  aAngstrom: number;
  /** Second edge c for hcp and tetragonal cells, Å. */
  cAngstrom?: number;
  /** Rhombohedral angle, degrees. */
  alphaDeg?: number;
  /** Atoms in the cell the edges describe. */
  atomsPerCell: number;
}

/** Miedema cell-model parameters (de Boer, Boom, Mattens, Miedema & Niessen, Cohesion in Metals, 1988). */
export interface MiedemaParameters {
  /** Electronegativity-like chemical potential φ*, volts. */
  phiStarV: number;
  /** Electron density at the Wigner–Seitz cell boundary, n_ws^(1/3), (density units)^(1/3). */
  nws13: number;
  /** Molar volume to the 2/3 power, cm². */
  v23Cm2: number;
  /** Counted as a transition metal for P and R (de Boer Fig. 2.28 grouping: Cu, Ag, Au count as transition). */
  transition: boolean;
  /** Element factor of the hybridization term; R/P of a transition–non-transition pair is the product. */
  hybridizationRtoP: number;
  /**
   * Valence used to pick the charge-transfer volume-correction coefficient a of the Miedema model
   * (1 → 0.14, 2 → 0.10, 3 → 0.07, Cu/Ag/Au → 0.07, all others 0.04; de Boer et al. 1988, from memory).
   */
  valence: number;
}

export interface ElementRecord {
  symbol: MetalSymbol;
  name: string;
  z: number;
  cell: CrystalCell;
  /** Cubic lattice constant a of the stable cell, Å (for hcp/tetragonal/rhombohedral/complex: the a edge). */
  latticeConstantAngstrom: number;
  cohesiveEnergyEv: number | null;
  /** Metallic radius for 12-fold coordination, Å. */
  metallicRadiusAngstrom: number | null;
  /** Mean surface energy of the solid, J/m². */
  surfaceEnergyJPerM2: number | null;
  /**
   * Second, independent surface energy: DFT value of the close-packed facet, J/m² (Vitos et al. 1998;
   * see `ELEMENT_COLUMN_SOURCES`). Used to judge whether a surface-energy difference is within the
   * scatter between sources; null where the recalled table has no value.
   */
  surfaceEnergyDftJPerM2: number | null;
  electronegativityPauling: number | null;
  bulkModulusGpa: number | null;
  shearModulusGpa: number | null;
  /** IUPAC standard atomic weight (abridged), g/mol. */
  atomicMass: number;
  miedema: MiedemaParameters | null;
  /** Oxidation states common in aqueous/polyol precursor chemistry, most used first. */
  oxidationStates: readonly number[];
}

/** The numeric properties callers may ask for by name. */
export type NumericElementProperty =
  | 'latticeConstantAngstrom'
  | 'cohesiveEnergyEv'
  | 'metallicRadiusAngstrom'
  | 'surfaceEnergyJPerM2'
  | 'surfaceEnergyDftJPerM2'
  | 'electronegativityPauling'
  | 'bulkModulusGpa'
  | 'shearModulusGpa'
  | 'atomicMass'
  | 'atomicVolumeAngstrom3'
  | 'fccEquivalentLatticeAngstrom'
  | 'miedemaPhiStarV'
  | 'miedemaNws13'
  | 'miedemaV23Cm2';

export const NUMERIC_ELEMENT_PROPERTIES: readonly NumericElementProperty[] = [
  'latticeConstantAngstrom',
  'cohesiveEnergyEv',
  'metallicRadiusAngstrom',
  'surfaceEnergyJPerM2',
  'surfaceEnergyDftJPerM2',
  'electronegativityPauling',
  'bulkModulusGpa',
  'shearModulusGpa',
  'atomicMass',
  'atomicVolumeAngstrom3',
  'fccEquivalentLatticeAngstrom',
  'miedemaPhiStarV',
  'miedemaNws13',
  'miedemaV23Cm2',
];

export interface ColumnSource {
  column: string;
  unit: string;
  source: string;
  /** True when the digits were recalled rather than read from the source while writing the table. */
  fromMemory: boolean;
  note?: string;
}

export const ELEMENT_COLUMN_SOURCES: readonly ColumnSource[] = [
  {
    column: 'cell / latticeConstantAngstrom',
    unit: 'Å',
    source:
      'Kittel, Introduction to Solid State Physics, 8th ed., ch. 1 table of crystal structures (room temperature); fcc values given to 4 figures as in the CRC Handbook lattice-constant table',
    fromMemory: true,
    note: 'Sn is white (β) tin, the form met at synthesis temperatures; Mn is α-Mn (58 atoms per cubic cell); Bi rhombohedral (2 atoms per cell).',
  },
  {
    column: 'cohesiveEnergyEv',
    unit: 'eV/atom',
    source: 'Kittel, ISSP 8th ed., Table 3.1 (cohesive energies, 0 K, 1 atm)',
    fromMemory: true,
  },
  {
    column: 'metallicRadiusAngstrom',
    unit: 'Å',
    source:
      'Teatum, Gschneidner & Waber (1968) 12-coordinate metallic radii as tabulated in Greenwood & Earnshaw, Chemistry of the Elements, 2nd ed.',
    fromMemory: true,
  },
  {
    column: 'surfaceEnergyJPerM2',
    unit: 'J/m²',
    source: 'Tyson & Miller, Surf. Sci. 62, 267 (1977): mean solid surface energy from liquid surface tension',
    fromMemory: true,
  },
  {
    column: 'surfaceEnergyDftJPerM2',
    unit: 'J/m²',
    source:
      'Vitos, Ruban, Skriver & Kollár, Surf. Sci. 411, 186 (1998): full-charge-density DFT (GGA) surface energy of the close-packed facet (fcc 111, hcp 0001, bcc 110)',
    fromMemory: true,
    note: 'a second, independent source for the surface energy (a facet value, not a mean); blank where not recalled',
  },
  {
    column: 'electronegativityPauling',
    unit: '',
    source: 'Pauling scale (Allred 1961 revision) as in the CRC Handbook',
    fromMemory: true,
  },
  {
    column: 'bulkModulusGpa',
    unit: 'GPa',
    source: 'Kittel, ISSP 8th ed., Table 3.3 (isothermal bulk modulus from elastic constants)',
    fromMemory: true,
    note: 'Sn: β-Sn value from its elastic constants (Kittel lists a different tin form).',
  },
  {
    column: 'shearModulusGpa',
    unit: 'GPa',
    source: 'polycrystalline (isotropic) shear modulus, CRC Handbook "Elastic constants" / Kaye & Laby tables',
    fromMemory: true,
  },
  {
    column: 'atomicMass',
    unit: 'g/mol',
    source: 'IUPAC standard atomic weights (2021 abridged/conventional values)',
    fromMemory: true,
  },
  {
    column: 'miedema (phiStarV, nws13, v23Cm2, hybridizationRtoP, transition)',
    unit: 'V, d.u.^1/3, cm²',
    source:
      'de Boer, Boom, Mattens, Miedema & Niessen, Cohesion in Metals (North-Holland, 1988), Table 2.1 and Fig. 2.28',
    fromMemory: true,
    note: 'checked by the Takeuchi & Inoue (2005) equiatomic mixing enthalpies in the tests',
  },
  {
    column: 'oxidationStates',
    unit: '',
    source: 'Greenwood & Earnshaw, Chemistry of the Elements, 2nd ed.: the states of common salt precursors',
    fromMemory: true,
  },
];

type Row = [
  symbol: MetalSymbol,
  cell: CrystalCell,
  latticeA: number,
  cohesiveEv: number,
  radiusA: number,
  gammaJm2: number,
  chi: number,
  bulkGpa: number,
  shearGpa: number,
  mass: number,
  miedema: [phi: number, nws13: number, v23: number, transition: 0 | 1, rToP: number, valence: number],
  oxidation: number[],
];

const fcc = (a: number): CrystalCell => ({ structure: 'fcc', aAngstrom: a, atomsPerCell: 4 });
const bcc = (a: number): CrystalCell => ({ structure: 'bcc', aAngstrom: a, atomsPerCell: 2 });
const hcp = (a: number, c: number): CrystalCell => ({ structure: 'hcp', aAngstrom: a, cAngstrom: c, atomsPerCell: 2 });

// prettier-ignore
const ROWS: Row[] = [
  //  sym   cell                                                         a       Ecoh   r12    γ      χ     B      G      mass         Miedema φ*, n1/3, V2/3, TM, R*/P, val   oxidation
  ['Al', fcc(4.0495),                                                   4.0495, 3.39, 1.43, 1.143, 1.61, 72.2,  26,   26.9815385, [4.20, 1.39, 4.64, 0, 1.9, 3],  [3]],
  ['Ti', hcp(2.95, 4.68),                                               2.95,   4.85, 1.47, 1.989, 1.54, 105.1, 44,   47.867,     [3.80, 1.52, 4.82, 1, 1.0, 4],  [4, 3]],
  ['V',  bcc(3.03),                                                     3.03,   5.31, 1.34, 2.555, 1.63, 161.9, 47,   50.9415,    [4.25, 1.64, 4.12, 1, 1.0, 5],  [5, 4, 3]],
  ['Cr', bcc(2.88),                                                     2.88,   4.10, 1.28, 2.354, 1.66, 190.1, 115,  51.9961,    [4.65, 1.73, 3.74, 1, 1.0, 6],  [3, 6]],
  ['Mn', { structure: 'complex cubic', aAngstrom: 8.91, atomsPerCell: 58 }, 8.91, 2.92, 1.27, 1.543, 1.55, 59.6,  79.5, 54.938044,  [4.45, 1.61, 3.78, 1, 1.0, 7],  [2, 4, 7]],
  ['Fe', bcc(2.87),                                                     2.87,   4.28, 1.26, 2.417, 1.83, 168.3, 82,   55.845,     [4.93, 1.77, 3.69, 1, 1.0, 8],  [3, 2]],
  ['Co', hcp(2.51, 4.07),                                               2.51,   4.39, 1.25, 2.522, 1.88, 191.4, 75,   58.933194,  [5.10, 1.75, 3.55, 1, 1.0, 9],  [2, 3]],
  ['Ni', fcc(3.5240),                                                   3.5240, 4.44, 1.24, 2.380, 1.91, 186,   76,   58.6934,    [5.20, 1.75, 3.52, 1, 1.0, 10], [2]],
  ['Cu', fcc(3.6149),                                                   3.6149, 3.49, 1.28, 1.790, 1.90, 137,   48,   63.546,     [4.45, 1.47, 3.70, 1, 0.3, 1], [2, 1]],
  ['Zn', hcp(2.66, 4.95),                                               2.66,   1.35, 1.34, 0.993, 1.65, 59.8,  43,   65.38,      [4.10, 1.32, 4.38, 0, 1.4, 2], [2]],
  ['Zr', hcp(3.23, 5.15),                                               3.23,   6.25, 1.60, 1.909, 1.33, 83.3,  33,   91.224,     [3.45, 1.41, 5.81, 1, 1.0, 4],  [4]],
  ['Nb', bcc(3.30),                                                     3.30,   7.57, 1.46, 2.655, 1.60, 170.2, 38,   92.90637,   [4.05, 1.64, 4.89, 1, 1.0, 5],  [5]],
  ['Mo', bcc(3.15),                                                     3.15,   6.82, 1.39, 2.907, 2.16, 272.5, 126,  95.95,      [4.65, 1.77, 4.45, 1, 1.0, 6],  [6, 4]],
  ['Ru', hcp(2.71, 4.28),                                               2.71,   6.74, 1.34, 3.043, 2.20, 320.8, 173,  101.07,     [5.40, 1.83, 4.06, 1, 1.0, 8],  [3, 4]],
  ['Rh', fcc(3.8034),                                                   3.8034, 5.75, 1.34, 2.659, 2.28, 270.4, 150,  102.90550,  [5.40, 1.76, 4.10, 1, 1.0, 9],  [3]],
  ['Pd', fcc(3.8907),                                                   3.8907, 3.89, 1.37, 2.003, 2.20, 180.8, 44,   106.42,     [5.45, 1.67, 4.29, 1, 1.0, 10], [2, 4]],
  ['Ag', fcc(4.0853),                                                   4.0853, 2.95, 1.44, 1.246, 1.93, 100.7, 30,   107.8682,   [4.35, 1.36, 4.72, 1, 0.15, 1], [1]],
  ['Cd', hcp(2.98, 5.62),                                               2.98,   1.16, 1.51, 0.762, 1.69, 46.7,  19,   112.414,    [4.05, 1.24, 5.53, 0, 1.4, 2], [2]],
  ['In', { structure: 'tetragonal', aAngstrom: 3.25, cAngstrom: 4.95, atomsPerCell: 2 }, 3.25, 2.52, 1.67, 0.675, 1.78, 41.1, 3.7, 114.818, [3.90, 1.17, 6.28, 0, 1.9, 3], [3]],
  ['Sn', { structure: 'tetragonal', aAngstrom: 5.83, cAngstrom: 3.18, atomsPerCell: 4 }, 5.83, 3.14, 1.58, 0.709, 1.96, 58,   18,  118.710, [4.15, 1.24, 6.43, 0, 2.1, 4], [2, 4]],
  ['Hf', hcp(3.19, 5.05),                                               3.19,   6.44, 1.59, 2.193, 1.30, 109,   30,   178.49,     [3.60, 1.45, 5.65, 1, 1.0, 4],  [4]],
  ['Ta', bcc(3.30),                                                     3.30,   8.10, 1.46, 2.902, 1.50, 200,   69,   180.94788,  [4.05, 1.63, 4.89, 1, 1.0, 5],  [5]],
  ['W',  bcc(3.16),                                                     3.16,   8.90, 1.39, 3.265, 2.36, 323.2, 161,  183.84,     [4.80, 1.81, 4.50, 1, 1.0, 6],  [6]],
  ['Re', hcp(2.76, 4.46),                                               2.76,   8.03, 1.37, 3.109, 1.90, 372,   178,  186.207,    [5.20, 1.85, 4.28, 1, 1.0, 7],  [7, 4]],
  ['Os', hcp(2.74, 4.32),                                               2.74,   8.17, 1.35, 3.439, 2.20, 418,   222,  190.23,     [5.40, 1.85, 4.15, 1, 1.0, 8],  [4, 8]],
  ['Ir', fcc(3.8390),                                                   3.8390, 6.94, 1.36, 3.048, 2.20, 355,   210,  192.217,    [5.55, 1.83, 4.17, 1, 1.0, 9],  [3, 4]],
  ['Pt', fcc(3.9242),                                                   3.9242, 5.84, 1.39, 2.489, 2.28, 278.3, 61,   195.084,    [5.65, 1.78, 4.36, 1, 1.0, 10], [4, 2]],
  ['Au', fcc(4.0782),                                                   4.0782, 3.81, 1.44, 1.506, 2.54, 173.2, 27,   196.966569, [5.15, 1.57, 4.70, 1, 0.3, 1], [3, 1]],
  ['Pb', fcc(4.9508),                                                   4.9508, 2.03, 1.75, 0.593, 2.33, 43.0,  5.6,  207.2,      [4.10, 1.15, 6.94, 0, 2.1, 4],  [2]],
  ['Bi', { structure: 'rhombohedral', aAngstrom: 4.75, alphaDeg: 57.23, atomsPerCell: 2 }, 4.75, 2.18, 1.82, 0.537, 2.02, 31.5, 12, 208.98040, [4.15, 1.16, 7.20, 0, 2.3, 5], [3]],
];

/** Vitos et al. (1998) close-packed-facet surface energies, J/m² (from memory; see ELEMENT_COLUMN_SOURCES). */
// prettier-ignore
const SURFACE_ENERGY_DFT_J_PER_M2: Partial<Record<MetalSymbol, number>> = {
  Al: 1.199, Ti: 2.632, V: 3.258, Cr: 3.979, Fe: 2.430, Co: 2.775, Ni: 2.011, Cu: 1.952, Zn: 0.989, Zr: 2.260,
  Nb: 2.686, Mo: 3.454, Ru: 3.928, Rh: 2.472, Pd: 1.920, Ag: 1.172, Cd: 0.592, Hf: 2.471, Ta: 3.084, W: 4.005,
  Re: 4.214, Os: 4.566, Ir: 2.971, Pt: 2.299, Au: 1.283,
};

function buildRecord(row: Row): ElementRecord {
  const [symbol, cell, latticeA, cohesiveEv, radiusA, gammaJm2, chi, bulkGpa, shearGpa, mass, m, oxidation] = row;
  const meta = METALS.find((metal) => metal.symbol === symbol);
  if (!meta) throw new Error(`element table row for ${symbol} has no entry in symbols.ts`);
  return Object.freeze({
    symbol,
    name: meta.name,
    z: meta.z,
    cell: Object.freeze(cell),
    latticeConstantAngstrom: latticeA,
    cohesiveEnergyEv: cohesiveEv,
    metallicRadiusAngstrom: radiusA,
    surfaceEnergyJPerM2: gammaJm2,
    surfaceEnergyDftJPerM2: SURFACE_ENERGY_DFT_J_PER_M2[symbol] ?? null,
    electronegativityPauling: chi,
    bulkModulusGpa: bulkGpa,
    shearModulusGpa: shearGpa,
    atomicMass: mass,
    miedema: Object.freeze({
      phiStarV: m[0],
      nws13: m[1],
      v23Cm2: m[2],
      transition: m[3] === 1,
      hybridizationRtoP: m[4],
      valence: m[5],
    }),
    oxidationStates: Object.freeze([...oxidation]),
  });
}

/** The table, keyed by symbol, in atomic-number order. */
export const ELEMENT_TABLE: Readonly<Record<MetalSymbol, ElementRecord>> = Object.freeze(
  Object.fromEntries(ROWS.map((row) => [row[0], buildRecord(row)])) as Record<MetalSymbol, ElementRecord>,
);

export const ELEMENT_RECORDS: readonly ElementRecord[] = Object.freeze(ROWS.map((row) => ELEMENT_TABLE[row[0]]));

/** Volume per atom of a crystal cell, Å³ (derived from the cell edges; no further data). */
export function cellAtomicVolumeAngstrom3(cell: CrystalCell): number {
  const a = cell.aAngstrom;
  let cellVolume: number;
  switch (cell.structure) {
    case 'fcc':
    case 'bcc':
    case 'complex cubic':
      cellVolume = a ** 3;
      break;
    case 'hcp':
      cellVolume = (Math.sqrt(3) / 2) * a * a * (cell.cAngstrom ?? Number.NaN);
      break;
    case 'tetragonal':
      cellVolume = a * a * (cell.cAngstrom ?? Number.NaN);
      break;
    case 'rhombohedral': {
      const cosAlpha = Math.cos(((cell.alphaDeg ?? Number.NaN) * Math.PI) / 180);
      cellVolume = a ** 3 * Math.sqrt(1 - 3 * cosAlpha ** 2 + 2 * cosAlpha ** 3);
      break;
    }
  }
  const volume = cellVolume / cell.atomsPerCell;
  if (!Number.isFinite(volume) || volume <= 0)
    throw new Error(`crystal cell ${JSON.stringify(cell)} lacks an edge or angle`);
  return volume;
}

function unknownSymbol(symbol: unknown, field: string) {
  return invalid(field, `unknown element "${String(symbol)}"; known metals: ${ROWS.map((row) => row[0]).join(' ')}`);
}

/** The element's record; throws a DomainError (invalid_input, field `element`) for an unknown symbol. */
export function getElement(symbol: string, field = 'element'): ElementRecord {
  if (typeof symbol !== 'string' || !isMetalSymbol(symbol)) throw unknownSymbol(symbol, field);
  return ELEMENT_TABLE[symbol];
}

/**
 * Reads one numeric property of a record, or throws a DomainError naming the element and the property when
 * the table has no value (never returns NaN or null).
 */
export function recordProperty(record: ElementRecord, property: NumericElementProperty): number {
  let value: number | null | undefined;
  switch (property) {
    case 'atomicVolumeAngstrom3':
      value = cellAtomicVolumeAngstrom3(record.cell);
      break;
    case 'fccEquivalentLatticeAngstrom':
      value =
        record.cell.structure === 'fcc'
          ? record.latticeConstantAngstrom
          : Math.cbrt(4 * cellAtomicVolumeAngstrom3(record.cell));
      break;
    case 'miedemaPhiStarV':
      value = record.miedema?.phiStarV;
      break;
    case 'miedemaNws13':
      value = record.miedema?.nws13;
      break;
    case 'miedemaV23Cm2':
      value = record.miedema?.v23Cm2;
      break;
    default:
      if (!(NUMERIC_ELEMENT_PROPERTIES as readonly string[]).includes(property)) {
        throw invalid(
          'property',
          `unknown element property "${String(property)}"; known: ${NUMERIC_ELEMENT_PROPERTIES.join(', ')}`,
        );
      }
      value = record[property];
  }
  if (value === null || value === undefined || !Number.isFinite(value)) {
    throw invalid('element', `the element table has no ${property} for ${record.symbol}`);
  }
  return value;
}

/** `elementProperty('Pt', 'surfaceEnergyJPerM2')` → 2.489. Throws for an unknown symbol or a missing value. */
export function elementProperty(symbol: string, property: NumericElementProperty): number {
  return recordProperty(getElement(symbol), property);
}

/** The element's Miedema parameters, or a DomainError naming the element when the table has none. */
export function miedemaParameters(symbol: string): MiedemaParameters {
  const record = getElement(symbol);
  if (!record.miedema) throw invalid('element', `the element table has no Miedema parameters for ${record.symbol}`);
  return record.miedema;
}

/**
 * Lattice constant to use when the element sits on an fcc lattice, in nm: the measured a for fcc metals;
 * for the others the edge of the fcc cell with the same volume per atom as the element's own crystal,
 * (4·Ω)^(1/3). Use `isFccElement` to flag the second case.
 */
export function latticeConstantNm(symbol: string): number {
  return elementProperty(symbol, 'fccEquivalentLatticeAngstrom') / 10;
}

export function isFccElement(symbol: string): boolean {
  return getElement(symbol).cell.structure === 'fcc';
}
