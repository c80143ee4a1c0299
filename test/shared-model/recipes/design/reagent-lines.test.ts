/** Design stage 2: masses, stock and neat volumes, the solvent line and the volume balance. */
import { describe, expect, it } from 'vitest';
import { designAmounts } from '../../../../shared-model/recipes/design/amounts';
import { massOf, reagentLines, volumeOf } from '../../../../shared-model/recipes/design/reagent-lines';
import type { BatchDesignRequest } from '../../../../shared-model/recipes/design-input';
import { catalogIndex, kittelLattice, parseRequest } from '../../../support/design-stages';
import { domainErrorOf } from '../../../support/domain-error';
import { auOnAg, ptNi, ptNiPolyol } from '../../../support/sample-batches';

const linesOf = (request: BatchDesignRequest) => {
  const input = parseRequest(request);
  return reagentLines(input, designAmounts(input, catalogIndex, kittelLattice), catalogIndex);
};
const reagent = (key: string) => catalogIndex.require(key, 'key');

describe('mass and volume of one line', () => {
  it('H2PtCl6·6H2O: 0.075 mmol × 517.91 g/mol = 38.84 mg; 3.75 mL of a 20 mM stock', () => {
    const acid = reagent('h2ptcl6-6h2o');
    const mass = massOf(acid, 0.075);
    expect(mass).toBeCloseTo(38.843, 2);
    expect(volumeOf(acid, 0.075, mass, 20)).toBeCloseTo(3.75, 12);
    // a solid without a stock has no volume
    expect(volumeOf(acid, 0.075, mass, undefined)).toBeNull();
  });
  it('Fe(CO)5 neat: 0.5 mmol × 195.90 g/mol = 97.95 mg ÷ 1.453 g/mL = 0.0674 mL', () => {
    const carbonyl = reagent('fe-co5');
    const mass = massOf(carbonyl, 0.5);
    expect(mass).toBeCloseTo(97.95, 1);
    expect(volumeOf(carbonyl, 0.5, mass, undefined)).toBeCloseTo(0.06741, 4);
  });
});

describe('the lines of a batch', () => {
  it('Pt75Ni25: precursors, borohydride, then water to 50 mL (50 − 3.75 − 1.25 − 2.1875 = 42.8125)', () => {
    const { lines, makeUpVolumeMl, checks } = linesOf(ptNi);
    expect(lines.map((l) => [l.key, l.role])).toEqual([
      ['h2ptcl6-6h2o', 'metal-precursor'],
      ['nicl2-6h2o', 'metal-precursor'],
      ['nabh4', 'reducer'],
      ['water', 'solvent'],
    ]);
    // 0.21875 mmol × 37.833 g/mol = 8.276 mg; 2.1875 mL of 100 mM
    expect(lines[2]?.massMg).toBeCloseTo(8.276, 2);
    expect(lines[2]?.volumeMl).toBeCloseTo(2.1875, 12);
    expect(makeUpVolumeMl).toBeCloseTo(42.8125, 12);
    expect(lines[3]?.volumeMl).toBeCloseTo(42.8125, 12);
    expect(checks).toEqual([]);
  });

  it('seeded growth: the seed dispersion comes first and names its batch', () => {
    const seeds = { metal: 'Ag', diameterNm: 20, metalMm: 0.5, volumeMl: 5, seedBatchId: 7 };
    const { lines } = linesOf({ ...auOnAg, seeds });
    expect(lines[0]).toMatchObject({ key: 'seed-batch-7', role: 'seeds', volumeMl: 5, amountMmol: null });
    expect(lines[0]?.name).toBe('Ag seed dispersion (batch #7)');
    expect(lines.map((l) => l.role)).toEqual(['seeds', 'metal-precursor', 'reducer', 'capping-agent', 'solvent']);
  });

  it('polyol: one glycol line, 20 mL × 1.113 g/mL ÷ 62.068 g/mol = 358.6 mmol, 1793 × the electrons', () => {
    const { lines, makeUpVolumeMl, checks } = linesOf(ptNiPolyol);
    const glycol = lines.filter((l) => l.key === 'ethylene-glycol');
    expect(glycol).toHaveLength(1);
    expect(glycol[0]?.amountMmol).toBeCloseTo(358.64, 1);
    expect(glycol[0]?.note).toBe('solvent and reducer');
    expect(makeUpVolumeMl).toBeNull();
    // 358.64 mmol × 2 e⁻ ÷ 0.4 mmol e⁻ = 1793
    expect(checks.map((c) => c.kind)).toEqual(['reducer']);
    expect(checks[0]?.message).toContain('1793 times');
  });

  it('stocks beyond the batch volume: a warning and no water line', () => {
    const { lines, makeUpVolumeMl, checks } = linesOf({ ...ptNi, batchVolumeMl: 3 });
    // 3 − (3.75 + 1.25 + 2.1875) = −4.1875 mL
    expect(makeUpVolumeMl).toBeCloseTo(-4.1875, 12);
    expect(lines.some((l) => l.key === 'water')).toBe(false);
    expect(checks.map((c) => [c.kind, c.severity])).toEqual([['volume', 'warning']]);
  });

  it('an additive is weighed as given; an unknown additive names its field', () => {
    const { lines } = linesOf({ ...ptNi, additives: [{ reagentKey: 'ctab', amountMmol: 0.1, stockMm: 10 }] });
    const ctab = lines.find((l) => l.role === 'additive');
    expect(ctab?.amountMmol).toBe(0.1);
    expect(ctab?.volumeMl).toBeCloseTo(10, 12);
    const error = domainErrorOf(() => linesOf({ ...ptNi, additives: [{ reagentKey: 'unobtainium', amountMmol: 1 }] }));
    expect(error.field).toBe('additives.0.reagentKey');
  });

  it('a capping agent that is already on another line is refused', () => {
    const withCtab = { ...ptNi, additives: [], capping: { reagentKey: 'ctab', molPerMolMetal: 1 } };
    expect(linesOf(withCtab).lines.find((l) => l.role === 'capping-agent')?.amountMmol).toBeCloseTo(0.1, 12);
    const oleylamine = { reagentKey: 'oleylamine', excess: 1 };
    const twice = { ...ptNi, reducer: oleylamine, capping: { reagentKey: 'oleylamine', molPerMolMetal: 1 } };
    const error = domainErrorOf(() => linesOf(twice));
    expect(error.field).toBe('capping.reagentKey');
    expect(error.message).toContain('already the reducer');
  });
});
