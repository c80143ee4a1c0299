/** `pairwright batches list`: saved batches of a campaign, of the active campaigns, or of all. */
import type { BatchStatus, BatchSummary } from '../../../../shared-model/api/batches';
import { BATCH_STATUSES } from '../../../../shared-model/api/batches';
import { CliError, optionalString, type CliCommand } from '../../command';
import { formatTable } from '../../table';
import { resolveCampaign } from '../campaigns';
import { num } from './format';

const batchTable = (batches: readonly BatchSummary[], campaignNames?: ReadonlyMap<number, string>): string =>
  formatTable(batches, [
    { header: 'id', value: (b) => b.id, align: 'right' },
    { header: 'name', value: (b) => b.name },
    { header: 'pair', value: (b) => `${b.elementA}-${b.elementB}` },
    { header: 'target', value: (b) => b.target },
    { header: 'route', value: (b) => b.route },
    { header: 'nm', value: (b) => num(b.diameterNm, 3), align: 'right' },
    { header: 'status', value: (b) => b.status },
    { header: 'seeds from', value: (b) => (b.seedBatchId ? `#${b.seedBatchId}` : '') },
    { header: 'catalog', value: (b) => (b.catalogChanged ? 'changed since' : '') },
    ...(campaignNames
      ? [
          {
            header: 'campaign',
            value: (b: BatchSummary) => (b.campaignId === null ? '—' : (campaignNames.get(b.campaignId) ?? '?')),
          },
        ]
      : []),
  ]);

export const batchesListCommand: CliCommand = {
  words: ['batches', 'list'],
  args: '',
  summary:
    "List saved batches: the named campaign's (--campaign), else those of active campaigns; --all lists every " +
    "campaign's, archived campaigns' too",
  options: {
    status: { type: 'string', description: BATCH_STATUSES.join(' | ') },
    campaign: { type: 'string', description: 'only this campaign (id or name)' },
    all: { type: 'boolean', description: "every campaign's batches, archived campaigns' too" },
  },
  run: async (args, context) => {
    const status = optionalString(args, 'status');
    const campaignRef = optionalString(args, 'campaign');
    const all = args.values.all === true;
    if (all && campaignRef !== undefined) throw new CliError('give either --all or --campaign, not both');
    const campaign = campaignRef !== undefined ? await resolveCampaign(context, campaignRef) : null;
    const batches = await context.call('batches.list', {
      ...(status !== undefined ? { status: status as BatchStatus } : {}),
      ...(campaign !== null ? { campaignId: campaign.id, includeArchived: true } : {}),
      ...(all ? { includeArchived: true } : {}),
    });
    const campaigns = await context.call('campaigns.list', { includeArchived: true });
    const names = new Map(campaigns.map((c) => [c.id, c.archived ? `${c.name} (archived)` : c.name]));
    const scope = all
      ? "every campaign's batches, archived campaigns' too"
      : campaign !== null
        ? `the batches of "${campaign.name}"`
        : "the batches of active campaigns (--all: every campaign's, archived too)";
    return { json: batches, text: `${scope}\n${batchTable(batches, campaign === null ? names : undefined)}` };
  },
};
