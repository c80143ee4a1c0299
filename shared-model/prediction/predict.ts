/**
 * Prediction for one pair under one set of conditions: which element goes to the surface of a finite
 * particle, by how much, the architecture label (from the one classifier) with a confidence, and why.
 *
 * Chain: element table → Miedema mixing (miedema.ts) → Wynblatt–Ku segregation terms (segregation.ts)
 * → site counts of the particle (geometry/particle-sites.ts) → Langmuir–McLean + mass balance
 * (surface-equilibrium.ts) → classifyArchitecture (architecture/classify.ts).
 *
 * Mixing tendency for the Janus / intermetallic labels (the classifier's unlike-neighbour ratio): the
 * regular-solution parameter ω at the particle's composition. When the Miedema chemical part is negative
 * (unlike bonds preferred; ordering relieves the size mismatch) ω is the chemical part and the ratio is
 * the quasi-chemical (Guggenheim) value 2/(1 + β), β = √(1 + 4x(1−x)(e^{2ω/kT} − 1)). Otherwise ω includes
 * the elastic part; below the regular-solution critical temperature (kT_c = Zω/2) and inside the
 * miscibility gap the particle is taken as two coexisting phases with binodal compositions x_b and 1 − x_b,
 * ratio x_b(1 − x_b)/(x(1 − x)); outside it the quasi-chemical value.
 */
import { classifyArchitecture, type ClassificationThresholds } from '../architecture/classify';
import type { ArchitectureKind } from '../architecture/labels';
import { invalid } from '../api/result';
import { getElement, recordProperty, type ElementRecord } from '../elements/element-table';
import { isMetalSymbol } from '../elements/symbols';
import { particleSiteCounts, type ParticleShape, type ParticleSiteCounts } from '../geometry/particle-sites';
import { resolveConditions, type PredictionConditions, type ResolvedConditions, type StrainRule } from './conditions';
import { miedemaFromConstants, miedemaPairConstants, type MiedemaPairConstants } from './miedema';
import {
  BOLTZMANN_EV_PER_K,
  FCC_COORDINATION,
  KJ_PER_MOL_PER_EV,
  friedelStrainEnergyEv,
  negateTerms,
  segregationCoefficients,
  segregationTermsB,
  type SegregationCoefficients,
  type SegregationTerms,
  type SurfaceFacet,
} from './segregation';
import { solveSurfaceEquilibrium } from './surface-equilibrium';
import { SEGREGATION_CALIBRATION } from './calibration';
import { adsorbateTerm, type AdsorbateTerm, type Environment } from './environment';
import { interdiffusionEstimate, type KineticsEstimate } from './diffusion';
import { pairOxidation, type PairOxidation } from './oxidation';
import { surfaceEnergySources, type SurfaceEnergySources } from './surface-energy-scatter';
import { spreadingAt, wettingAt, wettingPair, type WettingEstimate, type WettingPair } from './wetting';
import { coReductionExpectation, type KineticExpectation } from './kinetic-expectation';

export { PREDICTION_DEFAULTS, STRAIN_RULES, resolveConditions } from './conditions';
export type { PredictionConditions, ResolvedConditions, StrainRule } from './conditions';

/** Version of the whole prediction chain; stored with every saved prediction. */
export const MODEL_VERSION = 'segregation-2.0';

/** Terms of the segregation enthalpy, eV; negative values favour the named element at the surface. */
export interface PredictionTerms {
  surfaceEnergy: number;
  chemical: number;
  elastic: number;
  /** Adsorbate-induced term (0 in vacuum). */
  adsorbate: number;
  total: number;
}

/** Whether the data decide the prediction, with both surface-energy sources. */
export interface PredictionCertainty {
  uncertain: boolean;
  /** Energy equivalent of the surface-energy scatter between the sources, eV. */
  scatterEv: number;
  sources: SurfaceEnergySources;
  note: string;
}

/** The two verdicts: as the synthesis leaves the particle, and after annealing to equilibrium. */
export interface AsMadeVerdict {
  asMade: string;
  afterAnnealing: string;
  /** Which one the as-made label comes from. */
  basis: 'kinetic' | 'equilibrium';
  text: string;
}

