/**
 * Valid inputs of every operation against the fuzz fixture (fixture.ts): the starting points of the near-valid
 * mutations. The record is keyed by every operation name, so a new operation does not compile until it has seeds.
 * `bound` keeps what a generated input may do within the test: which operations get one and why is stated here.
 */
import { isAbsolute, join } from 'node:path';
import type { OperationName } from '../../../shared-model/api/contract';
import { auPd, ptNi } from '../../support/sample-batches';
import type { FixtureIds } from './fixture';

type Seeds = (ids: FixtureIds) => unknown[];

const conditions = { xB: 0.5, diameterNm: 10, temperatureK: 300 };
const fullConditions = {
  xB: 0.25,
  diameterNm: 4,
  shape: 'cuboctahedron',
  temperatureK: 473.15,
  facet: '111',
  strainRule: 'any solute',
  thresholds: { coreShellEnrichment: 0.6 },
  environment: 'vacuum',
  pressureBar: 1,
  timeH: 1,
};

function reagentInput(ids: FixtureIds, key: string): Record<string, unknown> {
  const { revision: _revision, builtIn: _builtIn, updatedAt: _updatedAt, ...reagent } = ids.reagent;
  return { ...reagent, key };
}

export const SEEDS: Record<OperationName, Seeds> = {
  'learn.importHistory': (ids) => [
    // 15 rows, not the whole demo table: 1,000 imports of 70 rows (each also stored as a batch) grew the store to
    // 6,000 batches, and the dumps that compare it before and after each call grew with it
    {
      campaignId: ids.campaignId,
      csvText: ids.historyCsv.split('\n').slice(0, 16).join('\n'),
      fileName: 'h.csv',
      allowDuplicates: true,
    },
    { campaignId: ids.campaignId, csvText: ids.historyCsv.split('\n').slice(0, 4).join('\n') },
  ],
  'learn.history': (ids) => [{ campaignId: ids.campaignId }],
  'learn.removeImport': (ids) => [{ importId: ids.importId }],
  'learn.setPrice': () => [
    { symbol: 'Au', pricePerGram: 70.5, currency: 'EUR', pricedOn: '2026-10-01' },
    { symbol: 'Pd', pricePerGram: 35, pricedOn: '2026-09-30' },
  ],
  'learn.prices': () => [{}],
  'learn.retrain': (ids) => [{ campaignId: ids.campaignId }, { campaignId: ids.campaignId, priorWeight: 0.5, C: 2 }],
  'learn.job': (ids) => [{ jobId: ids.jobId }],
  'learn.cancel': (ids) => [{ jobId: ids.jobId }],
  'learn.review': (ids) => [{ campaignId: ids.campaignId }],
  'learn.propose': (ids) => [
    { campaignId: ids.campaignId, target: 'alloy', count: 3 },
    {
      campaignId: ids.campaignId,
      target: 'core@shell',
      count: 6,
      explorationSlots: 2,
      includeFailed: true,
      metalMmolPerBatch: 0.2,
      seed: 7,
    },
  ],
  'outcomes.previewSizes': (ids) => [
    { csvText: ids.sizeCsv },
    { csvText: ids.sizeCsv, column: 1, decimalSeparator: '.', targetDiameterNm: 8, precisionPercent: 5 },
  ],
  'outcomes.previewLineScan': (ids) => [
    { pair: 'Au-Pd', csvText: ids.lineScanCsv },
    { pair: 'Au-Pd', csvText: ids.lineScanCsv, positionColumn: 1, aColumn: 2, bColumn: 3, unit: 'counts' },
    { pair: 'Au-Pd', csvText: ids.lineScanCsv, probeSigmaNm: 0.5, decimalSeparator: '.' },
  ],
  'outcomes.get': (ids) => [{ batchId: ids.outcomeBatchId }],
  'outcomes.record': (ids) => [
    {
      batchId: ids.outcomeBatchId,
      sizes: { csvText: ids.sizeCsv, sourceFile: 'sizes.csv' },
      composition: { nominalXB: 0.5, measurements: [{ method: 'EDX particle', xB: 0.48, uncertaintyXB: 0.02 }] },
      observed: { decision: 'override', label: 'alloy', reason: 'even contrast' },
      notes: 'fuzz',
      files: [{ path: '/data/x.tif', kind: 'image', note: '' }],
    },
    { batchId: ids.outcomeBatchId, lineScan: { name: 'scan', sourceFile: null, csvText: ids.lineScanCsv } },
    { batchId: ids.outcomeBatchId, notes: 'checked again' },
  ],
  'outcomes.removeSizes': (ids) => [{ id: ids.sizeImportId, confirm: true }],
  'outcomes.refitLineScan': (ids) => [{ id: ids.lineScanId }, { id: ids.lineScanId, probeSigmaNm: 0.8 }],
  'outcomes.removeLineScan': (ids) => [{ id: ids.lineScanId, confirm: true }],
  'outcomes.removeFile': (ids) => [{ id: ids.fileId }],
  'outcomes.listByCampaign': (ids) => [{ campaignId: ids.campaignId }],
  'outcomes.confusion': (ids) => [
    { campaignId: ids.campaignId },
    { campaignId: ids.campaignId, against: 'simulation' },
  ],
  'campaigns.create': () => [{ name: 'Pt-Ni ORR screen', description: 'first round' }, { name: 'Cu-Ag' }],
  'campaigns.list': () => [{}, { includeArchived: true }],
  'campaigns.rename': (ids) => [{ id: ids.campaignId, name: 'renamed campaign' }],
  'campaigns.archive': (ids) => [
    { id: ids.campaignId, archived: true },
    { id: ids.campaignId, archived: false },
  ],
  'campaigns.loadDemo': () => [{}],
  'pairs.add': (ids) => [
    { campaignId: ids.campaignId, pair: 'Cu-Ag', target: 'Ag@Cu', notes: 'n' },
    { campaignId: ids.campaignId, pair: 'PtNi' },
  ],
  'pairs.list': (ids) => [{ campaignId: ids.campaignId }],
  'pairs.update': (ids) => [{ id: ids.pairId, status: 'planned', target: 'alloy', notes: 'x' }],
  'pairs.remove': (ids) => [{ id: ids.pairId, confirm: true }],
  'prediction.predict': () => [
    { pair: 'Au-Pd', conditions },
    { pair: 'Pt-Ni', conditions: fullConditions },
  ],
  'prediction.rank': () => [
    { elements: ['Au', 'Pd', 'Pt', 'Ni'], target: 'alloy', conditions },
    { elements: 'all', target: 'core@shell:Pt', conditions: fullConditions, limit: 5, all: true },
  ],
  'prediction.isotherm': () => [
    { pair: 'Au-Pd', conditions, sweep: 'xB', points: 11 },
    { pair: 'Pt-Ni', conditions: fullConditions, sweep: 'temperature' },
  ],
  'prediction.save': (ids) => [
    { pair: ids.pairText, conditions, pairId: ids.pairId },
    { pair: 'Au-Pd', conditions },
  ],
  'prediction.listForPair': (ids) => [{ pairId: ids.pairId }],
  'elements.table': () => [{}],
  'elements.list': () => [{}],
  'batches.design': () => [ptNi, auPd],
  'batches.save': (ids) => [
    { name: 'fuzz batch', campaignId: ids.campaignId, pairId: ids.pairId, design: ptNi, notes: 'n' },
    { name: 'loose batch', design: auPd, lots: [{ reagentKey: 'nabh4', lot: 'L1' }] },
  ],
  'batches.list': (ids) => [
    {},
    { campaignId: ids.campaignId, status: 'made' },
    { statuses: ['made', 'characterized'], includeArchived: true },
  ],
  'batches.get': (ids) => [{ id: ids.batchIds[0] }],
  'batches.setStatus': (ids) => [
    { id: ids.batchIds[0], status: 'made' },
    { id: ids.batchIds[0], status: 'planned', inventory: false },
    { id: ids.batchIds[0], status: 'characterized', measured: { diameterNm: 9, particlesPerMl: 1e12 } },
  ],
  'batches.record': (ids) => [
    { id: ids.batchIds[0], lots: [{ reagentKey: 'nabh4', lot: 'A7' }], notes: 'stirred 30 min' },
  ],
  'batches.remove': (ids) => [{ id: ids.batchIds[0], confirm: true }],
  'reagents.catalog': () => [{}],
  'reagents.add': (ids) => [reagentInput(ids, 'fuzz-reagent')],
  'reagents.edit': (ids) => [reagentInput(ids, ids.reagent.key)],
  'inventory.list': () => [{}],
  'inventory.upsert': (ids) => [
    { reagentKey: 'nabh4', amount: 5, unit: 'g', location: 'shelf 2', lot: 'B' },
    { id: ids.inventoryId, reagentKey: 'nabh4', amount: 2.5, unit: 'g' },
  ],
  'inventory.remove': (ids) => [{ id: ids.inventoryId }],
  'reagents.list': (ids) => [{ batchIds: ids.batchIds }],
  'reagents.csv': (ids) => [{ batchIds: ids.batchIds.slice(0, 1) }],
  'batches.sheet': (ids) => [{ id: ids.batchIds[0] }, { id: ids.batchIds[0], printedOn: '2026-12-01' }],
  'simulation.options': () => [{}],
  'simulation.start': () => [
    { elementA: 'Au', elementB: 'Pd', xB: 0.5, shape: 'cuboctahedron', shells: 1, temperatureK: 600, sweeps: 5 },
    {
      elementA: 'Cu',
      elementB: 'Ag',
      xB: 0.3,
      shape: 'icosahedron',
      diameterNm: 1.2,
      temperatureK: 500,
      sweeps: 5,
      anneal: { startTemperatureK: 900, sweeps: 3 },
      seed: 3,
      relaxation: 'rigid',
      label: 'fuzz',
    },
  ],
  'simulation.status': (ids) => [{ id: ids.runId }],
  'simulation.cancel': (ids) => [{ id: ids.runId }],
  'simulation.get': (ids) => [{ id: ids.runId }],
  'simulation.list': () => [{}, { limit: 3 }],
  'simulation.exportXyz': (ids) => [{ id: ids.runId }],
  'simulation.energy': (ids) => [{ xyz: ids.xyz }, { xyz: ids.xyz, cutoffAngstrom: 6 }],
  'simulation.relax': (ids) => [{ xyz: ids.xyz, maxIterations: 200 }, { xyz: ids.xyz }],
  'backups.list': () => [{}],
  'backups.create': (ids) => [{}, { to: join(ids.dataDir, 'copy.sqlite') }],
  'backups.setKeep': () => [{ keep: 3 }],
  'screen.start': (ids) => [{ campaignId: ids.campaignId, xB: [0.5], diameterNm: [1], temperatureK: 600, sweeps: 100 }],
  'screen.status': (ids) => [{ runIds: [ids.runId] }],
  'screen.cancel': (ids) => [{ runIds: [ids.runId] }],
};

