import { describe, expect, it } from 'vitest';
import { fitLineScan } from '../../../shared-model/characterization/line-scan-fit';
import { LINE_SCAN_MODELS, type LineScanModelKind } from '../../../shared-model/characterization/chord-profile';
import { domainErrorOf as errorOf } from '../../support/domain-error';
import { monolayerThicknessNm } from '../../../shared-model/geometry/fcc';
import { createRandom } from '../../../shared-model/random';
import { exactBlurredProfiles, positions, syntheticScan, type SyntheticScanSpec } from './synthetic-line-scan';

// Au and Pd lattice constants, 0.4078 and 0.3891 nm (Kittel, ISSP 8th ed., Table 1.3 / 4; from memory).
const LATTICE = { latticeANm: 0.4078, latticeBNm: 0.3891 };
const OPTIONS = { elementA: 'Au', elementB: 'Pd', ...LATTICE };

const RADIUS_NM = 5;
const CORE_RADIUS_NM = 3.5;
const SNR = 8;
const TRIALS_PER_MODEL = 16;
const RADIUS_TOLERANCE_NM = 0.5;
const SHELL_TOLERANCE_NM = 0.8;

function spec(kind: LineScanModelKind, trial: number): SyntheticScanSpec {
  return {
    kind,
    // The particle sits at a different place on the scan in each trial.
    centerNm: 9.6 + 0.05 * (trial % 7),
    radiusNm: RADIUS_NM,
    coreRadiusNm: CORE_RADIUS_NM,
    janusALow: trial % 2 === 0,
    probeSigmaNm: 0.6,
    amplitudeA: 10,
    amplitudeB: 8,
    backgroundA: 5,
    backgroundB: 3,
    positionsNm: positions(0, 20, 0.4),
  };
}

describe('line-scan model fits on synthetic scans', () => {
  it(`BIC picks the generating model in ≥ 95 % of trials at SNR ${SNR} and the fit recovers radius and shell`, () => {
    // Scans of a 10 nm particle (core 7 nm, shell 1.5 nm), probe σ 0.6 nm (fitted), 51 points at 0.4 nm,
    // Gaussian noise of SD = peak net signal / SNR in each channel, seeded.
    const confusion = new Map<string, number>();
    let correct = 0;
    let total = 0;
    let radiusCovered = 0;
    let shellCovered = 0;
    let shellTrials = 0;
    const worst = { radius: 0, shell: 0 };
    for (const kind of LINE_SCAN_MODELS) {
      for (let trial = 0; trial < TRIALS_PER_MODEL; trial++) {
        const s = spec(kind, trial);
        const analysis = fitLineScan(syntheticScan(s, SNR, 7919 * trial + kind.length * 31), OPTIONS);
        const key = `${kind}→${analysis.chosenKind}`;
        confusion.set(key, (confusion.get(key) ?? 0) + 1);
        total++;
        if (analysis.chosenKind === kind) correct++;
        const fit = analysis.models.find((m) => m.model === kind)!;
        const radiusError = Math.abs(fit.radiusNm.value - RADIUS_NM);
        worst.radius = Math.max(worst.radius, radiusError);
        expect(radiusError).toBeLessThan(RADIUS_TOLERANCE_NM);
        if (fit.radiusNm.sd !== null && radiusError <= 3 * fit.radiusNm.sd) radiusCovered++;
        if (fit.shellThicknessNm) {
          shellTrials++;
          const shellError = Math.abs(fit.shellThicknessNm.value - (RADIUS_NM - CORE_RADIUS_NM));
          worst.shell = Math.max(worst.shell, shellError);
          expect(shellError).toBeLessThan(SHELL_TOLERANCE_NM);
          if (fit.shellThicknessNm.sd !== null && shellError <= 3 * fit.shellThicknessNm.sd) shellCovered++;
        }
      }
    }
    const header = ['generated \\ chosen', ...LINE_SCAN_MODELS].map((c) => c.padEnd(20)).join('');
    const lines = LINE_SCAN_MODELS.map((g) =>
      [g, ...LINE_SCAN_MODELS.map((c) => String(confusion.get(`${g}→${c}`) ?? 0))].map((c) => c.padEnd(20)).join(''),
    );
    console.log(
      `Line-scan model choice by BIC, SNR ${SNR}, ${TRIALS_PER_MODEL} trials per model:\n${header}\n${lines.join('\n')}\n` +
        `correct ${correct}/${total}; worst radius error ${worst.radius.toFixed(3)} nm, worst shell error ${worst.shell.toFixed(3)} nm; ` +
        `within 3 reported SD: radius ${radiusCovered}/${total}, shell ${shellCovered}/${shellTrials}`,
    );
    expect(correct / total).toBeGreaterThanOrEqual(0.95);
    // The reported uncertainties should be honest: 3 SD should cover nearly every error.
    expect(radiusCovered / total).toBeGreaterThanOrEqual(0.9);
    expect(shellCovered / shellTrials).toBeGreaterThanOrEqual(0.9);
    // About 7 s on an idle 2-core machine; the generous limit only guards against a loaded one.
  }, 120_000);

  it('reports the chosen model with the pair labels, monolayers and a suggestion', () => {
    const analysis = fitLineScan(syntheticScan(spec('B@A', 1), 30, 5), OPTIONS);
    expect(analysis.chosenModel).toBe('Pd@Au');
    expect(analysis.models.map((m) => m.label)).toEqual(['alloy', 'Au@Pd', 'Pd@Au', 'Janus']);
    const chosen = analysis.models.find((m) => m.label === 'Pd@Au')!;
    // The shell of Pd@Au is Au: monolayers use Au's (111) spacing a/√3.
    expect(chosen.shellMonolayers!.value).toBeCloseTo(
      chosen.shellThicknessNm!.value / monolayerThicknessNm(LATTICE.latticeANm),
      10,
    );
    expect(analysis.suggestion.label).toBe('Pd@Au');
    expect(analysis.analysisVersion).toMatch(/characterization-/);
    expect(analysis.models.reduce((s, m) => s + m.bicWeight, 0)).toBeCloseTo(1, 10);
    expect(chosen.fittedA).toHaveLength(51);
  });

  it('uses a given probe width instead of fitting it', () => {
    const analysis = fitLineScan(syntheticScan(spec('A@B', 2), 20, 8), { ...OPTIONS, probeSigmaNm: 0.6 });
    const fit = analysis.models.find((m) => m.model === 'A@B')!;
    expect(fit.probeFitted).toBe(false);
    expect(fit.probeSigmaNm.value).toBe(0.6);
    expect(analysis.chosenKind).toBe('A@B');
    expect(fit.parameterCount).toBe(analysis.models.find((m) => m.model === 'alloy')!.parameterCount + 1);
  });

  it('handles raw counts with Poisson noise', () => {
    const s = spec('A@B', 0);
    const { a, b } = exactBlurredProfiles(s);
    const rng = createRandom(77);
    // Poisson deviates by inversion (means ≤ ~110 here).
    const poisson = (mean: number) => {
      let k = 0;
      let p = Math.exp(-mean);
      let c = p;
      const u = rng.next();
      while (u > c && k < 1000) {
        k++;
        p *= mean / k;
        c += p;
      }
      return k;
    };
    const scan = {
      positionsNm: s.positionsNm,
      signalA: a.map((v) => poisson(10 * v + 5)),
      signalB: b.map((v) => poisson(8 * v + 3)),
      unit: 'counts' as const,
    };
    const analysis = fitLineScan(scan, OPTIONS);
    expect(analysis.noise.model).toBe('poisson');
    expect(analysis.chosenKind).toBe('A@B');
    const fit = analysis.models.find((m) => m.model === 'A@B')!;
    expect(Math.abs(fit.radiusNm.value - RADIUS_NM)).toBeLessThan(RADIUS_TOLERANCE_NM);
  });
});

