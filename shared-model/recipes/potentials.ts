/**
 * Standard reduction potentials of the actual precursor couples (DOMAIN.md Models 7) and the kinetic
 * checks built on them: reduction order in co-reduction, galvanic replacement of seeds by the shell
 * precursor (quantified), and conflicts between kinetic and thermodynamic expectations.
 *
 * Values: CRC Handbook of Chemistry and Physics, "Electrochemical Series" (P. Vanýsek), which compiles
 * Bard, Parsons & Jordan, Standard Potentials in Aqueous Solutions (1985), at 25 °C. Couples marked
 * `fromMemory` were recalled rather than read; the others were read from a public reproduction of the
 * table (OpenStax Chemistry 2e, Appendix L, "Standard Electrode (Half-Cell) Potentials", which takes its
 * values from the CRC table). For acetylacetonates in organic solvents the aqua-ion couple is the
 * nearest tabulated guide: trust the order, not the number.
 */
import { invalid } from '../api/result';

export interface ReductionCouple {
  id: string;
  /** The metal the couple deposits. */
  metal: string;
  /** Oxidation state of the oxidised member. */
  oxidationState: number;
  /** Oxidation state of the reduced member (0 for the metal). */
  reducedOxidationState: number;
  electrons: number;
  halfReaction: string;
  eStandardV: number;
  source: string;
  fromMemory: boolean;
}

const CRC = 'CRC Handbook, Electrochemical Series (after Bard, Parsons & Jordan 1985)';
const CRC_READ = `${CRC}; read in OpenStax Chemistry 2e, Appendix L`;

function couple(
  id: string,
  metal: string,
  oxidationState: number,
  reducedOxidationState: number,
  halfReaction: string,
  eStandardV: number,
  fromMemory: boolean,
  source = fromMemory ? `${CRC} (from memory)` : CRC_READ,
): ReductionCouple {
  return {
    id,
    metal,
    oxidationState,
    reducedOxidationState,
    electrons: oxidationState - reducedOxidationState,
    halfReaction,
    eStandardV,
    source,
    fromMemory,
  };
}

/** Combines consecutive couples into one (Latimer): E = Σ nᵢEᵢ / Σ nᵢ. */
export function combineCouples(id: string, steps: readonly ReductionCouple[], halfReaction: string): ReductionCouple {
  if (steps.length === 0) throw new Error('combineCouples needs at least one step');
  const first = steps[0] as ReductionCouple;
  const last = steps[steps.length - 1] as ReductionCouple;
  let electrons = 0;
  let weighted = 0;
  for (const step of steps) {
    electrons += step.electrons;
    weighted += step.electrons * step.eStandardV;
  }
  return {
    id,
    metal: first.metal,
    oxidationState: first.oxidationState,
    reducedOxidationState: last.reducedOxidationState,
    electrons,
    halfReaction,
    eStandardV: weighted / electrons,
    source: `Latimer combination of ${steps.map((s) => s.id).join(' and ')}`,
    fromMemory: steps.some((s) => s.fromMemory),
  };
}

const PTCL6_PTCL4 = couple('PtCl6/PtCl4', 'Pt', 4, 2, '[PtCl6]²⁻ + 2 e⁻ ⇌ [PtCl4]²⁻ + 2 Cl⁻', 0.68, false);
const PTCL4_PT = couple('PtCl4/Pt', 'Pt', 2, 0, '[PtCl4]²⁻ + 2 e⁻ ⇌ Pt + 4 Cl⁻', 0.755, false);
const RU3_RU2 = couple('Ru3+/Ru2+', 'Ru', 3, 2, 'Ru³⁺ + e⁻ ⇌ Ru²⁺', 0.2487, true);
const RU2_RU = couple('Ru2+/Ru', 'Ru', 2, 0, 'Ru²⁺ + 2 e⁻ ⇌ Ru', 0.455, true);

