import { describe, expect, it } from 'vitest';
import { OUTCOME_ONLY_KINDS, PREDICTED_KINDS } from '../../shared-model/architecture/labels';
import {
  ARCHITECTURE,
  architectureColour,
  NEUTRAL,
  seriesColour,
  SERIES,
  tint,
} from '../../renderer/src/charts/palette';

describe('the one chart palette', () => {
  it('gives every architecture kind its own colour (predicted and outcome-only kinds)', () => {
    const kinds = [...PREDICTED_KINDS, ...OUTCOME_ONLY_KINDS];
    for (const kind of kinds) expect(ARCHITECTURE[kind], kind).toMatch(/^#[0-9a-f]{6}$/);
    const named = kinds.filter((k) => k !== 'unknown').map((k) => architectureColour(k));
    expect(new Set(named).size).toBe(named.length);
    expect(architectureColour('not a kind')).toBe(NEUTRAL.reference);
  });

  it('series colours wrap round; tints mix with white (0 → white, 1 → the colour)', () => {
    expect(seriesColour(SERIES.length)).toBe(SERIES[0]);
    expect(seriesColour(-1)).toBe(SERIES[SERIES.length - 1]);
    expect(tint('#c2410c', 0)).toBe('#ffffff');
    expect(tint('#c2410c', 1)).toBe('#c2410c');
    expect(tint('#000000', 0.25)).toBe('#bfbfbf'); // 255 − 0.25 × 255 = 191.25 → 191
    expect(() => tint('red')).toThrow(/#rrggbb/);
  });
});
