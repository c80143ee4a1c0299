/** Prediction services through the dispatcher (every transport's entry), on a real SQLite file. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import { dispatch } from '../../electron/services/dispatch';
import type { ServiceContext } from '../../electron/services/context';
import type { SavedPrediction } from '../../shared-model/api/prediction';
import { MODEL_VERSION, predictPair } from '../../shared-model/prediction/predict';
import { tempDataDir } from '../support/host-fixture';

let store: Store;
let context: ServiceContext;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  context = { store };
});
afterEach(() => store.close());

const conditions = { xB: 0.5, diameterNm: 3, shape: 'cuboctahedron', temperatureK: 600 };

describe('prediction services', () => {
  it('predict answers the model result as plain data (reason included)', async () => {
    const result = await dispatch(context, 'prediction.predict', { pair: 'Ag-Pd', conditions });
    expect(result.ok).toBe(true);
    const value = (result as { value: Record<string, unknown> }).value;
    const direct = predictPair('Ag', 'Pd', { xB: 0.5, diameterNm: 3, shape: 'cuboctahedron', temperatureK: 600 });
    expect(value.surfaceFraction).toBeCloseTo(direct.surfaceFraction, 12);
    expect(Object.getOwnPropertyDescriptor(value, 'reason')?.value).toBe(direct.reason);
    expect(structuredClone(value)).toEqual(value);
  });

  it('bad input comes back as a value naming the field', async () => {
    expect(await dispatch(context, 'prediction.predict', { pair: 'Ag-Ag', conditions })).toMatchObject({
      ok: false,
      error: { code: 'invalid_input', field: 'pair' },
    });
    expect(
      await dispatch(context, 'prediction.predict', { pair: 'Ag-Pd', conditions: { ...conditions, xB: 1 } }),
    ).toMatchObject({ ok: false, error: { field: 'conditions.xB' } });
    expect(
      await dispatch(context, 'prediction.predict', { pair: 'Ag-Pd', conditions: { ...conditions, diameterNm: 0.1 } }),
    ).toMatchObject({
      ok: false,
      error: { code: 'invalid_input', field: 'diameterNm' },
    });
    expect(
      await dispatch(context, 'prediction.rank', { elements: ['Pt', 'Xx'], target: 'alloy', conditions }),
    ).toMatchObject({ ok: false, error: { field: 'elements.1' } });
  });

  it('rank with a limit, isotherm, element table', async () => {
    const ranked = await dispatch(context, 'prediction.rank', {
      elements: ['Pt', 'Pd', 'Au', 'Ag', 'Ni', 'Cu', 'Co'],
      target: 'core@shell:Au',
      conditions,
      limit: 3,
    });
    expect(ranked).toMatchObject({ ok: true, value: { target: 'core@shell with Au in the shell' } });
    const rows = (ranked as { value: { rows: Array<{ rank: number; prediction: { surfaceElement: string } }> } }).value
      .rows;
    expect(rows.map((r) => r.rank)).toEqual([1, 2, 3]);
    expect(rows[0]?.prediction.surfaceElement).toBe('Au');
    const iso = await dispatch(context, 'prediction.isotherm', {
      pair: 'Pd-Ag',
      conditions,
      sweep: 'diameter',
      points: 5,
    });
    expect(iso).toMatchObject({ ok: true, value: { pair: 'Pd-Ag', sweep: 'diameter' } });
    const table = await dispatch(context, 'elements.table', {});
    expect((table as { value: { elements: unknown[]; sources: unknown[] } }).value.elements).toHaveLength(30);
  });

  it('save links a prediction to a campaign pair with inputs, settings and model version; listForPair reads it back', async () => {
    const campaign = await dispatch(context, 'campaigns.create', { name: 'Oxygen reduction screen' });
    const campaignId = (campaign as { value: { id: number } }).value.id;
    const pair = await dispatch(context, 'pairs.add', { campaignId, pair: 'Pt-Ni', target: 'Ni@Pt' });
    const pairId = (pair as { value: { id: number } }).value.id;
    const saved = await dispatch(context, 'prediction.save', {
      pair: 'Ni-Pt',
      conditions: { ...conditions, xB: 0.25, thresholds: { coreShellEnrichment: 0.7 } },
      pairId,
    });
    expect(saved.ok).toBe(true);
    const value = (saved as { value: SavedPrediction }).value;
    expect(value).toMatchObject({ pairId, pair: 'Ni-Pt', modelVersion: MODEL_VERSION });
    expect(value.inputs.conditions.thresholds.coreShellEnrichment).toBe(0.7);
    expect(value.result.thresholds.coreShellEnrichment).toBe(0.7);
    const row = store.db.prepare('SELECT settings_json FROM predictions WHERE id = ?').get(value.id) as {
      settings_json: string;
    };
    expect(JSON.parse(row.settings_json)).toMatchObject({
      facet: '111',
      strainRule: 'oversized solute',
      thresholds: { coreShellEnrichment: 0.7 },
    });
    const listed = await dispatch(context, 'prediction.listForPair', { pairId });
    expect(listed).toMatchObject({ ok: true, value: [{ id: value.id, pairId }] });
    // a prediction for another pair cannot be linked to this one
    expect(await dispatch(context, 'prediction.save', { pair: 'Au-Pd', conditions, pairId })).toMatchObject({
      ok: false,
      error: { field: 'pairId' },
    });
    expect(await dispatch(context, 'prediction.listForPair', { pairId: 9999 })).toMatchObject({
      ok: false,
      error: { code: 'not_found' },
    });
    // removing the pair keeps the prediction, unlinked
    await dispatch(context, 'pairs.remove', { id: pairId, confirm: true });
    const kept = store.db.prepare('SELECT pair_id FROM predictions WHERE id = ?').get(value.id) as {
      pair_id: number | null;
    };
    expect(kept.pair_id).toBeNull();
  });
});
