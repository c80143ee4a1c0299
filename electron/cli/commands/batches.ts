/**
 * `pairwright recipe`, `pairwright reagents`, `pairwright catalog`, `pairwright batches …`: batch design
 * from the command line, with the same services as the app.
 */
import type {
  BatchStatus,
  BatchSummary,
  CatalogReagent,
  InventoryRecord,
  StatusChange,
} from '../../../shared-model/api/batches';
import { BATCH_STATUSES } from '../../../shared-model/api/batches';
import type { BatchDesign } from '../../../shared-model/recipes/design';
import type { BatchDesignRequest } from '../../../shared-model/recipes/design-input';
import { ROUTES } from '../../../shared-model/recipes/design-input';
import type { ReagentList } from '../../../shared-model/recipes/reagent-list';
import { splitPair } from '../../../shared-model/api/schemas';
import {
  CliError,
  optionalNumber,
  optionalString,
  readNumberText,
  requirePositional,
  type CliCommand,
  type OptionSpec,
  type ParsedArgs,
} from '../command';
import { formatTable } from '../table';
import { resolveCampaign } from './campaigns';

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

function num(value: number | null, digits = 4): string {
  if (value === null || !Number.isFinite(value)) return '';
  const abs = Math.abs(value);
  if (abs !== 0 && (abs >= 1e6 || abs < 1e-3)) return value.toExponential(digits - 1);
  return Number(value.toPrecision(digits)).toString();
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

function parseBatchIds(text: string | undefined): number[] {
  if (!text) throw new CliError('--batches is required, e.g. --batches 3,4,7');
  const ids = text.split(',').map((part) => part.trim());
  for (const id of ids)
    if (!/^\d+$/.test(id) || Number(id) === 0)
      throw new CliError(`--batches must be batch ids separated by commas, got "${text}"`);
  return ids.map(Number);
}

const reagentListTable = (list: ReagentList): string =>
  [
    formatTable(list.lines, [
      { header: 'reagent', value: (l) => l.name },
      { header: 'formula', value: (l) => l.formula },
      { header: 'total mg', value: (l) => num(l.totalMassMg), align: 'right' },
      { header: 'total mL', value: (l) => num(l.totalVolumeMl), align: 'right' },
      { header: 'on hand', value: (l) => l.onHandText },
      { header: 'location', value: (l) => l.locations.join('; ') },
      { header: 'short mg', value: (l) => (l.shortfallMg ? num(l.shortfallMg) : ''), align: 'right' },
      { header: 'status', value: (l) => l.status },
    ]),
    '',
    `hazards (${list.hazardSummary.signalWord ?? 'no signal word'}): ${list.hazardSummary.hazards.map((h) => h.code).join(' ')}`,
    ...list.hazardSummary.warnings.map((w) => `  [${w.severity}] ${w.message}`),
    list.hazardSummary.caution,
  ].join('\n');

const catalogTable = (catalog: readonly CatalogReagent[]): string =>
  formatTable(catalog, [
    { header: 'key', value: (r) => r.key },
    { header: 'name', value: (r) => r.name },
    { header: 'formula', value: (r) => r.formula },
    { header: 'g/mol', value: (r) => r.molarMassGPerMol.toFixed(2), align: 'right' },
    { header: 'roles', value: (r) => r.roles.join(', ') },
    { header: 'metal', value: (r) => (r.metal ? `${r.metal.symbol}(${r.metal.oxidationState})` : '') },
    { header: 'H-codes', value: (r) => r.hCodes.join(' ') },
    { header: 'rev', value: (r) => r.revision, align: 'right' },
  ]);

const batchTable = (batches: readonly BatchSummary[], campaignNames?: ReadonlyMap<number, string>): string =>
  formatTable(batches, [
    { header: 'id', value: (b) => b.id, align: 'right' },
    { header: 'name', value: (b) => b.name },
    { header: 'pair', value: (b) => `${b.elementA}-${b.elementB}` },
    { header: 'target', value: (b) => b.target },
    { header: 'route', value: (b) => b.route },
    { header: 'nm', value: (b) => num(b.diameterNm, 3), align: 'right' },
    { header: 'status', value: (b) => b.status },
    { header: 'seeds from', value: (b) => (b.seedBatchId ? `#${b.seedBatchId}` : '') },
    { header: 'catalog', value: (b) => (b.catalogChanged ? 'changed since' : '') },
    ...(campaignNames
      ? [
          {
            header: 'campaign',
            value: (b: BatchSummary) => (b.campaignId === null ? '—' : (campaignNames.get(b.campaignId) ?? '?')),
          },
        ]
      : []),
  ]);

export const batchCommands: CliCommand[] = [
  {
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
  },
  {
    words: ['reagents'],
    args: '',
    summary: 'Reagent totals for batches vs the inventory, e.g. reagents --batches 3,4,7 --csv',
    options: {
      batches: { type: 'string', description: 'batch ids separated by commas' },
      csv: { type: 'boolean', description: 'print CSV' },
      out: { type: 'string', description: 'write the CSV to this file instead of printing it' },
    },
    run: async (args, context) => {
      const batchIds = parseBatchIds(optionalString(args, 'batches'));
      if (args.values.csv === true || optionalString(args, 'out')) {
        const { csv, filename } = await context.call('reagents.csv', { batchIds });
        const out = optionalString(args, 'out');
        if (out) {
          context.writeTextFile(out, csv);
          return { json: { written: out, filename }, text: `wrote ${out}` };
        }
        return { json: { csv, filename }, text: csv };
      }
      const list = await context.call('reagents.list', { batchIds });
      return { json: list, text: reagentListTable(list) };
    },
  },
  {
    words: ['catalog'],
    args: '',
    summary: 'List the reagent catalog',
    options: {},
    run: async (_args, context) => {
      const catalog = await context.call('reagents.catalog', {});
      return { json: catalog, text: catalogTable(catalog) };
    },
  },
  {
    words: ['batches', 'list'],
    args: '',
    summary:
      "List saved batches: the named campaign's (--campaign), else those of active campaigns; --all lists every " +
      "campaign's, archived campaigns' too",
    options: {
      status: { type: 'string', description: BATCH_STATUSES.join(' | ') },
      campaign: { type: 'string', description: 'only this campaign (id or name)' },
      all: { type: 'boolean', description: "every campaign's batches, archived campaigns' too" },
    },
    run: async (args, context) => {
      const status = optionalString(args, 'status');
      const campaignRef = optionalString(args, 'campaign');
      const all = args.values.all === true;
      if (all && campaignRef !== undefined) throw new CliError('give either --all or --campaign, not both');
      const campaign = campaignRef !== undefined ? await resolveCampaign(context, campaignRef) : null;
      const batches = await context.call('batches.list', {
        ...(status !== undefined ? { status: status as BatchStatus } : {}),
        ...(campaign !== null ? { campaignId: campaign.id, includeArchived: true } : {}),
        ...(all ? { includeArchived: true } : {}),
      });
      const campaigns = await context.call('campaigns.list', { includeArchived: true });
      const names = new Map(campaigns.map((c) => [c.id, c.archived ? `${c.name} (archived)` : c.name]));
      const scope = all
        ? "every campaign's batches, archived campaigns' too"
        : campaign !== null
          ? `the batches of "${campaign.name}"`
          : "the batches of active campaigns (--all: every campaign's, archived too)";
      return { json: batches, text: `${scope}\n${batchTable(batches, campaign === null ? names : undefined)}` };
    },
  },
  {
    words: ['batches', 'status'],
    args: '<batch id> <planned|made|characterized>',
    summary: 'Move a batch along; --diameter and --conc record measured seed values',
    options: {
      diameter: { type: 'string', description: 'measured mean diameter, nm' },
      conc: { type: 'string', description: 'measured concentration, particles/mL' },
    },
    run: async (args, context) => {
      const idText = requirePositional(args, 0, 'batch id');
      if (!/^\d+$/.test(idText)) throw new CliError(`<batch id> must be a whole number, got "${idText}"`);
      const diameter = optionalNumber(args, 'diameter');
      const conc = optionalNumber(args, 'conc');
      const batch = await context.call('batches.setStatus', {
        id: Number(idText),
        status: requirePositional(args, 1, 'status') as BatchStatus,
        ...(diameter !== undefined || conc !== undefined
          ? {
              measured: {
                ...(diameter !== undefined ? { diameterNm: diameter } : {}),
                ...(conc !== undefined ? { particlesPerMl: conc } : {}),
              },
            }
          : {}),
      });
      return { json: batch, text: statusText(batch) };
    },
  },
  {
    words: ['inventory'],
    args: '',
    summary: 'List the inventory (amount on hand, location, lot)',
    options: {},
    run: async (_args, context) => {
      const items = await context.call('inventory.list', {});
      return { json: items, text: inventoryTable(items) };
    },
  },
  {
    words: ['inventory', 'add'],
    args: '<reagent key> <amount> <mg|g|kg|mL|L>',
    summary: 'Add an inventory entry (see pairwright catalog for the keys)',
    options: {
      location: { type: 'string', description: 'where it is kept' },
      lot: { type: 'string', description: 'lot number' },
    },
    run: async (args, context) => {
      const item = await context.call('inventory.upsert', {
        reagentKey: requirePositional(args, 0, 'reagent key'),
        amount: readNumberText(requirePositional(args, 1, 'amount'), '<amount>'),
        unit: requirePositional(args, 2, 'unit') as InventoryRecord['unit'],
        location: optionalString(args, 'location') ?? '',
        lot: optionalString(args, 'lot') ?? '',
      });
      return { json: item, text: `inventory #${item.id}: ${item.reagentName} ${item.amount} ${item.unit}` };
    },
  },
];

function inventoryTable(items: readonly InventoryRecord[]): string {
  if (items.length === 0) return 'The inventory is empty (pairwright inventory add <reagent key> <amount> <unit>).';
  return formatTable(items, [
    { header: '#', value: (i) => i.id },
    { header: 'reagent', value: (i) => i.reagentName },
    { header: 'amount', value: (i) => Number(i.amount.toPrecision(6)) },
    { header: 'unit', value: (i) => i.unit },
    { header: 'location', value: (i) => i.location },
    { header: 'lot', value: (i) => i.lot },
  ]);
}

/** The new status, then what it did to the inventory: taken or given back, warnings, unmatched reagents. */
function statusText(change: StatusChange): string {
  const lines = [`batch ${change.id} "${change.name}" is ${change.status}`];
  const effect = change.inventoryEffect;
  if (!effect) return lines.join('\n');
  const shown = (value: number) => String(Number(value.toPrecision(4)));
  lines.push(effect.kind === 'used' ? 'taken from the inventory:' : 'given back to the inventory:');
  if (effect.movements.length === 0) lines.push('  nothing');
  for (const m of effect.movements) {
    const sign = m.delta < 0 ? '-' : '+';
    lines.push(`  ${m.reagentName}: ${sign}${shown(Math.abs(m.delta))} ${m.unit} (now ${shown(m.after)} ${m.unit})`);
  }
  for (const warning of effect.warnings) lines.push(`warning: ${warning}`);
  for (const u of effect.unmatched) lines.push(`not matched: ${u.reagentName}: ${u.reason}`);
  return lines.join('\n');
}