export interface Prediction {
  pair: string;
  elementA: string;
  elementB: string;
  /** Element with more surface share than overall share, null when neither. */
  surfaceElement: string | null;
  /** Fraction of `surfaceElement` (or of B when null) among the surface sites. */
  surfaceFraction: number;
  /** B fraction of the surface layer and of the core. */
  surfaceXB: number;
  coreXB: number;
  /** E = (xs − x)/(1 − x) of the surface element: 0 none, 1 complete shell. */
  enrichment: number;
  architecture: string;
  architectureKind: ArchitectureKind;
  /** 0..1, from the distance to the nearest classification threshold and the data-quality flags. */
  confidence: number;
  /** Distance from the nearest threshold, 0..1 (classifier). */
  margin: number;
  /** Segregation enthalpy of the surface element (of B when none) at the solved compositions, eV. */
  terms: PredictionTerms;
  /** Dilute-limit segregation enthalpies: B at the surface of A, and A at the surface of B, eV. */
  segregation: { bInA: PredictionTerms; aInB: PredictionTerms };
  mixingEnthalpyKjPerMol: number;
  mixingChemicalKjPerMol: number;
  mixingElasticKjPerMol: number;
  /** Unlike-neighbour fraction relative to a random alloy (see file comment). */
  unlikeNeighbourRatio: number;
  /** Warren–Cowley short-range order parameter of the first shell, α = 1 − unlikeNeighbourRatio. */
  warrenCowleyAlpha: number;
  /** Whether the regular-solution miscibility gap contains the composition at this temperature. */
  miscibilityGap: boolean;
  atoms: number;
  surfaceSites: number;
  latticeNm: number;
  xB: number;
  diameterNm: number;
  shape: ParticleShape;
  temperatureK: number;
  facet: SurfaceFacet;
  strainRule: StrainRule;
  thresholds: ClassificationThresholds;
  modelVersion: string;
  classifierVersion: string;
  flags: string[];
  /** One sentence from the dominant terms. */
  reason: string;
  environment: Environment;
  pressureBar: number;
  timeH: number;
  /** Adsorbate term of the environment (coverage, energies, who is drawn out). */
  adsorbate: AdsorbateTerm;
  /** Spreading coefficient of the demixing pair (null when the pair mixes at this temperature). */
  wetting: WettingEstimate | null;
  /** Oxidation outlook in air or water. */
  oxidation: PairOxidation;
  /** Interdiffusion length against the radius. */
  kinetics: KineticsEstimate;
  /** Reduction order of the usual chloro-complex precursors (co-reduction), when both are tabulated. */
  kinetic: KineticExpectation | null;
  verdicts: AsMadeVerdict;
  certainty: PredictionCertainty;
  /** Calibration factor on the segregation terms. */
  calibrationScale: number;
}

/** Everything about a pair that does not depend on the conditions (computed once per pair). */
export interface PairContext {
  a: ElementRecord;
  b: ElementRecord;
  miedema: MiedemaPairConstants;
  gammaA: number;
  gammaB: number;
  latticeANm: number;
  latticeBNm: number;
  /** Friedel strain energies (eV) of B in A and A in B, and whether each solute is larger than its host. */
  strainBinAEv: number;
  strainAinBEv: number;
  bLargerThanA: boolean;
  /** Regular-solution ω (eV) of dilute B in A and of dilute A in B. */
  omegaDiluteBinAEv: number;
  omegaDiluteAinBEv: number;
  /** Data-quality flags with their confidence penalties. */
  pairFlags: ReadonlyArray<{ flag: string; penalty: number }>;
  /** Product of (1 − penalty) over `pairFlags`. */
  pairQuality: number;
  /** "A-B". */
  pairName: string;
  /** Strain energies that enter under each strain rule. */
  strainByRule: Readonly<Record<StrainRule, { bInA: number; aInB: number }>>;
  /** Last composition-dependent part computed for this pair (memo; see `predictCore`). */
  lastComposition: CompositionPart | null;
  /** Dilute-limit terms per facet, strain rule and environment (filled on first use). */
  diluteCache: Map<string, { bInA: PredictionTerms; aInB: PredictionTerms }>;
  /** Size-independent part of the wetting estimate (filled on first use). */
  wetting: WettingPair | null;
  surfaceSources: SurfaceEnergySources;
}

const HYBRIDIZING = new Set(['Al', 'Zn', 'Cd', 'In', 'Sn', 'Pb', 'Bi']);

