import { SEGREGATION_CALIBRATION } from '../../../shared-model/prediction/calibration';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import { DEFAULT_THRESHOLDS } from '../../../shared-model/architecture/classify';
import { elementProperty } from '../../../shared-model/elements/element-table';
import { METAL_SYMBOLS } from '../../../shared-model/elements/symbols';
import { conditionsSchema } from '../../../shared-model/api/prediction';
import {
  MODEL_VERSION,
  PREDICTION_DEFAULTS,
  resolveConditions,
  pairContext,
  predictCore,
  predictPair,
  regularSolutionBinodal,
  type PredictionConditions,
} from '../../../shared-model/prediction/predict';
import {
  friedelStrainEnergyEv,
  segregationCoefficients,
  segregationTermsB,
} from '../../../shared-model/prediction/segregation';
import { solveSurfaceEquilibrium } from '../../../shared-model/prediction/surface-equilibrium';

const BASE: PredictionConditions = { xB: 0.5, diameterNm: 3, shape: 'cuboctahedron', temperatureK: 600 };

function fieldOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (error) {
    expect(error).toBeInstanceOf(DomainError);
    return (error as DomainError).field;
  }
  throw new Error('expected a DomainError');
}

describe('predictPair: output', () => {
  it('has the promised fields, finite numbers, and the stored settings', () => {
    const p = predictPair('Ag', 'Pd', BASE);
    for (const key of [
      'pair',
      'surfaceElement',
      'surfaceFraction',
      'enrichment',
      'architecture',
      'confidence',
      'terms',
      'mixingEnthalpyKjPerMol',
      'atoms',
      'surfaceSites',
      'xB',
      'diameterNm',
      'shape',
      'temperatureK',
      'thresholds',
      'modelVersion',
      'flags',
      'reason',
    ]) {
      expect(p, key).toHaveProperty(key);
    }
    expect(p.pair).toBe('Ag-Pd');
    expect(p.modelVersion).toBe(MODEL_VERSION);
    expect(p.thresholds).toEqual(DEFAULT_THRESHOLDS);
    expect(p.terms.surfaceEnergy + p.terms.chemical + p.terms.elastic).toBeCloseTo(p.terms.total, 12);
    expect(p.confidence).toBeGreaterThanOrEqual(0);
    expect(p.confidence).toBeLessThanOrEqual(1);
    expect(Number.isInteger(p.atoms) && Number.isInteger(p.surfaceSites)).toBe(true);
    // JSON carries the reason (built lazily) like any other field
    const json = JSON.parse(JSON.stringify(p)) as { reason: string };
    expect(json.reason).toBe(p.reason);
    expect(p.reason).toMatch(/^Ag to the surface/);
  });

  it('is finite for every pair of the table (no NaN downstream)', () => {
    for (const a of METAL_SYMBOLS) {
      for (const b of METAL_SYMBOLS) {
        if (a >= b) continue;
        const p = predictPair(a, b, { ...BASE, xB: 0.3, diameterNm: 2 });
        for (const value of [
          p.surfaceXB,
          p.coreXB,
          p.enrichment,
          p.confidence,
          p.terms.total,
          p.mixingEnthalpyKjPerMol,
          p.unlikeNeighbourRatio,
          p.segregation.aInB.total,
          p.segregation.bInA.total,
        ]) {
          expect(Number.isFinite(value), `${a}-${b}`).toBe(true);
        }
        expect(p.surfaceXB * p.surfaceSites + 0).toBeGreaterThanOrEqual(0);
      }
    }
  });

  it('does not depend on the order of the pair: (A, B, x) ≡ (B, A, 1 − x)', () => {
    for (const [a, b, x] of [
      ['Ag', 'Pd', 0.3],
      ['Pt', 'Ni', 0.75],
      ['Cu', 'Au', 0.5],
      ['Fe', 'Pt', 0.5],
    ] as const) {
      const ab = predictPair(a, b, { ...BASE, xB: x });
      const ba = predictPair(b, a, { ...BASE, xB: 1 - x });
      expect(ba.surfaceElement).toBe(ab.surfaceElement);
      expect(ba.surfaceFraction).toBeCloseTo(ab.surfaceFraction, 8);
      expect(ba.enrichment).toBeCloseTo(ab.enrichment, 8);
      expect(ba.terms.total).toBeCloseTo(ab.terms.total, 8);
      expect(ba.mixingEnthalpyKjPerMol).toBeCloseTo(ab.mixingEnthalpyKjPerMol, 8);
      expect(ba.segregation.bInA.total).toBeCloseTo(ab.segregation.aInB.total, 10);
    }
  });
});

