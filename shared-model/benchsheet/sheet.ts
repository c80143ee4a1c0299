/**
 * The bench sheet of one saved batch: what the operator takes to the fume hood. Built from the batch as saved
 * (inputs and the design computed then, never recomputed), so the sheet matches the amounts that were planned.
 */
import type { SavedBatch } from '../api/batches';
import { pictogramName, type PictogramCode } from '../hazards/ghs';
import { precautionsFor, type PrecautionLine } from '../hazards/precautions';
import type { IncompatibilityWarning } from '../hazards/incompatibilities';
import type { WasteStream } from '../hazards/waste';
import { PROCEDURE_REMINDER, PROCEDURE_SOURCE, procedureFor, type ProcedureStep } from './route-procedure';

export interface BenchSheetReagentRow {
  key: string;
  name: string;
  formula: string;
  role: string;
  amountMmol: number | null;
  massMg: number | null;
  /** Volume to pipette (mL): of the stock solution when one is given. */
  volumeMl: number | null;
  stockMm: number | null;
  lot: string;
  note: string;
}

export interface BenchSheet {
  campaignName: string | null;
  batchId: number;
  batchName: string;
  status: string;
  /** The day the batch was saved (ISO date). */
  plannedOn: string;
  /** The day the sheet was printed (ISO date). */
  printedOn: string;
  pair: string;
  target: string;
  routeLabel: string;
  particle: string;
  batchVolumeMl: number;
  temperatureC: number;
  reagents: BenchSheetReagentRow[];
  makeUpVolumeMl: number | null;
  procedure: ProcedureStep[];
  procedureSource: string;
  signalWord: string | null;
  pictograms: { code: PictogramCode; name: string }[];
  hazards: { code: string; text: string }[];
  precautions: PrecautionLine[];
  /** Incompatibilities between reagents of this batch only. */
  incompatibilities: IncompatibilityWarning[];
  wasteStreams: WasteStream[];
  reminder: string;
}

function particleLine(batch: SavedBatch): string {
  const d = batch.design;
  if (d.architecture === 'core@shell' && d.coreDiameterNm !== null) {
    const ml = d.shellMonolayers !== null ? ` (${d.shellMonolayers.toFixed(1)} ML)` : '';
    return (
      `${d.coreElement}@${d.shellElement}: ${d.coreDiameterNm.toFixed(1)} nm core, ` +
      `${(d.shellThicknessNm ?? 0).toFixed(2)} nm shell${ml}; ${d.diameterNm.toFixed(1)} nm overall`
    );
  }
  if (d.architecture === 'single-metal') return `${d.elementA} seeds, ${d.diameterNm.toFixed(1)} nm`;
  return `${d.diameterNm.toFixed(1)} nm, ${(d.xB * 100).toFixed(1)} at.% ${d.elementB}`;
}

export function benchSheet(batch: SavedBatch, campaignName: string | null, printedOn: string): BenchSheet {
  const d = batch.design;
  const lots = new Map(batch.lots.map((l) => [l.reagentKey, l.lot]));
  const hCodes = d.hazardSummary.hazards.map((h) => h.code);
  return {
    campaignName,
    batchId: batch.id,
    batchName: batch.name,
    status: batch.status,
    plannedOn: batch.createdAt.slice(0, 10),
    printedOn,
    pair: `${d.elementA}–${d.elementB}`,
    target: d.target,
    routeLabel: d.routeLabel,
    particle: particleLine(batch),
    batchVolumeMl: d.batchVolumeMl,
    temperatureC: d.temperatureC,
    reagents: d.reagents.map((r) => ({
      key: r.key,
      name: r.name,
      formula: r.formula,
      role: r.role,
      amountMmol: r.amountMmol,
      massMg: r.massMg,
      volumeMl: r.volumeMl,
      stockMm: r.stockMm,
      lot: lots.get(r.key) ?? '',
      note: r.note,
    })),
    makeUpVolumeMl: d.makeUpVolumeMl,
    procedure: procedureFor(d.route, d.reagents, d.temperatureC),
    procedureSource: PROCEDURE_SOURCE,
    signalWord: d.hazardSummary.signalWord,
    pictograms: d.hazardSummary.pictograms.map((p) => ({ code: p.code, name: pictogramName(p.code) })),
    hazards: d.hazardSummary.hazards.map((h) => ({ code: h.code, text: h.text })),
    precautions: precautionsFor(hCodes),
    incompatibilities: d.hazardSummary.warnings.filter((w) => w.reagentKeys.length >= 2),
    wasteStreams: d.hazardSummary.wasteStreams,
    reminder: PROCEDURE_REMINDER,
  };
}
