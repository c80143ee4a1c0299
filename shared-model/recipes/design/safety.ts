/**
 * Design stage 4 — stocks and hazards (DOMAIN.md Model 8): stale stock solutions, then the hazard block
 * of the batch (the union of its reagents' hazard statements and the bench cautions) with its warnings
 * as checks. The block defers to the supplier's SDS and local safety rules (hazards/summary.ts).
 */
import { summarizeHazards, type HazardSummary, type ReagentHazardProfile } from '../../hazards/summary';
import type { BatchDesignInput } from '../design-input';
import { formatHours, stockAges } from '../stocks';
import type { DesignAmounts } from './amounts';
import type { CatalogIndex } from './common';
import type { DesignCheck, DesignedReagent } from './types';

/** A warning for each stock older than its limit (the user's, else the catalog's); none without `now`. */
export function stockAgeChecks(input: BatchDesignInput, catalog: CatalogIndex, now: string | undefined): DesignCheck[] {
  if (!now || input.stocks.length === 0) return [];
  const ages = stockAges(
    input.stocks.map((stock, index) => {
      const reagent = catalog.require(stock.reagentKey, `stocks.${index}.reagentKey`);
      return {
        reagentKey: reagent.key,
        name: reagent.name,
        preparedAt: stock.preparedAt,
        freshnessHours: stock.freshnessHours ?? reagent.stockFreshnessHours ?? null,
      };
    }),
    now,
  );
  const checks: DesignCheck[] = [];
  for (const age of ages) {
    if (age.stale && age.freshnessHours !== null) {
      checks.push({
        kind: 'stock-age',
        severity: 'warning',
        message:
          `The ${age.name} stock is ${formatHours(age.ageHours)} old, beyond its ${formatHours(age.freshnessHours)} ` +
          'limit: make it fresh.',
      });
    }
  }
  return checks;
}

export interface BatchHazards {
  hazardSummary: HazardSummary;
  checks: DesignCheck[];
}

/** Hazards of the reagents on the lines (each reagent once), at the batch's temperature and solvent. */
export function batchHazards(amounts: DesignAmounts, lines: DesignedReagent[], catalog: CatalogIndex): BatchHazards {
  const profiles: ReagentHazardProfile[] = [];
  for (const line of lines) {
    if (line.role === 'seeds') continue;
    const reagent = catalog.get(line.key);
    if (!reagent || profiles.some((p) => p.key === reagent.key)) continue;
    profiles.push({
      key: reagent.key,
      name: reagent.name,
      hCodes: reagent.hCodes,
      signalWord: reagent.signalWord,
      tags: reagent.tags,
      wasteStream: reagent.wasteStream,
      ...(line.amountMmol !== null ? { amountMmol: line.amountMmol } : {}),
      ...(reagent.notes ? { note: reagent.notes } : {}),
    });
  }
  const precursorMetals = [...amounts.precursors.keys()];
  const metals = amounts.seeds ? [amounts.seeds.metal, ...precursorMetals] : precursorMetals;
  const hazardSummary = summarizeHazards(profiles, {
    temperatureC: amounts.temperatureC,
    metals,
    aqueous: amounts.aqueous,
    benchCautions: true,
  });
  const checks: DesignCheck[] = [];
  for (const warning of hazardSummary.warnings) {
    if (warning.reagentKeys.length === 0) continue;
    const severity = warning.severity === 'caution' ? 'warning' : warning.severity;
    checks.push({ kind: 'hazard', severity, message: warning.message });
  }
  return { hazardSummary, checks };
}
