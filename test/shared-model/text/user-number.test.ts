import { describe, expect, it } from 'vitest';
import { readOptionalUserNumber, readUserNumber } from '../../../shared-model/text/user-number';

const valueOf = (text: string): number => {
  const result = readUserNumber(text);
  if (!result.ok) throw new Error(`expected a number from "${text}", got: ${result.message}`);
  return result.value;
};
const messageOf = (text: string): string => {
  const result = readUserNumber(text);
  if (result.ok) throw new Error(`expected "${text}" to be refused, got ${result.value}`);
  return result.message;
};

describe('readUserNumber', () => {
  it('reads a decimal point, a decimal comma, signs and scientific notation', () => {
    expect(valueOf('12.5')).toBe(12.5);
    expect(valueOf(' 12,5 ')).toBe(12.5);
    expect(valueOf('-3')).toBe(-3);
    expect(valueOf('+0,25')).toBe(0.25);
    expect(valueOf(',5')).toBe(0.5);
    expect(valueOf('1.65e13')).toBe(1.65e13);
    expect(valueOf('1,65E-3')).toBe(0.00165);
  });

  it('refuses thousands separators instead of misreading them', () => {
    expect(messageOf('1,234.5')).toMatch(/more than one/);
    expect(messageOf('1.234,5')).toMatch(/more than one/);
    expect(messageOf('1 234')).toMatch(/thousands separators/);
    expect(messageOf("1'234")).toMatch(/thousands separators/);
  });

  it('refuses text, empty input and overflow with a message that quotes the input', () => {
    expect(messageOf('abc')).toBe('"abc" is not a number');
    expect(messageOf('12 nm')).toMatch(/"12 nm"/);
    expect(messageOf('')).toBe('Enter a number');
    expect(messageOf('1e999')).toMatch(/too large/);
    expect(messageOf('NaN')).toMatch(/not a number/);
    expect(messageOf('Infinity')).toMatch(/not a number/);
  });

  it('treats empty text as not given only in the optional reader', () => {
    expect(readOptionalUserNumber('  ')).toEqual({ ok: true, value: undefined });
    expect(readOptionalUserNumber('2,5')).toEqual({ ok: true, value: 2.5 });
    expect(readOptionalUserNumber('x')).toEqual({ ok: false, message: '"x" is not a number' });
  });
});

describe('naming the field', () => {
  it('puts the field name in front of every refusal and leaves values alone', () => {
    expect(readUserNumber('abc', 'temperature, K')).toEqual({
      ok: false,
      message: 'temperature, K: "abc" is not a number',
    });
    expect(readUserNumber('', '--sweeps')).toEqual({ ok: false, message: '--sweeps: enter a number' });
    expect(readUserNumber('1,234.5', 'diameter, nm')).toMatchObject({
      ok: false,
      message: /^diameter, nm: "1,234.5" has more than one/,
    });
    expect(readOptionalUserNumber('x', 'seed')).toEqual({ ok: false, message: 'seed: "x" is not a number' });
    expect(readUserNumber('2,5', 'diameter, nm')).toEqual({ ok: true, value: 2.5 });
    expect(readOptionalUserNumber(' ', 'seed')).toEqual({ ok: true, value: undefined });
  });
});
