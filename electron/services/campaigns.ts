import { createCampaign, listCampaigns, renameCampaign, setCampaignArchived } from '../../db/repositories/campaigns';
import type { campaignOperations } from '../../shared-model/api/campaigns';
import type { HandlerMap } from './context';
import { loadDemoCampaign } from './demo-campaign';

export const campaignHandlers: HandlerMap<keyof typeof campaignOperations> = {
  'campaigns.create': (input, { store }) => createCampaign(store.db, input),
  'campaigns.list': (input, { store }) => listCampaigns(store.db, input.includeArchived),
  'campaigns.rename': (input, { store }) => renameCampaign(store.db, input.id, input.name),
  'campaigns.archive': (input, { store }) => setCampaignArchived(store.db, input.id, input.archived),
  'campaigns.loadDemo': (_input, context) => loadDemoCampaign(context),
};
