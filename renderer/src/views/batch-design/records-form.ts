/**
 * Pure helpers of the saved-batch forms: stock-preparation dates between the browser's local
 * `datetime-local` text and ISO instants, and the measured size and concentration typed when a batch is
 * marked characterized (typed numbers through the one reader).
 */
import type { SavedBatch } from '../../../../shared-model/api/batches';
import { formatHours } from '../../../../shared-model/recipes/stocks';
import { readOptionalUserNumber } from '../../../../shared-model/text/user-number';

/** A stock's age as the table shows it: days once it is a day old, with its limit and a reminder when stale. */
export function stockAgeText(age: SavedBatch['stockAges'][number] | undefined): string {
  if (!age) return '';
  const limit = age.freshnessHours !== null ? ` (limit ${formatHours(age.freshnessHours)})` : '';
  return `${formatHours(age.ageHours)}${limit}${age.stale ? ' — make it fresh' : ''}`;
}

/** An ISO instant as `datetime-local` text in the time zone `offsetMinutes` (Date#getTimezoneOffset) says. */
export function localDateTimeText(iso: string, offsetMinutes = new Date(iso).getTimezoneOffset()): string {
  const date = new Date(iso);
  return new Date(date.getTime() - offsetMinutes * 60_000).toISOString().slice(0, 16);
}

/**
 * The stocks to record: one per reagent with a date, as an ISO instant; text that is not a date goes through
 * as typed so the contract names the field.
 */
export function stocksFromDates(dates: Record<string, string>): { reagentKey: string; preparedAt: string }[] {
  return Object.entries(dates)
    .filter(([, value]) => value.trim() !== '')
    .map(([reagentKey, value]) => {
      const time = new Date(value);
      return { reagentKey, preparedAt: Number.isNaN(time.getTime()) ? value : time.toISOString() };
    });
}

export type MeasuredReading =
  { ok: true; measured: { diameterNm?: number; particlesPerMl?: number } } | { ok: false; message: string };

/** Measured diameter (nm) and particles per mL, each optional. */
export function readMeasured(diameterText: string, concentrationText: string): MeasuredReading {
  const diameter = readOptionalUserNumber(diameterText, 'measured diameter (nm)');
  if (!diameter.ok) return diameter;
  const concentration = readOptionalUserNumber(concentrationText, 'measured particles per mL');
  if (!concentration.ok) return concentration;
  return {
    ok: true,
    measured: {
      ...(diameter.value !== undefined ? { diameterNm: diameter.value } : {}),
      ...(concentration.value !== undefined ? { particlesPerMl: concentration.value } : {}),
    },
  };
}
