/**
 * The gas or ligand around a particle, and the adsorbate-induced segregation it causes.
 *
 * Model (stated): a surface site carries at most θ_sat adsorbates per surface metal atom. The coverage is
 * the Langmuir isotherm of the element that binds the adsorbate more strongly (it is the one drawn out):
 *   molecular (CO):        θ/θ_sat = Kp / (1 + Kp)
 *   dissociative (H₂, O₂): θ/θ_sat = √(Kp) / (1 + √(Kp))
 *   K = exp(−ΔG/kT), ΔG = n·E_ads + T·S°_gas per molecule (n = 2 atoms for H₂ and O₂, 1 for CO),
 * p in bar against the 1 bar standard state; the adsorbate keeps none of the gas entropy (immobile
 * adsorbate, common practice; S°_gas at 298.15 K from the NIST-JANAF tables, from memory: H₂ 130.68,
 * CO 197.66, O₂ 205.15 J mol⁻¹ K⁻¹). A strongly binding ligand (thiolate, amine) is taken as bound at
 * its saturation coverage (ligand in excess in solution), not in equilibrium with a gas.
 * Each covered site gains θ·E_ads, so exchanging a surface A with a core B changes the segregation
 * enthalpy of B by ΔH_ads = θ·(E_ads,B − E_ads,A): negative when B binds more strongly (B drawn out).
 *
 * Adsorption energies (eV per adsorbate, close-packed facet, DFT at low coverage; all from memory and
 * rounded to 0.1 eV):
 *  - H relative to ½ H₂: Nørskov et al., J. Electrochem. Soc. 152, J23 (2005) (their ΔG_H minus 0.24 eV);
 *  - CO relative to CO(g): Abild-Pedersen & Andersson, Surf. Sci. 601, 1747 (2007) (RPBE-level values);
 *  - O relative to ½ O₂: Nørskov et al., J. Phys. Chem. B 108, 17886 (2004) (ΔE_O relative to water,
 *    shifted by the water formation energy to the O₂ reference);
 *  - thiolate (CH₃S) relative to the radical: order-of-magnitude values as collected in the review of
 *    Love, Estroff, Kriebel, Nuzzo & Whitesides, Chem. Rev. 105, 1103 (2005); rough, trust the order.
 * An element without a value gets no adsorbate term, and the prediction says so.
 * Saturation coverages (from memory): H 1 ML, CO 0.5 ML (c(4×2) on Pt(111) and Pd(111)), O 0.25 ML
 * (p(2×2)-O on Pt(111)), thiolate 1/3 ML ((√3×√3)R30° on Au(111), Love et al. 2005).
 */
import { BOLTZMANN_EV_PER_K, KJ_PER_MOL_PER_EV } from './segregation';

export const ENVIRONMENTS = ['vacuum', 'H2', 'CO', 'O2', 'ligand'] as const;
export type Environment = (typeof ENVIRONMENTS)[number];

export const ENVIRONMENT_LABELS: Readonly<Record<Environment, string>> = {
  vacuum: 'vacuum / inert',
  H2: 'H₂',
  CO: 'CO',
  O2: 'O₂ / air',
  ligand: 'ligand (thiol, amine)',
};

export type Adsorbate = 'H' | 'CO' | 'O' | 'SR';

interface AdsorbateSpec {
  adsorbate: Adsorbate;
  /** Atoms adsorbed per gas molecule (2 for dissociative adsorption), 0 for a bound ligand. */
  atomsPerMolecule: number;
  /** Standard molar entropy of the gas at 298.15 K, J mol⁻¹ K⁻¹ (NIST-JANAF, from memory). */
  gasEntropyJPerMolK: number;
  /** Adsorbates per surface metal atom at saturation. */
  saturationCoverage: number;
  source: string;
}

const ADSORBATES: Readonly<Record<Exclude<Environment, 'vacuum'>, AdsorbateSpec>> = {
  H2: {
    adsorbate: 'H',
    atomsPerMolecule: 2,
    gasEntropyJPerMolK: 130.68,
    saturationCoverage: 1,
    source: 'Nørskov et al., J. Electrochem. Soc. 152, J23 (2005), from memory',
  },
  CO: {
    adsorbate: 'CO',
    atomsPerMolecule: 1,
    gasEntropyJPerMolK: 197.66,
    saturationCoverage: 0.5,
    source: 'Abild-Pedersen & Andersson, Surf. Sci. 601, 1747 (2007), from memory',
  },
  O2: {
    adsorbate: 'O',
    atomsPerMolecule: 2,
    gasEntropyJPerMolK: 205.15,
    saturationCoverage: 0.25,
    source: 'Nørskov et al., J. Phys. Chem. B 108, 17886 (2004), from memory',
  },
  ligand: {
    adsorbate: 'SR',
    atomsPerMolecule: 0,
    gasEntropyJPerMolK: 0,
    saturationCoverage: 1 / 3,
    source: 'Love et al., Chem. Rev. 105, 1103 (2005), rough values from memory',
  },
};

