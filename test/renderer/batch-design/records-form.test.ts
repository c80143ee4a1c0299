/** The saved-batch forms' helpers: stock dates between local text and ISO, measured values typed. */
import { describe, expect, it } from 'vitest';
import {
  localDateTimeText,
  readMeasured,
  stocksFromDates,
} from '../../../renderer/src/views/batch-design/records-form';

describe('stock dates', () => {
  it('an instant as local text: UTC+1 (offset −60 min) shows 10:30 for 09:30Z', () => {
    expect(localDateTimeText('2025-03-01T09:30:00.000Z', -60)).toBe('2025-03-01T10:30');
    expect(localDateTimeText('2025-03-01T09:30:00.000Z', 0)).toBe('2025-03-01T09:30');
  });

  it('dated stocks become ISO instants; empty ones are left out; text that is no date goes through as typed', () => {
    const stocks = stocksFromDates({ nabh4: '2025-03-01T09:30Z', 'ascorbic-acid': ' ', pvp: 'yesterday' });
    expect(stocks).toEqual([
      { reagentKey: 'nabh4', preparedAt: '2025-03-01T09:30:00.000Z' },
      { reagentKey: 'pvp', preparedAt: 'yesterday' },
    ]);
  });
});

describe('measured values', () => {
  it('reads either, both or none, with decimal commas', () => {
    const both = { ok: true, measured: { diameterNm: 13.2, particlesPerMl: 2.1e12 } };
    expect(readMeasured('13,2', '2,1e12')).toEqual(both);
    expect(readMeasured('', '')).toEqual({ ok: true, measured: {} });
    expect(readMeasured('13.2', '')).toEqual({ ok: true, measured: { diameterNm: 13.2 } });
  });

  it('names the value that is not a number', () => {
    const diameter = { ok: false, message: 'measured diameter (nm): "13 nm" is not a number' };
    expect(readMeasured('13 nm', '')).toEqual(diameter);
    const concentration = readMeasured('', '2.100.000');
    expect(concentration).toMatchObject({ ok: false, message: expect.stringMatching(/^measured particles per mL:/) });
  });
});
