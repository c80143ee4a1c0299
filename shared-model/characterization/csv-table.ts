/**
 * Reads delimited text as exported by image-analysis and EDX software into rows of fields with their line
 * numbers: strips a byte-order mark, accepts CRLF / CR / LF line ends, skips blank lines, detects the
 * delimiter (tab, semicolon or comma) and whether decimal commas are used. Parsing is done by papaparse.
 *
 * Decimal commas: with a tab or semicolon delimiter a comma inside a number is a decimal comma. With a comma
 * delimiter, a file whose rows all hold exactly two digit-only parts (and whose header, if any, has one
 * name) is read as one column of decimal-comma numbers, unless the first parts count 0,1,2… or 1,2,3…
 * (then they are a row index). The reading chosen is reported in `notes`.
 */
import Papa from 'papaparse/papaparse.js';
import { invalid } from '../api/result';
import { PLAIN_NUMBER } from '../text/user-number';

export type DecimalSeparator = 'auto' | '.' | ',';

export interface CsvRow {
  /** 1-based line number in the file as the user sees it. */
  line: number;
  fields: string[];
}

export interface CsvTable {
  header: string[] | null;
  rows: CsvRow[];
  delimiter: 'tab' | 'semicolon' | 'comma' | 'none';
  decimalComma: boolean;
  columnCount: number;
  notes: string[];
}

const NUMBER_DOT = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
/** With decimal commas a field is a number in the typed-number reader's sense (one "." or ","). */
const NUMBER_COMMA = PLAIN_NUMBER;

/** Parses one field as a number; null when it is not one. */
export function parseNumberField(raw: string, decimalComma: boolean): number | null {
  const text = raw.trim();
  if (text === '') return null;
  if (decimalComma ? !NUMBER_COMMA.test(text) : !NUMBER_DOT.test(text)) return null;
  const value = Number(decimalComma ? text.replace(',', '.') : text);
  return Number.isFinite(value) ? value : null;
}

function detectDelimiter(lines: readonly string[]): CsvTable['delimiter'] {
  if (lines.some((l) => l.includes('\t'))) return 'tab';
  if (lines.some((l) => l.includes(';'))) return 'semicolon';
  if (lines.some((l) => l.includes(','))) return 'comma';
  return 'none';
}

const DELIMITER_CHAR = { tab: '\t', semicolon: ';', comma: ',', none: ',' } as const;

function isIndexSequence(values: readonly string[]): boolean {
  if (values.length < 2) return false;
  const first = Number(values[0]);
  if (first !== 0 && first !== 1) return false;
  return values.every((v, i) => Number(v) === first + i);
}

