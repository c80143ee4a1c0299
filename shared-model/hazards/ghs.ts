/**
 * UN GHS hazard communication (DOMAIN.md Models 8): hazard statements with their standard texts,
 * pictogram codes and signal words.
 *
 * Texts: UN GHS (Rev. 9, 2021) Annex 3, Tables A3.1.1 (physical), A3.1.2 (health), A3.1.3
 * (environmental). Where the Annex text carries conditional clauses in angle brackets ("<state route of
 * exposure if it is conclusively proven that no other routes of exposure cause the hazard>", "<or state
 * all organs affected, if known>", "<state specific effect if known>"), `text` is the statement without
 * them and `qualifier` names what a label may add. EU CLP sub-codes (H350i, H360F, H360D …) are not UN
 * GHS codes; a reagent that carries one in the EU uses the UN code here and says so in its note.
 *
 * Classification of a substance is the supplier's: these notes support, never replace, the SDS.
 */

export type SignalWord = 'Danger' | 'Warning';

export const PICTOGRAMS = {
  GHS01: 'Exploding bomb',
  GHS02: 'Flame',
  GHS03: 'Flame over circle',
  GHS04: 'Gas cylinder',
  GHS05: 'Corrosion',
  GHS06: 'Skull and crossbones',
  GHS07: 'Exclamation mark',
  GHS08: 'Health hazard',
  GHS09: 'Environment',
} as const;

export type PictogramCode = keyof typeof PICTOGRAMS;

export interface HazardStatement {
  code: string;
  /** Standard text, UN GHS Annex 3 (conditional clauses removed, see `qualifier`). */
  text: string;
  /** Conditional wording the Annex allows a label to add. */
  qualifier?: string;
  hazardClass: string;
  /** Pictogram the statement carries (before the precedence rules); null when it carries none. */
  pictogram: PictogramCode | null;
  /**
   * Signal word of the category. `null` = no signal word (e.g. H412); 'either' = the code covers
   * categories with different signal words (H228: Danger for cat. 1, Warning for cat. 2).
   */
  signalWord: SignalWord | null | 'either';
  /** Pictogram suppressed by the precedence rules when a stronger one of the same kind applies. */
  precedenceGroup?: 'acute-toxicity' | 'skin-eye' | 'sensitisation';
}

const ROUTE = 'state route of exposure if it is conclusively proven that no other routes of exposure cause the hazard';

