/**
 * Every input a batch-design message can name exists on the form: the inputs the model places errors on
 * (BATCH_FORM_INPUTS) are each rendered by a section of the form, and every field the design model and its
 * contract refuse (the `invalid('…')` fields in shared-model/recipes/design and the contract) lands on one of them or,
 * for the few the form never sends, is listed below with the reason. Read from the sources, so a new message
 * on a new field fails here until the form shows it.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  BATCH_FORM_INPUTS,
  EXAMPLE_BATCH_FORM,
  inputForField,
} from '../../../renderer/src/views/batch-design/batch-form';

const root = join(import.meta.dirname, '../../..');
const read = (path: string) => readFileSync(join(root, path), 'utf8');
const filesIn = (dir: string, pattern: RegExp) =>
  readdirSync(join(root, dir))
    .filter((f) => pattern.test(f))
    .map((f) => `${dir}/${f}`);

/** Input names the form's sections render (`name="…"`, `name={'…'}`, `name={`precursor${slot}`}` for A and B). */
function renderedInputs(): Set<string> {
  const names = new Set<string>();
  for (const file of filesIn('renderer/src/views/batch-design', /\.tsx$/)) {
    const text = read(file);
    for (const m of text.matchAll(/name=(?:"([^"]+)"|\{'([^']+)'\})/g)) names.add(m[1] ?? m[2] ?? '');
    for (const m of text.matchAll(/name=\{`([a-zA-Z.]+)\$\{slot\}`\}/g))
      ['A', 'B'].forEach((s) => names.add(`${m[1]}${s}`));
    for (const m of text.matchAll(/data-error-for="([^"]+)"/g)) names.add(m[1] ?? '');
  }
  return names;
}

/** Literal fields the recipes model refuses: invalid('field', …), including `cond ? 'a' : 'b'`. */
function refusedFields(): string[] {
  const files = [...filesIn('shared-model/recipes/design', /\.ts$/), 'shared-model/recipes/design-input.ts'];
  const fields = new Set<string>();
  for (const file of files) {
    const text = read(file);
    for (const m of text.matchAll(/invalid\(\s*'([^']+)'/g)) fields.add(m[1] ?? '');
    for (const m of text.matchAll(/throw invalid\(\s*([a-z.]+) \? '([^']+)' : '([^']+)'/g)) {
      fields.add(m[2] ?? '');
      fields.add(m[3] ?? '');
    }
  }
  return [...fields].sort();
}

/** Fields the form never sends, so no message about them reaches it (each shown above the actions if it did). */
const NOT_SENT_BY_THE_FORM: Record<string, string> = {
  now: 'the time of a stock-age check is the service’s clock, not typed',
  seeds: 'in seed-mediated mode the form always sends the seeds',
};

describe('every input a batch-design message names is on the form', () => {
  it('each input errors are placed on is rendered by a section', () => {
    const rendered = renderedInputs();
    const missing = [...BATCH_FORM_INPUTS].filter((name) => !rendered.has(name));
    expect(missing).toEqual([]);
  });

  it('each field the model and contract refuse lands on a rendered input', () => {
    const refused = refusedFields();
    // the search reads the sources: it must find the messages this test is about
    expect(refused).toEqual(expect.arrayContaining(['capping.molPerMolMetal', 'reducer', 'seeds.particlesPerMl']));
    const unplaced = refused.filter(
      (field) => !(field in NOT_SENT_BY_THE_FORM) && !BATCH_FORM_INPUTS.has(inputForField(field, EXAMPLE_BATCH_FORM)),
    );
    expect(unplaced).toEqual([]);
  });

  it('no message of the model names an API path instead of the input (e.g. "give latticeNm.Fe")', () => {
    const files = [...filesIn('shared-model/recipes/design', /\.ts$/), 'shared-model/recipes/design-input.ts'];
    const offending: string[] = [];
    for (const file of files) {
      for (const m of read(file).matchAll(/(?:invalid\([^,]+,|message:)\s*([`'"][^\n]*)/g)) {
        // interpolated values (`${seeds.metal}`) are the user's values, not names of fields
        const text = (m[1] ?? '').replace(/\$\{[^}]*\}/g, '…');
        if (/\b(?:latticeNm|seeds\.[a-zA-Z]+|size\.[a-zA-Z]+|capping\.[a-zA-Z]+|reducer\.[a-zA-Z]+)\b/.test(text)) {
          offending.push(`${file}: ${text}`);
        }
      }
    }
    expect(offending).toEqual([]);
  });
});
