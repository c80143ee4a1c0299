/** `pairwright sizes` and `pairwright linescan` run as child processes on CSV files. */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { fitLogNormal } from '../../shared-model/characterization/lognormal';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { tempDataDir } from '../support/host-fixture';
import { positions, syntheticScan } from '../shared-model/characterization/synthetic-line-scan';

const dir = tempDataDir('pairwright-cli-outcomes-');
const data = ['--data', join(dir, 'store')];

describe('pairwright sizes', () => {
  it('prints the statistics and log-normal fit as JSON', () => {
    const diameters = [4.8, 5.1, 5.3, 5.3, 5.6, 5.9, 6.0, 6.4, 7.2, 8.1];
    const file = join(dir, 'diameters.csv');
    // An export with a BOM, CRLF, a header, semicolons and decimal commas.
    writeFileSync(file, `\uFEFFParticle;Diameter (nm)\r\n${diameters.map((d, i) => `${i + 1};${String(d).replace('.', ',')}`).join('\r\n')}\r\n`);
    const out = runPairwrightJson<{ n: number; meanNm: number; sdNm: number; medianNm: number; cvPercent: number; lognormal: { mu: number; sigma: number } }>(['sizes', file, ...data]);
    expect(out.n).toBe(10);
    const mean = diameters.reduce((s, d) => s + d, 0) / 10;
    expect(out.meanNm).toBeCloseTo(mean, 10);
    expect(out.medianNm).toBeCloseTo(5.75, 10);
    expect(out.cvPercent).toBeCloseTo((100 * out.sdNm) / mean, 10);
    const fit = fitLogNormal(diameters);
    expect(out.lognormal.mu).toBeCloseTo(fit.mu, 10);
    expect(out.lognormal.sigma).toBeCloseTo(fit.sigma, 10);
  });

  it('names the line and value of a malformed row, exit code 2', () => {
    const file = join(dir, 'bad.csv');
    writeFileSync(file, 'd\n5\n6.x\n7\n');
    const run = runPairwright(['sizes', file, ...data]);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/line 3: "6.x"/);
  });
});

describe('pairwright linescan', () => {
  it('chooses the generating model and reports radius, core and shell with per-model BIC', () => {
    const scan = syntheticScan(
      { kind: 'B@A', centerNm: 10, radiusNm: 5, coreRadiusNm: 3.5, probeSigmaNm: 0.6, amplitudeA: 10, amplitudeB: 8, backgroundA: 5, backgroundB: 3, positionsNm: positions(0, 20, 0.4) },
      20,
      42,
    );
    const file = join(dir, 'scan.csv');
    writeFileSync(file, `Position (nm),Au M,Pd L\n${scan.positionsNm.map((x, i) => `${x},${scan.signalA[i]},${scan.signalB[i]}`).join('\n')}\n`);
    const out = runPairwrightJson<{
      chosenModel: string;
      radiusNm: number;
      coreRadiusNm: number;
      shellThicknessNm: number;
      bic: Record<string, number>;
      models: { model: string; bic: number }[];
    }>(['linescan', file, '--pair', 'Au-Pd', ...data]);
    expect(out.chosenModel).toBe('Pd@Au');
    expect(Object.keys(out.bic).sort()).toEqual(['Au@Pd', 'Janus', 'Pd@Au', 'alloy']);
    expect(out.bic['Pd@Au']).toBe(Math.min(...Object.values(out.bic)));
    // Generated with R = 5 nm, core 3.5 nm; SNR 20 (tolerances as in the model tests).
    expect(Math.abs(out.radiusNm - 5)).toBeLessThan(0.5);
    expect(Math.abs(out.coreRadiusNm - 3.5)).toBeLessThan(0.6);
    expect(out.shellThicknessNm).toBeCloseTo(out.radiusNm - out.coreRadiusNm, 10);
    const text = runPairwright(['linescan', file, '--pair', 'Au-Pd', ...data]);
    expect(text.status).toBe(0);
    expect(text.stdout).toMatch(/chosen: Pd@Au/);
  });

  it('refuses a missing --pair and an unknown element', () => {
    const file = join(dir, 'scan.csv');
    expect(runPairwright(['linescan', file, ...data]).stderr).toMatch(/--pair is required/);
    const run = runPairwright(['linescan', file, '--pair', 'Au-Xx', ...data]);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/unknown element "Xx"/);
  });
});
