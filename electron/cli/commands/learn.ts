/**
 * Learning commands: `outcomes import-table` (a history table into a campaign; all rows or none),
 * `prices set / list` (metal prices per gram with their date), `learn` (retrain as a job, wait for it,
 * print the model review), `propose` (next batches from the stored model) and `demo history` (write the
 * invented demo history table). Each calls the same operations as the app.
 */
import type { LearnJob, ProposalSet, StoredReview } from '../../../shared-model/api/learn';
import { DEMO_HISTORY_ROWS, demoHistoryCsv } from '../../../shared-model/learn/demo-history';
import { formatCostPerBatch, meetsTargetText } from '../../../shared-model/learn/proposals';
import { priorSourcesText } from '../../../shared-model/learn/screen-prior';
import {
  CliError,
  optionalNumber,
  optionalString,
  readNumberText,
  requirePositional,
  requireString,
  type CliCommand,
  type CliContext,
} from '../command';
import { formatTable } from '../table';
import { resolveCampaign } from './campaigns';

const pct = (v: number) => `${(100 * v).toFixed(1)} %`;

async function waitForJob(context: CliContext, job: LearnJob): Promise<LearnJob> {
  let current = job;
  while (current.status === 'running') {
    await new Promise((resolve) => setTimeout(resolve, 150));
    current = await context.call('learn.job', { jobId: job.id });
  }
  return current;
}

function reviewJson(stored: StoredReview): Record<string, unknown> {
  const r = stored.review;
  const common = {
    modelId: stored.modelId,
    modelVersion: stored.modelVersion,
    trainedOn: stored.trainedOn,
    outcomes: r.outcomes,
    failed: r.failed,
  };
  if (r.status === 'too-few') {
    return {
      ...common,
      status: r.status,
      message: r.message,
      minOutcomes: r.minOutcomes,
      classes: r.classes.map((c) => c.key),
      physics: r.physics,
    };
  }
  return {
    ...common,
    status: r.status,
    classes: r.classes.map((c) => c.key),
    classCounts: Object.fromEntries(r.classes.map((c) => [c.key, c.count])),
    validation: r.validation,
    pairs: r.pairs,
    priorWeight: r.priorWeight,
    priorWeightTuning: r.priorWeightTuning,
    // models stored before the note was written have none
    priorWeightNote: (r.priorWeightNote as string | undefined) ?? null,
    // which source labelled each pseudo-outcome (Monte Carlo runs or the analytic prediction); null in older models
    prior: r.prior ?? null,
    model: r.model,
    physics: r.physics,
    majority: r.majority,
    // reviews stored before the validation caps were written have no note
    validationNote: r.validationNote ?? null,
    knownPairsNewConditions: {
      model: { accuracy: r.knownPairsNewConditions.model.accuracy },
      physics: { accuracy: r.knownPairsNewConditions.physics.accuracy },
      heldOut: r.knownPairsNewConditions.heldOut ?? 'each outcome held out alone',
    },
    timeline: r.timeline,
    loadings: (r.lda?.loadings ?? []).map((l) => ({ descriptor: l.descriptor, weight: l.weight, weight2: l.weight2 })),
    ldaNote: r.ldaNote,
  };
}