export function pairContext(elementA: string, elementB: string): PairContext {
  const a = getElement(elementA, 'elementA');
  const b = getElement(elementB, 'elementB');
  if (a.symbol === b.symbol)
    throw invalid('elementB', `a pair needs two different elements, got ${a.symbol}-${b.symbol}`);
  const miedema = miedemaPairConstants(a.symbol, b.symbol);
  const pairFlags: Array<{ flag: string; penalty: number }> = [];
  for (const record of [a, b]) {
    if (record.cell.structure !== 'fcc') {
      pairFlags.push({
        flag: `${record.symbol} is ${record.cell.structure} in bulk: fcc-equivalent lattice and fcc coordination assumed`,
        penalty: 0.1,
      });
    }
  }
  if (miedema.hybridizationRtoP > 0) {
    const p = HYBRIDIZING.has(a.symbol) ? a.symbol : b.symbol;
    pairFlags.push({
      flag: `Miedema hybridization term applies (${p} with a transition metal): mixing enthalpy less certain`,
      penalty: 0.1,
    });
  }
  const rA = recordProperty(a, 'metallicRadiusAngstrom');
  const rB = recordProperty(b, 'metallicRadiusAngstrom');
  const mismatch = Math.abs(rA - rB) / Math.min(rA, rB);
  if (mismatch > 0.1) {
    pairFlags.push({
      flag: `size mismatch ${(100 * mismatch).toFixed(0)} % > 10 %: continuum strain and Vegard's law are rough`,
      penalty: 0.1,
    });
  }
  const strainBinAEv = friedelStrainEnergyEv(a.symbol, b.symbol);
  const strainAinBEv = friedelStrainEnergyEv(b.symbol, a.symbol);
  return {
    a,
    b,
    miedema,
    gammaA: recordProperty(a, 'surfaceEnergyJPerM2'),
    gammaB: recordProperty(b, 'surfaceEnergyJPerM2'),
    latticeANm: recordProperty(a, 'fccEquivalentLatticeAngstrom') / 10,
    latticeBNm: recordProperty(b, 'fccEquivalentLatticeAngstrom') / 10,
    strainBinAEv,
    strainAinBEv,
    bLargerThanA: rB > rA,
    omegaDiluteBinAEv:
      miedemaFromConstants(miedema, 0, 'solid').chemicalOverXaXb / (FCC_COORDINATION * KJ_PER_MOL_PER_EV),
    omegaDiluteAinBEv:
      miedemaFromConstants(miedema, 1, 'solid').chemicalOverXaXb / (FCC_COORDINATION * KJ_PER_MOL_PER_EV),
    pairFlags,
    pairQuality: pairFlags.reduce((q, f) => q * (1 - f.penalty), 1),
    pairName: `${a.symbol}-${b.symbol}`,
    strainByRule: {
      'any solute': { bInA: strainBinAEv, aInB: strainAinBEv },
      'oversized solute': { bInA: rB > rA ? strainBinAEv : 0, aInB: rB > rA ? 0 : strainAinBEv },
    },
    diluteCache: new Map(),
    lastComposition: null,
    wetting: null,
    surfaceSources: surfaceEnergySources(
      a,
      b,
      recordProperty(a, 'surfaceEnergyJPerM2'),
      recordProperty(b, 'surfaceEnergyJPerM2'),
    ),
  };
}

/** The pair's wetting inputs (computed once per pair, on first need). */
export function pairWetting(ctx: PairContext): WettingPair {
  if (ctx.wetting === null) {
    const elasticKj = miedemaFromConstants(ctx.miedema, 0.5, 'solid').elasticKjPerMol;
    ctx.wetting = wettingPair({
      a: ctx.a,
      b: ctx.b,
      gammaA: ctx.gammaA,
      gammaB: ctx.gammaB,
      latticeANm: ctx.latticeANm,
      latticeBNm: ctx.latticeBNm,
      omegaChemBinAEv: ctx.omegaDiluteBinAEv,
      omegaChemAinBEv: ctx.omegaDiluteAinBEv,
      omegaElasticEv: elasticKj / (0.25 * FCC_COORDINATION * KJ_PER_MOL_PER_EV),
    });
  }
  return ctx.wetting;
}

