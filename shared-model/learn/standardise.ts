/**
 * Column standardisation fitted on a training set and applied to any rows (mean and standard deviation with
 * ddof 0, as scikit-learn's StandardScaler), plus the removal of constant and exactly collinear columns.
 * Both are fitted inside each training fold of a cross-validation, never on the held-out rows.
 */

export interface ColumnScaler {
  /** Indices of the kept input columns, in order. */
  kept: number[];
  means: number[];
  scales: number[];
  /** Input columns left out, with the reason. */
  dropped: { column: number; reason: 'constant' | 'collinear' }[];
}

/** Relative size of a residual below which a column counts as a linear combination of earlier ones. */
const COLLINEAR_TOLERANCE = 1e-9;

function columnOf(rows: readonly (readonly number[])[], column: number): Float64Array {
  const out = new Float64Array(rows.length);
  for (let i = 0; i < rows.length; i++) out[i] = (rows[i] as readonly number[])[column] as number;
  return out;
}

function columnMeanAndScale(values: Float64Array): { mean: number; scale: number } {
  const n = values.length;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += values[i] as number;
  const mean = sum / n;
  let squares = 0;
  for (let i = 0; i < n; i++) {
    const d = (values[i] as number) - mean;
    squares += d * d;
  }
  return { mean, scale: Math.sqrt(squares / n) };
}

function sumOfSquares(v: Float64Array): number {
  let s = 0;
  for (let i = 0; i < v.length; i++) s += (v[i] as number) * (v[i] as number);
  return s;
}

/**
 * Fits the scaler: drops constant columns, then (Gram–Schmidt on the standardised columns, in column order)
 * every column whose residual after projection on the kept ones is below 1e-9 of its norm — e.g. a Miedema
 * total that is the sum of its chemical and elastic parts, or the last level of a one-hot group.
 */
export function fitColumnScaler(
  rows: readonly (readonly number[])[],
  options: { dropCollinear?: boolean } = {},
): ColumnScaler {
  if (rows.length === 0) throw new RangeError('cannot standardise an empty table');
  const columns = (rows[0] as readonly number[]).length;
  const kept: number[] = [];
  const means: number[] = [];
  const scales: number[] = [];
  const dropped: ColumnScaler['dropped'] = [];
  const basis: Float64Array[] = [];
  for (let c = 0; c < columns; c++) {
    const values = columnOf(rows, c);
    const { mean, scale } = columnMeanAndScale(values);
    if (!(scale > 1e-12 * Math.max(1, Math.abs(mean)))) {
      dropped.push({ column: c, reason: 'constant' });
      continue;
    }
    if (options.dropCollinear !== false) {
      const v = values;
      for (let i = 0; i < v.length; i++) v[i] = ((v[i] as number) - mean) / scale;
      const norm0 = Math.sqrt(sumOfSquares(v));
      for (const q of basis) {
        let dot = 0;
        for (let i = 0; i < v.length; i++) dot += (q[i] as number) * (v[i] as number);
        for (let i = 0; i < v.length; i++) v[i] = (v[i] as number) - dot * (q[i] as number);
      }
      const norm = Math.sqrt(sumOfSquares(v));
      if (norm < COLLINEAR_TOLERANCE * norm0) {
        dropped.push({ column: c, reason: 'collinear' });
        continue;
      }
      for (let i = 0; i < v.length; i++) v[i] = (v[i] as number) / norm;
      basis.push(v);
    }
    kept.push(c);
    means.push(mean);
    scales.push(scale);
  }
  return { kept, means, scales, dropped };
}

export function applyColumnScaler(scaler: ColumnScaler, rows: readonly (readonly number[])[]): number[][] {
  return rows.map((row) =>
    scaler.kept.map((c, j) => ((row[c] as number) - (scaler.means[j] as number)) / (scaler.scales[j] as number)),
  );
}

/** applyColumnScaler into one flat row-major table (rows × kept columns), the same values. */
export function applyColumnScalerFlat(scaler: ColumnScaler, rows: readonly (readonly number[])[]): Float64Array {
  const p = scaler.kept.length;
  const out = new Float64Array(rows.length * p);
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i] as readonly number[];
    for (let j = 0; j < p; j++)
      out[i * p + j] =
        ((row[scaler.kept[j] as number] as number) - (scaler.means[j] as number)) / (scaler.scales[j] as number);
  }
  return out;
}
