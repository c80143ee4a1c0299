/**
 * Learning service (issue 11): history import (one transaction, all rows or none; the same table twice is
 * refused unless duplicates are allowed), metal prices, retrain as a job in a worker thread (the review is
 * stored as a model with its version and the ids of the outcomes it was trained on), the stored review,
 * and proposals from the stored model (stored with the model version and those ids).
 */
import {
  batchesSeededFromImport,
  historyBatchIds,
  insertHistoryBatch,
  listOwnBatchConditions,
} from '../../db/repositories/batches';
import { getCampaign } from '../../db/repositories/campaigns';
import {
  findImportByFingerprint,
  historyOutcomeIdsOfImport,
  insertHistoryImport,
  insertMetalPrice,
  insertModel,
  insertProposals,
  latestMetalPrices,
  latestModel,
  listHistoryImports,
  listHistoryOutcomes,
  listMetalPrices,
  removeHistoryImport,
  type HistoryImportRecord,
} from '../../db/repositories/learning';
import { getObservation, setObservation, setOutcomeNotes } from '../../db/repositories/outcome-observations';
import { findPair, listPairs } from '../../db/repositories/pairs';
import type { Store } from '../../db/store';
import type { HistoryImportSummary, learnOperations, ProposalSet, ReviewView } from '../../shared-model/api/learn';
import { DomainError } from '../../shared-model/api/result';
import { buildCandidates, candidateConditions, DEFAULT_GRID } from '../../shared-model/learn/candidates';
import { parseHistoryTable } from '../../shared-model/learn/history-table';
import { prepareOutcomes, type LearningOutcome } from '../../shared-model/learn/outcome-model';
import { proposeBatches } from '../../shared-model/learn/proposals';
import { withMonteCarloPhysics } from '../../shared-model/learn/screen-prior';
import { DEFAULT_REVIEW_SETTINGS, type ModelReview, type ReviewSettings } from '../../shared-model/learn/review';
import { LEARN_MODEL_VERSION } from '../../shared-model/learn/outcome-model';
import { parseRankTarget } from '../../shared-model/prediction/rank';
import { DEFAULT_TEMPERATURE_C, ROUTES, type SynthesisRoute } from '../../shared-model/recipes/design-input';
import { learnJobsFor } from '../workers/learn-jobs';
import type { HandlerMap } from './context';
import { campaignMonteCarloLabels } from './learn-screen-prior';

const summaryOf = (r: HistoryImportRecord): HistoryImportSummary => ({
  id: r.id,
  campaignId: r.campaignId,
  fileName: r.fileName,
  rowCount: r.rowCount,
  createdAt: r.createdAt,
});

/**
 * The outcomes the campaign's model learns from: its imported history (ids "h<row>") and its own batches
 * with a recorded observed architecture (outcomes.record; ids "b<batch id>"), at their planned size,
 * nominal composition, route and highest temperature (the route's usual one when the design gives none),
 * dated by the day the batch was saved. A batch whose design lacks the size or composition is left out.
 */
export function campaignOutcomes(store: Store, campaignId: number): LearningOutcome[] {
  const history = listHistoryOutcomes(store.db, campaignId).map(
    ({ importId: _i, line: _l, notes: _n, rowId: _r, ...o }) => o,
  );
  const own: LearningOutcome[] = [];
  for (const b of listOwnBatchConditions(store.db, campaignId)) {
    const label = getObservation(store.db, b.id).observed?.label ?? null;
    if (label === null || b.diameterNm === null || b.xB === null || b.xB <= 0 || b.xB >= 1) continue;
    if (!(ROUTES as readonly string[]).includes(b.route)) continue;
    const route = b.route as SynthesisRoute;
    own.push({
      id: `b${b.id}`,
      elementA: b.elementA,
      elementB: b.elementB,
      xB: b.xB,
      diameterNm: b.diameterNm,
      temperatureK: (b.temperatureC ?? DEFAULT_TEMPERATURE_C[route]) + 273.15,
      route,
      observed: label,
      madeOn: b.createdAt.slice(0, 10),
    });
  }
  return [...history, ...own];
}

