/** Refusals speak to the user: the field in words, no code path in front (house rule: messages name the field). */
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { fieldWords, keyWords, userMessage } from '../../../shared-model/api/issue-message';
import { validateInput, zodIssueToError } from '../../../shared-model/api/validate';

describe('validation messages in words', () => {
  it('asks for an empty name instead of "name: must not be empty"', () => {
    const refused = validateInput('campaigns.create', { name: '  ' });
    expect(refused).toEqual({
      ok: false,
      error: { code: 'invalid_input', message: 'Give the campaign a name', field: 'name' },
    });
  });

  it('puts the field in words in front of a predicate', () => {
    const refused = validateInput('campaigns.create', { name: 'A', description: 'x'.repeat(2001) });
    expect(refused.ok ? null : refused.error.message).toBe('The description must be at most 2000 characters');
    const id = validateInput('pairs.list', { campaignId: 1.5 });
    expect(id.ok ? null : id.error).toEqual({
      code: 'invalid_input',
      message: 'The campaign id must be a whole number',
      field: 'campaignId',
    });
  });

  it('names the element of a pair that is unknown, with the field of that element', () => {
    const second = validateInput('pairs.add', { campaignId: 1, pair: 'Pt-Xx' });
    expect(second.ok ? null : second.error.field).toBe('pair.elementB');
    expect(second.ok ? null : second.error.message).toMatch(
      /^The second element of "Pt-Xx" is not one of Pairwright's metals: unknown element "Xx"/,
    );
    const first = validateInput('pairs.add', { campaignId: 1, pair: 'Qq-Pt' });
    expect(first.ok ? null : first.error.field).toBe('pair.elementA');
    // a pair of two valid elements that is still wrong belongs to the pair as a whole
    const same = validateInput('pairs.add', { campaignId: 1, pair: 'Pt-Pt' });
    expect(same.ok ? null : same.error.field).toBe('pair');
  });

  it('turns input names into words, units written as units', () => {
    expect(keyWords('diameterNm')).toBe('diameter (nm)');
    expect(keyWords('totalMetalMm')).toBe('total metal (mM)');
    expect(keyWords('temperatureK')).toBe('temperature (K)');
    expect(keyWords('xB')).toBe('composition');
    expect(keyWords('name')).toBe('name');
    expect(fieldWords(['composition', 'measurements', 1, 'xB'])).toBe('composition of measurements entry 2');
    expect(fieldWords([])).toBe('');
  });

  it('keeps a message that is a sentence of its own, and reads bounds as "must be"', () => {
    expect(userMessage('elements', 'unknown element "Zz"; known metals: Pt Pd')).toBe(
      'unknown element "Zz"; known metals: Pt Pd',
    );
    expect(userMessage('composition', 'at most 1')).toBe('The composition must be at most 1');
    expect(userMessage('currency', 'must not be empty')).toBe('Type the currency');
    expect(userMessage('', 'give the size either as shells or as a diameter')).toBe(
      'Give the size either as shells or as a diameter',
    );
  });

  it('never starts with a code path, whatever the schema', () => {
    const schema = z.object({ probeSigmaNm: z.number().positive('must be greater than 0') });
    const parsed = schema.safeParse({ probeSigmaNm: -1 });
    if (parsed.success) throw new Error('expected a refusal');
    const error = zodIssueToError(parsed.error);
    expect(error.message).toBe('The probe width σ (nm) must be greater than 0');
    expect(error.message).not.toMatch(/^[A-Za-z.]+: /);
    expect(error.field).toBe('probeSigmaNm');
  });
});
