/**
 * The Next batches view as a pure model (no React, no DOM): the proposal form (target in the syntax of rank,
 * count, exploration slots, whether failed conditions may come back) read into a `learn.propose` input
 * (typed numbers through the one reader, the input at fault named), the metal-price form read into a
 * `learn.setPrice` input, the campaign's metals that have no price yet, the table's words for a proposal
 * (composition in at.%, route, cost), and the hand-off of a proposal to Batch design.
 */
import type { OperationInput } from '../../../../shared-model/api/contract';
import type { MetalPriceView } from '../../../../shared-model/api/learn';
import { formatCostPerBatch, meetsTargetText, type Proposal } from '../../../../shared-model/learn/proposals';
import { ROUTE_LABELS } from '../../../../shared-model/recipes/design-input';
import type { BatchPlanRequest } from '../../app-state';
import { fieldNumber, readForm, type FormReading } from '../../forms/typed-numbers';

export interface NextBatchesFormState {
  target: string;
  count: string;
  explorationSlots: string;
  includeFailed: boolean;
}

/** Six proposals, one of them exploration (the contract's defaults). */
export const INITIAL_NEXT_BATCHES_FORM: NextBatchesFormState = {
  target: 'alloy',
  count: '6',
  explorationSlots: '1',
  includeFailed: false,
};

/** The targets offered beside the free text (the syntax of rank; core@shell:X names the shell metal). */
export const TARGET_EXAMPLES = ['alloy', 'core@shell', 'core@shell:Pt', 'Janus', 'intermetallic'] as const;

/** Reads the form into the `learn.propose` input; ranges and whole numbers are the contract's to check. */
export function readNextBatchesForm(
  form: NextBatchesFormState,
  campaignId: number,
): FormReading<OperationInput<'learn.propose'>> {
  return readForm(() => ({
    campaignId,
    target: form.target.trim(),
    count: fieldNumber(form.count, 'count', 'number of proposals'),
    explorationSlots: fieldNumber(form.explorationSlots, 'explorationSlots', 'exploration slots'),
    includeFailed: form.includeFailed,
  }));
}

export interface PriceFormState {
  symbol: string;
  pricePerGram: string;
  currency: string;
  pricedOn: string;
}

/** An empty price form dated `today` (YYYY-MM-DD). */
export function initialPriceForm(today: string, symbol = ''): PriceFormState {
  return { symbol, pricePerGram: '', currency: 'EUR', pricedOn: today };
}

/** Reads the price form into the `learn.setPrice` input (the symbol tidied to its usual capitals). */
export function readPriceForm(form: PriceFormState): FormReading<OperationInput<'learn.setPrice'>> {
  return readForm(() => {
    const raw = form.symbol.trim();
    return {
      symbol: raw.charAt(0).toUpperCase() + raw.slice(1).toLowerCase(),
      pricePerGram: fieldNumber(form.pricePerGram, 'pricePerGram', 'price per gram'),
      currency: form.currency.trim() || 'EUR',
      pricedOn: form.pricedOn.trim(),
    };
  });
}

/** The campaign's metals (from its pairs and its history) that have no price, sorted. */
export function metalsWithoutPrice(
  pairs: readonly string[],
  prices: readonly Pick<MetalPriceView, 'symbol'>[],
): string[] {
  const priced = new Set(prices.map((p) => p.symbol));
  const metals = new Set<string>();
  for (const pair of pairs) for (const symbol of pair.split('-')) if (symbol) metals.add(symbol);
  return [...metals].filter((s) => !priced.has(s)).sort();
}

/** The sentence naming metals without a price, or null when every metal has one. */
export function missingPriceText(missing: readonly string[]): string | null {
  if (missing.length === 0) return null;
  return (
    `No price per gram for ${missing.join(', ')}: proposals with ${missing.length === 1 ? 'this metal' : 'these metals'} ` +
    'are ranked without cost and show no cost per batch. Enter a price below.'
  );
}

const pct = (x: number): string => String(Number((x * 100).toFixed(1)));

/** "Pt 75 / Ni 25 at.%" */
export function compositionText(p: Pick<Proposal, 'elementA' | 'elementB' | 'xB'>): string {
  return `${p.elementA} ${pct(1 - p.xB)} / ${p.elementB} ${pct(p.xB)} at.%`;
}

/** The route in words as Batch design names it. */
export function routeText(route: Proposal['route']): string {
  return ROUTE_LABELS[route];
}

/** "0.62 ± 0.15" */
export function probabilityText(p: Pick<Proposal, 'probability' | 'probabilitySd'>): string {
  return `${p.probability.toFixed(2)} ± ${p.probabilitySd.toFixed(2)}`;
}

/** Cost of one batch's metal, two significant digits ("0.26 EUR", "5.7 × 10⁻⁵ EUR"), or a dash naming why there is none. */
export function costText(p: Pick<Proposal, 'costPerBatch' | 'currency'>): string {
  if (p.costPerBatch === null) return '– (no price)';
  return formatCostPerBatch(p.costPerBatch, p.currency);
}

/** "yes", or "no (P < 0.5)" for a proposal shown as one of the closest. */
export function meetsText(p: Pick<Proposal, 'meetsTarget'>, threshold: number): string {
  return meetsTargetText(p.meetsTarget, threshold);
}

/** The card's title: "6 proposals for alloy", or "0 of 6 meet alloy: the closest" when some do not meet it. */
export function proposalsTitle(set: { proposals: readonly Pick<Proposal, 'meetsTarget'>[]; target: string }): string {
  const n = set.proposals.length;
  const meeting = set.proposals.filter((p) => p.meetsTarget).length;
  if (meeting === n) return `${n} proposal${n === 1 ? '' : 's'} for ${set.target}`;
  return `${meeting} of ${n} proposals likely to reach ${set.target}${meeting === 0 ? ': the closest' : ''}`;
}

/** A proposal as the request Batch design opens with (target: the first label the target means here). */
export function planFromProposal(p: Proposal, metalMmolPerBatch: number, target: string): BatchPlanRequest {
  return {
    elementA: p.elementA,
    elementB: p.elementB,
    xB: p.xB,
    diameterNm: p.diameterNm,
    temperatureK: p.temperatureK,
    route: p.route,
    targetLabel: p.targetLabel.split(' or ')[0] ?? p.targetLabel,
    totalMetalMmol: metalMmolPerBatch,
    source: `Next batches (target ${target}, proposal ${p.pair})`,
  };
}
