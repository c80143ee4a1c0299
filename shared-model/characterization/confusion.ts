/**
 * Confusion matrix of predicted vs observed architectures over a campaign's outcomes. Labels are normalised
 * through labels.ts (so "janus" and "Janus" count as one); rows are observed, columns predicted. Agreement is
 * reported twice: exact label match, and match of kind (a core@shell predicted with the elements the other
 * way round agrees in kind but not in label).
 */
import {
  formatArchitecture,
  parseArchitecture,
  PREDICTED_KINDS,
  OUTCOME_ONLY_KINDS,
  type ArchitectureLabel,
} from '../architecture/labels';
import { at } from '../indexed';

export interface PredictionOutcomePair {
  predicted: ArchitectureLabel;
  observed: ArchitectureLabel;
}

export interface ConfusionMatrix {
  /** Label order of both axes. */
  labels: ArchitectureLabel[];
  /** counts[observedIndex][predictedIndex]. */
  counts: number[][];
  total: number;
  exactAgreement: number;
  kindAgreement: number;
  /** Fraction of exact matches (null when there are no pairs). */
  exactAgreementRate: number | null;
  kindAgreementRate: number | null;
  /** Per observed label: how many were predicted right (recall) — null when the label never occurs. */
  perLabel: {
    label: ArchitectureLabel;
    observed: number;
    predicted: number;
    correct: number;
    recall: number | null;
    precision: number | null;
  }[];
}

const KIND_ORDER = [...PREDICTED_KINDS, ...OUTCOME_ONLY_KINDS] as readonly string[];

function normalise(label: ArchitectureLabel): { label: ArchitectureLabel; kind: string } {
  const parsed = parseArchitecture(label);
  if (!parsed) return { label: label.trim(), kind: 'other' };
  return { label: formatArchitecture(parsed), kind: parsed.kind };
}

function labelOrder(a: { label: string; kind: string }, b: { label: string; kind: string }): number {
  const ka = KIND_ORDER.indexOf(a.kind);
  const kb = KIND_ORDER.indexOf(b.kind);
  if (ka !== kb) return ka - kb;
  return a.label.localeCompare(b.label);
}

export function confusionMatrix(
  pairs: readonly PredictionOutcomePair[],
  extraLabels: readonly ArchitectureLabel[] = [],
): ConfusionMatrix {
  const normalised = pairs.map((p) => ({ predicted: normalise(p.predicted), observed: normalise(p.observed) }));
  const seen = new Map<string, { label: string; kind: string }>();
  for (const p of normalised) {
    seen.set(p.predicted.label, p.predicted);
    seen.set(p.observed.label, p.observed);
  }
  for (const extra of extraLabels) {
    const n = normalise(extra);
    seen.set(n.label, n);
  }
  const labels = [...seen.values()].sort(labelOrder).map((l) => l.label);
  const index = new Map(labels.map((l, i) => [l, i]));
  const counts = labels.map(() => labels.map(() => 0));
  let exact = 0;
  let kind = 0;
  for (const p of normalised) {
    const row = counts[index.get(p.observed.label) as number] as number[];
    const col = index.get(p.predicted.label) as number;
    row[col] = at(row, col) + 1;
    if (p.predicted.label === p.observed.label) exact++;
    if (p.predicted.kind === p.observed.kind) kind++;
  }
  const total = normalised.length;
  const perLabel = labels.map((label, i) => {
    const observed = (counts[i] as number[]).reduce((s, v) => s + v, 0);
    const predicted = counts.reduce((s, row) => s + at(row, i), 0);
    const correct = (counts[i] as number[])[i] as number;
    return {
      label,
      observed,
      predicted,
      correct,
      recall: observed > 0 ? correct / observed : null,
      precision: predicted > 0 ? correct / predicted : null,
    };
  });
  return {
    labels,
    counts,
    total,
    exactAgreement: exact,
    kindAgreement: kind,
    exactAgreementRate: total > 0 ? exact / total : null,
    kindAgreementRate: total > 0 ? kind / total : null,
    perLabel,
  };
}

export type LabelAgreement = 'agree' | 'same kind' | 'disagree';

/** Exact label match → agree; same kind (e.g. core@shell the other way round) → same kind; else disagree. */
export function labelAgreement(predicted: ArchitectureLabel, observed: ArchitectureLabel): LabelAgreement {
  const p = normalise(predicted);
  const o = normalise(observed);
  if (p.label === o.label) return 'agree';
  return p.kind === o.kind && p.kind !== 'other' ? 'same kind' : 'disagree';
}
