/**
 * Electrons a reducer gives per formula unit, with the half-reaction assumed (DOMAIN.md Models 6).
 * Real reducers may go further (glycolaldehyde → glycolic acid → oxalate; formate → CO2) or less far
 * (borohydride lost to hydrolysis); the chemist's excess factor covers that. The numbers below are the
 * first, usual oxidation step — written out so the assumption is visible.
 */
export interface ReducerHalfReaction {
  id: string;
  /** Electrons given per formula unit of the reagent as dispensed. */
  electrons: number;
  halfReaction: string;
  note: string;
}

export const REDUCER_HALF_REACTIONS: Readonly<Record<string, ReducerHalfReaction>> = Object.freeze({
  borohydride: {
    id: 'borohydride',
    electrons: 8,
    halfReaction: 'BH4⁻ + 8 OH⁻ → B(OH)4⁻ + 4 H2O + 8 e⁻',
    note: 'all four B–H hydrides used (boron stays B(III), each H⁻ → H⁺ gives 2 e⁻); competing hydrolysis wastes part of it',
  },
  ascorbate: {
    id: 'ascorbate',
    electrons: 2,
    halfReaction: 'C6H8O6 → C6H6O6 + 2 H⁺ + 2 e⁻',
    note: 'ascorbic acid to dehydroascorbic acid',
  },
  hydrazine: {
    id: 'hydrazine',
    electrons: 4,
    halfReaction: 'N2H4 → N2 + 4 H⁺ + 4 e⁻',
    note: 'per N2H4 (hydrazine hydrate N2H4·H2O gives the same 4 e⁻ per formula unit); in base N2H4 + 4 OH⁻ → N2 + 4 H2O + 4 e⁻',
  },
  'ethylene-glycol': {
    id: 'ethylene-glycol',
    electrons: 2,
    halfReaction: 'HOCH2CH2OH → HOCH2CHO + 2 H⁺ + 2 e⁻',
    note: 'ethylene glycol to glycolaldehyde, the first step assumed in the polyol process; further oxidation would give more',
  },
  formaldehyde: {
    id: 'formaldehyde',
    electrons: 2,
    halfReaction: 'HCHO + H2O → HCOOH + 2 H⁺ + 2 e⁻',
    note: 'formaldehyde to formic acid (in base HCHO + 3 OH⁻ → HCOO⁻ + 2 H2O + 2 e⁻)',
  },
  oleylamine: {
    id: 'oleylamine',
    electrons: 2,
    halfReaction: 'RCH2NH2 → RCH=NH + 2 H⁺ + 2 e⁻',
    note: 'primary amine to imine, the usual assumption; oleylamine is mostly solvent and ligand, its reducing role is weak',
  },
  'borane-amine': {
    id: 'borane-amine',
    electrons: 6,
    halfReaction: 'R-NH2·BH3 + 3 H2O → R-NH2 + B(OH)3 + 6 H⁺ + 6 e⁻',
    note: 'three B–H hydrides, 2 e⁻ each (borane–tert-butylamine, borane–morpholine and similar adducts)',
  },
  citrate: {
    id: 'citrate',
    electrons: 2,
    halfReaction: 'C6H5O7³⁻ → C5H4O5²⁻ + CO2 + H⁺ + 2 e⁻',
    note: 'citrate to acetonedicarboxylate (Turkevich route); per trisodium citrate formula unit',
  },
  diol: {
    id: 'diol',
    electrons: 2,
    halfReaction: 'RCH(OH)CH2OH → RCH(OH)CHO + 2 H⁺ + 2 e⁻',
    note: 'long-chain 1,2-diol (e.g. 1,2-hexadecanediol) to the hydroxy aldehyde, as for ethylene glycol',
  },
});

export function reducerHalfReaction(id: string): ReducerHalfReaction | undefined {
  return REDUCER_HALF_REACTIONS[id];
}
