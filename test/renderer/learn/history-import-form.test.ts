/**
 * Results → Import history without a browser: the table into a `learn.importHistory` input, a refused
 * table's message split into one line per bad cell (messages made by the real reader,
 * shared-model/learn/history-table.ts), the duplicate refusal recognised, and the imported-table lines.
 */
import { describe, expect, it } from 'vitest';
import type { HistoryImportResult, HistoryOutcomeView } from '../../../shared-model/api/learn';
import { DomainError } from '../../../shared-model/api/result';
import { validateInput } from '../../../shared-model/api/validate';
import { parseHistoryTable } from '../../../shared-model/learn/history-table';
import {
  importDoneText,
  importedTables,
  importErrorLines,
  isDuplicateRefusal,
  readHistoryImport,
  removeQuestion,
} from '../../../renderer/src/views/results/history-import-form';

const HEADER = 'pair,xB_at_pct,diameter_nm,temperature_k,route,observed,made_on';

function refusal(text: string): string {
  try {
    parseHistoryTable(text);
  } catch (error) {
    if (error instanceof DomainError) return error.message;
    throw error;
  }
  throw new Error('the table was accepted');
}

describe('history import form', () => {
  it('reads a pasted table into an input the contract accepts', () => {
    const text = `${HEADER}\nPt-Ni,25,4,423,polyol,alloy,2026-09-01\n`;
    const reading = readHistoryImport({ csvText: text, fileName: 'group.csv' }, 3, false);
    expect(reading).toEqual({
      ok: true,
      input: { campaignId: 3, csvText: text, fileName: 'group.csv', allowDuplicates: false },
    });
    if (!reading.ok) throw new Error('unreachable');
    expect(validateInput('learn.importHistory', reading.input).ok).toBe(true);
  });

  it('refuses an empty table beside the table input', () => {
    expect(readHistoryImport({ csvText: '  \n', fileName: null }, 3, false)).toEqual({
      ok: false,
      error: { code: 'invalid_input', field: 'csvText', message: 'paste a history table or pick a CSV file first' },
    });
  });

  it('splits a refused table into one line per bad cell, each with its line, column and value', () => {
    const message = refusal(
      `${HEADER}\nPt-Ni,25,4,423,polyol,alloy,2026-09-01\nPt-Xx,25,4,423,polyol,alloy,\nPt-Ni,120,4,423,polyol,alloy,\n`,
    );
    const parts = importErrorLines(message);
    expect(parts.lead).toBe('Nothing imported');
    expect(parts.lines).toEqual([
      'line 3, column pair, value "Pt-Xx": unknown element "Xx"',
      'line 4, column xB_at_pct, value "120": composition must lie strictly between 0 and 100 at.%',
    ]);
  });

  it('keeps a message without cell errors as one line', () => {
    const message = refusal('pair,xB_at_pct\nPt-Ni,25\n');
    expect(importErrorLines(message)).toEqual({ lead: null, lines: [message] });
    expect(message).toMatch(/^line 1: missing columns diameter_nm, temperature_k, route, observed/);
  });

  it('recognises the refusal of a table imported before, and nothing else', () => {
    const duplicate = {
      code: 'conflict' as const,
      field: 'csvText',
      message: 'this table (70 rows) was already imported into the campaign on 2026-12-02; import it again only …',
    };
    expect(isDuplicateRefusal(duplicate)).toBe(true);
    expect(isDuplicateRefusal({ ...duplicate, code: 'invalid_input' })).toBe(false);
    expect(isDuplicateRefusal({ code: 'conflict', field: 'campaignId', message: 'no learned model yet' })).toBe(false);
  });

  it('says what was imported, per label, and when the rows now count twice', () => {
    const summary = { id: 2, campaignId: 1, fileName: 'demo.csv', rowCount: 3, createdAt: '2026-12-02T10:00:00Z' };
    const result: HistoryImportResult = {
      import: summary,
      rows: 3,
      labels: { failed: 1, alloy: 2 },
      notes: [],
      duplicateOf: null,
    };
    expect(importDoneText(result)).toBe('Imported 3 rows from demo.csv as history: alloy 2, failed 1.');
    expect(importDoneText({ ...result, duplicateOf: { ...summary, id: 1, createdAt: '2026-11-30T09:00:00Z' } })).toBe(
      'Imported 3 rows from demo.csv as history: alloy 2, failed 1. ' +
        'The same rows were imported before (2026-11-30); they now count twice.',
    );
  });

  it('lists each imported table with its dates and labels, and asks before removing it', () => {
    const outcome = (importId: number, observed: string, madeOn: string | null): HistoryOutcomeView => ({
      id: `${importId}-${observed}-${madeOn}`,
      importId,
      line: 2,
      pair: 'Pt-Ni',
      xB: 0.25,
      diameterNm: 4,
      temperatureK: 423,
      route: 'polyol',
      observed,
      madeOn,
      notes: '',
    });
    const rows = importedTables(
      [
        { id: 1, campaignId: 1, fileName: 'a.csv', rowCount: 3, createdAt: '2026-12-01T08:30:00Z' },
        { id: 2, campaignId: 1, fileName: null, rowCount: 1, createdAt: '2026-12-02T09:15:00Z' },
      ],
      [
        outcome(1, 'alloy', '2026-10-02'),
        outcome(1, 'Ni@Pt', '2026-09-20'),
        outcome(1, 'alloy', null),
        outcome(2, 'failed', null),
      ],
    );
    expect(rows.map(({ title, dates, labels }) => ({ title, dates, labels }))).toEqual([
      {
        title: 'a.csv (3 rows, imported 2026-12-01 08:30)',
        dates: '2026-09-20 – 2026-10-02',
        labels: 'alloy 2, Ni@Pt 1',
      },
      { title: 'pasted table (1 row, imported 2026-12-02 09:15)', dates: null, labels: 'failed 1' },
    ]);
    expect(removeQuestion(rows[0] as (typeof rows)[number])).toMatch(/^Remove a\.csv and its 3 outcomes/);
  });
});
