/** Service functions through the dispatcher every transport uses, on a real SQLite file. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import { DEMO_CAMPAIGN_NAME } from '../../electron/services/demo-campaign';
import { dispatch } from '../../electron/services/dispatch';
import type { ServiceContext } from '../../electron/services/context';
import { tempDataDir } from '../support/host-fixture';

let store: Store;
let context: ServiceContext;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  context = { store };
});
afterEach(() => store.close());

describe('campaign and pair services', () => {
  it('create → add pairs → list, and errors come back as values naming the field', async () => {
    const created = await dispatch(context, 'campaigns.create', { name: 'Fuel-cell cathode screen' });
    expect(created.ok).toBe(true);
    const campaignId = created.ok ? (created.value as { id: number }).id : 0;
    expect(await dispatch(context, 'pairs.add', { campaignId, pair: 'Pt-Ni', target: 'Ni@Pt' })).toMatchObject({
      ok: true,
    });
    expect(await dispatch(context, 'pairs.add', { campaignId, pair: 'Ni-Pt' })).toMatchObject({
      ok: false,
      error: { code: 'conflict', field: 'pair' },
    });
    expect(await dispatch(context, 'pairs.add', { campaignId: 999, pair: 'Au-Ag' })).toMatchObject({
      ok: false,
      error: { code: 'not_found' },
    });
    const listed = await dispatch(context, 'pairs.list', { campaignId });
    expect(listed).toMatchObject({
      ok: true,
      value: [{ elementA: 'Pt', elementB: 'Ni', target: 'Ni@Pt', status: 'candidate' }],
    });
  });

  it('checks a changed target against the stored pair', async () => {
    const created = await dispatch(context, 'campaigns.create', { name: 'C' });
    const campaignId = created.ok ? (created.value as { id: number }).id : 0;
    const added = await dispatch(context, 'pairs.add', { campaignId, pair: 'Au-Pd' });
    const id = added.ok ? (added.value as { id: number }).id : 0;
    expect(await dispatch(context, 'pairs.update', { id, target: 'Pt@Au' })).toMatchObject({
      ok: false,
      error: { field: 'target' },
    });
    expect(await dispatch(context, 'pairs.update', { id, target: 'Pd@Au', status: 'planned' })).toMatchObject({
      ok: true,
      value: { target: 'Pd@Au', status: 'planned' },
    });
  });

  it('answers unknown operations without throwing', async () => {
    expect(await dispatch(context, 'campaigns.drop', {})).toMatchObject({
      ok: false,
      error: { code: 'unknown_operation' },
    });
    expect(await dispatch(context, '__proto__', {})).toMatchObject({ ok: false, error: { code: 'unknown_operation' } });
  });

  it('loads the demo campaign once, labelled as demo', async () => {
    const first = await dispatch(context, 'campaigns.loadDemo', {});
    const second = await dispatch(context, 'campaigns.loadDemo', {});
    expect(first).toMatchObject({ ok: true, value: { name: DEMO_CAMPAIGN_NAME, isDemo: true } });
    expect(second.ok && first.ok && (second.value as { id: number }).id === (first.value as { id: number }).id).toBe(
      true,
    );
    const list = await dispatch(context, 'campaigns.list', {});
    expect(list.ok && (list.value as unknown[]).length).toBe(1);
    const pairs = await dispatch(context, 'pairs.list', {
      campaignId: first.ok ? (first.value as { id: number }).id : 0,
    });
    expect(pairs.ok && (pairs.value as { notes: string }[]).every((pair) => pair.notes.startsWith('Demo data'))).toBe(
      true,
    );
  });

  it('survives closing and reopening the store', async () => {
    await dispatch(context, 'campaigns.create', { name: 'Persistent' });
    const dataDir = store.dataDir;
    store.close();
    store = openStore({ dataDir });
    context = { store };
    const list = await dispatch(context, 'campaigns.list', {});
    expect(list).toMatchObject({ ok: true, value: [{ name: 'Persistent' }] });
  });
});
