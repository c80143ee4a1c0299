/** Helpers every design stage uses: number and potential formatting for check messages, catalog look-up. */
import { invalid } from '../../api/result';
import { formatInText } from '../../text/number-format';
import type { Reagent } from '../reagent';

/** Three significant digits, scientific notation (1.65 × 10¹³) for very large or small values (check and note texts). */
export const fmt = formatInText;

/** An electrode potential with its sign, e.g. "+1.002 V", "−0.257 V". */
export function signedV(value: number): string {
  return `${value >= 0 ? '+' : '−'}${Math.abs(value).toFixed(3)} V`;
}

/** The catalog by key; `require` names the input field when a key is unknown. */
export interface CatalogIndex {
  get(key: string): Reagent | undefined;
  require(key: string, field: string): Reagent;
}

export function indexCatalog(catalog: readonly Reagent[]): CatalogIndex {
  const byKey = new Map(catalog.map((r) => [r.key, r]));
  return {
    get: (key) => byKey.get(key),
    require: (key, field) => {
      const found = byKey.get(key);
      if (!found) throw invalid(field, `no reagent "${key}" in the catalog`);
      return found;
    },
  };
}
