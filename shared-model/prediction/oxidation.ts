/**
 * Will the surface metal be an oxide in air or water? From the standard enthalpy of formation of the
 * element's most common oxide, per O atom: ΔfH°(oxide)/n_O at 298.15 K, kJ per mol O.
 *
 * Values: CRC Handbook of Chemistry and Physics, "Standard Thermodynamic Properties of Chemical
 * Substances" (which takes most oxides from the NIST-JANAF tables), from memory.
 * Rule (common practice, a threshold placed between the oxides that do and do not form on metal
 * nanoparticles kept in air at room temperature): ΔfH°/O below −150 kJ/mol → the surface oxidises
 * ("expect a metal core with an oxide shell"); between −150 and −60 kJ/mol → a surface oxide forms only
 * in oxygen at raised temperature (Pd, Rh, Ir, Pt); above −60 kJ/mol → stays metallic (Ag, Au; silver
 * tarnishes slowly to the sulfide instead).
 */
export interface OxideEntry {
  oxide: string;
  /** ΔfH° of the oxide, kJ/mol of formula units. */
  formationKjPerMol: number;
  oxygenAtoms: number;
}

// prettier-ignore
export const OXIDE_TABLE: Readonly<Record<string, OxideEntry>> = {
  Al: { oxide: 'Al₂O₃', formationKjPerMol: -1675.7, oxygenAtoms: 3 },
  Ti: { oxide: 'TiO₂', formationKjPerMol: -944.0, oxygenAtoms: 2 },
  V: { oxide: 'V₂O₃', formationKjPerMol: -1218.8, oxygenAtoms: 3 },
  Cr: { oxide: 'Cr₂O₃', formationKjPerMol: -1139.7, oxygenAtoms: 3 },
  Mn: { oxide: 'MnO', formationKjPerMol: -385.2, oxygenAtoms: 1 },
  Fe: { oxide: 'Fe₃O₄', formationKjPerMol: -1118.4, oxygenAtoms: 4 },
  Co: { oxide: 'CoO', formationKjPerMol: -237.9, oxygenAtoms: 1 },
  Ni: { oxide: 'NiO', formationKjPerMol: -239.7, oxygenAtoms: 1 },
  Cu: { oxide: 'Cu₂O', formationKjPerMol: -168.6, oxygenAtoms: 1 },
  Zn: { oxide: 'ZnO', formationKjPerMol: -350.5, oxygenAtoms: 1 },
  Zr: { oxide: 'ZrO₂', formationKjPerMol: -1100.6, oxygenAtoms: 2 },
  Nb: { oxide: 'Nb₂O₅', formationKjPerMol: -1899.5, oxygenAtoms: 5 },
  Mo: { oxide: 'MoO₂', formationKjPerMol: -588.9, oxygenAtoms: 2 },
  Ru: { oxide: 'RuO₂', formationKjPerMol: -305.0, oxygenAtoms: 2 },
  Rh: { oxide: 'Rh₂O₃', formationKjPerMol: -343.0, oxygenAtoms: 3 },
  Pd: { oxide: 'PdO', formationKjPerMol: -85.4, oxygenAtoms: 1 },
  Ag: { oxide: 'Ag₂O', formationKjPerMol: -31.1, oxygenAtoms: 1 },
  Cd: { oxide: 'CdO', formationKjPerMol: -258.4, oxygenAtoms: 1 },
  In: { oxide: 'In₂O₃', formationKjPerMol: -925.8, oxygenAtoms: 3 },
  Sn: { oxide: 'SnO₂', formationKjPerMol: -577.6, oxygenAtoms: 2 },
  Hf: { oxide: 'HfO₂', formationKjPerMol: -1144.7, oxygenAtoms: 2 },
  Ta: { oxide: 'Ta₂O₅', formationKjPerMol: -2046.0, oxygenAtoms: 5 },
  W: { oxide: 'WO₃', formationKjPerMol: -842.9, oxygenAtoms: 3 },
  Re: { oxide: 'ReO₂', formationKjPerMol: -449.0, oxygenAtoms: 2 },
  Os: { oxide: 'OsO₂', formationKjPerMol: -294.8, oxygenAtoms: 2 },
  Ir: { oxide: 'IrO₂', formationKjPerMol: -274.1, oxygenAtoms: 2 },
  Pt: { oxide: 'PtO₂', formationKjPerMol: -80.0, oxygenAtoms: 2 },
  Au: { oxide: 'Au₂O₃', formationKjPerMol: 80.8, oxygenAtoms: 3 },
  Pb: { oxide: 'PbO', formationKjPerMol: -219.0, oxygenAtoms: 1 },
  Bi: { oxide: 'Bi₂O₃', formationKjPerMol: -573.9, oxygenAtoms: 3 },
};

export const OXIDE_SOURCE =
  'CRC Handbook, Standard Thermodynamic Properties of Chemical Substances (NIST-JANAF oxides), from memory';
/** Below this ΔfH° per O atom (kJ/mol) the surface oxidises in air or water (common practice). */
export const OXIDISES_IN_AIR_KJ_PER_MOL_O = -150;
/** Below this (and above the previous) a surface oxide forms only in O₂ at raised temperature. */
export const OXIDISES_HOT_KJ_PER_MOL_O = -60;

export type OxidationVerdict = 'oxidises in air' | 'oxidises only hot in O₂' | 'stays metallic';

export interface ElementOxidation {
  element: string;
  oxide: string;
  formationKjPerMolO: number;
  verdict: OxidationVerdict;
}

export function elementOxidation(symbol: string): ElementOxidation | null {
  const entry = OXIDE_TABLE[symbol];
  if (entry === undefined) return null;
  const perO = entry.formationKjPerMol / entry.oxygenAtoms;
  const verdict: OxidationVerdict =
    perO < OXIDISES_IN_AIR_KJ_PER_MOL_O
      ? 'oxidises in air'
      : perO < OXIDISES_HOT_KJ_PER_MOL_O
        ? 'oxidises only hot in O₂'
        : 'stays metallic';
  return { element: symbol, oxide: entry.oxide, formationKjPerMolO: perO, verdict };
}

export interface PairOxidation {
  elements: ElementOxidation[];
  /** Elements whose surface will be an oxide in air or water. */
  oxidisingInAir: string[];
  /** One sentence for the surface element (or both when neither is enriched), empty when nothing oxidises. */
  summary: string;
}

/** Oxidation outlook of a pair in air/water, with the element predicted at the surface named first. */
export function pairOxidation(elementA: string, elementB: string, surfaceElement: string | null): PairOxidation {
  const elements = [elementOxidation(elementA), elementOxidation(elementB)].filter(
    (e): e is ElementOxidation => e !== null,
  );
  const oxidisingInAir = elements.filter((e) => e.verdict === 'oxidises in air').map((e) => e.element);
  let summary = '';
  const shell = elements.find((e) => e.element === surfaceElement);
  if (shell !== undefined && shell.verdict === 'oxidises in air') {
    summary = `in air or water the ${shell.element} shell will be an oxide (${shell.oxide}, ΔfH° ${shell.formationKjPerMolO.toFixed(0)} kJ per mol O): expect a metal core with an oxide shell`;
  } else if (oxidisingInAir.length > 0) {
    const list = elements
      .filter((e) => e.verdict === 'oxidises in air')
      .map((e) => `${e.element} → ${e.oxide}`)
      .join(', ');
    summary = `in air or water exposed ${oxidisingInAir.join(' and ')} will oxidise (${list})`;
  }
  return { elements, oxidisingInAir, summary };
}
