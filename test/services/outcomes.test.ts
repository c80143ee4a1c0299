/** Outcome services through the dispatcher every transport uses, on a real SQLite file. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { dispatch } from '../../electron/services/dispatch';
import type { SavedBatch } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { BatchOutcome, CampaignConfusion, CompositionRecord, LineScanRecord, OutcomeRow, SizeRecord } from '../../shared-model/api/outcomes';
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

async function campaignWithBatch(): Promise<{ campaign: Campaign; pair: CandidatePair; batch: SavedBatch }> {
  const campaign = await ok<Campaign>('campaigns.create', { name: 'Au-Pd screen' });
  const pair = await ok<CandidatePair>('pairs.add', { campaignId: campaign.id, pair: 'Au-Pd', target: 'alloy' });
  await ok('prediction.save', { pair: 'Au-Pd', conditions: { xB: 0.5, diameterNm: 10, temperatureK: 300 }, pairId: pair.id });
  const batch = await ok<SavedBatch>('batches.save', { name: 'AuPd 10 nm', campaignId: campaign.id, pairId: pair.id, design: auPd });
  return { campaign, pair, batch };
}

function scanCsv(kind: 'alloy' | 'A@B' | 'B@A' | 'Janus', seed: number): string {
  const scan = syntheticScan(
    { kind, centerNm: 10, radiusNm: 5, coreRadiusNm: 3.5, probeSigmaNm: 0.6, amplitudeA: 10, amplitudeB: 8, backgroundA: 5, backgroundB: 3, positionsNm: positions(0, 20, 0.4) },
    20,
    seed,
  );
  return `x (nm),Au,Pd\n${scan.positionsNm.map((x, i) => `${x},${scan.signalA[i]},${scan.signalB[i]}`).join('\n')}`;
}

describe('TEM sizes on a batch', () => {
  it('stores every diameter beside the analysis and its version', async () => {
    const { batch } = await campaignWithBatch();
    const record = await ok<SizeRecord>('outcomes.recordSizes', { batchId: batch.id, csvText: 'd (nm)\r\n9.5\r\n10.2\r\n\r\n10.9\r\n11.4\r\n', sourceFile: 'sizes.csv' });
    expect(record.diametersNm).toEqual([9.5, 10.2, 10.9, 11.4]);
    expect(record.statistics.n).toBe(4);
    // The batch's design target (10 nm) is used when no target is given.
    expect(record.statistics.target?.diameterNm).toBe(10);
    expect(record.analysisVersion).toMatch(/^characterization-/);
    expect(count('outcome_diameters')).toBe(4);
    const outcome = await ok<BatchOutcome>('outcomes.get', { batchId: batch.id });
    expect(outcome.sizes[0]?.diametersNm).toEqual([9.5, 10.2, 10.9, 11.4]);
    expect(outcome.nominalXB).toBeCloseTo(0.5, 12);
  });

  it('stores nothing of a file with a malformed row, and names the line and value', async () => {
    const { batch } = await campaignWithBatch();
    const error = await failure('outcomes.recordSizes', { batchId: batch.id, csvText: '9.5\n10.2\n1O.9\n11.4\n' });
    expect(error).toMatchObject({ code: 'invalid_input', field: 'csvText', message: 'line 3: "1O.9" in column 1 is not a number' });
    expect(await failure('outcomes.recordSizes', { batchId: batch.id, csvText: '9.5\n-10\n11\n' })).toMatchObject({ field: 'csvText' });
    expect((await failure('outcomes.recordSizes', { batchId: batch.id, csvText: '9.5\n10\n' })).message).toMatch(/at least 3/);
    expect(count('outcome_size_imports')).toBe(0);
    expect(count('outcome_diameters')).toBe(0);
    expect(await failure('outcomes.recordSizes', { batchId: 999, csvText: '1\n2\n3' })).toMatchObject({ code: 'not_found', field: 'batchId' });
  });
});

describe('composition', () => {
  it('keeps nominal, ICP and EDX apart and flags deviations and grid trouble', async () => {
    const { batch } = await campaignWithBatch();
    const record = await ok<CompositionRecord>('outcomes.recordComposition', {
      batchId: batch.id,
      measurements: [
        { method: 'ICP-OES', xB: 0.47, uncertaintyXB: 0.02 },
        { method: 'EDX particle', xB: 0.38, uncertaintyXB: 0.04, lines: 'Au L, Pd K' },
      ],
      gridMetal: 'Cu',
    });
    expect(record.nominalXB).toBeCloseTo(0.5, 12);
    expect(record.comparison.rows.map((r) => r.flagged)).toEqual([true, true]);
    expect(record.measurements[1]).toEqual({ method: 'EDX particle', xB: 0.38, uncertaintyXB: 0.04, lines: 'Au L, Pd K' });
    expect(count('outcome_composition_measurements')).toBe(2);
    expect(await failure('outcomes.recordComposition', { batchId: batch.id, measurements: [{ method: 'ICP-MS', xB: 1.4 }] })).toMatchObject({ field: 'measurements.0.xB' });
  });
});

describe('line scans and the observed architecture', () => {
  it('imports a scan with every point, suggests the fitted model, and takes confirm or override', async () => {
    const { batch } = await campaignWithBatch();
    const scan = await ok<LineScanRecord>('outcomes.importLineScan', { batchId: batch.id, csvText: scanCsv('B@A', 3), name: 'particle 1' });
    expect(scan.points).toHaveLength(51);
    expect(count('outcome_line_scan_points')).toBe(51);
    expect(scan.analysis.chosenModel).toBe('Pd@Au');
    let outcome = await ok<BatchOutcome>('outcomes.get', { batchId: batch.id });
    expect(outcome.suggestion).toMatchObject({ label: 'Pd@Au', lineScanId: scan.id });

    expect(await failure('outcomes.setObserved', { batchId: batch.id, label: 'Au@Pd', decision: 'confirmed' })).toMatchObject({ field: 'label' });
    expect(await failure('outcomes.setObserved', { batchId: batch.id, label: 'Ni@Pt', decision: 'override' })).toMatchObject({ field: 'label' });
    outcome = await ok<BatchOutcome>('outcomes.setObserved', { batchId: batch.id, label: 'Pd@Au', decision: 'confirmed' });
    expect(outcome.observed).toMatchObject({ label: 'Pd@Au', decision: 'confirmed', suggestedLabel: 'Pd@Au' });
    outcome = await ok<BatchOutcome>('outcomes.setObserved', { batchId: batch.id, label: 'janus', decision: 'override', reason: 'HAADF shows two lobes' });
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
    expect((await failure('outcomes.importLineScan', { batchId: batch.id, csvText: short })).message).toMatch(/shorter than the particle/);
    const zero = lines.map((line, i) => (i === 0 ? line : line.replace(/,[^,]*$/, ',0'))).join('\n');
    expect((await failure('outcomes.importLineScan', { batchId: batch.id, csvText: zero })).message).toMatch(/Pd channel is zero at every point/);
    expect(count('outcome_line_scans')).toBe(0);
    expect(count('outcome_line_scan_points')).toBe(0);
  });

  it('keeps notes and file paths, and removes everything with the batch', async () => {
    const { batch } = await campaignWithBatch();
    await ok('outcomes.setNotes', { batchId: batch.id, notes: 'grid 3, region B' });
    await ok('outcomes.addFile', { batchId: batch.id, path: '/data/tem/b7_012.dm4', kind: 'image' });
    await ok('outcomes.recordSizes', { batchId: batch.id, csvText: '9\n10\n11\n' });
    const outcome = await ok<BatchOutcome>('outcomes.get', { batchId: batch.id });
    expect(outcome.notes).toBe('grid 3, region B');
    expect(outcome.files.map((f) => f.path)).toEqual(['/data/tem/b7_012.dm4']);
    expect(await failure('outcomes.addFile', { batchId: batch.id, path: '  ' })).toMatchObject({ field: 'path' });
    await ok('batches.remove', { id: batch.id, confirm: true });
    expect(count('outcome_files')).toBe(0);
    expect(count('outcome_diameters')).toBe(0);
    expect(count('outcome_observations')).toBe(0);
  });
});

describe('prediction vs outcome over a campaign', () => {
  it('lists each batch with its prediction at planning and builds the confusion matrix', async () => {
    const { campaign, pair, batch } = await campaignWithBatch();
    const second = await ok<SavedBatch>('batches.save', { name: 'AuPd second', campaignId: campaign.id, pairId: pair.id, design: auPd });
    await ok('outcomes.setObserved', { batchId: batch.id, label: 'Au@Pd', decision: 'override' });
    await ok('outcomes.setObserved', { batchId: second.id, label: 'alloy', decision: 'override' });
    const rows = await ok<OutcomeRow[]>('outcomes.listByCampaign', { campaignId: campaign.id });
    expect(rows).toHaveLength(2);
    const predicted = rows[0]!.predicted;
    expect(typeof predicted).toBe('string');
    const confusion = await ok<CampaignConfusion>('outcomes.confusion', { campaignId: campaign.id });
    expect(confusion.matrix.total).toBe(2);
    expect(confusion.matrix.counts.flat().reduce((s, v) => s + v, 0)).toBe(2);
    const expectedExact = [rows[0]!, rows[1]!].filter((r) => r.observed === r.predicted).length;
    expect(confusion.matrix.exactAgreement).toBe(expectedExact);
    const bySimulation = await ok<CampaignConfusion>('outcomes.confusion', { campaignId: campaign.id, against: 'simulation' });
    expect(bySimulation.matrix.total).toBe(0);
    expect(bySimulation.unmatched).toBe(2);
    expect(await failure('outcomes.listByCampaign', { campaignId: 999 })).toMatchObject({ code: 'not_found' });
  });
});
