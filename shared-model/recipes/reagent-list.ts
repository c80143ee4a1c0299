/**
 * Reagent list for a set of planned batches: totals per reagent against the inventory the user keeps
 * (amount on hand, location, lot), shortfalls, stock-solution volumes, a hazard summary across the list
 * (incompatibilities batch by batch: reagents of different batches never share a flask), and CSV export.
 * Comparisons are made in mass (mg): inventory volumes are converted with the reagent's density.
 */
import Papa from 'papaparse';
import { invalid } from '../api/result';
import type { IncompatibilityContext } from '../hazards/incompatibilities';
import { batchWarnings, summarizeHazards, type HazardSummary, type ReagentHazardProfile } from '../hazards/summary';
import type { DesignedReagent } from './design';
import type { Reagent } from './reagent';

export const INVENTORY_UNITS = ['mg', 'g', 'kg', 'mL', 'L'] as const;
export type InventoryUnit = (typeof INVENTORY_UNITS)[number];

export interface InventoryItem {
  reagentKey: string;
  amount: number;
  unit: InventoryUnit;
  location: string;
  lot: string;
}

export interface BatchReagents {
  batchId: number;
  batchName: string;
  reagents: readonly DesignedReagent[];
  /** The batch's temperature, metals and solvent, for the warnings that depend on them. */
  context?: IncompatibilityContext;
}

export type ReagentListStatus = 'enough' | 'short' | 'not in inventory' | 'cannot compare';

export interface ReagentListLine {
  key: string;
  name: string;
  formula: string;
  roles: string[];
  totalAmountMmol: number | null;
  /** Mass to weigh in total (mg); null for reagents dispensed only by volume without a known mass. */
  totalMassMg: number | null;
  /** Neat-liquid volume in total (mL) for liquids; null for solids. */
  totalVolumeMl: number | null;
  /** Stock-solution volume to pipette in total (mL), over the uses given as a stock; null when none is. */
  totalStockVolumeMl: number | null;
  batchIds: number[];
  onHandMg: number | null;
  onHandText: string;
  locations: string[];
  lots: string[];
  shortfallMg: number | null;
  status: ReagentListStatus;
  hCodes: string[];
  signalWord: string | null;
}

export interface ReagentList {
  batchIds: number[];
  lines: ReagentListLine[];
  hazardSummary: HazardSummary;
}

/** Converts an inventory amount to mg (volumes need the density, g/mL). Returns null when it cannot. */
export function inventoryMassMg(
  item: Pick<InventoryItem, 'amount' | 'unit'>,
  densityGPerMl: number | null | undefined,
): number | null {
  if (!Number.isFinite(item.amount) || item.amount < 0)
    throw invalid('amount', `inventory amount must be ≥ 0, got ${item.amount}`);
  switch (item.unit) {
    case 'mg':
      return item.amount;
    case 'g':
      return item.amount * 1000;
    case 'kg':
      return item.amount * 1e6;
    case 'mL':
      return densityGPerMl ? item.amount * densityGPerMl * 1000 : null;
    case 'L':
      return densityGPerMl ? item.amount * 1000 * densityGPerMl * 1000 : null;
  }
}

/**
 * Totals per reagent across `batches` (the seed dispersions, which are products of other batches, and
 * make-up water, which nobody stocks, are left out), compared with `inventory`.
 */
