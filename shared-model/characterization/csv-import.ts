/**
 * CSV import of TEM particle diameters and of EDX line scans (DOMAIN.md Models 9). Both read the same
 * tolerant table (see csv-table.ts) and stop at the first bad row with a message naming its line and value.
 */
import { invalid } from '../api/result';
import {
  columnName,
  describeColumns,
  headerLengthFactor,
  readCsvTable,
  readNumberCell,
  resolveColumn,
  type CsvTable,
  type DecimalSeparator,
} from './csv-table';

export interface DiameterImport {
  diametersNm: number[];
  /** 1-based column number and its header name (if any). */
  column: { number: number; name: string | null };
  headerPresent: boolean;
  delimiter: CsvTable['delimiter'];
  decimalComma: boolean;
  notes: string[];
}

export interface DiameterImportOptions {
  /** Header name or 1-based column number; chosen automatically when the file has one column or a diameter-like header. */
  column?: string | number;
  decimalSeparator?: DecimalSeparator;
}

const DIAMETER_HEADER = /(diam|feret|size|^d$|^d\s*[([]|length)/i;

function pickDiameterColumn(table: CsvTable): number {
  if (table.columnCount === 1) return 0;
  if (table.header) {
    const index = table.header.findIndex((h) => DIAMETER_HEADER.test(h.trim()));
    if (index >= 0) return index;
  }
  throw invalid(
    'column',
    `the file has ${table.columnCount} columns (${describeColumns(table)}); choose the column holding the diameters`,
  );
}

export function parseDiameterCsv(text: string, options: DiameterImportOptions = {}): DiameterImport {
  const table = readCsvTable(text, { decimalSeparator: options.decimalSeparator ?? 'auto' });
  const column =
    options.column !== undefined ? resolveColumn(table, options.column, 'column') : pickDiameterColumn(table);
  const headerText = table.header?.[column];
  const unit = headerLengthFactor(headerText);
  if (unit === 'pixels') {
    throw invalid(
      'column',
      `column ${columnName(table, column)} is in pixels; set the scale in the image-analysis tool and export diameters in nm`,
    );
  }
  const notes = [...table.notes];
  if (unit.factorToNm !== 1) notes.push(`column ${columnName(table, column)} is in ${unit.unit}; converted to nm`);
  const diametersNm: number[] = [];
  for (const row of table.rows) {
    const value = readNumberCell(table, row, column, 'csvText') * unit.factorToNm;
    if (value <= 0) throw invalid('csvText', `line ${row.line}: diameter "${row.fields[column]}" is not positive`);
    diametersNm.push(value);
  }
  if (diametersNm.length < 3) {
    throw invalid('csvText', `need at least 3 particle diameters, found ${diametersNm.length}`);
  }
  return {
    diametersNm,
    column: { number: column + 1, name: headerText ?? null },
    headerPresent: table.header !== null,
    delimiter: table.delimiter,
    decimalComma: table.decimalComma,
    notes,
  };
}

export type LineScanUnit = 'counts' | 'atPercent';

export interface LineScanData {
  positionsNm: number[];
  /** Signal of element A at each position (counts, or at.% when unit is atPercent). */
  signalA: number[];
  signalB: number[];
  unit: LineScanUnit;
}

export interface LineScanImport extends LineScanData {
  columns: { position: string; a: string; b: string };
  notes: string[];
}

export interface LineScanImportOptions {
  elementA: string;
  elementB: string;
  positionColumn?: string | number;
  aColumn?: string | number;
  bColumn?: string | number;
  unit?: LineScanUnit | 'auto';
  decimalSeparator?: DecimalSeparator;
}

/** The fewest points a line scan must have for the four-model comparison. */
export const MIN_LINE_SCAN_POINTS = 12;

function headerHasSymbol(header: string, symbol: string): boolean {
  return new RegExp(`(^|[^A-Za-z])${symbol}([^a-z]|$)`).test(header);
}

export function parseLineScanCsv(text: string, options: LineScanImportOptions): LineScanImport {
  const table = readCsvTable(text, { decimalSeparator: options.decimalSeparator ?? 'auto' });
  if (table.columnCount < 3) {
    throw invalid(
      'csvText',
      `a line scan needs three columns (position, ${options.elementA}, ${options.elementB}); the file has ${table.columnCount}`,
    );
  }
  const notes = [...table.notes];
  const header = table.header;
  let positionIndex: number;
  if (options.positionColumn !== undefined)
    positionIndex = resolveColumn(table, options.positionColumn, 'positionColumn');
  else {
    const found = header ? header.findIndex((h) => /(pos|dist|^x\b|length|\bnm\b|µm|μm)/i.test(h)) : -1;
    positionIndex = found >= 0 ? found : 0;
  }
  const pickElement = (
    choice: string | number | undefined,
    symbol: string,
    field: string,
    fallback: number,
  ): number => {
    if (choice !== undefined) return resolveColumn(table, choice, field);
    if (header) {
      const found = header.findIndex((h, i) => i !== positionIndex && headerHasSymbol(h, symbol));
      if (found >= 0) return found;
    }
    notes.push(`no header names ${symbol}; took column ${fallback + 1} for ${symbol}`);
    return fallback;
  };
  const others = [0, 1, 2, 3, 4, 5].filter((i) => i !== positionIndex && i < table.columnCount);
  const aIndex = pickElement(options.aColumn, options.elementA, 'aColumn', others[0] as number);
  const bIndex = pickElement(
    options.bColumn,
    options.elementB,
    'bColumn',
    (others.find((i) => i !== aIndex) ?? others[1]) as number,
  );
  if (aIndex === bIndex)
    throw invalid(
      'bColumn',
      `${options.elementA} and ${options.elementB} cannot be read from the same column (${columnName(table, aIndex)})`,
    );
  if (aIndex === positionIndex || bIndex === positionIndex)
    throw invalid('positionColumn', 'the position column cannot also hold an element signal');

  let unit: LineScanUnit;
  if (options.unit && options.unit !== 'auto') unit = options.unit;
  else {
    const names = [header?.[aIndex] ?? '', header?.[bIndex] ?? ''].join(' ');
    unit = /(%|at\.?\s*pct|atomic)/i.test(names) ? 'atPercent' : 'counts';
  }
  const lengthUnit = headerLengthFactor(header?.[positionIndex]);
  if (lengthUnit === 'pixels')
    throw invalid('positionColumn', `column ${columnName(table, positionIndex)} is in pixels; export positions in nm`);
  if (lengthUnit.factorToNm !== 1) notes.push(`positions are in ${lengthUnit.unit}; converted to nm`);

  const points: { x: number; a: number; b: number; line: number }[] = [];
  for (const row of table.rows) {
    points.push({
      x: readNumberCell(table, row, positionIndex, 'csvText') * lengthUnit.factorToNm,
      a: readNumberCell(table, row, aIndex, 'csvText'),
      b: readNumberCell(table, row, bIndex, 'csvText'),
      line: row.line,
    });
  }
  if (points.length < MIN_LINE_SCAN_POINTS) {
    throw invalid(
      'csvText',
      `a line scan needs at least ${MIN_LINE_SCAN_POINTS} points to compare the four models, found ${points.length}`,
    );
  }
  const increasing = points.every((p, i) => i === 0 || p.x > (points[i - 1] as typeof p).x);
  if (!increasing) {
    points.sort((p, q) => p.x - q.x);
    for (let i = 1; i < points.length; i++) {
      const p = points[i] as (typeof points)[number];
      const q = points[i - 1] as (typeof points)[number];
      if (p.x === q.x)
        throw invalid('csvText', `lines ${q.line} and ${p.line} both give position ${p.x} nm; positions must differ`);
    }
    notes.push('positions were not in increasing order; sorted');
  }
  return {
    positionsNm: points.map((p) => p.x),
    signalA: points.map((p) => p.a),
    signalB: points.map((p) => p.b),
    unit,
    columns: { position: columnName(table, positionIndex), a: columnName(table, aIndex), b: columnName(table, bIndex) },
    notes,
  };
}
