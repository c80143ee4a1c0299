/**
 * Reads a history table (a group's spreadsheet of past syntheses) into outcome rows. Header row required;
 * columns (any order, names case-insensitive): pair ("Pt-Ni"), xB_at_pct (at.% of the second element),
 * diameter_nm, temperature_k, route (co-reduction | seed-mediated | polyol | oleylamine), observed (an
 * architecture label as Pairwright writes it, or "failed"), and optional made_on (ISO date) and notes.
 * Delimiter and decimal commas as shared-model/characterization/csv-table.ts reads them (a semicolon or tab
 * file may use decimal commas). All rows or none: every bad cell is reported with its line, column and value.
 */
import { DomainError } from '../api/result';
import { splitPair } from '../api/schemas';
import { parseArchitecture } from '../architecture/labels';
import { readCsvTable, parseNumberField, type CsvTable } from '../characterization/csv-table';
import { isMetalSymbol } from '../elements/symbols';
import type { SynthesisRoute } from '../recipes/design-input';

export const HISTORY_COLUMNS = [
  'pair',
  'xB_at_pct',
  'diameter_nm',
  'temperature_k',
  'route',
  'observed',
  'made_on',
  'notes',
] as const;
const REQUIRED = ['pair', 'xB_at_pct', 'diameter_nm', 'temperature_k', 'route', 'observed'] as const;

/** Route words of the table → Pairwright's routes ("oleylamine" is the organic-solvent route). */
export const HISTORY_ROUTE_WORDS: Readonly<Record<string, SynthesisRoute>> = {
  'co-reduction': 'co-reduction',
  'seed-mediated': 'seed-mediated',
  polyol: 'polyol',
  oleylamine: 'organic',
  organic: 'organic',
};

export const HISTORY_LABELS = [
  'alloy',
  'surface-enriched alloy',
  'A@B (e.g. Ni@Pt)',
  'Janus',
  'intermetallic',
  'hollow',
  'other',
  'failed',
] as const;

export interface HistoryRow {
  /** Line in the file. */
  line: number;
  elementA: string;
  elementB: string;
  xB: number;
  diameterNm: number;
  temperatureK: number;
  route: SynthesisRoute;
  /** The label as the app writes it, or "failed". */
  observed: string;
  madeOn: string | null;
  notes: string;
}

export interface HistoryTable {
  rows: HistoryRow[];
  notes: string[];
  /** Fingerprint of the rows' content (same table imported twice → same fingerprint). */
  fingerprint: string;
}

const MAX_ERRORS = 12;

function fnv1a64(text: string): string {
  let h1 = 0x811c9dc5;
  let h2 = 0x01000193;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    h1 = Math.imul(h1 ^ c, 0x01000193) >>> 0;
    h2 = Math.imul(h2 ^ c, 0x0100019d) >>> 0;
  }
  return h1.toString(16).padStart(8, '0') + h2.toString(16).padStart(8, '0');
}

