/**
 * The Reagents view's form models without a browser: the catalog editor's text → a reagent the contract
 * accepts (numbers through the one reader, the input at fault named; a revision keeps the entry's other
 * roles and settings), and the inventory amount.
 */
import { describe, expect, it } from 'vitest';
import { validateInput } from '../../../shared-model/api/validate';
import { readInventoryForm, EMPTY_INVENTORY_FORM } from '../../../renderer/src/views/reagents/inventory-form';
import { EMPTY_REAGENT, fromCatalog, readReagentForm } from '../../../renderer/src/views/reagents/reagent-form';
import type { CatalogReagent } from '../../../shared-model/api/batches';

const k2pdcl4 = {
  ...EMPTY_REAGENT,
  key: 'k2pdcl4',
  name: 'Potassium tetrachloropalladate',
  formula: 'K2PdCl4',
  assayWtPct: '99,5',
  metalSymbol: 'Pd',
  oxidationState: '2',
  coupleId: 'PdCl4/Pd',
  hCodes: 'H302, H317',
  signalWord: 'Warning',
  tags: 'oxidizer',
};

describe('catalog reagent form', () => {
  it('reads a new reagent that the contract accepts (decimal comma in the assay)', () => {
    const reading = readReagentForm(k2pdcl4, null);
    if (!reading.ok) throw new Error(reading.error.message);
    expect(reading.value).toMatchObject({
      key: 'k2pdcl4',
      roles: ['metal-precursor'],
      assayWtPct: 99.5,
      densityGPerMl: null,
      metal: { symbol: 'Pd', oxidationState: 2, coupleId: 'PdCl4/Pd' },
      hCodes: ['H302', 'H317'],
      tags: ['oxidizer'],
      signalWord: 'Warning',
    });
    expect(validateInput('reagents.add', reading.value)).toMatchObject({ ok: true });
  });

  it('names the input whose text is not a number', () => {
    expect(readReagentForm({ ...k2pdcl4, assayWtPct: '' }, null)).toMatchObject({
      ok: false,
      error: { field: 'assayWtPct', message: 'assay, wt %: enter a number' },
    });
    expect(readReagentForm({ ...k2pdcl4, densityGPerMl: '1.2.3' }, null)).toMatchObject({
      ok: false,
      error: { field: 'densityGPerMl' },
    });
    expect(readReagentForm({ ...k2pdcl4, oxidationState: 'II' }, null)).toEqual({
      ok: false,
      error: { code: 'invalid_input', field: 'oxidationState', message: 'oxidation state: "II" is not a number' },
    });
    // no metal: the oxidation state is not read at all
    expect(readReagentForm({ ...k2pdcl4, metalSymbol: ' ', oxidationState: 'II' }, null)).toMatchObject({ ok: true });
  });

  it('saves a revision with the chosen role first and the entry’s unedited settings kept', () => {
    const entry = {
      key: 'nabh4',
      name: 'Sodium borohydride',
      formula: 'NaBH4',
      roles: ['reducer', 'additive'],
      form: 'solid',
      assayWtPct: 98,
      densityGPerMl: null,
      metal: null,
      reducerHalfReactionId: '',
      hCodes: ['H260'],
      signalWord: 'Danger',
      tags: [],
      wasteStream: 'aqueous-inorganic',
      notes: '',
      stockFreshnessHours: 0.5,
      metalContentWtPct: null,
      amountUnitNote: null,
      source: 'seed catalog',
    } as unknown as CatalogReagent;
    const form = { ...fromCatalog(entry), role: 'additive', densityGPerMl: '1,07' };
    const reading = readReagentForm(form, entry);
    if (!reading.ok) throw new Error(reading.error.message);
    expect(reading.value).toMatchObject({
      roles: ['additive', 'reducer'],
      densityGPerMl: 1.07,
      signalWord: 'Danger',
      stockFreshnessHours: 0.5,
      source: 'seed catalog',
    });
  });
});

describe('inventory form', () => {
  it('reads the amount with a decimal comma, and names it when it is not a number', () => {
    const form = {
      ...EMPTY_INVENTORY_FORM,
      reagentKey: 'nabh4',
      amount: '2,5',
      unit: 'g' as const,
      location: 'shelf 1',
    };
    expect(readInventoryForm(form)).toEqual({
      ok: true,
      value: { reagentKey: 'nabh4', amount: 2.5, unit: 'g', location: 'shelf 1', lot: '' },
    });
    expect(readInventoryForm({ ...form, amount: '1 000' })).toMatchObject({
      ok: false,
      error: { field: 'amount', message: /^amount on hand: .*thousands separators/ },
    });
  });

  it('leaves the range to the contract: −5 g is read, and the contract refuses it naming the amount', () => {
    const reading = readInventoryForm({ ...EMPTY_INVENTORY_FORM, reagentKey: 'nabh4', amount: '-5' });
    if (!reading.ok) throw new Error(reading.error.message);
    expect(validateInput('inventory.upsert', reading.value)).toMatchObject({ ok: false, error: { field: 'amount' } });
  });
});
