/**
 * Outcome commands: `sizes` and `linescan` analyse a CSV file and store nothing; `outcomes …` record
 * results on a batch.
 */
import type { BatchOutcome, CampaignConfusion, LineScanPreview, OutcomeRow, SizePreview } from '../../../shared-model/api/outcomes';
import type { CompositionMeasurement } from '../../../shared-model/characterization/composition';
import type { Estimate, LineScanModelFit } from '../../../shared-model/characterization/line-scan-fit';
import { CliError, optionalNumber, optionalString, requirePositional, requireString, type CliCommand, type ParsedArgs } from '../command';
import { formatTable } from '../table';
import { resolveCampaign } from './campaigns';

function columnOption(args: ParsedArgs, name: string): string | number | undefined {
  const value = optionalString(args, name);
  if (value === undefined) return undefined;
  return /^\d+$/.test(value.trim()) ? Number(value.trim()) : value;
}

function decimalOption(args: ParsedArgs): 'auto' | '.' | ',' {
  const value = optionalString(args, 'decimal') ?? 'auto';
  if (value !== 'auto' && value !== '.' && value !== ',') throw new CliError(`--decimal must be auto, "." or ",", got "${value}"`);
  return value;
}

const f = (value: number, digits = 3) => (Number.isFinite(value) ? value.toPrecision(digits) : String(value));
const est = (e: Estimate | null, digits = 3) => (e === null ? '–' : e.sd === null ? f(e.value, digits) : `${f(e.value, digits)} ± ${f(e.sd, 2)}`);

/** The flat JSON of `pairwright sizes`. */
export function sizesJson(preview: SizePreview) {
  const s = preview.statistics;
  const ln = preview.lognormal;
  return {
    n: s.n,
    meanNm: s.meanNm,
    sdNm: s.sdNm,
    semNm: s.semNm,
    medianNm: s.medianNm,
    minNm: s.minNm,
    maxNm: s.maxNm,
    cvPercent: s.cvPercent,
    meanInterval95Nm: s.meanInterval,
    lognormal: {
      mu: ln.mu,
      sigma: ln.sigma,
      muInterval: ln.muInterval,
      sigmaInterval: ln.sigmaInterval,
      confidenceLevel: ln.confidenceLevel,
      medianNm: ln.medianNm,
      geometricSd: ln.geometricSd,
    },
    target: s.target,
    precision: s.precision,
    histogram: preview.histogram.bins.map((b) => ({ fromNm: b.fromNm, toNm: b.toNm, count: b.count })),
    column: preview.column,
    notes: preview.importNotes,
    analysisVersion: preview.analysisVersion,
  };
}

function sizesText(preview: SizePreview): string {
  const s = preview.statistics;
  const ln = preview.lognormal;
  const lines = [
    `n = ${s.n} particles (column ${preview.column.number}${preview.column.name ? ` "${preview.column.name}"` : ''})`,
    `mean ${f(s.meanNm)} ± ${f(s.sdNm)} nm (SD), SEM ${f(s.semNm, 2)} nm, median ${f(s.medianNm)} nm, CV ${f(s.cvPercent, 3)} %`,
    `log-normal (ML): mu = ${f(ln.mu, 4)} [${f(ln.muInterval[0], 4)}, ${f(ln.muInterval[1], 4)}], sigma = ${f(ln.sigma, 3)} [${f(ln.sigmaInterval[0], 3)}, ${f(ln.sigmaInterval[1], 3)}] of ln(d/nm), 95 %`,
  ];
  if (s.target) lines.push(`target ${f(s.target.diameterNm)} nm: mean deviates by ${f(s.target.deviationNm, 2)} nm (${f(s.target.deviationPercent, 2)} %)`);
  if (s.precision) {
    lines.push(
      `for ±${f(s.precision.halfWidthNm, 2)} nm on the mean (95 %): ${s.precision.particlesNeeded} particles in all, ${s.precision.moreParticles} more to count`,
    );
  }
  for (const note of preview.importNotes) lines.push(`note: ${note}`);
  return lines.join('\n');
}

