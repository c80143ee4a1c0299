/**
 * Predictions under the conditions of a flask (issue: environment, Janus, oxidation, kinetics, confidence).
 * The adsorbate reversals are facts of the field, reproduced from the stated parameters of environment.ts
 * (they are not tuning targets); sources named beside each, from memory.
 */
import { describe, expect, it } from 'vitest';
import {
  arrheniusDiffusivity,
  diffusionLengthNm,
  interdiffusionEstimate,
  selfDiffusionParameters,
} from '../../../shared-model/prediction/diffusion';
import { adsorbateTerm, langmuirCoverage } from '../../../shared-model/prediction/environment';
import { pairContext, predictPair, type PredictionConditions } from '../../../shared-model/prediction/predict';
import { qualifiesFor, rankPairs } from '../../../shared-model/prediction/rank';

const AT: PredictionConditions = { xB: 0.5, diameterNm: 4, shape: 'cuboctahedron', temperatureK: 400 };

describe('adsorbate-induced segregation (environment)', () => {
  it('Langmuir coverage by hand: H on Pt(111) at 600 K, 1 bar H₂ (dissociative)', () => {
    // ΔG = 2·(−0.3 eV) + T·S°(H₂) = −0.6 + 600 × 130.68 / 96485.33 = 0.21265 eV; kT = 0.051704 eV
    // ln(Kp) = −4.1128; odds = exp(½ ln Kp) = 0.12790; θ = 0.12790 / 1.12790 = 0.1134 (θ_sat = 1)
    expect(langmuirCoverage('H2', -0.3, 600, 1)).toBeCloseTo(0.1134, 3);
    // CO is molecular with θ_sat = 0.5: on Pd at 300 K, ΔG = −1.6 + 0.6146 eV ≪ 0 → saturated
    expect(langmuirCoverage('CO', -1.6, 300, 1)).toBeCloseTo(0.5, 6);
  });

  it('vacuum adds nothing: the default equals an explicit vacuum', () => {
    const bare = predictPair('Ag', 'Pd', AT);
    const vacuum = predictPair('Ag', 'Pd', { ...AT, environment: 'vacuum' });
    expect(vacuum.surfaceXB).toBe(bare.surfaceXB);
    expect(Math.abs(bare.terms.adsorbate)).toBe(0);
    expect(bare.environment).toBe('vacuum');
  });

  // Ag–Pd: Ag segregates in vacuum and Pd comes out under CO (e.g. Soto-Verdugo & Metiu, Surf. Sci. 601,
  // 5332 (2007), DFT) and under H₂ (Pd–Ag membranes: Svenum et al., Catal. Today 193, 111 (2012)); from memory
  it('Ag–Pd: Ag outside in vacuum, Pd outside under CO and under H₂', () => {
    expect(predictPair('Ag', 'Pd', AT).surfaceElement).toBe('Ag');
    for (const environment of ['CO', 'H2'] as const) {
      const p = predictPair('Ag', 'Pd', { ...AT, environment });
      expect(p.surfaceElement, environment).toBe('Pd');
      expect(p.adsorbate.drawnOut, environment).toBe('Pd');
      expect(p.terms.adsorbate, environment).toBeLessThan(0);
    }
  });

  // Au–Pd: CO draws Pd to the surface of Au–Pd (Gao, Wang & Goodman, J. Phys. Chem. C 113, 14993 (2009),
  // IR of CO on Au–Pd/Mo(110)); from memory
  it('Au–Pd: Au outside in vacuum, Pd outside under CO', () => {
    expect(predictPair('Au', 'Pd', AT).surfaceElement).toBe('Au');
    expect(predictPair('Au', 'Pd', { ...AT, environment: 'CO' }).surfaceElement).toBe('Pd');
  });

  // Pt alloys in oxygen: the oxophilic metal comes out (Mayrhofer et al., Angew. Chem. 47, 3588 (2008)
  // for Pt–Co; Pt–Ni in O₂: Menning & Chen, J. Chem. Phys. 128, 164703 (2008)); from memory
  it('Pt–Co and Pt–Ni in O₂: Co and Ni come to the surface; not so in vacuum', () => {
    const warm = { ...AT, temperatureK: 600 };
    for (const other of ['Co', 'Ni']) {
      expect(predictPair('Pt', other, warm).surfaceElement, `${other} vacuum`).toBe('Pt');
      expect(predictPair('Pt', other, { ...warm, environment: 'O2' }).surfaceElement, `${other} O2`).toBe(other);
    }
  });

  it('says so when an element has no adsorption energy, and leaves the term out', () => {
    const t = adsorbateTerm('Al', 'Pt', 'CO', 400, 1);
    expect(t.termBEv).toBe(0);
    expect(t.missing).toMatch(/no CO adsorption energy tabulated for Al/);
    expect(predictPair('Al', 'Pt', { ...AT, environment: 'CO' }).flags.join(' ')).toMatch(/adsorbate term left out/);
  });
});

