/**
 * GHS precautionary statements (P-statements) for the bench sheet: the standard texts and, for each hazard
 * statement Pairwright uses, the precautionary statements a label typically carries with it.
 *
 * Texts: UN GHS (Rev. 9, 2021) Annex 3, Section 2, Tables A3.2.1 (general), A3.2.2 (prevention), A3.2.3
 * (response), A3.2.4 (storage), A3.2.5 (disposal) — from memory, with the Annex's "…" placeholders (which the
 * supplier fills in, e.g. the extinguishing medium) kept as "…". The H → P assignment follows the Annex 3
 * tables of each hazard class, reduced to the statements a bench worker acts on (common practice); the
 * supplier's SDS gives the statements that apply to the product in hand.
 */
import { sortHCodes } from './ghs';

export const PRECAUTIONARY_STATEMENTS = Object.freeze({
  P201: 'Obtain special instructions before use.',
  P210: 'Keep away from heat, hot surfaces, sparks, open flames and other ignition sources. No smoking.',
  P220: 'Keep away from clothing and other combustible materials.',
  P223: 'Do not allow contact with water.',
  'P231+P232': 'Handle and store contents under inert gas/…. Protect from moisture.',
  P233: 'Keep container tightly closed.',
  P234: 'Keep only in original packaging.',
  P260: 'Do not breathe dust/fume/gas/mist/vapours/spray.',
  P261: 'Avoid breathing dust/fume/gas/mist/vapours/spray.',
  P264: 'Wash … thoroughly after handling.',
  P270: 'Do not eat, drink or smoke when using this product.',
  P271: 'Use only outdoors or in a well-ventilated area.',
  P272: 'Contaminated work clothing should not be allowed out of the workplace.',
  P273: 'Avoid release to the environment.',
  P280: 'Wear protective gloves/protective clothing/eye protection/face protection.',
  P284: '[In case of inadequate ventilation] wear respiratory protection.',
  'P301+P310': 'IF SWALLOWED: Immediately call a POISON CENTER/doctor/….',
  'P301+P330+P331': 'IF SWALLOWED: Rinse mouth. Do NOT induce vomiting.',
  'P302+P352': 'IF ON SKIN: Wash with plenty of water/….',
  'P303+P361+P353':
    'IF ON SKIN (or hair): Take off immediately all contaminated clothing. Rinse skin with water [or shower].',
  'P304+P340': 'IF INHALED: Remove person to fresh air and keep comfortable for breathing.',
  'P305+P351+P338':
    'IF IN EYES: Rinse cautiously with water for several minutes. Remove contact lenses, if present and easy to do. ' +
    'Continue rinsing.',
  'P308+P313': 'IF exposed or concerned: Get medical advice/attention.',
  'P333+P313': 'If skin irritation or rash occurs: Get medical advice/attention.',
  'P342+P311': 'If experiencing respiratory symptoms: Call a POISON CENTER/doctor/….',
  'P370+P378': 'In case of fire: Use … to extinguish.',
  P391: 'Collect spillage.',
  'P402+P404': 'Store in a dry place. Store in a closed container.',
  'P403+P235': 'Store in a well-ventilated place. Keep cool.',
  P405: 'Store locked up.',
  P501: 'Dispose of contents/container to ….',
} as const);

export type PrecautionCode = keyof typeof PRECAUTIONARY_STATEMENTS;

/** Typical precautionary statements per hazard statement (prevention, response, storage, disposal). */
const PRECAUTIONS_FOR: Readonly<Record<string, readonly PrecautionCode[]>> = Object.freeze({
  H225: ['P210', 'P233', 'P280', 'P303+P361+P353', 'P370+P378', 'P403+P235', 'P501'],
  H226: ['P210', 'P233', 'P280', 'P303+P361+P353', 'P370+P378', 'P403+P235', 'P501'],
  H228: ['P210', 'P280', 'P370+P378'],
  H260: ['P223', 'P231+P232', 'P280', 'P370+P378', 'P402+P404', 'P501'],
  H272: ['P210', 'P220', 'P280', 'P370+P378', 'P501'],
  H290: ['P234'],
  H301: ['P264', 'P270', 'P301+P310', 'P405', 'P501'],
  H302: ['P264', 'P270', 'P501'],
  H304: ['P301+P310', 'P405', 'P501'],
  H311: ['P280', 'P302+P352', 'P405', 'P501'],
  H312: ['P280', 'P302+P352', 'P501'],
  H314: ['P260', 'P264', 'P280', 'P301+P330+P331', 'P303+P361+P353', 'P305+P351+P338', 'P405', 'P501'],
  H315: ['P264', 'P280', 'P302+P352'],
  H317: ['P261', 'P272', 'P280', 'P302+P352', 'P333+P313', 'P501'],
  H318: ['P280', 'P305+P351+P338'],
  H319: ['P264', 'P280', 'P305+P351+P338'],
  H330: ['P260', 'P271', 'P284', 'P304+P340', 'P405', 'P501'],
  H331: ['P261', 'P271', 'P304+P340', 'P405', 'P501'],
  H332: ['P261', 'P271', 'P304+P340'],
  H334: ['P261', 'P284', 'P304+P340', 'P342+P311', 'P501'],
  H335: ['P261', 'P271', 'P304+P340', 'P405', 'P501'],
  H341: ['P201', 'P280', 'P308+P313', 'P405', 'P501'],
  H350: ['P201', 'P280', 'P308+P313', 'P405', 'P501'],
  H351: ['P201', 'P280', 'P308+P313', 'P405', 'P501'],
  H360: ['P201', 'P280', 'P308+P313', 'P405', 'P501'],
  H361: ['P201', 'P280', 'P308+P313', 'P405', 'P501'],
  H370: ['P260', 'P264', 'P270', 'P308+P313', 'P405', 'P501'],
  H372: ['P260', 'P264', 'P270', 'P501'],
  H373: ['P260', 'P501'],
  H400: ['P273', 'P391', 'P501'],
  H410: ['P273', 'P391', 'P501'],
  H411: ['P273', 'P391', 'P501'],
  H412: ['P273', 'P501'],
});

export interface PrecautionLine {
  code: PrecautionCode;
  text: string;
  /** The hazard statements that call for it. */
  forHazards: string[];
}

/** Precautionary statements for a set of H-codes, each once, in P-number order, with the H-codes asking for it. */
export function precautionsFor(hCodes: Iterable<string>): PrecautionLine[] {
  const byCode = new Map<PrecautionCode, Set<string>>();
  for (const hCode of sortHCodes(hCodes)) {
    for (const pCode of PRECAUTIONS_FOR[hCode] ?? []) {
      const set = byCode.get(pCode) ?? new Set<string>();
      set.add(hCode);
      byCode.set(pCode, set);
    }
  }
  const pNumber = (code: string): number => Number(code.slice(1, 4));
  return [...byCode.entries()]
    .sort(([a], [b]) => pNumber(a) - pNumber(b) || a.localeCompare(b))
    .map(([code, hazards]) => ({ code, text: PRECAUTIONARY_STATEMENTS[code], forHazards: [...hazards] }));
}

/** True when every hazard statement Pairwright knows has typical precautionary statements (checked in tests). */
export function hasPrecautionsFor(hCode: string): boolean {
  return (PRECAUTIONS_FOR[hCode]?.length ?? 0) > 0;
}
