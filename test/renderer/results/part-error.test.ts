/** A Results panel shows an `outcomes.record` error beside its own input, without the part's name in front. */
import { describe, expect, it } from 'vitest';
import { partError } from '../../../renderer/src/views/results/part-error';

describe('partError', () => {
  it('makes the field relative to the part and drops the part name the panel heading already shows', () => {
    const sizes = {
      code: 'invalid_input' as const,
      message: 'sizes: line 3: "1O.9" in column 1 is not a number',
      field: 'sizes.csvText',
    };
    expect(partError(sizes, 'sizes')).toEqual({
      code: 'invalid_input',
      message: 'line 3: "1O.9" in column 1 is not a number',
      field: 'csvText',
    });
    // A zod refusal names the field in words (shared-model/api/issue-message.ts); the message is kept.
    const zod = {
      code: 'invalid_input' as const,
      message: 'The probe width σ (nm) must be greater than 0',
      field: 'lineScan.probeSigmaNm',
    };
    expect(partError(zod, 'lineScan')).toEqual({
      code: 'invalid_input',
      message: 'The probe width σ (nm) must be greater than 0',
      field: 'probeSigmaNm',
    });
    const nested = {
      code: 'invalid_input' as const,
      message: 'composition.measurements.1.xB: at most 1',
      field: 'composition.measurements.1.xB',
    };
    expect(partError(nested, 'composition').field).toBe('measurements.1.xB');
  });

  it('leaves an error of the part as a whole, or of another field, for the banner', () => {
    const whole = { code: 'invalid_input' as const, message: 'line scan: the fit did not converge', field: 'lineScan' };
    expect(partError(whole, 'lineScan')).toEqual({ code: 'invalid_input', message: 'the fit did not converge' });
    const batch = { code: 'not_found' as const, message: 'no batch with id 9', field: 'batchId' };
    expect(partError(batch, 'sizes')).toEqual(batch);
  });
});
