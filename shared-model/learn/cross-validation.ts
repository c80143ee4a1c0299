/**
 * Cross-validation folds: leave-one-group-out (scikit-learn's LeaveOneGroupOut; for outcomes the group is the
 * pair, so every outcome of a pair is held out together) and leave-one-out. Folds come in the order of the
 * groups' first appearance; held-out predictions are pooled back in row order. For large sets, a seeded
 * k-fold over rows and a grouped k-fold cap the number of fits (review.ts states where they are used).
 */
import { createRandom } from '../random';

export interface Fold {
  /** What is held out (the group name, or the row number for leave-one-out). */
  heldOut: string;
  train: number[];
  test: number[];
}

export function leaveOneGroupOut(groups: readonly string[]): Fold[] {
  const names: string[] = [];
  for (const g of groups) if (!names.includes(g)) names.push(g);
  return names.map((name) => ({
    heldOut: name,
    train: groups.flatMap((g, i) => (g === name ? [] : [i])),
    test: groups.flatMap((g, i) => (g === name ? [i] : [])),
  }));
}

export function leaveOneOut(rowCount: number): Fold[] {
  return Array.from({ length: rowCount }, (_, r) => ({
    heldOut: String(r),
    train: Array.from({ length: rowCount - 1 }, (_, i) => (i < r ? i : i + 1)),
    test: [r],
  }));
}

/** Runs `predict` on every fold and returns the held-out outputs in row order. */
export function crossValidate<T>(
  rowCount: number,
  folds: readonly Fold[],
  predict: (train: number[], test: number[]) => T[],
): T[] {
  const out = new Array<T | undefined>(rowCount).fill(undefined);
  for (const fold of folds) {
    const predictions = predict(fold.train, fold.test);
    fold.test.forEach((row, i) => {
      out[row] = predictions[i];
    });
  }
  return out.map((v, i) => {
    if (v === undefined) throw new RangeError(`row ${i} was in no test fold`);
    return v;
  });
}

/**
 * k-fold over rows (scikit-learn's KFold(shuffle=True) idea, with our own seeded shuffle): rows shuffled by
 * `seed`, then cut into k folds of near-equal size; each test fold listed in row order.
 */
export function kFold(rowCount: number, k: number, seed: number): Fold[] {
  const random = createRandom(seed);
  const order = Array.from({ length: rowCount }, (_, i) => i);
  for (let i = order.length - 1; i > 0; i--) {
    const j = random.nextInt(i + 1);
    [order[i], order[j]] = [order[j] as number, order[i] as number];
  }
  const folds = Math.min(k, rowCount);
  const foldOf = new Int32Array(rowCount);
  order.forEach((row, position) => (foldOf[row] = position % folds));
  return Array.from({ length: folds }, (_, f) => {
    const train: number[] = [];
    const test: number[] = [];
    for (let i = 0; i < rowCount; i++) (foldOf[i] === f ? test : train).push(i);
    return { heldOut: `fold ${f + 1} of ${folds}`, train, test };
  });
}

/**
 * Pairs held out together in at most this many groups (groupKFold; exactly leave-one-pair-out up to this many
 * pairs): the Model review's prior-weight tuning and each week's timeline model. Its headline stays
 * leave-one-pair-out.
 */
export const PAIR_GROUPS = 10;

/**
 * Grouped k-fold (every row of a group in the same test fold, the idea of scikit-learn's GroupKFold, which
 * balances fold sizes instead): the groups in order of first appearance are dealt round-robin into at most k
 * folds, so with k groups or fewer it is leave-one-group-out.
 */
export function groupKFold(groups: readonly string[], k: number): Fold[] {
  const names: string[] = [];
  for (const g of groups) if (!names.includes(g)) names.push(g);
  if (names.length <= k) return leaveOneGroupOut(groups);
  const foldOfGroup = new Map(names.map((name, i) => [name, i % k]));
  return Array.from({ length: k }, (_, f) => ({
    heldOut: names.filter((_, i) => i % k === f).join(', '),
    train: groups.flatMap((g, i) => (foldOfGroup.get(g) === f ? [] : [i])),
    test: groups.flatMap((g, i) => (foldOfGroup.get(g) === f ? [i] : [])),
  }));
}
