/**
 * The batch-design form's model without a browser: typed text → `batches.design` request (decimal commas,
 * at.% typed and x_B sent, the input at fault named), errors placed beside the input that shows them, and
 * the form changes other parts of the view make.
 */
import { describe, expect, it } from 'vitest';
import { validateInput } from '../../../shared-model/api/validate';
import {
  EXAMPLE_BATCH_FORM,
  computeFailureText,
  growOnSeeds,
  inputForField,
  placeError,
  precursorFor,
  readBatchForm,
  reducerExcessHint,
  withPair,
  withReducer,
  withRoute,
  type BatchFormState,
} from '../../../renderer/src/views/batch-design/batch-form';
import { seededCatalog } from '../../support/design-stages';
import { ptNi } from '../../support/sample-batches';

const read = (change: Partial<BatchFormState> = {}) => readBatchForm({ ...EXAMPLE_BATCH_FORM, ...change });
const requestOf = (change: Partial<BatchFormState> = {}) => {
  const reading = read(change);
  if (!reading.ok) throw new Error(`form refused: ${reading.field}: ${reading.message}`);
  return reading.request;
};

describe('reading the form', () => {
  it('the example is the hand-worked Pt75Ni25 batch: 25 at.% typed, x_B = 0.25 sent', () => {
    expect(requestOf()).toEqual(ptNi);
    expect(validateInput('batches.design', requestOf()).ok).toBe(true);
  });

  it('reads decimal commas and scientific notation', () => {
    const request = requestOf({
      compositionPct: '33,3',
      diameterNm: '4,5',
      amountKind: 'particle-concentration',
      amountValue: '1,5e13',
    });
    expect(request.size).toEqual({ kind: 'alloy', diameterNm: 4.5, xB: 33.3 / 100 });
    expect(request.amount).toEqual({ kind: 'particle-concentration', particlesPerMl: 1.5e13 });
  });

  it.each<[string, Partial<BatchFormState>, string, string]>([
    ['a composition that is no number', { compositionPct: 'abc' }, 'size.xB', 'composition (at.% Ni): "abc" is not a'],
    ['thousands separators', { amountValue: '1,234.5' }, 'amount', 'total metal (mmol): "1,234.5" has more than one'],
    ['an empty batch volume', { batchVolumeMl: ' ' }, 'batchVolumeMl', 'batch volume (mL): enter a number'],
    ['a bad stock', { stockB: '2O' }, 'stockB', 'Ni stock (mM): "2O" is not a number'],
    ['a bad temperature', { temperatureC: '25 °C' }, 'temperatureC', 'highest temperature (°C): "25 °C" is not a'],
    ['capping without a ratio', { cappingKey: 'pvp' }, 'capping.molPerMolMetal', 'capping (mol per mol metal): enter'],
  ])('%s is refused at its input', (_label, change, field, message) => {
    const reading = read(change);
    expect(reading).toMatchObject({ ok: false, field });
    expect(reading.ok ? '' : reading.message).toContain(message);
  });

  it('leaves ranges to the contract, whose error lands on the composition input', () => {
    const request = requestOf({ compositionPct: '120' });
    expect(request.size).toEqual({ kind: 'alloy', diameterNm: 4, xB: 1.2 });
    const checked = validateInput('batches.design', request);
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    const placed = placeError(checked.error, EXAMPLE_BATCH_FORM);
    expect(placed.field).toBe('size.xB');
    expect(placed.message).toMatch(/0 and 100 at\.%/);
  });

  it('core-shell sizes: monolayers or nm, the core optional; overall diameter with a shell in nm', () => {
    expect(requestOf({ sizeKind: 'core-shell', shellValue: '2', coreDiameterNm: '' }).size).toEqual({
      kind: 'core-shell',
      shellMonolayers: 2,
    });
    const inNm = { sizeKind: 'core-shell', shellValue: '0,5', shellUnit: 'nm', coreDiameterNm: '3' } as const;
    expect(requestOf(inNm).size).toEqual({
      kind: 'core-shell',
      coreDiameterNm: 3,
      shellThicknessNm: 0.5,
    });
    expect(requestOf({ sizeKind: 'core-shell-overall', diameterNm: '6', shellValue: '1' }).size).toEqual({
      kind: 'core-shell-overall',
      diameterNm: 6,
      shellThicknessNm: 1,
    });
  });

  it('a single-metal batch lists only that metal’s precursor', () => {
    const request = requestOf({ sizeKind: 'single-metal', singleElement: 'Ni' });
    expect(request.size).toEqual({ kind: 'single-metal', element: 'Ni', diameterNm: 4 });
    expect(request.precursors).toEqual([{ element: 'Ni', reagentKey: 'nicl2-6h2o', stockMm: 20 }]);
  });

  it('typed seeds: metal, diameter, concentration as metal mM, and only the shell precursor', () => {
    const form = {
      ...withRoute({ ...EXAMPLE_BATCH_FORM, elementA: 'Ag', elementB: 'Au', target: 'Ag@Au' }, 'seed-mediated'),
      shellValue: '2',
      seedDiameterNm: '20',
      seedConcKind: 'metal' as const,
      seedConc: '0,5',
      seedVolumeMl: '5',
      precursorB: 'haucl4-3h2o',
      stockB: '10',
    };
    const reading = readBatchForm(form);
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    expect(reading.request.size).toEqual({ kind: 'core-shell', shellMonolayers: 2 });
    expect(reading.request.seeds).toEqual({ metal: 'Ag', diameterNm: 20, metalMm: 0.5, volumeMl: 5 });
    expect(reading.request.amount).toBeUndefined();
    expect(reading.request.precursors).toEqual([{ element: 'Au', reagentKey: 'haucl4-3h2o', stockMm: 10 }]);
  });

  it('growing on a saved batch: its id, two monolayers and 5 mL by default; typed seed values are not read', () => {
    const grown = growOnSeeds(EXAMPLE_BATCH_FORM, { id: 3, elementA: 'Au', elementB: 'Pt' }, 'Au');
    const form = { ...grown, seedDiameterNm: 'x' };
    expect(form).toMatchObject({ route: 'seed-mediated', sizeKind: 'core-shell', seedBatchId: '3', shellValue: '2' });
    const reading = readBatchForm(form);
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    expect(reading.request.seeds).toEqual({ metal: 'Au', volumeMl: 5, seedBatchId: 3 });
    expect(reading.request.precursors.map((p) => p.element)).toEqual(['Pt']);
  });
});

