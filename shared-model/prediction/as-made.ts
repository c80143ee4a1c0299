/**
 * The expected structure of a batch as the synthesis leaves it, for its route and conditions: the
 * equilibrium prediction at the synthesis temperature and environment, the interdiffusion length for the
 * synthesis time, and — when atoms cannot rearrange in that time — the kinetic expectation (reduction
 * order in one-pot routes, seed@shell or galvanic replacement in seeded growth). Used by batch design and
 * by the physics prior of the learning models.
 *
 * Defaults per route (common practice): temperatures from recipes/design-input.ts; times co-reduction
 * 0.5 h, seed-mediated 1 h, polyol 2 h, organic (oleylamine) 1 h; environment "ligand" for the organic
 * route (the amine binds the surface), "vacuum" (no adsorbate term) for the others.
 */
import { DEFAULT_TEMPERATURE_C, type SynthesisRoute } from '../recipes/design-input';
import type { Environment } from './environment';
import { coReductionExpectation, seededGrowthExpectation, type KineticExpectation } from './kinetic-expectation';
import { asMadeVerdict, predictPair, type Prediction } from './predict';

export const DEFAULT_SYNTHESIS_TIME_H: Readonly<Record<SynthesisRoute, number>> = {
  'co-reduction': 0.5,
  'seed-mediated': 1,
  polyol: 2,
  organic: 1,
};

export const DEFAULT_ROUTE_ENVIRONMENT: Readonly<Record<SynthesisRoute, Environment>> = {
  'co-reduction': 'vacuum',
  'seed-mediated': 'vacuum',
  polyol: 'vacuum',
  organic: 'ligand',
};

export interface BatchConditions {
  elementA: string;
  elementB: string;
  /** Overall atomic fraction of B. */
  xB: number;
  diameterNm: number;
  route: SynthesisRoute;
  /** Synthesis temperature, K (default: the route's). */
  temperatureK?: number;
  timeH?: number;
  environment?: Environment;
  /** Seed metal of a seed-mediated batch (the other element grows on it). */
  seedElement?: string;
}

export interface AsMadeExpectation {
  /** Label of the particle as made (kinetic when equilibrium is out of reach, else the equilibrium label). */
  label: string;
  basis: 'kinetic' | 'equilibrium';
  /** Label after annealing (the equilibrium prediction at the synthesis environment). */
  afterAnnealing: string;
  text: string;
  kinetic: KineticExpectation | null;
  equilibrium: Prediction;
  temperatureK: number;
  timeH: number;
  environment: Environment;
  /** In air or water: the oxidation outlook of the pair. */
  oxidation: string;
}

/** The as-made expectation of a batch (throws a DomainError naming the field for bad input). */
export function asMadeForBatch(batch: BatchConditions): AsMadeExpectation {
  const temperatureK = batch.temperatureK ?? DEFAULT_TEMPERATURE_C[batch.route] + 273.15;
  const timeH = batch.timeH ?? DEFAULT_SYNTHESIS_TIME_H[batch.route];
  const environment = batch.environment ?? DEFAULT_ROUTE_ENVIRONMENT[batch.route];
  const equilibrium = predictPair(batch.elementA, batch.elementB, {
    xB: batch.xB,
    diameterNm: batch.diameterNm,
    shape: 'sphere',
    temperatureK,
    timeH,
    environment,
  });
  let kinetic: KineticExpectation | null;
  if (batch.route === 'seed-mediated' && batch.seedElement !== undefined) {
    const shell = batch.seedElement === batch.elementA ? batch.elementB : batch.elementA;
    kinetic = seededGrowthExpectation(batch.seedElement, shell);
  } else {
    kinetic = coReductionExpectation(batch.elementA, batch.elementB);
  }
  const verdict = asMadeVerdict(equilibrium.architecture, equilibrium.kinetics, kinetic);
  return {
    label: verdict.asMade,
    basis: verdict.basis,
    afterAnnealing: verdict.afterAnnealing,
    text: verdict.text,
    kinetic,
    equilibrium,
    temperatureK,
    timeH,
    environment,
    oxidation: equilibrium.oxidation.summary,
  };
}
