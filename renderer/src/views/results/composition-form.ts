/**
 * The composition form as a pure model: typed at.% (nominal, and value ± uncertainty of each filled row)
 * read with the one number reader and turned into fractions for `outcomes.record`; a refusal names the
 * input shown (rows keep the index they have on screen). Empty rows are left out.
 */
import type { OperationInput } from '../../../../shared-model/api/contract';
import type { CompositionMethod } from '../../../../shared-model/characterization/composition';
import { fieldNumber, optionalFieldNumber, readForm, type FormReading } from '../../forms/typed-numbers';

export interface RowDraft {
  method: CompositionMethod;
  xBPct: string;
  uncertaintyPct: string;
  lines: string;
}

export const emptyRow = (method: CompositionMethod): RowDraft => ({ method, xBPct: '', uncertaintyPct: '', lines: '' });

type CompositionInput = NonNullable<OperationInput<'outcomes.record'>['composition']>;

/** The composition part to record, or the error to show beside the input at fault. */
export function readCompositionForm(
  nominal: string,
  grid: string,
  rows: readonly RowDraft[],
): FormReading<CompositionInput> {
  return readForm(() => {
    const nominalPct = optionalFieldNumber(nominal, 'nominalXB', 'nominal at.%');
    const measurements = rows.flatMap((row, i) => {
      if (row.xBPct.trim() === '') return [];
      const xBPct = fieldNumber(row.xBPct, `measurements.${i}.xB`, `${row.method} at.%`);
      const uncertaintyPct = optionalFieldNumber(
        row.uncertaintyPct,
        `measurements.${i}.uncertaintyXB`,
        `${row.method} ± at.%`,
      );
      return [
        {
          method: row.method,
          xB: xBPct / 100,
          uncertaintyXB: uncertaintyPct === null ? null : uncertaintyPct / 100,
          ...(row.lines.trim() ? { lines: row.lines.trim() } : {}),
        },
      ];
    });
    return {
      nominalXB: nominalPct === null ? null : nominalPct / 100,
      gridMetal: grid.trim() === '' ? null : grid.trim(),
      measurements,
    };
  });
}
