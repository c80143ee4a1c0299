/** One TEM size analysis: statistics, log-normal fit and chart data, stamped with the analysis version. */
import { sizeHistogram, type SizeHistogram } from './histogram';
import { fitLogNormal, type LogNormalFit } from './lognormal';
import { sizeStatistics, type SizeStatistics } from './size-statistics';
import { ANALYSIS_VERSION } from './version';

export interface SizeAnalysisOptions {
  targetDiameterNm?: number | null;
  /** Wanted ±precision of the mean, % of the mean (95 % confidence); default 2. */
  precisionPercent?: number | null;
  binWidthNm?: number | null;
}

export interface SizeAnalysis {
  analysisVersion: string;
  statistics: SizeStatistics;
  lognormal: LogNormalFit;
  histogram: SizeHistogram;
}

export const DEFAULT_PRECISION_PERCENT = 2;

export function analyseSizes(diametersNm: readonly number[], options: SizeAnalysisOptions = {}): SizeAnalysis {
  const statistics = sizeStatistics(diametersNm, {
    targetDiameterNm: options.targetDiameterNm ?? null,
    precision: { relativePercent: options.precisionPercent ?? DEFAULT_PRECISION_PERCENT },
  });
  const lognormal = fitLogNormal(diametersNm);
  const histogram = sizeHistogram(diametersNm, lognormal, options.binWidthNm ? { binWidthNm: options.binWidthNm } : {});
  return { analysisVersion: ANALYSIS_VERSION, statistics, lognormal, histogram };
}
