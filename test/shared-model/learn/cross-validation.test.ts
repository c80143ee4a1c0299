/**
 * The capped validation schemes (review.ts): a seeded k-fold over rows and a grouped k-fold by pair. Every row
 * is held out exactly once, train and test are disjoint, a group never straddles folds, and with k groups or
 * fewer the grouped k-fold is leave-one-group-out (scikit-learn's KFold / GroupKFold contracts, from their
 * documentation).
 */
import { describe, expect, it } from 'vitest';
import { groupKFold, kFold, leaveOneGroupOut } from '../../../shared-model/learn/cross-validation';

function checkPartition(rowCount: number, folds: { train: number[]; test: number[] }[]): void {
  const seen = new Array<number>(rowCount).fill(0);
  for (const f of folds) {
    for (const i of f.test) seen[i] = (seen[i] as number) + 1;
    expect(new Set([...f.train, ...f.test]).size).toBe(rowCount);
    expect(f.train.length + f.test.length).toBe(rowCount);
  }
  expect(seen.every((c) => c === 1)).toBe(true);
}

describe('capped cross-validation folds', () => {
  it('k-fold: 10 folds of 45 or 46 rows, each row held out once, the same for the same seed', () => {
    const folds = kFold(455, 10, 11);
    expect(folds).toHaveLength(10);
    checkPartition(455, folds);
    expect(folds.every((f) => f.test.length === 45 || f.test.length === 46)).toBe(true);
    expect(kFold(455, 10, 11)).toEqual(folds);
    expect(kFold(455, 10, 12)).not.toEqual(folds);
  });

  it('grouped k-fold: a pair is never split, at most k folds, leave-one-group-out for k groups or fewer', () => {
    const groups = Array.from({ length: 200 }, (_, i) => `pair${(i * 7) % 23}`);
    const folds = groupKFold(groups, 10);
    expect(folds).toHaveLength(10);
    checkPartition(groups.length, folds);
    for (const f of folds) {
      const testGroups = new Set(f.test.map((i) => groups[i]));
      expect(f.train.some((i) => testGroups.has(groups[i]))).toBe(false);
    }
    const few = groups.map((g) => g.slice(0, 5));
    expect(groupKFold(few, 10)).toEqual(leaveOneGroupOut(few));
  });
});
