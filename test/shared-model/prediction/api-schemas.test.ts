import { describe, expect, it } from 'vitest';
import { predictionOperations } from '../../../shared-model/api/prediction';

function firstIssue(
  schema: {
    safeParse: (v: unknown) => {
      success: boolean;
      error?: { issues: Array<{ path: PropertyKey[]; message: string }> };
    };
  },
  value: unknown,
): string {
  const result = schema.safeParse(value);
  if (result.success) return 'ok';
  const issue = result.error?.issues[0];
  return `${(issue?.path ?? []).map(String).join('.')}: ${issue?.message ?? ''}`;
}

const good = { xB: 0.5, diameterNm: 3, shape: 'cuboctahedron', temperatureK: 600 };

describe('prediction API input schemas', () => {
  const predict = predictionOperations['prediction.predict'].input;

  it('accepts good input and fills defaults (facet 111, oversized-solute strain, default thresholds)', () => {
    const parsed = predict.parse({ pair: 'Ag-Pd', conditions: { xB: 0.5, diameterNm: 3, temperatureK: 600 } });
    expect(parsed.pair).toEqual({ elementA: 'Ag', elementB: 'Pd' });
    expect(parsed.conditions.shape).toBe('cuboctahedron');
    expect(parsed.conditions.facet).toBe('111');
    expect(parsed.conditions.strainRule).toBe('oversized solute');
    expect(parsed.conditions.thresholds.coreShellEnrichment).toBe(0.6);
  });

  it.each([
    [{ pair: 'Ag-Xx', conditions: good }, /^pair\.elementB: The second element of "Ag-Xx" .*unknown element "Xx"/],
    [{ pair: 'Pd-Pd', conditions: good }, /^pair: a pair needs two different elements/],
    [{ pair: 'Ag-Pd', conditions: { ...good, xB: 0 } }, /^conditions\.xB: must lie strictly between 0 and 1/],
    [{ pair: 'Ag-Pd', conditions: { ...good, xB: 1.2 } }, /^conditions\.xB: /],
    [{ pair: 'Ag-Pd', conditions: { ...good, xB: Number.NaN } }, /^conditions\.xB: must be a number/],
    [{ pair: 'Ag-Pd', conditions: { ...good, xB: '0.5' } }, /^conditions\.xB: must be a number/],
    [{ pair: 'Ag-Pd', conditions: { ...good, diameterNm: 0 } }, /^conditions\.diameterNm: must be a positive diameter/],
    [{ pair: 'Ag-Pd', conditions: { ...good, diameterNm: -1 } }, /^conditions\.diameterNm: /],
    [
      { pair: 'Ag-Pd', conditions: { ...good, temperatureK: -5 } },
      /^conditions\.temperatureK: must be a positive temperature/,
    ],
    [{ pair: 'Ag-Pd', conditions: { ...good, temperatureK: Number.POSITIVE_INFINITY } }, /^conditions\.temperatureK: /],
    [{ pair: 'Ag-Pd', conditions: { ...good, shape: 'cube' } }, /^conditions\.shape: must be one of/],
    [
      { pair: 'Ag-Pd', conditions: { ...good, thresholds: { coreShellEnrichment: 0.1 } } },
      /^conditions\.thresholds\.enrichedAlloyEnrichment: must be below/,
    ],
  ])('rejects %j', (value, message) => {
    expect(firstIssue(predict, value)).toMatch(message);
  });

  it('rank: elements list or "all", target text, limit', () => {
    const rank = predictionOperations['prediction.rank'].input;
    const parsed = rank.parse({ elements: ['Pt', 'Pd'], target: 'core@shell:Pt', conditions: good });
    expect(parsed.target).toEqual({ kind: 'core@shell', shellElement: 'Pt' });
    expect(rank.parse({ elements: 'all', target: 'alloy', conditions: good }).elements).toBe('all');
    expect(firstIssue(rank, { elements: ['Pt', 'Zz'], target: 'alloy', conditions: good })).toMatch(
      /^elements\.1: unknown element "Zz"/,
    );
    expect(firstIssue(rank, { elements: ['Pt', 'Pt'], target: 'alloy', conditions: good })).toMatch(/^elements/);
    expect(firstIssue(rank, { elements: ['Pt', 'Pd'], target: 'hollow', conditions: good })).toMatch(
      /^target: target must be/,
    );
    expect(firstIssue(rank, { elements: 'all', target: 'alloy', conditions: good, limit: 0 })).toMatch(/^limit: /);
  });

  it('isotherm, save, listForPair, elements.table', () => {
    expect(
      firstIssue(predictionOperations['prediction.isotherm'].input, { pair: 'Ag-Pd', conditions: good, sweep: 'size' }),
    ).toMatch(/^sweep: must be one of/);
    expect(
      predictionOperations['prediction.isotherm'].input.parse({ pair: 'Ag-Pd', conditions: good, sweep: 'diameter' })
        .points,
    ).toBe(41);
    expect(
      firstIssue(predictionOperations['prediction.save'].input, { pair: 'Ag-Pd', conditions: good, pairId: -1 }),
    ).toMatch(/^pairId: /);
    expect(firstIssue(predictionOperations['prediction.listForPair'].input, { pairId: 'x' })).toMatch(/^pairId: /);
    expect(firstIssue(predictionOperations['elements.table'].input, {})).toBe('ok');
  });
});