/** Regular-solution binodal x_b < ½ at τ = Zω/kT > 2: ln((1 − x)/x) = τ(1 − 2x). */
export function regularSolutionBinodal(tau: number): number {
  if (!(tau > 2)) return 0.5;
  // g(x) = ln((1−x)/x) − τ(1−2x) is +∞ at 0 and negative just below ½ (τ > 2), convex on (0, ½):
  // Newton from the left of the root (where g > 0) climbs monotonically to it.
  let lo = 0;
  let hi = 0.5 - 0.5 * Math.sqrt(Math.max(0, 1 - 2 / tau)); // spinodal: g' = 0, g < 0 there
  let x = Math.min(Math.exp(-tau), 0.5 * hi);
  for (let i = 0; i < 100; i++) {
    const g = Math.log1p(-x) - Math.log(x) - tau * (1 - 2 * x);
    if (g > 0) lo = x;
    else hi = x;
    const slope = -1 / (x * (1 - x)) + 2 * tau;
    let next = x - g / slope;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - x) <= 1e-14 * x) return next;
    x = next;
  }
  return x;
}

function mixingTendency(
  omegaChemEv: number,
  omegaTotalEv: number,
  xB: number,
  kTEv: number,
): { ratio: number; gap: boolean } {
  const x = xB;
  const xx = x * (1 - x);
  const omega = omegaChemEv < 0 ? omegaChemEv : omegaTotalEv;
  const exponent = Math.min(700, (2 * omega) / kTEv);
  const beta = Math.sqrt(1 + 4 * xx * (Math.exp(exponent) - 1));
  let ratio = 2 / (1 + beta);
  let gap = false;
  if (omega > 0) {
    const tau = (FCC_COORDINATION * omega) / kTEv;
    if (tau > 2) {
      const xb = regularSolutionBinodal(tau);
      if (Math.min(x, 1 - x) > xb) {
        gap = true;
        ratio = Math.min(ratio, (xb * (1 - xb)) / xx);
      }
    }
  }
  return { ratio, gap };
}

function toTerms(t: SegregationTerms): PredictionTerms {
  return {
    surfaceEnergy: t.surfaceEnergyEv,
    chemical: t.chemicalEv,
    elastic: t.elasticEv,
    adsorbate: t.adsorbateEv,
    total: t.totalEv,
  };
}

const signed = (value: number) => `${value >= 0 ? '+' : '−'}${Math.abs(value).toFixed(2)} eV`;

function buildReason(
  surfaceElement: string | null,
  other: string,
  enrichment: number,
  terms: PredictionTerms,
  mixingKj: number,
  gap: boolean,
  ratio: number,
): string {
  const mixing = `ΔHmix ${mixingKj >= 0 ? '+' : '−'}${Math.abs(mixingKj).toFixed(1)} kJ/mol${gap ? ' (miscibility gap)' : mixingKj < 0 ? ' (mixing favoured)' : ' (demixing tendency)'}`;
  const order =
    ratio > 1.05
      ? `, unlike neighbours ×${ratio.toFixed(2)}`
      : ratio < 0.95
        ? `, like neighbours cluster (unlike ×${ratio.toFixed(2)})`
        : '';
  if (surfaceElement === null) return `no surface enrichment; ${mixing}${order}`;
  const words: Record<'surfaceEnergy' | 'chemical' | 'elastic' | 'adsorbate', [string, string]> = {
    surfaceEnergy: [`lower surface energy of ${surfaceElement}`, `higher surface energy of ${surfaceElement}`],
    chemical: [`bond balance (ω) favours ${surfaceElement} outside`, `bond balance (ω) holds ${surfaceElement} inside`],
    elastic: [`strain relief of ${surfaceElement} in ${other}`, `strain`],
    adsorbate: [`adsorbate binds ${surfaceElement} more strongly`, `adsorbate binds ${other} more strongly`],
  };
  const parts = (['surfaceEnergy', 'chemical', 'elastic', 'adsorbate'] as const)
    .map((key) => ({ key, value: terms[key] }))
    .sort((p, q) => Math.abs(q.value) - Math.abs(p.value))
    .filter((p) => Math.abs(p.value) >= 0.005);
  const pushing = parts.filter((p) => p.value < 0).map((p) => `${words[p.key][0]} ${signed(p.value)}`);
  const against = parts.filter((p) => p.value > 0).map((p) => `${words[p.key][1]} ${signed(p.value)}`);
  return (
    `${surfaceElement} to the surface (E = ${enrichment.toFixed(2)}): ` +
    (pushing.length > 0 ? pushing.join(', ') : 'configurational entropy only') +
    (against.length > 0 ? `; against: ${against.join(', ')}` : '') +
    `; ${mixing}${order}`
  );
}

