/**
 * Stock-solution freshness: a stock older than its limit (the user's, else the catalog's default, e.g.
 * borohydride made fresh) earns a warning. `now` is an argument so the check stays pure and repeatable.
 */
import { invalid } from '../api/result';

export interface StockAgeInput {
  reagentKey: string;
  name: string;
  preparedAt: string;
  /** Limit in hours; null = no limit known (no warning). */
  freshnessHours: number | null;
}

export interface StockAge {
  reagentKey: string;
  name: string;
  preparedAt: string;
  ageHours: number;
  freshnessHours: number | null;
  stale: boolean;
}

function parseInstant(field: string, text: string): number {
  const ms = Date.parse(text);
  if (!Number.isFinite(ms)) throw invalid(field, `${field} "${text}" is not a date-time`);
  return ms;
}

export function stockAges(stocks: readonly StockAgeInput[], now: string): StockAge[] {
  const nowMs = parseInstant('now', now);
  return stocks.map((stock, index) => {
    const preparedMs = parseInstant(`stocks.${index}.preparedAt`, stock.preparedAt);
    if (preparedMs > nowMs + 60_000)
      throw invalid(`stocks.${index}.preparedAt`, `${stock.name} stock is dated ${stock.preparedAt}, in the future`);
    const ageHours = Math.max(0, (nowMs - preparedMs) / 3_600_000);
    return {
      reagentKey: stock.reagentKey,
      name: stock.name,
      preparedAt: stock.preparedAt,
      ageHours,
      freshnessHours: stock.freshnessHours,
      stale: stock.freshnessHours !== null && ageHours > stock.freshnessHours,
    };
  });
}

/** An age or a limit as people say it: minutes under an hour, hours under a day, then days ("1 day", "12.5 days"). */
export function formatHours(hours: number): string {
  if (hours < 1) return `${Math.round(hours * 60)} min`;
  if (hours < 24) return `${hours.toFixed(1)} h`;
  const days = hours / 24;
  const text = days < 10 ? days.toFixed(1) : days.toFixed(0);
  return `${text.replace(/\.0$/, '')} ${text === '1.0' || text === '1' ? 'day' : 'days'}`;
}
