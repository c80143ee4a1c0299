/**
 * Janus or core@shell for a demixing pair: the spreading (wetting) coefficient of the low-surface-energy
 * element on the other, S = γ_core − γ_shell − γ_AB (de Gennes, Rev. Mod. Phys. 57, 827 (1985)).
 * S ≥ 0: the shell wets the core completely (core@shell); S < 0: partial wetting, two lobes (Janus) or an
 * off-centre core.
 *
 * Interface energy γ_AB (stated estimate, not a measured value):
 *  - chemical part, broken-bond / regular-solution count for a sharp (111) interface: each interface atom
 *    has Z_v = 3 unlike neighbours across, each costing ω, so γ_chem = Z_v·ω_chem / σ, σ = √3 a²/4 at the
 *    mean lattice constant; ω_chem = mean of the two dilute Miedema chemical ω (miedema.ts);
 *  - misfit part: a coherent shell of thickness t stores the biaxial strain energy M ε² t per area
 *    (M = 2G(1+ν)/(1−ν) of the shell, ε the lattice misfit; Freund & Suresh, Thin Film Materials (2003),
 *    from memory) until misfit dislocations take it over; the semicoherent limit is the same
 *    broken-bond count with the Miedema size-mismatch (elastic) ω at equiatomic composition:
 *    γ_misfit = min(M ε² t, Z_v·ω_el/σ).
 * With that, S depends on size only through the coherent part: if Δγ − γ_chem lies between 0 and the
 * semicoherent cap, the answer flips from core@shell (small) to Janus (large) at
 *   d* = 2(Δγ − γ_chem) / (M ε² (1 − (1 − x_shell)^{1/3})).
 * Small clusters add strain this continuum picture leaves out; the relaxed Monte Carlo is the check.
 */
import type { ElementRecord } from '../elements/element-table';
import { recordProperty } from '../elements/element-table';
import { EV_PER_JOULE } from './segregation';

const INTERFACE_BONDS_111 = 3;

export interface WettingInputs {
  a: ElementRecord;
  b: ElementRecord;
  gammaA: number;
  gammaB: number;
  latticeANm: number;
  latticeBNm: number;
  /** Dilute chemical ω of B in A and A in B, eV. */
  omegaChemBinAEv: number;
  omegaChemAinBEv: number;
  /** Miedema elastic (size-mismatch) ω at equiatomic composition, eV. */
  omegaElasticEv: number;
}

/** The size-independent part of the wetting estimate of a pair. */
export interface WettingPair {
  shell: string;
  core: string;
  gammaCoreJPerM2: number;
  gammaShellJPerM2: number;
  /** γ_core − γ_shell ≥ 0. */
  deltaGammaJPerM2: number;
  interfaceChemicalJPerM2: number;
  interfaceMisfitCapJPerM2: number;
  /** Lattice misfit of the shell on the core, (a_shell − a_core)/a_core. */
  misfit: number;
  /** Biaxial modulus of the shell, GPa. */
  biaxialModulusGpa: number;
}

export interface WettingEstimate extends WettingPair {
  /** Coherent strain energy per area of the shell at this size, capped at the semicoherent limit. */
  interfaceMisfitJPerM2: number;
  interfaceJPerM2: number;
  spreadingJPerM2: number;
  verdict: 'core@shell' | 'Janus';
  /** Diameter (nm) at which core@shell (smaller) turns Janus (larger); null when it never flips. */
  flipDiameterNm: number | null;
  estimate: string;
}

export const WETTING_ESTIMATE =
  'broken-bond γ_AB = 3ω/σ from the Miedema ω (chemical + misfit, the misfit part capped by the coherent strain of the shell)';

function biaxialModulusGpa(record: ElementRecord): number {
  const k = recordProperty(record, 'bulkModulusGpa');
  const g = recordProperty(record, 'shearModulusGpa');
  const nu = (3 * k - 2 * g) / (2 * (3 * k + g));
  return (2 * g * (1 + nu)) / (1 - nu);
}