export const REDUCTION_COUPLES: Readonly<Record<string, ReductionCouple>> = Object.freeze({
  'AuCl4/Au': couple('AuCl4/Au', 'Au', 3, 0, '[AuCl4]⁻ + 3 e⁻ ⇌ Au + 4 Cl⁻', 1.002, true),
  'PtCl6/PtCl4': PTCL6_PTCL4,
  'PtCl4/Pt': PTCL4_PT,
  'PtCl6/Pt': combineCouples('PtCl6/Pt', [PTCL6_PTCL4, PTCL4_PT], '[PtCl6]²⁻ + 4 e⁻ ⇌ Pt + 6 Cl⁻'),
  'Pt2+/Pt': couple('Pt2+/Pt', 'Pt', 2, 0, 'Pt²⁺ + 2 e⁻ ⇌ Pt', 1.18, true),
  'PdCl4/Pd': couple('PdCl4/Pd', 'Pd', 2, 0, '[PdCl4]²⁻ + 2 e⁻ ⇌ Pd + 4 Cl⁻', 0.591, false),
  'Pd2+/Pd': couple('Pd2+/Pd', 'Pd', 2, 0, 'Pd²⁺ + 2 e⁻ ⇌ Pd', 0.951, true),
  'Ag+/Ag': couple('Ag+/Ag', 'Ag', 1, 0, 'Ag⁺ + e⁻ ⇌ Ag', 0.7996, false),
  'AgCl/Ag': couple('AgCl/Ag', 'Ag', 1, 0, 'AgCl + e⁻ ⇌ Ag + Cl⁻', 0.22233, false),
  'Cu2+/Cu': couple('Cu2+/Cu', 'Cu', 2, 0, 'Cu²⁺ + 2 e⁻ ⇌ Cu', 0.3419, true),
  'Ni2+/Ni': couple('Ni2+/Ni', 'Ni', 2, 0, 'Ni²⁺ + 2 e⁻ ⇌ Ni', -0.257, false),
  'Co2+/Co': couple('Co2+/Co', 'Co', 2, 0, 'Co²⁺ + 2 e⁻ ⇌ Co', -0.28, false),
  'Fe2+/Fe': couple('Fe2+/Fe', 'Fe', 2, 0, 'Fe²⁺ + 2 e⁻ ⇌ Fe', -0.447, false),
  'Fe3+/Fe': couple('Fe3+/Fe', 'Fe', 3, 0, 'Fe³⁺ + 3 e⁻ ⇌ Fe', -0.037, true),
  'RhCl6/Rh': couple('RhCl6/Rh', 'Rh', 3, 0, '[RhCl6]³⁻ + 3 e⁻ ⇌ Rh + 6 Cl⁻', 0.431, true),
  'IrCl6/Ir': couple('IrCl6/Ir', 'Ir', 3, 0, '[IrCl6]³⁻ + 3 e⁻ ⇌ Ir + 6 Cl⁻', 0.77, true),
  'Ru3+/Ru': combineCouples('Ru3+/Ru', [RU3_RU2, RU2_RU], 'Ru³⁺ + 3 e⁻ ⇌ Ru'),
});

export function reductionCouple(id: string): ReductionCouple {
  const found = REDUCTION_COUPLES[id];
  if (!found)
    throw invalid('coupleId', `unknown reduction couple "${id}"; known: ${Object.keys(REDUCTION_COUPLES).join(', ')}`);
  return found;
}

export function isKnownCouple(id: string): boolean {
  return Object.prototype.hasOwnProperty.call(REDUCTION_COUPLES, id);
}

/**
 * The couple a seed metal is oxidised through when it dissolves. With chloride in the bath (any
 * chloro-complex precursor brings it), silver goes to AgCl, whose couple lies 0.58 V below Ag⁺/Ag — the
 * reason Pt(II) and Pd(II) chloro-complexes hollow out silver seeds although Ag⁺/Ag alone would not allow it.
 */
