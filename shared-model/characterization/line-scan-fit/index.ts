/**
 * Fits the four line-scan models of chord-profile.ts to an EDX line scan and chooses between them by BIC.
 *
 * Signal model per channel c ∈ {A, B}:  y_c(x) = k_c · (G_σ * L_c)(x) + b_c, with L_c the chord through c's
 * region, G_σ the Gaussian probe, k_c ≥ 0 an amplitude (density × detector sensitivity) and b_c a background.
 * For given geometry (x0, R, core fraction f = rc/R, σ) the amplitudes and backgrounds are linear and are
 * solved exactly (variable projection, Golub & Pereyra, SIAM J. Numer. Anal. 10, 413 (1973)); the geometry
 * is fitted by Levenberg–Marquardt (ml-levenberg-marquardt) within bounds, from starting values read off the
 * data (half-maximum widths of each channel), with two starts per core@shell model and both Janus
 * orientations. Residuals are weighted by each channel's noise: Poisson variance for raw counts (non-negative
 * integers), otherwise a constant per channel estimated from second differences (MAD).
 *
 * Choice: BIC = N·ln(WRSS/N) + k·ln N (Schwarz, Ann. Stat. 6, 461 (1978)), N = 2 × points, k = all fitted
 * parameters (geometry, 4 linear, 1 noise scale). Evidence from the BIC gap to the runner-up follows Kass &
 * Raftery, J. Am. Stat. Assoc. 90, 773 (1995): < 2 weak, 2–6 positive, 6–10 strong, > 10 very strong.
 * Uncertainties: covariance s²(JᵀJ)⁻¹ of all parameters at the optimum (J by central differences for the
 * geometry, exact for the linear ones), s² = WRSS/(N − k); core radius fR and shell R(1 − f) by the delta method.
 *
 * Files: types.ts (options and results), scan.ts (input checks, noise), residual.ts (the problem shared by every
 * model), levenberg-marquardt.ts (the driver), covariance.ts, alloy.ts / core-shell.ts / janus.ts (each model's
 * starts and quantities), selection.ts (BIC, evidence, suggestion), fit.ts (fitLineScan).
 */
export { fitLineScan } from './fit';
export { bicEvidence, modelLabel } from './selection';
export { LINE_SCAN_FIT_BUDGET, MAX_GRID_CELLS } from './types';
export type { BicEvidence, Estimate, LineScanAnalysis, LineScanFitOptions, LineScanModelFit } from './types';
