/**
 * Batch design, saved batches, the reagent catalog, the inventory and reagent lists (issue "Batch design").
 * Inputs are zod schemas; outputs are the types below. A saved batch keeps the inputs and the computed
 * design it was saved with, plus the catalog revision of every reagent it used, so a later catalog edit
 * never silently changes it (the batch shows that the catalog changed since).
 */
import { z } from 'zod';
import { batchDesignInputSchema, stockRecordSchema } from '../recipes/design-input';
import type { BatchDesignInput } from '../recipes/design-input';
import type { BatchDesign } from '../recipes/design';
import { reagentInputSchema, type Reagent } from '../recipes/reagent';
import { INVENTORY_UNITS, type InventoryItem, type ReagentList } from '../recipes/reagent-list';
import type { InventoryMovement, UnmatchedReagent } from '../recipes/inventory-use';
import type { StockAge } from '../recipes/stocks';
import { operation } from './operation';
import { idSchema, nameSchema } from './schemas';

export const BATCH_STATUSES = ['planned', 'made', 'characterized'] as const;
export type BatchStatus = (typeof BATCH_STATUSES)[number];

/** Allowed status moves: forward one step, or back to planned to correct a mistake. */
export function statusMoveAllowed(from: BatchStatus, to: BatchStatus): boolean {
  const order = BATCH_STATUSES.indexOf(from);
  const next = BATCH_STATUSES.indexOf(to);
  return next === order + 1 || (to === 'planned' && from !== 'planned') || next === order;
}

export interface CatalogReagent extends Reagent {
  /** Increases with every edit; saved batches record the revision they used. */
  revision: number;
  builtIn: boolean;
  updatedAt: string;
}

export interface ReagentLot {
  reagentKey: string;
  lot: string;
}

export interface CatalogChange {
  reagentKey: string;
  name: string;
  savedRevision: number;
  /** null when the reagent was removed from the catalog since. */
  currentRevision: number | null;
}

export interface MeasuredSeeds {
  diameterNm: number | null;
  particlesPerMl: number | null;
}

/** One line of a batch's history (status moves and the inventory they moved), oldest first. */
export interface BatchHistoryLine {
  id: number;
  event: 'status' | 'stock-taken' | 'stock-returned';
  fromStatus: BatchStatus | null;
  toStatus: BatchStatus | null;
  text: string;
  movements: { inventoryId: number; reagentKey: string; delta: number; unit: string }[];
  /** For stock-taken: the line that gave the reagents back (null while in force). */
  restoredBy: number | null;
  at: string;
}

/** What a status move did to the inventory: taken when marked made, given back when that is undone. */
export interface InventoryEffect {
  kind: 'used' | 'restored';
  movements: InventoryMovement[];
  unmatched: UnmatchedReagent[];
  /** Stocks that went below zero, rows removed since: said to the user, never hidden. */
  warnings: string[];
}

export interface StatusChange extends SavedBatch {
  /** null when the move touched no inventory (e.g. made → characterized, or the inventory switch off). */
  inventoryEffect: InventoryEffect | null;
}

export interface SavedBatch {
  id: number;
  name: string;
  campaignId: number | null;
  pairId: number | null;
  status: BatchStatus;
  input: BatchDesignInput;
  /** The design as computed when saved (never recomputed silently). */
  design: BatchDesign;
  catalogRevisions: Record<string, number>;
  /** Reagents edited (or removed) in the catalog since the batch was saved. */
  catalogChanges: CatalogChange[];
  lots: ReagentLot[];
  /** Ages of the recorded stock solutions at the time of reading. */
  stockAges: StockAge[];
  seedBatchId: number | null;
  measured: MeasuredSeeds | null;
  notes: string;
  history: BatchHistoryLine[];
  createdAt: string;
  updatedAt: string;
}

export interface BatchSummary {
  id: number;
  name: string;
  campaignId: number | null;
  elementA: string;
  elementB: string;
  target: string;
  route: string;
  status: BatchStatus;
  diameterNm: number;
  seedBatchId: number | null;
  catalogChanged: boolean;
  createdAt: string;
  /** A row of an imported history table: characterized, its outcome observed, no design of ours. */
  importedHistory: boolean;
}

export interface InventoryRecord extends InventoryItem {
  id: number;
  reagentName: string;
  updatedAt: string;
}

const statusSchema = z.enum(BATCH_STATUSES, { error: `must be one of: ${BATCH_STATUSES.join(', ')}` });
const notesSchema = z.string({ error: 'must be text' }).max(4000, 'must be at most 4000 characters');
const lotSchema = z.object({
  reagentKey: z.string({ error: 'must name a catalog reagent' }).trim().min(1, 'must name a catalog reagent'),
  lot: z.string({ error: 'must be text' }).trim().max(120, 'must be at most 120 characters'),
});
const batchIdsSchema = z
  .array(idSchema, { error: 'must be a list of batch ids' })
  .min(1, 'select at least one batch')
  .max(200, 'at most 200 batches at once');
const positiveMeasure = (what: string, max: number) =>
  z
    .number({ error: `${what} must be a number` })
    .positive(`${what} must be greater than 0`)
    .max(max, `${what} must be at most ${max}`)
    .nullable()
    .optional();

