import { describe, expect, it } from 'vitest';
import {
  incompatibilityWarnings,
  standingBenchCautions,
  type TaggedReagent,
} from '../../../shared-model/hazards/incompatibilities';
import { summarizeHazards } from '../../../shared-model/hazards/summary';

const r = (key: string, tags: TaggedReagent['tags'], amountMmol?: number): TaggedReagent => ({
  key,
  name: key,
  tags,
  ...(amountMmol !== undefined ? { amountMmol } : {}),
});
const ids = (list: ReturnType<typeof incompatibilityWarnings>) => list.map((w) => w.id);

describe('incompatible reagents present together', () => {
  it('borohydride with water: caution with the hydrogen upper bound', () => {
    const warnings = incompatibilityWarnings([r('nabh4', ['borohydride'], 0.5), r('water', ['water'])]);
    const w = warnings.find((x) => x.id === 'borohydride-hydrolysis');
    expect(w?.severity).toBe('caution');
    // 4 × 0.5 mmol × 24.4654 L/mol = 48.93 mL
    expect(w?.hydrogenMl).toBeCloseTo(48.931, 2);
    expect(w?.message).toContain('NaBH4 + 2 H2O → NaBO2 + 4 H2');
  });
  it('borohydride with acid: danger', () => {
    const warnings = incompatibilityWarnings([
      r('nabh4', ['borohydride'], 0.5),
      r('hcl', ['acid', 'hydrochloric-acid']),
    ]);
    expect(warnings.find((x) => x.id === 'borohydride-hydrolysis')?.severity).toBe('danger');
  });
  it('borohydride alone (dry, organic solvent) raises nothing', () => {
    expect(ids(incompatibilityWarnings([r('nabh4', ['borohydride'], 0.5)]))).toEqual([]);
  });
  it('ammoniacal silver must not stand', () => {
    expect(ids(incompatibilityWarnings([r('agno3', ['silver-salt', 'oxidizer']), r('nh3', ['ammonia'])]))).toContain(
      'ammoniacal-silver',
    );
    expect(ids(incompatibilityWarnings([r('agno3', ['silver-salt', 'oxidizer'])]))).not.toContain('ammoniacal-silver');
  });
  it('chloroplatinates sensitise', () => {
    expect(ids(incompatibilityWarnings([r('h2ptcl6', ['acid', 'chloroplatinate'])]))).toContain(
      'chloroplatinate-sensitiser',
    );
  });
  it('hydrazine decomposes on Pt or Ni but not on Au alone', () => {
    expect(ids(incompatibilityWarnings([r('n2h4', ['hydrazine'])], { metals: ['Pt', 'Au'] }))).toContain(
      'hydrazine-catalytic-decomposition',
    );
    expect(ids(incompatibilityWarnings([r('n2h4', ['hydrazine'])], { metals: ['Au', 'Ag'] }))).not.toContain(
      'hydrazine-catalytic-decomposition',
    );
  });
  it('heated amines above 100 °C only', () => {
    expect(ids(incompatibilityWarnings([r('ola', ['amine', 'organic'])], { temperatureC: 220 }))).toContain(
      'heated-amine',
    );
    expect(ids(incompatibilityWarnings([r('ola', ['amine', 'organic'])], { temperatureC: 25 }))).not.toContain(
      'heated-amine',
    );
  });
  it('metal carbonyls release CO', () => {
    expect(ids(incompatibilityWarnings([r('feco5', ['carbonyl', 'flammable'])]))).toContain('metal-carbonyl');
  });
  it('nitric with hydrochloric acid: aqua regia, never stoppered', () => {
    const w = incompatibilityWarnings([
      r('hno3', ['acid', 'nitric-acid', 'oxidizer']),
      r('hcl', ['acid', 'hydrochloric-acid']),
    ]).find((x) => x.id === 'aqua-regia');
    expect(w?.severity).toBe('danger');
    expect(w?.message).toMatch(/never stopper/);
  });
  it('harmless reagents raise nothing', () => {
    expect(incompatibilityWarnings([r('ascorbic', []), r('citrate', []), r('water', ['water'])])).toEqual([]);
  });
  it('bench cautions: dry nanopowders and aqua regia glassware', () => {
    expect(standingBenchCautions().map((w) => w.id)).toEqual(['dry-nanopowder', 'aqua-regia-glassware']);
  });
});

describe('hazard summary', () => {
  const summary = summarizeHazards(
    [
      {
        key: 'haucl4',
        name: 'HAuCl4·3H2O',
        hCodes: ['H290', 'H302', 'H314', 'H317', 'H373', 'H411'],
        signalWord: 'Danger',
        tags: ['acid'],
        wasteStream: 'precious-metal-recovery',
      },
      { key: 'aa', name: 'Ascorbic acid', hCodes: [], signalWord: null, tags: [], wasteStream: 'aqueous-general' },
      {
        key: 'eg',
        name: 'Ethylene glycol',
        hCodes: ['H302', 'H373'],
        signalWord: 'Warning',
        tags: ['organic'],
        wasteStream: 'organic-solvent',
      },
    ],
    { metals: ['Au', 'Ag'], aqueous: true, benchCautions: true },
  );
  it('unions the H-codes with the reagents carrying each', () => {
    expect(summary.hazards.map((h) => h.code)).toEqual(['H290', 'H302', 'H314', 'H317', 'H373', 'H411']);
    expect(summary.hazards.find((h) => h.code === 'H302')?.reagents).toEqual(['HAuCl4·3H2O', 'Ethylene glycol']);
  });
  it('takes the strictest signal word and the pictograms of the union', () => {
    expect(summary.signalWord).toBe('Danger');
    expect(summary.pictograms.map((p) => p.code)).toEqual(['GHS05', 'GHS07', 'GHS08', 'GHS09']);
  });
  it('lists waste streams, precious metals for recovery first', () => {
    expect(summary.wasteStreams[0]?.id).toBe('precious-metal-recovery');
    expect(summary.wasteStreams.map((w) => w.id)).toEqual(
      expect.arrayContaining(['organic-solvent', 'aqueous-general']),
    );
  });
  it('carries the standing caution and the per-reagent source note', () => {
    expect(summary.caution).toContain('never replace');
    expect(summary.perReagent[0]?.source).toBe("typical classification, verify with your supplier's SDS");
    expect(summary.warnings.map((w) => w.id)).toContain('dry-nanopowder');
  });
});
