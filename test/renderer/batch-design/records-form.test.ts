/** The saved-batch forms' helpers: stock dates between local text and ISO, measured values typed. */
import { describe, expect, it } from 'vitest';
import {
  localDateTimeText,
  readMeasured,
  stockAgeText,
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

describe('stock ages', () => {
  const age = (ageHours: number, freshnessHours: number | null, stale: boolean) => ({
    reagentKey: 'nabh4',
    name: 'Sodium borohydride',
    preparedAt: '2025-03-01T09:30:00.000Z',
    ageHours,
    freshnessHours,
    stale,
  });
  it('are shown in days once a day old, hours and minutes below, with the limit', () => {
    expect(stockAgeText(age(0.25, 0.5, false))).toBe('15 min (limit 30 min)');
    expect(stockAgeText(age(5, null, false))).toBe('5.0 h');
    expect(stockAgeText(age(24, null, false))).toBe('1 day');
    // 30 days old against a 7-day limit (a typical limit for a metal-salt stock: common practice)
    expect(stockAgeText(age(720, 168, true))).toBe('30 days (limit 7 days) — make it fresh');
    expect(stockAgeText(age(36, 0.5, true))).toBe('1.5 days (limit 30 min) — make it fresh');
    expect(stockAgeText(undefined)).toBe('');
  });
});
