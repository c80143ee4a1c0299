/**
 * Version of the characterization analysis (size statistics, log-normal fit, composition checks and
 * line-scan models). Stored beside every derived result so an old figure can be recomputed and compared.
 * Bump it whenever a change would alter any stored number.
 */
// 2: histogram bins are whole multiples of the width; a diameter on an edge counts in the bin starting there.
export const ANALYSIS_VERSION = 'characterization-2';
