/**
 * Each table has one owning repository (DEVELOPERS.md, "Repositories"): a table name may appear in the SQL of
 * its owner only. Other areas reach its rows by calling the owner's functions. This reads the repository
 * sources, takes every string that holds SQL, and fails when a table shows up outside its owner.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const REPOSITORIES = join(ROOT, 'db', 'repositories');
const MIGRATIONS = join(ROOT, 'db', 'migrations');

/** table → the repository file (in db/repositories/) that alone reads and writes it. */
const TABLE_OWNERS: Record<string, string> = {
  campaigns: 'campaigns.ts',
  pairs: 'pairs.ts',
  predictions: 'predictions.ts',
  simulation_runs: 'simulation.ts',
  reagents: 'catalog.ts',
  reagent_revisions: 'catalog.ts',
  batches: 'batches.ts',
  batch_lots: 'batches.ts',
  batch_stocks: 'batches.ts',
  batch_history: 'batch-history.ts',
  inventory: 'inventory.ts',
  outcome_size_imports: 'outcome-sizes.ts',
  outcome_diameters: 'outcome-sizes.ts',
  outcome_compositions: 'outcome-compositions.ts',
  outcome_composition_measurements: 'outcome-compositions.ts',
  outcome_line_scans: 'outcome-line-scans.ts',
  outcome_line_scan_points: 'outcome-line-scans.ts',
  outcome_observations: 'outcome-observations.ts',
  outcome_files: 'outcome-files.ts',
  settings: 'settings.ts',
  history_imports: 'learning.ts',
  history_outcomes: 'learning.ts',
  metal_prices: 'learning.ts',
  learn_models: 'learning.ts',
  learn_proposals: 'learning.ts',
};

/** A string literal is taken as SQL when it holds one of these upper-case keywords (the style of the code). */
const SQL_KEYWORD = /\b(SELECT|INSERT|UPDATE|DELETE|FROM|JOIN|INTO)\b/;

/** The text of every string and template literal in a TypeScript source that looks like SQL. */
function sqlStrings(fileName: string, source: string): string[] {
  const file = ts.createSourceFile(fileName, source, ts.ScriptTarget.Latest, false, ts.ScriptKind.TS);
  const found: string[] = [];
  const visit = (node: ts.Node): void => {
    let text: string | null = null;
    if (ts.isStringLiteral(node) || ts.isNoSubstitutionTemplateLiteral(node)) text = node.text;
    else if (ts.isTemplateExpression(node)) {
      text = [node.head.text, ...node.templateSpans.map((span) => span.literal.text)].join(' ');
    }
    if (text !== null && SQL_KEYWORD.test(text)) found.push(text);
    ts.forEachChild(node, visit);
  };
  visit(file);
  return found;
}

interface Trespass {
  file: string;
  table: string;
  owner: string;
  sql: string;
}

/** Tables named in the SQL of `file` that another repository owns. */
function trespasses(file: string, source: string, owners: Record<string, string>): Trespass[] {
  const found: Trespass[] = [];
  for (const sql of sqlStrings(file, source)) {
    for (const [table, owner] of Object.entries(owners)) {
      if (owner !== file && new RegExp(`\\b${table}\\b`).test(sql)) {
        found.push({ file, table, owner, sql: sql.replace(/\s+/g, ' ').trim() });
      }
    }
  }
  return found;
}

function migrationTables(): { table: string; migration: string }[] {
  return readdirSync(MIGRATIONS)
    .filter((name) => name.endsWith('.sql'))
    .flatMap((migration) =>
      [...readFileSync(join(MIGRATIONS, migration), 'utf8').matchAll(/CREATE TABLE (?:IF NOT EXISTS )?(\w+)/gi)].map(
        (match) => ({ table: match[1] ?? '', migration }),
      ),
    );
}

describe('each table is read and written by its owning repository only', () => {
  const files = readdirSync(REPOSITORIES).filter((name) => name.endsWith('.ts'));
  const sourceOf = (file: string) => readFileSync(join(REPOSITORIES, file), 'utf8');

  it('no repository names another repository’s table in its SQL', () => {
    const found = files.flatMap((file) => trespasses(file, sourceOf(file), TABLE_OWNERS));
    const report = found.map((t) => `${t.file} uses ${t.table} (owned by ${t.owner}): ${t.sql}`);
    expect(report).toEqual([]);
  });

  it('every table the migrations create has an owner, and every owner is a repository file', () => {
    const unowned = migrationTables()
      .filter(({ table }) => !(table in TABLE_OWNERS))
      .map(({ table, migration }) => `${table} (${migration}) has no owner: add it to TABLE_OWNERS in this test`);
    expect(unowned).toEqual([]);
    const missing = [...new Set(Object.values(TABLE_OWNERS))].filter((owner) => !files.includes(owner));
    expect(missing).toEqual([]);
  });

  it('every owner uses its tables (the map is not stale)', () => {
    const sqlByFile = new Map(files.map((file) => [file, sqlStrings(file, sourceOf(file))]));
    const unused = Object.entries(TABLE_OWNERS)
      .filter(([table, owner]) => !(sqlByFile.get(owner) ?? []).some((sql) => new RegExp(`\\b${table}\\b`).test(sql)))
      .map(([table, owner]) => `${owner} never uses ${table}`);
    expect(unused).toEqual([]);
  });

  it('the check bites: a join on another area’s table, a template query and a plain string are all caught', () => {
    const source = [
      'const A = `SELECT i.*, r.data FROM inventory i JOIN reagents r ON r.key = i.reagent_key`;',
      'const B = (id: number) => db.prepare(`${A} WHERE batch_id = ${id} AND EXISTS (SELECT 1 FROM batches)`);',
      "db.prepare('UPDATE predictions SET model_version = ?').run('x');",
      "const message = 'no batches left in predictions';", // prose, not SQL: ignored
    ].join('\n');
    const found = trespasses('inventory.ts', source, TABLE_OWNERS).map((t) => `${t.table}→${t.owner}`);
    expect(found).toEqual(['reagents→catalog.ts', 'batches→batches.ts', 'predictions→predictions.ts']);
  });
});
