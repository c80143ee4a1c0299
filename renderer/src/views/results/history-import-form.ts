/**
 * Results → Import history as a pure model (no React, no DOM): the pasted or picked table into a
 * `learn.importHistory` input, the refusal of a bad table split into one line per bad cell (line, column,
 * value), the "already imported" refusal recognised so the view can ask before importing every row twice,
 * and the sentences the view shows after an import and for each imported table.
 */
import type { OperationInput } from '../../../../shared-model/api/contract';
import type { HistoryImportResult, HistoryImportSummary, HistoryOutcomeView } from '../../../../shared-model/api/learn';
import type { ApiError } from '../../../../shared-model/api/result';

export interface HistoryImportFormState {
  csvText: string;
  fileName: string | null;
}

export const EMPTY_HISTORY_IMPORT: HistoryImportFormState = { csvText: '', fileName: null };

export type HistoryImportReading =
  { ok: true; input: OperationInput<'learn.importHistory'> } | { ok: false; error: ApiError & { field: string } };

/** The operation input, or the message for an empty table (shown under the table's input). */
export function readHistoryImport(
  form: HistoryImportFormState,
  campaignId: number,
  allowDuplicates: boolean,
): HistoryImportReading {
  if (form.csvText.trim() === '')
    return {
      ok: false,
      error: { code: 'invalid_input', field: 'csvText', message: 'paste a history table or pick a CSV file first' },
    };
  return { ok: true, input: { campaignId, csvText: form.csvText, fileName: form.fileName, allowDuplicates } };
}

/** True for the refusal of a table the campaign already holds (the view asks, then imports with duplicates). */
export function isDuplicateRefusal(error: ApiError): boolean {
  return error.code === 'conflict' && error.field === 'csvText' && /already imported/.test(error.message);
}

/**
 * A refused table's message as its parts: a lead ("nothing imported") and one line per bad cell
 * ("line 4, column pair, value "Pt-Xx": unknown element "Xx""). A message without cell errors is one line.
 */
export function importErrorLines(message: string): { lead: string | null; lines: string[] } {
  const prefix = 'nothing imported: ';
  if (!message.startsWith(prefix)) return { lead: null, lines: [message] };
  const body = message.slice(prefix.length);
  const lines = body.split(/; (?=line \d+)/);
  return { lead: 'Nothing imported', lines };
}

/** The sentence after an import: rows, where from, per observed label, and a duplicate note. */
export function importDoneText(result: HistoryImportResult): string {
  const labels = Object.entries(result.labels)
    .sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]))
    .map(([label, n]) => `${label} ${n}`)
    .join(', ');
  const from = result.import.fileName ? ` from ${result.import.fileName}` : '';
  const duplicate = result.duplicateOf
    ? ` The same rows were imported before (${result.duplicateOf.createdAt.slice(0, 10)}); they now count twice.`
    : '';
  return `Imported ${result.rows} row${result.rows === 1 ? '' : 's'}${from} as history: ${labels}.${duplicate}`;
}

export interface ImportedTableRow {
  summary: HistoryImportSummary;
  title: string;
  /** "2026-09-08 – 2026-10-20" from the rows' made_on, or null when no row has a date. */
  dates: string | null;
  labels: string;
}

/** One line per imported table (oldest first, as the store lists them), with its dates and labels. */
export function importedTables(
  imports: readonly HistoryImportSummary[],
  outcomes: readonly HistoryOutcomeView[],
): ImportedTableRow[] {
  return imports.map((summary) => {
    const own = outcomes.filter((o) => o.importId === summary.id);
    const dates = own
      .map((o) => o.madeOn)
      .filter((d): d is string => d !== null)
      .sort();
    const counts = new Map<string, number>();
    for (const o of own) counts.set(o.observed, (counts.get(o.observed) ?? 0) + 1);
    const labels = [...counts.entries()]
      .sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]))
      .map(([label, n]) => `${label} ${n}`)
      .join(', ');
    return {
      summary,
      title: `${summary.fileName ?? 'pasted table'} (${summary.rowCount} row${summary.rowCount === 1 ? '' : 's'}, imported ${summary.createdAt.slice(0, 16).replace('T', ' ')})`,
      dates: dates.length > 0 ? `${dates[0]} – ${dates[dates.length - 1]}` : null,
      labels,
    };
  });
}

/** The question before removing a table. */
export function removeQuestion(row: ImportedTableRow): string {
  return (
    `Remove ${row.summary.fileName ?? 'the pasted table'} and its ${row.summary.rowCount} outcomes from the campaign? ` +
    'A model trained on them keeps its figures until you retrain.'
  );
}