describe('predictPair: physics checks', () => {
  it('huge particle → the semi-infinite surface (McLean with the bulk at the overall composition)', () => {
    const conditions = resolveConditions({ ...BASE, xB: 0.2, diameterNm: 1e5 });
    const ctx = pairContext('Pd', 'Ag');
    const core = predictCore(ctx, conditions);
    const semi = solveSurfaceEquilibrium({
      xB: 0.2,
      surfaceShare: 0,
      kTEv: core.kT,
      c0: core.k.c0,
      cS: core.k.cS,
      cC: core.k.cC,
    });
    const p = predictPair('Pd', 'Ag', { ...BASE, xB: 0.2, diameterNm: 1e5 });
    expect(p.coreXB).toBeCloseTo(0.2, 4);
    expect(p.surfaceXB).toBeCloseTo(semi.surfaceXB, 4);
  });

  it('T → ∞ → no enrichment', () => {
    for (const [a, b] of [
      ['Pd', 'Ag'],
      ['Pt', 'Au'],
      ['Ni', 'Cu'],
    ] as const) {
      const p = predictPair(a, b, { ...BASE, temperatureK: 1e8 });
      expect(p.enrichment).toBeLessThan(1e-3);
      expect(p.architecture).toBe('alloy');
    }
  });

  it('xB → 0 and xB → 1: finite, and the surface odds ratio tends to the dilute segregation factor', () => {
    const kT = 8.617333262e-5 * 600; // CODATA Boltzmann constant in eV/K
    for (const x of [1e-9, 1e-6, 1 - 1e-6, 1 - 1e-9]) {
      const p = predictPair('Pd', 'Ag', { ...BASE, xB: x, diameterNm: 1e3 });
      expect(Number.isFinite(p.surfaceXB) && Number.isFinite(p.enrichment)).toBe(true);
    }
    const dilute = predictPair('Pd', 'Ag', { ...BASE, xB: 1e-9, diameterNm: 1e3 });
    const ratio = Math.log(dilute.surfaceXB / (1 - dilute.surfaceXB) / (dilute.coreXB / (1 - dilute.coreXB)));
    expect(ratio).toBeCloseTo(-dilute.segregation.bInA.total / kT, 2);
  });

  it('small particles deplete their core (DOMAIN.md Models 3)', () => {
    const cores = [1.5, 2, 3, 5, 10, 50].map(
      (d) => predictPair('Pd', 'Ag', { ...BASE, xB: 0.2, diameterNm: d }).coreXB,
    );
    for (let i = 1; i < cores.length; i++) expect(cores[i] as number).toBeGreaterThan(cores[i - 1] as number);
    expect(cores[0] as number).toBeLessThan(0.05);
  });

  it('dilute terms are the Wynblatt–Ku expression evaluated by hand', () => {
    const p = predictPair('Pt', 'Au', BASE);
    // surface-energy term (γ_Au − γ_Pt)·σ(111) of Pt, σ = √3 a²/4, 1 eV = 1.602176634e-19 J
    const a = elementProperty('Pt', 'latticeConstantAngstrom') * 1e-10;
    const sigma = (Math.sqrt(3) / 4) * a * a;
    // every term carries the calibration factor s (calibration.ts: fitted to EAM slab energies)
    const s = SEGREGATION_CALIBRATION.scale;
    expect(p.calibrationScale).toBe(s);
    const expected =
      ((elementProperty('Au', 'surfaceEnergyJPerM2') - elementProperty('Pt', 'surfaceEnergyJPerM2')) * sigma) /
      1.602176634e-19;
    expect(p.segregation.bInA.surfaceEnergy).toBeCloseTo(s * expected, 10);
    // Au is larger than Pt: Friedel strain relief applies, −E_el(Au in Pt)
    expect(p.segregation.bInA.elastic).toBeCloseTo(-s * friedelStrainEnergyEv('Pt', 'Au'), 12);
    // Pt is smaller than Au: no strain relief for Pt at the Au surface under the default rule
    expect(Math.abs(p.segregation.aInB.elastic)).toBe(0);
  });

  it("Friedel's strain energy matches the formula written out (Wynblatt & Ku 1977): Ag in Ni", () => {
    const K = elementProperty('Ag', 'bulkModulusGpa') * 1e9; // bulk modulus of the solute
    const G = elementProperty('Ni', 'shearModulusGpa') * 1e9; // shear modulus of the host
    const rA = elementProperty('Ni', 'metallicRadiusAngstrom') * 1e-10;
    const rB = elementProperty('Ag', 'metallicRadiusAngstrom') * 1e-10;
    const joules = (24 * Math.PI * K * G * rA * rB * (rA - rB) ** 2) / (3 * K * rB + 4 * G * rA);
    expect(friedelStrainEnergyEv('Ni', 'Ag')).toBeCloseTo(joules / 1.602176634e-19, 12);
    expect(friedelStrainEnergyEv('Ni', 'Ag')).toBeGreaterThan(0.2);
    expect(friedelStrainEnergyEv('Ni', 'Ag')).toBeLessThan(0.5);
  });

  it('the composition-dependent enthalpy joins the two dilute limits: ΔH_B(1, 1) = −ΔH_A(dilute)', () => {
    const k = segregationCoefficients({
      gammaAJPerM2: 2.0,
      gammaBJPerM2: 1.2,
      latticeNm: 0.4,
      facet: '111',
      omegaEv: 0.02,
      strainBinAEv: 0.1,
      strainAinBEv: 0.05,
    });
    const kReverse = segregationCoefficients({
      gammaAJPerM2: 1.2,
      gammaBJPerM2: 2.0,
      latticeNm: 0.4,
      facet: '111',
      omegaEv: 0.02,
      strainBinAEv: 0.05,
      strainAinBEv: 0.1,
    });
    expect(segregationTermsB(k, 1, 1).totalEv).toBeCloseTo(-segregationTermsB(kReverse, 0, 0).totalEv, 12);
    // ω > 0: a B-rich surface layer attracts more B (lateral like-bonds), ΔH falls as x_s rises
    expect(segregationTermsB(k, 0.8, 0.2).chemicalEv).toBeLessThan(segregationTermsB(k, 0.2, 0.2).chemicalEv);
  });

  it('rules of the trade: Ag, Au and Pb cover strongly bound, small-atom partners (common practice)', () => {
    for (const [core, shell] of [
      ['Pt', 'Ag'],
      ['Pd', 'Au'],
      ['Ni', 'Ag'],
      ['Cu', 'Pb'],
      ['Pt', 'Au'],
      ['Ir', 'Ag'],
      ['Rh', 'Au'],
    ] as const) {
      const p = predictPair(core, shell, { ...BASE, xB: 0.3 });
      expect(p.surfaceElement, `${core}-${shell}`).toBe(shell);
    }
  });

  it('regular-solution binodal: ½ at τ = 2, symmetric gap closing, x_b ≈ e^(−τ) for large τ', () => {
    expect(regularSolutionBinodal(1.9)).toBe(0.5);
    expect(regularSolutionBinodal(2.0001)).toBeGreaterThan(0.45);
    const x = regularSolutionBinodal(3);
    expect(Math.log((1 - x) / x)).toBeCloseTo(3 * (1 - 2 * x), 10);
    expect(regularSolutionBinodal(20)).toBeCloseTo(Math.exp(-20), 12);
  });
});

