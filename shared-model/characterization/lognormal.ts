/**
 * Log-normal maximum-likelihood fit of particle diameters. With the location fixed at zero the MLE is
 * closed form on the logarithms: mu = mean of ln(d/nm), sigma = root-mean-square deviation of ln(d/nm)
 * with divisor n (the MLE, which is what scipy.stats.lognorm.fit(data, floc=0) returns as s, with
 * scale = exp(mu)). Confidence intervals use the normal theory of the log data: mu ± t(n−1) · s/√n, and
 * sigma from (n−1)s²/σ² ~ χ²(n−1), where s is the sample standard deviation of ln d (divisor n−1).
 */
import { invalid } from '../api/result';
import { checkDiameters } from './diameters';
import { chiSquareQuantile, studentTQuantile } from './distributions';

export interface LogNormalFit {
  /** Mean of ln(d/nm). */
  mu: number;
  /** Maximum-likelihood standard deviation of ln(d/nm) (divisor n). */
  sigma: number;
  /** Sample standard deviation of ln(d/nm) (divisor n−1), the unbiased-variance companion of sigma. */
  sigmaSample: number;
  confidenceLevel: number;
  muInterval: [number, number];
  sigmaInterval: [number, number];
  /** exp(mu): the median of the fitted distribution, nm. */
  medianNm: number;
  /** exp(mu + sigma²/2), nm. */
  meanNm: number;
  /** exp(mu − sigma²), nm. */
  modeNm: number;
  /** exp(sigma): geometric standard deviation (dimensionless). */
  geometricSd: number;
  n: number;
  /** Maximized log-likelihood of the diameters (in nm), for comparisons with other fits. */
  logLikelihood: number;
}

function checkConfidence(level: number): void {
  if (!(level > 0 && level < 1))
    throw invalid('confidenceLevel', `confidence level must lie between 0 and 1 (e.g. 0.95), got ${level}`);
}

export function fitLogNormal(diametersNm: readonly number[], confidenceLevel = 0.95): LogNormalFit {
  checkDiameters(diametersNm);
  checkConfidence(confidenceLevel);
  const n = diametersNm.length;
  let sumLog = 0;
  for (const d of diametersNm) sumLog += Math.log(d);
  const mu = sumLog / n;
  let ss = 0;
  for (const d of diametersNm) ss += (Math.log(d) - mu) ** 2;
  const sigma = Math.sqrt(ss / n);
  if (!(sigma > 0)) throw invalid('diametersNm', 'all diameters are equal; a size distribution needs some spread');
  const sigmaSample = Math.sqrt(ss / (n - 1));
  const alpha = 1 - confidenceLevel;
  const t = studentTQuantile(1 - alpha / 2, n - 1);
  const halfWidth = (t * sigmaSample) / Math.sqrt(n);
  const chiHigh = chiSquareQuantile(1 - alpha / 2, n - 1);
  const chiLow = chiSquareQuantile(alpha / 2, n - 1);
  // ln L = Σ [−ln d − ln σ − ½ ln 2π − (ln d − μ)²/(2σ²)]; at the MLE the last sum is n/2.
  const logLikelihood = -sumLog - n * Math.log(sigma) - 0.5 * n * Math.log(2 * Math.PI) - 0.5 * n;
  return {
    mu,
    sigma,
    sigmaSample,
    confidenceLevel,
    muInterval: [mu - halfWidth, mu + halfWidth],
    sigmaInterval: [
      Math.sqrt(((n - 1) * sigmaSample ** 2) / chiHigh),
      Math.sqrt(((n - 1) * sigmaSample ** 2) / chiLow),
    ],
    medianNm: Math.exp(mu),
    meanNm: Math.exp(mu + (sigma * sigma) / 2),
    modeNm: Math.exp(mu - sigma * sigma),
    geometricSd: Math.exp(sigma),
    n,
    logLikelihood,
  };
}

/** Probability density of the log-normal (mu, sigma of ln(d/nm)) at d nm, per nm. */
export function logNormalPdf(diameterNm: number, mu: number, sigma: number): number {
  if (diameterNm <= 0) return 0;
  const z = (Math.log(diameterNm) - mu) / sigma;
  return Math.exp(-0.5 * z * z) / (diameterNm * sigma * Math.sqrt(2 * Math.PI));
}
