/**
 * Property-based fuzzing of every file reader (fast-check, seeded, fixed counts): the TEM diameter CSV, the EDX
 * line-scan CSV, the history table and extended XYZ. Each gets RUNS_PER_READER texts (2,000 with CI=true, 200
 * otherwise): near-valid edits of a valid file (lines dropped, doubled, swapped or replaced; cells replaced by
 * arbitrary or edge text; delimiters, decimal marks, line ends, quotes and byte-order marks changed), tables of
 * arbitrary cells, and arbitrary text. Each reader either reads the text or refuses it with a DomainError that
 * names its field, and a refusal of a row names the line; nothing else is thrown, each read within 2 s.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { parseDiameterCsv, parseLineScanCsv } from '../../shared-model/characterization/csv-import';
import { DomainError } from '../../shared-model/api/result';
import { parseHistoryTable } from '../../shared-model/learn/history-table';
import { readExtendedXyz } from '../../shared-model/montecarlo/extended-xyz';
import { TIMEOUTS } from '../support/timeouts';
import { lineScanCsvText, sizeCsvText } from './fuzz/fixture';
import { BASE_SEED, CALL_BUDGET_MS, seedOf } from './fuzz/harness';

const RUNS_PER_READER = Number(process.env.FUZZ_RUNS ?? (process.env.CI === 'true' ? 2000 : 200));

/** A 13-atom Au-Pd cuboctahedron (nearest-neighbour distance 2.88 Å) in extended XYZ. */
function xyzText(): string {
  const d = 2.88 / Math.SQRT2;
  const sites: [number, number, number][] = [[0, 0, 0]];
  for (const [a, b] of [
    [1, 1],
    [1, -1],
    [-1, 1],
    [-1, -1],
  ] as const) {
    sites.push([a * d, b * d, 0], [a * d, 0, b * d], [0, a * d, b * d]);
  }
  const lines = sites.map(
    ([x, y, z], i) => `${i % 3 === 0 ? 'Pd' : 'Au'} ${x.toFixed(5)} ${y.toFixed(5)} ${z.toFixed(5)}`,
  );
  return `${sites.length}\nProperties=species:S:1:pos:R:3 pbc="F F F"\n${lines.join('\n')}\n`;
}

const historyCsv = readFileSync(join(import.meta.dirname, '../../docs/demo-history.csv'), 'utf8');

const cell = fc.oneof(
  fc.constantFrom(
    '',
    ' ',
    '0',
    '-1',
    '1e999',
    'NaN',
    '1,5',
    '3.2',
    '"',
    '""',
    '\u0000',
    'Pt-Ni',
    'alloy',
    '2026-13-01',
    '∞',
  ),
  fc.double().map(String),
  fc.string({ maxLength: 12 }),
);
const arbitraryTable = fc
  .tuple(
    fc.constantFrom(',', ';', '\t', ' ', '|'),
    fc.constantFrom('\n', '\r\n', '\r'),
    fc.array(fc.array(cell, { minLength: 1, maxLength: 8 }), { minLength: 0, maxLength: 40 }),
  )
  .map(([delimiter, eol, rows]) => rows.map((r) => r.join(delimiter)).join(eol));

type LineEdit = (lines: string[], pick: number, text: string) => string[];
const LINE_EDITS: LineEdit[] = [
  (l, p) => l.filter((_, i) => i !== p % l.length),
  (l, p) => [...l.slice(0, p % l.length), l[p % l.length] ?? '', ...l.slice(p % l.length)],
  (l, p, t) => l.map((line, i) => (i === p % l.length ? t : line)),
  (l, p, t) =>
    l.map((line, i) => {
      if (i !== p % l.length) return line;
      const cells = line.split(/([,;\t ]+)/);
      cells[(p >> 3) % cells.length] = t;
      return cells.join('');
    }),
  (l) => l.map((line) => line.replace(/,/g, ';')),
  (l) => l.map((line) => line.replace(/\./g, ',')),
  (l) => l.map((line) => line.replace(/[ ,]/g, '\t')),
  (l, p) => l.slice(0, (p % l.length) + 1),
  (l, _p, t) => [t, ...l],
  (l) => ['\uFEFF' + (l[0] ?? ''), ...l.slice(1)],
  (l, p) => l.map((line, i) => (i === p % l.length ? `"${line}` : line)),
  (l) => [...l].reverse(),
  (l, p) => {
    const copy = [...l];
    const i = p % copy.length;
    const j = (p >> 4) % copy.length;
    [copy[i], copy[j]] = [copy[j] ?? '', copy[i] ?? ''];
    return copy;
  },
  (l) => l.map((line) => line.replace(/\d+/g, (d) => d.repeat(40))),
  (l, p) => l.concat(Array.from({ length: p % 500 }, (_, i) => l[1 + (i % Math.max(1, l.length - 1))] ?? '')),
  (l) => l.map((line) => line.toUpperCase()),
];
const editText = fc.oneof(cell, fc.string({ maxLength: 40 }), fc.constantFrom('1e308', '-0', '0.00', '5e-324'));

