/**
 * Campaign screen service: plans the runs for every pair of a campaign's elements (skipping, with why,
 * pairs without tight-binding parameters), queues them on the store's Monte Carlo queue (all cores but
 * one), and answers progress, per-run status and the pair × pair matrix beside the analytic prediction.
 */
import { listPairs } from '../../db/repositories/pairs';
import { getCampaign } from '../../db/repositories/campaigns';
import { getRunSummary } from '../../db/repositories/simulation';
import { DomainError } from '../../shared-model/api/result';
import type { screenOperations, ScreenStatus } from '../../shared-model/api/screen';
import type { SimulationRunSummary } from '../../shared-model/api/simulation';
import { planScreen, screenCells } from '../../shared-model/montecarlo/screen';
import { predictPair } from '../../shared-model/prediction/predict';
import { queueFor } from '../workers/montecarlo-queue';
import type { HandlerMap } from './context';

/** Label of every run of a screen: "screen <campaign> <ISO time>" (the runs list shows it). */
function screenLabel(campaignName: string): string {
  return `screen ${campaignName} ${new Date().toISOString()}`;
}

function predictionFor(run: SimulationRunSummary): string | null {
  const spec = run.spec;
  if (spec.diameterNm === undefined) return null;
  try {
    return predictPair(spec.elementA, spec.elementB, {
      xB: spec.xB,
      diameterNm: spec.diameterNm,
      shape: spec.shape,
      temperatureK: spec.temperatureK,
    }).architecture;
  } catch (error) {
    if (error instanceof DomainError) return `no prediction: ${error.message}`;
    throw error;
  }
}

export const screenHandlers: HandlerMap<keyof typeof screenOperations> = {
  'screen.start': (input, { store }) => {
    const campaign = getCampaign(store.db, input.campaignId);
    const pairs = listPairs(store.db, campaign.id);
    const elements: string[] = [];
    for (const pair of pairs)
      for (const symbol of [pair.elementA, pair.elementB]) if (!elements.includes(symbol)) elements.push(symbol);
    const plan = planScreen({
      elements,
      xB: input.xB,
      diameterNm: input.diameterNm,
      temperatureK: input.temperatureK,
      shape: input.shape,
      sweeps: input.sweeps,
      seed: input.seed,
    });
    const label = screenLabel(campaign.name);
    const queue = queueFor(store);
    // Every spec was checked by planScreen before the first run is stored; the inserts share one transaction.
    const runs = store.db.transaction(() =>
      plan.runs.map((run) => {
        const pair = pairs.find(
          (p) =>
            (p.elementA === run.elementA && p.elementB === run.elementB) ||
            (p.elementA === run.elementB && p.elementB === run.elementA),
        );
        const stored = queue.enqueue(run.spec, label, pair?.id ?? null);
        return {
          runId: stored.id,
          elementA: run.elementA,
          elementB: run.elementB,
          xB: run.xB,
          diameterNm: run.diameterNm,
        };
      }),
    )();
    return {
      label,
      campaignId: campaign.id,
      elements: plan.elements,
      runs,
      skipped: plan.skipped,
      concurrency: queue.concurrency,
    };
  },

  'screen.status': ({ runIds }, { store }) => {
    const queue = queueFor(store);
    queue.expireSilent();
    const summaries = runIds.map((id) => getRunSummary(store.db, id));
    let progress = 0;
    let finished = 0;
    let first: number | null = null;
    let last: number | null = null;
    const runs: ScreenStatus['runs'] = [];
    const sources = [];
    for (const run of summaries) {
      const ended = run.status !== 'queued' && run.status !== 'running';
      if (ended) finished++;
      progress += ended
        ? 1
        : run.progress
          ? Math.min(1, run.progress.sweep / Math.max(1, run.progress.totalSweeps))
          : 0;
      if (run.startedAt) first = Math.min(first ?? Infinity, Date.parse(run.startedAt));
      if (run.finishedAt) last = Math.max(last ?? -Infinity, Date.parse(run.finishedAt));
      const entry = {
        runId: run.id,
        elementA: run.spec.elementA,
        elementB: run.spec.elementB,
        xB: run.spec.xB,
        diameterNm: run.spec.diameterNm ?? 0,
      };
      runs.push({
        ...entry,
        status: run.status,
        architecture: run.architecture,
        surfaceXB: run.surfaceXB,
        error: run.error,
      });
      sources.push({ ...entry, status: run.status, architecture: run.architecture, prediction: predictionFor(run) });
    }
    const compositions = [...new Set(runs.map((r) => r.xB))].sort((a, b) => a - b);
    const allCompositions = [
      ...new Set([...compositions, ...compositions.map((x) => Math.round((1 - x) * 1e9) / 1e9)]),
    ].sort((a, b) => a - b);
    const elements: string[] = [];
    for (const r of runs) for (const s of [r.elementA, r.elementB]) if (!elements.includes(s)) elements.push(s);
    return {
      total: runs.length,
      finished,
      progress: runs.length > 0 ? progress / runs.length : 1,
      runs,
      cells: screenCells(sources, compositions),
      elements,
      compositions: allCompositions.filter((x) => compositions.some((c) => Math.abs(c - x) < 1e-9)),
      diameters: [...new Set(runs.map((r) => r.diameterNm))].sort((a, b) => a - b),
      elapsedMs: first !== null && last !== null && finished === runs.length ? last - first : null,
    };
  },

  'screen.cancel': ({ runIds }, { store }) => {
    const queue = queueFor(store);
    let cancelled = 0;
    for (const id of runIds) {
      const run = queue.summary(id);
      if (run.status === 'queued' || run.status === 'running') {
        queue.cancel(id);
        cancelled++;
      }
    }
    return { cancelled };
  },
};
