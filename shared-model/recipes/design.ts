/**
 * Batch design (DOMAIN.md Models 5–8): from a target particle, a route and catalog reagents to amounts,
 * masses and stock volumes, with the kinetic checks and the hazard block. Four pure stages, in order:
 *  1. amounts (design/amounts.ts, design/particles.ts): atoms per particle, particle count, metal per
 *     element, precursor formula units, electrons, reducer and capping amounts;
 *  2. reagent lines (design/reagent-lines.ts): masses, stock or neat volumes, solvent and make-up water;
 *  3. kinetic checks (design/kinetics.ts): reduction order, galvanic replacement, kinetics vs thermodynamics;
 *  4. stocks and hazards (design/safety.ts): stale stocks, the hazard block and its warnings.
 */
import { atomsInSphere } from '../geometry/fcc';
import { ROUTE_LABELS, type BatchDesignInput } from './design-input';
import { designAmounts, type DesignAmounts } from './design/amounts';
import { indexCatalog } from './design/common';
import { kineticChecks, kineticsVersusThermodynamics } from './design/kinetics';
import { reagentLines } from './design/reagent-lines';
import { batchHazards, stockAgeChecks } from './design/safety';
import { RECIPE_MODEL_VERSION, type BatchDesign, type DesignContext, type SurfaceAnswer } from './design/types';
import { particleNanomolar } from './particle';

export * from './design/types';

/** The thermodynamic answer the context gives, asked about the designed particle when it is a function. */
function surfaceFor(input: BatchDesignInput, amounts: DesignAmounts, context: DesignContext): SurfaceAnswer {
  const given = context.thermodynamicSurfaceElement;
  if (given !== undefined) return { element: given, note: null };
  if (!context.thermodynamicSurface) return { element: undefined, note: null };
  const { geometry } = amounts;
  return context.thermodynamicSurface({
    elementA: input.elementA,
    elementB: input.elementB,
    architecture: geometry.architecture,
    xB: geometry.xB,
    diameterNm: geometry.diameterNm,
    temperatureC: amounts.temperatureC,
    route: input.route,
    seedElement: input.route === 'seed-mediated' ? amounts.coreElement : null,
  });
}

/** Designs a batch; throws `invalid(field, …)` naming the field for bad input. */
export function designBatch(input: BatchDesignInput, context: DesignContext): BatchDesign {
  const catalog = indexCatalog(context.catalog);
  const amounts = designAmounts(input, catalog, context.latticeNm);
  const { lines, makeUpVolumeMl, checks: lineChecks } = reagentLines(input, amounts, catalog);
  const kinetics = kineticChecks(input, amounts, lines);
  const surface = surfaceFor(input, amounts, context);
  const versus = kineticsVersusThermodynamics(input, amounts, kinetics.kineticCore, surface);
  const stockChecks = stockAgeChecks(input, catalog, context.now);
  const hazards = batchHazards(amounts, lines, catalog);
  const { geometry } = amounts;
  const particlesPerMl = amounts.particles / input.batchVolumeMl;
  return {
    modelVersion: RECIPE_MODEL_VERSION,
    elementA: input.elementA,
    elementB: input.elementB,
    target: input.target,
    route: input.route,
    routeLabel: ROUTE_LABELS[input.route],
    architecture: geometry.architecture,
    coreElement: amounts.coreElement,
    shellElement: amounts.shellElement,
    latticeNm: amounts.latticeNm,
    diameterNm: geometry.diameterNm,
    coreDiameterNm: geometry.coreDiameterNm,
    shellThicknessNm: geometry.shellThicknessNm,
    shellMonolayers: geometry.shellMonolayers,
    atomsPerParticle: geometry.atomsPerParticle,
    coreAtoms: geometry.coreAtoms,
    shellAtoms: geometry.shellAtoms,
    atomsA: geometry.atomsA,
    atomsB: geometry.atomsB,
    xB: geometry.xB,
    particles: amounts.particles,
    particlesPerMl,
    particleNanomolar: particleNanomolar(particlesPerMl),
    batchVolumeMl: input.batchVolumeMl,
    temperatureC: amounts.temperatureC,
    aqueous: amounts.aqueous,
    metals: amounts.metals,
    electronsMmol: amounts.electronsMmol,
    reducer: amounts.reducer?.balance ?? null,
    reagents: lines,
    makeUpVolumeMl,
    reductionOrder: kinetics.reductionOrder,
    galvanic: kinetics.galvanic,
    thermodynamicSurfaceElement: surface.element,
    asMade: surface.asMade ?? null,
    checks: [...amounts.checks, ...lineChecks, ...kinetics.checks, ...versus, ...stockChecks, ...hazards.checks],
    hazards: hazards.hazardSummary.hazards.map((h) => ({ code: h.code, text: h.text })),
    hazardSummary: hazards.hazardSummary,
  };
}

/** Atoms in one seed of `diameterNm` (convenience for lineage and the view). */
export function atomsPerSeed(diameterNm: number, latticeNm: number): number {
  return atomsInSphere(diameterNm, latticeNm);
}