describe('line-scan bad input', () => {
  const good = () => syntheticScan(spec('alloy', 0), 20, 3);

  it('an all-zero channel', () => {
    const scan = { ...good(), signalB: good().signalB.map(() => 0) };
    const e = errorOf(() => fitLineScan(scan, OPTIONS));
    expect(e.field).toBe('signalB');
    expect(e.message).toMatch(/Pd channel is zero at every point/);
  });

  it('a scan shorter than the particle', () => {
    const full = good();
    const cut = {
      ...full,
      positionsNm: full.positionsNm.slice(0, 26),
      signalA: full.signalA.slice(0, 26),
      signalB: full.signalB.slice(0, 26),
    };
    expect(errorOf(() => fitLineScan(cut, OPTIONS)).message).toMatch(/shorter than the particle/);
  });

  it('too few points, a flat channel, and at.% normalised to the two metals', () => {
    const full = good();
    const few = {
      ...full,
      positionsNm: full.positionsNm.slice(0, 8),
      signalA: full.signalA.slice(0, 8),
      signalB: full.signalB.slice(0, 8),
    };
    expect(errorOf(() => fitLineScan(few, OPTIONS)).message).toMatch(/at least 12 points/);
    const rng = createRandom(4);
    const flat = { ...full, signalA: full.signalA.map(() => 5 + rng.nextNormal()) };
    expect(errorOf(() => fitLineScan(flat, OPTIONS)).message).toMatch(/Au channel shows no particle signal/);
    const normalised = {
      ...full,
      unit: 'atPercent' as const,
      signalA: full.signalA.map(() => 50),
      signalB: full.signalB.map(() => 50),
    };
    expect(errorOf(() => fitLineScan(normalised, OPTIONS)).message).toMatch(/add up to 100/);
  });
});
