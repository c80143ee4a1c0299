/** Plain-text tables for the CLI's human output. */
export interface Column<Row> {
  header: string;
  value: (row: Row) => string | number | boolean | null | undefined;
  align?: 'left' | 'right';
}

function cell(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isInteger(value) ? String(value) : value.toPrecision(4);
  return String(value);
}

export function formatTable<Row>(rows: readonly Row[], columns: readonly Column<Row>[]): string {
  if (rows.length === 0) return '(none)';
  const cells = rows.map((row) => columns.map((column) => cell(column.value(row))));
  const widths = columns.map((column, index) =>
    Math.max(column.header.length, ...cells.map((line) => (line[index] ?? '').length)),
  );
  const pad = (text: string, index: number): string => {
    const width = widths[index] ?? 0;
    return columns[index]?.align === 'right' ? text.padStart(width) : text.padEnd(width);
  };
  const header = columns.map((column, index) => pad(column.header, index)).join('  ');
  const rule = widths.map((width) => '-'.repeat(width)).join('  ');
  const body = cells.map((line) =>
    line
      .map((text, index) => pad(text, index))
      .join('  ')
      .trimEnd(),
  );
  return [header.trimEnd(), rule, ...body].join('\n');
}