/** Every H-code Pairwright uses, with its Annex 3 wording. */
export const HAZARD_STATEMENTS: Readonly<Record<string, HazardStatement>> = Object.freeze({
  H225: {
    code: 'H225',
    text: 'Highly flammable liquid and vapour',
    hazardClass: 'Flammable liquids, cat. 2',
    pictogram: 'GHS02',
    signalWord: 'Danger',
  },
  H226: {
    code: 'H226',
    text: 'Flammable liquid and vapour',
    hazardClass: 'Flammable liquids, cat. 3',
    pictogram: 'GHS02',
    signalWord: 'Warning',
  },
  H228: {
    code: 'H228',
    text: 'Flammable solid',
    hazardClass: 'Flammable solids, cat. 1 and 2',
    pictogram: 'GHS02',
    signalWord: 'either',
  },
  H260: {
    code: 'H260',
    text: 'In contact with water releases flammable gases which may ignite spontaneously',
    hazardClass: 'Substances which in contact with water emit flammable gases, cat. 1',
    pictogram: 'GHS02',
    signalWord: 'Danger',
  },
  H272: {
    code: 'H272',
    text: 'May intensify fire; oxidizer',
    hazardClass: 'Oxidizing liquids/solids, cat. 2 and 3',
    pictogram: 'GHS03',
    signalWord: 'either',
  },
  H290: {
    code: 'H290',
    text: 'May be corrosive to metals',
    hazardClass: 'Corrosive to metals, cat. 1',
    pictogram: 'GHS05',
    signalWord: 'Warning',
  },
  H301: {
    code: 'H301',
    text: 'Toxic if swallowed',
    hazardClass: 'Acute toxicity (oral), cat. 3',
    pictogram: 'GHS06',
    signalWord: 'Danger',
    precedenceGroup: 'acute-toxicity',
  },
  H302: {
    code: 'H302',
    text: 'Harmful if swallowed',
    hazardClass: 'Acute toxicity (oral), cat. 4',
    pictogram: 'GHS07',
    signalWord: 'Warning',
    precedenceGroup: 'acute-toxicity',
  },
  H304: {
    code: 'H304',
    text: 'May be fatal if swallowed and enters airways',
    hazardClass: 'Aspiration hazard, cat. 1',
    pictogram: 'GHS08',
    signalWord: 'Danger',
  },
  H311: {
    code: 'H311',
    text: 'Toxic in contact with skin',
    hazardClass: 'Acute toxicity (dermal), cat. 3',
    pictogram: 'GHS06',
    signalWord: 'Danger',
    precedenceGroup: 'acute-toxicity',
  },
  H312: {
    code: 'H312',
    text: 'Harmful in contact with skin',
    hazardClass: 'Acute toxicity (dermal), cat. 4',
    pictogram: 'GHS07',
    signalWord: 'Warning',
    precedenceGroup: 'acute-toxicity',
  },
  H314: {
    code: 'H314',
    text: 'Causes severe skin burns and eye damage',
    hazardClass: 'Skin corrosion, cat. 1',
    pictogram: 'GHS05',
    signalWord: 'Danger',
    precedenceGroup: 'skin-eye',
  },
  H315: {
    code: 'H315',
    text: 'Causes skin irritation',
    hazardClass: 'Skin irritation, cat. 2',
    pictogram: 'GHS07',
    signalWord: 'Warning',
    precedenceGroup: 'skin-eye',
  },
  H317: {
    code: 'H317',
    text: 'May cause an allergic skin reaction',
    hazardClass: 'Skin sensitization, cat. 1',
    pictogram: 'GHS07',
    signalWord: 'Warning',
    precedenceGroup: 'sensitisation',
  },
  H318: {
    code: 'H318',
    text: 'Causes serious eye damage',
    hazardClass: 'Serious eye damage, cat. 1',
    pictogram: 'GHS05',
    signalWord: 'Danger',
    precedenceGroup: 'skin-eye',
  },
  H319: {
    code: 'H319',
    text: 'Causes serious eye irritation',
    hazardClass: 'Eye irritation, cat. 2A',
    pictogram: 'GHS07',
    signalWord: 'Warning',
    precedenceGroup: 'skin-eye',
  },
  H330: {
    code: 'H330',
    text: 'Fatal if inhaled',
    hazardClass: 'Acute toxicity (inhalation), cat. 1 and 2',
    pictogram: 'GHS06',
    signalWord: 'Danger',
    precedenceGroup: 'acute-toxicity',
  },
  H331: {
    code: 'H331',
    text: 'Toxic if inhaled',
    hazardClass: 'Acute toxicity (inhalation), cat. 3',
    pictogram: 'GHS06',
    signalWord: 'Danger',
    precedenceGroup: 'acute-toxicity',
  },
  H332: {
    code: 'H332',
    text: 'Harmful if inhaled',
    hazardClass: 'Acute toxicity (inhalation), cat. 4',
    pictogram: 'GHS07',
    signalWord: 'Warning',
    precedenceGroup: 'acute-toxicity',
  },
  H334: {
    code: 'H334',
    text: 'May cause allergy or asthma symptoms or breathing difficulties if inhaled',
    hazardClass: 'Respiratory sensitization, cat. 1',
    pictogram: 'GHS08',
    signalWord: 'Danger',
  },
  H335: {
    code: 'H335',
    text: 'May cause respiratory irritation',
    hazardClass: 'Specific target organ toxicity, single exposure, cat. 3',
    pictogram: 'GHS07',
    signalWord: 'Warning',
  },
  H341: {
    code: 'H341',
    text: 'Suspected of causing genetic defects',
    qualifier: `<${ROUTE}>`,
    hazardClass: 'Germ cell mutagenicity, cat. 2',
    pictogram: 'GHS08',
    signalWord: 'Warning',
  },
  H350: {
    code: 'H350',
    text: 'May cause cancer',
    qualifier: `<${ROUTE}>`,
    hazardClass: 'Carcinogenicity, cat. 1A and 1B',
    pictogram: 'GHS08',
    signalWord: 'Danger',
  },
  H351: {
    code: 'H351',
    text: 'Suspected of causing cancer',
    qualifier: `<${ROUTE}>`,
    hazardClass: 'Carcinogenicity, cat. 2',
    pictogram: 'GHS08',
    signalWord: 'Warning',
  },
  H360: {
    code: 'H360',
    text: 'May damage fertility or the unborn child',
    qualifier: `<state specific effect if known> <${ROUTE}>`,
    hazardClass: 'Reproductive toxicity, cat. 1A and 1B',
    pictogram: 'GHS08',
    signalWord: 'Danger',
  },
  H361: {
    code: 'H361',
    text: 'Suspected of damaging fertility or the unborn child',
    qualifier: `<state specific effect if known> <${ROUTE}>`,
    hazardClass: 'Reproductive toxicity, cat. 2',
    pictogram: 'GHS08',
    signalWord: 'Warning',
  },
  H370: {
    code: 'H370',
    text: 'Causes damage to organs',
    qualifier: `<or state all organs affected, if known> <${ROUTE}>`,
    hazardClass: 'Specific target organ toxicity, single exposure, cat. 1',
    pictogram: 'GHS08',
    signalWord: 'Danger',
  },
  H372: {
    code: 'H372',
    text: 'Causes damage to organs through prolonged or repeated exposure',
    qualifier: `<state all organs affected, if known> <${ROUTE}>`,
    hazardClass: 'Specific target organ toxicity, repeated exposure, cat. 1',
    pictogram: 'GHS08',
    signalWord: 'Danger',
  },
  H373: {
    code: 'H373',
    text: 'May cause damage to organs through prolonged or repeated exposure',
    qualifier: `<state all organs affected, if known> <${ROUTE}>`,
    hazardClass: 'Specific target organ toxicity, repeated exposure, cat. 2',
    pictogram: 'GHS08',
    signalWord: 'Warning',
  },
  H400: {
    code: 'H400',
    text: 'Very toxic to aquatic life',
    hazardClass: 'Hazardous to the aquatic environment, acute 1',
    pictogram: 'GHS09',
    signalWord: 'Warning',
  },
  H410: {
    code: 'H410',
    text: 'Very toxic to aquatic life with long lasting effects',
    hazardClass: 'Hazardous to the aquatic environment, chronic 1',
    pictogram: 'GHS09',
    signalWord: 'Warning',
  },
  H411: {
    code: 'H411',
    text: 'Toxic to aquatic life with long lasting effects',
    hazardClass: 'Hazardous to the aquatic environment, chronic 2',
    pictogram: 'GHS09',
    signalWord: null,
  },
  H412: {
    code: 'H412',
    text: 'Harmful to aquatic life with long lasting effects',
    hazardClass: 'Hazardous to the aquatic environment, chronic 3',
    pictogram: null,
    signalWord: null,
  },
});

