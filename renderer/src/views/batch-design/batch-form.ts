/**
 * The batch-design form as a pure model (no React, no DOM): the typed text of each input, the example it
 * starts from, reading the text into a `batches.design` request (typed numbers through the one reader,
 * the input at fault named; the composition typed in at.% and sent as the atomic fraction x_B), placing an
 * API error beside the input that shows it, and the form changes other parts of the view ask for.
 * Ranges are left to the contract (zod), so the form and the API say the same.
 */
import type { ApiError } from '../../../../shared-model/api/result';
import {
  AQUEOUS_ROUTES,
  type BatchDesignRequest,
  type SynthesisRoute,
} from '../../../../shared-model/recipes/design-input';
import { defaultReducerExcess } from '../../../../shared-model/recipes/reducers';
import { readOptionalUserNumber, readUserNumber } from '../../../../shared-model/text/user-number';

export type SizeKind = 'alloy' | 'core-shell' | 'core-shell-overall' | 'single-metal';

export interface BatchFormState {
  elementA: string;
  elementB: string;
  target: string;
  route: SynthesisRoute;
  sizeKind: SizeKind;
  diameterNm: string;
  /** Composition as the user types it: at.% of element B. */
  compositionPct: string;
  coreDiameterNm: string;
  shellValue: string;
  shellUnit: 'nm' | 'ML';
  singleElement: string;
  amountKind: 'total-metal' | 'particle-concentration';
  amountValue: string;
  batchVolumeMl: string;
  seedMetal: string;
  seedDiameterNm: string;
  seedConcKind: 'particles' | 'metal';
  seedConc: string;
  seedVolumeMl: string;
  seedBatchId: string;
  precursorA: string;
  stockA: string;
  precursorB: string;
  stockB: string;
  reducerKey: string;
  reducerExcess: string;
  reducerStock: string;
  cappingKey: string;
  /** How the capping amount is typed: per mol of metal reduced, or as its final concentration in the batch. */
  cappingAmountKind: 'mol-per-mol-metal' | 'final-mM';
  cappingRatio: string;
  cappingStock: string;
  solventKey: string;
  solventVolumeMl: string;
  temperatureC: string;
}

/** 4 nm Pt75Ni25 by borohydride co-reduction (worked by hand in test/shared-model/recipes/design.test.ts). */
export const EXAMPLE_BATCH_FORM: BatchFormState = {
  elementA: 'Pt',
  elementB: 'Ni',
  target: 'alloy',
  route: 'co-reduction',
  sizeKind: 'alloy',
  diameterNm: '4',
  compositionPct: '25',
  coreDiameterNm: '',
  shellValue: '',
  shellUnit: 'ML',
  singleElement: 'Pt',
  amountKind: 'total-metal',
  amountValue: '0.1',
  batchVolumeMl: '50',
  seedMetal: '',
  seedDiameterNm: '',
  seedConcKind: 'particles',
  seedConc: '',
  seedVolumeMl: '',
  seedBatchId: '',
  precursorA: 'h2ptcl6-6h2o',
  stockA: '20',
  precursorB: 'nicl2-6h2o',
  stockB: '20',
  reducerKey: 'nabh4',
  reducerExcess: '5',
  reducerStock: '100',
  cappingKey: '',
  cappingAmountKind: 'mol-per-mol-metal',
  cappingRatio: '',
  cappingStock: '',
  solventKey: '',
  solventVolumeMl: '',
  temperatureC: '',
};

/** The request read from the form, or the first input whose text is not a number (`field` = the input's name). */
export type BatchFormReading =
  { ok: true; request: BatchDesignRequest } | { ok: false; field: string; message: string };

class InputRefusal extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

function required(text: string, field: string, label: string): number {
  const result = readUserNumber(text, label);
  if (!result.ok) throw new InputRefusal(field, result.message);
  return result.value;
}

function optional(text: string, field: string, label: string): number | undefined {
  const result = readOptionalUserNumber(text, label);
  if (!result.ok) throw new InputRefusal(field, result.message);
  return result.value;
}

/** The metal the seeds are made of (the form's choice, else element A) and the shell metal grown on them. */
export function seedAndShell(form: BatchFormState): { seedMetal: string; shellElement: string } {
  const seedMetal = form.seedMetal || form.elementA;
  return { seedMetal, shellElement: seedMetal === form.elementA ? form.elementB : form.elementA };
}

