/**
 * Surface-segregation enthalpy of a binary A–B, Wynblatt & Ku type (Surf. Sci. 65, 511 (1977)).
 *
 * Sign convention: ΔH_B < 0 means exchanging a surface A with a core B lowers the enthalpy, i.e. B goes
 * to the surface. With x_s, x_c the B fractions of the surface layer and of the core:
 *
 *   ΔH_B(x_s, x_c) = (γ_B − γ_A)·σ                                   surface-energy term
 *                  + 2ω [ Z_l (x_c − x_s) + Z_v (x_c − ½) ]            regular-solution (chemical) term
 *                  − (1 − x_c)·E_el(B in A) + x_c·E_el(A in B)          elastic-strain term
 *
 * - σ: area per surface atom of the chosen facet at the alloy's Vegard lattice constant
 *   ((111): √3 a²/4; (100): a²/2). γ: Tyson–Miller mean surface energies.
 * - Z_l, Z_v: in-plane and out-of-plane (one adjacent plane) coordination of the facet:
 *   (111) 6 and 3, (100) 4 and 4 (fcc, total Z = Z_l + 2 Z_v = 12).
 *   The chemical term follows from counting nearest-neighbour bonds when a core B trades places with a
 *   surface A (B gets Z_l neighbours in the surface plane at x_s and Z_v below at x_c; the bulk site has
 *   Z = Z_l + 2 Z_v at x_c); the broken-bond part of that count is the surface-energy term. For ω > 0
 *   (like bonds preferred) a B-rich surface attracts more B (Fowler-type isotherm).
 * - ω: regular-solution bond parameter from the Miedema chemical mixing enthalpy of the solid at the
 *   particle's composition, ω = ΔH_chem / (Z x_A x_B) per atom (finite at the ends, see miedema.ts).
 * - E_el(B in A): Friedel's strain energy of a B solute in A, relieved at the surface:
 *   E_el = 24π K_B G_A r_A r_B (r_A − r_B)² / (3 K_B r_B + 4 G_A r_A)
 *   with K_B the BULK modulus of the SOLUTE B, G_A the SHEAR modulus of the HOST A, r the 12-fold metallic
 *   radii. Wynblatt–Ku state it for the dilute solute only; we interpolate linearly in the core
 *   composition between the two dilute limits so that both ends are exact.
 * At x_s = x_c = 0 the expression is W&K's dilute B-in-A segregation enthalpy; at x_s = x_c = 1 it equals
 * minus the dilute A-in-B one. It is linear in x_s and x_c: ΔH_B = c0 + cS·x_s + cC·x_c.
 *
 * Optional, for the prediction chain: a calibration factor `scale` on all three terms (calibration.ts)
 * and a constant adsorbate term ΔH_ads (environment.ts), added unscaled.
 */
import { getElement } from '../elements/element-table';
import { invalid } from '../api/result';

export const EV_PER_JOULE = 1 / 1.602176634e-19; // SI exact elementary charge
export const BOLTZMANN_EV_PER_K = 8.617333262e-5; // CODATA 2018 (exact in SI 2019)
export const KJ_PER_MOL_PER_EV = 96.48533212; // N_A·e/1000, CODATA 2018
export const FCC_COORDINATION = 12;

export type SurfaceFacet = '111' | '100';
export const SURFACE_FACETS: readonly SurfaceFacet[] = ['111', '100'];

export interface FacetGeometry {
  facet: SurfaceFacet;
  inPlane: number;
  outOfPlane: number;
  /** Area per surface atom divided by a². */
  areaPerAtomOverA2: number;
}

const FACETS: Readonly<Record<SurfaceFacet, FacetGeometry>> = {
  '111': Object.freeze({ facet: '111', inPlane: 6, outOfPlane: 3, areaPerAtomOverA2: Math.sqrt(3) / 4 }),
  '100': Object.freeze({ facet: '100', inPlane: 4, outOfPlane: 4, areaPerAtomOverA2: 0.5 }),
};

export function facetGeometry(facet: SurfaceFacet): FacetGeometry {
  const geometry = FACETS[facet];
  if (geometry === undefined) throw invalid('facet', `facet must be "111" or "100", got "${String(facet)}"`);
  return geometry;
}

