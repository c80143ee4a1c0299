/**
 * Design stage 3 — kinetic checks (DOMAIN.md Model 7): in co-reduction the more noble couple reduces
 * first and tends to nucleate the core; in seeded growth the shell precursor may oxidise the seeds
 * (galvanic replacement); and the kinetic expectation is set against the thermodynamic prediction.
 */
import type { BatchDesignInput } from '../design-input';
import {
  GALVANIC_MARGIN_V,
  galvanicReplacement,
  reductionCouple,
  reductionOrder,
  seedDissolutionCouple,
  type ReductionCouple,
} from '../potentials';
import type { DesignAmounts } from './amounts';
import { fmt, signedV } from './common';
import type { SeedSupply } from './particles';
import type { DesignCheck, DesignedReagent, GalvanicSummary, ReductionOrderSummary } from './types';

export interface KineticChecks {
  reductionOrder: ReductionOrderSummary | null;
  galvanic: GalvanicSummary | null;
  /** Element kinetics puts in the core (first reduced, or the seed); null when it cannot be judged. */
  kineticCore: string | null;
  checks: DesignCheck[];
}

function coupleOf(amounts: DesignAmounts, element: string): ReductionCouple | null {
  const metal = amounts.precursors.get(element)?.metal;
  return metal && metal.coupleId ? reductionCouple(metal.coupleId) : null;
}

function coReductionOrder(input: BatchDesignInput, amounts: DesignAmounts): KineticChecks {
  const checks: DesignCheck[] = [];
  const coupleA = coupleOf(amounts, input.elementA);
  const coupleB = coupleOf(amounts, input.elementB);
  if (!coupleA || !coupleB) {
    const zeroValent = [...amounts.precursors.values()]
      .filter((p) => p.metal.oxidationState === 0)
      .map((p) => p.reagent.name);
    checks.push({
      kind: 'reduction-order',
      severity: 'info',
      message:
        zeroValent.length > 0
          ? `${zeroValent.join(', ')} is zero-valent and decomposes thermally: the order of nucleation follows ` +
            'decomposition vs reduction rates, not electrode potentials.'
          : 'No reduction couple for one of the precursors: the reduction order cannot be judged.',
    });
    return { reductionOrder: null, galvanic: null, kineticCore: null, checks };
  }
  const order = reductionOrder(coupleA, coupleB);
  const { first, second, gapV, firstCouple, secondCouple } = order;
  checks.push({
    kind: 'reduction-order',
    severity: 'info',
    message:
      `${firstCouple.halfReaction} (E° = ${signedV(firstCouple.eStandardV)}) is more noble than ` +
      `${secondCouple.halfReaction} (E° = ${signedV(secondCouple.eStandardV)}) by ${gapV.toFixed(3)} V: ` +
      `${first} reduces first and tends to nucleate the core (kinetic ${first}@${second}).`,
  });
  if (amounts.geometry.architecture === 'alloy' && gapV > 0.3) {
    checks.push({
      kind: 'reduction-order',
      severity: 'warning',
      message:
        `A ${gapV.toFixed(2)} V gap between the couples works against a mixed alloy: co-reduction tends to give ` +
        `${first}-rich cores and ${second}-rich surfaces. A fast, strong reducer added at once, or ligands that ` +
        'bring the potentials closer, help.',
    });
  }
  const target = amounts.target;
  if (target.kind === 'core@shell' && target.core === second) {
    checks.push({
      kind: 'reduction-order',
      severity: 'warning',
      message:
        `The target ${input.target} needs ${second} first, but ${first} reduces first in co-reduction: grow ` +
        `${target.shell} on preformed ${target.core} seeds (seed-mediated route) instead.`,
    });
  }
  const reductionOrderSummary: ReductionOrderSummary = {
    first,
    second,
    gapV,
    firstCouple: firstCouple.halfReaction,
    secondCouple: secondCouple.halfReaction,
    firstEV: firstCouple.eStandardV,
    secondEV: secondCouple.eStandardV,
  };
  return { reductionOrder: reductionOrderSummary, galvanic: null, kineticCore: first, checks };
}

