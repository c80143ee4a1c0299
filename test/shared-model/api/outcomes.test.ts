import { describe, expect, it } from 'vitest';
import { outcomeOperations } from '../../../shared-model/api/outcomes';
import { analyseSizes } from '../../../shared-model/characterization/size-analysis';
import { ANALYSIS_VERSION } from '../../../shared-model/characterization/version';

const issue = (name: keyof typeof outcomeOperations, input: unknown) => {
  const parsed = outcomeOperations[name].input.safeParse(input);
  return parsed.success
    ? null
    : { path: parsed.error.issues[0]!.path.join('.'), message: parsed.error.issues[0]!.message };
};

describe('outcome operation inputs', () => {
  it('accept a size import with defaults', () => {
    const parsed = outcomeOperations['outcomes.record'].input.parse({ batchId: 1, sizes: { csvText: '5\n6\n7' } });
    expect(parsed.sizes).toMatchObject({ decimalSeparator: 'auto', precisionPercent: 2, sourceFile: null });
  });

  it('name the part and the field at fault', () => {
    const record = (parts: Record<string, unknown>) => issue('outcomes.record', { batchId: 1, ...parts });
    expect(record({ sizes: { csvText: '' } })).toEqual({ path: 'sizes.csvText', message: 'the file is empty' });
    expect(record({ composition: { nominalXB: 50, measurements: [] } })?.message).toMatch(/at most 1 \(a fraction/);
    expect(record({ composition: { measurements: [{ method: 'SEM', xB: 0.2 }] } })?.path).toBe(
      'composition.measurements.0.method',
    );
    expect(record({ composition: { measurements: [], gridMetal: 'Xx' } })?.message).toMatch(/unknown element/);
    expect(issue('outcomes.removeLineScan', { id: 3 })?.message).toMatch(/confirmation/);
    expect(record({ lineScan: { csvText: 'x', probeSigmaNm: -1 } })?.path).toBe('lineScan.probeSigmaNm');
    expect(record({ observed: { label: 'alloy', decision: 'maybe' } })).toEqual({
      path: 'observed.decision',
      message: 'must be confirmed or override',
    });
    expect(record({ observed: { decision: 'override' } })?.path).toBe('observed.label');
    expect(record({ files: [{ path: ' ' }] })?.path).toBe('files.0.path');
    expect(record({})).toEqual({
      path: '',
      message: 'nothing to record: give sizes, composition, lineScan, observed, notes or files',
    });
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