export interface PredictionCore {
  kT: number;
  mixing: ReturnType<typeof miedemaFromConstants>;
  omegaChemEv: number;
  latticeNm: number;
  strain: { bInA: number; aInB: number };
  k: SegregationCoefficients;
  sites: ParticleSiteCounts;
  surfaceXB: number;
  coreXB: number;
  unlikeNeighbourRatio: number;
  miscibilityGap: boolean;
  adsorbate: AdsorbateTerm;
  /** Spreading coefficient (J/m²) at this size for a pair inside its miscibility gap, else null. */
  spreadingJPerM2: number | null;
}

/** The size-independent part of a prediction: depends on composition, temperature, facet and strain rule. */
interface CompositionPart extends Pick<
  PredictionCore,
  'kT' | 'mixing' | 'omegaChemEv' | 'latticeNm' | 'strain' | 'k' | 'adsorbate'
> {
  xB: number;
  temperatureK: number;
  facet: SurfaceFacet;
  strainRule: StrainRule;
  environment: Environment;
  pressureBar: number;
  ratio: number;
  gap: boolean;
}

function compositionPart(ctx: PairContext, c: ResolvedConditions): CompositionPart {
  const last = ctx.lastComposition;
  if (
    last !== null &&
    last.xB === c.xB &&
    last.temperatureK === c.temperatureK &&
    last.facet === c.facet &&
    last.strainRule === c.strainRule &&
    last.environment === c.environment &&
    last.pressureBar === c.pressureBar
  ) {
    return last;
  }
  const xB = c.xB;
  const kT = BOLTZMANN_EV_PER_K * c.temperatureK;
  const mixing = miedemaFromConstants(ctx.miedema, xB, 'solid');
  const zEvPerKj = FCC_COORDINATION * KJ_PER_MOL_PER_EV;
  const omegaChem = mixing.chemicalOverXaXb / zEvPerKj;
  const omegaTotal = omegaChem + mixing.elasticKjPerMol / (xB * (1 - xB)) / zEvPerKj;
  const latticeNm = (1 - xB) * ctx.latticeANm + xB * ctx.latticeBNm;
  const strain = ctx.strainByRule[c.strainRule];
  const adsorbate = adsorbateTerm(ctx.a.symbol, ctx.b.symbol, c.environment, c.temperatureK, c.pressureBar);
  const k = segregationCoefficients({
    gammaAJPerM2: ctx.gammaA,
    gammaBJPerM2: ctx.gammaB,
    latticeNm,
    facet: c.facet,
    omegaEv: omegaChem,
    strainBinAEv: strain.bInA,
    strainAinBEv: strain.aInB,
    scale: SEGREGATION_CALIBRATION.scale,
    adsorbateEv: adsorbate.termBEv,
  });
  const tendency = mixingTendency(omegaChem, omegaTotal, xB, kT);
  const part: CompositionPart = {
    xB,
    temperatureK: c.temperatureK,
    facet: c.facet,
    strainRule: c.strainRule,
    environment: c.environment,
    pressureBar: c.pressureBar,
    adsorbate,
    kT,
    mixing,
    omegaChemEv: omegaChem,
    latticeNm,
    strain,
    k,
    ratio: tendency.ratio,
    gap: tendency.gap,
  };
  // one-entry memo: ranking over several sizes at one composition reuses it (pure values, frozen inputs)
  ctx.lastComposition = part;
  return part;
}

