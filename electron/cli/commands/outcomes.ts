/**
 * Outcome commands: `sizes` and `linescan` analyse a CSV file and store nothing; `outcomes add` records what
 * was measured on a batch in one call of `outcomes.record` (one transaction: all of it or nothing);
 * `outcomes show / list / confusion` read. How they print is in outcome-format.ts.
 */
import type { OperationInput } from '../../../shared-model/api/contract';
import type { OutcomePart } from '../../../shared-model/api/outcomes';
import type { CompositionMeasurement } from '../../../shared-model/characterization/composition';
import {
  CliError,
  optionalNumber,
  optionalString,
  readNumberText,
  requirePositional,
  requireString,
  type CliCommand,
  type CliContext,
  type ParsedArgs,
} from '../command';
import { resolveCampaign } from './campaigns';
import {
  confusionText,
  lineScanJson,
  lineScanText,
  outcomeText,
  rowTable,
  sizesJson,
  sizesText,
} from './outcome-format';

function columnOption(args: ParsedArgs, name: string): string | number | undefined {
  const value = optionalString(args, name);
  if (value === undefined) return undefined;
  return /^\d+$/.test(value.trim()) ? Number(value.trim()) : value;
}

function decimalOption(args: ParsedArgs): 'auto' | '.' | ',' {
  const value = optionalString(args, 'decimal') ?? 'auto';
  if (value !== 'auto' && value !== '.' && value !== ',')
    throw new CliError(`--decimal must be auto, "." or ",", got "${value}"`);
  return value;
}

function batchIdArg(args: ParsedArgs): number {
  const text = requirePositional(args, 0, 'batch id');
  if (!/^\d+$/.test(text) || Number(text) === 0) throw new CliError(`<batch id> must be a whole number, got "${text}"`);
  return Number(text);
}

/** "48±2", "48+-2" or "48" (at.% of B, optional ± at.%) → fractions. */
export function parseAtPercent(text: string, option: string): { xB: number; uncertaintyXB: number | null } {
  const match = /^\s*([0-9]+(?:[.,][0-9]+)?)\s*(?:(?:±|\+-|\+\/-)\s*([0-9]+(?:[.,][0-9]+)?))?\s*$/.exec(text);
  if (!match)
    throw new CliError(`--${option} must be at.% of B with an optional uncertainty, e.g. 48±2, got "${text}"`);
  const value = readNumberText(match[1] as string, `--${option}`);
  const uncertainty = match[2] !== undefined ? readNumberText(match[2], `--${option} uncertainty`) : null;
  return { xB: value / 100, uncertaintyXB: uncertainty === null ? null : uncertainty / 100 };
}

function compositionMeasurements(args: ParsedArgs): CompositionMeasurement[] {
  const measurements: CompositionMeasurement[] = [];
  const icp = optionalString(args, 'icp');
  if (icp !== undefined) {
    const method = optionalString(args, 'icp-method') ?? 'ICP-OES';
    if (method !== 'ICP-OES' && method !== 'ICP-MS')
      throw new CliError(`--icp-method must be ICP-OES or ICP-MS, got "${method}"`);
    measurements.push({ method, ...parseAtPercent(icp, 'icp') });
  }
  const edx = optionalString(args, 'edx');
  if (edx !== undefined) {
    const mode = optionalString(args, 'edx-mode') ?? 'particle';
    if (mode !== 'particle' && mode !== 'area')
      throw new CliError(`--edx-mode must be particle or area, got "${mode}"`);
    const lines = optionalString(args, 'edx-lines');
    const method = mode === 'particle' ? 'EDX particle' : 'EDX area';
    measurements.push({ method, ...parseAtPercent(edx, 'edx'), ...(lines ? { lines } : {}) });
  }
  return measurements;
}

type RecordRequest = OperationInput<'outcomes.record'>;

/** A spectrum by its file extension, an image otherwise. */
const fileKind = (path: string) => (/\.(msa|emsa|spx|eds|txt)$/i.test(path) ? 'spectrum' : 'image');

