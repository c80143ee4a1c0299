/** Round axis ticks and value ± uncertainty (common practice in scientific plotting and reporting). */
import { describe, expect, it } from 'vitest';
import { logTicks, niceStep, niceTicks, plusMinus } from '../../renderer/src/charts/chart-numbers';

describe('axis ticks at round values', () => {
  it('composition 0–100 at.% gets 0/25/50/75/100, also from data that starts at 1 at.%', () => {
    expect(niceTicks(0, 100, 5)).toEqual([0, 25, 50, 75, 100]);
    expect(niceTicks(1, 99, 5)).toEqual([0, 25, 50, 75, 100]);
  });

  it('steps are 1, 2, 2.5 or 5 times a power of ten', () => {
    expect([0.7, 1.3, 2.2, 3, 7, 13].map(niceStep)).toEqual([1, 2, 2.5, 5, 10, 20]);
    // 300–1500 K in at most six ticks: steps of 250 K, from 250 K to 1500 K
    expect(niceTicks(300, 1500, 6)).toEqual([250, 500, 750, 1000, 1250, 1500]);
    expect(niceTicks(0, 0.37, 5)).toEqual([0, 0.1, 0.2, 0.3, 0.4]);
    expect(niceTicks(5, 5)).toEqual([5]);
  });

  it('log ticks at 1-2-5 per decade inside the range', () => {
    expect(logTicks(1, 20)).toEqual([1, 2, 5, 10, 20]);
    expect(logTicks(1.5, 30)).toEqual([2, 5, 10, 20]);
    expect(logTicks(0, 10)).toEqual([]);
  });
});

describe('value ± uncertainty', () => {
  it('writes both to the uncertainty’s second significant digit, never "± 0.0"', () => {
    expect(plusMinus(0.5123, 0.0432)).toBe('0.512 ± 0.043');
    expect(plusMinus(12.34, 2.3)).toBe('12.3 ± 2.3');
    expect(plusMinus(48.2, 0.004)).toBe('48.2000 ± 0.0040');
    expect(plusMinus(1234, 56)).toBe('1234 ± 56');
    expect(plusMinus(3.2, 0)).toBe('3.20 ± 0');
    expect(plusMinus(Number.NaN, 1)).toBe('–');
  });
});
