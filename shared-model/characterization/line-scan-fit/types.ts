import type { ArchitectureLabel } from '../../architecture/labels';
import type { ComputeBudget, Clock } from '../../compute-budget';
import type { LineScanModelKind } from '../chord-profile';
import type { LineScanData } from '../csv-import';

export interface LineScanFitOptions {
  elementA: string;
  elementB: string;
  /** Probe σ (nm) when known; fitted when omitted or null. */
  probeSigmaNm?: number | null;
  /** Lattice constants (nm) used to express a shell of A or of B in monolayers. */
  latticeANm?: number | null;
  latticeBNm?: number | null;
  /** Levenberg–Marquardt iterations per start (default 60). */
  maxIterations?: number;
  /** Model evaluations and wall time of the whole fit, every model and start (default LINE_SCAN_FIT_BUDGET). */
  budget?: ComputeBudget;
  /** The budget's clock (tests pass their own). */
  clock?: Clock;
}

/**
 * A whole fit (four models, up to three starts each, 60 Levenberg–Marquardt steps of 2·p + 1 evaluations) takes
 * at most ~3,500 model evaluations; 20,000 leaves room for the covariances. 30 s is far above the ~0.1 s a
 * scan of a few hundred points takes (npm run bench), and keeps a pathological scan from holding a core.
 */
/** Model grid plus blur kernel cells: 4 million (~100 MB of work arrays) is ~20 cells per point of 200,000 points. */
export const MAX_GRID_CELLS = 4_000_000;

export const LINE_SCAN_FIT_BUDGET: ComputeBudget = Object.freeze({ maxIterations: 20_000, maxWallMs: 30_000 });

export interface Estimate {
  value: number;
  /** One standard uncertainty, or null when the covariance could not be formed. */
  sd: number | null;
}

export interface LineScanModelFit {
  model: LineScanModelKind;
  /** "alloy", "Au@Pd", "Pd@Au" or "Janus". */
  label: ArchitectureLabel;
  parameterCount: number;
  weightedRss: number;
  bic: number;
  /** BIC − smallest BIC over the models. */
  deltaBic: number;
  /** Approximate posterior probability from BIC, exp(−ΔBIC/2) normalised. */
  bicWeight: number;
  centerNm: Estimate;
  radiusNm: Estimate;
  coreRadiusNm: Estimate | null;
  shellThicknessNm: Estimate | null;
  shellMonolayers: Estimate | null;
  probeSigmaNm: Estimate;
  probeFitted: boolean;
  amplitudeA: number;
  amplitudeB: number;
  backgroundA: number;
  backgroundB: number;
  /** Janus only: true when A occupies the low-position hemisphere. */
  janusALow: boolean | null;
  /** Fitted signals at the scan positions. */
  fittedA: number[];
  fittedB: number[];
  /** Parameters that ended on a bound (their uncertainties are not meaningful). */
  atBounds: string[];
  iterations: number;
}

export type BicEvidence = 'weak' | 'positive' | 'strong' | 'very strong';

export interface LineScanAnalysis {
  analysisVersion: string;
  elementA: string;
  elementB: string;
  unit: LineScanData['unit'];
  points: number;
  chosenModel: ArchitectureLabel;
  chosenKind: LineScanModelKind;
  models: LineScanModelFit[];
  evidence: BicEvidence;
  /** BIC gap between the chosen model and the runner-up. */
  deltaBicToNext: number;
  /** Suggested observed architecture (labels.ts), with the reason. */
  suggestion: { label: ArchitectureLabel; reason: string };
  noise: { a: number; b: number; model: 'poisson' | 'constant' };
  notes: string[];
}
