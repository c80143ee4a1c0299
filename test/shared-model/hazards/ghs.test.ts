import { describe, expect, it } from 'vitest';
import {
  HAZARD_STATEMENTS,
  minimumSignalWord,
  PICTOGRAMS,
  pictogramsFor,
  sortHCodes,
  STANDING_CAUTION,
  strictestSignalWord,
} from '../../../shared-model/hazards/ghs';
import { REAGENT_SEED } from '../../../shared-model/recipes/reagent-seed';

/**
 * UN GHS (Rev. 9, 2021), Annex 3, Tables A3.1.1–A3.1.3: hazard statement texts, written out here from
 * the Annex (the conditional clauses in angle brackets left out). Cross-read against public
 * transcriptions of the Annex; the wording "long lasting" (no hyphen) and "oxidizer" follow the UN text.
 */
const ANNEX_3: Record<string, string> = {
  H225: 'Highly flammable liquid and vapour',
  H226: 'Flammable liquid and vapour',
  H228: 'Flammable solid',
  H260: 'In contact with water releases flammable gases which may ignite spontaneously',
  H272: 'May intensify fire; oxidizer',
  H290: 'May be corrosive to metals',
  H301: 'Toxic if swallowed',
  H302: 'Harmful if swallowed',
  H304: 'May be fatal if swallowed and enters airways',
  H311: 'Toxic in contact with skin',
  H312: 'Harmful in contact with skin',
  H314: 'Causes severe skin burns and eye damage',
  H315: 'Causes skin irritation',
  H317: 'May cause an allergic skin reaction',
  H318: 'Causes serious eye damage',
  H319: 'Causes serious eye irritation',
  H330: 'Fatal if inhaled',
  H331: 'Toxic if inhaled',
  H332: 'Harmful if inhaled',
  H334: 'May cause allergy or asthma symptoms or breathing difficulties if inhaled',
  H335: 'May cause respiratory irritation',
  H341: 'Suspected of causing genetic defects',
  H350: 'May cause cancer',
  H351: 'Suspected of causing cancer',
  H360: 'May damage fertility or the unborn child',
  H361: 'Suspected of damaging fertility or the unborn child',
  H370: 'Causes damage to organs',
  H372: 'Causes damage to organs through prolonged or repeated exposure',
  H373: 'May cause damage to organs through prolonged or repeated exposure',
  H400: 'Very toxic to aquatic life',
  H410: 'Very toxic to aquatic life with long lasting effects',
  H411: 'Toxic to aquatic life with long lasting effects',
  H412: 'Harmful to aquatic life with long lasting effects',
};

describe('H-statement texts vs UN GHS Annex 3', () => {
  it.each(Object.keys(HAZARD_STATEMENTS))('%s', (code) => {
    expect(ANNEX_3[code], `no Annex 3 reference text written for ${code}`).toBeDefined();
    expect(HAZARD_STATEMENTS[code]?.text).toBe(ANNEX_3[code]);
  });

  it('every code used by the catalog has its Annex 3 text', () => {
    const used = new Set(REAGENT_SEED.flatMap((r) => r.hCodes));
    for (const code of used) expect(HAZARD_STATEMENTS[code]?.text, code).toBe(ANNEX_3[code]);
  });

  it('the route-conditional statements carry their qualifier', () => {
    expect(HAZARD_STATEMENTS.H350?.qualifier).toContain('route of exposure');
    expect(HAZARD_STATEMENTS.H372?.qualifier).toContain('organs affected');
  });
});

describe('pictograms (UN GHS 1.4.10.4.3 precedence)', () => {
  it('nine codes with their names', () => {
    expect(Object.keys(PICTOGRAMS)).toEqual([
      'GHS01',
      'GHS02',
      'GHS03',
      'GHS04',
      'GHS05',
      'GHS06',
      'GHS07',
      'GHS08',
      'GHS09',
    ]);
    expect(PICTOGRAMS.GHS06).toBe('Skull and crossbones');
  });
  it('silver nitrate: oxidizer, corrosion, environment', () => {
    expect(pictogramsFor(['H272', 'H290', 'H314', 'H410'])).toEqual(['GHS03', 'GHS05', 'GHS09']);
  });
  it('skull and crossbones replaces the exclamation mark for acute toxicity only', () => {
    expect(pictogramsFor(['H301', 'H302'])).toEqual(['GHS06']);
    expect(pictogramsFor(['H301', 'H335'])).toEqual(['GHS06', 'GHS07']);
  });
  it('corrosion replaces the exclamation mark for skin/eye irritation', () => {
    expect(pictogramsFor(['H314', 'H319'])).toEqual(['GHS05']);
  });
  it('respiratory sensitisation replaces it for skin sensitisation', () => {
    expect(pictogramsFor(['H317', 'H334'])).toEqual(['GHS08']);
    expect(pictogramsFor(['H317'])).toEqual(['GHS07']);
  });
  it('H412 carries no pictogram', () => {
    expect(pictogramsFor(['H412'])).toEqual([]);
  });
});

describe('signal words', () => {
  it('Danger beats Warning beats none', () => {
    expect(strictestSignalWord([null, 'Warning', null])).toBe('Warning');
    expect(strictestSignalWord(['Warning', 'Danger'])).toBe('Danger');
    expect(strictestSignalWord([])).toBeNull();
  });
  it('codes imply a minimum, except those covering categories with different words', () => {
    expect(minimumSignalWord(['H302', 'H411'])).toBe('Warning');
    expect(minimumSignalWord(['H302', 'H314'])).toBe('Danger');
    expect(minimumSignalWord(['H412'])).toBeNull();
    expect(minimumSignalWord(['H228'])).toBeNull();
  });
  it('sorts codes numerically without duplicates', () => {
    expect(sortHCodes(['H410', 'H302', 'H290', 'H302'])).toEqual(['H290', 'H302', 'H410']);
  });
  it('the standing caution defers to the SDS, institutional rules and local regulations', () => {
    expect(STANDING_CAUTION).toMatch(/SDS/);
    expect(STANDING_CAUTION).toMatch(/institution/);
    expect(STANDING_CAUTION).toMatch(/local regulations/);
  });
});