export function seedDissolutionCouple(metal: string, chloridePresent: boolean): ReductionCouple | undefined {
  const byMetal: Record<string, string> = {
    Au: 'AuCl4/Au',
    Ag: chloridePresent ? 'AgCl/Ag' : 'Ag+/Ag',
    Pt: chloridePresent ? 'PtCl4/Pt' : 'Pt2+/Pt',
    Pd: chloridePresent ? 'PdCl4/Pd' : 'Pd2+/Pd',
    Cu: 'Cu2+/Cu',
    Ni: 'Ni2+/Ni',
    Co: 'Co2+/Co',
    Fe: 'Fe2+/Fe',
    Rh: 'RhCl6/Rh',
    Ir: 'IrCl6/Ir',
    Ru: 'Ru3+/Ru',
  };
  const id = byMetal[metal];
  return id === undefined ? undefined : REDUCTION_COUPLES[id];
}

export interface ReductionOrder {
  /** Element whose couple is more positive: reduces (nucleates) first, so tends to form the core. */
  first: string;
  second: string;
  /** E°(first) − E°(second), V (≥ 0). */
  gapV: number;
  firstCouple: ReductionCouple;
  secondCouple: ReductionCouple;
}

/** Which precursor reduces first in a co-reduction (the more noble couple). */
export function reductionOrder(a: ReductionCouple, b: ReductionCouple): ReductionOrder {
  if (a.metal === b.metal)
    throw invalid('precursors', `both precursors deposit ${a.metal}; a bimetallic batch needs two metals`);
  const [first, second] = a.eStandardV >= b.eStandardV ? [a, b] : [b, a];
  return {
    first: first.metal,
    second: second.metal,
    gapV: first.eStandardV - second.eStandardV,
    firstCouple: first,
    secondCouple: second,
  };
}

export interface GalvanicVerdict {
  seedMetal: string;
  shellMetal: string;
  /** E°(shell precursor) − E°(seed dissolution couple), V. Positive: replacement is downhill. */
  drivingForceV: number;
  replaces: boolean;
  /** Seed atoms oxidised per shell atom deposited by replacement alone: n(shell) / n(seed). */
  seedAtomsPerShellAtom: number;
  shellCouple: ReductionCouple;
  seedCouple: ReductionCouple;
  /** Overall reaction in words, e.g. "3 Ag + [AuCl4]⁻ → Au + 3 Ag(I)". */
  reaction: string;
}

/** Margin below which a positive driving force is reported as marginal rather than a clear risk (V). */
export const GALVANIC_MARGIN_V = 0.05;

/**
 * Galvanic replacement of seed metal by the shell precursor: the shell ion oxidises the seed when its
 * couple lies above the seed's dissolution couple. Electron balance: each shell ion takes n(shell)
 * electrons, each seed atom gives n(seed), so n(shell)/n(seed) seed atoms go per shell atom
 * (Au(III) on Ag: 3 Ag per Au).
 */
export function galvanicReplacement(shellCouple: ReductionCouple, seedCouple: ReductionCouple): GalvanicVerdict {
  if (shellCouple.metal === seedCouple.metal)
    throw invalid('seeds.metal', `seed and shell are both ${seedCouple.metal}`);
  const drivingForceV = shellCouple.eStandardV - seedCouple.eStandardV;
  const seedAtomsPerShellAtom = shellCouple.electrons / seedCouple.electrons;
  const seedOx = seedCouple.oxidationState;
  return {
    seedMetal: seedCouple.metal,
    shellMetal: shellCouple.metal,
    drivingForceV,
    replaces: drivingForceV > 0,
    seedAtomsPerShellAtom,
    shellCouple,
    seedCouple,
    reaction: `${formatCount(seedAtomsPerShellAtom)} ${seedCouple.metal} + ${shellCouple.metal}(${roman(shellCouple.oxidationState)}) → ${shellCouple.metal} + ${formatCount(seedAtomsPerShellAtom)} ${seedCouple.metal}(${roman(seedOx)})`,
  };
}

function formatCount(value: number): string {
  return Number.isInteger(value) ? String(value) : value.toFixed(2);
}

const ROMAN = ['0', 'I', 'II', 'III', 'IV', 'V', 'VI'];
export function roman(oxidationState: number): string {
  return ROMAN[oxidationState] ?? String(oxidationState);
}