/** The campaign's elements: those of its candidate pairs and of its outcomes. */
function campaignElements(store: Store, campaignId: number, outcomes: readonly LearningOutcome[]): string[] {
  const symbols = new Set<string>();
  for (const p of listPairs(store.db, campaignId)) {
    symbols.add(p.elementA);
    symbols.add(p.elementB);
  }
  for (const o of outcomes) {
    symbols.add(o.elementA);
    symbols.add(o.elementB);
  }
  return [...symbols].sort();
}

function withoutFit(review: ModelReview): ReviewView {
  if (review.status !== 'ready') return review;
  const { fitted: _fitted, ...rest } = review;
  return rest;
}

type ReadyReview = Extract<ModelReview, { status: 'ready' }>;

export const learnHandlers: HandlerMap<keyof typeof learnOperations> = {
  'learn.importHistory': ({ campaignId, csvText, fileName, allowDuplicates }, { store }) => {
    getCampaign(store.db, campaignId);
    const table = parseHistoryTable(csvText, 'csvText');
    const previous = findImportByFingerprint(store.db, campaignId, table.fingerprint);
    if (previous && !allowDuplicates) {
      throw new DomainError(
        'conflict',
        `this table (${table.rows.length} rows) was already imported into the campaign ` +
          `on ${previous.createdAt.slice(0, 10)}${previous.fileName ? ` from ${previous.fileName}` : ''}; ` +
          'import it again only if you mean to add every row twice ' +
          '(allow duplicates)',
        'csvText',
      );
    }
    // The table, its rows and one characterized batch per row with its observation: all or none.
    const { record, batchIds } = store.db.transaction(() => {
      const stored = insertHistoryImport(store.db, {
        campaignId,
        fileName: fileName ?? null,
        fingerprint: table.fingerprint,
        rows: table.rows,
      });
      const ids = table.rows.map((row, i) => {
        const batchId = insertHistoryBatch(store.db, {
          campaignId,
          pairId: findPair(store.db, campaignId, row.elementA, row.elementB)?.id ?? null,
          historyOutcomeId: stored.outcomeIds[i] as number,
          importId: stored.id,
          fileName: stored.fileName,
          line: row.line,
          elementA: row.elementA,
          elementB: row.elementB,
          xB: row.xB,
          diameterNm: row.diameterNm,
          temperatureK: row.temperatureK,
          route: row.route,
          observed: row.observed,
          madeOn: row.madeOn,
          notes: row.notes,
        });
        if (row.observed === 'failed') {
          setOutcomeNotes(store.db, batchId, 'imported history: the synthesis gave no usable particles (failed)');
        } else {
          setObservation(store.db, batchId, {
            label: row.observed,
            decision: 'override',
            suggestedLabel: null,
            reason: `imported history (line ${row.line})`,
          });
        }
        return batchId;
      });
      return { record: stored, batchIds: ids };
    })();
    const labels: Record<string, number> = {};
    for (const r of table.rows) labels[r.observed] = (labels[r.observed] ?? 0) + 1;
    return {
      import: summaryOf(record),
      rows: table.rows.length,
      labels,
      notes: table.notes,
      duplicateOf: previous ? summaryOf(previous) : null,
      batchIds,
    };
  },

  'learn.history': ({ campaignId }, { store }) => {
    getCampaign(store.db, campaignId);
    const batchOf = historyBatchIds(store.db, campaignId);
    return {
      imports: listHistoryImports(store.db, campaignId).map(summaryOf),
      outcomes: listHistoryOutcomes(store.db, campaignId).map((o) => ({
        id: o.id,
        batchId: batchOf.get(o.rowId) ?? null,
        importId: o.importId,
        line: o.line,
        pair: `${o.elementA}-${o.elementB}`,
        xB: o.xB,
        diameterNm: o.diameterNm,
        temperatureK: o.temperatureK,
        route: o.route,
        observed: o.observed,
        madeOn: o.madeOn,
        notes: o.notes,
      })),
    };
  },

  'learn.removeImport': ({ importId }, { store }) =>
    store.db.transaction(() => {
      const rowIds = historyOutcomeIdsOfImport(store.db, importId);
      const seeded = batchesSeededFromImport(store.db, rowIds);
      if (seeded.length > 0) {
        throw new DomainError(
          'conflict',
          `batches of this import are the seed batches of ${seeded.map((b) => `#${b.id} ${b.name}`).join(', ')}; ` +
            'remove those first',
          'importId',
        );
      }
      // The batches go with their rows (history_outcome_id ON DELETE CASCADE), and their observations with them.
      return { removed: removeHistoryImport(store.db, importId), batchesRemoved: rowIds.length };
    })(),

  'learn.setPrice': (input, { store }) => insertMetalPrice(store.db, input),

  'learn.prices': (_input, { store }) => ({ latest: latestMetalPrices(store.db), all: listMetalPrices(store.db) }),

  'learn.retrain': ({ campaignId, priorWeight, C }, { store }) => {
    getCampaign(store.db, campaignId);
    const outcomes = campaignOutcomes(store, campaignId);
    if (outcomes.length === 0) {
      throw new DomainError(
        'invalid_input',
        'the campaign has no outcomes to learn from; import a history table first (Results → Import history) ' +
          'or record the observed architecture of a characterized batch',
        'campaignId',
      );
    }
    const elements = campaignElements(store, campaignId, outcomes);
    const settings: ReviewSettings = { ...DEFAULT_REVIEW_SETTINGS, C, priorWeight, grid: DEFAULT_GRID };
    // Finished Monte Carlo runs of the campaign label the prior where they match; the model keeps the settings
    // without them (the review's `prior` names the runs used).
    const monteCarloRuns = campaignMonteCarloLabels(store, campaignId);
    const input = { outcomes, elements, settings: { ...settings, monteCarloRuns } };
    return learnJobsFor(store).start(campaignId, input, (review) =>
      insertModel(store.db, {
        campaignId,
        modelVersion: LEARN_MODEL_VERSION,
        trainedOn: review.trainedOn,
        settings,
        review,
      }),
    );
  },

  'learn.job': ({ jobId }, { store }) => learnJobsFor(store).get(jobId),

  'learn.cancel': ({ jobId }, { store }) => learnJobsFor(store).cancel(jobId),

  'learn.review': ({ campaignId }, { store }) => {
    getCampaign(store.db, campaignId);
    const model = latestModel<ModelReview>(store.db, campaignId);
    if (!model) return { stored: null };
    const trained = new Set(model.trainedOn);
    const newOutcomes = campaignOutcomes(store, campaignId).filter((o) => !trained.has(o.id)).length;
    const review = withoutFit(model.review);
    return {
      stored: {
        modelId: model.id,
        modelVersion: model.modelVersion,
        trainedOn: model.trainedOn,
        createdAt: model.createdAt,
        newOutcomes,
        review,
      },
    };
  },

  'learn.propose': (input, { store }): ProposalSet => {
    getCampaign(store.db, input.campaignId);
    const target = parseRankTarget(input.target);
    const model = latestModel<ModelReview>(store.db, input.campaignId);
    if (!model)
      throw new DomainError(
        'conflict',
        'the campaign has no learned model yet; retrain first (Model review → Retrain, or pairwright learn)',
        'campaignId',
      );
    if (model.review.status !== 'ready') {
      throw new DomainError('conflict', `the latest model could not be trained: ${model.review.message}`, 'campaignId');
    }
    const fitted = (model.review as ReadyReview).fitted;
    const settingsUsed = model.settings as ReviewSettings;
    const candidates = withMonteCarloPhysics(
      buildCandidates(candidateConditions(fitted.elements, settingsUsed.grid ?? DEFAULT_GRID)),
      campaignMonteCarloLabels(store, input.campaignId),
    );
    const outcomes = prepareOutcomes(campaignOutcomes(store, input.campaignId)).all;
    const result = proposeBatches(fitted, candidates, outcomes, latestMetalPrices(store.db), {
      target,
      count: input.count,
      explorationSlots: Math.min(input.explorationSlots, input.count),
      includeFailed: input.includeFailed,
      metalMmolPerBatch: input.metalMmolPerBatch,
      seed: input.seed,
    });
    const settings = { ...input, target: input.target };
    const id = insertProposals(store.db, {
      campaignId: input.campaignId,
      modelId: model.id,
      modelVersion: model.modelVersion,
      trainedOn: model.trainedOn,
      target: input.target,
      settings,
      proposals: result,
    });
    return {
      id,
      modelId: model.id,
      modelVersion: model.modelVersion,
      trainedOn: model.trainedOn,
      target: input.target,
      metalMmolPerBatch: input.metalMmolPerBatch,
      ...result,
    };
  },
};
