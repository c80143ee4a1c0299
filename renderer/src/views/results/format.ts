/** Number formatting for the Results view. */
import { plusMinus } from '../../charts/chart-numbers';
import type { Estimate } from '../../../../shared-model/characterization/line-scan-fit';

export function num(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '–';
  const abs = Math.abs(value);
  if (abs !== 0 && (abs >= 1e5 || abs < 1e-3)) return value.toExponential(digits - 1);
  return value.toPrecision(digits);
}

export function fixed(value: number | null | undefined, decimals = 2): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '–';
  return value.toFixed(decimals);
}

export function estimate(value: Estimate | null | undefined, decimals = 2): string {
  if (!value) return '–';
  // the uncertainty to its second significant digit, the value to the same place (never "± 0.00")
  return value.sd === null ? fixed(value.value, decimals) : plusMinus(value.value, value.sd, decimals);
}

export const atPct = (fraction: number | null | undefined, decimals = 1): string =>
  fraction === null || fraction === undefined ? '–' : `${(fraction * 100).toFixed(decimals)} at.%`;
