/**
 * Lineage: a growth batch points to the seed batch it used. The seeds' measured size and concentration
 * (once characterized) take precedence over the seed batch's planned values, so the shell calculation
 * starts from what was actually made.
 */
import { invalid } from '../api/result';
import { isMetalSymbol } from '../elements/symbols';
import type { SeedsInput } from './design-input';
import type { BatchDesign } from './design';

export interface SeedBatchRecord {
  id: number;
  name: string;
  design: Pick<BatchDesign, 'elementA' | 'elementB' | 'architecture' | 'coreElement' | 'diameterNm' | 'particlesPerMl'>;
  measured?: { diameterNm?: number | null; particlesPerMl?: number | null } | null;
}

export interface ResolvedSeeds {
  seeds: SeedsInput;
  /** Where each number came from, for the view ("measured", "planned"). */
  diameterFrom: 'measured' | 'planned';
  concentrationFrom: 'measured' | 'planned';
  seedBatchId: number;
}

/** The metal of a seed batch (a single-metal design). */
export function seedBatchMetal(record: SeedBatchRecord): string {
  const design = record.design;
  if (design.architecture !== 'single-metal' || !design.coreElement) {
    throw invalid(
      'seeds.seedBatchId',
      `batch #${record.id} (${record.name}) made ${design.architecture} particles; seeds for shell growth must come from a single-metal batch`,
    );
  }
  return design.coreElement;
}

/**
 * Seeds for a growth batch from the seed batch record: measured diameter and concentration when the seed
 * batch was characterized, else its planned ones; `volumeMl` is how much of the seed dispersion is used.
 */
export function seedsFromBatch(record: SeedBatchRecord, metal: string, volumeMl: number): ResolvedSeeds {
  if (!isMetalSymbol(metal)) throw invalid('seeds.metal', `"${metal}" is not one of Pairwright's metals`);
  if (!Number.isFinite(volumeMl) || volumeMl <= 0)
    throw invalid('seeds.volumeMl', `seed volume must be greater than 0 mL, got ${volumeMl}`);
  const measuredDiameter = record.measured?.diameterNm ?? null;
  const measuredConcentration = record.measured?.particlesPerMl ?? null;
  const diameterNm = measuredDiameter ?? record.design.diameterNm;
  const particlesPerMl = measuredConcentration ?? record.design.particlesPerMl;
  if (!(diameterNm > 0)) throw invalid('seeds.seedBatchId', `batch #${record.id} has no seed diameter`);
  if (!(particlesPerMl > 0)) throw invalid('seeds.seedBatchId', `batch #${record.id} has no seed concentration`);
  return {
    seeds: { metal, diameterNm, particlesPerMl, volumeMl, seedBatchId: record.id },
    diameterFrom: measuredDiameter !== null ? 'measured' : 'planned',
    concentrationFrom: measuredConcentration !== null ? 'measured' : 'planned',
    seedBatchId: record.id,
  };
}
