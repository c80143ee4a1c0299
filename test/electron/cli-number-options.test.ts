/** Numbers typed on the command line go through the one reader: decimal commas read, thousands separators refused, the option named. */
import { describe, expect, it } from 'vitest';
import { CliError, optionalNumber, type ParsedArgs } from '../../electron/cli/command';
import { parseAtPercent } from '../../electron/cli/commands/outcomes';

const args = (values: Record<string, string>): ParsedArgs => ({ values, positionals: [] });
const refusal = (fn: () => unknown): string => {
  try {
    fn();
  } catch (error) {
    if (error instanceof CliError) return error.message;
    throw error;
  }
  throw new Error('expected a CliError');
};

describe('numeric CLI options', () => {
  it('reads decimal points, decimal commas and exponents; a missing option is undefined', () => {
    expect(optionalNumber(args({ 'diameter-nm': '2,5' }), 'diameter-nm')).toBe(2.5);
    expect(optionalNumber(args({ 'seed-conc': '1.5e13' }), 'seed-conc')).toBe(1.5e13);
    expect(optionalNumber(args({}), 'diameter-nm')).toBeUndefined();
  });

  it('names the option and says what is wrong', () => {
    expect(refusal(() => optionalNumber(args({ 'diameter-nm': 'abc' }), 'diameter-nm'))).toBe(
      '--diameter-nm must be a number: "abc" is not a number',
    );
    expect(refusal(() => optionalNumber(args({ volume: '1,000.5' }), 'volume'))).toMatch(
      /^--volume must be a number: .*more than one/,
    );
    expect(refusal(() => optionalNumber(args({ volume: ' ' }), 'volume'))).toBe(
      '--volume must be a number, got nothing',
    );
  });

  it('reads at.% with an uncertainty through the same reader (48,5±2 → 0.485 ± 0.02)', () => {
    expect(parseAtPercent('48,5±2', 'composition')).toEqual({ xB: 0.485, uncertaintyXB: 0.02 });
    expect(parseAtPercent('30', 'composition')).toEqual({ xB: 0.3, uncertaintyXB: null });
    expect(refusal(() => parseAtPercent('about 30', 'composition'))).toMatch(/^--composition must be at\.% of B/);
  });
});
