/** Characterization analysis: TEM sizes, composition checks, EDX line scans, prediction-vs-outcome tables. */
export { ANALYSIS_VERSION } from './version';
export { parseDiameterCsv, parseLineScanCsv, MIN_LINE_SCAN_POINTS } from './csv-import';
export type {
  DiameterImport,
  DiameterImportOptions,
  LineScanData,
  LineScanImport,
  LineScanImportOptions,
  LineScanUnit,
} from './csv-import';
export { sizeStatistics, particlesForHalfWidth } from './size-statistics';
export { analyseSizes, DEFAULT_PRECISION_PERCENT } from './size-analysis';
export type { SizeAnalysis, SizeAnalysisOptions } from './size-analysis';
export type { SizeStatistics, SizePrecisionGoal } from './size-statistics';
export { fitLogNormal, logNormalPdf } from './lognormal';
export type { LogNormalFit } from './lognormal';
export { sizeHistogram } from './histogram';
export type { SizeHistogram, HistogramBin } from './histogram';
export { compareComposition, COMPOSITION_METHODS, GRID_METALS } from './composition';
export type {
  CompositionInput,
  CompositionComparison,
  CompositionMeasurement,
  CompositionMethod,
  CompositionRow,
  CompositionWarning,
} from './composition';
export { lineOverlaps, suggestedLine, xrayLines, detectorFwhmEv } from './xray-lines';
export {
  LINE_SCAN_MODELS,
  sphereChordNm,
  chordAntiderivative,
  regionChordsNm,
  BlurredChordGrid,
} from './chord-profile';
export type { LineScanModelKind, ProfileGeometry } from './chord-profile';
export { fitLineScan, modelLabel, bicEvidence } from './line-scan-fit';
export type { LineScanAnalysis, LineScanModelFit, LineScanFitOptions, Estimate, BicEvidence } from './line-scan-fit';
export { confusionMatrix } from './confusion';
export type { ConfusionMatrix, PredictionOutcomePair } from './confusion';
