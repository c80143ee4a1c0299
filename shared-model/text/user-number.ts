/**
 * The one reader of numbers that people type (form fields, CLI options, "48±2" composition values).
 * Accepts a decimal point or a decimal comma ("12,5"), a sign, and scientific notation ("1.65e13", "1,65E13").
 * Refuses, with a sentence a person understands, text that is not one number — in particular thousands
 * separators ("1,234.5", "1.234,5", "1 234"), which would otherwise be read as a different number.
 * CSV files are read by shared-model/characterization/csv-table.ts, which decides per file whether commas
 * are decimal commas; this module is for single values.
 */

export type UserNumberResult = { ok: true; value: number } | { ok: false; message: string };

/** One number with a decimal point or comma and an optional exponent (also used by the CSV reader per cell). */
export const PLAIN_NUMBER = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/;

/**
 * Reads one typed number. Empty text is refused here; use `readOptionalUserNumber` where empty means "not given".
 * With `field` (how the user knows the field: "temperature, K", "--diameter-nm") a refusal starts with it:
 * 'temperature, K: "abc" is not a number'.
 */
export function readUserNumber(text: string, field?: string): UserNumberResult {
  const result = readUnnamed(text);
  return result.ok || field === undefined ? result : { ok: false, message: `${field}: ${lowerFirst(result.message)}` };
}

const lowerFirst = (message: string) => (message.startsWith('Enter') ? `e${message.slice(1)}` : message);

function readUnnamed(text: string): UserNumberResult {
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, message: 'Enter a number' };
  if (/\d[\s\u00a0\u202f']\d/.test(trimmed)) {
    return { ok: false, message: `"${trimmed}" looks like a number with thousands separators; type it without them` };
  }
  const separators = trimmed.replace(/[eE][+-]?\d+$/, '').match(/[.,]/g) ?? [];
  if (separators.length > 1) {
    return {
      ok: false,
      message: `"${trimmed}" has more than one "." or ","; type one decimal separator and no thousands separators`,
    };
  }
  if (!PLAIN_NUMBER.test(trimmed)) return { ok: false, message: `"${trimmed}" is not a number` };
  const value = Number(trimmed.replace(',', '.'));
  if (!Number.isFinite(value)) return { ok: false, message: `"${trimmed}" is too large` };
  return { ok: true, value };
}

/** Empty text → `{ ok: true, value: undefined }`; otherwise as `readUserNumber`. */
export function readOptionalUserNumber(
  text: string,
  field?: string,
): { ok: true; value: number | undefined } | { ok: false; message: string } {
  return text.trim() === '' ? { ok: true, value: undefined } : readUserNumber(text, field);
}
