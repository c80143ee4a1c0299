/** An API error's dotted field finds the input the message is shown under (DEVELOPERS.md: errors beside the field). */
import { describe, expect, it } from 'vitest';
import { inputForField } from '../../renderer/src/api/hooks';

describe('inputForField', () => {
  const aliases = { 'pair.elementA': 'elementA', 'pair.elementB': 'elementB', pair: 'elementA' };
  it('shows an unknown second element under the second element, not the first', () => {
    expect(inputForField('pair.elementB', aliases)).toBe('elementB');
    expect(inputForField('pair.elementA', aliases)).toBe('elementA');
  });
  it('falls back to the longest aliased prefix, then to the path itself', () => {
    expect(inputForField('pair', aliases)).toBe('elementA');
    expect(inputForField('pair.other', aliases)).toBe('elementA');
    expect(inputForField('notes', aliases)).toBe('notes');
    expect(inputForField('lineScan.probeSigmaNm')).toBe('lineScan.probeSigmaNm');
  });
});