export function buildReagentList(
  batches: readonly BatchReagents[],
  inventory: readonly InventoryItem[],
  catalog: readonly Reagent[],
): ReagentList {
  const byKey = new Map(catalog.map((r) => [r.key, r]));
  const lines = new Map<string, ReagentListLine>();
  for (const batch of batches) {
    for (const use of batch.reagents) {
      if (use.role === 'seeds' || use.massMg === null) continue;
      const reagent = byKey.get(use.key);
      const line =
        lines.get(use.key) ??
        ({
          key: use.key,
          name: use.name,
          formula: use.formula,
          roles: [],
          totalAmountMmol: 0,
          totalMassMg: 0,
          totalVolumeMl: reagent && (reagent.form === 'liquid' || reagent.form === 'solution') ? 0 : null,
          totalStockVolumeMl: null,
          batchIds: [],
          onHandMg: null,
          onHandText: '',
          locations: [],
          lots: [],
          shortfallMg: null,
          status: 'not in inventory',
          hCodes: reagent ? [...reagent.hCodes] : [],
          signalWord: reagent?.signalWord ?? null,
        } satisfies ReagentListLine);
      if (!line.roles.includes(use.role)) line.roles.push(use.role);
      line.totalAmountMmol =
        line.totalAmountMmol === null || use.amountMmol === null ? null : line.totalAmountMmol + use.amountMmol;
      line.totalMassMg = (line.totalMassMg ?? 0) + use.massMg;
      if (line.totalVolumeMl !== null && reagent?.densityGPerMl)
        line.totalVolumeMl += use.massMg / 1000 / reagent.densityGPerMl;
      if (use.stockMm !== null && use.volumeMl !== null)
        line.totalStockVolumeMl = (line.totalStockVolumeMl ?? 0) + use.volumeMl;
      if (!line.batchIds.includes(batch.batchId)) line.batchIds.push(batch.batchId);
      lines.set(use.key, line);
    }
  }

  for (const line of lines.values()) {
    const items = inventory.filter((item) => item.reagentKey === line.key);
    if (items.length === 0) continue;
    const density = byKey.get(line.key)?.densityGPerMl ?? null;
    let onHand = 0;
    let comparable = true;
    for (const item of items) {
      const mg = inventoryMassMg(item, density);
      if (mg === null) comparable = false;
      else onHand += mg;
    }
    line.onHandText = items.map((item) => `${item.amount} ${item.unit}`).join(' + ');
    line.locations = [...new Set(items.map((i) => i.location).filter((l) => l.length > 0))];
    line.lots = [...new Set(items.map((i) => i.lot).filter((l) => l.length > 0))];
    if (!comparable) {
      line.status = 'cannot compare';
      continue;
    }
    line.onHandMg = onHand;
    const need = line.totalMassMg ?? 0;
    line.shortfallMg = need > onHand ? need - onHand : 0;
    line.status = need > onHand ? 'short' : 'enough';
  }

  const ordered = [...lines.values()].sort((a, b) => a.name.localeCompare(b.name));
  const profile = (key: string, amountMmol: number | null): ReagentHazardProfile[] => {
    const reagent = byKey.get(key);
    if (!reagent) return [];
    const { name, hCodes, signalWord, tags, wasteStream } = reagent;
    return [{ key, name, hCodes, signalWord, tags, wasteStream, ...(amountMmol !== null ? { amountMmol } : {}) }];
  };
  const profiles = ordered.flatMap((line) => profile(line.key, line.totalAmountMmol));
  // Incompatibilities only within a batch (its reagents share a flask), summarised batch by batch.
  const warnings = batchWarnings(
    batches.map((batch) => ({
      batchId: batch.batchId,
      batchName: batch.batchName,
      profiles: batchProfiles(batch).flatMap(([key, amountMmol]) => profile(key, amountMmol)),
      ...(batch.context ? { context: batch.context } : {}),
    })),
  );
  return {
    batchIds: batches.map((b) => b.batchId),
    lines: ordered,
    hazardSummary: summarizeHazards(profiles, { warnings }),
  };
}

/** Each reagent of a batch once (seeds and unweighed lines left out, as in the totals), with its amount. */
function batchProfiles(batch: BatchReagents): [string, number | null][] {
  const amounts = new Map<string, number | null>();
  for (const use of batch.reagents) {
    if (use.role === 'seeds' || use.massMg === null) continue;
    const sum = amounts.has(use.key) ? (amounts.get(use.key) ?? null) : 0;
    amounts.set(use.key, sum === null || use.amountMmol === null ? null : sum + use.amountMmol);
  }
  return [...amounts];
}

function rounded(value: number | null, digits = 4): string {
  if (value === null || !Number.isFinite(value)) return '';
  return Number(value.toPrecision(digits)).toString();
}

/** The list as CSV (papaparse `unparse`), one row per reagent; H-codes and signal word included. */
export function reagentListCsv(list: ReagentList): string {
  const rows = list.lines.map((line) => ({
    reagent: line.name,
    formula: line.formula,
    roles: line.roles.join('; '),
    total_mmol: rounded(line.totalAmountMmol),
    total_mass_mg: rounded(line.totalMassMg),
    total_volume_ml: rounded(line.totalVolumeMl),
    total_stock_ml: rounded(line.totalStockVolumeMl),
    batches: line.batchIds.join('; '),
    on_hand: line.onHandText,
    location: line.locations.join('; '),
    lot: line.lots.join('; '),
    shortfall_mg: rounded(line.shortfallMg),
    status: line.status,
    h_codes: line.hCodes.join(' '),
    signal_word: line.signalWord ?? '',
  }));
  return Papa.unparse(rows, {
    columns: [
      'reagent',
      'formula',
      'roles',
      'total_mmol',
      'total_mass_mg',
      'total_volume_ml',
      'total_stock_ml',
      'batches',
      'on_hand',
      'location',
      'lot',
      'shortfall_mg',
      'status',
      'h_codes',
      'signal_word',
    ],
    newline: '\n',
  });
}
