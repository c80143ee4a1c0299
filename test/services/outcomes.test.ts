/** Outcome services through the dispatcher every transport uses, on a real SQLite file. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { dispatch } from '../../electron/services/dispatch';
import type { SavedBatch } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import Database from 'better-sqlite3';
import type {
  BatchOutcome,
  CampaignConfusion,
  LineScanRecord,
  OutcomeRow,
  RecordedOutcome,
} from '../../shared-model/api/outcomes';
import type { CandidatePair } from '../../shared-model/api/pairs';
import { dispatchValue } from '../support/dispatch';
import { tempDataDir } from '../support/host-fixture';
import { auPd } from '../support/sample-batches';
import { positions, syntheticScan } from '../shared-model/characterization/synthetic-line-scan';

let store: Store;
let context: ServiceContext;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  context = { store };
});
afterEach(() => store.close());

const ok = <T>(name: string, input: unknown): Promise<T> => dispatchValue<T>(context, name, input);
async function failure(name: string, input: unknown): Promise<{ code: string; message: string; field?: string }> {
  const result = await dispatch(context, name, input);
  if (result.ok) throw new Error(`${name} should have failed`);
  return result.error;
}
const count = (table: string) => (store.db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;
/** Stores parts of a batch's outcome through the one write operation. */
const record = (batchId: number, parts: Record<string, unknown>) =>
  ok<RecordedOutcome>('outcomes.record', { batchId, ...parts });
const recordFailure = (batchId: number, parts: Record<string, unknown>) =>
  failure('outcomes.record', { batchId, ...parts });

const OUTCOME_TABLES = [
  'outcome_size_imports',
  'outcome_diameters',
  'outcome_compositions',
  'outcome_composition_measurements',
  'outcome_line_scans',
  'outcome_line_scan_points',
  'outcome_observations',
  'outcome_files',
] as const;
/** Row counts of every outcome table, read from the SQLite file by a second connection (what was committed). */
function committedCounts(): Record<string, number> {
  const reader = new Database(store.path, { readonly: true });
  try {
    return Object.fromEntries(
      OUTCOME_TABLES.map((t) => [t, (reader.prepare(`SELECT count(*) AS n FROM ${t}`).get() as { n: number }).n]),
    );
  } finally {
    reader.close();
  }
}

async function campaignWithBatch(): Promise<{ campaign: Campaign; pair: CandidatePair; batch: SavedBatch }> {
  const campaign = await ok<Campaign>('campaigns.create', { name: 'Au-Pd screen' });
  const pair = await ok<CandidatePair>('pairs.add', { campaignId: campaign.id, pair: 'Au-Pd', target: 'alloy' });
  await ok('prediction.save', {
    pair: 'Au-Pd',
    conditions: { xB: 0.5, diameterNm: 10, temperatureK: 300 },
    pairId: pair.id,
  });
  const batch = await ok<SavedBatch>('batches.save', {
    name: 'AuPd 10 nm',
    campaignId: campaign.id,
    pairId: pair.id,
    design: auPd,
  });
  return { campaign, pair, batch };
}

function scanCsv(kind: 'alloy' | 'A@B' | 'B@A' | 'Janus', seed: number): string {
  const scan = syntheticScan(
    {
      kind,
      centerNm: 10,
      radiusNm: 5,
      coreRadiusNm: 3.5,
      probeSigmaNm: 0.6,
      amplitudeA: 10,
      amplitudeB: 8,
      backgroundA: 5,
      backgroundB: 3,
      positionsNm: positions(0, 20, 0.4),
    },
    20,
    seed,
  );
  return `x (nm),Au,Pd\n${scan.positionsNm.map((x, i) => `${x},${scan.signalA[i]},${scan.signalB[i]}`).join('\n')}`;
}