// prettier-ignore
/** Adsorption energies, eV per adsorbate (see the file comment for sources; all from memory). */
export const ADSORPTION_ENERGIES_EV: Readonly<Record<Adsorbate, Readonly<Record<string, number>>>> = {
  H: { Fe: -0.6, Co: -0.5, Ni: -0.5, Cu: -0.1, Mo: -0.6, Ru: -0.4, Rh: -0.4, Pd: -0.4, Ag: 0.3, W: -0.6, Re: -0.4, Os: -0.4, Ir: -0.3, Pt: -0.3, Au: 0.2 },
  CO: { Fe: -1.9, Co: -1.6, Ni: -1.7, Cu: -0.6, Ru: -1.7, Rh: -1.7, Pd: -1.6, Ag: -0.1, Re: -1.8, Os: -1.7, Ir: -1.8, Pt: -1.5, Au: -0.3 },
  O: { Fe: -3.0, Co: -2.5, Ni: -2.2, Cu: -1.3, Mo: -3.6, Ru: -2.2, Rh: -1.7, Pd: -1.0, Ag: -0.5, W: -3.9, Re: -3.0, Os: -2.0, Ir: -1.3, Pt: -1.0, Au: 0.1 },
  SR: { Ni: -2.8, Cu: -2.5, Pd: -2.3, Ag: -2.0, Pt: -2.4, Au: -1.9 },
};

export const DEFAULT_PRESSURE_BAR = 1;

export interface AdsorbateTerm {
  environment: Environment;
  adsorbate: Adsorbate | null;
  /** Adsorption energies of A and B, eV (null: not in the table). */
  energyAEv: number | null;
  energyBEv: number | null;
  /** Coverage used (adsorbates per surface atom), of the stronger binder. */
  coverage: number;
  /** ΔH_ads of B to the surface, eV (negative: B drawn out); 0 when not computable. */
  termBEv: number;
  /** Element drawn to the surface by the adsorbate, null when none. */
  drawnOut: string | null;
  source: string | null;
  /** Why no term could be computed, when that happens. */
  missing: string | null;
}

export const VACUUM_TERM: AdsorbateTerm = Object.freeze({
  environment: 'vacuum',
  adsorbate: null,
  energyAEv: null,
  energyBEv: null,
  coverage: 0,
  termBEv: 0,
  drawnOut: null,
  source: null,
  missing: null,
});

/** Langmuir coverage (per surface atom) of an adsorbate of energy `energyEv` on one element. */
export function langmuirCoverage(
  environment: Exclude<Environment, 'vacuum'>,
  energyEv: number,
  temperatureK: number,
  pressureBar: number,
): number {
  const spec = ADSORBATES[environment];
  if (spec.atomsPerMolecule === 0) return spec.saturationCoverage;
  const kT = BOLTZMANN_EV_PER_K * temperatureK;
  const gasEntropyEvPerK = spec.gasEntropyJPerMolK / 1000 / KJ_PER_MOL_PER_EV;
  const deltaG = spec.atomsPerMolecule * energyEv + temperatureK * gasEntropyEvPerK;
  const lnKp = Math.log(pressureBar) - deltaG / kT;
  const lnOdds = spec.atomsPerMolecule === 2 ? 0.5 * lnKp : lnKp;
  // θ/θsat = odds/(1 + odds), written to stay finite for any odds
  const fraction = lnOdds > 0 ? 1 / (1 + Math.exp(-lnOdds)) : Math.exp(lnOdds) / (1 + Math.exp(lnOdds));
  return spec.saturationCoverage * fraction;
}

/** The adsorbate contribution to the segregation enthalpy of B in an A–B particle. */
export function adsorbateTerm(
  elementA: string,
  elementB: string,
  environment: Environment,
  temperatureK: number,
  pressureBar: number,
): AdsorbateTerm {
  if (environment === 'vacuum') return VACUUM_TERM;
  const spec = ADSORBATES[environment];
  const table = ADSORPTION_ENERGIES_EV[spec.adsorbate];
  const energyAEv = table[elementA] ?? null;
  const energyBEv = table[elementB] ?? null;
  const base = { environment, adsorbate: spec.adsorbate, energyAEv, energyBEv, source: spec.source };
  if (energyAEv === null || energyBEv === null) {
    const lacking = [energyAEv === null ? elementA : null, energyBEv === null ? elementB : null]
      .filter((s) => s !== null)
      .join(' and ');
    return {
      ...base,
      coverage: 0,
      termBEv: 0,
      drawnOut: null,
      missing: `no ${spec.adsorbate} adsorption energy tabulated for ${lacking}: adsorbate term left out`,
    };
  }
  const stronger = Math.min(energyAEv, energyBEv);
  const coverage = langmuirCoverage(environment, stronger, temperatureK, pressureBar);
  const termBEv = coverage * (energyBEv - energyAEv);
  const drawnOut = Math.abs(termBEv) < 1e-6 ? null : termBEv < 0 ? elementB : elementA;
  return { ...base, coverage, termBEv, drawnOut, missing: null };
}
