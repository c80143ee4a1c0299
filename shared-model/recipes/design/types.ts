/**
 * What a batch design returns (DOMAIN.md Models 5–8) and what the design stages pass to one another's
 * callers: reagent lines, metal amounts, kinetic summaries and checks.
 */
import type { HazardSummary } from '../../hazards/summary';
import type { SynthesisRoute } from '../design-input';
import type { Reagent, ReagentRole } from '../reagent';

export const RECIPE_MODEL_VERSION = 'recipes-1';

export type CheckSeverity = 'info' | 'warning' | 'danger';
export type CheckKind =
  | 'reduction-order'
  | 'galvanic-replacement'
  | 'kinetics-vs-thermodynamics'
  | 'target'
  | 'shell'
  | 'geometry'
  | 'volume'
  | 'reducer'
  | 'stock-age'
  | 'hazard';

export interface DesignCheck {
  kind: CheckKind;
  severity: CheckSeverity;
  message: string;
}

export type DesignedRole = ReagentRole | 'seeds';

export interface DesignedReagent {
  key: string;
  name: string;
  formula: string;
  role: DesignedRole;
  /** Formula units (mmol); for PVP monomer units; null for the seed dispersion. */
  amountMmol: number | null;
  /** Mass to weigh (mg) of the reagent as dispensed (assay accounted for). */
  massMg: number | null;
  /** Volume to dispense (mL): of the stock solution when a stock is given, else of the neat liquid. */
  volumeMl: number | null;
  stockMm: number | null;
  molarMassGPerMol: number | null;
  note: string;
}

export interface MetalAmount {
  element: string;
  amountMmol: number;
  /** Final concentration in the batch volume (mM). */
  finalMm: number;
  /** Catalog key of the precursor; null when the metal comes with the seeds. */
  precursorKey: string | null;
  oxidationState: number | null;
}

export interface GalvanicSummary {
  seedMetal: string;
  shellMetal: string;
  drivingForceV: number;
  replaces: boolean;
  seedAtomsPerShellAtom: number;
  /** If the whole shell precursor reacted by replacement instead of reduction. */
  seedAtomsConsumedPerParticle: number;
  seedFractionConsumed: number;
  shellCouple: string;
  seedCouple: string;
  reaction: string;
}

export interface ReductionOrderSummary {
  first: string;
  second: string;
  gapV: number;
  firstCouple: string;
  secondCouple: string;
  firstEV: number;
  secondEV: number;
}

/** The electron balance behind the reducer amount. */
export interface ReducerBalance {
  key: string;
  electronsPerUnit: number;
  halfReaction: string;
  stoichiometricMmol: number;
  excess: number;
  /** True when the user gave no excess and the reducer's common-practice default was used (absent in older designs). */
  excessAssumed?: boolean;
  /** Why that excess: the common practice behind the default, or that the user gave it. */
  excessBasis?: string;
}

export interface BatchDesign {
  modelVersion: string;
  elementA: string;
  elementB: string;
  target: string;
  route: SynthesisRoute;
  routeLabel: string;
  architecture: 'alloy' | 'core@shell' | 'single-metal';
  coreElement: string | null;
  shellElement: string | null;
  latticeNm: Record<string, number>;
  diameterNm: number;
  coreDiameterNm: number | null;
  shellThicknessNm: number | null;
  shellMonolayers: number | null;
  atomsPerParticle: number;
  coreAtoms: number;
  shellAtoms: number;
  atomsA: number;
  atomsB: number;
  /** Composition as the atomic fraction of B (0–1), as in predictions and outcomes; shown as at.%. */
  xB: number;
  particles: number;
  particlesPerMl: number;
  particleNanomolar: number;
  batchVolumeMl: number;
  temperatureC: number;
  aqueous: boolean;
  metals: MetalAmount[];
  electronsMmol: number;
  reducer: ReducerBalance | null;
  reagents: DesignedReagent[];
  /** Water (or solvent) to add so the batch reaches its volume; null when not applicable. */
  makeUpVolumeMl: number | null;
  reductionOrder: ReductionOrderSummary | null;
  galvanic: GalvanicSummary | null;
  thermodynamicSurfaceElement: string | null | undefined;
  /** The structure expected as made for this route and conditions (null: no prediction for the pair). */
  asMade: BatchAsMade | null;
  checks: DesignCheck[];
  hazards: { code: string; text: string }[];
  hazardSummary: HazardSummary;
}

/** The particle a thermodynamic prediction is asked about (composition as the atomic fraction of B). */
export interface SurfaceQuestion {
  elementA: string;
  elementB: string;
  architecture: BatchDesign['architecture'];
  xB: number;
  diameterNm: number;
  temperatureC: number;
  route: SynthesisRoute;
  /** Seed metal of a seed-mediated batch, else null. */
  seedElement: string | null;
}

/** What the particle is expected to be as the synthesis leaves it (shared-model/prediction/as-made.ts). */
export interface BatchAsMade {
  label: string;
  basis: 'kinetic' | 'equilibrium';
  afterAnnealing: string;
  text: string;
  /** In air or water: the oxidation outlook ('' when nothing oxidises). */
  oxidation: string;
}

/**
 * Element the thermodynamic model puts at the surface (null: no strong enrichment; undefined: no
 * prediction available), with the reason when there is none.
 */
export interface SurfaceAnswer {
  element: string | null | undefined;
  note: string | null;
  asMade?: BatchAsMade | null;
}

export interface DesignContext {
  catalog: readonly Reagent[];
  /**
   * Lattice constants (nm) for elements missing from `input.latticeNm`; else the element table's
   * (fcc-equivalent) value.
   */
  latticeNm?: (symbol: string) => number | undefined;
  /**
   * Element the thermodynamic model puts at the surface for this pair and composition
   * (null: no strong enrichment; undefined: no prediction available).
   */
  thermodynamicSurfaceElement?: string | null;
  /**
   * Asked once the particle is known, when `thermodynamicSurfaceElement` is not given: lets a caller
   * run the prediction at the designed composition, size and temperature without designing twice.
   */
  thermodynamicSurface?: (particle: SurfaceQuestion) => SurfaceAnswer;
  /** Current time (ISO) for stock-age checks; omit to skip them. */
  now?: string;
}