function readSize(form: BatchFormState): BatchDesignRequest['size'] {
  const seedMode = form.route === 'seed-mediated';
  const overall = form.sizeKind === 'core-shell-overall' && !seedMode;
  const shellLabel = `shell (${overall ? 'nm' : form.shellUnit})`;
  if (!seedMode && form.sizeKind === 'alloy') {
    const diameterNm = required(form.diameterNm, 'size.diameterNm', 'diameter (nm)');
    const pct = required(form.compositionPct, 'size.xB', `composition (at.% ${form.elementB || 'B'})`);
    return { kind: 'alloy', diameterNm, xB: pct / 100 };
  }
  if (!seedMode && form.sizeKind === 'single-metal') {
    const diameterNm = required(form.diameterNm, 'size.diameterNm', 'diameter (nm)');
    return { kind: 'single-metal', element: form.singleElement, diameterNm };
  }
  if (overall) {
    const diameterNm = required(form.diameterNm, 'size.diameterNm', 'overall diameter (nm)');
    return { kind: 'core-shell-overall', diameterNm, shellThicknessNm: required(form.shellValue, 'shell', shellLabel) };
  }
  const core = seedMode ? undefined : optional(form.coreDiameterNm, 'size.coreDiameterNm', 'core diameter (nm)');
  const shell = required(form.shellValue, 'shell', shellLabel);
  return {
    kind: 'core-shell',
    ...(core !== undefined ? { coreDiameterNm: core } : {}),
    ...(form.shellUnit === 'nm' ? { shellThicknessNm: shell } : { shellMonolayers: shell }),
  };
}

function readPrecursors(form: BatchFormState): BatchDesignRequest['precursors'] {
  const precursors: BatchDesignRequest['precursors'] = [];
  const add = (slot: 'A' | 'B') => {
    const element = slot === 'A' ? form.elementA : form.elementB;
    const key = slot === 'A' ? form.precursorA : form.precursorB;
    if (!key) return;
    const stockMm = optional(slot === 'A' ? form.stockA : form.stockB, `stock${slot}`, `${element} stock (mM)`);
    precursors.push({ element, reagentKey: key, ...(stockMm !== undefined ? { stockMm } : {}) });
  };
  if (form.route === 'seed-mediated') {
    add(seedAndShell(form).shellElement === form.elementA ? 'A' : 'B');
  } else {
    const single = form.sizeKind === 'single-metal' ? form.singleElement : null;
    if (!single || single === form.elementA) add('A');
    if (!single || single === form.elementB) add('B');
  }
  return precursors;
}

function readSeeds(form: BatchFormState): NonNullable<BatchDesignRequest['seeds']> {
  const seedBatchId = optional(form.seedBatchId, 'seeds.seedBatchId', 'seed batch');
  const volumeMl = required(form.seedVolumeMl, 'seeds.volumeMl', 'seed volume used (mL)');
  const fromBatch = seedBatchId !== undefined;
  const diameterNm = fromBatch ? undefined : optional(form.seedDiameterNm, 'seeds.diameterNm', 'seed diameter (nm)');
  const concLabel = form.seedConcKind === 'particles' ? 'seeds per mL' : 'seed metal (mM)';
  const conc = fromBatch ? undefined : optional(form.seedConc, 'seeds.particlesPerMl', concLabel);
  return {
    metal: seedAndShell(form).seedMetal,
    volumeMl,
    ...(seedBatchId !== undefined ? { seedBatchId } : {}),
    ...(diameterNm !== undefined ? { diameterNm } : {}),
    ...(conc !== undefined ? (form.seedConcKind === 'particles' ? { particlesPerMl: conc } : { metalMm: conc }) : {}),
  };
}

function readReagents(form: BatchFormState): Pick<BatchDesignRequest, 'reducer' | 'capping' | 'solvent'> {
  const reagents: Pick<BatchDesignRequest, 'reducer' | 'capping' | 'solvent'> = {};
  if (form.reducerKey) {
    const excess = optional(form.reducerExcess, 'reducer.excess', 'reducer excess (×)');
    const stockMm = optional(form.reducerStock, 'reducer.stockMm', 'reducer stock (mM)');
    reagents.reducer = {
      reagentKey: form.reducerKey,
      ...(excess !== undefined ? { excess } : {}),
      ...(stockMm !== undefined ? { stockMm } : {}),
    };
  }
  if (form.cappingKey) {
    const perMetal = form.cappingAmountKind === 'mol-per-mol-metal';
    const label = perMetal ? 'capping (mol per mol metal)' : 'capping final concentration (mM)';
    const value = required(form.cappingRatio, 'capping.molPerMolMetal', label);
    const stockMm = optional(form.cappingStock, 'capping.stockMm', 'capping stock (mM)');
    reagents.capping = {
      reagentKey: form.cappingKey,
      ...(perMetal ? { molPerMolMetal: value } : { concentrationMm: value }),
      ...(stockMm !== undefined ? { stockMm } : {}),
    };
  }
  if (form.solventKey) {
    const volumeMl = optional(form.solventVolumeMl, 'solvent.volumeMl', 'solvent volume (mL)');
    reagents.solvent = { reagentKey: form.solventKey, ...(volumeMl !== undefined ? { volumeMl } : {}) };
  }
  return reagents;
}