/** The numbers of a prediction (no labels, strings or term breakdown): the hot path of ranking. */
export function predictCore(ctx: PairContext, c: ResolvedConditions): PredictionCore {
  const part = compositionPart(ctx, c);
  const k = part.k;
  const sites = particleSiteCounts(c.diameterNm, part.latticeNm, c.shape);
  const solved = solveSurfaceEquilibrium({
    xB: c.xB,
    surfaceShare: sites.surfaceSites / sites.atoms,
    kTEv: part.kT,
    c0: k.c0,
    cS: k.cS,
    cC: k.cC,
  });
  return {
    kT: part.kT,
    mixing: part.mixing,
    omegaChemEv: part.omegaChemEv,
    latticeNm: part.latticeNm,
    strain: part.strain,
    k,
    sites,
    surfaceXB: solved.surfaceXB,
    coreXB: solved.coreXB,
    unlikeNeighbourRatio: part.ratio,
    miscibilityGap: part.gap,
    adsorbate: part.adsorbate,
    spreadingJPerM2: part.gap ? spreadingAt(pairWetting(ctx), ctx.b.symbol, c.xB, c.diameterNm) : null,
  };
}

/**
 * Prediction from a precomputed pair context and already-checked conditions (the fast path used by
 * ranking and isotherms). Use `predictPair` for user input.
 */
export function predictWithContext(ctx: PairContext, c: ResolvedConditions): Prediction {
  return predictionFromCore(ctx, c, predictCore(ctx, c));
}

export function predictionFromCore(ctx: PairContext, c: ResolvedConditions, core: PredictionCore): Prediction {
  const { kT, mixing, latticeNm, strain, k, sites } = core;
  const xB = c.xB;
  const solved = { surfaceXB: core.surfaceXB, coreXB: core.coreXB };
  const tendency = { ratio: core.unlikeNeighbourRatio, gap: core.miscibilityGap };
  const wetting = core.spreadingJPerM2 !== null ? wettingAt(pairWetting(ctx), ctx.b.symbol, xB, c.diameterNm) : null;
  const classification = classifyArchitecture(
    {
      elementA: ctx.a.symbol,
      elementB: ctx.b.symbol,
      xB,
      surfaceXB: solved.surfaceXB,
      unlikeNeighbourRatio: tendency.ratio,
      ...(wetting !== null ? { spreadingJPerM2: wetting.spreadingJPerM2 } : {}),
    },
    c.thresholds,
  );

  const flags: string[] = [];
  for (const f of ctx.pairFlags) flags.push(f.flag);
  let quality = ctx.pairQuality;
  if (sites.surfaceSites >= sites.atoms) {
    flags.push('every atom is a surface atom: no core to exchange with');
    quality *= 0.7;
  } else if (sites.atoms < 150) {
    flags.push(`only ${Math.round(sites.atoms)} atoms: a continuum segregation model is at its limit`);
    quality *= 0.85;
  }
  if (k.cS / kT < -4) {
    flags.push(
      'strong demixing tendency within the surface layer: the isotherm may have several solutions (2D phase separation)',
    );
    quality *= 0.8;
  }
  if (c.shape === 'icosahedron') flags.push('icosahedron: Mackay site counts; its internal strain is not modelled');
  if (tendency.gap) flags.push('inside the regular-solution miscibility gap at this temperature');
  if (core.adsorbate.missing !== null) flags.push(core.adsorbate.missing);

  const bTerms = segregationTermsB(k, solved.surfaceXB, solved.coreXB);
  const enrichedIsA = classification.enrichedElement === ctx.a.symbol;
  const terms = toTerms(enrichedIsA ? negateTerms(bTerms) : bTerms);
  const dilute = diluteTerms(ctx, c, strain);
  const certainty = pairCertainty(ctx, dilute);
  if (certainty.uncertain) {
    flags.push(certainty.note);
    quality *= 0.5;
  }
  const kinetics = interdiffusionEstimate(ctx.a.symbol, ctx.b.symbol, xB, c.diameterNm, c.temperatureK, c.timeH);
  const kinetic = coReductionExpectation(ctx.a.symbol, ctx.b.symbol);

  const surfaceElement = classification.enrichedElement;
  const surfaceFraction = enrichedIsA ? 1 - solved.surfaceXB : solved.surfaceXB;
  const confidence = Math.round(1000 * (0.5 + 0.5 * classification.margin) * quality) / 1000;
  const other = surfaceElement === ctx.a.symbol ? ctx.b.symbol : ctx.a.symbol;
  const oxidation = pairOxidation(ctx.a.symbol, ctx.b.symbol, surfaceElement);
  if (oxidation.summary !== '' && c.environment === 'O2') flags.push(oxidation.summary);
  const verdicts = asMadeVerdict(classification.label, kinetics, kinetic);
  let reason: string | undefined;
  return {
    pair: ctx.pairName,
    elementA: ctx.a.symbol,
    elementB: ctx.b.symbol,
    surfaceElement,
    surfaceFraction,
    surfaceXB: solved.surfaceXB,
    coreXB: solved.coreXB,
    enrichment: classification.enrichment,
    architecture: classification.label,
    architectureKind: classification.kind,
    confidence,
    margin: classification.margin,
    terms,
    segregation: dilute,
    mixingEnthalpyKjPerMol: mixing.totalKjPerMol,
    mixingChemicalKjPerMol: mixing.chemicalKjPerMol,
    mixingElasticKjPerMol: mixing.elasticKjPerMol,
    unlikeNeighbourRatio: tendency.ratio,
    warrenCowleyAlpha: 1 - tendency.ratio,
    miscibilityGap: tendency.gap,
    atoms: Math.round(sites.atoms),
    surfaceSites: Math.round(sites.surfaceSites),
    latticeNm,
    xB,
    diameterNm: c.diameterNm,
    shape: c.shape,
    temperatureK: c.temperatureK,
    facet: c.facet,
    strainRule: c.strainRule,
    thresholds: { ...c.thresholds },
    modelVersion: MODEL_VERSION,
    classifierVersion: classification.classifierVersion,
    flags,
    environment: c.environment,
    pressureBar: c.pressureBar,
    timeH: c.timeH,
    adsorbate: core.adsorbate,
    wetting,
    oxidation,
    kinetics,
    kinetic,
    verdicts,
    certainty,
    calibrationScale: SEGREGATION_CALIBRATION.scale,
    // built on first read (ranking produces many predictions, few reasons are shown); an own enumerable
    // property, so JSON and structured clone carry it
    get reason(): string {
      if (reason === undefined) {
        reason = buildReason(
          surfaceElement,
          other,
          classification.enrichment,
          terms,
          mixing.totalKjPerMol,
          tendency.gap,
          tendency.ratio,
        );
        if (wetting !== null) reason = `${wettingSentence(wetting)}; ${reason}`;
      }
      return reason;
    },
  };
}