describe('TEM sizes on a batch', () => {
  it('stores every diameter beside the analysis and its version', async () => {
    const { batch } = await campaignWithBatch();
    const stored = await record(batch.id, {
      sizes: { csvText: 'd (nm)\r\n9.5\r\n10.2\r\n\r\n10.9\r\n11.4\r\n', sourceFile: 'sizes.csv' },
    });
    expect(stored.recorded).toEqual(['sizes']);
    const size = stored.outcome.sizes[0]!;
    expect(size.sourceFile).toBe('sizes.csv');
    expect(size.diametersNm).toEqual([9.5, 10.2, 10.9, 11.4]);
    expect(size.statistics.n).toBe(4);
    // The batch's design target (10 nm) is used when no target is given.
    expect(size.statistics.target?.diameterNm).toBe(10);
    expect(size.analysisVersion).toMatch(/^characterization-/);
    expect(count('outcome_diameters')).toBe(4);
    const outcome = await ok<BatchOutcome>('outcomes.get', { batchId: batch.id });
    expect(outcome.sizes[0]?.diametersNm).toEqual([9.5, 10.2, 10.9, 11.4]);
    expect(outcome.nominalXB).toBeCloseTo(0.5, 12);
  });

  it('stores nothing of a file with a malformed row, and names the line and value', async () => {
    const { batch } = await campaignWithBatch();
    const error = await recordFailure(batch.id, { sizes: { csvText: '9.5\n10.2\n1O.9\n11.4\n' } });
    expect(error).toMatchObject({
      code: 'invalid_input',
      field: 'sizes.csvText',
      message: 'sizes: line 3: "1O.9" in column 1 is not a number',
    });
    expect(await recordFailure(batch.id, { sizes: { csvText: '9.5\n-10\n11\n' } })).toMatchObject({
      field: 'sizes.csvText',
    });
    expect((await recordFailure(batch.id, { sizes: { csvText: '9.5\n10\n' } })).message).toMatch(
      /^sizes: .*at least 3/,
    );
    expect(count('outcome_size_imports')).toBe(0);
    expect(count('outcome_diameters')).toBe(0);
    expect(await recordFailure(999, { sizes: { csvText: '1\n2\n3' } })).toMatchObject({
      code: 'not_found',
      field: 'batchId',
    });
    expect(await recordFailure(batch.id, {})).toMatchObject({
      code: 'invalid_input',
      message: expect.stringMatching(/^Nothing to record/),
    });
  });
});

describe('outcomes.record: one transaction for every part', () => {
  it('stores every part in order: a scan given in the same call is what a confirmation confirms', async () => {
    const { batch } = await campaignWithBatch();
    const stored = await record(batch.id, {
      sizes: { csvText: '9.6\n10.1\n10.4\n10.8\n', sourceFile: 'sizes.csv' },
      composition: { measurements: [{ method: 'ICP-OES', xB: 0.48, uncertaintyXB: 0.02 }] },
      lineScan: { csvText: scanCsv('B@A', 5), sourceFile: 'scan.csv' },
      observed: { decision: 'confirmed' },
      notes: 'grid 2',
      files: [{ path: '/data/tem/b1.dm4' }, { path: '/data/edx/b1.msa', kind: 'spectrum' }],
    });
    expect(stored.recorded).toEqual(['sizes', 'composition', 'lineScan', 'observed', 'notes', 'files']);
    expect(stored.outcome.observed).toMatchObject({ label: 'Pd@Au', decision: 'confirmed' });
    expect(stored.outcome.files.map((f) => f.kind)).toEqual(['image', 'spectrum']);
    expect(committedCounts()).toEqual({
      outcome_size_imports: 1,
      outcome_diameters: 4,
      outcome_compositions: 1,
      outcome_composition_measurements: 1,
      outcome_line_scans: 1,
      outcome_line_scan_points: 51,
      outcome_observations: 1,
      outcome_files: 2,
    });
  });

  it('a bad line scan stores none of the sizes, composition, notes or files, and names the part', async () => {
    const { batch } = await campaignWithBatch();
    const before = committedCounts();
    expect(Object.values(before).every((n) => n === 0)).toBe(true);
    // The first half of an alloy scan: it ends inside the particle.
    const short = scanCsv('alloy', 4).split('\n').slice(0, 27).join('\n');
    const error = await recordFailure(batch.id, {
      sizes: { csvText: '9.6\n10.1\n10.4\n10.8\n' },
      composition: { measurements: [{ method: 'ICP-OES', xB: 0.48, uncertaintyXB: 0.02 }], gridMetal: 'Cu' },
      lineScan: { csvText: short },
      notes: 'should not stay',
      files: [{ path: '/data/tem/b1.dm4' }],
    });
    expect(error.code).toBe('invalid_input');
    expect(error.field).toMatch(/^lineScan(\.|$)/);
    expect(error.message).toMatch(/^line scan: .*shorter than the particle/);
    expect(committedCounts()).toEqual(before);
    const outcome = await ok<BatchOutcome>('outcomes.get', { batchId: batch.id });
    expect([outcome.sizes, outcome.compositions, outcome.lineScans, outcome.files]).toEqual([[], [], [], []]);
    expect(outcome.notes).toBe('');
  });

  it('a confirmation with nothing to confirm rolls back the sizes stored before it', async () => {
    const { batch } = await campaignWithBatch();
    const error = await recordFailure(batch.id, {
      sizes: { csvText: '9\n10\n11\n' },
      observed: { decision: 'confirmed' },
    });
    expect(error).toMatchObject({
      field: 'observed.decision',
      message: expect.stringMatching(/^observed architecture: there is no suggested/),
    });
    expect(committedCounts().outcome_size_imports).toBe(0);
  });
});

