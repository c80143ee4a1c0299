/**
 * Cross-validation folds: leave-one-group-out (scikit-learn's LeaveOneGroupOut; for outcomes the group is the
 * pair, so every outcome of a pair is held out together) and leave-one-out. Folds come in the order of the
 * groups' first appearance; held-out predictions are pooled back in row order.
 */

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
