/** `pairwright recipe <A-B>`: design a batch from the flags, optionally saved (--save NAME). */
import type { BatchDesign } from '../../../../shared-model/recipes/design';
import type { BatchDesignRequest } from '../../../../shared-model/recipes/design-input';
import { ROUTES } from '../../../../shared-model/recipes/design-input';
import { splitPair } from '../../../../shared-model/api/schemas';
import {
  CliError,
  optionalNumber,
  optionalString,
  readNumberText,
  requirePositional,
  type CliCommand,
  type OptionSpec,
  type ParsedArgs,
} from '../../command';
import { formatTable } from '../../table';
import { resolveCampaign } from '../campaigns';
import { num } from './format';

const RECIPE_OPTIONS: Record<string, OptionSpec> = {
  route: { type: 'string', description: `${ROUTES.join(' | ')} (default co-reduction)` },
  target: { type: 'string', description: 'architecture: alloy, A@B, Janus, intermetallic … (default alloy)' },
  diameter: { type: 'string', description: 'particle diameter, nm (alloy, single metal, or overall with --shell-nm)' },
  composition: { type: 'string', description: 'at.% of B for an alloy, e.g. 25' },
  single: { type: 'string', description: 'single-metal batch (seeds) of this element' },
  core: { type: 'string', description: 'core diameter, nm (core@shell)' },
  'shell-nm': { type: 'string', description: 'shell thickness, nm' },
  'shell-ml': { type: 'string', description: 'shell thickness, monolayers' },
  'total-metal': { type: 'string', description: 'total metal, mmol' },
  'particles-per-ml': { type: 'string', description: 'particle concentration target, particles/mL' },
  volume: { type: 'string', description: 'batch volume, mL' },
  precursor: {
    type: 'string',
    multiple: true,
    description: 'EL=reagent-key[@stock mM], once per metal, e.g. Pt=h2ptcl6-6h2o@20',
  },
  reducer: { type: 'string', description: 'reducer reagent key, e.g. nabh4' },
  excess: {
    type: 'string',
    description:
      'reducer excess over the electron balance (default: common practice per reducer, e.g. 5 for NaBH4; stated in the design)',
  },
  'reducer-stock': { type: 'string', description: 'reducer stock concentration, mM' },
  capping: { type: 'string', description: 'capping agent reagent key, e.g. pvp' },
  'capping-ratio': { type: 'string', description: 'capping agent, mol per mol metal' },
  'capping-mm': { type: 'string', description: 'capping agent final concentration, mM' },
  'capping-stock': { type: 'string', description: 'capping agent stock concentration, mM' },
  solvent: { type: 'string', description: 'solvent reagent key (polyol/organic routes), e.g. ethylene-glycol' },
  'solvent-volume': { type: 'string', description: 'solvent volume, mL' },
  'seed-metal': { type: 'string', description: 'seed metal (seed-mediated)' },
  'seed-diameter': { type: 'string', description: 'seed diameter, nm' },
  'seed-conc': { type: 'string', description: 'seed concentration, particles/mL' },
  'seed-metal-mm': { type: 'string', description: 'seed concentration as metal, mM' },
  'seed-volume': { type: 'string', description: 'volume of seed dispersion used, mL' },
  'seed-batch': {
    type: 'string',
    description: 'id of the batch the seeds come from (its measured size and concentration are used)',
  },
  temperature: { type: 'string', description: 'highest temperature, °C (default by route)' },
  save: { type: 'string', description: 'save the batch under this name (status planned)' },
  campaign: { type: 'string', description: 'campaign (id or name) to file a saved batch under' },
};

function precursorOption(text: string): { element: string; reagentKey: string; stockMm?: number } {
  const match = /^([A-Z][a-z]?)=([a-z0-9-]+)(?:@([^@\s]+))?$/.exec(text.trim());
  if (!match)
    throw new CliError(`--precursor "${text}" must look like Pt=h2ptcl6-6h2o or Pt=h2ptcl6-6h2o@20 (stock mM)`);
  const stock =
    match[3] === undefined
      ? undefined
      : readNumberText(match[3], `--precursor "${text}": the stock concentration (mM)`);
  return {
    element: match[1] as string,
    reagentKey: match[2] as string,
    ...(stock !== undefined ? { stockMm: stock } : {}),
  };
}