describe('placing errors', () => {
  it.each<[string, string]>([
    ['design.size.xB', 'size.xB'],
    ['amount.totalMetalMmol', 'amount'],
    ['size.shellMonolayers', 'shell'],
    ['seeds.metalMm', 'seeds.particlesPerMl'],
    ['precursors.1.reagentKey', 'precursorB'],
    ['design.precursors.0.stockMm', 'stockA'],
    ['reducer.reagentKey', 'reducer'],
    ['capping.concentrationMm', 'capping.molPerMolMetal'],
    ['solvent.reagentKey', 'solvent'],
  ])('%s → %s', (field, input) => {
    expect(inputForField(field, EXAMPLE_BATCH_FORM)).toBe(input);
    expect(placeError({ code: 'invalid_input', message: 'm', field }, EXAMPLE_BATCH_FORM).field).toBe(input);
  });

  it('an error no input shows keeps its message and loses its field (shown above the form)', () => {
    const error = { code: 'invalid_input', message: 'no lattice constant for Fe', field: 'latticeNm.Fe' } as const;
    const placed = placeError(error, EXAMPLE_BATCH_FORM);
    expect(placed).toEqual({ code: 'invalid_input', message: 'no lattice constant for Fe' });
  });
});

describe('switching the pair', () => {
  const precursorsOf = (form: BatchFormState) =>
    [form.precursorA, form.precursorB].map((key) => seededCatalog.find((r) => r.key === key)?.metal?.symbol);

  it('the precursors become precursors of the new metals (Pt–Ni → Au–Pd)', () => {
    const form = withPair(EXAMPLE_BATCH_FORM, { elementA: 'Au', elementB: 'Pd' }, seededCatalog);
    expect(form).toMatchObject({ elementA: 'Au', elementB: 'Pd' });
    expect(precursorsOf(form)).toEqual(['Au', 'Pd']);
    // the request is valid for the new pair as it stands
    const reading = readBatchForm(form);
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    expect(reading.request.precursors.map((p) => p.element)).toEqual(['Au', 'Pd']);
  });

  it('a precursor of a metal kept stays as chosen; a metal without one in the catalog gets none', () => {
    const keptA = withPair(EXAMPLE_BATCH_FORM, { elementB: 'Au' }, seededCatalog);
    expect(keptA.precursorA).toBe('h2ptcl6-6h2o');
    expect(precursorsOf(keptA)).toEqual(['Pt', 'Au']);
    expect(precursorFor('Pt', 'nicl2-6h2o', seededCatalog)).not.toBe('nicl2-6h2o');
    expect(precursorFor('Xx', 'nicl2-6h2o', seededCatalog)).toBe('');
  });

  it('a new precursor suits the route: a water-soluble salt in water, an acetylacetonate in organic solvent', () => {
    // the catalog lists Pd(acac)2 before Na2PdCl4 (shared-model/recipes/reagent-seed.ts); acac salts do not
    // dissolve in water (common practice)
    expect(precursorFor('Pd', '', seededCatalog, 'co-reduction')).toBe('na2pdcl4');
    expect(precursorFor('Pd', '', seededCatalog, 'organic')).toBe('pd-acac2');
    const organic = withPair({ ...EXAMPLE_BATCH_FORM, route: 'organic' }, { elementB: 'Pd' }, seededCatalog);
    expect(organic.precursorB).toBe('pd-acac2');
  });

  it('a core@shell target, single metal or seed metal of the old pair falls back to the new pair', () => {
    const old = { ...EXAMPLE_BATCH_FORM, target: 'Pt@Ni', singleElement: 'Ni', seedMetal: 'Ni' };
    const form = withPair(old, { elementA: 'Au', elementB: 'Pd' }, seededCatalog);
    expect(form).toMatchObject({ target: 'alloy', singleElement: 'Au', seedMetal: '' });
    // a campaign pair brings its own target
    expect(withPair(old, { elementA: 'Au', elementB: 'Pt', target: 'Au@Pt' }, seededCatalog).target).toBe('Au@Pt');
    expect(withPair({ ...old, target: 'Janus' }, { elementB: 'Au' }, seededCatalog).target).toBe('Janus');
  });

  it('growing on a saved Au–Pt batch offers a Pt precursor for the shell, not the example’s Ni salt', () => {
    const grown = withPair(
      growOnSeeds(EXAMPLE_BATCH_FORM, { id: 3, elementA: 'Au', elementB: 'Pt' }, 'Au'),
      {},
      seededCatalog,
    );
    const reading = readBatchForm(grown);
    expect(reading.ok).toBe(true);
    if (!reading.ok) return;
    const [shell] = reading.request.precursors;
    expect(shell?.element).toBe('Pt');
    expect(seededCatalog.find((r) => r.key === shell?.reagentKey)?.metal?.symbol).toBe('Pt');
  });
});

