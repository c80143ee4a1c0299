/**
 * The conditions of one prediction and their defaults. PREDICTION_DEFAULTS is the one place the defaults
 * live: the contract's zod schema (shared-model/api/prediction.ts), the model, the CLI and the conditions
 * bar of the prediction views all read it. Inputs from outside are validated by the contract only; the
 * model (`resolveConditions`) fills the settings a caller left out and asserts the numeric domain its
 * equations need, nothing more.
 */
import { DEFAULT_THRESHOLDS, type ClassificationThresholds } from '../architecture/classify';
import { invalid } from '../api/result';
import type { ParticleShape } from '../geometry/shapes';
import { DEFAULT_PRESSURE_BAR, type Environment } from './environment';
import type { SurfaceFacet } from './segregation';

export const STRAIN_RULES = ['oversized solute', 'any solute'] as const;
export type StrainRule = (typeof STRAIN_RULES)[number];

export interface PredictionConditions {
  /** Overall atomic fraction of B, 0 < xB < 1. */
  xB: number;
  diameterNm: number;
  shape: ParticleShape;
  /** Synthesis or annealing temperature, K. */
  temperatureK: number;
  /** Facet whose coordination and area per atom enter the segregation enthalpy; (111) by default. */
  facet?: SurfaceFacet;
  /**
   * Which solutes gain the Friedel strain relief at the surface: 'oversized solute' (default: only a solute
   * larger than its host; a clean surface is under tensile stress and offers room to larger atoms only) or
   * 'any solute' (Wynblatt & Ku's original, which also pushes smaller solutes out).
   */
  strainRule?: StrainRule;
  thresholds?: ClassificationThresholds;
  /** Gas or ligand around the particle (environment.ts); vacuum by default. */
  environment?: Environment;
  /** Gas pressure for the Langmuir coverage, bar (default 1). */
  pressureBar?: number;
  /** Time at `temperatureK`, hours (default 1 h, common practice for colloidal syntheses): sets the interdiffusion length. */
  timeH?: number;
}

/** Conditions with every setting filled in, as the model computes with them. */
export type ResolvedConditions = Required<PredictionConditions>;

/** Defaults of every condition (the first four are what a new form or a bare CLI call starts from). */
export const PREDICTION_DEFAULTS: Readonly<ResolvedConditions> = Object.freeze({
  xB: 0.5,
  diameterNm: 3,
  shape: 'cuboctahedron',
  temperatureK: 600,
  facet: '111',
  strainRule: 'oversized solute',
  thresholds: DEFAULT_THRESHOLDS,
  environment: 'vacuum',
  pressureBar: DEFAULT_PRESSURE_BAR,
  timeH: 1,
});

/**
 * Fills omitted settings from PREDICTION_DEFAULTS and asserts what the equations need (0 < xB < 1, a finite
 * positive diameter and temperature); a caller that breaks this gets a DomainError naming the field.
 * Not a validator of user input: that is the contract's zod schema.
 */
export function resolveConditions(conditions: PredictionConditions): ResolvedConditions {
  const { xB, diameterNm, temperatureK, shape } = conditions;
  if (!(Number.isFinite(xB) && xB > 0 && xB < 1))
    throw invalid('xB', `xB must lie strictly between 0 and 1, got ${String(xB)}`);
  if (!(Number.isFinite(diameterNm) && diameterNm > 0)) {
    throw invalid('diameterNm', `diameterNm must be a positive number, got ${String(diameterNm)}`);
  }
  if (!(Number.isFinite(temperatureK) && temperatureK > 0)) {
    throw invalid('temperatureK', `temperatureK must be a positive number, got ${String(temperatureK)}`);
  }
  const { pressureBar, timeH } = conditions;
  if (pressureBar !== undefined && !(Number.isFinite(pressureBar) && pressureBar > 0)) {
    throw invalid('pressureBar', `pressureBar must be a positive number, got ${String(pressureBar)}`);
  }
  if (timeH !== undefined && !(Number.isFinite(timeH) && timeH > 0))
    throw invalid('timeH', `timeH must be a positive number, got ${String(timeH)}`);
  return {
    xB,
    diameterNm,
    shape,
    temperatureK,
    facet: conditions.facet ?? PREDICTION_DEFAULTS.facet,
    strainRule: conditions.strainRule ?? PREDICTION_DEFAULTS.strainRule,
    thresholds: conditions.thresholds ?? PREDICTION_DEFAULTS.thresholds,
    environment: conditions.environment ?? PREDICTION_DEFAULTS.environment,
    pressureBar: conditions.pressureBar ?? PREDICTION_DEFAULTS.pressureBar,
    timeH: conditions.timeH ?? PREDICTION_DEFAULTS.timeH,
  };
}
