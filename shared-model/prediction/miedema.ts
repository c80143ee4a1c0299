/**
 * Miedema's cell model for the enthalpy of mixing of a binary solution (de Boer, Boom, Mattens,
 * Miedema & Niessen, Cohesion in Metals, North-Holland 1988). Formulae as we implement them:
 *
 *   interface enthalpy of A dissolved in B (kJ/mol of A):
 *     ΔH_inter(A in B) = V_A^(2/3) · [ −P(Δφ*)² + Q(Δn_ws^(1/3))² − R ] / ½(1/n_A^(1/3) + 1/n_B^(1/3))
 *   P = 14.1 (both transition metals), 10.6 (neither), 12.35 (one of each); Q = 9.4·P;
 *   R/P = r_A·r_B (element factors r = R-star/P) for a transition–non-transition pair (hybridization; Al, Zn, Cd, In, Sn, Pb, Bi
 *   with a transition metal), 0 otherwise; in the liquid R is multiplied by 0.73.
 *   charge-transfer volume correction, applied once: V_A^(2/3) ← V_A^(2/3)·[1 + a_A·c^s_B·(φ_A − φ_B)].
 *   chemical part:  ΔH_chem = c_A·c^s_B·ΔH_inter(A in B), surface fractions c^s_B = c_B V_B^(2/3)/Σ c V^(2/3).
 *   elastic part (solid solutions only, Eshelby–Friedel):
 *     ΔH_el = c_A c_B [c_B ΔE(A in B) + c_A ΔE(B in A)],
 *     ΔE(A in B) = 2 K_A G_B (W_A − W_B)² / (3 K_A W_B + 4 G_B W_A), W molar volumes (corrected),
 *     K bulk modulus of the solute, G shear modulus of the solvent (GPa·cm³/mol = kJ/mol).
 * The structural (valence-band) term of de Boer et al. is not implemented. Constants from memory.
 */
import { getElement, type ElementRecord } from '../elements/element-table';
import { invalid } from '../api/result';

export type MiedemaState = 'solid' | 'liquid';

export const MIEDEMA_P_BOTH_TRANSITION = 14.1;
export const MIEDEMA_P_MIXED = 12.35;
export const MIEDEMA_P_NON_TRANSITION = 10.6;
export const MIEDEMA_Q_OVER_P = 9.4;
export const MIEDEMA_LIQUID_R_FACTOR = 0.73;

/** Per-pair constants, independent of composition (computed once per pair). */
export interface MiedemaPairConstants {
  /** [−P Δφ² + Q Δn² − R] / ⟨n^(−1/3)⟩, kJ/mol per cm² of contact area, solid (R full). */
  gammaSolid: number;
  /** The same with 0.73·R (liquid, amorphous). */
  gammaLiquid: number;
  /** R/P used (0 when the hybridization term does not apply). */
  hybridizationRtoP: number;
  phiA: number;
  phiB: number;
  v23A: number;
  v23B: number;
  chargeCoefficientA: number;
  chargeCoefficientB: number;
  bulkA: number;
  bulkB: number;
  shearA: number;
  shearB: number;
}

export interface MiedemaMixing {
  /** Chemical (interfacial) part, kJ/mol of atoms. */
  chemicalKjPerMol: number;
  /** Elastic size-mismatch part (0 for the liquid), kJ/mol. */
  elasticKjPerMol: number;
  totalKjPerMol: number;
  state: MiedemaState;
  /** Hybridization R/P applied (0 when not a transition–non-transition pair). */
  hybridizationRtoP: number;
}

function chargeTransferCoefficient(record: ElementRecord): number {
  if (record.symbol === 'Cu' || record.symbol === 'Ag' || record.symbol === 'Au') return 0.07;
  const valence = record.miedema?.valence ?? 0;
  if (valence === 1) return 0.14;
  if (valence === 2) return 0.1;
  if (valence === 3) return 0.07;
  return 0.04;
}

function requireNumber(record: ElementRecord, value: number | null, name: string): number {
  if (value === null || !Number.isFinite(value))
    throw invalid('element', `the element table has no ${name} for ${record.symbol}`);
  return value;
}