/** The flags of `outcomes add` as the one `outcomes.record` input (the files are read here, nothing is stored). */
function outcomeRecordInput(args: ParsedArgs, context: CliContext): RecordRequest {
  const batchId = batchIdArg(args);
  const observed = optionalString(args, 'observed');
  const confirm = args.values.confirm === true;
  if (confirm && observed !== undefined) throw new CliError('give either --confirm or --observed, not both');
  const input: RecordRequest = { batchId };
  const decimalSeparator = decimalOption(args);
  const sizesPath = optionalString(args, 'sizes');
  if (sizesPath !== undefined) {
    const target = optionalNumber(args, 'target');
    input.sizes = {
      csvText: context.readTextFile(sizesPath),
      sourceFile: sizesPath,
      column: columnOption(args, 'column'),
      decimalSeparator,
      // Without --target the service takes the batch design's diameter.
      ...(target !== undefined ? { targetDiameterNm: target } : {}),
      precisionPercent: optionalNumber(args, 'precision') ?? 2,
    };
  }
  const measurements = compositionMeasurements(args);
  const nominal = optionalString(args, 'nominal');
  const grid = optionalString(args, 'grid');
  if (measurements.length > 0 || nominal !== undefined || grid !== undefined) {
    input.composition = {
      ...(nominal !== undefined ? { nominalXB: parseAtPercent(nominal, 'nominal').xB } : {}),
      measurements,
      gridMetal: grid ?? null,
    };
  }
  const scanPath = optionalString(args, 'linescan');
  if (scanPath !== undefined) {
    input.lineScan = {
      csvText: context.readTextFile(scanPath),
      sourceFile: scanPath,
      decimalSeparator,
      probeSigmaNm: optionalNumber(args, 'probe-sigma') ?? null,
    };
  }
  const reason = optionalString(args, 'reason') ?? '';
  if (confirm) input.observed = { decision: 'confirmed', reason };
  if (observed !== undefined) input.observed = { decision: 'override', label: observed, reason };
  const notes = optionalString(args, 'notes');
  if (notes !== undefined) input.notes = notes;
  const files = args.values.file;
  const paths = (Array.isArray(files) ? files : []).filter((path): path is string => typeof path === 'string');
  if (paths.length > 0) input.files = paths.map((path) => ({ path, kind: fileKind(path) }));
  if (!Object.keys(input).some((key) => key !== 'batchId')) {
    throw new CliError(
      'nothing to add: give --sizes, --linescan, --icp, --edx, --observed, --confirm, --notes or --file',
    );
  }
  return input;
}

/** How `outcomes add` names a stored part in its answer. */
function addedLabel(part: OutcomePart, input: RecordRequest): string {
  if (part === 'lineScan') return 'line scan';
  if (part === 'observed') return input.observed?.decision === 'confirmed' ? 'observed (confirmed)' : 'observed';
  return part;
}