export function isKnownHCode(code: string): boolean {
  return Object.prototype.hasOwnProperty.call(HAZARD_STATEMENTS, code);
}

export function hazardStatement(code: string): HazardStatement {
  const statement = HAZARD_STATEMENTS[code];
  if (!statement) throw new Error(`unknown hazard statement code ${code}`);
  return statement;
}

const SIGNAL_RANK: Record<SignalWord, number> = { Warning: 1, Danger: 2 };

/** The stricter of two signal words ("Danger" beats "Warning" beats none). */
export function stricterSignalWord(a: SignalWord | null, b: SignalWord | null): SignalWord | null {
  if (a === null) return b;
  if (b === null) return a;
  return SIGNAL_RANK[a] >= SIGNAL_RANK[b] ? a : b;
}

export function strictestSignalWord(words: Iterable<SignalWord | null>): SignalWord | null {
  let strictest: SignalWord | null = null;
  for (const word of words) strictest = stricterSignalWord(strictest, word);
  return strictest;
}

/**
 * The weakest signal word a set of H-codes allows: the strictest word among codes whose categories all
 * share one word. Codes marked 'either' (H228, H272) cannot raise it; the supplier's stated word decides.
 */
export function minimumSignalWord(codes: readonly string[]): SignalWord | null {
  let strictest: SignalWord | null = null;
  for (const code of codes) {
    const word = hazardStatement(code).signalWord;
    if (word === 'Danger' || word === 'Warning') strictest = stricterSignalWord(strictest, word);
  }
  return strictest;
}

/**
 * Pictograms for a set of H-codes, with the GHS precedence rules (UN GHS 1.4.10.4.3): the skull and
 * crossbones replaces the exclamation mark for acute toxicity; the corrosion pictogram replaces it for
 * skin and eye irritation; the health-hazard pictogram for respiratory sensitisation replaces it for skin
 * sensitisation and skin/eye irritation.
 */
export function pictogramsFor(codes: readonly string[]): PictogramCode[] {
  const statements = codes.map(hazardStatement);
  const has = (pictogram: PictogramCode, group?: HazardStatement['precedenceGroup']) =>
    statements.some((s) => s.pictogram === pictogram && (group === undefined || s.precedenceGroup === group));
  const acuteToxic = has('GHS06', 'acute-toxicity');
  const corrosive = statements.some((s) => s.pictogram === 'GHS05' && s.precedenceGroup === 'skin-eye');
  const respiratorySensitiser = statements.some((s) => s.code === 'H334');
  const result = new Set<PictogramCode>();
  for (const s of statements) {
    if (s.pictogram === null) continue;
    if (s.pictogram === 'GHS07') {
      if (s.precedenceGroup === 'acute-toxicity' && acuteToxic) continue;
      if (s.precedenceGroup === 'skin-eye' && (corrosive || respiratorySensitiser)) continue;
      if (s.precedenceGroup === 'sensitisation' && respiratorySensitiser) continue;
    }
    result.add(s.pictogram);
  }
  return [...result].sort();
}

export function pictogramName(code: PictogramCode): string {
  return PICTOGRAMS[code];
}

/** H-codes sorted by number, duplicates removed. */
export function sortHCodes(codes: Iterable<string>): string[] {
  return [...new Set(codes)].sort((a, b) => Number(a.slice(1)) - Number(b.slice(1)));
}

/** The standing caution shown with every hazard block. */
export const STANDING_CAUTION =
  "These notes are typical classifications and rules of the trade. They support, but never replace, the supplier's safety data sheet (SDS) for the lot you hold, your institution's safety rules and local regulations.";

export const CLASSIFICATION_SOURCE_NOTE = "typical classification, verify with your supplier's SDS";
