/** Number formatting shared by the batch commands' tables and texts. */

/** Four significant digits; exponent form for very large or very small values; blank for null. */
export function num(value: number | null, digits = 4): string {
  if (value === null || !Number.isFinite(value)) return '';
  const abs = Math.abs(value);
  if (abs !== 0 && (abs >= 1e6 || abs < 1e-3)) return value.toExponential(digits - 1);
  return Number(value.toPrecision(digits)).toString();
}
