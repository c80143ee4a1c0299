/**
 * The one place where a particle's architecture is decided from its composition numbers
 * (DOMAIN.md "Words"). The analytic prediction, the Monte Carlo analysis and the outcome log all call
 * `classifyArchitecture`, with thresholds that are settings stored beside every result.
 */
import { coreShellLabel, type ArchitectureKind, type ArchitectureLabel } from './labels';

export interface ClassificationThresholds {
  /** Enrichment E at or above which the enriched element is called a shell (E = 1 is a complete shell). */
  coreShellEnrichment: number;
  /** Enrichment E at or above which a mixed particle is called surface-enriched. */
  enrichedAlloyEnrichment: number;
  /** Unlike-neighbour fraction relative to a random alloy below which like atoms cluster: Janus / phase separated. */
  janusUnlikeRatio: number;
  /** Unlike-neighbour fraction relative to a random alloy above which the particle is called ordered (intermetallic). */
  intermetallicUnlikeRatio: number;
  /**
   * Janus rule on the separation numbers (used only when a model gives them): centre-of-mass offset of the
   * two elements over the particle radius at or above which, with both elements on the surface and each
   * in one connected domain, the particle is called Janus.
   */
  janusCentreOffset?: number;
  /** Share of each element's atoms in its largest connected domain at or above which it counts as one domain. */
  janusDomainShare?: number;
  /** Smallest surface share each element must hold for both to count as exposed. */
  janusSurfaceShare?: number;
}

export const DEFAULT_THRESHOLDS: ClassificationThresholds = Object.freeze({
  coreShellEnrichment: 0.6,
  enrichedAlloyEnrichment: 0.15,
  janusUnlikeRatio: 0.6,
  intermetallicUnlikeRatio: 1.35,
  janusCentreOffset: 0.3,
  janusDomainShare: 0.9,
  janusSurfaceShare: 0.1,
});

export const CLASSIFIER_VERSION = 'classify-1';

export interface ClassificationInput {
  elementA: string;
  elementB: string;
  /** Overall atomic fraction of B in the particle, 0 < xB < 1. */
  xB: number;
  /** Atomic fraction of B among surface sites. */
  surfaceXB: number;
  /**
   * Unlike-neighbour fraction of the particle divided by that of a random arrangement at the same
   * composition (1 − Warren–Cowley α); omitted when the model gives no neighbour statistics.
   */
  unlikeNeighbourRatio?: number;
  /**
   * Spreading coefficient S = γ_core − γ_shell − γ_AB (J/m²) of a phase-separated particle, when a model
   * gives one: S < 0 (partial wetting) makes it Janus even if the isotherm puts one element outside.
   */
  spreadingJPerM2?: number;
  /** Separation numbers of a particle model with positions (omitted otherwise). */
  separation?: {
    /** Centre-of-mass distance of the two elements over the particle radius. */
    centreOfMassOffset: number;
    /** Share of A's atoms, and of B's, in their largest connected domain. */
    largestDomainShareA: number;
    largestDomainShareB: number;
  };
}

export interface Classification {
  label: ArchitectureLabel;
  kind: ArchitectureKind;
  /** The element with more surface share than its overall share, or null when neither is. */
  enrichedElement: string | null;
  /** E = (xs − x)/(1 − x) for the enriched element: 0 none, 1 complete shell. */
  enrichment: number;
  /**
   * Distance of the deciding numbers from the nearest threshold, scaled to [0, 1]:
   * 0 = on a threshold (the label could flip), 1 = far from every threshold.
   */
  margin: number;
  thresholds: ClassificationThresholds;
  classifierVersion: string;
}

/** E = (xs − x)/(1 − x) of the element whose surface share exceeds its overall share. */
export function surfaceEnrichment(xB: number, surfaceXB: number): { enriched: 'A' | 'B' | null; enrichment: number } {
  if (surfaceXB > xB) return { enriched: 'B', enrichment: (surfaceXB - xB) / (1 - xB) };
  if (surfaceXB < xB) {
    const xA = 1 - xB;
    const surfaceXA = 1 - surfaceXB;
    return { enriched: 'A', enrichment: (surfaceXA - xA) / (1 - xA) };
  }
  return { enriched: null, enrichment: 0 };
}