const modelRow = (m: LineScanModelFit) => ({
  model: m.label,
  bic: m.bic,
  deltaBic: m.deltaBic,
  bicWeight: m.bicWeight,
  radiusNm: m.radiusNm.value,
  radiusSdNm: m.radiusNm.sd,
  coreRadiusNm: m.coreRadiusNm?.value ?? null,
  coreRadiusSdNm: m.coreRadiusNm?.sd ?? null,
  shellThicknessNm: m.shellThicknessNm?.value ?? null,
  shellThicknessSdNm: m.shellThicknessNm?.sd ?? null,
  shellMonolayers: m.shellMonolayers?.value ?? null,
  probeSigmaNm: m.probeSigmaNm.value,
  atBounds: m.atBounds,
});

/** The flat JSON of `pairwright linescan`. */
export function lineScanJson(preview: LineScanPreview) {
  const a = preview.analysis;
  const chosen = a.models.find((m) => m.label === a.chosenModel) as LineScanModelFit;
  return {
    chosenModel: a.chosenModel,
    evidence: a.evidence,
    deltaBicToNext: a.deltaBicToNext,
    radiusNm: chosen.radiusNm.value,
    radiusSdNm: chosen.radiusNm.sd,
    coreRadiusNm: chosen.coreRadiusNm?.value ?? null,
    coreRadiusSdNm: chosen.coreRadiusNm?.sd ?? null,
    shellThicknessNm: chosen.shellThicknessNm?.value ?? null,
    shellThicknessSdNm: chosen.shellThicknessNm?.sd ?? null,
    shellMonolayers: chosen.shellMonolayers?.value ?? null,
    probeSigmaNm: chosen.probeSigmaNm.value,
    bic: Object.fromEntries(a.models.map((m) => [m.label, m.bic])),
    models: a.models.map(modelRow),
    suggestion: a.suggestion,
    points: a.points,
    unit: a.unit,
    columns: preview.columns,
    latticeNm: preview.latticeNm,
    notes: [...preview.importNotes, ...a.notes],
    analysisVersion: a.analysisVersion,
  };
}

function lineScanText(preview: LineScanPreview): string {
  const a = preview.analysis;
  const table = formatTable(a.models, [
    { header: 'model', value: (m) => `${m.label}${m.label === a.chosenModel ? ' *' : ''}` },
    { header: 'ΔBIC', value: (m) => m.deltaBic.toFixed(1), align: 'right' },
    { header: 'radius nm', value: (m) => est(m.radiusNm) },
    { header: 'core nm', value: (m) => est(m.coreRadiusNm) },
    { header: 'shell nm', value: (m) => est(m.shellThicknessNm) },
    { header: 'shell ML', value: (m) => est(m.shellMonolayers, 2) },
    { header: 'probe σ nm', value: (m) => est(m.probeSigmaNm, 2) },
  ]);
  const lines = [
    `${a.points} points (${a.unit}); columns: position ${preview.columns.position}, ${a.elementA} ${preview.columns.a}, ${a.elementB} ${preview.columns.b}`,
    table,
    `chosen: ${a.chosenModel} (${a.evidence} evidence, ΔBIC ${a.deltaBicToNext.toFixed(1)} to the next)`,
  ];
  for (const note of [...preview.importNotes, ...a.notes]) lines.push(`note: ${note}`);
  return lines.join('\n');
}

function batchIdArg(args: ParsedArgs): number {
  const text = requirePositional(args, 0, 'batch id');
  if (!/^\d+$/.test(text) || Number(text) === 0) throw new CliError(`<batch id> must be a whole number, got "${text}"`);
  return Number(text);
}

/** "48±2", "48+-2" or "48" (at.% of B, optional ± at.%) → fractions. */
export function parseAtPercent(text: string, option: string): { xB: number; uncertaintyXB: number | null } {
  const match = /^\s*([0-9]+(?:[.,][0-9]+)?)\s*(?:(?:±|\+-|\+\/-)\s*([0-9]+(?:[.,][0-9]+)?))?\s*$/.exec(text);
  if (!match) throw new CliError(`--${option} must be at.% of B with an optional uncertainty, e.g. 48±2, got "${text}"`);
  const value = Number((match[1] as string).replace(',', '.'));
  const uncertainty = match[2] !== undefined ? Number(match[2].replace(',', '.')) : null;
  return { xB: value / 100, uncertaintyXB: uncertainty === null ? null : uncertainty / 100 };
}