export function miedemaPairConstants(elementA: string, elementB: string): MiedemaPairConstants {
  const a = getElement(elementA, 'elementA');
  const b = getElement(elementB, 'elementB');
  if (!a.miedema) throw invalid('elementA', `the element table has no Miedema parameters for ${a.symbol}`);
  if (!b.miedema) throw invalid('elementB', `the element table has no Miedema parameters for ${b.symbol}`);
  const ma = a.miedema;
  const mb = b.miedema;
  const transitions = (ma.transition ? 1 : 0) + (mb.transition ? 1 : 0);
  const p =
    transitions === 2 ? MIEDEMA_P_BOTH_TRANSITION : transitions === 1 ? MIEDEMA_P_MIXED : MIEDEMA_P_NON_TRANSITION;
  const rToP = transitions === 1 ? ma.hybridizationRtoP * mb.hybridizationRtoP : 0;
  const dPhi = ma.phiStarV - mb.phiStarV;
  const dN = ma.nws13 - mb.nws13;
  const meanInverseN = 0.5 * (1 / ma.nws13 + 1 / mb.nws13);
  const base = -dPhi * dPhi + MIEDEMA_Q_OVER_P * dN * dN;
  return {
    gammaSolid: (p * (base - rToP)) / meanInverseN,
    gammaLiquid: (p * (base - MIEDEMA_LIQUID_R_FACTOR * rToP)) / meanInverseN,
    hybridizationRtoP: rToP,
    phiA: ma.phiStarV,
    phiB: mb.phiStarV,
    v23A: ma.v23Cm2,
    v23B: mb.v23Cm2,
    chargeCoefficientA: chargeTransferCoefficient(a),
    chargeCoefficientB: chargeTransferCoefficient(b),
    bulkA: requireNumber(a, a.bulkModulusGpa, 'bulk modulus'),
    bulkB: requireNumber(b, b.bulkModulusGpa, 'bulk modulus'),
    shearA: requireNumber(a, a.shearModulusGpa, 'shear modulus'),
    shearB: requireNumber(b, b.shearModulusGpa, 'shear modulus'),
  };
}

/**
 * Mixing enthalpy at composition xB (closed interval [0, 1]; 0 at the ends). Also returns, through
 * `perBondFactor`, ΔH_chem/(x_A x_B) which stays finite at the ends (used for the regular-solution ω).
 */
export function miedemaFromConstants(
  k: MiedemaPairConstants,
  xB: number,
  state: MiedemaState,
): MiedemaMixing & { chemicalOverXaXb: number } {
  const xA = 1 - xB;
  // surface fractions with the uncorrected volumes, then one charge-transfer correction of the volumes
  const s0 = xA * k.v23A + xB * k.v23B;
  const csA0 = (xA * k.v23A) / s0;
  const csB0 = (xB * k.v23B) / s0;
  const vA = k.v23A * (1 + k.chargeCoefficientA * csB0 * (k.phiA - k.phiB));
  const vB = k.v23B * (1 + k.chargeCoefficientB * csA0 * (k.phiB - k.phiA));
  const gamma = state === 'solid' ? k.gammaSolid : k.gammaLiquid;
  // c_A·c^s_B·V_A·γ = x_A x_B · V_A V_B γ / (x_A V_A + x_B V_B)
  const chemicalOverXaXb = (vA * vB * gamma) / (xA * vA + xB * vB);
  const chemical = xA * xB * chemicalOverXaXb;
  let elastic = 0;
  if (state === 'solid') {
    const wA = vA ** 1.5;
    const wB = vB ** 1.5;
    const dW2 = (wA - wB) * (wA - wB);
    const eAinB = (2 * k.bulkA * k.shearB * dW2) / (3 * k.bulkA * wB + 4 * k.shearB * wA);
    const eBinA = (2 * k.bulkB * k.shearA * dW2) / (3 * k.bulkB * wA + 4 * k.shearA * wB);
    elastic = xA * xB * (xB * eAinB + xA * eBinA);
  }
  return {
    chemicalKjPerMol: chemical,
    elasticKjPerMol: elastic,
    totalKjPerMol: chemical + elastic,
    state,
    hybridizationRtoP: k.hybridizationRtoP,
    chemicalOverXaXb,
  };
}

/** Miedema mixing enthalpy of A(1−xB)B(xB), kJ/mol of atoms; solid solution by default (chemical + elastic). */
export function miedemaMixingEnthalpy(
  elementA: string,
  elementB: string,
  xB: number,
  state: MiedemaState = 'solid',
): MiedemaMixing {
  if (typeof xB !== 'number' || !Number.isFinite(xB) || xB < 0 || xB > 1)
    throw invalid('xB', `xB must lie between 0 and 1, got ${String(xB)}`);
  if (elementA === elementB)
    throw invalid('elementB', `a pair needs two different elements, got ${elementA}-${elementB}`);
  const { chemicalOverXaXb: _unused, ...mixing } = miedemaFromConstants(
    miedemaPairConstants(elementA, elementB),
    xB,
    state,
  );
  return mixing;
}
