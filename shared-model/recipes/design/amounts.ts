/**
 * Design stage 1 — amounts (DOMAIN.md Models 5–6): the particles (see particles.ts), then for each metal
 * the precursor formula units (metal ÷ metal atoms per formula unit), the electrons the precursors need
 * (Σ metal × oxidation state), the reducer from the electron balance (electrons ÷ electrons per reducer
 * × excess) and the capping agent (ratio × metal reduced, or final concentration × volume).
 * Masses, volumes and the volume balance are the next stage's (reagent-lines.ts).
 */
import { invalid } from '../../api/result';
import { AQUEOUS_ROUTES, DEFAULT_TEMPERATURE_C, type BatchDesignInput } from '../design-input';
import { parseFormula } from '../formula';
import { electronsDonated, hasRole, type Reagent, type ReagentMetal } from '../reagent';
import { defaultReducerExcess, REDUCER_HALF_REACTIONS } from '../reducers';
import { fmt, type CatalogIndex } from './common';
import { planParticles, type ParticlePlan } from './particles';
import type { DesignCheck, MetalAmount, ReducerBalance } from './types';

export interface PrecursorAmount {
  element: string;
  reagent: Reagent;
  metal: ReagentMetal;
  /** Metal atoms to reduce (mmol). */
  metalMmol: number;
  /** Formula units of the precursor (mmol). */
  amountMmol: number;
  stockMm: number | undefined;
}

export interface ReducerAmount {
  reagent: Reagent;
  /** Null when the precursors need no electrons (zero-valent metals). */
  balance: ReducerBalance | null;
  /** Formula units for the reducer's own line; null when the solvent is the reducer or nothing is reduced. */
  amountMmol: number | null;
  stockMm: number | undefined;
}

export interface CappingAmount {
  reagent: Reagent;
  amountMmol: number;
  stockMm: number | undefined;
  /** How the amount was set, for the line's note. */
  basis: { molPerMolMetal: number; reducedMetalMmol: number } | { concentrationMm: number };
}

export interface DesignAmounts extends ParticlePlan {
  temperatureC: number;
  aqueous: boolean;
  /** Each metal of the pair present in the batch, in pair order; seed metal without a precursor. */
  metals: MetalAmount[];
  /** One per precursor, in pair order. */
  precursorAmounts: PrecursorAmount[];
  electronsMmol: number;
  solvent: Reagent | null;
  reducer: ReducerAmount | null;
  capping: CappingAmount | null;
}

function isAqueous(input: BatchDesignInput, catalog: CatalogIndex): boolean {
  if (!AQUEOUS_ROUTES.includes(input.route)) return false;
  return !input.solvent || catalog.require(input.solvent.reagentKey, 'solvent.reagentKey').tags.includes('water');
}

function metalAmounts(input: BatchDesignInput, plan: ParticlePlan) {
  const metals: MetalAmount[] = [];
  const precursorAmounts: PrecursorAmount[] = [];
  let electronsMmol = 0;
  for (const element of plan.pair) {
    const mmol = plan.metalMmol.get(element) ?? 0;
    const precursor = plan.precursors.get(element);
    const finalMm = (mmol / input.batchVolumeMl) * 1000;
    if (!precursor) {
      if (mmol !== 0) metals.push({ element, amountMmol: mmol, finalMm, precursorKey: null, oxidationState: null });
      continue;
    }
    const { reagent, metal } = precursor;
    const metalPerUnit = parseFormula(reagent.formula).atoms[element] ?? 1;
    electronsMmol += mmol * metal.oxidationState;
    const oxidationState = metal.oxidationState;
    metals.push({ element, amountMmol: mmol, finalMm, precursorKey: reagent.key, oxidationState });
    precursorAmounts.push({
      element,
      reagent,
      metal,
      metalMmol: mmol,
      amountMmol: mmol / metalPerUnit,
      stockMm: precursor.stockMm,
    });
  }
  return { metals, precursorAmounts, electronsMmol };
}

function readSolvent(input: BatchDesignInput, catalog: CatalogIndex, aqueous: boolean): Reagent | null {
  let solvent: Reagent | null = null;
  if (input.solvent) {
    solvent = catalog.require(input.solvent.reagentKey, 'solvent.reagentKey');
    if (!hasRole(solvent, 'solvent')) throw invalid('solvent.reagentKey', `${solvent.name} is not a solvent`);
  }
  if (!aqueous && (!input.solvent || input.solvent.volumeMl === undefined)) {
    throw invalid(
      input.solvent ? 'solvent.volumeMl' : 'solvent',
      `the ${input.route} route needs its solvent and the solvent volume (mL)`,
    );
  }
  return solvent;
}

