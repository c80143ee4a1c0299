import { describe, expect, it } from 'vitest';
import { confusionMatrix } from '../../../shared-model/characterization/confusion';

describe('confusion matrix of predicted vs observed architectures', () => {
  it('counts pairs into observed rows and predicted columns', () => {
    const m = confusionMatrix([
      { predicted: 'alloy', observed: 'alloy' },
      { predicted: 'Ni@Pt', observed: 'Ni@Pt' },
      { predicted: 'Ni@Pt', observed: 'Pt@Ni' },
      { predicted: 'janus', observed: 'alloy' },
      { predicted: 'alloy', observed: 'hollow' },
    ]);
    expect(m.labels).toEqual(['alloy', 'Ni@Pt', 'Pt@Ni', 'Janus', 'hollow']);
    const cell = (observed: string, predicted: string) =>
      m.counts[m.labels.indexOf(observed)]![m.labels.indexOf(predicted)];
    expect(cell('alloy', 'alloy')).toBe(1);
    expect(cell('alloy', 'Janus')).toBe(1);
    expect(cell('Pt@Ni', 'Ni@Pt')).toBe(1);
    expect(cell('hollow', 'alloy')).toBe(1);
    expect(m.total).toBe(5);
    expect(m.counts.flat().reduce((s, v) => s + v, 0)).toBe(5);
    expect(m.exactAgreement).toBe(2);
    // Ni@Pt predicted, Pt@Ni observed: same kind (core@shell), wrong way round.
    expect(m.kindAgreement).toBe(3);
    const alloy = m.perLabel.find((p) => p.label === 'alloy')!;
    expect(alloy).toMatchObject({ observed: 2, predicted: 2, correct: 1, recall: 0.5, precision: 0.5 });
  });

  it('is empty but well-formed without pairs', () => {
    const m = confusionMatrix([], ['alloy']);
    expect(m.labels).toEqual(['alloy']);
    expect(m.counts).toEqual([[0]]);
    expect(m.exactAgreementRate).toBeNull();
  });
});