/** Reads the typed text into the request both `batches.design` and `batches.save` take. */
export function readBatchForm(form: BatchFormState): BatchFormReading {
  try {
    const seedMode = form.route === 'seed-mediated';
    const size = readSize(form);
    const request: BatchDesignRequest = {
      elementA: form.elementA,
      elementB: form.elementB,
      target: form.target,
      route: form.route,
      size,
      batchVolumeMl: required(form.batchVolumeMl, 'batchVolumeMl', 'batch volume (mL)'),
      precursors: [],
    };
    if (seedMode) request.seeds = readSeeds(form);
    else {
      const label = form.amountKind === 'total-metal' ? 'total metal (mmol)' : 'particles per mL';
      const value = required(form.amountValue, 'amount', label);
      request.amount =
        form.amountKind === 'total-metal'
          ? { kind: 'total-metal', totalMetalMmol: value }
          : { kind: 'particle-concentration', particlesPerMl: value };
    }
    request.precursors = readPrecursors(form);
    Object.assign(request, readReagents(form));
    const temperatureC = optional(form.temperatureC, 'temperatureC', 'highest temperature (°C)');
    if (temperatureC !== undefined) request.temperatureC = temperatureC;
    return { ok: true, request };
  } catch (error) {
    if (error instanceof InputRefusal) return { ok: false, field: error.field, message: error.message };
    throw error;
  }
}

/**
 * Every input (by name) that can show an error of its own; each is rendered by a section of the form
 * (test/renderer/batch-design/form-inputs.test.ts reads the sections and checks). An error on any other field
 * is shown above the form's actions, without a field.
 */
export const BATCH_FORM_INPUTS: ReadonlySet<string> = new Set([
  'elementA',
  'elementB',
  'target',
  'route',
  'size.kind',
  'size.diameterNm',
  'size.xB',
  'size.coreDiameterNm',
  'shell',
  'size.element',
  'amount',
  'batchVolumeMl',
  'seeds.metal',
  'seeds.diameterNm',
  'seeds.particlesPerMl',
  'seeds.volumeMl',
  'seeds.seedBatchId',
  'precursors',
  'precursorA',
  'stockA',
  'precursorB',
  'stockB',
  'reducer',
  'reducer.excess',
  'reducer.stockMm',
  'capping',
  'capping.molPerMolMetal',
  'capping.stockMm',
  'solvent',
  'solvent.volumeMl',
  'temperatureC',
  'name',
]);

/** The input that shows an error on `field` (an API path such as `design.precursors.1.reagentKey`). */
export function inputForField(field: string, form: BatchFormState): string {
  const path = field.replace(/^design\./, '');
  if (path === 'amount.totalMetalMmol' || path === 'amount.particlesPerMl' || path === 'amount') return 'amount';
  if (path === 'size.shellThicknessNm' || path === 'size.shellMonolayers') return 'shell';
  if (path.startsWith('seeds.')) return path === 'seeds.metalMm' ? 'seeds.particlesPerMl' : path;
  const precursor = /^precursors\.(\d+)\.(reagentKey|element|stockMm)$/.exec(path);
  if (precursor) {
    const reading = readBatchForm(form);
    const element = reading.ok ? reading.request.precursors[Number(precursor[1])]?.element : undefined;
    const slot = element === form.elementB ? 'B' : 'A';
    return precursor[2] === 'stockMm' ? `stock${slot}` : `precursor${slot}`;
  }
  if (path === 'reducer' || path === 'reducer.reagentKey') return 'reducer';
  if (path === 'capping.reagentKey') return 'capping';
  if (path === 'capping.molPerMolMetal' || path === 'capping.concentrationMm') return 'capping.molPerMolMetal';
  if (path === 'solvent' || path === 'solvent.reagentKey') return 'solvent';
  return path;
}

/** The error with its field renamed to the input that shows it, or without a field when no input does. */
export function placeError(error: ApiError, form: BatchFormState): ApiError {
  const input = error.field ? inputForField(error.field, form) : null;
  if (input && BATCH_FORM_INPUTS.has(input)) return { ...error, field: input };
  return { code: error.code, message: error.message };
}

/** A reading that failed, as the error the view shows beside the input. */
export function readingError(reading: Extract<BatchFormReading, { ok: false }>): ApiError {
  return { code: 'invalid_input', message: reading.message, field: reading.field };
}

