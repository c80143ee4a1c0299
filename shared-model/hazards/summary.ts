/**
 * Hazard aggregation across reagents (one batch, or a reagent list across batches): union of H-codes
 * with their texts, pictograms, the strictest signal word, incompatible pairs present together, waste
 * streams, and the standing caution.
 */
import {
  CLASSIFICATION_SOURCE_NOTE,
  hazardStatement,
  pictogramName,
  pictogramsFor,
  sortHCodes,
  STANDING_CAUTION,
  strictestSignalWord,
  type PictogramCode,
  type SignalWord,
} from './ghs';
import {
  incompatibilityWarnings,
  standingBenchCautions,
  type HazardTag,
  type IncompatibilityContext,
  type IncompatibilityWarning,
} from './incompatibilities';
import { motherLiquorStream, WASTE_STREAMS, type WasteStream, type WasteStreamId } from './waste';

export interface ReagentHazardProfile {
  key: string;
  name: string;
  hCodes: readonly string[];
  signalWord: SignalWord | null;
  tags: readonly HazardTag[];
  wasteStream: WasteStreamId;
  amountMmol?: number;
  note?: string;
}

export interface HazardLine {
  code: string;
  text: string;
  /** Reagents carrying it. */
  reagents: string[];
}

export interface ReagentHazardBlock {
  key: string;
  name: string;
  hazards: { code: string; text: string }[];
  pictograms: { code: PictogramCode; name: string }[];
  signalWord: SignalWord | null;
  wasteStream: WasteStream;
  note?: string;
  source: string;
}

export interface HazardSummary {
  /** Union of H-codes, sorted, each with its standard text. */
  hazards: HazardLine[];
  pictograms: { code: PictogramCode; name: string }[];
  signalWord: SignalWord | null;
  perReagent: ReagentHazardBlock[];
  warnings: IncompatibilityWarning[];
  wasteStreams: WasteStream[];
  caution: string;
}

export const HAZARD_SOURCE_NOTE = CLASSIFICATION_SOURCE_NOTE;

export function reagentHazardBlock(profile: ReagentHazardProfile): ReagentHazardBlock {
  const codes = sortHCodes(profile.hCodes);
  return {
    key: profile.key,
    name: profile.name,
    hazards: codes.map((code) => ({ code, text: hazardStatement(code).text })),
    pictograms: pictogramsFor(codes).map((code) => ({ code, name: pictogramName(code) })),
    signalWord: profile.signalWord,
    wasteStream: WASTE_STREAMS[profile.wasteStream],
    ...(profile.note ? { note: profile.note } : {}),
    source: HAZARD_SOURCE_NOTE,
  };
}

export interface SummaryContext extends IncompatibilityContext {
  /** Include the dry-nanopowder and aqua-regia glassware cautions (true for a synthesis). */
  benchCautions?: boolean;
  /**
   * Warnings worked out elsewhere (per batch, see batchWarnings) used instead of the rules over all the
   * profiles together: reagents of different batches never meet in one flask.
   */
  warnings?: readonly IncompatibilityWarning[];
}

/** The reagents of one batch, for warnings that only reagents present together can trigger. */
export interface BatchHazardProfiles {
  batchId: number;
  batchName: string;
  profiles: readonly ReagentHazardProfile[];
  context?: IncompatibilityContext;
}

export interface BatchWarning extends IncompatibilityWarning {
  /** The batches it applies to (the same warning word for word in several batches is given once). */
  batchIds: number[];
}

/**
 * Incompatibility warnings batch by batch (each batch's reagents and conditions alone), each message led
 * by the batches it applies to; the same warning in several batches is given once, naming them all.
 */
export function batchWarnings(batches: readonly BatchHazardProfiles[]): BatchWarning[] {
  const merged = new Map<string, { warning: IncompatibilityWarning; batches: { id: number; name: string }[] }>();
  for (const batch of batches) {
    for (const warning of incompatibilityWarnings(batch.profiles, batch.context ?? {})) {
      const key = `${warning.id}\u0000${warning.message}`;
      const entry = merged.get(key) ?? { warning, batches: [] };
      if (!entry.batches.some((b) => b.id === batch.batchId))
        entry.batches.push({ id: batch.batchId, name: batch.batchName });
      merged.set(key, entry);
    }
  }
  return [...merged.values()].map(({ warning, batches: inBatches }) => {
    const named = inBatches.map((b) => `#${b.id} ${b.name}`).join(', ');
    return {
      ...warning,
      message: `${inBatches.length === 1 ? 'Batch' : 'Batches'} ${named}: ${warning.message}`,
      batchIds: inBatches.map((b) => b.id),
    };
  });
}

export function summarizeHazards(
  profiles: readonly ReagentHazardProfile[],
  context: SummaryContext = {},
): HazardSummary {
  const byCode = new Map<string, Set<string>>();
  for (const profile of profiles) {
    for (const code of profile.hCodes) {
      const holders = byCode.get(code) ?? new Set<string>();
      holders.add(profile.name);
      byCode.set(code, holders);
    }
  }
  const codes = sortHCodes(byCode.keys());
  const hazards = codes.map((code) => ({
    code,
    text: hazardStatement(code).text,
    reagents: [...(byCode.get(code) ?? [])],
  }));
  const warnings = context.warnings ? [...context.warnings] : incompatibilityWarnings(profiles, context);
  if (context.benchCautions) warnings.push(...standingBenchCautions());
  const streamIds = new Set<WasteStreamId>(profiles.map((p) => p.wasteStream));
  if (context.metals && context.metals.length > 0)
    streamIds.add(motherLiquorStream(context.metals, context.aqueous ?? false));
  const order = Object.keys(WASTE_STREAMS) as WasteStreamId[];
  return {
    hazards,
    pictograms: pictogramsFor(codes).map((code) => ({ code, name: pictogramName(code) })),
    signalWord: strictestSignalWord(profiles.map((p) => p.signalWord)),
    perReagent: profiles.map(reagentHazardBlock),
    warnings,
    wasteStreams: order.filter((id) => streamIds.has(id)).map((id) => WASTE_STREAMS[id]),
    caution: STANDING_CAUTION,
  };
}
