/**
 * The Next batches form model without a browser: the proposal and price forms into inputs the contract
 * accepts (typed numbers through the one reader, the input at fault named), metals without a price, the
 * table's words, and a proposal handed to Batch design (batch-design/plan-request.ts) read by Batch design's
 * own form reader into the request it computes.
 */
import { describe, expect, it } from 'vitest';
import type { CatalogReagent } from '../../../shared-model/api/batches';
import { validateInput } from '../../../shared-model/api/validate';
import type { Proposal } from '../../../shared-model/learn/proposals';
import { EXAMPLE_BATCH_FORM, readBatchForm } from '../../../renderer/src/views/batch-design/batch-form';
import { describePlan, formFromPlan } from '../../../renderer/src/views/batch-design/plan-request';
import {
  compositionText,
  costText,
  INITIAL_NEXT_BATCHES_FORM,
  initialPriceForm,
  metalsWithoutPrice,
  missingPriceText,
  planFromProposal,
  meetsText,
  probabilityText,
  proposalsTitle,
  readNextBatchesForm,
  readPriceForm,
} from '../../../renderer/src/views/next-batches/next-batches-form';

const proposal: Proposal = {
  pair: 'Pt-Ni',
  elementA: 'Pt',
  elementB: 'Ni',
  xB: 0.35,
  diameterNm: 5,
  temperatureK: 473.15,
  route: 'polyol',
  probability: 0.6234,
  probabilitySd: 0.1512,
  successProbability: 0.81,
  costPerBatch: 1.2345,
  currency: 'EUR',
  exploration: false,
  meetsTarget: true,
  targetLabel: 'alloy',
  physicsLabel: 'alloy',
  modelLabel: 'alloy',
  reason: 'P(alloy) 0.62 ± 0.15; physics agrees; route untried here',
};

const reagent = (key: string, symbol: string | null): CatalogReagent =>
  ({ key, metal: symbol ? { symbol } : undefined }) as unknown as CatalogReagent;
const catalog = [reagent('h2ptcl6-6h2o', 'Pt'), reagent('nicl2-6h2o', 'Ni'), reagent('haucl4-3h2o', 'Au')];

