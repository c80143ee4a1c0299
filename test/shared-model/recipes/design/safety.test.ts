/** Design stage 4: stale stocks and the hazard block of the batch. */
import { describe, expect, it } from 'vitest';
import { designAmounts } from '../../../../shared-model/recipes/design/amounts';
import { reagentLines } from '../../../../shared-model/recipes/design/reagent-lines';
import { batchHazards, stockAgeChecks } from '../../../../shared-model/recipes/design/safety';
import type { BatchDesignRequest } from '../../../../shared-model/recipes/design-input';
import { catalogIndex, kittelLattice, parseRequest } from '../../../support/design-stages';
import { domainErrorOf } from '../../../support/domain-error';
import { auOnAg, ptNi } from '../../../support/sample-batches';

const hazardsOf = (request: BatchDesignRequest) => {
  const input = parseRequest(request);
  const amounts = designAmounts(input, catalogIndex, kittelLattice);
  return batchHazards(amounts, reagentLines(input, amounts, catalogIndex).lines, catalogIndex);
};

describe('stock ages', () => {
  const stocks = parseRequest({
    ...ptNi,
    stocks: [
      { reagentKey: 'nabh4', preparedAt: '2025-03-01T08:00:00Z' },
      { reagentKey: 'ascorbic-acid', preparedAt: '2025-03-01T08:00:00Z' },
    ],
  });

  it('two hours on: borohydride (limit 30 min, made fresh) is stale, ascorbate (limit 24 h) is not', () => {
    const checks = stockAgeChecks(stocks, catalogIndex, '2025-03-01T10:00:00Z');
    expect(checks).toEqual([
      {
        kind: 'stock-age',
        severity: 'warning',
        message: 'The Sodium borohydride stock is 2.0 h old, beyond its 30 min limit: make it fresh.',
      },
    ]);
  });

  it('a limit set by the user wins over the catalog; no clock, no check', () => {
    const lenient = { ...stocks, stocks: stocks.stocks.map((s) => ({ ...s, freshnessHours: 3 })) };
    expect(stockAgeChecks(lenient, catalogIndex, '2025-03-01T10:00:00Z')).toEqual([]);
    expect(stockAgeChecks(stocks, catalogIndex, undefined)).toEqual([]);
  });

  it('an unknown stock reagent names its field', () => {
    const unknown = { ...stocks, stocks: [{ reagentKey: 'unobtainium', preparedAt: '2025-03-01T08:00:00Z' }] };
    const error = domainErrorOf(() => stockAgeChecks(unknown, catalogIndex, '2025-03-01T10:00:00Z'));
    expect(error.field).toBe('stocks.0.reagentKey');
  });
});

describe('hazards', () => {
  it('Pt75Ni25 by borohydride: the union of the three reagents, Danger, hydrogen from the borohydride', () => {
    const { hazardSummary, checks } = hazardsOf(ptNi);
    const codes = hazardSummary.hazards.map((h) => h.code);
    // supplier SDSs of H2PtCl6·6H2O, NiCl2·6H2O and NaBH4 (as entered in reagent-seed.ts)
    for (const code of ['H260', 'H301', 'H314', 'H334', 'H350', 'H360', 'H410']) expect(codes).toContain(code);
    expect(hazardSummary.signalWord).toBe('Danger');
    // 4 H2 per BH4⁻: 4 × 0.21875 mmol = 0.875 mmol × 24.4654 L/mol (25 °C, 1 atm) = 21.41 mL
    expect(hazardSummary.warnings.find((w) => w.id === 'borohydride-hydrolysis')?.hydrogenMl).toBeCloseTo(21.407, 2);
    expect(checks.length).toBeGreaterThan(0);
    expect(checks.every((c) => c.kind === 'hazard' && c.severity !== 'info')).toBe(true);
  });

  it('each reagent on the lines once; the seed dispersion is not a catalog reagent', () => {
    const { hazardSummary } = hazardsOf(auOnAg);
    expect(hazardSummary.perReagent.map((r) => r.key)).toEqual(['haucl4-3h2o', 'ascorbic-acid', 'pvp', 'water']);
  });
});