function reducerAmount(
  input: BatchDesignInput,
  catalog: CatalogIndex,
  solvent: Reagent | null,
  electronsMmol: number,
  checks: DesignCheck[],
): ReducerAmount | null {
  let reagent: Reagent;
  if (input.reducer) {
    reagent = catalog.require(input.reducer.reagentKey, 'reducer.reagentKey');
    if (!hasRole(reagent, 'reducer')) throw invalid('reducer.reagentKey', `${reagent.name} is not a reducer`);
  } else if (solvent && hasRole(solvent, 'reducer')) {
    reagent = solvent;
  } else if (electronsMmol > 0) {
    throw invalid('reducer', `choose a reducer: the precursors need ${fmt(electronsMmol)} mmol of electrons`);
  } else {
    return null;
  }
  const stockMm = input.reducer?.stockMm;
  if (!(electronsMmol > 0)) return { reagent, balance: null, amountMmol: null, stockMm };
  const given = input.reducer?.excess;
  const assumed = defaultReducerExcess(reagent.reducerHalfReactionId, reagent.name);
  const excess = given ?? assumed.excess;
  const excessBasis = given !== undefined ? 'given' : assumed.practice;
  const electronsPerUnit = electronsDonated(reagent);
  const halfReaction = REDUCER_HALF_REACTIONS[reagent.reducerHalfReactionId ?? '']?.halfReaction ?? '';
  const stoichiometricMmol = electronsMmol / electronsPerUnit;
  if (excess < 1) {
    checks.push({
      kind: 'reducer',
      severity: 'warning',
      message:
        `Reducer excess ${fmt(excess)} is below the electron balance: at most ${fmt(100 * excess)} % of the metal ` +
        'can be reduced.',
    });
  }
  const solventReduces = solvent !== null && reagent.key === solvent.key;
  if (given === undefined && !solventReduces) {
    checks.push({
      kind: 'reducer',
      severity: 'info',
      message: `${reagent.name}: ${fmt(excess)}× the electron balance assumed, as no excess was given — ${assumed.practice}.`,
    });
  }
  return {
    reagent,
    balance: {
      key: reagent.key,
      electronsPerUnit,
      halfReaction,
      stoichiometricMmol,
      excess,
      excessAssumed: given === undefined,
      excessBasis,
    },
    amountMmol: solventReduces ? null : stoichiometricMmol * excess,
    stockMm,
  };
}

function cappingAmount(input: BatchDesignInput, catalog: CatalogIndex, metals: MetalAmount[]): CappingAmount | null {
  const choice = input.capping;
  if (!choice) return null;
  const reagent = catalog.require(choice.reagentKey, 'capping.reagentKey');
  if (!hasRole(reagent, 'capping-agent')) throw invalid('capping.reagentKey', `${reagent.name} is not a capping agent`);
  const reducedMetalMmol = metals.filter((m) => m.precursorKey !== null).reduce((sum, m) => sum + m.amountMmol, 0);
  if (choice.molPerMolMetal !== undefined) {
    return {
      reagent,
      amountMmol: choice.molPerMolMetal * reducedMetalMmol,
      stockMm: choice.stockMm,
      basis: { molPerMolMetal: choice.molPerMolMetal, reducedMetalMmol },
    };
  }
  const concentrationMm = choice.concentrationMm;
  if (concentrationMm === undefined) {
    throw invalid('capping.molPerMolMetal', 'give the capping amount as mol per mol metal or as final mM');
  }
  return {
    reagent,
    amountMmol: (concentrationMm * input.batchVolumeMl) / 1000,
    stockMm: choice.stockMm,
    basis: { concentrationMm },
  };
}

/** The amounts of a batch; throws `invalid(field, …)` naming the field for bad input. */
export function designAmounts(
  input: BatchDesignInput,
  catalog: CatalogIndex,
  latticeSource?: (symbol: string) => number | undefined,
): DesignAmounts {
  const plan = planParticles(input, catalog, latticeSource);
  const checks = [...plan.checks];
  const aqueous = isAqueous(input, catalog);
  const { metals, precursorAmounts, electronsMmol } = metalAmounts(input, plan);
  const solvent = readSolvent(input, catalog, aqueous);
  const reducer = reducerAmount(input, catalog, solvent, electronsMmol, checks);
  const capping = cappingAmount(input, catalog, metals);
  return {
    ...plan,
    checks,
    temperatureC: input.temperatureC ?? DEFAULT_TEMPERATURE_C[input.route],
    aqueous,
    metals,
    precursorAmounts,
    electronsMmol,
    solvent,
    reducer,
    capping,
  };
}