function seededGalvanic(amounts: DesignAmounts, seeds: SeedSupply, shellElement: string, lines: DesignedReagent[]) {
  const checks: DesignCheck[] = [];
  const shellCouple = coupleOf(amounts, shellElement);
  const chloridePresent = lines.some(
    (line) => line.role !== 'seeds' && line.role !== 'solvent' && /Cl(?![a-z])/.test(line.formula),
  );
  const seedCouple = seedDissolutionCouple(seeds.metal, chloridePresent);
  const result = (galvanic: GalvanicSummary | null): KineticChecks => ({
    reductionOrder: null,
    galvanic,
    kineticCore: seeds.metal,
    checks,
  });
  if (!shellCouple || !seedCouple) {
    checks.push({
      kind: 'galvanic-replacement',
      severity: 'info',
      message: 'No couple for the shell precursor or the seed metal: galvanic replacement cannot be judged.',
    });
    return result(null);
  }
  const verdict = galvanicReplacement(shellCouple, seedCouple);
  const consumed = amounts.geometry.shellAtoms * verdict.seedAtomsPerShellAtom;
  const fraction = Math.min(1, consumed / seeds.atomsPerSeed);
  const comparison =
    `${shellCouple.halfReaction} (${signedV(shellCouple.eStandardV)}) vs ${seedCouple.halfReaction} ` +
    `(${signedV(seedCouple.eStandardV)}${seedCouple.id === 'AgCl/Ag' ? ', chloride present' : ''})`;
  if (verdict.replaces) {
    const strong = verdict.drivingForceV > GALVANIC_MARGIN_V;
    checks.push({
      kind: 'galvanic-replacement',
      severity: strong ? 'warning' : 'info',
      message:
        `${strong ? 'Galvanic replacement' : 'Marginal galvanic replacement'}: the ${shellElement} precursor can ` +
        `oxidise the ${seeds.metal} seeds (ΔE° = ${signedV(verdict.drivingForceV)}; ${comparison}). ` +
        `${verdict.reaction}: ${fmt(verdict.seedAtomsPerShellAtom)} ${seeds.metal} atoms dissolve per ` +
        `${shellElement} atom deposited by replacement. ` +
        `If the whole shell precursor reacted that way, ${fmt(consumed)} ${seeds.metal} atoms per seed would ` +
        `dissolve (${fmt(100 * fraction)} % of a ${fmt(seeds.atomsPerSeed)}-atom seed): expect hollow or alloyed ` +
        'particles. Add the reducer before or with the precursor, add the precursor slowly, or choose a less ' +
        'oxidising precursor.',
    });
  } else {
    checks.push({
      kind: 'galvanic-replacement',
      severity: 'info',
      message: `No galvanic replacement expected: ΔE° = ${signedV(verdict.drivingForceV)} (${comparison}).`,
    });
  }
  return result({
    seedMetal: verdict.seedMetal,
    shellMetal: verdict.shellMetal,
    drivingForceV: verdict.drivingForceV,
    replaces: verdict.replaces,
    seedAtomsPerShellAtom: verdict.seedAtomsPerShellAtom,
    seedAtomsConsumedPerParticle: consumed,
    seedFractionConsumed: fraction,
    shellCouple: shellCouple.halfReaction,
    seedCouple: seedCouple.halfReaction,
    reaction: verdict.reaction,
  });
}

/** Reduction order (co-reduction) or galvanic replacement (seeded growth). */
export function kineticChecks(
  input: BatchDesignInput,
  amounts: DesignAmounts,
  lines: DesignedReagent[],
): KineticChecks {
  if (amounts.geometry.architecture === 'single-metal') {
    const message =
      `Single-metal batch: ${amounts.coreElement} particles (seeds for a later growth batch of ` +
      `${input.elementA}-${input.elementB}).`;
    const checks: DesignCheck[] = [{ kind: 'target', severity: 'info', message }];
    return { reductionOrder: null, galvanic: null, kineticCore: null, checks };
  }
  if (input.route !== 'seed-mediated') return coReductionOrder(input, amounts);
  if (amounts.seeds && amounts.shellElement) return seededGalvanic(amounts, amounts.seeds, amounts.shellElement, lines);
  return { reductionOrder: null, galvanic: null, kineticCore: null, checks: [] };
}

/**
 * The kinetic core against the element the thermodynamic model puts at the surface (null: no strong
 * enrichment; undefined: no prediction available; `note` says why).
 */
export function kineticsVersusThermodynamics(
  input: BatchDesignInput,
  amounts: DesignAmounts,
  kineticCore: string | null,
  surface: { element: string | null | undefined; note: string | null },
): DesignCheck[] {
  if (amounts.geometry.architecture === 'single-metal') return [];
  const thermo = surface.element;
  if (thermo === undefined) {
    const checks: DesignCheck[] = [
      {
        kind: 'kinetics-vs-thermodynamics',
        severity: 'info',
        message: 'No thermodynamic prediction was available to compare with the kinetic expectation.',
      },
    ];
    if (surface.note) checks.push({ kind: 'kinetics-vs-thermodynamics', severity: 'info', message: surface.note });
    return checks;
  }
  if (kineticCore === null) return [];
  const other = kineticCore === input.elementA ? input.elementB : input.elementA;
  if (thermo === kineticCore) {
    const why = input.route === 'seed-mediated' ? 'is the seed' : 'reduces first';
    return [
      {
        kind: 'kinetics-vs-thermodynamics',
        severity: 'warning',
        message:
          `Kinetics and thermodynamics disagree: ${kineticCore} is expected in the core (it ${why}), but the ` +
          `thermodynamic model puts ${kineticCore} at the surface. A kinetic ${kineticCore}@${other} may invert or ` +
          'alloy on annealing or heating; keep post-synthesis temperatures low, or anneal on purpose and check by ' +
          'EDX line scan.',
      },
    ];
  }
  if (thermo === other) {
    return [
      {
        kind: 'kinetics-vs-thermodynamics',
        severity: 'info',
        message: `Kinetics and thermodynamics agree: ${kineticCore} in the core, ${other} at the surface.`,
      },
    ];
  }
  if (thermo === null && (amounts.geometry.architecture === 'core@shell' || input.route === 'seed-mediated')) {
    return [
      {
        kind: 'kinetics-vs-thermodynamics',
        severity: 'info',
        message:
          `The thermodynamic model predicts no strong surface enrichment: a kinetic ${kineticCore}@${other} ` +
          'structure may interdiffuse toward an alloy on heating.',
      },
    ];
  }
  return [];
}
