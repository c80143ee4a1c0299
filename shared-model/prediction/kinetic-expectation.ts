/**
 * What the synthesis itself builds when atoms cannot rearrange afterwards (the "as made" structure):
 * the reduction order of the precursors in a co-reduction, or the seed and its shell in seeded growth
 * (with galvanic replacement when the shell ion oxidises the seed). Built on the kinetic checks of batch
 * design (recipes/potentials.ts: CRC / Bard–Parsons–Jordan standard potentials of the real couples).
 *
 * Co-reduction: the more noble couple reduces first and forms the core; the other deposits on it
 * (first@second). When the two couples lie within 0.1 V of each other both reduce together and the
 * particle comes out mixed (common practice). Usual precursors assumed when none is named: HAuCl₄,
 * H₂PtCl₆, Na₂PdCl₄, AgNO₃, the metal(II) salts of Cu, Ni, Co, Fe, Na₃RhCl₆, H₂IrCl₆, RuCl₃.
 */
import { coreShellLabel } from '../architecture/labels';
import {
  galvanicReplacement,
  reductionCouple,
  reductionOrder,
  seedDissolutionCouple,
  type ReductionCouple,
} from '../recipes/potentials';

const USUAL_PRECURSOR_COUPLE: Readonly<Record<string, string>> = {
  Au: 'AuCl4/Au',
  Pt: 'PtCl6/Pt',
  Pd: 'PdCl4/Pd',
  Ag: 'Ag+/Ag',
  Cu: 'Cu2+/Cu',
  Ni: 'Ni2+/Ni',
  Co: 'Co2+/Co',
  Fe: 'Fe2+/Fe',
  Rh: 'RhCl6/Rh',
  Ir: 'IrCl6/Ir',
  Ru: 'Ru3+/Ru',
};

/** Couples closer than this reduce together (common practice), V. */
export const CO_REDUCTION_TOGETHER_V = 0.1;

export interface KineticExpectation {
  route: 'co-reduction' | 'seed-mediated';
  /** Architecture label the synthesis builds. */
  label: string;
  text: string;
  couples: string[];
}

export function usualPrecursorCouple(metal: string): ReductionCouple | null {
  const id = USUAL_PRECURSOR_COUPLE[metal];
  return id === undefined ? null : reductionCouple(id);
}

/** Co-reduction from the given couples (or the usual precursors); null when a couple is not tabulated. */
export function coReductionExpectation(
  elementA: string,
  elementB: string,
  coupleA?: ReductionCouple,
  coupleB?: ReductionCouple,
): KineticExpectation | null {
  const ca = coupleA ?? usualPrecursorCouple(elementA);
  const cb = coupleB ?? usualPrecursorCouple(elementB);
  if (ca === null || cb === null) return null;
  const order = reductionOrder(ca, cb);
  const couples = [`${ca.id} ${ca.eStandardV.toFixed(3)} V`, `${cb.id} ${cb.eStandardV.toFixed(3)} V`];
  if (order.gapV < CO_REDUCTION_TOGETHER_V) {
    return {
      route: 'co-reduction',
      label: 'alloy',
      text: `${ca.id} and ${cb.id} lie ${order.gapV.toFixed(2)} V apart: both reduce together, mixed as made`,
      couples,
    };
  }
  return {
    route: 'co-reduction',
    label: coreShellLabel(order.first, order.second),
    text: `${order.first} reduces first (${order.gapV.toFixed(2)} V more noble) and forms the core; ${order.second} deposits on it`,
    couples,
  };
}

/** Seeded growth of `shell` on `seed` seeds: core@shell, or hollow/alloyed when galvanic replacement runs. */
export function seededGrowthExpectation(
  seed: string,
  shell: string,
  shellCouple?: ReductionCouple,
  chloridePresent = true,
): KineticExpectation | null {
  const sc = shellCouple ?? usualPrecursorCouple(shell);
  const seedCouple = seedDissolutionCouple(seed, chloridePresent);
  if (sc === null || seedCouple === undefined) return null;
  const galvanic = galvanicReplacement(sc, seedCouple);
  const couples = [`${sc.id} ${sc.eStandardV.toFixed(3)} V`, `${seedCouple.id} ${seedCouple.eStandardV.toFixed(3)} V`];
  if (galvanic.replaces) {
    return {
      route: 'seed-mediated',
      label: 'hollow',
      text: `galvanic replacement (${galvanic.reaction}, +${galvanic.drivingForceV.toFixed(2)} V): hollow or alloyed shells as made`,
      couples,
    };
  }
  return {
    route: 'seed-mediated',
    label: coreShellLabel(seed, shell),
    text: `${shell} grows on the ${seed} seeds (no galvanic replacement)`,
    couples,
  };
}