describe('capping amount as final mM', () => {
  it('the form offers both ways the contract takes: per mol of metal, or final concentration (mM)', () => {
    const perMetal = requestOf({ cappingKey: 'pvp', cappingRatio: '10', cappingStock: '100' });
    expect(perMetal.capping).toEqual({ reagentKey: 'pvp', molPerMolMetal: 10, stockMm: 100 });
    const finalMm = requestOf({ cappingKey: 'ctab', cappingAmountKind: 'final-mM', cappingRatio: '0,5' });
    expect(finalMm.capping).toEqual({ reagentKey: 'ctab', concentrationMm: 0.5 });
    expect(validateInput('batches.design', finalMm).ok).toBe(true);
    const empty = read({ cappingKey: 'ctab', cappingAmountKind: 'final-mM' });
    expect(empty).toMatchObject({ ok: false, field: 'capping.molPerMolMetal' });
    expect(empty.ok ? '' : empty.message).toContain('capping final concentration (mM)');
  });
});

describe('the reducer excess', () => {
  const nabh4 = seededCatalog.find((r) => r.key === 'nabh4');
  it('the field says what is assumed when left empty (NaBH4: several-fold, common practice)', () => {
    expect(reducerExcessHint(nabh4)).toMatch(/^empty: 5× assumed — borohydride hydrolyses in water/);
    expect(reducerExcessHint(nabh4)).toContain('common practice');
    expect(reducerExcessHint({ name: 'My reducer', reducerHalfReactionId: null })).toMatch(
      /^empty: 1× assumed — no common-practice excess is known for My reducer/,
    );
    expect(reducerExcessHint(undefined)).toBeNull();
  });
  it('a new reducer clears the excess typed for the old one; the same reducer keeps it', () => {
    expect(withReducer(EXAMPLE_BATCH_FORM, 'ascorbic-acid')).toMatchObject({
      reducerKey: 'ascorbic-acid',
      reducerExcess: '',
    });
    expect(withReducer(EXAMPLE_BATCH_FORM, 'nabh4')).toBe(EXAMPLE_BATCH_FORM);
    const request = requestOf({ reducerExcess: '' });
    expect(request.reducer).toEqual({ reagentKey: 'nabh4', stockMm: 100 });
  });
});

describe('a failed compute', () => {
  it('says so in the result pane, with where the input at fault is', () => {
    const error = { code: 'invalid_input', message: 'choose a Pd precursor', field: 'precursorB' } as const;
    expect(computeFailureText(error)).toBe(
      'Not computed: choose a Pd precursor. The input at fault is marked in the form.',
    );
    expect(computeFailureText({ code: 'internal', message: 'the store is closed' })).toBe(
      'Not computed: the store is closed.',
    );
  });
});
