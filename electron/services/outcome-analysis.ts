/**
 * The analyses behind the outcome operations, shared by the previews (store nothing) and the imports
 * (store raw data and results): CSV → diameters → size analysis; CSV → line scan → four-model fit.
 */
import type { LineScanPreview, SizePreview } from '../../shared-model/api/outcomes';
import { parseDiameterCsv, parseLineScanCsv } from '../../shared-model/characterization/csv-import';
import type { DecimalSeparator } from '../../shared-model/characterization/csv-table';
import { fitLineScan } from '../../shared-model/characterization/line-scan-fit';
import { analyseSizes } from '../../shared-model/characterization/size-analysis';
import { latticeConstantNm } from '../../shared-model/elements/element-table';

export interface SizeImportInput {
  csvText: string;
  column?: string | number | undefined;
  decimalSeparator: DecimalSeparator;
  targetDiameterNm?: number | null | undefined;
  precisionPercent: number;
}

export function analyseSizeCsv(input: SizeImportInput): SizePreview {
  const imported = parseDiameterCsv(input.csvText, {
    ...(input.column !== undefined ? { column: input.column } : {}),
    decimalSeparator: input.decimalSeparator,
  });
  const analysis = analyseSizes(imported.diametersNm, {
    targetDiameterNm: input.targetDiameterNm ?? null,
    precisionPercent: input.precisionPercent,
  });
  return { ...analysis, diametersNm: imported.diametersNm, column: imported.column, importNotes: imported.notes };
}

export interface LineScanImportInput {
  csvText: string;
  positionColumn?: string | number | undefined;
  aColumn?: string | number | undefined;
  bColumn?: string | number | undefined;
  unit: 'auto' | 'counts' | 'atPercent';
  decimalSeparator: DecimalSeparator;
  probeSigmaNm: number | null;
}

export function pairLattices(elementA: string, elementB: string): Record<string, number> {
  return { [elementA]: latticeConstantNm(elementA), [elementB]: latticeConstantNm(elementB) };
}

export function analyseLineScanCsv(input: LineScanImportInput, elementA: string, elementB: string): LineScanPreview {
  const imported = parseLineScanCsv(input.csvText, {
    elementA,
    elementB,
    ...(input.positionColumn !== undefined ? { positionColumn: input.positionColumn } : {}),
    ...(input.aColumn !== undefined ? { aColumn: input.aColumn } : {}),
    ...(input.bColumn !== undefined ? { bColumn: input.bColumn } : {}),
    unit: input.unit,
    decimalSeparator: input.decimalSeparator,
  });
  const latticeNm = pairLattices(elementA, elementB);
  const analysis = fitLineScan(imported, {
    elementA,
    elementB,
    probeSigmaNm: input.probeSigmaNm,
    latticeANm: latticeNm[elementA] ?? null,
    latticeBNm: latticeNm[elementB] ?? null,
  });
  return {
    points: imported.positionsNm.map((positionNm, i) => ({
      positionNm,
      a: imported.signalA[i] as number,
      b: imported.signalB[i] as number,
    })),
    unit: imported.unit,
    columns: imported.columns,
    importNotes: imported.notes,
    latticeNm,
    analysis,
  };
}