/** Friedel elastic strain energy (eV) of one `solute` atom in a `host` crystal. */
export function friedelStrainEnergyEv(host: string, solute: string): number {
  const h = getElement(host, 'host');
  const s = getElement(solute, 'solute');
  const rh = h.metallicRadiusAngstrom;
  const rs = s.metallicRadiusAngstrom;
  const kSolute = s.bulkModulusGpa;
  const gHost = h.shearModulusGpa;
  if (rh === null || rs === null)
    throw invalid('element', `the element table has no metallic radius for ${rh === null ? h.symbol : s.symbol}`);
  if (kSolute === null) throw invalid('element', `the element table has no bulk modulus for ${s.symbol}`);
  if (gHost === null) throw invalid('element', `the element table has no shear modulus for ${h.symbol}`);
  const rA = rh * 1e-10;
  const rB = rs * 1e-10;
  const k = kSolute * 1e9;
  const g = gHost * 1e9;
  const joules = (24 * Math.PI * k * g * rA * rB * (rA - rB) ** 2) / (3 * k * rB + 4 * g * rA);
  return joules * EV_PER_JOULE;
}

/** Coefficients of ΔH_B = c0 + cS·x_s + cC·x_c (eV), plus the pieces used to report the terms. */
export interface SegregationCoefficients {
  surfaceEnergyEv: number;
  /** Regular-solution bond parameter ω, eV (> 0: A–B bonds disfavoured). */
  omegaEv: number;
  inPlane: number;
  outOfPlane: number;
  strainBinAEv: number;
  strainAinBEv: number;
  /** Factor on the three Wynblatt–Ku terms (1 = uncalibrated). */
  scale: number;
  /** Adsorbate term of B to the surface, eV (0 in vacuum). */
  adsorbateEv: number;
  c0: number;
  cS: number;
  cC: number;
}

export function segregationCoefficients(args: {
  gammaAJPerM2: number;
  gammaBJPerM2: number;
  latticeNm: number;
  facet: SurfaceFacet;
  omegaEv: number;
  strainBinAEv: number;
  strainAinBEv: number;
  scale?: number;
  adsorbateEv?: number;
}): SegregationCoefficients {
  const geometry = facetGeometry(args.facet);
  const aM = args.latticeNm * 1e-9;
  const sigmaM2 = geometry.areaPerAtomOverA2 * aM * aM;
  const scale = args.scale ?? 1;
  const adsorbateEv = args.adsorbateEv ?? 0;
  const surfaceEnergyEv = scale * (args.gammaBJPerM2 - args.gammaAJPerM2) * sigmaM2 * EV_PER_JOULE;
  const w = args.omegaEv;
  const zl = geometry.inPlane;
  const zv = geometry.outOfPlane;
  return {
    surfaceEnergyEv,
    omegaEv: w,
    inPlane: zl,
    outOfPlane: zv,
    strainBinAEv: args.strainBinAEv,
    strainAinBEv: args.strainAinBEv,
    scale,
    adsorbateEv,
    c0: surfaceEnergyEv + scale * (-w * zv - args.strainBinAEv) + adsorbateEv,
    cS: scale * (-2 * w * zl),
    cC: scale * (2 * w * (zl + zv) + args.strainBinAEv + args.strainAinBEv),
  };
}

export interface SegregationTerms {
  /** Sum of the three terms, eV; < 0 favours the named element at the surface. */
  totalEv: number;
  surfaceEnergyEv: number;
  chemicalEv: number;
  elasticEv: number;
  /** Adsorbate term (0 in vacuum). */
  adsorbateEv: number;
}

/** The three terms of ΔH_B at surface fraction `xs` and core fraction `xc` of B. */
export function segregationTermsB(k: SegregationCoefficients, xs: number, xc: number): SegregationTerms {
  const chemicalEv = k.scale * 2 * k.omegaEv * (k.inPlane * (xc - xs) + k.outOfPlane * (xc - 0.5));
  const elasticEv = k.scale * (-(1 - xc) * k.strainBinAEv + xc * k.strainAinBEv);
  const totalEv = k.surfaceEnergyEv + chemicalEv + elasticEv + k.adsorbateEv;
  return { totalEv, surfaceEnergyEv: k.surfaceEnergyEv, chemicalEv, elasticEv, adsorbateEv: k.adsorbateEv };
}

/** Same terms seen from A (ΔH_A = −ΔH_B). */
export function negateTerms(t: SegregationTerms): SegregationTerms {
  return {
    totalEv: -t.totalEv,
    surfaceEnergyEv: -t.surfaceEnergyEv,
    chemicalEv: -t.chemicalEv,
    elasticEv: -t.elasticEv,
    adsorbateEv: -t.adsorbateEv,
  };
}