function diluteTerms(ctx: PairContext, c: ResolvedConditions, strain: { bInA: number; aInB: number }) {
  const facet = c.facet;
  const adsorbateEv =
    c.environment === 'vacuum'
      ? 0
      : adsorbateTerm(ctx.a.symbol, ctx.b.symbol, c.environment, c.temperatureK, c.pressureBar).termBEv;
  const key = `${facet}|${c.strainRule}|${adsorbateEv}`;
  let cached = ctx.diluteCache.get(key);
  if (cached === undefined) {
    // dilute limits: B in A at x_s = x_c = 0 with A's lattice; A in B at x_s = x_c = 1 with B's lattice;
    // ω of the dilute solutions: Miedema chemical enthalpy per x_A·x_B at x_B → 0 and x_B → 1
    const kA = segregationCoefficients({
      ...kArgs(ctx, ctx.omegaDiluteBinAEv, facet, strain, adsorbateEv),
      latticeNm: ctx.latticeANm,
    });
    const kB = segregationCoefficients({
      ...kArgs(ctx, ctx.omegaDiluteAinBEv, facet, strain, adsorbateEv),
      latticeNm: ctx.latticeBNm,
    });
    cached = Object.freeze({
      bInA: Object.freeze(toTerms(segregationTermsB(kA, 0, 0))),
      aInB: Object.freeze(toTerms(negateTerms(segregationTermsB(kB, 1, 1)))),
    });
    ctx.diluteCache.set(key, cached);
  }
  return cached;
}

function kArgs(
  ctx: PairContext,
  omegaEv: number,
  facet: SurfaceFacet,
  strain: { bInA: number; aInB: number },
  adsorbateEv: number,
) {
  return {
    gammaAJPerM2: ctx.gammaA,
    gammaBJPerM2: ctx.gammaB,
    facet,
    omegaEv,
    strainBinAEv: strain.bInA,
    strainAinBEv: strain.aInB,
    scale: SEGREGATION_CALIBRATION.scale,
    adsorbateEv,
  };
}

