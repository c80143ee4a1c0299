/**
 * Waste streams (DOMAIN.md Models 8; common practice in synthesis labs). Which container a reagent's
 * residue goes to; the institution's waste rules decide the details.
 */
export type WasteStreamId =
  | 'precious-metal-recovery'
  | 'heavy-metal-aqueous'
  | 'heavy-metal-solvent'
  | 'organic-solvent'
  | 'aqueous-general'
  | 'reactive-quench'
  | 'acid'
  | 'carbonyl';

export interface WasteStream {
  id: WasteStreamId;
  label: string;
  instruction: string;
}

export const WASTE_STREAMS: Readonly<Record<WasteStreamId, WasteStream>> = Object.freeze({
  'precious-metal-recovery': {
    id: 'precious-metal-recovery',
    label: 'Precious-metal residues (for recovery)',
    instruction:
      'Collect supernatants, washings and failed batches containing Au, Pt, Pd, Rh, Ir, Ru or Ag separately for precious-metal recovery; label with metals and solvent.',
  },
  'heavy-metal-aqueous': {
    id: 'heavy-metal-aqueous',
    label: 'Heavy-metal aqueous waste',
    instruction:
      'Aqueous solutions with Ni, Co, Cu or other heavy-metal ions: heavy-metal aqueous container, never the drain.',
  },
  'heavy-metal-solvent': {
    id: 'heavy-metal-solvent',
    label: 'Metal-bearing organic solvent waste',
    instruction:
      'Organic-phase mother liquors (oleylamine, octadecene, glycols) carrying metal: non-halogenated solvent waste labelled with the metals.',
  },
  'organic-solvent': {
    id: 'organic-solvent',
    label: 'Non-halogenated organic solvent waste',
    instruction: 'Organic solvents and ligands without metal: non-halogenated solvent waste.',
  },
  'aqueous-general': {
    id: 'aqueous-general',
    label: 'Aqueous waste (check local rules)',
    instruction:
      'Dilute, metal-free aqueous solutions of low hazard (ascorbate, citrate, PVP): follow local rules; many institutions still require collection.',
  },
  'reactive-quench': {
    id: 'reactive-quench',
    label: 'Reactive reducer: quench first',
    instruction:
      'Unused borohydride, borane–amine or hydrazine solutions: quench by the institutional procedure (slow addition to dilute acid or oxidant in a fume hood, venting the gas) before they join aqueous waste; never close a container with active hydride.',
  },
  acid: {
    id: 'acid',
    label: 'Acid waste',
    instruction:
      'Spent acids (HCl, HNO3, aqua regia): separate acid container with a vented cap, never with organics; aqua regia that dissolved precious metal goes to recovery.',
  },
  carbonyl: {
    id: 'carbonyl',
    label: 'Metal carbonyl residues',
    instruction:
      "Metal carbonyl residues: deactivate under the institution's procedure in a fume hood before disposal; never in general solvent waste.",
  },
});

const PRECIOUS_METALS = new Set(['Au', 'Pt', 'Pd', 'Rh', 'Ir', 'Ru', 'Ag', 'Os', 'Re']);

export function isPreciousMetal(symbol: string): boolean {
  return PRECIOUS_METALS.has(symbol);
}

/** The stream for the batch's metal-bearing mother liquor. */
export function motherLiquorStream(metals: readonly string[], aqueous: boolean): WasteStreamId {
  if (metals.some(isPreciousMetal)) return 'precious-metal-recovery';
  return aqueous ? 'heavy-metal-aqueous' : 'heavy-metal-solvent';
}
