/**
 * How numbers are shown to people (the batch result, the bench sheet, the reagent lists, check messages): very
 * large and very small values in scientific notation as it is printed, "1.65 × 10¹³" (a true multiplication
 * sign and superscript exponent digits), never "1.65e+13" or "1.65 × 10^13". One place, so every view reads alike.
 */

const SUPERSCRIPT: Readonly<Record<string, string>> = {
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
  '-': '⁻',
};

/** An integer exponent in superscript digits, e.g. -4 → "⁻⁴". */
export function superscript(exponent: number): string {
  return [...String(Math.trunc(exponent))].map((c) => SUPERSCRIPT[c] ?? c).join('');
}

/** `value` in scientific notation with `digits` significant digits: 1.65e13 → "1.65 × 10¹³", −2e-4 → "−2.00 × 10⁻⁴". */
export function scientific(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return String(value);
  const [mantissa = '', exponent = '0'] = value.toExponential(Math.max(0, digits - 1)).split('e');
  const sign = mantissa.startsWith('-') ? '−' : '';
  const power = Number(exponent);
  const body = mantissa.replace(/^-/, '');
  return power === 0 ? `${sign}${body}` : `${sign}${body} × 10${superscript(power)}`;
}

/** Whether a value is shown in scientific notation: |value| ≥ `large` or below `small` (0 never is). */
function wantsScientific(value: number, large: number, small: number): boolean {
  const abs = Math.abs(value);
  return abs !== 0 && (abs >= large || abs < small);
}

/**
 * A number for a table or a figure: `digits` significant digits, thousands grouped (en-US), scientific
 * notation from 10⁶ up and below 10⁻³; "—" when there is no value.
 */
export function formatNumber(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  if (wantsScientific(value, 1e6, 1e-3)) return scientific(value, digits);
  return Number(value.toPrecision(digits)).toLocaleString('en-US', { maximumFractionDigits: 6 });
}

/** A number inside a sentence (check and note texts): three significant digits, scientific from 10⁵ and below 10⁻³. */
export function formatInText(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return String(value);
  if (wantsScientific(value, 1e5, 1e-3)) return scientific(value, digits);
  if (Math.abs(value) >= 10 ** digits) return value.toFixed(0);
  return value.toPrecision(digits);
}

/** Fixed decimals for a printed amount (the bench sheet); values too small for them, or 10⁹ and up, in scientific notation. */
export function formatFixed(value: number | null, decimals: number): string {
  if (value === null || !Number.isFinite(value)) return '—';
  if (wantsScientific(value, 1e9, 10 ** -decimals)) return scientific(value, 3);
  return value.toFixed(decimals);
}
