/**
 * What marking a batch made takes from the inventory: each reagent line the reagent list counts (seed
 * dispersions and make-up water are left out, as in reagent-list.ts) is matched to the inventory rows of
 * the same catalog reagent and converted to the row's unit — mass units (mg, g, kg) take the line's mass,
 * volume units (mL, L) take the neat-liquid volume (mass ÷ the catalog density). Rows are used in the
 * order entered; what the rows do not hold is taken from the last usable row, which then goes below zero
 * and a warning says so. Lines that match no row, or no row in a unit that can be converted, are listed
 * as unmatched with the reason.
 */
import type { DesignedReagent } from './design';
import type { InventoryItem, InventoryUnit } from './reagent-list';

export interface InventoryRow extends InventoryItem {
  id: number;
}

export interface InventoryMovement {
  inventoryId: number;
  reagentKey: string;
  reagentName: string;
  /** Change of the row's amount, in its unit (negative when taken). */
  delta: number;
  unit: InventoryUnit;
  before: number;
  after: number;
  location: string;
  lot: string;
}

export interface UnmatchedReagent {
  reagentKey: string;
  reagentName: string;
  reason: string;
}

export interface InventoryUse {
  movements: InventoryMovement[];
  unmatched: UnmatchedReagent[];
  warnings: string[];
}

const PER_UNIT: Record<InventoryUnit, { kind: 'mass' | 'volume'; factor: number }> = {
  mg: { kind: 'mass', factor: 1 },
  g: { kind: 'mass', factor: 1e-3 },
  kg: { kind: 'mass', factor: 1e-6 },
  mL: { kind: 'volume', factor: 1 },
  L: { kind: 'volume', factor: 1e-3 },
};

function shown(value: number): string {
  return Number(value.toPrecision(4)).toString();
}

/** The line's need in one row's unit (mass in mg, neat volume in mL, then scaled), or null when it cannot be said. */
function needIn(unit: InventoryUnit, massMg: number, densityGPerMl: number | null): number | null {
  const { kind, factor } = PER_UNIT[unit];
  if (kind === 'mass') return massMg * factor;
  return densityGPerMl ? (massMg / 1000 / densityGPerMl) * factor : null;
}

/** Totals per reagent of the lines that take from the inventory. */
function needs(lines: readonly DesignedReagent[]): Map<string, { name: string; massMg: number }> {
  const byKey = new Map<string, { name: string; massMg: number }>();
  for (const line of lines) {
    if (line.role === 'seeds' || line.massMg === null) continue;
    const entry = byKey.get(line.key) ?? { name: line.name, massMg: 0 };
    entry.massMg += line.massMg;
    byKey.set(line.key, entry);
  }
  return byKey;
}

/** The inventory changes for using the batch's reagent lines (nothing is changed here). */
export function inventoryUse(
  lines: readonly DesignedReagent[],
  inventory: readonly InventoryRow[],
  densities: ReadonlyMap<string, number | null>,
): InventoryUse {
  const movements: InventoryMovement[] = [];
  const unmatched: UnmatchedReagent[] = [];
  const warnings: string[] = [];
  for (const [key, { name, massMg }] of needs(lines)) {
    const rows = inventory.filter((row) => row.reagentKey === key).sort((a, b) => a.id - b.id);
    if (rows.length === 0) {
      unmatched.push({ reagentKey: key, reagentName: name, reason: 'not in the inventory; nothing was taken' });
      continue;
    }
    const density = densities.get(key) ?? null;
    const usable = rows.filter((row) => needIn(row.unit, massMg, density) !== null);
    if (usable.length === 0) {
      const units = [...new Set(rows.map((row) => row.unit))].join(', ');
      unmatched.push({
        reagentKey: key,
        reagentName: name,
        reason: `held in ${units} but the catalog has no density to turn ${shown(massMg)} mg into a volume; nothing was taken`,
      });
      continue;
    }
    // The share of the need still to take, as a fraction (1 = all of it), so rows in different units add up.
    let remaining = 1;
    usable.forEach((row, index) => {
      if (remaining <= 0) return;
      const need = needIn(row.unit, massMg, density) ?? 0;
      const last = index === usable.length - 1;
      const available = Math.max(row.amount, 0);
      const take = last ? need * remaining : Math.min(need * remaining, available);
      if (take <= 0) return;
      remaining -= take / need;
      const after = row.amount - take;
      movements.push({
        inventoryId: row.id,
        reagentKey: key,
        reagentName: name,
        delta: -take,
        unit: row.unit,
        before: row.amount,
        after,
        location: row.location,
        lot: row.lot,
      });
      if (after < 0) {
        warnings.push(
          `${name}: the batch uses ${shown(take)} ${row.unit} from a stock of ${shown(row.amount)} ${row.unit}` +
            `${row.location ? ` (${row.location})` : ''}; the inventory now shows ${shown(after)} ${row.unit}. ` +
            'Restock, or correct the inventory entry.',
        );
      }
    });
  }
  return { movements, unmatched, warnings };
}