function requireNumber(args: ParsedArgs, name: string): number {
  const value = optionalNumber(args, name);
  if (value === undefined) throw new CliError(`--${name} is required`);
  return value;
}

/** Builds the design request from the flags; the service validates the numbers (messages name the field). */
export function recipeRequest(args: ParsedArgs): BatchDesignRequest {
  const pair = splitPair(requirePositional(args, 0, 'A-B'));
  if (!pair) throw new CliError(`<A-B> must be a pair such as Pt-Ni, got "${args.positionals[0]}"`);
  const [elementA, elementB] = pair;
  const route = (optionalString(args, 'route') ?? 'co-reduction') as BatchDesignRequest['route'];
  const target = optionalString(args, 'target') ?? 'alloy';
  const single = optionalString(args, 'single');
  const core = optionalNumber(args, 'core');
  const shellNm = optionalNumber(args, 'shell-nm');
  const shellMl = optionalNumber(args, 'shell-ml');
  const diameter = optionalNumber(args, 'diameter');
  let size: BatchDesignRequest['size'];
  if (single !== undefined)
    size = { kind: 'single-metal', element: single, diameterNm: requireNumber(args, 'diameter') };
  else if (
    route === 'seed-mediated' ||
    core !== undefined ||
    shellMl !== undefined ||
    (shellNm !== undefined && diameter === undefined)
  ) {
    size = {
      kind: 'core-shell',
      ...(core !== undefined ? { coreDiameterNm: core } : {}),
      ...(shellNm !== undefined ? { shellThicknessNm: shellNm } : {}),
      ...(shellMl !== undefined ? { shellMonolayers: shellMl } : {}),
    };
  } else if (shellNm !== undefined)
    size = { kind: 'core-shell-overall', diameterNm: requireNumber(args, 'diameter'), shellThicknessNm: shellNm };
  else {
    // --composition is typed in at.% of B; the contract takes the atomic fraction x_B
    size = { kind: 'alloy', diameterNm: requireNumber(args, 'diameter'), xB: requireNumber(args, 'composition') / 100 };
  }

  const totalMetal = optionalNumber(args, 'total-metal');
  const particlesPerMl = optionalNumber(args, 'particles-per-ml');
  const rawPrecursors = args.values.precursor;
  const precursorTexts = Array.isArray(rawPrecursors)
    ? rawPrecursors.map(String)
    : typeof rawPrecursors === 'string'
      ? [rawPrecursors]
      : [];
  const reducer = optionalString(args, 'reducer');
  const capping = optionalString(args, 'capping');
  const solvent = optionalString(args, 'solvent');
  const seedMetal = optionalString(args, 'seed-metal');
  const seedBatch = optionalNumber(args, 'seed-batch');
  const temperature = optionalNumber(args, 'temperature');
  const request: BatchDesignRequest = {
    elementA,
    elementB,
    target,
    route,
    size,
    batchVolumeMl: requireNumber(args, 'volume'),
    precursors: precursorTexts.map((text) => precursorOption(text)),
  };
  if (totalMetal !== undefined) request.amount = { kind: 'total-metal', totalMetalMmol: totalMetal };
  else if (particlesPerMl !== undefined) request.amount = { kind: 'particle-concentration', particlesPerMl };
  if (reducer) {
    const excess = optionalNumber(args, 'excess');
    const stock = optionalNumber(args, 'reducer-stock');
    request.reducer = {
      reagentKey: reducer,
      ...(excess !== undefined ? { excess } : {}),
      ...(stock !== undefined ? { stockMm: stock } : {}),
    };
  }
  if (capping) {
    const ratio = optionalNumber(args, 'capping-ratio');
    const mm = optionalNumber(args, 'capping-mm');
    const stock = optionalNumber(args, 'capping-stock');
    request.capping = {
      reagentKey: capping,
      ...(ratio !== undefined ? { molPerMolMetal: ratio } : {}),
      ...(mm !== undefined ? { concentrationMm: mm } : {}),
      ...(stock !== undefined ? { stockMm: stock } : {}),
    };
  }
  if (solvent) {
    const volume = optionalNumber(args, 'solvent-volume');
    request.solvent = { reagentKey: solvent, ...(volume !== undefined ? { volumeMl: volume } : {}) };
  }
  if (seedMetal !== undefined || seedBatch !== undefined) {
    const conc = optionalNumber(args, 'seed-conc');
    const metalMm = optionalNumber(args, 'seed-metal-mm');
    const seedDiameter = optionalNumber(args, 'seed-diameter');
    request.seeds = {
      metal: seedMetal ?? elementA,
      volumeMl: requireNumber(args, 'seed-volume'),
      ...(seedDiameter !== undefined ? { diameterNm: seedDiameter } : {}),
      ...(conc !== undefined ? { particlesPerMl: conc } : {}),
      ...(metalMm !== undefined ? { metalMm } : {}),
      ...(seedBatch !== undefined ? { seedBatchId: seedBatch } : {}),
    };
  }
  if (temperature !== undefined) request.temperatureC = temperature;
  return request;
}