describe('composition', () => {
  it('keeps nominal, ICP and EDX apart and flags deviations and grid trouble', async () => {
    const { batch } = await campaignWithBatch();
    const stored = await record(batch.id, {
      composition: {
        measurements: [
          { method: 'ICP-OES', xB: 0.47, uncertaintyXB: 0.02 },
          { method: 'EDX particle', xB: 0.38, uncertaintyXB: 0.04, lines: 'Au L, Pd K' },
        ],
        gridMetal: 'Cu',
      },
    });
    const composition = stored.outcome.compositions[0]!;
    expect(composition.nominalXB).toBeCloseTo(0.5, 12);
    expect(composition.comparison.rows.map((r) => r.flagged)).toEqual([true, true]);
    expect(composition.measurements[1]).toEqual({
      method: 'EDX particle',
      xB: 0.38,
      uncertaintyXB: 0.04,
      lines: 'Au L, Pd K',
    });
    expect(count('outcome_composition_measurements')).toBe(2);
    expect(
      await recordFailure(batch.id, { composition: { measurements: [{ method: 'ICP-MS', xB: 1.4 }] } }),
    ).toMatchObject({
      field: 'composition.measurements.0.xB',
    });
  });
});

describe('line scans and the observed architecture', () => {
  it('imports a scan with every point, suggests the fitted model, and takes confirm or override', async () => {
    const { batch } = await campaignWithBatch();
    const stored = await record(batch.id, { lineScan: { csvText: scanCsv('B@A', 3), name: 'particle 1' } });
    const scan = stored.outcome.lineScans[0]!;
    expect(scan.points).toHaveLength(51);
    expect(count('outcome_line_scan_points')).toBe(51);
    expect(scan.analysis.chosenModel).toBe('Pd@Au');
    let outcome = await ok<BatchOutcome>('outcomes.get', { batchId: batch.id });
    expect(outcome.suggestion).toMatchObject({ label: 'Pd@Au', lineScanId: scan.id });

    expect(await recordFailure(batch.id, { observed: { label: 'Au@Pd', decision: 'confirmed' } })).toMatchObject({
      field: 'observed.label',
    });
    expect(await recordFailure(batch.id, { observed: { label: 'Ni@Pt', decision: 'override' } })).toMatchObject({
      field: 'observed.label',
    });
    expect(await recordFailure(batch.id, { observed: { decision: 'override' } })).toMatchObject({
      field: 'observed.label',
    });
    expect(await recordFailure(batch.id, { observed: { label: 'alloy', decision: 'maybe' } })).toMatchObject({
      field: 'observed.decision',
    });
    outcome = (await record(batch.id, { observed: { label: 'Pd@Au', decision: 'confirmed' } })).outcome;
    expect(outcome.observed).toMatchObject({ label: 'Pd@Au', decision: 'confirmed', suggestedLabel: 'Pd@Au' });
    // Confirming without a label takes the suggestion.
    outcome = (await record(batch.id, { observed: { decision: 'confirmed', reason: 'as fitted' } })).outcome;
    expect(outcome.observed).toMatchObject({ label: 'Pd@Au', decision: 'confirmed', reason: 'as fitted' });
    outcome = (
      await record(batch.id, { observed: { label: 'janus', decision: 'override', reason: 'HAADF shows two lobes' } })
    ).outcome;
    expect(outcome.observed).toMatchObject({ label: 'Janus', decision: 'override', reason: 'HAADF shows two lobes' });

    const refit = await ok<LineScanRecord>('outcomes.refitLineScan', { id: scan.id, probeSigmaNm: 0.6 });
    expect(refit.probeSigmaNm).toBe(0.6);
    expect(refit.analysis.models.every((m) => !m.probeFitted)).toBe(true);
    expect(refit.points).toEqual(scan.points);
  });

  it('refuses scans that are too short or have an empty channel, storing nothing', async () => {
    const { batch } = await campaignWithBatch();
    const lines = scanCsv('alloy', 4).split('\n');
    const short = [lines[0], ...lines.slice(1, 27)].join('\n');
    expect((await recordFailure(batch.id, { lineScan: { csvText: short } })).message).toMatch(
      /^line scan: .*shorter than the particle/,
    );
    const zero = lines.map((line, i) => (i === 0 ? line : line.replace(/,[^,]*$/, ',0'))).join('\n');
    expect((await recordFailure(batch.id, { lineScan: { csvText: zero } })).message).toMatch(
      /Pd channel is zero at every point/,
    );
    expect(count('outcome_line_scans')).toBe(0);
    expect(count('outcome_line_scan_points')).toBe(0);
  });

  it('keeps notes and file paths, and removes everything with the batch', async () => {
    const { batch } = await campaignWithBatch();
    await record(batch.id, { notes: 'grid 3, region B', files: [{ path: '/data/tem/b7_012.dm4', kind: 'image' }] });
    await record(batch.id, { sizes: { csvText: '9\n10\n11\n' } });
    const outcome = await ok<BatchOutcome>('outcomes.get', { batchId: batch.id });
    expect(outcome.notes).toBe('grid 3, region B');
    expect(outcome.files.map((f) => f.path)).toEqual(['/data/tem/b7_012.dm4']);
    expect(await recordFailure(batch.id, { files: [{ path: '/ok.tif' }, { path: '  ' }] })).toMatchObject({
      field: 'files.1.path',
    });
    await ok('batches.remove', { id: batch.id, confirm: true });
    expect(count('outcome_files')).toBe(0);
    expect(count('outcome_diameters')).toBe(0);
    expect(count('outcome_observations')).toBe(0);
  });
});