export function wettingPair(w: WettingInputs): WettingPair {
  const bIsShell = w.gammaB <= w.gammaA;
  const shell = bIsShell ? w.b : w.a;
  const core = bIsShell ? w.a : w.b;
  const aShell = bIsShell ? w.latticeBNm : w.latticeANm;
  const aCore = bIsShell ? w.latticeANm : w.latticeBNm;
  const meanLatticeM = 0.5 * (w.latticeANm + w.latticeBNm) * 1e-9;
  const sigmaM2 = (Math.sqrt(3) / 4) * meanLatticeM * meanLatticeM;
  const perArea = (omegaEv: number) => (INTERFACE_BONDS_111 * omegaEv) / EV_PER_JOULE / sigmaM2;
  const omegaChem = 0.5 * (w.omegaChemBinAEv + w.omegaChemAinBEv);
  return {
    shell: shell.symbol,
    core: core.symbol,
    gammaCoreJPerM2: bIsShell ? w.gammaA : w.gammaB,
    gammaShellJPerM2: bIsShell ? w.gammaB : w.gammaA,
    deltaGammaJPerM2: Math.abs(w.gammaA - w.gammaB),
    interfaceChemicalJPerM2: Math.max(0, perArea(omegaChem)),
    interfaceMisfitCapJPerM2: Math.max(0, perArea(w.omegaElasticEv)),
    misfit: (aShell - aCore) / aCore,
    biaxialModulusGpa: biaxialModulusGpa(shell),
  };
}

/** Shell thickness (nm) of a core@shell sphere of diameter d whose shell holds the atomic fraction x. */
export function shellThicknessNm(diameterNm: number, shellFraction: number): number {
  return (diameterNm / 2) * (1 - Math.cbrt(1 - shellFraction));
}

/** S alone (J/m²), without building the record: the ranking's hot path. */
export function spreadingAt(pair: WettingPair, elementB: string, xB: number, diameterNm: number): number {
  const shellFraction = pair.shell === elementB ? xB : 1 - xB;
  const coherent =
    pair.biaxialModulusGpa * 1e9 * pair.misfit * pair.misfit * shellThicknessNm(diameterNm, shellFraction) * 1e-9;
  return pair.deltaGammaJPerM2 - pair.interfaceChemicalJPerM2 - Math.min(coherent, pair.interfaceMisfitCapJPerM2);
}

/** The spreading coefficient at one size and composition (x_B the overall fraction of B). */
export function wettingAt(pair: WettingPair, elementB: string, xB: number, diameterNm: number): WettingEstimate {
  const shellFraction = pair.shell === elementB ? xB : 1 - xB;
  const strainPerThickness = pair.biaxialModulusGpa * 1e9 * pair.misfit * pair.misfit; // J/m² per m
  const thicknessM = shellThicknessNm(diameterNm, shellFraction) * 1e-9;
  const interfaceMisfitJPerM2 = Math.min(strainPerThickness * thicknessM, pair.interfaceMisfitCapJPerM2);
  const interfaceJPerM2 = pair.interfaceChemicalJPerM2 + interfaceMisfitJPerM2;
  const spreadingJPerM2 = pair.deltaGammaJPerM2 - interfaceJPerM2;
  const room = pair.deltaGammaJPerM2 - pair.interfaceChemicalJPerM2;
  const geometric = 1 - Math.cbrt(1 - shellFraction);
  const flips = room > 0 && room < pair.interfaceMisfitCapJPerM2 && strainPerThickness > 0 && geometric > 0;
  const flipDiameterNm = flips ? ((2 * room) / (strainPerThickness * geometric)) * 1e9 : null;
  return {
    ...pair,
    interfaceMisfitJPerM2,
    interfaceJPerM2,
    spreadingJPerM2,
    verdict: spreadingJPerM2 >= 0 ? 'core@shell' : 'Janus',
    flipDiameterNm,
    estimate: WETTING_ESTIMATE,
  };
}
