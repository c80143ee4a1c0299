/**
 * Reading an array element whose index is in range by construction (a loop bound, a length checked before):
 * with noUncheckedIndexedAccess `values[i]` is `number | undefined`; `at` gives the number, and throws where a
 * cast would have let `undefined` through as NaN. Not for the Monte Carlo kernels' inner loops (kept as they are).
 */
export function at(values: ArrayLike<number>, index: number): number {
  const value = values[index];
  if (value === undefined) throw new RangeError(`index ${index} is outside 0–${values.length - 1}`);
  return value;
}