/** The CLI's JSON for a design: the contract fields first, then the full design. */
export function recipeJson(design: BatchDesign, saved: { id: number } | null) {
  return {
    ...(saved ? { batchId: saved.id } : {}),
    atomsPerParticle: design.atomsPerParticle,
    coreAtoms: design.coreAtoms,
    shellAtoms: design.shellAtoms,
    particles: design.particles,
    reagents: design.reagents.map((r) => ({
      name: r.name,
      formula: r.formula,
      role: r.role,
      amountMmol: r.amountMmol,
      massMg: r.massMg,
      volumeMl: r.volumeMl,
      key: r.key,
      stockMm: r.stockMm,
    })),
    checks: design.checks.map((c) => ({ kind: c.kind, severity: c.severity, message: c.message })),
    hazards: design.hazards,
    design,
  };
}

export function recipeText(design: BatchDesign, saved: { id: number } | null): string {
  const lines: string[] = [];
  if (saved) lines.push(`saved as batch ${saved.id} (planned)`);
  lines.push(
    `${design.elementA}-${design.elementB}, target ${design.target}, ${design.routeLabel}`,
    `particle ${num(design.diameterNm)} nm (${design.architecture}${design.shellMonolayers !== null ? `, shell ${num(design.shellMonolayers, 3)} ML` : ''}): ${num(design.atomsPerParticle)} atoms (core ${num(design.coreAtoms)}, shell ${num(design.shellAtoms)}), ${num(design.xB * 100, 3)} at.% ${design.elementB}`,
    `${num(design.particles)} particles, ${num(design.particlesPerMl)} per mL (${num(design.particleNanomolar, 3)} nM) in ${num(design.batchVolumeMl)} mL`,
    '',
    formatTable(design.reagents, [
      { header: 'reagent', value: (r) => r.name },
      { header: 'role', value: (r) => r.role },
      { header: 'mmol', value: (r) => num(r.amountMmol), align: 'right' },
      { header: 'mg', value: (r) => num(r.massMg), align: 'right' },
      { header: 'mL', value: (r) => num(r.volumeMl), align: 'right' },
      { header: 'stock mM', value: (r) => num(r.stockMm), align: 'right' },
    ]),
    '',
    'checks:',
    ...design.checks.map((c) => `  [${c.severity}] ${c.message}`),
    '',
    `hazards (${design.hazardSummary.signalWord ?? 'no signal word'}; ${design.hazardSummary.pictograms.map((p) => p.code).join(' ') || 'no pictograms'}):`,
    ...design.hazards.map((h) => `  ${h.code} ${h.text}`),
    '',
    `waste: ${design.hazardSummary.wasteStreams.map((w) => w.label).join('; ')}`,
    design.hazardSummary.caution,
  );
  return lines.join('\n');
}

export const recipeCommand: CliCommand = {
  words: ['recipe'],
  args: '<A-B>',
  summary: 'Design a batch: atoms, particles, reagent amounts, kinetic checks, hazards (--save NAME to keep it)',
  options: RECIPE_OPTIONS,
  run: async (args, context) => {
    const request = recipeRequest(args);
    const name = optionalString(args, 'save');
    if (name !== undefined) {
      const campaignRef = optionalString(args, 'campaign');
      const campaign = campaignRef ? await resolveCampaign(context, campaignRef) : null;
      const saved = await context.call('batches.save', { name, campaignId: campaign?.id ?? null, design: request });
      return { json: recipeJson(saved.design, saved), text: recipeText(saved.design, saved) };
    }
    const design = await context.call('batches.design', request);
    return { json: recipeJson(design, null), text: recipeText(design, null) };
  },
};
