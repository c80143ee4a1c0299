import { describe, expect, it } from 'vitest';
import { outcomeOperations } from '../../../shared-model/api/outcomes';
import { analyseSizes } from '../../../shared-model/characterization/size-analysis';
import { ANALYSIS_VERSION } from '../../../shared-model/characterization/version';

const issue = (name: keyof typeof outcomeOperations, input: unknown) => {
  const parsed = outcomeOperations[name].input.safeParse(input);
  return parsed.success ? null : { path: parsed.error.issues[0]!.path.join('.'), message: parsed.error.issues[0]!.message };
};

describe('outcome operation inputs', () => {
  it('accept a size import with defaults', () => {
    const parsed = outcomeOperations['outcomes.recordSizes'].input.parse({ batchId: 1, csvText: '5\n6\n7' });
    expect(parsed).toMatchObject({ decimalSeparator: 'auto', precisionPercent: 2, sourceFile: null });
  });

  it('name the field at fault', () => {
    expect(issue('outcomes.recordSizes', { batchId: 1, csvText: '' })).toEqual({ path: 'csvText', message: 'the file is empty' });
    expect(issue('outcomes.recordComposition', { batchId: 1, nominalXB: 50, measurements: [] })?.message).toMatch(/at most 1 \(a fraction/);
    expect(issue('outcomes.recordComposition', { batchId: 1, measurements: [{ method: 'SEM', xB: 0.2 }] })?.path).toBe('measurements.0.method');
    expect(issue('outcomes.recordComposition', { batchId: 1, measurements: [], gridMetal: 'Xx' })?.message).toMatch(/unknown element/);
    expect(issue('outcomes.removeLineScan', { id: 3 })?.message).toMatch(/confirmation/);
    expect(issue('outcomes.importLineScan', { batchId: 1, csvText: 'x', probeSigmaNm: -1 })?.path).toBe('probeSigmaNm');
    expect(issue('outcomes.setObserved', { batchId: 1, label: 'alloy', decision: 'maybe' })?.path).toBe('decision');
  });
});

describe('size analysis bundle', () => {
  it('carries statistics, log-normal fit, histogram and the analysis version', () => {
    const a = analyseSizes([4.8, 5.1, 5.3, 5.3, 5.6, 5.9, 6.0, 6.4, 7.2, 8.1], { targetDiameterNm: 5 });
    expect(a.analysisVersion).toBe(ANALYSIS_VERSION);
    expect(a.statistics.n).toBe(10);
    expect(a.statistics.target?.deviationNm).toBeCloseTo(a.statistics.meanNm - 5, 12);
    expect(a.statistics.precision?.halfWidthNm).toBeCloseTo(0.02 * a.statistics.meanNm, 12);
    expect(a.histogram.bins.reduce((s, b) => s + b.count, 0)).toBe(10);
    expect(a.lognormal.n).toBe(10);
  });
});