function outcomeText(o: BatchOutcome): string {
  const lines = [`batch ${o.batchId} "${o.batchName}": ${o.elementA}-${o.elementB}, target ${o.targetLabel ?? '–'}`];
  const size = o.sizes[o.sizes.length - 1];
  if (size) lines.push(`sizes: n = ${size.statistics.n}, mean ${f(size.statistics.meanNm)} ± ${f(size.statistics.sdNm)} nm, CV ${f(size.statistics.cvPercent)} %`);
  const composition = o.compositions[o.compositions.length - 1];
  if (composition) {
    for (const row of composition.comparison.rows) lines.push(`composition ${row.method}: ${(row.xB * 100).toFixed(1)} at.% ${o.elementB} — ${row.comment}`);
    for (const warning of composition.comparison.warnings) lines.push(`warning: ${warning.message}`);
  }
  for (const scan of o.lineScans) lines.push(`line scan ${scan.id}${scan.name ? ` "${scan.name}"` : ''}: ${scan.analysis.chosenModel} (${scan.analysis.evidence})`);
  if (o.predictions.length > 0) lines.push(`predicted: ${o.predictions.map((p) => `${p.label} (${p.source})`).join(', ')}`);
  if (o.suggestion) lines.push(`suggested: ${o.suggestion.label}`);
  lines.push(`observed: ${o.observed ? `${o.observed.label} (${o.observed.decision})` : 'not recorded'}`);
  if (o.notes) lines.push(`notes: ${o.notes}`);
  for (const file of o.files) lines.push(`file: ${file.path} (${file.kind})`);
  return lines.join('\n');
}

const rowTable = (rows: readonly OutcomeRow[]): string =>
  formatTable(rows, [
    { header: 'batch', value: (r) => r.batchId, align: 'right' },
    { header: 'name', value: (r) => r.batchName },
    { header: 'pair', value: (r) => `${r.elementA}-${r.elementB}` },
    { header: 'predicted', value: (r) => r.predicted ?? '' },
    { header: 'simulated', value: (r) => r.simulated ?? '' },
    { header: 'observed', value: (r) => r.observed ?? '' },
    { header: 'agreement', value: (r) => r.agreement ?? '' },
    { header: 'mean nm', value: (r) => (r.meanDiameterNm === null ? '' : r.meanDiameterNm.toFixed(2)), align: 'right' },
    { header: 'line scan', value: (r) => r.lineScanModel ?? '' },
  ]);