function checkFraction(name: string, value: number): void {
  if (!Number.isFinite(value) || value < 0 || value > 1) {
    throw new RangeError(`${name} must be a fraction between 0 and 1, got ${value}`);
  }
}

export function classifyArchitecture(
  input: ClassificationInput,
  thresholds: ClassificationThresholds = DEFAULT_THRESHOLDS,
): Classification {
  checkFraction('xB', input.xB);
  checkFraction('surfaceXB', input.surfaceXB);
  if (input.xB <= 0 || input.xB >= 1) throw new RangeError(`xB must lie strictly between 0 and 1, got ${input.xB}`);
  const { enriched, enrichment } = surfaceEnrichment(input.xB, input.surfaceXB);
  const enrichedElement = enriched === 'A' ? input.elementA : enriched === 'B' ? input.elementB : null;
  const otherElement = enriched === 'A' ? input.elementB : input.elementA;
  const ratio = input.unlikeNeighbourRatio;

  const distances: number[] = [
    Math.abs(enrichment - thresholds.coreShellEnrichment) / Math.max(thresholds.coreShellEnrichment, 1e-9),
    Math.abs(enrichment - thresholds.enrichedAlloyEnrichment) / Math.max(thresholds.enrichedAlloyEnrichment, 1e-9),
  ];
  if (ratio !== undefined) {
    if (!Number.isFinite(ratio) || ratio < 0) throw new RangeError(`unlikeNeighbourRatio must be ≥ 0, got ${ratio}`);
    distances.push(Math.abs(ratio - thresholds.janusUnlikeRatio) / thresholds.janusUnlikeRatio);
    distances.push(Math.abs(ratio - thresholds.intermetallicUnlikeRatio) / thresholds.intermetallicUnlikeRatio);
  }
  const sep = input.separation;
  const janusOffset = thresholds.janusCentreOffset;
  let separatedJanus = false;
  if (sep !== undefined && janusOffset !== undefined) {
    const domainShare = thresholds.janusDomainShare ?? DEFAULT_THRESHOLDS.janusDomainShare ?? 0.9;
    const surfaceShare = thresholds.janusSurfaceShare ?? DEFAULT_THRESHOLDS.janusSurfaceShare ?? 0.1;
    if (!Number.isFinite(sep.centreOfMassOffset) || sep.centreOfMassOffset < 0)
      throw new RangeError(`centreOfMassOffset must be ≥ 0, got ${sep.centreOfMassOffset}`);
    distances.push(Math.abs(sep.centreOfMassOffset - janusOffset) / janusOffset);
    separatedJanus =
      sep.centreOfMassOffset >= janusOffset &&
      Math.min(sep.largestDomainShareA, sep.largestDomainShareB) >= domainShare &&
      Math.min(input.surfaceXB, 1 - input.surfaceXB) >= surfaceShare;
  }
  const margin = Math.min(1, ...distances);

  let kind: ArchitectureKind;
  let label: ArchitectureLabel;
  if (input.spreadingJPerM2 !== undefined && input.spreadingJPerM2 < 0) {
    kind = 'Janus';
    label = 'Janus';
  } else if (enrichedElement !== null && enrichment >= thresholds.coreShellEnrichment) {
    kind = 'core@shell';
    label = coreShellLabel(otherElement, enrichedElement);
  } else if (separatedJanus || (ratio !== undefined && ratio < thresholds.janusUnlikeRatio)) {
    kind = 'Janus';
    label = 'Janus';
  } else if (ratio !== undefined && ratio > thresholds.intermetallicUnlikeRatio) {
    kind = 'intermetallic';
    label = 'intermetallic';
  } else if (enrichedElement !== null && enrichment >= thresholds.enrichedAlloyEnrichment) {
    kind = 'surface-enriched alloy';
    label = 'surface-enriched alloy';
  } else {
    kind = 'alloy';
    label = 'alloy';
  }
  return {
    label,
    kind,
    enrichedElement,
    enrichment,
    margin,
    thresholds: { ...thresholds },
    classifierVersion: CLASSIFIER_VERSION,
  };
}