function reviewText(stored: StoredReview): string {
  const r = stored.review;
  if (r.status === 'too-few') return `model ${stored.modelId}: too few data — ${r.message}`;
  const line = (name: string, f: typeof r.model) =>
    `${name.padEnd(9)} accuracy ${pct(f.accuracy)} (${f.errors} errors of ${f.rows}), ` +
    `balanced ${pct(f.balancedAccuracy)}, ` +
    `log-loss ${f.logLoss.toFixed(3)} (ln K = ${f.uniformLogLoss.toFixed(3)}), Brier ${f.brier.toFixed(3)}`;
  return [
    `model ${stored.modelId} (${stored.modelVersion}), ${r.outcomes} labelled outcomes over ${r.pairs} pairs, ` +
      `${r.failed} failed; ` +
      `classes ${r.classes.map((c) => `${c.key} ${c.count}`).join(', ')}; physics prior weight ${r.priorWeight}`,
    'validation: leave-one-pair-out (every outcome of a pair held out together)',
    ...((r.priorWeightNote as string | undefined) ? [r.priorWeightNote] : []),
    ...(r.prior ? [priorSourcesText(r.prior)] : []),
    line('model', r.model),
    line('physics', r.physics),
    line('majority', r.majority),
    `known pairs, new conditions (${r.knownPairsNewConditions.heldOut ?? 'each outcome held out alone'}): ` +
      `model ${pct(r.knownPairsNewConditions.model.accuracy)}`,
    ...(r.validationNote ? [`validation: ${r.validationNote}`] : []),
    r.lda
      ? `descriptors that separate the architectures: ${r.lda.loadings
          .slice(0, 4)
          .map((l) => `${l.descriptor} ${l.weight.toFixed(2)}`)
          .join(', ')}`
      : (r.ldaNote ?? ''),
  ].join('\n');
}

