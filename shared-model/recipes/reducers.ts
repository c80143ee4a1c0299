/**
 * Electrons a reducer gives per formula unit, with the half-reaction assumed (DOMAIN.md Models 6).
 * Real reducers may go further (glycolaldehyde → glycolic acid → oxalate; formate → CO2) or less far
 * (borohydride lost to hydrolysis); the chemist's excess factor covers that. The numbers below are the
 * first, usual oxidation step — written out so the assumption is visible — and, per reducer, the excess over the
 * electron balance assumed when the user gives none (common practice, with the reason).
 */
export interface ReducerHalfReaction {
  id: string;
  /** Electrons given per formula unit of the reagent as dispensed. */
  electrons: number;
  halfReaction: string;
  note: string;
  /** Excess over the electron balance assumed when the user gives none (common practice; `excessPractice` says why). */
  defaultExcess: number;
  excessPractice: string;
}

export const REDUCER_HALF_REACTIONS: Readonly<Record<string, ReducerHalfReaction>> = Object.freeze({
  borohydride: {
    id: 'borohydride',
    electrons: 8,
    halfReaction: 'BH4⁻ + 8 OH⁻ → B(OH)4⁻ + 4 H2O + 8 e⁻',
    note: 'all four B–H hydrides used (boron stays B(III), each H⁻ → H⁺ gives 2 e⁻); competing hydrolysis wastes part of it',
    defaultExcess: 5,
    excessPractice:
      'borohydride hydrolyses in water while it reduces (BH4⁻ + 2 H2O → BO2⁻ + 4 H2), so a several-fold excess over the electron balance is the norm; made fresh and ice-cold (common practice)',
  },
  ascorbate: {
    id: 'ascorbate',
    electrons: 2,
    halfReaction: 'C6H8O6 → C6H6O6 + 2 H⁺ + 2 e⁻',
    note: 'ascorbic acid to dehydroascorbic acid',
    defaultExcess: 1.5,
    excessPractice:
      'a modest excess is usual; much more speeds reduction and, in seeded growth, favours new nuclei over growth on the seeds (common practice)',
  },
  hydrazine: {
    id: 'hydrazine',
    electrons: 4,
    halfReaction: 'N2H4 → N2 + 4 H⁺ + 4 e⁻',
    note: 'per N2H4 (hydrazine hydrate N2H4·H2O gives the same 4 e⁻ per formula unit); in base N2H4 + 4 OH⁻ → N2 + 4 H2O + 4 e⁻',
    defaultExcess: 3,
    excessPractice:
      'a few-fold excess is usual: part of the hydrazine decomposes to N2 and NH3 instead of reducing (common practice)',
  },
  'ethylene-glycol': {
    id: 'ethylene-glycol',
    electrons: 2,
    halfReaction: 'HOCH2CH2OH → HOCH2CHO + 2 H⁺ + 2 e⁻',
    note: 'ethylene glycol to glycolaldehyde, the first step assumed in the polyol process; further oxidation would give more',
    defaultExcess: 10,
    excessPractice:
      'in the polyol process the glycol is the solvent, in a large excess; dosed as a reagent, a tenfold excess is assumed (common practice)',
  },
  formaldehyde: {
    id: 'formaldehyde',
    electrons: 2,
    halfReaction: 'HCHO + H2O → HCOOH + 2 H⁺ + 2 e⁻',
    note: 'formaldehyde to formic acid (in base HCHO + 3 OH⁻ → HCOO⁻ + 2 H2O + 2 e⁻)',
    defaultExcess: 2,
    excessPractice: 'a twofold excess is usual (common practice)',
  },
  oleylamine: {
    id: 'oleylamine',
    electrons: 2,
    halfReaction: 'RCH2NH2 → RCH=NH + 2 H⁺ + 2 e⁻',
    note: 'primary amine to imine, the usual assumption; oleylamine is mostly solvent and ligand, its reducing role is weak',
    defaultExcess: 10,
    excessPractice:
      'oleylamine is a weak reducer, mostly used as the solvent, i.e. in a large excess; dosed as a reagent, a tenfold excess is assumed (common practice)',
  },
  'borane-amine': {
    id: 'borane-amine',
    electrons: 6,
    halfReaction: 'R-NH2·BH3 + 3 H2O → R-NH2 + B(OH)3 + 6 H⁺ + 6 e⁻',
    note: 'three B–H hydrides, 2 e⁻ each (borane–tert-butylamine, borane–morpholine and similar adducts)',
    defaultExcess: 3,
    excessPractice: 'a few-fold excess is usual for borane–amine adducts in organic solvents (common practice)',
  },
  citrate: {
    id: 'citrate',
    electrons: 2,
    halfReaction: 'C6H5O7³⁻ → C5H4O5²⁻ + CO2 + H⁺ + 2 e⁻',
    note: 'citrate to acetonedicarboxylate (Turkevich route); per trisodium citrate formula unit',
    defaultExcess: 2.5,
    excessPractice:
      'citrate reduces and caps: Turkevich-type syntheses use about 3.5 citrate per Au(III), about 2.3 times the electron balance (Turkevich 1951, Frens 1973; from memory); 2.5× assumed (common practice)',
  },
  diol: {
    id: 'diol',
    electrons: 2,
    halfReaction: 'RCH(OH)CH2OH → RCH(OH)CHO + 2 H⁺ + 2 e⁻',
    note: 'long-chain 1,2-diol (e.g. 1,2-hexadecanediol) to the hydroxy aldehyde, as for ethylene glycol',
    defaultExcess: 3,
    excessPractice:
      '1,2-diols are dosed at about 3 mol per mol of M(II) precursor, 3 times the electron balance (e.g. Sun et al., Science 2000, FePt; from memory) (common practice)',
  },
});

export function reducerHalfReaction(id: string): ReducerHalfReaction | undefined {
  return REDUCER_HALF_REACTIONS[id];
}

/** Used when a reducer's half-reaction is not in the table: the bare electron balance, said so. */
export const UNKNOWN_REDUCER_EXCESS = 1;

/** The excess assumed for a reducer when the user gives none, and why (never a silent 1×). */
export function defaultReducerExcess(
  halfReactionId: string | null | undefined,
  reducerName: string,
): { excess: number; practice: string } {
  const known = halfReactionId ? REDUCER_HALF_REACTIONS[halfReactionId] : undefined;
  if (known) return { excess: known.defaultExcess, practice: known.excessPractice };
  return {
    excess: UNKNOWN_REDUCER_EXCESS,
    practice: `no common-practice excess is known for ${reducerName}: the bare electron balance (1×) is assumed; type the excess you use`,
  };
}
