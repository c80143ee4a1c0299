/** The contract validates input at the boundary and names the field at fault. */
import { describe, expect, it } from 'vitest';
import { OPERATION_NAMES, isOperationName } from '../../../shared-model/api/contract';
import { splitPair } from '../../../shared-model/api/schemas';
import { validateInput } from '../../../shared-model/api/validate';

describe('API contract', () => {
  it('lists every operation once under an area.verb name', () => {
    expect(new Set(OPERATION_NAMES).size).toBe(OPERATION_NAMES.length);
    for (const name of OPERATION_NAMES) expect(name).toMatch(/^[a-z]+\.[a-zA-Z]+$/);
    expect(isOperationName('campaigns.create')).toBe(true);
    expect(isOperationName('toString')).toBe(false);
  });

  it('trims names and refuses empty ones with the field named', () => {
    expect(validateInput('campaigns.create', { name: '  Screen  ' })).toEqual({
      ok: true,
      value: { name: 'Screen', description: '' },
    });
    const empty = validateInput('campaigns.create', { name: '   ' });
    expect(empty).toMatchObject({ ok: false, error: { code: 'invalid_input', field: 'name' } });
  });

  it('reads pairs written several ways and refuses unknown elements, A = B and nonsense', () => {
    expect(splitPair('Pt-Ni')).toEqual(['Pt', 'Ni']);
    expect(splitPair('pt–ni')).toEqual(['Pt', 'Ni']);
    expect(splitPair('PtNi')).toEqual(['Pt', 'Ni']);
    const unknown = validateInput('pairs.add', { campaignId: 1, pair: 'Pt-Xx' });
    // the element at fault is named as the field (the form shows the message under that element)
    expect(unknown).toMatchObject({ ok: false, error: { field: 'pair.elementB' } });
    if (!unknown.ok) expect(unknown.error.message).toContain('Xx');
    expect(validateInput('pairs.add', { campaignId: 1, pair: 'Pt-Pt' })).toMatchObject({
      ok: false,
      error: { field: 'pair' },
    });
    expect(validateInput('pairs.add', { campaignId: 1, pair: 42 })).toMatchObject({
      ok: false,
      error: { field: 'pair' },
    });
  });

  it('checks the target against the pair', () => {
    expect(validateInput('pairs.add', { campaignId: 1, pair: 'Pt-Ni', target: 'Ni@Pt' }).ok).toBe(true);
    expect(validateInput('pairs.add', { campaignId: 1, pair: 'Pt-Ni', target: 'janus' }).ok).toBe(true);
    expect(validateInput('pairs.add', { campaignId: 1, pair: 'Pt-Ni', target: 'Au@Pt' })).toMatchObject({
      ok: false,
      error: { field: 'target' },
    });
    expect(validateInput('pairs.add', { campaignId: 1, pair: 'Pt-Ni', target: 'hollow' })).toMatchObject({
      ok: false,
      error: { field: 'target' },
    });
  });

  it('requires confirmation to remove a pair', () => {
    expect(validateInput('pairs.remove', { id: 3 })).toMatchObject({ ok: false, error: { field: 'confirm' } });
    expect(validateInput('pairs.remove', { id: 3, confirm: true }).ok).toBe(true);
  });

  it('refuses ids that are not positive whole numbers', () => {
    for (const id of [0, -1, 1.5, '1', null, Number.NaN]) {
      expect(validateInput('pairs.list', { campaignId: id })).toMatchObject({
        ok: false,
        error: { field: 'campaignId' },
      });
    }
  });
});