describe('predictPair: classification settings and confidence', () => {
  it('uses the thresholds it is given and stores them with the result', () => {
    const strict = { ...DEFAULT_THRESHOLDS, coreShellEnrichment: 0.999 };
    const normal = predictPair('Pt', 'Au', { ...BASE, xB: 0.3 });
    const withStrict = predictPair('Pt', 'Au', { ...BASE, xB: 0.3, thresholds: strict });
    expect(normal.architecture).toBe('Pt@Au');
    expect(withStrict.architecture).not.toBe('Pt@Au');
    expect(withStrict.thresholds).toEqual(strict);
  });

  it('flags non-fcc elements and tiny particles and lowers the confidence', () => {
    const fcc = predictPair('Pt', 'Pd', BASE);
    const bcc = predictPair('Fe', 'Pd', BASE);
    expect(fcc.flags.some((f) => f.includes('bcc'))).toBe(false);
    expect(bcc.flags.some((f) => f.includes('Fe is bcc'))).toBe(true);
    const tiny = predictPair('Pt', 'Pd', { ...BASE, diameterNm: 1 });
    expect(tiny.flags.some((f) => f.includes('atoms'))).toBe(true);
    expect(tiny.confidence).toBeLessThan(
      predictPair('Pt', 'Pd', { ...BASE, diameterNm: 1, temperatureK: 600 }).confidence + 1e-12,
    );
  });

  it('Janus and intermetallic labels come from the mixing tendency (quasi-chemical / miscibility gap)', () => {
    // Ag–Ni demixes strongly (Miedema ΔHmix > 0): unlike neighbours far below random
    expect(predictPair('Ni', 'Ag', BASE).unlikeNeighbourRatio).toBeLessThan(0.6);
    // Pt–Sn orders (ΔHmix ≪ 0): unlike neighbours above random and label intermetallic when the surface is not a shell
    const ptSn = predictPair('Pt', 'Sn', BASE);
    expect(ptSn.unlikeNeighbourRatio).toBeGreaterThan(1.35);
    expect(ptSn.architecture).toBe('intermetallic');
    // Warren–Cowley α = 1 − (unlike fraction / random unlike fraction): negative for ordering, positive for clustering
    expect(ptSn.warrenCowleyAlpha).toBeCloseTo(1 - ptSn.unlikeNeighbourRatio, 12);
    expect(ptSn.warrenCowleyAlpha).toBeLessThan(0);
    expect(predictPair('Ni', 'Ag', BASE).warrenCowleyAlpha).toBeGreaterThan(0);
  });
});

