/**
 * Numbers as charts and tables show them: axis ticks at round values (0/25/50/75/100, not 1/26/51/76/100),
 * log-axis ticks at 1-2-5 steps, and a value with its uncertainty written to the uncertainty's first two
 * significant digits ("0.512 ± 0.043", never "0.5 ± 0.0"). Pure functions, unit-tested.
 */

/** The round step nearest to `raw`: 1, 2, 2.5 or 5 times a power of ten (common practice for axis ticks). */
export function niceStep(raw: number): number {
  if (!(raw > 0) || !Number.isFinite(raw)) throw new RangeError(`a tick step must be positive, got ${raw}`);
  const power = 10 ** Math.floor(Math.log10(raw));
  const fraction = raw / power;
  const nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 2.5 ? 2.5 : fraction <= 5 ? 5 : 10;
  return nice * power;
}

/**
 * Round ticks covering [min, max] with at most `maxTicks` ticks: multiples of a round step, from the one at
 * or below `min` to the one at or above `max` (so the axis domain is [first, last]).
 */
export function niceTicks(min: number, max: number, maxTicks = 6): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return [];
  if (max < min) return niceTicks(max, min, maxTicks);
  if (max === min) return [min];
  const intervals = Math.max(1, maxTicks - 1);
  let step = niceStep((max - min) / intervals);
  let first = Math.floor(min / step + 1e-9) * step;
  let last = Math.ceil(max / step - 1e-9) * step;
  // rounding the ends outwards can add an interval: take the next round step then
  while (Math.round((last - first) / step) > intervals) {
    step = niceStep(step * 1.0001);
    first = Math.floor(min / step + 1e-9) * step;
    last = Math.ceil(max / step - 1e-9) * step;
  }
  const ticks: number[] = [];
  const count = Math.round((last - first) / step);
  const digits = Math.max(0, -Math.floor(Math.log10(step)) + 2);
  for (let i = 0; i <= count; i++) ticks.push(Number((first + i * step).toFixed(digits)));
  return ticks;
}

/** Ticks of a logarithmic axis at 1, 2 and 5 times each power of ten inside [min, max] (both > 0). */
export function logTicks(min: number, max: number): number[] {
  if (!(min > 0) || !(max > 0)) return [];
  const lo = Math.min(min, max);
  const hi = Math.max(min, max);
  const ticks: number[] = [];
  for (let power = Math.floor(Math.log10(lo)); power <= Math.ceil(Math.log10(hi)); power++) {
    for (const m of [1, 2, 5]) {
      const tick = Number((m * 10 ** power).toPrecision(3));
      if (tick >= lo * (1 - 1e-9) && tick <= hi * (1 + 1e-9)) ticks.push(tick);
    }
  }
  return ticks;
}

/**
 * "value ± uncertainty", both to the decimal place of the uncertainty's second significant digit
 * (0.5123 ± 0.0432 → "0.512 ± 0.043"; 12.34 ± 2.3 → "12.3 ± 2.3"); an uncertainty of exactly 0 is
 * written "± 0" beside the value to `fallbackDecimals`.
 */
export function plusMinus(value: number, uncertainty: number, fallbackDecimals = 2, significant = 2): string {
  if (!Number.isFinite(value)) return '–';
  if (!Number.isFinite(uncertainty) || uncertainty < 0) return value.toFixed(fallbackDecimals);
  if (uncertainty === 0) return `${value.toFixed(fallbackDecimals)} ± 0`;
  const decimals = Math.min(12, Math.max(0, significant - 1 - Math.floor(Math.log10(uncertainty))));
  return `${value.toFixed(decimals)} ± ${uncertainty.toFixed(decimals)}`;
}
