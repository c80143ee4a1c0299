import { describe, expect, it } from 'vitest';
import {
  campaignElementsText,
  campaignPairNames,
  pairCountOf,
  recomputeDelayMs,
  TYPING_PAUSE_MS,
} from '../../../renderer/src/views/candidates/candidates-scope';

describe('where Candidates starts', () => {
  it("lists a campaign's distinct elements in the order its pairs name them", () => {
    const pairs = [
      { elementA: 'Pt', elementB: 'Ni' },
      { elementA: 'Au', elementB: 'Pt' },
      { elementA: 'Pd', elementB: 'Au' },
    ];
    expect(campaignElementsText(pairs)).toBe('Pt, Ni, Au, Pd');
    expect(campaignElementsText([])).toBe('');
  });

  it("marks a campaign's pairs in either order", () => {
    const names = campaignPairNames([{ elementA: 'Pt', elementB: 'Ni' }]);
    expect(names.has('Pt-Ni')).toBe(true);
    expect(names.has('Ni-Pt')).toBe(true);
    expect(names.has('Pt-Au')).toBe(false);
  });

  it('waits for a pause only for a large set: 30 metals are 435 pairs (n(n − 1)/2)', () => {
    expect(pairCountOf('all')).toBe(435);
    expect(pairCountOf(['Pt', 'Ni', 'Pt'])).toBe(1);
    expect(recomputeDelayMs(pairCountOf('all'))).toBe(TYPING_PAUSE_MS);
    expect(recomputeDelayMs(pairCountOf(['Pt', 'Pd', 'Au', 'Ag', 'Ni', 'Cu', 'Co']))).toBe(0);
  });
});
