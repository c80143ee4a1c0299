/**
 * The demo campaign: INVENTED data so a first-time user sees a populated app. Everything it creates
 * is marked as demo (is_demo = 1, "(demo)" in the name and description). Nothing here is a measurement.
 */
import { createCampaign, findCampaignByName } from '../../db/repositories/campaigns';
import { addPair } from '../../db/repositories/pairs';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { ServiceContext } from './context';

export const DEMO_CAMPAIGN_NAME = 'Fuel-cell cathode screen (demo)';

const DEMO_PAIRS = [
  { elementA: 'Pt', elementB: 'Ni', target: 'Ni@Pt', status: 'planned', notes: 'Demo data: Pt-skin over a Ni-rich core for oxygen reduction.' },
  { elementA: 'Pt', elementB: 'Co', target: 'alloy', status: 'candidate', notes: 'Demo data: mixed alloy reference.' },
  { elementA: 'Pd', elementB: 'Au', target: 'Pd@Au', status: 'characterized', notes: 'Demo data: Au shell on Pd seeds.' },
  { elementA: 'Ag', elementB: 'Pd', target: 'alloy', status: 'in synthesis', notes: 'Demo data: co-reduction in oleylamine.' },
  { elementA: 'Cu', elementB: 'Ag', target: 'Janus', status: 'candidate', notes: 'Demo data: immiscible pair, expected to phase separate.' },
] as const;

/** Creates the demo campaign once; a second call returns the existing one unchanged. */
export function loadDemoCampaign({ store }: ServiceContext): Campaign {
  const db = store.db;
  return db.transaction(() => {
    const existing = findCampaignByName(db, DEMO_CAMPAIGN_NAME);
    if (existing) return existing;
    const campaign = createCampaign(db, {
      name: DEMO_CAMPAIGN_NAME,
      description: 'DEMO DATA — invented for a first look at Pairwright; not measurements. Archive it when you start your own campaign.',
      isDemo: true,
    });
    for (const pair of DEMO_PAIRS) addPair(db, { campaignId: campaign.id, ...pair });
    return findCampaignByName(db, DEMO_CAMPAIGN_NAME) ?? campaign;
  })();
}
