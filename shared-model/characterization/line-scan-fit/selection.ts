/**
 * Model choice: BIC = N·ln(WRSS/N) + k·ln N (Schwarz, Ann. Stat. 6, 461 (1978)); evidence from the BIC gap to the
 * runner-up after Kass & Raftery, J. Am. Stat. Assoc. 90, 773 (1995): < 2 weak, 2–6 positive, 6–10 strong,
 * > 10 very strong.
 */
import { coreShellLabel, type ArchitectureLabel } from '../../architecture/labels';
import type { LineScanModelKind } from '../chord-profile';
import type { BicEvidence, LineScanAnalysis, LineScanModelFit } from './types';

export function modelLabel(kind: LineScanModelKind, elementA: string, elementB: string): ArchitectureLabel {
  switch (kind) {
    case 'alloy':
      return 'alloy';
    case 'A@B':
      return coreShellLabel(elementA, elementB);
    case 'B@A':
      return coreShellLabel(elementB, elementA);
    case 'Janus':
      return 'Janus';
  }
}

export function bicEvidence(deltaBic: number): BicEvidence {
  if (deltaBic > 10) return 'very strong';
  if (deltaBic > 6) return 'strong';
  if (deltaBic > 2) return 'positive';
  return 'weak';
}

/** BIC of a fit of N residuals with k parameters. */
export function bicOf(weightedRss: number, N: number, k: number): number {
  return N * Math.log(weightedRss / N) + k * Math.log(N);
}

/** The smallest BIC and each BIC's approximate posterior probability, exp(−ΔBIC/2) normalised. */
export function bicWeights(bics: readonly number[]): { minBic: number; weightOf: (bic: number) => number } {
  const minBic = Math.min(...bics);
  const weightSum = bics.reduce((s, bic) => s + Math.exp(-(bic - minBic) / 2), 0);
  return { minBic, weightOf: (bic) => Math.exp(-(bic - minBic) / 2) / weightSum };
}

export interface Ranking {
  chosen: LineScanModelFit;
  runnerUp: LineScanModelFit;
  deltaBicToNext: number;
  evidence: BicEvidence;
}

export function rankModels(models: readonly LineScanModelFit[]): Ranking {
  const ranked = [...models].sort((p, q) => p.bic - q.bic);
  const chosen = ranked[0] as LineScanModelFit;
  const runnerUp = ranked[1] as LineScanModelFit;
  const deltaBicToNext = runnerUp.bic - chosen.bic;
  return { chosen, runnerUp, deltaBicToNext, evidence: bicEvidence(deltaBicToNext) };
}

/** The suggested observed architecture with its reason; notes on bounds and weak evidence go to `notes`. */
export function suggestArchitecture(
  { chosen, runnerUp, deltaBicToNext, evidence }: Ranking,
  notes: string[],
): LineScanAnalysis['suggestion'] {
  let suggestion: LineScanAnalysis['suggestion'] = {
    label: chosen.label,
    reason: `${chosen.label} has the lowest BIC (${evidence} evidence, ΔBIC ${deltaBicToNext.toFixed(1)} to ${runnerUp.label})`,
  };
  if (chosen.shellMonolayers && chosen.shellMonolayers.value < 1) {
    suggestion = {
      label: 'surface-enriched alloy',
      reason: `${chosen.label} fits best but its shell is ${chosen.shellMonolayers.value.toFixed(2)} monolayers thick, less than one complete layer (Pairwright's rule: call that a surface-enriched alloy)`,
    };
  }
  if (chosen.atBounds.length > 0)
    notes.push(`${chosen.label}: ${chosen.atBounds.join(', ')} ended on a bound; its uncertainty is not meaningful`);
  if (evidence === 'weak')
    notes.push(
      `the data hardly distinguish ${chosen.label} from ${runnerUp.label} (ΔBIC < 2); treat the choice as open`,
    );
  return suggestion;
}
