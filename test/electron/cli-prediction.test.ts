/** `pairwright elements`, `predict` and `rank` run as child processes. */
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { ElementTableResult, RankResult } from '../../shared-model/api/prediction';
import type { Prediction } from '../../shared-model/prediction/predict';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { tempDataDir } from '../support/host-fixture';

const data = ['--data', join(tempDataDir('pairwright-cli-prediction-'), 'store')];

describe('pairwright prediction commands', () => {
  it('elements --json lists 30 metals with sources', () => {
    const out = runPairwrightJson<ElementTableResult>(['elements', ...data]);
    expect(out.elements).toHaveLength(30);
    expect(out.elements.find((e) => e.symbol === 'Pt')?.surfaceEnergyJPerM2).toBe(2.489); // Tyson & Miller (1977), from memory
    expect(out.sources.length).toBeGreaterThanOrEqual(9);
  });

  it('predict Ag-Pd --json gives the promised fields', () => {
    const p = runPairwrightJson<Prediction>([
      'predict',
      'Ag-Pd',
      '--xB',
      '0.5',
      '--diameter-nm',
      '3',
      '--shape',
      'cuboctahedron',
      '--temperature-k',
      '600',
      ...data,
    ]);
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
      'reason',
    ]) {
      expect(p, key).toHaveProperty(key);
    }
    expect(p.surfaceElement).toBe('Ag');
    expect(Object.keys(p.terms).sort()).toEqual(['adsorbate', 'chemical', 'elastic', 'surfaceEnergy', 'total']);
  });

  it('rank --elements … --target alloy --json lists only the pairs predicted to stay alloyed, out of 21', () => {
    const out = runPairwrightJson<RankResult>([
      'rank',
      '--elements',
      'Pt,Pd,Au,Ag,Ni,Cu,Co',
      '--target',
      'alloy',
      ...data,
    ]);
    expect(out.ranked).toBe(21);
    expect(out.rows).toHaveLength(out.meeting);
    expect(out.rows[0]?.rank).toBe(1);
    for (const row of out.rows) expect(['alloy', 'surface-enriched alloy']).toContain(row.prediction.architectureKind);
    expect(out.missing).toEqual([]);
    expect(out.target).toBe('alloy');
  });

  it('rank --target core@shell:Au lists only Au-shelled pairs; --all adds the rest, marked with why', () => {
    const args = ['rank', '--elements', 'Pt,Pd,Au,Ag,Ni,Cu,Co', '--target', 'core@shell:Au', ...data];
    const out = runPairwrightJson<RankResult>(args);
    expect(out.rows.length).toBeGreaterThan(0);
    for (const row of out.rows) expect(row.prediction.surfaceElement).toBe('Au');
    expect(out.missing).toEqual([]);
    const all = runPairwrightJson<RankResult>([...args, '--all']);
    expect(all.rows.length + all.missing.length).toBe(21);
    expect(all.missing.find((row) => row.prediction.pair === 'Au-Ag')?.miss).toBe('Ag goes to the surface, not Au');
    const text = runPairwright([...args, '--all']);
    expect(text.stdout).toMatch(/\d+ of 21 pairs meet the target/);
    expect(text.stdout).toMatch(/Not meeting core@shell with Au in the shell:/);
  });

  it('rank --target core@shell:Pt: none of the seven meets it; says so and shows the closest three', () => {
    const run = runPairwright(['rank', '--elements', 'Pt,Pd,Au,Ag,Ni,Cu,Co', '--target', 'core@shell:Pt', ...data]);
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/0 of 21 pairs meet the target/);
    expect(run.stdout).toMatch(/No pair meets core@shell with Pt in the shell; the closest:/);
    const out = runPairwrightJson<RankResult>([
      'rank',
      '--elements',
      'Pt,Pd,Au,Ag,Ni,Cu,Co',
      '--target',
      'core@shell:Pt',
      ...data,
    ]);
    expect(out.rows).toEqual([]);
    expect(out.missing).toHaveLength(3);
  });

  it('human output for predict names the surface element and the terms', () => {
    const run = runPairwright(['predict', 'Pt-Au', '--xB', '0.3', ...data]);
    expect(run.status).toBe(0);
    expect(run.stdout).toMatch(/surface element\s+Au/);
    expect(run.stdout).toMatch(/surface energy/);
  });

  it('predict --environment CO --time-h: Pd comes out of Ag–Pd; the as-made verdict and the terms are printed', () => {
    const p = runPairwrightJson<Prediction>([
      'predict',
      'Ag-Pd',
      '--environment',
      'CO',
      '--temperature-k',
      '350',
      '--time-h',
      '2',
      ...data,
    ]);
    expect(p.environment).toBe('CO');
    expect(p.timeH).toBe(2);
    expect(p.surfaceElement).toBe('Pd'); // CO draws Pd out of Ag–Pd (see test/shared-model/prediction/flask-conditions.test.ts)
    const run = runPairwright(['predict', 'Ag-Pd', '--environment', 'CO', '--temperature-k', '350', ...data]);
    expect(run.stdout).toMatch(/adsorbate\s+CO: E_ads/);
    expect(run.stdout).toMatch(/equilibrium not reachable: the as-made structure follows the reduction order/);
  });

  it('rank --target Janus --environment vacuum lists only qualifying pairs, each with its spreading coefficient', () => {
    const out = runPairwrightJson<RankResult>([
      'rank',
      '--target',
      'Janus',
      '--environment',
      'vacuum',
      '--temperature-k',
      '600',
      '--diameter-nm',
      '4',
      ...data,
    ]);
    expect(out.rows.length).toBeGreaterThan(0);
    for (const row of out.rows) {
      expect(row.prediction.architectureKind).toBe('Janus');
      expect(row.prediction.reason).toMatch(/partial wetting, Janus: S = /);
    }
  });

  it.each([
    [['predict', 'Ag-Pd', '--environment', 'N2'], /environment must be .*\(option --environment\)/],
    [['predict', 'Ag-Pd', '--time-h', '0'], /time \(h\) must be .*\(option --time-h\)/],
    [['predict', 'Ag-Pd', '--xB', '1.5'], /composition must lie .*\(option --xB\)/],
    [['predict', 'Ag-Ag'], /two different elements/],
    [['predict', 'Ag-Xx'], /unknown element "Xx"/],
    [['predict', 'Ag-Pd', '--diameter-nm', 'abc'], /--diameter-nm must be a number/],
    [['predict', 'Ag-Pd', '--temperature-k=-3'], /temperature \(K\) must .*\(option --temperature-k\)/],
    [['rank', '--elements', 'Pt,Qq'], /unknown element "Qq"/],
    [['rank', '--target', 'hollow'], /target/],
  ])('bad input %j → one line, exit code 2', (args, message) => {
    const run = runPairwright([...args, ...data]);
    expect(run.status).toBe(2);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
    expect(run.stderr).toMatch(message);
  });
});