export const outcomeCommands: CliCommand[] = [
  {
    words: ['sizes'],
    args: '<diameters.csv>',
    summary: 'TEM size statistics and log-normal fit of a CSV of particle diameters (nm); stores nothing',
    options: {
      column: { type: 'string', description: 'column holding the diameters (header name or number from 1)' },
      decimal: { type: 'string', description: 'decimal separator: auto (default), "." or ","' },
      target: { type: 'string', description: 'target diameter, nm' },
      precision: { type: 'string', description: 'wanted ± precision of the mean, % (default 2)' },
    },
    run: async (args, context) => {
      const path = requirePositional(args, 0, 'diameters.csv');
      const preview = await context.call('outcomes.previewSizes', {
        csvText: context.readTextFile(path),
        column: columnOption(args, 'column'),
        decimalSeparator: decimalOption(args),
        targetDiameterNm: optionalNumber(args, 'target') ?? null,
        precisionPercent: optionalNumber(args, 'precision') ?? 2,
      });
      return { json: sizesJson(preview), text: sizesText(preview) };
    },
  },
  {
    words: ['linescan'],
    args: '<scan.csv>',
    summary:
      'Fit alloy, A@B, B@A and Janus models to an EDX line scan (position nm, A, B) and choose by BIC; stores nothing',
    options: {
      pair: { type: 'string', description: 'the pair A-B, e.g. Au-Pd (required)' },
      'position-column': { type: 'string', description: 'position column (name or number)' },
      'a-column': { type: 'string', description: 'column of element A' },
      'b-column': { type: 'string', description: 'column of element B' },
      unit: { type: 'string', description: 'counts, atPercent or auto (default)' },
      'probe-sigma': { type: 'string', description: 'probe σ in nm when known (fitted otherwise)' },
      decimal: { type: 'string', description: 'decimal separator: auto (default), "." or ","' },
    },
    run: async (args, context) => {
      const path = requirePositional(args, 0, 'scan.csv');
      const unit = optionalString(args, 'unit') ?? 'auto';
      if (unit !== 'auto' && unit !== 'counts' && unit !== 'atPercent')
        throw new CliError(`--unit must be counts, atPercent or auto, got "${unit}"`);
      const preview = await context.call('outcomes.previewLineScan', {
        pair: requireString(args, 'pair'),
        csvText: context.readTextFile(path),
        positionColumn: columnOption(args, 'position-column'),
        aColumn: columnOption(args, 'a-column'),
        bColumn: columnOption(args, 'b-column'),
        unit,
        decimalSeparator: decimalOption(args),
        probeSigmaNm: optionalNumber(args, 'probe-sigma') ?? null,
      });
      return { json: lineScanJson(preview), text: lineScanText(preview) };
    },
  },
  {
    words: ['outcomes', 'add'],
    args: '<batch id>',
    summary:
      'Record characterization of a made batch: sizes CSV, composition, line-scan CSV, observed architecture, notes, ' +
      'file paths; all of it is stored or none',
    options: {
      sizes: { type: 'string', description: 'CSV of particle diameters (nm)' },
      column: { type: 'string', description: 'diameter column (name or number)' },
      decimal: { type: 'string', description: 'decimal separator of the CSV files: auto (default), "." or ","' },
      target: { type: 'string', description: 'target diameter, nm (default: the batch design)' },
      precision: { type: 'string', description: 'wanted ± precision of the mean, % (default 2)' },
      linescan: { type: 'string', description: 'CSV of an EDX line scan (position nm, A, B)' },
      'probe-sigma': { type: 'string', description: 'probe σ in nm when known (fitted otherwise)' },
      nominal: { type: 'string', description: 'nominal at.% of B (default: the batch design)' },
      icp: { type: 'string', description: 'bulk analysis, at.% of B with uncertainty, e.g. 48±2' },
      'icp-method': { type: 'string', description: 'ICP-OES (default) or ICP-MS' },
      edx: { type: 'string', description: 'EDX at.% of B with uncertainty, e.g. 39±4' },
      'edx-mode': { type: 'string', description: 'particle (default) or area' },
      'edx-lines': { type: 'string', description: 'X-ray lines used, e.g. "Au L, Pd K"' },
      grid: { type: 'string', description: 'TEM grid metal, e.g. Cu' },
      observed: { type: 'string', description: 'observed architecture label (override), e.g. Pd@Au' },
      confirm: { type: 'boolean', description: 'confirm the architecture suggested by the line scan' },
      reason: { type: 'string', description: 'reason for the observed label' },
      notes: { type: 'string', description: 'free-text notes' },
      file: { type: 'string', multiple: true, description: 'path of an original image or spectrum (repeatable)' },
    },
    run: async (args, context) => {
      const input = outcomeRecordInput(args, context);
      const stored = await context.call('outcomes.record', input);
      const added = stored.recorded.map((part) => addedLabel(part, input));
      return {
        json: { added, outcome: stored.outcome },
        text: `recorded ${added.join(', ')}\n${outcomeText(stored.outcome)}`,
      };
    },
  },
  {
    words: ['outcomes', 'show'],
    args: '<batch id>',
    summary: 'What is recorded for a batch',
    options: {},
    run: async (args, context) => {
      const outcome = await context.call('outcomes.get', { batchId: batchIdArg(args) });
      return { json: outcome, text: outcomeText(outcome) };
    },
  },
  {
    words: ['outcomes', 'list'],
    args: '<campaign>',
    summary: 'Prediction vs outcome for every batch of a campaign',
    options: {},
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const rows = await context.call('outcomes.listByCampaign', { campaignId: campaign.id });
      return { json: rows, text: rowTable(rows) };
    },
  },
  {
    words: ['outcomes', 'confusion'],
    args: '<campaign>',
    summary: 'Confusion matrix of predicted (or --simulation) vs observed architectures',
    options: {
      simulation: { type: 'boolean', description: 'compare with the simulations instead of the analytic predictions' },
    },
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const confusion = await context.call('outcomes.confusion', {
        campaignId: campaign.id,
        against: args.values.simulation === true ? 'simulation' : 'prediction',
      });
      return { json: confusion, text: confusionText(confusion) };
    },
  },
];
