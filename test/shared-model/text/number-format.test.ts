/** The one number formatter of the views and the bench sheet: scientific notation as printed, 1.65 × 10¹³. */
import { describe, expect, it } from 'vitest';
import {
  formatFixed,
  formatInText,
  formatNumber,
  scientific,
  superscript,
} from '../../../shared-model/text/number-format';

describe('scientific notation as printed', () => {
  it('writes the exponent in superscript digits after a multiplication sign', () => {
    expect(scientific(1.65e13)).toBe('1.65 × 10¹³');
    expect(scientific(2e-4)).toBe('2.00 × 10⁻⁴');
    expect(scientific(-3.21e7, 2)).toBe('−3.2 × 10⁷');
    expect(superscript(-10)).toBe('⁻¹⁰');
    // exponent 0 is no exponent at all
    expect(scientific(5.5, 2)).toBe('5.5');
  });

  it('formatNumber: 10⁶ and up and below 10⁻³ in scientific notation, grouped digits between', () => {
    // 1.65 × 10¹³ particles per mL is typical of a few-nm batch (the example figure)
    expect(formatNumber(1.6543e13)).toBe('1.654 × 10¹³');
    expect(formatNumber(1.65e13, 3)).toBe('1.65 × 10¹³');
    expect(formatNumber(999_999)).toBe('1,000,000');
    expect(formatNumber(1_000_000)).toBe('1.000 × 10⁶');
    expect(formatNumber(12345.678)).toBe('12,350');
    expect(formatNumber(0.000999)).toBe('9.990 × 10⁻⁴');
    expect(formatNumber(0)).toBe('0');
    expect(formatNumber(null)).toBe('—');
    expect(formatNumber(Number.NaN)).toBe('—');
  });

  it('never prints the programmer forms e+13 or 10^13', () => {
    for (const value of [1e-9, 3.3e-5, 7.7e8, 1.65e13, 6.02e23]) {
      for (const text of [formatNumber(value), formatInText(value), formatFixed(value, 2)]) {
        expect(text).not.toMatch(/e[+-]|\^/);
        expect(text).toMatch(/\d × 10[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+$|^\d/);
      }
    }
  });

  it('formatInText (messages) and formatFixed (bench sheet) keep their own ranges', () => {
    expect(formatInText(123456)).toBe('1.23 × 10⁵');
    expect(formatInText(2500)).toBe('2500');
    expect(formatInText(0.5)).toBe('0.500');
    expect(formatFixed(0.00001234, 3)).toBe('1.23 × 10⁻⁵');
    expect(formatFixed(12.345, 2)).toBe('12.35');
    expect(formatFixed(null, 2)).toBe('—');
  });
});
