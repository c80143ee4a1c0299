/**
 * How the outcome commands print: the flat JSON of `sizes` and `linescan`, and the text (sentences and
 * tables) of every outcome command. Formatting only: nothing here calls an operation.
 */
import type {
  BatchOutcome,
  CampaignConfusion,
  LineScanPreview,
  OutcomeRow,
  SizePreview,
} from '../../../shared-model/api/outcomes';
import type { Estimate, LineScanModelFit } from '../../../shared-model/characterization/line-scan-fit';
import { formatTable } from '../table';

const f = (value: number, digits = 3) => (Number.isFinite(value) ? value.toPrecision(digits) : String(value));
const est = (e: Estimate | null, digits = 3) =>
  e === null ? '–' : e.sd === null ? f(e.value, digits) : `${f(e.value, digits)} ± ${f(e.sd, 2)}`;

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

export function sizesText(preview: SizePreview): string {
  const s = preview.statistics;
  const ln = preview.lognormal;
  const lines = [
    `n = ${s.n} particles (column ${preview.column.number}${preview.column.name ? ` "${preview.column.name}"` : ''})`,
    `mean ${f(s.meanNm)} ± ${f(s.sdNm)} nm (SD), SEM ${f(s.semNm, 2)} nm, median ${f(s.medianNm)} nm, ` +
      `CV ${f(s.cvPercent, 3)} %`,
    `log-normal (ML): mu = ${f(ln.mu, 4)} [${f(ln.muInterval[0], 4)}, ${f(ln.muInterval[1], 4)}], ` +
      `sigma = ${f(ln.sigma, 3)} [${f(ln.sigmaInterval[0], 3)}, ${f(ln.sigmaInterval[1], 3)}] of ln(d/nm), 95 %`,
  ];
  if (s.target)
    lines.push(
      `target ${f(s.target.diameterNm)} nm: mean deviates by ${f(s.target.deviationNm, 2)} nm ` +
        `(${f(s.target.deviationPercent, 2)} %)`,
    );
  if (s.precision) {
    lines.push(
      `for ±${f(s.precision.halfWidthNm, 2)} nm on the mean (95 %): ` +
        `${s.precision.particlesNeeded} particles in all, ${s.precision.moreParticles} more to count`,
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

export function lineScanText(preview: LineScanPreview): string {
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
    `${a.points} points (${a.unit}); columns: position ${preview.columns.position}, ` +
      `${a.elementA} ${preview.columns.a}, ${a.elementB} ${preview.columns.b}`,
    table,
    `chosen: ${a.chosenModel} (${a.evidence} evidence, ΔBIC ${a.deltaBicToNext.toFixed(1)} to the next)`,
  ];
  for (const note of [...preview.importNotes, ...a.notes]) lines.push(`note: ${note}`);
  return lines.join('\n');
}

export function outcomeText(o: BatchOutcome): string {
  const lines = [`batch ${o.batchId} "${o.batchName}": ${o.elementA}-${o.elementB}, target ${o.targetLabel ?? '–'}`];
  const size = o.sizes[o.sizes.length - 1];
  if (size)
    lines.push(
      `sizes: n = ${size.statistics.n}, mean ${f(size.statistics.meanNm)} ± ${f(size.statistics.sdNm)} nm, ` +
        `CV ${f(size.statistics.cvPercent)} %`,
    );
  const composition = o.compositions[o.compositions.length - 1];
  if (composition) {
    for (const row of composition.comparison.rows)
      lines.push(`composition ${row.method}: ${(row.xB * 100).toFixed(1)} at.% ${o.elementB} — ${row.comment}`);
    for (const warning of composition.comparison.warnings) lines.push(`warning: ${warning.message}`);
  }
  for (const scan of o.lineScans)
    lines.push(
      `line scan ${scan.id}${scan.name ? ` "${scan.name}"` : ''}: ` +
        `${scan.analysis.chosenModel} (${scan.analysis.evidence})`,
    );
  if (o.predictions.length > 0)
    lines.push(`predicted: ${o.predictions.map((p) => `${p.label} (${p.source})`).join(', ')}`);
  if (o.suggestion) lines.push(`suggested: ${o.suggestion.label}`);
  lines.push(`observed: ${o.observed ? `${o.observed.label} (${o.observed.decision})` : 'not recorded'}`);
  if (o.notes) lines.push(`notes: ${o.notes}`);
  for (const file of o.files) lines.push(`file: ${file.path} (${file.kind})`);
  return lines.join('\n');
}

export const rowTable = (rows: readonly OutcomeRow[]): string =>
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

export function confusionText(c: CampaignConfusion): string {
  const m = c.matrix;
  if (m.labels.length === 0) return `no batch has both an observed architecture and a ${c.against} yet`;
  const width = Math.max(10, ...m.labels.map((l) => l.length)) + 2;
  const header =
    `${'observed \\ ' + (c.against === 'prediction' ? 'predicted' : 'simulated')}`.padEnd(width + 12) +
    m.labels.map((l) => l.padStart(width)).join('');
  const body = m.labels.map(
    (label, i) => label.padEnd(width + 12) + (m.counts[i] as number[]).map((n) => String(n).padStart(width)).join(''),
  );
  return [
    header,
    ...body,
    `exact agreement ${m.exactAgreement}/${m.total}, same kind ${m.kindAgreement}/${m.total}`,
  ].join('\n');
}
