/** The Results view says what recording an outcome moved (outcomes.record answers with its statusChanges). */
import { describe, expect, it } from 'vitest';
import { statusChangeText } from '../../../renderer/src/views/results/status-change';

describe('statusChangeText', () => {
  it('names the batch and the pair with each move', () => {
    const text = statusChangeText(
      { batch: { from: 'made', to: 'characterized' }, pair: { id: 4, from: 'planned', to: 'characterized' } },
      'PtNi-01',
      'Pt–Ni',
    );
    expect(text).toBe(
      'Recorded: batch "PtNi-01" moved from made to characterized; the campaign pair Pt–Ni moved from planned to ' +
        'characterized. You can still set statuses by hand (Batch design, Campaigns).',
    );
  });

  it('says nothing when nothing moved (notes or files alone, or already characterized)', () => {
    expect(statusChangeText({ batch: null, pair: null }, 'PtNi-01', 'Pt–Ni')).toBeNull();
    expect(
      statusChangeText({ batch: null, pair: { id: 1, from: 'candidate', to: 'characterized' } }, 'B', 'Au–Pd'),
    ).toBe(
      'Recorded: the campaign pair Au–Pd moved from candidate to characterized. You can still set statuses by hand (Batch design, Campaigns).',
    );
  });
});