describe('prediction vs outcome over a campaign', () => {
  it('lists each batch with its prediction at planning and builds the confusion matrix', async () => {
    const { campaign, pair, batch } = await campaignWithBatch();
    const second = await ok<SavedBatch>('batches.save', {
      name: 'AuPd second',
      campaignId: campaign.id,
      pairId: pair.id,
      design: auPd,
    });
    await record(batch.id, { observed: { label: 'Au@Pd', decision: 'override' } });
    await record(second.id, { observed: { label: 'alloy', decision: 'override' } });
    const rows = await ok<OutcomeRow[]>('outcomes.listByCampaign', { campaignId: campaign.id });
    expect(rows).toHaveLength(2);
    const predicted = rows[0]!.predicted;
    expect(typeof predicted).toBe('string');
    const confusion = await ok<CampaignConfusion>('outcomes.confusion', { campaignId: campaign.id });
    expect(confusion.matrix.total).toBe(2);
    expect(confusion.matrix.counts.flat().reduce((s, v) => s + v, 0)).toBe(2);
    const expectedExact = [rows[0]!, rows[1]!].filter((r) => r.observed === r.predicted).length;
    expect(confusion.matrix.exactAgreement).toBe(expectedExact);
    const bySimulation = await ok<CampaignConfusion>('outcomes.confusion', {
      campaignId: campaign.id,
      against: 'simulation',
    });
    expect(bySimulation.matrix.total).toBe(0);
    expect(bySimulation.unmatched).toBe(2);
    expect(await failure('outcomes.listByCampaign', { campaignId: 999 })).toMatchObject({ code: 'not_found' });
  });
});
