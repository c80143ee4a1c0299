/**
 * Outcome commands: `sizes` and `linescan` analyse a CSV file and store nothing; `outcomes …` record
 * results on a batch.
 */
import type { LineScanPreview, SizePreview } from '../../../shared-model/api/outcomes';
import type { Estimate, LineScanModelFit } from '../../../shared-model/characterization/line-scan-fit';
import { CliError, optionalNumber, optionalString, requirePositional, requireString, type CliCommand, type ParsedArgs } from '../command';
import { formatTable } from '../table';

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
];