export const batchOperations = {
  'batches.design': operation<BatchDesign>()({
    kind: 'query',
    summary: 'Compute a batch: atoms, particles, reagent amounts, kinetic checks and hazards',
    input: batchDesignInputSchema,
  }),
  'batches.save': operation<SavedBatch>()({
    kind: 'command',
    summary: 'Save a batch as planned, with its inputs, computed amounts, lots and stock dates',
    input: z.object({
      name: nameSchema,
      campaignId: idSchema.nullable().default(null),
      pairId: idSchema.nullable().default(null),
      design: batchDesignInputSchema,
      lots: z.array(lotSchema).default([]),
      notes: notesSchema.default(''),
    }),
  }),
  'batches.list': operation<BatchSummary[]>()({
    kind: 'query',
    summary:
      "List saved batches, newest first (archived campaigns' batches only with includeArchived; " +
      'statuses: only those, e.g. made and characterized for seed batches)',
    input: z.object({
      campaignId: idSchema.optional(),
      status: statusSchema.optional(),
      statuses: z.array(statusSchema).min(1, 'name at least one status').optional(),
      includeArchived: z.boolean({ error: 'must be true or false' }).default(false),
    }),
  }),
  'batches.get': operation<SavedBatch>()({
    kind: 'query',
    summary: 'One saved batch with catalog changes since and stock ages',
    input: z.object({ id: idSchema }),
  }),
  'batches.setStatus': operation<StatusChange>()({
    kind: 'command',
    summary:
      'Move a batch planned → made → characterized (measured seed size and concentration may be recorded); ' +
      'made takes its reagents from the inventory, back to planned gives them back (inventory: false leaves it)',
    input: z.object({
      id: idSchema,
      status: statusSchema,
      inventory: z.boolean({ error: 'must be true or false' }).default(true),
      measured: z
        .object({
          diameterNm: positiveMeasure('measured diameter (nm)', 1000),
          particlesPerMl: positiveMeasure('measured concentration (particles/mL)', 1e21),
        })
        .optional(),
    }),
  }),
  'batches.record': operation<SavedBatch>()({
    kind: 'command',
    summary: 'Record lots, stock-solution dates and notes of a batch (amounts stay as saved)',
    input: z.object({
      id: idSchema,
      lots: z.array(lotSchema).optional(),
      stocks: z.array(stockRecordSchema).optional(),
      notes: notesSchema.optional(),
    }),
  }),
  'batches.remove': operation<{ removed: number }>()({
    kind: 'command',
    summary: 'Remove a saved batch (needs confirm: true; refused while growth batches use it as seeds)',
    input: z.object({
      id: idSchema,
      confirm: z.literal(true, { error: 'removing a batch needs confirmation (confirm: true)' }),
    }),
  }),
  'reagents.catalog': operation<CatalogReagent[]>()({
    kind: 'query',
    summary: 'The reagent catalog',
    input: z.object({}),
  }),
  'reagents.add': operation<CatalogReagent>()({
    kind: 'command',
    summary: 'Add a reagent to the catalog (formula, role, metal or electrons, hazards)',
    input: reagentInputSchema,
  }),
  'reagents.edit': operation<CatalogReagent>()({
    kind: 'command',
    summary: 'Edit a catalog reagent (new revision; saved batches keep their values)',
    input: reagentInputSchema,
  }),
  'inventory.list': operation<InventoryRecord[]>()({
    kind: 'query',
    summary: 'The inventory: amount on hand, location and lot per reagent',
    input: z.object({}),
  }),
  'inventory.upsert': operation<InventoryRecord>()({
    kind: 'command',
    summary: 'Add or change an inventory entry',
    input: z.object({
      id: idSchema.optional(),
      reagentKey: z.string({ error: 'must name a catalog reagent' }).trim().min(1, 'must name a catalog reagent'),
      // In the row's unit (g, mg, mL, …): up to a million of it, far above any shelf (common practice).
      amount: z.number({ error: 'must be a number' }).min(0, 'must be ≥ 0').max(1e6, 'must be at most 1000000'),
      unit: z.enum(INVENTORY_UNITS, { error: `must be one of: ${INVENTORY_UNITS.join(', ')}` }),
      location: z.string({ error: 'must be text' }).trim().max(120, 'must be at most 120 characters').default(''),
      lot: z.string({ error: 'must be text' }).trim().max(120, 'must be at most 120 characters').default(''),
    }),
  }),
  'inventory.remove': operation<{ removed: number }>()({
    kind: 'command',
    summary: 'Remove an inventory entry',
    input: z.object({ id: idSchema }),
  }),
  'reagents.list': operation<ReagentList>()({
    kind: 'query',
    summary: 'Reagent totals for selected batches against the inventory, with shortfalls and a hazard summary',
    input: z.object({ batchIds: batchIdsSchema }),
  }),
  'reagents.csv': operation<{ csv: string; filename: string }>()({
    kind: 'query',
    summary: 'The reagent list for selected batches as CSV',
    input: z.object({ batchIds: batchIdsSchema }),
  }),
};