function isIsoDate(text: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(text)) return false;
  const d = new Date(`${text}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === text;
}

function normaliseLabel(raw: string, a: string, b: string): string | null {
  if (raw.toLowerCase() === 'failed') return 'failed';
  const parsed = parseArchitecture(raw, [a, b]);
  if (!parsed || parsed.kind === 'unknown') return null;
  return parsed.kind === 'core@shell' ? `${parsed.core}@${parsed.shell}` : parsed.kind;
}

export function parseHistoryTable(text: string, field = 'csvText'): HistoryTable {
  const table: CsvTable = readCsvTable(text, { field });
  if (!table.header)
    throw new DomainError(
      'invalid_input',
      `the table needs a header row naming the columns ${REQUIRED.join(', ')}`,
      field,
    );
  const header = table.header.map((h) => h.trim().toLowerCase());
  const index = new Map<string, number>();
  for (const name of HISTORY_COLUMNS) {
    const i = header.indexOf(name.toLowerCase());
    if (i >= 0) index.set(name, i);
  }
  const missing = REQUIRED.filter((c) => !index.has(c));
  if (missing.length > 0)
    throw new DomainError(
      'invalid_input',
      `line 1: missing column${missing.length > 1 ? 's' : ''} ${missing.join(', ')} ` +
        `(the header has ${table.header.join(', ')})`,
      field,
    );
  if (table.rows.length === 0) throw new DomainError('invalid_input', 'the table has a header but no rows', field);
  const errors: string[] = [];
  const rows: HistoryRow[] = [];
  const cell = (fields: string[], name: string): string =>
    index.has(name) ? (fields[index.get(name) as number] ?? '').trim() : '';
  for (const row of table.rows) {
    const bad = (column: string, value: string, why: string) =>
      errors.push(`line ${row.line}, column ${column}, value "${value}": ${why}`);
    const before = errors.length;
    const pairText = cell(row.fields, 'pair');
    const parts = splitPair(pairText);
    let a = '';
    let b = '';
    if (!parts) bad('pair', pairText, 'write the pair as two element symbols joined by "-", e.g. Pt-Ni');
    else {
      [a, b] = parts;
      if (!isMetalSymbol(a)) bad('pair', pairText, `unknown element "${a}"`);
      else if (!isMetalSymbol(b)) bad('pair', pairText, `unknown element "${b}"`);
      else if (a === b) bad('pair', pairText, 'a pair needs two different elements');
    }
    const number = (name: string, check: (v: number) => string | null): number => {
      const raw = cell(row.fields, name);
      const v = parseNumberField(raw, table.decimalComma);
      if (v === null) {
        bad(name, raw, raw === '' ? 'no value' : 'not a number');
        return NaN;
      }
      const why = check(v);
      if (why) bad(name, raw, why);
      return v;
    };
    const xPct = number('xB_at_pct', (v) =>
      v > 0 && v < 100 ? null : 'composition must lie strictly between 0 and 100 at.%',
    );
    const diameterNm = number('diameter_nm', (v) =>
      v > 0 && v <= 1000 ? null : 'diameter must be above 0 and at most 1000 nm',
    );
    const temperatureK = number('temperature_k', (v) =>
      v > 0 && v <= 2000 ? null : 'temperature must be above 0 and at most 2000 K',
    );
    const routeRaw = cell(row.fields, 'route');
    const route = HISTORY_ROUTE_WORDS[routeRaw.toLowerCase()];
    if (!route) bad('route', routeRaw, 'route must be co-reduction, seed-mediated, polyol or oleylamine');
    const observedRaw = cell(row.fields, 'observed');
    let observed: string | null = null;
    if (a && b && errors.length === before) {
      observed = normaliseLabel(observedRaw, a, b);
      if (observed === null) {
        const cs = /^([A-Za-z]{1,2})\s*@\s*([A-Za-z]{1,2})$/.exec(observedRaw);
        bad(
          'observed',
          observedRaw,
          cs
            ? `the label names a metal not in the pair ${a}-${b}`
            : `label must be one of ${HISTORY_LABELS.join(', ')}`,
        );
      }
    } else if (observedRaw === '') bad('observed', observedRaw, 'no value');
    const madeOnRaw = cell(row.fields, 'made_on');
    if (madeOnRaw !== '' && !isIsoDate(madeOnRaw)) bad('made_on', madeOnRaw, 'date must be an ISO date (YYYY-MM-DD)');
    if (errors.length === before && route && observed) {
      rows.push({
        line: row.line,
        elementA: a,
        elementB: b,
        xB: xPct / 100,
        diameterNm,
        temperatureK,
        route,
        observed,
        madeOn: madeOnRaw === '' ? null : madeOnRaw,
        notes: cell(row.fields, 'notes'),
      });
    }
    if (errors.length >= MAX_ERRORS) break;
  }
  if (errors.length > 0) {
    const more = errors.length >= MAX_ERRORS ? ' (first errors only)' : '';
    throw new DomainError('invalid_input', `nothing imported: ${errors.join('; ')}${more}`, field);
  }
  const canonicalText = rows
    .map((r) =>
      [r.elementA, r.elementB, r.xB, r.diameterNm, r.temperatureK, r.route, r.observed, r.madeOn ?? '', r.notes].join(
        '|',
      ),
    )
    .join('\n');
  return { rows, notes: table.notes, fingerprint: fnv1a64(canonicalText) };
}
