import type { Campaign } from '../../../shared-model/api/campaigns';
import { CliError, requirePositional, type CliCommand, type CliContext } from '../command';
import { formatTable } from '../table';

export const campaignTable = (campaigns: readonly Campaign[]): string =>
  formatTable(campaigns, [
    { header: 'id', value: (c) => c.id, align: 'right' },
    { header: 'name', value: (c) => c.name },
    { header: 'pairs', value: (c) => c.pairCount, align: 'right' },
    { header: 'state', value: (c) => (c.archived ? 'archived' : 'active') },
    { header: 'updated', value: (c) => c.updatedAt.slice(0, 16).replace('T', ' ') },
  ]);

/** A campaign given by id or by (case-insensitive) name. */
export async function resolveCampaign(context: CliContext, reference: string): Promise<Campaign> {
  const campaigns = await context.call('campaigns.list', { includeArchived: true });
  const byId = /^\d+$/.test(reference) ? campaigns.find((c) => c.id === Number(reference)) : undefined;
  const found = byId ?? campaigns.find((c) => c.name.toLowerCase() === reference.trim().toLowerCase());
  if (!found)
    throw new CliError(`no campaign "${reference}" (give its id or exact name; see: pairwright campaigns list)`);
  return found;
}

export const campaignCommands: CliCommand[] = [
  {
    words: ['campaigns', 'list'],
    args: '',
    summary: 'List campaigns',
    options: { all: { type: 'boolean', description: 'include archived campaigns' } },
    run: async (args, context) => {
      const campaigns = await context.call('campaigns.list', { includeArchived: args.values.all === true });
      return { json: campaigns, text: campaignTable(campaigns) };
    },
  },
  {
    words: ['campaigns', 'create'],
    args: '<name>',
    summary: 'Create a campaign',
    options: { description: { type: 'string', description: 'a line about the campaign' } },
    run: async (args, context) => {
      const name = requirePositional(args, 0, 'name');
      const description = typeof args.values.description === 'string' ? args.values.description : '';
      const campaign = await context.call('campaigns.create', { name, description });
      return { json: campaign, text: `created campaign ${campaign.id} "${campaign.name}"` };
    },
  },
  {
    words: ['campaigns', 'rename'],
    args: '<campaign> <new name>',
    summary: 'Rename a campaign',
    options: {},
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const renamed = await context.call('campaigns.rename', {
        id: campaign.id,
        name: requirePositional(args, 1, 'new name'),
      });
      return { json: renamed, text: `renamed campaign ${renamed.id} to "${renamed.name}"` };
    },
  },
  {
    words: ['campaigns', 'archive'],
    args: '<campaign>',
    summary: 'Archive a campaign (--restore to bring it back)',
    options: { restore: { type: 'boolean', description: 'restore instead of archive' } },
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const updated = await context.call('campaigns.archive', {
        id: campaign.id,
        archived: args.values.restore !== true,
      });
      return {
        json: updated,
        text: `${updated.archived ? 'archived' : 'restored'} campaign ${updated.id} "${updated.name}"`,
      };
    },
  },
  {
    words: ['demo'],
    args: '',
    summary: 'Load the demo campaign (invented data, labelled as demo)',
    options: {},
    run: async (_args, context) => {
      const campaign = await context.call('campaigns.loadDemo', {});
      const batches = await context.call('batches.list', { campaignId: campaign.id });
      const text = [
        `demo campaign ${campaign.id} "${campaign.name}" (invented data): ${campaign.pairCount} pairs, ${batches.length} batches`,
        `next: pairwright pairs list ${campaign.id} · pairwright batches list · pairwright outcomes list ${campaign.id}`,
      ].join('\n');
      return { json: campaign, text };
    },
  },
];
