/**
 * Can the particle reach its equilibrium arrangement during the synthesis? Bulk interdiffusion length
 * L = √(D̃ t) against the particle radius.
 *
 * D* = D₀ exp(−Q/RT) per element: lattice self-diffusion, Arrhenius parameters from Mehrer, Diffusion in
 * Solids (Springer 2007) and the Smithells Metals Reference Book (8th ed., ch. 13), from memory. For an
 * element without a tabulated value the rule of thumb Q ≈ 0.6·E_coh, D₀ = 0.5 cm²/s (common practice;
 * the tabulated fcc metals give Q/E_coh = 0.45–0.7) is used and said.
 * Interdiffusion by Darken's relation without the thermodynamic factor, D̃ = x_B·D*_A + x_A·D*_B
 * (Darken, Trans. AIME 175, 184 (1948)), each tracer diffusivity approximated by the element's own
 * self-diffusion.
 * Verdict: L/r < 0.1 → equilibrium not reachable (the as-made structure follows the reduction order);
 * 0.1 ≤ L/r < 1 → partly equilibrated; L/r ≥ 1 → equilibrium reachable. Surface and grain-boundary
 * diffusion and the vacancies of small particles make real particles faster (see docs/known-limits-prediction.md).
 */
import { getElement, recordProperty } from '../elements/element-table';
import { KJ_PER_MOL_PER_EV } from './segregation';

export const GAS_CONSTANT_J_PER_MOL_K = 8.314462618; // CODATA 2018

export interface ArrheniusParameters {
  d0M2PerS: number;
  activationKjPerMol: number;
  source: string;
}

const MEHRER = 'Mehrer, Diffusion in Solids (2007) / Smithells (8th ed.), from memory';

// prettier-ignore
/** Lattice self-diffusion D₀ (cm²/s) and Q (kJ/mol), from memory. */
const SELF_DIFFUSION: Readonly<Record<string, [d0Cm2PerS: number, qKjPerMol: number]>> = {
  Al: [1.37, 142], Fe: [2.0, 251], Co: [0.83, 283], Ni: [0.92, 278], Cu: [0.78, 211], Zn: [0.18, 96],
  Mo: [0.5, 405], Rh: [0.5, 300], Pd: [0.205, 266], Ag: [0.40, 185], Cd: [0.18, 82], In: [0.1, 78],
  Sn: [10.7, 105], W: [1.88, 586], Ir: [0.36, 438], Pt: [0.05, 258], Au: [0.107, 177], Pb: [0.887, 107],
};

export const DIFFUSION_RULE_OF_THUMB = 'Q ≈ 0.6·E_coh, D₀ = 0.5 cm²/s (common practice)';

/** Arrhenius parameters of an element's self-diffusion (tabulated, or the rule of thumb from E_coh). */
export function selfDiffusionParameters(symbol: string): ArrheniusParameters {
  const row = SELF_DIFFUSION[symbol];
  if (row !== undefined) return { d0M2PerS: row[0] * 1e-4, activationKjPerMol: row[1], source: MEHRER };
  const cohesiveEv = recordProperty(getElement(symbol), 'cohesiveEnergyEv');
  return {
    d0M2PerS: 0.5e-4,
    activationKjPerMol: 0.6 * cohesiveEv * KJ_PER_MOL_PER_EV,
    source: DIFFUSION_RULE_OF_THUMB,
  };
}

/** D = D₀ exp(−Q/RT), m²/s. */
export function arrheniusDiffusivity(p: ArrheniusParameters, temperatureK: number): number {
  return p.d0M2PerS * Math.exp((-p.activationKjPerMol * 1000) / (GAS_CONSTANT_J_PER_MOL_K * temperatureK));
}

/** √(D t) in nm for D in m²/s and t in hours. */
export function diffusionLengthNm(diffusivityM2PerS: number, timeH: number): number {
  return Math.sqrt(diffusivityM2PerS * timeH * 3600) * 1e9;
}

export type KineticRegime = 'equilibrium not reachable' | 'partly equilibrated' | 'equilibrium reachable';

export interface KineticsEstimate {
  temperatureK: number;
  timeH: number;
  diffusivityAM2PerS: number;
  diffusivityBM2PerS: number;
  interdiffusivityM2PerS: number;
  lengthNm: number;
  radiusNm: number;
  /** L / r. */
  ratio: number;
  regime: KineticRegime;
  /** Temperature at which L reaches the radius in the same time (the annealing that equilibrates), K. */
  annealingTemperatureK: number;
  sources: string[];
}

export function kineticRegime(ratio: number): KineticRegime {
  return ratio < 0.1 ? 'equilibrium not reachable' : ratio < 1 ? 'partly equilibrated' : 'equilibrium reachable';
}

export function interdiffusionEstimate(
  elementA: string,
  elementB: string,
  xB: number,
  diameterNm: number,
  temperatureK: number,
  timeH: number,
): KineticsEstimate {
  const pa = selfDiffusionParameters(elementA);
  const pb = selfDiffusionParameters(elementB);
  const da = arrheniusDiffusivity(pa, temperatureK);
  const db = arrheniusDiffusivity(pb, temperatureK);
  const interdiffusivity = xB * da + (1 - xB) * db;
  const lengthNm = diffusionLengthNm(interdiffusivity, timeH);
  const radiusNm = diameterNm / 2;
  const ratio = lengthNm / radiusNm;
  const sources = [...new Set([`${elementA}: ${pa.source}`, `${elementB}: ${pb.source}`])];
  // D̃(T) rises monotonically with T: bisect on T for D̃·t = r²
  const target = (radiusNm * 1e-9) ** 2 / (timeH * 3600);
  const dTilde = (t: number) => xB * arrheniusDiffusivity(pa, t) + (1 - xB) * arrheniusDiffusivity(pb, t);
  let lo = 1;
  let hi = 5000;
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (dTilde(mid) < target) lo = mid;
    else hi = mid;
  }
  return {
    temperatureK,
    timeH,
    diffusivityAM2PerS: da,
    diffusivityBM2PerS: db,
    interdiffusivityM2PerS: interdiffusivity,
    lengthNm,
    radiusNm,
    ratio,
    regime: kineticRegime(ratio),
    annealingTemperatureK: 0.5 * (lo + hi),
    sources,
  };
}
