import { describe, expect, it } from 'vitest';
import {
  chiSquareQuantile,
  erfc,
  logGamma,
  normalQuantile,
  studentTCdf,
  studentTQuantile,
} from '../../../shared-model/characterization/distributions';

describe('special functions', () => {
  it('log-gamma matches exact values', () => {
    // Γ(1/2) = √π and Γ(n) = (n−1)! — exact identities.
    expect(logGamma(0.5)).toBeCloseTo(Math.log(Math.sqrt(Math.PI)), 12);
    expect(logGamma(5)).toBeCloseTo(Math.log(24), 12);
    expect(logGamma(11)).toBeCloseTo(Math.log(3628800), 10);
  });

  it('erfc matches known values', () => {
    // erfc(0) = 1 exactly; erfc(1) = 0.157299207 (Abramowitz & Stegun Table 7.1, from memory).
    expect(erfc(0)).toBeCloseTo(1, 7);
    expect(erfc(1)).toBeCloseTo(0.157299207, 6);
    expect(erfc(-1)).toBeCloseTo(2 - 0.157299207, 6);
  });

  it('Student t quantiles match printed tables', () => {
    // Two-sided 95 % critical values (any statistics table, e.g. NIST/SEMATECH e-Handbook 1.3.6.7.2; from memory).
    expect(studentTQuantile(0.975, 1)).toBeCloseTo(12.706, 3);
    expect(studentTQuantile(0.975, 9)).toBeCloseTo(2.262, 3);
    expect(studentTQuantile(0.975, 29)).toBeCloseTo(2.045, 3);
    expect(studentTQuantile(0.995, 10)).toBeCloseTo(3.169, 3);
    // t with 1 df is Cauchy: quantile tan(π(p − ½)) — exact.
    expect(studentTQuantile(0.9, 1)).toBeCloseTo(Math.tan(Math.PI * 0.4), 8);
    expect(studentTQuantile(0.025, 9)).toBeCloseTo(-2.262, 3);
    expect(studentTCdf(0, 7)).toBeCloseTo(0.5, 12);
  });

  it('χ² quantiles match printed tables', () => {
    // NIST/SEMATECH e-Handbook 1.3.6.7.4 (from memory).
    expect(chiSquareQuantile(0.95, 1)).toBeCloseTo(3.841, 3);
    expect(chiSquareQuantile(0.975, 10)).toBeCloseTo(20.483, 3);
    expect(chiSquareQuantile(0.025, 10)).toBeCloseTo(3.247, 3);
    // χ² with 2 df is exponential with mean 2: quantile −2 ln(1 − p) — exact.
    expect(chiSquareQuantile(0.7, 2)).toBeCloseTo(-2 * Math.log(0.3), 9);
  });

  it('normal quantile', () => {
    // z(0.975) = 1.959964 (standard value, from memory).
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 5);
    expect(normalQuantile(0.5)).toBe(0);
  });

  it('rejects probabilities outside (0, 1)', () => {
    expect(() => studentTQuantile(1, 5)).toThrow(/probability/);
    expect(() => chiSquareQuantile(0, 5)).toThrow(/probability/);
  });
});