function confusionText(c: CampaignConfusion): string {
  const m = c.matrix;
  if (m.labels.length === 0) return `no batch has both an observed architecture and a ${c.against} yet`;
  const width = Math.max(10, ...m.labels.map((l) => l.length)) + 2;
  const header = `${'observed \\ ' + (c.against === 'prediction' ? 'predicted' : 'simulated')}`.padEnd(width + 12) + m.labels.map((l) => l.padStart(width)).join('');
  const body = m.labels.map((label, i) => label.padEnd(width + 12) + (m.counts[i] as number[]).map((n) => String(n).padStart(width)).join(''));
  return [header, ...body, `exact agreement ${m.exactAgreement}/${m.total}, same kind ${m.kindAgreement}/${m.total}`].join('\n');
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
    summary: 'Fit alloy, A@B, B@A and Janus models to an EDX line scan (position nm, A, B) and choose by BIC; stores nothing',
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
      if (unit !== 'auto' && unit !== 'counts' && unit !== 'atPercent') throw new CliError(`--unit must be counts, atPercent or auto, got "${unit}"`);
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
    summary: 'Record characterization of a made batch: sizes CSV, composition, line-scan CSV, observed architecture, notes, file paths',
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
      const batchId = batchIdArg(args);
      if (args.values.confirm === true && optionalString(args, 'observed') !== undefined) throw new CliError('give either --confirm or --observed, not both');
      const sizesPath = optionalString(args, 'sizes');
      const scanPath = optionalString(args, 'linescan');
      const sizesText = sizesPath !== undefined ? context.readTextFile(sizesPath) : null;
      const scanText = scanPath !== undefined ? context.readTextFile(scanPath) : null;
      const measurements: CompositionMeasurement[] = [];
      const icp = optionalString(args, 'icp');
      if (icp !== undefined) {
        const method = optionalString(args, 'icp-method') ?? 'ICP-OES';
        if (method !== 'ICP-OES' && method !== 'ICP-MS') throw new CliError(`--icp-method must be ICP-OES or ICP-MS, got "${method}"`);
        measurements.push({ method, ...parseAtPercent(icp, 'icp') });
      }
      const edx = optionalString(args, 'edx');
      if (edx !== undefined) {
        const mode = optionalString(args, 'edx-mode') ?? 'particle';
        if (mode !== 'particle' && mode !== 'area') throw new CliError(`--edx-mode must be particle or area, got "${mode}"`);
        const lines = optionalString(args, 'edx-lines');
        measurements.push({ method: mode === 'particle' ? 'EDX particle' : 'EDX area', ...parseAtPercent(edx, 'edx'), ...(lines ? { lines } : {}) });
      }
      const nominalText = optionalString(args, 'nominal');
      const grid = optionalString(args, 'grid');

      // Check the batch and both files before storing anything, so a bad file leaves no partial record.
      const before = await context.call('outcomes.get', { batchId });
      const sizeInput = {
        column: columnOption(args, 'column'),
        decimalSeparator: decimalOption(args),
        targetDiameterNm: optionalNumber(args, 'target') ?? before.targetDiameterNm,
        precisionPercent: optionalNumber(args, 'precision') ?? 2,
      };
      const probeSigmaNm = optionalNumber(args, 'probe-sigma') ?? null;
      if (sizesText !== null) await context.call('outcomes.previewSizes', { csvText: sizesText, ...sizeInput });
      if (scanText !== null) await context.call('outcomes.previewLineScan', { pair: `${before.elementA}-${before.elementB}`, csvText: scanText, probeSigmaNm });

      const added: string[] = [];
      if (sizesText !== null) {
        await context.call('outcomes.recordSizes', { batchId, csvText: sizesText, sourceFile: sizesPath ?? null, ...sizeInput });
        added.push('sizes');
      }
      if (measurements.length > 0 || nominalText !== undefined || grid !== undefined) {
        await context.call('outcomes.recordComposition', {
          batchId,
          ...(nominalText !== undefined ? { nominalXB: parseAtPercent(nominalText, 'nominal').xB } : {}),
          measurements,
          gridMetal: grid ?? null,
        });
        added.push('composition');
      }
      if (scanText !== null) {
        await context.call('outcomes.importLineScan', { batchId, csvText: scanText, sourceFile: scanPath ?? null, probeSigmaNm });
        added.push('line scan');
      }
      const reason = optionalString(args, 'reason') ?? '';
      if (args.values.confirm === true) {
        const now = await context.call('outcomes.get', { batchId });
        if (!now.suggestion) throw new CliError('--confirm needs a line scan to suggest an architecture; give --observed LABEL instead');
        await context.call('outcomes.setObserved', { batchId, label: now.suggestion.label, decision: 'confirmed', reason });
        added.push('observed (confirmed)');
      }
      const observed = optionalString(args, 'observed');
      if (observed !== undefined) {
        await context.call('outcomes.setObserved', { batchId, label: observed, decision: 'override', reason });
        added.push('observed');
      }
      const notes = optionalString(args, 'notes');
      if (notes !== undefined) {
        await context.call('outcomes.setNotes', { batchId, notes });
        added.push('notes');
      }
      const files = args.values.file;
      for (const path of Array.isArray(files) ? files : []) {
        if (typeof path === 'string') await context.call('outcomes.addFile', { batchId, path, kind: /\.(msa|emsa|spx|eds|txt)$/i.test(path) ? 'spectrum' : 'image' });
      }
      if (Array.isArray(files) && files.length > 0) added.push('files');
      if (added.length === 0) throw new CliError('nothing to add: give --sizes, --linescan, --icp, --edx, --observed, --confirm, --notes or --file');
      const outcome = await context.call('outcomes.get', { batchId });
      return { json: { added, outcome }, text: `recorded ${added.join(', ')}\n${outcomeText(outcome)}` };
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
    options: { simulation: { type: 'boolean', description: 'compare with the simulations instead of the analytic predictions' } },
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const confusion = await context.call('outcomes.confusion', { campaignId: campaign.id, against: args.values.simulation === true ? 'simulation' : 'prediction' });
      return { json: confusion, text: confusionText(confusion) };
    },
  },
];