const LONG_JOB_CAPS: Record<string, number> = { shells: 2, diameterNm: 1.5, sweeps: 100 };

/** Caps the size and length of a Monte Carlo request (shells ≤ 2, diameter ≤ 1.5 nm, sweeps ≤ 100). */
function capJob(input: unknown): unknown {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) return input;
  const out: Record<string, unknown> = { ...(input as Record<string, unknown>) };
  for (const [key, cap] of Object.entries(LONG_JOB_CAPS)) {
    const v = out[key];
    if (typeof v === 'number' && v > cap) out[key] = cap;
    if (Array.isArray(v)) out[key] = v.map((x) => (typeof x === 'number' && x > cap ? cap : x));
  }
  const anneal = out.anneal;
  if (typeof anneal === 'object' && anneal !== null && !Array.isArray(anneal)) {
    const sweeps = (anneal as Record<string, unknown>).sweeps;
    if (typeof sweeps === 'number' && sweeps > LONG_JOB_CAPS.sweeps!) out.anneal = { ...anneal, sweeps: 100 };
  }
  return out;
}

/**
 * Operations whose generated inputs are bounded before the call, with the reason (none is skipped):
 * - simulation.start, screen.start: queue Monte Carlo runs; the size and sweeps are capped (capJob) and every
 *   accepted run is cancelled at once and waited for, so 1,000 calls do not queue hours of work.
 * - learn.retrain: a job in a worker thread; every accepted job is cancelled at once and waited for.
 * - backups.create: an absolute `to` path outside the test's data folder is moved under it (into a folder that
 *   does not exist, which the operation must refuse by name), so generated paths never write outside it; a relative
 *   path is refused by the operation itself and stays as generated.
 */
export const BOUNDED: Partial<
  Record<OperationName, { why: string; bound: (input: unknown, ids: FixtureIds) => unknown }>
> = {
  'simulation.start': { why: 'starts a Monte Carlo run: size and sweeps capped, run cancelled', bound: capJob },
  'screen.start': { why: 'starts Monte Carlo runs: size and sweeps capped, runs cancelled', bound: capJob },
  'learn.retrain': { why: 'starts a retrain job: cancelled at once', bound: (input) => input },
  'backups.create': {
    why: 'writes a file: absolute paths moved under the test folder',
    bound: (input, ids) => {
      if (typeof input !== 'object' || input === null || Array.isArray(input)) return input;
      const to = (input as Record<string, unknown>).to;
      if (typeof to !== 'string' || !isAbsolute(to.trim()) || to.startsWith(ids.dataDir)) return input;
      return { ...input, to: join(ids.dataDir, 'generated', to.trim()) };
    },
  },
};