describe('next batches form', () => {
  it('reads the defaults (six proposals, one exploration slot) into an input the contract accepts', () => {
    const reading = readNextBatchesForm(INITIAL_NEXT_BATCHES_FORM, 4);
    expect(reading).toEqual({
      ok: true,
      value: { campaignId: 4, target: 'alloy', count: 6, explorationSlots: 1, includeFailed: false },
    });
    if (!reading.ok) throw new Error('unreachable');
    expect(validateInput('learn.propose', reading.value).ok).toBe(true);
  });

  it('names the input whose number it cannot read', () => {
    expect(readNextBatchesForm({ ...INITIAL_NEXT_BATCHES_FORM, count: 'six' }, 4)).toMatchObject({
      ok: false,
      error: { field: 'count' },
    });
    expect(readNextBatchesForm({ ...INITIAL_NEXT_BATCHES_FORM, explorationSlots: '' }, 4)).toMatchObject({
      ok: false,
      error: { field: 'explorationSlots' },
    });
  });

  it('reads a price with a decimal comma and tidies the symbol', () => {
    const reading = readPriceForm({ symbol: ' pt ', pricePerGram: '31,5', currency: '', pricedOn: '2026-12-01' });
    expect(reading).toEqual({
      ok: true,
      value: { symbol: 'Pt', pricePerGram: 31.5, currency: 'EUR', pricedOn: '2026-12-01' },
    });
    if (!reading.ok) throw new Error('unreachable');
    expect(validateInput('learn.setPrice', reading.value).ok).toBe(true);
    expect(readPriceForm({ ...initialPriceForm('2026-12-01', 'Ni'), pricePerGram: '1,234.5' })).toMatchObject({
      ok: false,
      error: { field: 'pricePerGram' },
    });
  });

  it('names the campaign metals without a price', () => {
    const missing = metalsWithoutPrice(['Pt-Ni', 'Ag-Au', 'Pt-Ag'], [{ symbol: 'Pt' }, { symbol: 'Au' }]);
    expect(missing).toEqual(['Ag', 'Ni']);
    expect(missingPriceText(missing)).toMatch(/^No price per gram for Ag, Ni: proposals with these metals/);
    expect(missingPriceText([])).toBeNull();
  });

  it('writes a proposal in the table’s words', () => {
    expect(compositionText(proposal)).toBe('Pt 65 / Ni 35 at.%');
    expect(probabilityText(proposal)).toBe('0.62 ± 0.15');
    // two significant digits; below 10⁻³ in printed scientific notation (shared-model/text/number-format.ts)
    expect(costText(proposal)).toBe('1.2 EUR');
    expect(costText({ costPerBatch: 0.04321, currency: 'EUR' })).toBe('0.043 EUR');
    expect(costText({ costPerBatch: 0.000076, currency: 'EUR' })).toBe('7.6 × 10⁻⁵ EUR');
    expect(costText({ costPerBatch: 1234.5, currency: 'EUR' })).toBe('1,200 EUR');
    expect(costText({ costPerBatch: null, currency: null })).toBe('– (no price)');
  });

  it('marks a proposal that does not reach the threshold, and says so in the title', () => {
    expect(meetsText(proposal, 0.5)).toBe('yes');
    expect(meetsText({ meetsTarget: false }, 0.5)).toBe('no (P < 0.5)');
    const miss = { ...proposal, meetsTarget: false };
    expect(proposalsTitle({ target: 'alloy', proposals: [proposal, proposal] })).toBe('2 proposals for alloy');
    expect(proposalsTitle({ target: 'alloy', proposals: [proposal, miss] })).toBe(
      '1 of 2 proposals likely to reach alloy',
    );
    expect(proposalsTitle({ target: 'alloy', proposals: [miss, miss] })).toBe(
      '0 of 2 proposals likely to reach alloy: the closest',
    );
  });

  it('hands a proposal to Batch design, which reads it into the particle it proposes', () => {
    const plan = planFromProposal(proposal, 0.1, 'alloy');
    const form = formFromPlan({ ...EXAMPLE_BATCH_FORM, precursorB: 'haucl4-3h2o' }, plan, catalog);
    expect(form).toMatchObject({
      elementA: 'Pt',
      elementB: 'Ni',
      target: 'alloy',
      route: 'polyol',
      sizeKind: 'alloy',
      diameterNm: '5',
      compositionPct: '35',
      amountValue: '0.1',
      temperatureC: '200',
      precursorA: 'h2ptcl6-6h2o',
      precursorB: 'nicl2-6h2o',
    });
    const reading = readBatchForm(form);
    if (!reading.ok) throw new Error(reading.message);
    expect(reading.request).toMatchObject({
      elementA: 'Pt',
      elementB: 'Ni',
      route: 'polyol',
      size: { kind: 'alloy', diameterNm: 5, xB: 0.35 },
      amount: { kind: 'total-metal', totalMetalMmol: 0.1 },
      temperatureC: 200,
    });
    expect(describePlan(plan)).toBe(
      'Filled in from Next batches (target alloy, proposal Pt-Ni): Pt-Ni, 35 at.% Ni, 5 nm, target alloy, ' +
        '473.15 K. Check the reagents, then Compute.',
    );
  });

  it('turns a seed-mediated core@shell proposal into core seeds and a shell of the proposed composition', () => {
    const plan = planFromProposal(
      { ...proposal, route: 'seed-mediated', targetLabel: 'Ni@Pt or Pt@Ni', xB: 0.5, diameterNm: 8 },
      0.1,
      'core@shell',
    );
    expect(plan.targetLabel).toBe('Ni@Pt');
    const form = formFromPlan(EXAMPLE_BATCH_FORM, plan, catalog);
    // Pt is the shell: x_shell = 1 − xB = 0.5; d_core = 8 nm × 0.5^(1/3) = 6.3496 nm; shell (8 − 6.3496)/2 = 0.8252 nm.
    expect(form).toMatchObject({
      route: 'seed-mediated',
      sizeKind: 'core-shell',
      seedMetal: 'Ni',
      seedDiameterNm: '6.35',
      shellUnit: 'nm',
      shellValue: '0.8252',
    });
    const reading = readBatchForm(form);
    if (!reading.ok) throw new Error(reading.message);
    expect(reading.request.seeds).toMatchObject({ metal: 'Ni', diameterNm: 6.35 });
    expect(reading.request.size).toMatchObject({ kind: 'core-shell', shellThicknessNm: 0.8252 });
    expect(reading.request.precursors).toEqual([{ element: 'Pt', reagentKey: 'h2ptcl6-6h2o', stockMm: 20 }]);
  });
});
