/** Campaign and pair repositories on a real temporary SQLite file. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createCampaign, listCampaigns, renameCampaign, setCampaignArchived } from '../../db/repositories/campaigns';
import { addPair, listPairs, removePair, updatePair } from '../../db/repositories/pairs';
import { openStore, type Store } from '../../db/store';
import { tempDataDir } from '../support/host-fixture';

let store: Store;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
});
afterEach(() => store.close());

describe('campaign repository', () => {
  it('creates, lists, renames and archives', () => {
    const first = createCampaign(store.db, { name: 'Fuel-cell cathode screen', description: '' });
    createCampaign(store.db, { name: 'Plasmonic shells', description: 'Au and Ag' });
    expect(
      listCampaigns(store.db, false)
        .map((c) => c.name)
        .sort(),
    ).toEqual(['Fuel-cell cathode screen', 'Plasmonic shells']);
    expect(renameCampaign(store.db, first.id, 'ORR cathodes').name).toBe('ORR cathodes');
    setCampaignArchived(store.db, first.id, true);
    expect(listCampaigns(store.db, false).map((c) => c.name)).toEqual(['Plasmonic shells']);
    expect(listCampaigns(store.db, true)).toHaveLength(2);
  });

  it('refuses a duplicate name (case-insensitive) with the field named', () => {
    createCampaign(store.db, { name: 'Screen', description: '' });
    expect(() => createCampaign(store.db, { name: 'screen', description: '' })).toThrow(
      expect.objectContaining({ code: 'conflict', field: 'name' }),
    );
  });
});

describe('pair repository', () => {
  it('adds pairs, counts them, and treats A-B and B-A as the same pair', () => {
    const campaign = createCampaign(store.db, { name: 'C', description: '' });
    addPair(store.db, { campaignId: campaign.id, elementA: 'Pt', elementB: 'Ni', target: 'Ni@Pt', notes: '' });
    expect(() =>
      addPair(store.db, { campaignId: campaign.id, elementA: 'Ni', elementB: 'Pt', target: 'alloy', notes: '' }),
    ).toThrow(/already in/);
    expect(listPairs(store.db, campaign.id)).toHaveLength(1);
    expect(listCampaigns(store.db, false)[0]?.pairCount).toBe(1);
  });

  it('updates status and target, removes, and refuses unknown ids', () => {
    const campaign = createCampaign(store.db, { name: 'C', description: '' });
    const pair = addPair(store.db, {
      campaignId: campaign.id,
      elementA: 'Au',
      elementB: 'Pd',
      target: 'alloy',
      notes: '',
    });
    const updated = updatePair(store.db, pair.id, { status: 'planned', target: 'Pd@Au' });
    expect([updated.status, updated.target]).toEqual(['planned', 'Pd@Au']);
    removePair(store.db, pair.id);
    expect(listPairs(store.db, campaign.id)).toEqual([]);
    expect(() => removePair(store.db, pair.id)).toThrow(expect.objectContaining({ code: 'not_found' }));
  });

  it('refuses pairs in an archived campaign', () => {
    const campaign = createCampaign(store.db, { name: 'Old', description: '' });
    setCampaignArchived(store.db, campaign.id, true);
    expect(() =>
      addPair(store.db, { campaignId: campaign.id, elementA: 'Au', elementB: 'Ag', target: 'alloy', notes: '' }),
    ).toThrow(/archived/);
  });

  it('removing a campaign row cascades to its pairs (foreign keys are on)', () => {
    const campaign = createCampaign(store.db, { name: 'C', description: '' });
    addPair(store.db, { campaignId: campaign.id, elementA: 'Au', elementB: 'Ag', target: 'alloy', notes: '' });
    store.db.prepare('DELETE FROM campaigns WHERE id = ?').run(campaign.id);
    expect(store.db.prepare('SELECT count(*) AS n FROM pairs').get()).toEqual({ n: 0 });
  });
});
