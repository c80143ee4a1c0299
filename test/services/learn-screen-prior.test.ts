/**
 * Monte Carlo runs in the physics prior, on a real SQLite file: finished runs of the campaign (its screens by
 * label, runs linked to its pairs) label the prior's pseudo-outcomes at matching conditions, the review and
 * the stored model say how many came from Monte Carlo, and the learned model moves toward the run's answer.
 * Runs are real Monte Carlo (rigid, 40 sweeps of a 3 nm cuboctahedron) stored through the owning repository;
 * the history is part of the demo history (demo data, invented).
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { latestModel } from '../../db/repositories/learning';
import { insertRun, saveResult } from '../../db/repositories/simulation';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { campaignMonteCarloLabels } from '../../electron/services/learn-screen-prior';
import { shutdownServices } from '../../electron/services/lifecycle';
import { learnJobsFor } from '../../electron/workers/learn-jobs';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { LearnJob, StoredReview } from '../../shared-model/api/learn';
import { buildCandidates } from '../../shared-model/learn/candidates';
import { canonicalCondition } from '../../shared-model/learn/conditions';
import { demoHistoryCsv } from '../../shared-model/learn/demo-history';
import { classifierProbabilities } from '../../shared-model/learn/outcome-model';
import type { ModelReview } from '../../shared-model/learn/review';
import { runSimulation, type SimulationSpec } from '../../shared-model/montecarlo/simulate';
import { createRandom } from '../../shared-model/random';
import { dispatchValue } from '../support/dispatch';
import { tempDataDir } from '../support/host-fixture';
import { TIMEOUTS } from '../support/timeouts';

let store: Store;
let context: ServiceContext;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  context = { store };
});
afterEach(async () => {
  await shutdownServices(store);
});

// The first 24 rows of the demo history: enough pairs and architectures for a ready review, and a quick retrain.
const HISTORY = demoHistoryCsv().split('\n').slice(0, 25).join('\n');

const ok = <T>(name: string, input: unknown): Promise<T> => dispatchValue<T>(context, name, input);

/** A real run stored as finished (the architecture is what its classifier found). */
function storeRun(
  spec: Omit<SimulationSpec, 'shape' | 'sweeps' | 'seed' | 'relaxation'>,
  label: string,
  pairId: number | null,
) {
  const full: SimulationSpec = { ...spec, shape: 'cuboctahedron', sweeps: 40, seed: 1, relaxation: 'rigid' };
  const result = runSimulation(full, createRandom(1));
  const stored = insertRun(store.db, {
    spec: full,
    label,
    pairId,
    engineVersion: result.engineVersion,
    plannedAtoms: result.atoms,
    totalSweeps: 40,
    owner: 'test',
  });
  saveResult(store.db, stored.id, result);
  return { id: stored.id, architecture: result.architecture };
}

async function retrain(campaignId: number): Promise<{ review: Extract<StoredReview['review'], { status: 'ready' }> }> {
  // A fixed weight, large enough that two pseudo-outcomes move the model visibly (the default is tuned).
  const job = await ok<LearnJob>('learn.retrain', { campaignId, priorWeight: 0.5 });
  const done = await learnJobsFor(store).whenDone(job.id);
  expect(done.error).toBeNull();
  const { stored } = await ok<{ stored: StoredReview | null }>('learn.review', { campaignId });
  if (stored?.review.status !== 'ready') throw new Error('expected a ready review');
  return { review: stored.review };
}

/** P(class) of the latest stored model at a condition. */
function modelProbability(campaignId: number, classKey: string, condition: Parameters<typeof canonicalCondition>[0]) {
  const model = latestModel<ModelReview>(store.db, campaignId);
  if (model?.review.status !== 'ready') throw new Error('no ready model');
  const fit = model.review.fitted.classifier;
  const [candidate] = buildCandidates([canonicalCondition(condition)]);
  const probs = classifierProbabilities(fit, [candidate!.features])[0]!;
  return probs[fit.classes.indexOf(classKey as never)]!;
}

describe('Monte Carlo runs in the physics prior', () => {
  // Two retrains in worker threads: the wait for background work.
  it(
    'a matching screen run relabels the prior, the review counts the sources, the model follows',
    { timeout: TIMEOUTS.longWaitMs },
    async () => {
      const c = await ok<Campaign>('campaigns.create', { name: 'History' });
      await ok('learn.importHistory', { campaignId: c.id, csvText: HISTORY });
      const polyol = {
        elementA: 'Ni',
        elementB: 'Pt',
        xB: 0.8,
        diameterNm: 3,
        temperatureK: 433.15,
        route: 'polyol' as const,
      };

      const before = (await retrain(c.id)).review;
      expect(before.prior?.fromMonteCarlo).toBe(0);
      expect(before.prior?.runsAvailable).toBe(0);
      const pBefore = modelProbability(c.id, 'A@B', polyol);

      // The campaign's screen at 450 K (matches the polyol 433 K and organic 473 K candidates, not 298 K).
      const screen = storeRun(
        { elementA: 'Ni', elementB: 'Pt', xB: 0.8, diameterNm: 3, temperatureK: 450 },
        `screen History ${new Date().toISOString()}`,
        null,
      );
      expect(screen.architecture).toBe('Ni@Pt');
      // Not this campaign's: another campaign's screen whose name starts like this one's; a run at 5.5 nm.
      storeRun(
        { elementA: 'Ni', elementB: 'Pt', xB: 0.8, diameterNm: 3, temperatureK: 450 },
        `screen History B ${new Date().toISOString()}`,
        null,
      );
      const other = storeRun(
        { elementA: 'Ni', elementB: 'Pt', xB: 0.8, diameterNm: 5.5, temperatureK: 450 },
        `screen History ${new Date().toISOString()}`,
        null,
      );
      expect(campaignMonteCarloLabels(store, c.id).map((r) => r.runId)).toEqual([screen.id, other.id]);

      const after = (await retrain(c.id)).review;
      expect(after.prior).toMatchObject({
        pseudoOutcomes: before.prior?.pseudoOutcomes,
        fromMonteCarlo: 2,
        fromAnalytic: (before.prior?.pseudoOutcomes ?? 0) - 2,
        runIds: [screen.id],
        runsAvailable: 2,
      });
      // The analytic chain calls this condition a surface-enriched alloy: the run disagrees, and says so.
      expect(after.prior?.disagreementExamples[0]).toMatchObject({
        pair: 'Ni-Pt',
        runId: screen.id,
        monteCarlo: 'Ni@Pt',
      });
      expect(after.prior?.disagreementExamples[0]?.analytic).not.toBe('Ni@Pt');
      expect(modelProbability(c.id, 'A@B', polyol)).toBeGreaterThan(pBefore);
    },
  );

  it('a run linked to a pair of the campaign counts, whatever its label', async () => {
    const c = await ok<Campaign>('campaigns.create', { name: 'Linked' });
    const pair = await ok<{ id: number }>('pairs.add', { campaignId: c.id, pair: 'Pd-Pt' });
    const linked = storeRun(
      { elementA: 'Pt', elementB: 'Pd', xB: 0.8, diameterNm: 5, temperatureK: 300 },
      'by hand',
      pair.id,
    );
    storeRun({ elementA: 'Pt', elementB: 'Pd', xB: 0.8, diameterNm: 5, temperatureK: 300 }, 'by hand', null);
    expect(campaignMonteCarloLabels(store, c.id)).toEqual([
      expect.objectContaining({ runId: linked.id, elementA: 'Pt', elementB: 'Pd', xB: 0.8, diameterNm: 5 }),
    ]);
  });
});