/**
 * Uncertain when a dilute-limit segregation enthalpy is smaller than the energy the surface-energy
 * scatter between sources amounts to (surface-energy-scatter.ts).
 */
function pairCertainty(
  ctx: PairContext,
  dilute: { bInA: PredictionTerms; aInB: PredictionTerms },
): PredictionCertainty {
  const sources = ctx.surfaceSources;
  const deltaGamma = ctx.gammaB - ctx.gammaA;
  // surface term per J/m² of γ_B − γ_A, calibrated: the term's own ratio (σ at the host's lattice)
  const perJ = deltaGamma === 0 ? 0 : Math.abs(dilute.bInA.surfaceEnergy / deltaGamma);
  const scatterEv = perJ * sources.scatterJPerM2;
  const smallest = Math.min(Math.abs(dilute.bInA.total), Math.abs(dilute.aInB.total));
  const uncertain = smallest < scatterEv;
  const note = uncertain
    ? `uncertain: a dilute segregation enthalpy (${smallest.toFixed(3)} eV) is within the surface-energy scatter between sources (±${scatterEv.toFixed(3)} eV); ${sources.note}`
    : sources.note;
  return { uncertain, scatterEv, sources, note };
}

function wettingSentence(w: WettingEstimate): string {
  const s = `S = γ(${w.core}) − γ(${w.shell}) − γ_AB = ${w.gammaCoreJPerM2.toFixed(2)} − ${w.gammaShellJPerM2.toFixed(2)} − ${w.interfaceJPerM2.toFixed(2)} = ${w.spreadingJPerM2.toFixed(2)} J/m²`;
  const flip = w.flipDiameterNm === null ? '' : ` (core@shell below ${w.flipDiameterNm.toFixed(1)} nm, Janus above)`;
  return w.verdict === 'Janus'
    ? `partial wetting, Janus: ${s}${flip}`
    : `${w.shell} wets ${w.core} (${w.core}@${w.shell}): ${s}${flip}`;
}

/** "As made" and "after annealing" labels from the diffusion length and the reduction order. */
export function asMadeVerdict(
  equilibrium: string,
  kinetics: KineticsEstimate,
  kinetic: KineticExpectation | null,
): AsMadeVerdict {
  const at = `${kinetics.temperatureK.toFixed(0)} K for ${kinetics.timeH} h`;
  const length = `L = √(D̃t) = ${formatNm(kinetics.lengthNm)} vs radius ${kinetics.radiusNm.toFixed(1)} nm`;
  const afterAnnealing = equilibrium;
  if (kinetics.regime === 'equilibrium reachable' || kinetic === null) {
    const text =
      kinetics.regime === 'equilibrium reachable'
        ? `${length}: equilibrium reachable at ${at}; as made = ${equilibrium}`
        : `${length} (${kinetics.regime}); no reduction potentials tabulated for the pair, so no kinetic expectation: equilibrium shown`;
    return { asMade: equilibrium, afterAnnealing, basis: 'equilibrium', text };
  }
  const lead =
    kinetics.regime === 'equilibrium not reachable'
      ? 'equilibrium not reachable: the as-made structure follows the reduction order'
      : 'partly equilibrated: the as-made structure mostly follows the reduction order';
  return {
    asMade: kinetic.label,
    afterAnnealing,
    basis: 'kinetic',
    text: `${length} at ${at}: ${lead} (${kinetic.text}) → as made ${kinetic.label}; ${equilibrium} after annealing at ≈ ${kinetics.annealingTemperatureK.toFixed(0)} K for ${kinetics.timeH} h (L = r)`,
  };
}

function formatNm(nm: number): string {
  return nm >= 0.01 ? `${nm.toPrecision(2)} nm` : `${nm.toExponential(1)} nm`;
}

/** Public entry point: checks the elements and conditions (DomainError naming the field) and predicts. */
export function predictPair(elementA: string, elementB: string, conditions: PredictionConditions): Prediction {
  if (typeof elementA !== 'string' || !isMetalSymbol(elementA)) getElement(String(elementA), 'elementA');
  if (typeof elementB !== 'string' || !isMetalSymbol(elementB)) getElement(String(elementB), 'elementB');
  const checked = resolveConditions(conditions);
  return predictWithContext(pairContext(elementA, elementB), checked);
}