function nearValidText(valid: string): fc.Arbitrary<string> {
  return fc
    .tuple(
      fc.array(fc.tuple(fc.nat({ max: LINE_EDITS.length - 1 }), fc.nat(), editText), { minLength: 1, maxLength: 3 }),
      fc.constantFrom('\n', '\r\n', '\r'),
    )
    .map(([edits, eol]) => {
      let lines = valid.replace(/\n$/, '').split('\n');
      for (const [which, pick, text] of edits) lines = LINE_EDITS[which]!(lines, pick, text);
      return lines.join(eol);
    });
}

function texts(valid: string): fc.Arbitrary<string> {
  return fc.oneof(
    { arbitrary: nearValidText(valid), weight: 6 },
    { arbitrary: arbitraryTable, weight: 2 },
    { arbitrary: fc.string({ maxLength: 200, unit: 'binary' }), weight: 1 },
    { arbitrary: fc.constant(valid), weight: 1 },
  );
}

interface ReaderCase {
  name: string;
  valid: string;
  read: (text: string) => unknown;
  field: string;
}

const READERS: ReaderCase[] = [
  { name: 'TEM diameter CSV', valid: sizeCsvText(), read: (t) => parseDiameterCsv(t), field: 'csvText' },
  {
    name: 'EDX line-scan CSV',
    valid: lineScanCsvText(),
    read: (t) => parseLineScanCsv(t, { elementA: 'Au', elementB: 'Pd' }),
    field: 'csvText',
  },
  { name: 'history table', valid: historyCsv, read: (t) => parseHistoryTable(t), field: 'csvText' },
  { name: 'extended XYZ', valid: xyzText(), read: (t) => readExtendedXyz(t), field: 'xyz' },
];

/** A refusal that is about one row of the file says which line. */
const ROW_WORDS = /\b(value|cell|diameter|position|atom line|row)\b/i;
const NAMES_LINE = /\b(line|lines|row|column)s?\s+\d/i;

const totals = { readers: 0, read: 0, refused: 0 };
afterAll(() => {
  if (totals.readers === 0) return;
  console.log(
    `[fuzz readers] ${totals.read + totals.refused} texts over ${totals.readers} readers: ${totals.read} read, ` +
      `${totals.refused} refused with a field message, 0 other errors`,
  );
});

describe(`every file reader, ${RUNS_PER_READER} generated texts each (seed ${BASE_SEED})`, () => {
  for (const reader of READERS) {
    it(
      reader.name,
      () => {
        expect(() => reader.read(reader.valid)).not.toThrow();
        const tally = { read: 0, refused: 0 };
        fc.assert(
          fc.property(texts(reader.valid), (text) => {
            const started = performance.now();
            try {
              reader.read(text);
              tally.read++;
            } catch (error) {
              if (!(error instanceof DomainError)) throw error;
              tally.refused++;
              if (error.code !== 'invalid_input') throw new Error(`refused as ${error.code}: ${error.message}`);
              if (!error.field) throw new Error(`the refusal "${error.message}" names no field`);
              if (ROW_WORDS.test(error.message) && /"/.test(error.message) && !NAMES_LINE.test(error.message))
                throw new Error(`the refusal "${error.message}" quotes a value but names no line`);
            }
            const ms = performance.now() - started;
            if (ms > CALL_BUDGET_MS)
              throw new Error(`${reader.name}: ${ms.toFixed(0)} ms on a ${text.length}-character text`);
          }),
          { seed: seedOf(reader.name), numRuns: RUNS_PER_READER, endOnFailure: true },
        );
        console.log(`${reader.name}: ${RUNS_PER_READER} texts, ${tally.read} read, ${tally.refused} refused`);
        expect(tally.read + tally.refused).toBe(RUNS_PER_READER);
        totals.readers++;
        totals.read += tally.read;
        totals.refused += tally.refused;
      },
      TIMEOUTS.fuzzOperationMs,
    );
  }
});
