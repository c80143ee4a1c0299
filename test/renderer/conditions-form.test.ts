/**
 * The prediction conditions bar's model without a browser: defaults from the model's one constant, typed
 * numbers through the one reader, ranges by the contract's schema (the same words the API uses), and the
 * copy kept for the browser tab.
 */
import { describe, expect, it } from 'vitest';
import { conditionsSchema } from '../../shared-model/api/prediction';
import { PREDICTION_DEFAULTS } from '../../shared-model/prediction/conditions';
import { DEFAULT_CONDITIONS_FORM, readConditions, readKeptConditions } from '../../renderer/src/views/conditions-form';

const withText = (field: keyof typeof DEFAULT_CONDITIONS_FORM.text, value: string) => ({
  ...DEFAULT_CONDITIONS_FORM,
  text: { ...DEFAULT_CONDITIONS_FORM.text, [field]: value },
});

describe('prediction conditions form', () => {
  it('starts from the model defaults, shown in at.%', () => {
    expect(DEFAULT_CONDITIONS_FORM).toEqual({
      text: { atPercentB: '50', diameterNm: '3', temperatureK: '600', timeH: '1' },
      shape: PREDICTION_DEFAULTS.shape,
      facet: PREDICTION_DEFAULTS.facet,
      environment: 'vacuum',
    });
    expect(readConditions(DEFAULT_CONDITIONS_FORM)).toEqual({ conditions: PREDICTION_DEFAULTS, errors: {} });
  });

  it('reads decimal commas and gives the same conditions the contract gives the API', () => {
    const form = { ...withText('diameterNm', '2,5'), facet: '100' as const, environment: 'CO' as const };
    const reading = readConditions({ ...form, text: { ...form.text, atPercentB: '30', timeH: '0,5' } });
    const api = conditionsSchema.parse({
      xB: 0.3,
      diameterNm: 2.5,
      temperatureK: 600,
      shape: 'cuboctahedron',
      facet: '100',
      environment: 'CO',
      timeH: 0.5,
    });
    expect(reading).toEqual({ conditions: api, errors: {} });
  });

  it('names every field that does not hold a number', () => {
    const form = {
      ...withText('diameterNm', 'big'),
      text: { atPercentB: '1.234,5', diameterNm: 'big', temperatureK: '', timeH: '1' },
    };
    expect(readConditions(form)).toEqual({
      conditions: null,
      errors: {
        atPercentB: expect.stringMatching(/^composition, at\.%: "1\.234,5" has more than one/),
        diameterNm: 'diameter, nm: "big" is not a number',
        temperatureK: 'temperature, K: enter a number',
      },
    });
  });

  it('refuses out-of-range values with the contract words, beside the input', () => {
    expect(readConditions(withText('atPercentB', '150')).errors).toEqual({
      atPercentB: 'composition must lie strictly between 0 and 100 at.%',
    });
    expect(readConditions(withText('diameterNm', '-2')).errors).toEqual({
      diameterNm: 'The diameter (nm) must be a positive diameter in nm',
    });
    expect(readConditions(withText('temperatureK', '6000')).errors).toEqual({
      temperatureK: 'The temperature (K) must be at most 5000 K',
    });
    expect(readConditions(withText('timeH', '0')).errors).toEqual({
      timeH: 'The time (h) must be a positive time in hours',
    });
  });

  it('keeps the typed text for the tab, and falls back to the defaults on a damaged copy', () => {
    const kept = {
      text: { atPercentB: '25', diameterNm: '4,5', temperatureK: 'x', timeH: '2' },
      shape: 'sphere',
      facet: '100',
      environment: 'H2',
    };
    expect(readKeptConditions(JSON.stringify(kept))).toEqual(kept);
    // a copy kept before the time and environment inputs existed: those two take their defaults
    const older = { text: { atPercentB: '25', diameterNm: '4,5', temperatureK: 'x' }, shape: 'sphere', facet: '100' };
    expect(readKeptConditions(JSON.stringify(older))).toEqual({
      ...older,
      text: { ...older.text, timeH: '1' },
      environment: 'vacuum',
    });
    expect(readKeptConditions(null)).toBe(DEFAULT_CONDITIONS_FORM);
    expect(readKeptConditions('{not json')).toBe(DEFAULT_CONDITIONS_FORM);
    expect(readKeptConditions(JSON.stringify({ ...kept, shape: 'cube' }))).toBe(DEFAULT_CONDITIONS_FORM);
  });
});
