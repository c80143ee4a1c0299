/**
 * Validation figures of a probabilistic classifier on held-out rows (scikit-learn's definitions):
 * accuracy, balanced accuracy (mean per-class recall over the classes present), log-loss (mean −ln p of
 * the observed class; compare with ln K, the loss of the uniform guess), multiclass Brier score
 * (mean over rows of Σ_k (p_k − [y = k])², 0 best, 2 worst), per-class recall and a reliability diagram
 * (10 equal-width bins of the top-class probability: mean confidence vs observed frequency of being right).
 */

export interface ReliabilityBin {
  /** Lower and upper edge of the confidence bin. */
  from: number;
  to: number;
  count: number;
  /** Mean top-class probability in the bin, and the fraction of those rows predicted right (null when empty). */
  meanConfidence: number | null;
  observedAccuracy: number | null;
}

export interface ClassifierFigures {
  rows: number;
  accuracy: number;
  errors: number;
  balancedAccuracy: number;
  logLoss: number;
  /** ln K of the uniform guess over the K classes. */
  uniformLogLoss: number;
  brier: number;
  perClassRecall: { label: string; recall: number | null; support: number }[];
  reliability: ReliabilityBin[];
}

export const RELIABILITY_BINS = 10;

/** Figures of held-out probabilities (each row sums to 1 over `labels`) against the observed class indices. */
export function classifierFigures(
  probabilities: readonly (readonly number[])[],
  observed: readonly number[],
  labels: readonly string[],
): ClassifierFigures {
  const n = observed.length;
  if (n === 0) throw new RangeError('no held-out rows to score');
  const K = labels.length;
  let right = 0;
  let logLoss = 0;
  let brier = 0;
  const support = new Array<number>(K).fill(0);
  const hits = new Array<number>(K).fill(0);
  const bins = Array.from({ length: RELIABILITY_BINS }, () => ({ count: 0, confidence: 0, right: 0 }));
  probabilities.forEach((probs, i) => {
    const y = observed[i] as number;
    let best = 0;
    for (let k = 1; k < K; k++) if ((probs[k] as number) > (probs[best] as number)) best = k;
    const correct = best === y;
    if (correct) right++;
    support[y] = (support[y] as number) + 1;
    if (correct) hits[y] = (hits[y] as number) + 1;
    logLoss -= Math.log(Math.max(probs[y] as number, 1e-15));
    for (let k = 0; k < K; k++) brier += ((probs[k] as number) - (k === y ? 1 : 0)) ** 2;
    const top = probs[best] as number;
    const bin = bins[Math.min(RELIABILITY_BINS - 1, Math.floor(top * RELIABILITY_BINS))] as (typeof bins)[number];
    bin.count++;
    bin.confidence += top;
    if (correct) bin.right++;
  });
  const perClassRecall = labels.map((label, k) => ({
    label,
    support: support[k] as number,
    recall: (support[k] as number) > 0 ? (hits[k] as number) / (support[k] as number) : null,
  }));
  const present = perClassRecall.filter((c) => c.recall !== null);
  return {
    rows: n,
    accuracy: right / n,
    errors: n - right,
    balancedAccuracy: present.reduce((s, c) => s + (c.recall as number), 0) / present.length,
    logLoss: logLoss / n,
    uniformLogLoss: Math.log(K),
    brier: brier / n,
    perClassRecall,
    reliability: bins.map((b, i) => ({
      from: i / RELIABILITY_BINS,
      to: (i + 1) / RELIABILITY_BINS,
      count: b.count,
      meanConfidence: b.count > 0 ? b.confidence / b.count : null,
      observedAccuracy: b.count > 0 ? b.right / b.count : null,
    })),
  };
}