/** The form set up to grow a shell on a saved batch's particles (its measured values are used). */
export function growOnSeeds(
  form: BatchFormState,
  batch: { id: number; elementA: string; elementB: string },
  seedMetal: string,
): BatchFormState {
  return {
    ...form,
    elementA: batch.elementA,
    elementB: batch.elementB,
    route: 'seed-mediated',
    sizeKind: 'core-shell',
    seedBatchId: String(batch.id),
    seedMetal,
    shellUnit: 'ML',
    shellValue: form.shellValue || '2',
    seedVolumeMl: form.seedVolumeMl || '5',
  };
}

/** What the form needs of a catalog reagent to offer it as a metal's precursor. */
export interface PrecursorOption {
  key: string;
  formula: string;
  metal?: { symbol: string; oxidationState: number } | null;
}

/**
 * A precursor for organic solvents: acetylacetonates and zero-valent carbonyls, which do not dissolve in water
 * (common practice: metal chlorides and nitrates for aqueous routes, acac and carbonyls for organic ones).
 */
function organicPhase(reagent: PrecursorOption): boolean {
  return /C5H7O2|\(CO\)/.test(reagent.formula) || reagent.metal?.oxidationState === 0;
}

/**
 * The current precursor when it is one of `element`, else the catalog's first precursor of it that suits the
 * route (a water-soluble salt for aqueous routes, an acac or carbonyl for the organic route), else any ('' if none).
 */
export function precursorFor(
  element: string,
  current: string,
  catalog: readonly PrecursorOption[],
  route: SynthesisRoute = 'co-reduction',
): string {
  const ofElement = catalog.filter((r) => r.metal?.symbol === element);
  if (ofElement.some((r) => r.key === current)) return current;
  const suits = (r: PrecursorOption) =>
    route === 'organic' ? organicPhase(r) : AQUEOUS_ROUTES.includes(route) ? !organicPhase(r) : true;
  return (ofElement.find(suits) ?? ofElement[0])?.key ?? '';
}

/**
 * The form after the pair changes (typed, chosen from the campaign's pairs, or taken from a seed batch): the
 * precursors become precursors of the new metals, and choices naming a metal no longer in the pair (the
 * single metal, the seed metal, a core@shell target) fall back to ones of the new pair.
 */
export function withPair(
  form: BatchFormState,
  change: { elementA?: string; elementB?: string; target?: string },
  catalog: readonly PrecursorOption[],
): BatchFormState {
  const next = { ...form, ...change };
  const pair = [next.elementA, next.elementB];
  const target = change.target ?? (targetNamesOnly(next.target, pair) ? next.target : 'alloy');
  return {
    ...next,
    target,
    precursorA: precursorFor(next.elementA, form.precursorA, catalog, next.route),
    precursorB: precursorFor(next.elementB, form.precursorB, catalog, next.route),
    singleElement: pair.includes(form.singleElement) ? form.singleElement : next.elementA,
    seedMetal: form.seedMetal !== '' && !pair.includes(form.seedMetal) ? '' : form.seedMetal,
  };
}

/** Whether a target names no metal outside the pair (alloy, Janus, … or A@B of the pair's metals). */
function targetNamesOnly(target: string, pair: string[]): boolean {
  if (!target.includes('@')) return true;
  return target.split('@').every((part) => pair.includes(part.trim()));
}

/** What the result pane says when Compute failed: the message, and where the input at fault is. */
export function computeFailureText(error: ApiError): string {
  const where = error.field ? ' The input at fault is marked in the form.' : '';
  const sentence = /[.!?]$/.test(error.message) ? error.message : `${error.message}.`;
  return `Not computed: ${sentence}${where}`;
}

/** The reducer excess the contract assumes when the field is left empty, as the field's hint shows it. */
export function reducerExcessHint(
  reducer: { name: string; reducerHalfReactionId?: string | null } | undefined,
): string | null {
  if (!reducer) return null;
  const assumed = defaultReducerExcess(reducer.reducerHalfReactionId, reducer.name);
  return `empty: ${assumed.excess}× assumed — ${assumed.practice}`;
}

/** A new reducer: the excess typed for the previous one is cleared, so the new one's common-practice default applies. */
export function withReducer(form: BatchFormState, reducerKey: string): BatchFormState {
  return reducerKey === form.reducerKey ? form : { ...form, reducerKey, reducerExcess: '' };
}

/** A new route; seed-mediated growth always grows a core-shell particle. */
export function withRoute(form: BatchFormState, route: SynthesisRoute): BatchFormState {
  return { ...form, route, sizeKind: route === 'seed-mediated' ? 'core-shell' : form.sizeKind };
}