export function readCsvTable(
  text: string,
  options: { decimalSeparator?: DecimalSeparator; field?: string } = {},
): CsvTable {
  const field = options.field ?? 'csvText';
  if (typeof text !== 'string') throw invalid(field, 'the file content must be text');
  const cleaned = text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
  const physicalLines = cleaned.split('\n');
  const nonBlank = physicalLines.filter((l) => l.trim() !== '');
  if (nonBlank.length === 0) throw invalid(field, 'the file is empty');
  const notes: string[] = [];
  let delimiter = detectDelimiter(nonBlank);
  const decimalOption = options.decimalSeparator ?? 'auto';
  let decimalComma =
    decimalOption === ',' || (decimalOption === 'auto' && (delimiter === 'tab' || delimiter === 'semicolon'));

  const parsed = Papa.parse(cleaned, { delimiter: DELIMITER_CHAR[delimiter], newline: '\n', skipEmptyLines: false });
  const quoteError = parsed.errors.find((e) => e.code === 'MissingQuotes' || e.code === 'InvalidQuotes');
  if (quoteError) {
    const line = (quoteError.row ?? 0) + 1;
    throw invalid(field, `line ${line}: ${quoteError.message.toLowerCase()}`);
  }
  let rows: CsvRow[] = [];
  parsed.data.forEach((fields, index) => {
    if (fields.every((f) => f.trim() === '')) return;
    rows.push({ line: index + 1, fields: fields.map((f) => f.trim()) });
  });

  // A comma-delimited file that is really one column of decimal-comma numbers?
  if (delimiter === 'comma' && decimalOption !== '.') {
    const isDigits = (s: string) => /^[+-]?\d+$/.test(s);
    const firstIsHeader =
      rows.length > 0 && (rows[0] as CsvRow).fields.some((f) => f !== '' && parseNumberField(f, false) === null);
    const dataRows = firstIsHeader ? rows.slice(1) : rows;
    const headerFields = firstIsHeader ? (rows[0] as CsvRow).fields.length : 1;
    const twoDigitParts =
      dataRows.length > 0 &&
      dataRows.every(
        (r) => r.fields.length === 2 && isDigits(r.fields[0] as string) && /^\d+$/.test(r.fields[1] as string),
      );
    const looksLikeIndex = isIndexSequence(dataRows.map((r) => r.fields[0] as string));
    if (decimalOption === ',' || (twoDigitParts && headerFields === 1 && !looksLikeIndex)) {
      rows = rows.map((r) => ({ line: r.line, fields: [r.fields.join(',')] }));
      delimiter = 'none';
      decimalComma = true;
      if (decimalOption === 'auto')
        notes.push(
          'read "12,5"-style values as decimal commas (one column); choose "." as decimal separator if they were two columns',
        );
    }
  }

  const first = rows[0] as CsvRow;
  // A header has a non-numeric name; a first row whose odd cells start like numbers ("12.x") is a bad data row.
  const nonNumeric = first.fields.filter((f) => f !== '' && parseNumberField(f, decimalComma) === null);
  const hasHeader = nonNumeric.length > 0 && !nonNumeric.every((f) => /^[+-]?[\d.,]/.test(f));
  const header = hasHeader ? first.fields : null;
  const dataRows = hasHeader ? rows.slice(1) : rows;
  const columnCount = Math.max(header?.length ?? 0, ...dataRows.map((r) => r.fields.length));
  if (decimalComma && (delimiter === 'tab' || delimiter === 'semicolon'))
    notes.push('decimal commas accepted (tab/semicolon-delimited file)');
  return { header, rows: dataRows, delimiter, decimalComma, columnCount, notes };
}

/** Resolves a column chosen by 1-based number or header name to a 0-based index. */
export function resolveColumn(table: CsvTable, choice: string | number, field: string): number {
  if (typeof choice === 'number') {
    if (!Number.isInteger(choice) || choice < 1 || choice > table.columnCount) {
      throw invalid(
        field,
        `column ${choice} does not exist; the file has ${table.columnCount} column${table.columnCount === 1 ? '' : 's'}`,
      );
    }
    return choice - 1;
  }
  const wanted = choice.trim().toLowerCase();
  if (/^\d+$/.test(wanted)) return resolveColumn(table, Number(wanted), field);
  if (!table.header)
    throw invalid(field, `the file has no header row, so choose the column by number (1–${table.columnCount})`);
  const index = table.header.findIndex((h) => h.trim().toLowerCase() === wanted);
  if (index < 0) throw invalid(field, `no column named "${choice}"; the columns are ${describeColumns(table)}`);
  return index;
}

export function describeColumns(table: CsvTable): string {
  const names: string[] = [];
  for (let i = 0; i < table.columnCount; i++) {
    const name = table.header?.[i];
    names.push(name ? `${i + 1} "${name}"` : `${i + 1}`);
  }
  return names.join(', ');
}

export function columnName(table: CsvTable, index: number): string {
  const name = table.header?.[index];
  return name ? `"${name}"` : `${index + 1}`;
}

/** Length unit written in a column header: factor to nm, or an error for pixels. */
export function headerLengthFactor(headerText: string | undefined): { factorToNm: number; unit: string } | 'pixels' {
  if (!headerText) return { factorToNm: 1, unit: 'nm' };
  if (/\b(px|pixels?)\b/i.test(headerText)) return 'pixels';
  if (/(µm|μm|\bum\b|micron)/i.test(headerText)) return { factorToNm: 1000, unit: 'µm' };
  if (/(Å|angstrom)/i.test(headerText)) return { factorToNm: 0.1, unit: 'Å' };
  return { factorToNm: 1, unit: 'nm' };
}

/** Reads a numeric cell; throws naming the line and the value. */
export function readNumberCell(table: CsvTable, row: CsvRow, column: number, field: string): number {
  const raw = row.fields[column];
  if (raw === undefined || raw === '') {
    throw invalid(field, `line ${row.line}: no value in column ${columnName(table, column)}`);
  }
  const value = parseNumberField(raw, table.decimalComma);
  if (value === null)
    throw invalid(field, `line ${row.line}: "${raw}" in column ${columnName(table, column)} is not a number`);
  return value;
}
