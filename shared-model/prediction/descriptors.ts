/**
 * Pair descriptors (DOMAIN.md Models 1): signed relative differences of element properties, B relative to
 * A, δp = (p_B − p_A)/((p_A + p_B)/2), plus the Miedema mixing enthalpy at the chosen composition.
 */
import { getElement, recordProperty, type NumericElementProperty } from '../elements/element-table';
import { invalid } from '../api/result';
import { miedemaMixingEnthalpy, type MiedemaState } from './miedema';

export const DESCRIPTOR_KEYS = [
  'cohesiveEnergy',
  'metallicRadius',
  'surfaceEnergy',
  'electronegativity',
  'bulkModulus',
  'shearModulus',
  'latticeConstant',
  'mixingEnthalpyKjPerMol',
  'mixingChemicalKjPerMol',
  'mixingElasticKjPerMol',
] as const;
export type DescriptorKey = (typeof DESCRIPTOR_KEYS)[number];

export const DESCRIPTOR_LABELS: Readonly<Record<DescriptorKey, string>> = {
  cohesiveEnergy: 'relative difference of cohesive energy (B vs A)',
  metallicRadius: 'relative difference of metallic radius (B vs A)',
  surfaceEnergy: 'relative difference of surface energy (B vs A)',
  electronegativity: 'relative difference of Pauling electronegativity (B vs A)',
  bulkModulus: 'relative difference of bulk modulus (B vs A)',
  shearModulus: 'relative difference of shear modulus (B vs A)',
  latticeConstant: 'relative difference of (fcc-equivalent) lattice constant (B vs A)',
  mixingEnthalpyKjPerMol: 'Miedema mixing enthalpy of the solid solution, kJ/mol',
  mixingChemicalKjPerMol: 'Miedema chemical part, kJ/mol',
  mixingElasticKjPerMol: 'Miedema elastic part, kJ/mol',
};

export type PairDescriptors = Record<DescriptorKey, number>;

const RELATIVE: ReadonlyArray<[DescriptorKey, NumericElementProperty]> = [
  ['cohesiveEnergy', 'cohesiveEnergyEv'],
  ['metallicRadius', 'metallicRadiusAngstrom'],
  ['surfaceEnergy', 'surfaceEnergyJPerM2'],
  ['electronegativity', 'electronegativityPauling'],
  ['bulkModulus', 'bulkModulusGpa'],
  ['shearModulus', 'shearModulusGpa'],
  ['latticeConstant', 'fccEquivalentLatticeAngstrom'],
];

export function relativeDifference(a: number, b: number): number {
  return (b - a) / ((a + b) / 2);
}

export function pairDescriptors(
  elementA: string,
  elementB: string,
  xB = 0.5,
  state: MiedemaState = 'solid',
): PairDescriptors {
  const a = getElement(elementA, 'elementA');
  const b = getElement(elementB, 'elementB');
  if (a.symbol === b.symbol)
    throw invalid('elementB', `a pair needs two different elements, got ${a.symbol}-${b.symbol}`);
  const out = {} as PairDescriptors;
  for (const [key, property] of RELATIVE)
    out[key] = relativeDifference(recordProperty(a, property), recordProperty(b, property));
  const mixing = miedemaMixingEnthalpy(a.symbol, b.symbol, xB, state);
  out.mixingEnthalpyKjPerMol = mixing.totalKjPerMol;
  out.mixingChemicalKjPerMol = mixing.chemicalKjPerMol;
  out.mixingElasticKjPerMol = mixing.elasticKjPerMol;
  return out;
}