describe('wetting: Janus or core@shell for demixing pairs', () => {
  it('Ag–Ni, Ag–Cu and Au–Ni: the low-surface-energy element wets (core@shell), S and its terms shown', () => {
    for (const [core, shell] of [
      ['Ni', 'Ag'],
      ['Cu', 'Ag'],
      ['Ni', 'Au'],
    ] as const) {
      for (const diameterNm of [4, 10, 30]) {
        const p = predictPair(shell, core, { ...AT, diameterNm });
        expect(p.wetting, `${shell}-${core}`).not.toBeNull();
        const w = p.wetting!;
        expect(w.shell).toBe(shell);
        expect(w.spreadingJPerM2).toBeCloseTo(w.gammaCoreJPerM2 - w.gammaShellJPerM2 - w.interfaceJPerM2, 12);
        expect(w.verdict).toBe('core@shell');
        expect(p.architecture).toBe(`${core}@${shell}`);
        expect(p.reason).toMatch(/S = γ/);
      }
    }
  });

  it('broken-bond interface energy by hand: Ag–Ni chemical part 3ω/σ', () => {
    const w = predictPair('Ag', 'Ni', AT).wetting!;
    // σ = √3 a²/4 at the mean lattice constant of Ag (4.0853 Å) and Ni (3.5240 Å)
    const a = 0.5 * (4.0853 + 3.524) * 1e-10;
    const sigma = (Math.sqrt(3) / 4) * a * a;
    const ctx = pairContext('Ag', 'Ni');
    const omegaEv = 0.5 * (ctx.omegaDiluteBinAEv + ctx.omegaDiluteAinBEv);
    expect(w.interfaceChemicalJPerM2).toBeCloseTo((3 * omegaEv * 1.602176634e-19) / sigma, 10);
    expect(w.interfaceChemicalJPerM2).toBeGreaterThan(0.2);
    expect(w.interfaceChemicalJPerM2).toBeLessThan(1.0); // Porter & Easterling: interfaces 0.2–1 J/m² (from memory)
  });

  it('Ag–Pd and Au–Pd are never Janus (they mix), at any size or temperature', () => {
    for (const pair of [
      ['Ag', 'Pd'],
      ['Au', 'Pd'],
    ] as const) {
      for (const diameterNm of [2, 4, 10, 30]) {
        for (const temperatureK of [300, 450, 600, 900]) {
          for (const environment of ['vacuum', 'CO'] as const) {
            const p = predictPair(pair[0], pair[1], { ...AT, diameterNm, temperatureK, environment });
            expect(p.architectureKind, `${pair.join('-')} ${diameterNm} nm ${temperatureK} K`).not.toBe('Janus');
          }
        }
      }
    }
  });

  it('rank --target Janus lists only pairs whose spreading coefficient is negative, with the reason', () => {
    const rows = rankPairs('all', 'Janus', { ...AT, temperatureK: 600 });
    const qualifying = rows.filter((r) => qualifiesFor({ kind: 'Janus' }, r.prediction));
    expect(qualifying.length).toBeGreaterThan(0);
    for (const row of qualifying) {
      expect(row.prediction.wetting?.spreadingJPerM2).toBeLessThan(0);
      expect(row.prediction.reason).toMatch(/partial wetting, Janus/);
    }
    expect(qualifying.map((r) => r.pair)).not.toContain('Ag-Pd');
  });
});