describe('predictPair: bad input names the field', () => {
  it.each([
    [() => predictPair('Xx', 'Pd', BASE), 'elementA'],
    [() => predictPair('Pd', 'Qq', BASE), 'elementB'],
    [() => predictPair('Pd', 'Pd', BASE), 'elementB'],
    [() => predictPair('Ag', 'Pd', { ...BASE, xB: 0 }), 'xB'],
    [() => predictPair('Ag', 'Pd', { ...BASE, xB: 1 }), 'xB'],
    [() => predictPair('Ag', 'Pd', { ...BASE, xB: Number.NaN }), 'xB'],
    [() => predictPair('Ag', 'Pd', { ...BASE, xB: '0.5' as never }), 'xB'],
    [() => predictPair('Ag', 'Pd', { ...BASE, diameterNm: 0 }), 'diameterNm'],
    [() => predictPair('Ag', 'Pd', { ...BASE, diameterNm: -2 }), 'diameterNm'],
    [() => predictPair('Ag', 'Pd', { ...BASE, temperatureK: 0 }), 'temperatureK'],
    [() => predictPair('Ag', 'Pd', { ...BASE, temperatureK: Number.POSITIVE_INFINITY }), 'temperatureK'],
    [() => predictPair('Ag', 'Pd', { ...BASE, shape: 'cube' as never }), 'shape'],
    [() => predictPair('Ag', 'Pd', { ...BASE, facet: '110' as never }), 'facet'],
    [() => predictPair('Ag', 'Pd', { ...BASE, diameterNm: 0.2 }), 'diameterNm'],
  ])('case %#', (fn, field) => {
    expect(fieldOf(fn)).toBe(field);
  });
});

describe('prediction conditions: one set of defaults', () => {
  it('the contract fills the settings a caller leaves out from PREDICTION_DEFAULTS, as the model does', () => {
    const { xB, diameterNm, temperatureK } = PREDICTION_DEFAULTS;
    const fromContract = conditionsSchema.parse({ xB, diameterNm, temperatureK });
    expect(fromContract).toEqual(PREDICTION_DEFAULTS);
    expect(resolveConditions({ xB, diameterNm, temperatureK, shape: PREDICTION_DEFAULTS.shape })).toEqual(fromContract);
  });
});