export const learnCommands: CliCommand[] = [
  {
    words: ['outcomes', 'import-table'],
    args: '<campaign> <FILE.csv>',
    summary: 'Import a history table (pair, xB_at_pct, diameter_nm, temperature_k, route, observed[, made_on, notes])',
    options: {
      'allow-duplicates': { type: 'boolean', description: 'import even if the same table was imported before' },
    },
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const file = requirePositional(args, 1, 'FILE.csv');
      const result = await context.call('learn.importHistory', {
        campaignId: campaign.id,
        csvText: context.readTextFile(file),
        fileName: file,
        allowDuplicates: args.values['allow-duplicates'] === true,
      });
      const labels = Object.entries(result.labels)
        .map(([k, v]) => `${k} ${v}`)
        .join(', ');
      return {
        json: result,
        text: `imported ${result.rows} rows into campaign ${campaign.id} "${campaign.name}" as history (${labels})`,
      };
    },
  },
  {
    words: ['prices', 'set'],
    args: '<metal> <price per gram>',
    summary: 'Enter the price per gram of a metal (kept with its date)',
    options: {
      currency: { type: 'string', description: 'currency code (default EUR)' },
      date: { type: 'string', description: 'date of the price, YYYY-MM-DD (default today)' },
    },
    run: async (args, context) => {
      const symbol = requirePositional(args, 0, 'metal');
      const priceText = requirePositional(args, 1, 'price per gram');
      const pricePerGram = readNumberText(priceText, '<price per gram>');
      const price = await context.call('learn.setPrice', {
        symbol,
        pricePerGram,
        currency: optionalString(args, 'currency') ?? 'EUR',
        pricedOn: optionalString(args, 'date') ?? new Date().toISOString().slice(0, 10),
      });
      return { json: price, text: `${price.symbol}: ${price.pricePerGram} ${price.currency}/g on ${price.pricedOn}` };
    },
  },
  {
    words: ['prices', 'list'],
    args: '',
    summary: 'Latest metal prices per gram',
    options: {},
    run: async (_args, context) => {
      const prices = await context.call('learn.prices', {});
      const text = formatTable(prices.latest, [
        { header: 'metal', value: (p) => p.symbol },
        { header: 'per gram', value: (p) => p.pricePerGram, align: 'right' },
        { header: 'currency', value: (p) => p.currency },
        { header: 'priced on', value: (p) => p.pricedOn },
      ]);
      return { json: prices, text };
    },
  },
  {
    words: ['learn'],
    args: '<campaign>',
    summary: "Retrain the campaign's model from its outcomes and print the leave-one-pair-out review",
    options: {
      'prior-weight': { type: 'string', description: 'weight of each physics pseudo-outcome (default: tuned)' },
    },
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const weight = optionalNumber(args, 'prior-weight');
      const job = await context.call('learn.retrain', {
        campaignId: campaign.id,
        ...(weight === undefined ? {} : { priorWeight: weight }),
      });
      const end = await waitForJob(context, job);
      if (end.status !== 'done') throw new CliError(`the retrain ${end.status}: ${end.error ?? ''}`);
      const { stored } = await context.call('learn.review', { campaignId: campaign.id });
      if (!stored) throw new CliError('the retrain finished but no model was stored');
      return { json: reviewJson(stored), text: reviewText(stored) };
    },
  },
  {
    words: ['propose'],
    args: '<campaign>',
    summary: 'Propose next batches for a target from the stored model (run pairwright learn first)',
    options: {
      target: { type: 'string', description: 'alloy, core@shell, core@shell:X, Janus or intermetallic' },
      count: { type: 'string', description: 'number of proposals (default 6)' },
      exploration: { type: 'string', description: 'exploration slots (default 1)' },
      'include-failed': { type: 'boolean', description: 'propose again where a synthesis failed' },
      seed: { type: 'string', description: 'seed of the posterior draws (default 1)' },
    },
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const whole = (name: string) => {
        const v = optionalNumber(args, name);
        if (v !== undefined && !Number.isInteger(v)) throw new CliError(`--${name} must be a whole number, got ${v}`);
        return v;
      };
      const count = whole('count');
      const exploration = whole('exploration');
      const seed = whole('seed');
      const set: ProposalSet = await context.call('learn.propose', {
        campaignId: campaign.id,
        target: requireString(args, 'target'),
        ...(count === undefined ? {} : { count }),
        ...(exploration === undefined ? {} : { explorationSlots: exploration }),
        ...(seed === undefined ? {} : { seed }),
        includeFailed: args.values['include-failed'] === true,
      });
      const table = formatTable(set.proposals, [
        { header: 'pair', value: (p) => p.pair },
        { header: 'xB', value: (p) => p.xB.toFixed(2), align: 'right' },
        { header: 'd nm', value: (p) => p.diameterNm, align: 'right' },
        { header: 'route', value: (p) => p.route },
        { header: 'P', value: (p) => p.probability.toFixed(2), align: 'right' },
        { header: 'P ok', value: (p) => p.successProbability.toFixed(2), align: 'right' },
        { header: 'cost', value: (p) => formatCostPerBatch(p.costPerBatch, p.currency), align: 'right' },
        { header: 'meets', value: (p) => meetsTargetText(p.meetsTarget, set.threshold) },
        { header: 'explore', value: (p) => (p.exploration ? 'yes' : '') },
        { header: 'reason', value: (p) => p.reason },
      ]);
      const notes = [set.costNote, set.targetNote].filter((n): n is string => n !== null);
      const header =
        `target: ${set.target}; ${set.meeting} of ${set.proposals.length} proposals meet it ` +
        `(posterior mean P(target) ≥ ${set.threshold}); cost per batch for ${set.metalMmolPerBatch} mmol of metal`;
      return {
        json: set,
        text: [
          header,
          ...(set.meetingNote ? [set.meetingNote] : []),
          table,
          ...notes,
          `model ${set.modelId} (${set.modelVersion}), proposal set ${set.id}`,
        ].join('\n'),
      };
    },
  },
  {
    words: ['demo', 'history'],
    args: '[FILE.csv]',
    summary: 'Write the invented 70-row demo history table (demo data) to a file you can import',
    options: {},
    run: (args, context) => {
      const file = args.positionals[0] ?? 'pairwright-demo-history.csv';
      context.writeTextFile(file, demoHistoryCsv());
      return Promise.resolve({
        json: { file, rows: DEMO_HISTORY_ROWS, demo: true },
        text:
          `wrote ${file} (${DEMO_HISTORY_ROWS} invented rows: demo data). ` +
          `Import it: pairwright outcomes import-table <campaign> ${file}`,
      });
    },
  },
];