describe('oxidation in air or water (oxide formation enthalpy per O atom, CRC / NIST-JANAF)', () => {
  it('Cu, Co, Fe, Ni, Al, Pb, Sn, Zn oxidise; Pt, Au, Pd, Ag do not at room temperature', () => {
    // CRC Handbook ΔfH° (from memory): Cu₂O −168.6, NiO −239.7, CoO −237.9, PbO −219.0 kJ/mol;
    // Al₂O₃ −1675.7/3 = −558.6; Fe₃O₄ −1118.4/4 = −279.6; SnO₂ −577.6/2 = −288.8; ZnO −350.5
    const cases: Array<[string, string]> = [
      ['Cu', 'Pt'],
      ['Co', 'Au'],
      ['Fe', 'Pd'],
      ['Ni', 'Ag'],
      ['Al', 'Pt'],
      ['Pb', 'Au'],
      ['Sn', 'Pt'],
      ['Zn', 'Au'],
    ];
    for (const [base, noble] of cases) {
      const p = predictPair(base, noble, AT);
      expect(p.oxidation.oxidisingInAir, base).toEqual([base]);
      expect(p.oxidation.summary, base).not.toBe('');
    }
    const cu = predictPair('Cu', 'Pt', AT).oxidation.elements.find((e) => e.element === 'Cu')!;
    expect(cu.formationKjPerMolO).toBeCloseTo(-168.6, 1);
    expect(predictPair('Ag', 'Au', AT).oxidation.oxidisingInAir).toEqual([]);
    expect(predictPair('Pd', 'Pt', AT).oxidation.oxidisingInAir).toEqual([]);
  });

  it('a Cu shell in O₂ is flagged as an oxide shell on a metal core', () => {
    const p = predictPair('Pt', 'Cu', { ...AT, environment: 'O2' });
    expect(p.flags.join(' ')).toMatch(/oxide/);
  });
});

describe('kinetics: interdiffusion length against the radius', () => {
  it('Au in Au for 1 h: 423 K gives 2.3 pm, 600 K gives 3.9 nm (worked by hand)', () => {
    // Au self-diffusion D₀ = 0.107 cm²/s, Q = 177 kJ/mol (Mehrer 2007, from memory); R = 8.314462618
    // 423 K: Q/RT = 177000 / 3517.02 = 50.327; D = 1.07e-5 × e^−50.327 = 1.07e-5 × 1.391e-22 = 1.488e-27 m²/s
    //        L = √(1.488e-27 × 3600) = 2.31e-12 m
    // 600 K: Q/RT = 35.480; D = 1.07e-5 × 3.901e-16 = 4.174e-21 m²/s; L = √(1.503e-17) = 3.88e-9 m
    const au = selfDiffusionParameters('Au');
    expect(diffusionLengthNm(arrheniusDiffusivity(au, 423), 1)).toBeCloseTo(2.31e-3, 4);
    expect(diffusionLengthNm(arrheniusDiffusivity(au, 600), 1) / 3.88).toBeCloseTo(1, 2);
    // the pair estimate with both elements Au is the same self-diffusion (Darken: x_B·D + x_A·D = D)
    const cold = interdiffusionEstimate('Au', 'Au', 0.5, 10, 423, 1);
    expect(cold.lengthNm).toBeCloseTo(2.31e-3, 4);
    expect(cold.regime).toBe('equilibrium not reachable');
  });

  it('Au–Pd made at 300 K: as made by the reduction order (Au@Pd), Pd@Au only after annealing', () => {
    const p = predictPair('Au', 'Pd', { ...AT, temperatureK: 300, timeH: 2 });
    expect(p.architecture).toBe('Pd@Au');
    expect(p.verdicts.basis).toBe('kinetic');
    expect(p.verdicts.asMade).toBe('Au@Pd');
    expect(p.verdicts.afterAnnealing).toBe('Pd@Au');
    expect(p.verdicts.text).toMatch(/equilibrium not reachable: the as-made structure follows the reduction order/);
    expect(p.kinetics.annealingTemperatureK).toBeGreaterThan(300);
    // at the annealing temperature for the same time the length reaches the radius
    const annealed = predictPair('Au', 'Pd', { ...AT, temperatureK: p.kinetics.annealingTemperatureK, timeH: 2 });
    expect(annealed.kinetics.ratio).toBeCloseTo(1, 6);
    expect(annealed.verdicts.basis).toBe('equilibrium');
  });
});

describe('honest confidence: surface-energy differences within the scatter between sources', () => {
  it('the near-degenerate pairs are uncertain and show both sources; Pt–Au is not', () => {
    for (const [a, b] of [
      ['Ir', 'Ru'],
      ['Co', 'Pt'],
      ['Fe', 'Pt'],
      ['Ni', 'Co'],
      ['Ni', 'Fe'],
      ['Cu', 'Pd'],
      ['Re', 'W'],
    ]) {
      const p = predictPair(a!, b!, AT);
      expect(p.certainty.uncertain, `${a}-${b}`).toBe(true);
      expect(p.certainty.sources.second, `${a}-${b}`).not.toBeNull();
      expect(p.flags.join(' '), `${a}-${b}`).toMatch(/uncertain: .*Tyson & Miller.*Vitos/);
      expect(p.confidence).toBeLessThanOrEqual(0.5);
    }
    const clear = predictPair('Pt', 'Au', AT);
    expect(clear.certainty.uncertain).toBe(false);
  });
});
