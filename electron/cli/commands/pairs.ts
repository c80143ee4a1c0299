import type { CandidatePair } from '../../../shared-model/api/pairs';
import { CliError, optionalString, requirePositional, type CliCommand } from '../command';
import { formatTable } from '../table';
import { resolveCampaign } from './campaigns';

const pairTable = (pairs: readonly CandidatePair[]): string =>
  formatTable(pairs, [
    { header: 'id', value: (p) => p.id, align: 'right' },
    { header: 'pair', value: (p) => `${p.elementA}-${p.elementB}` },
    { header: 'target', value: (p) => p.target },
    { header: 'status', value: (p) => p.status },
    { header: 'notes', value: (p) => p.notes },
  ]);

function parseId(text: string, name: string): number {
  if (!/^\d+$/.test(text)) throw new CliError(`<${name}> must be a pair id (a whole number), got "${text}"`);
  return Number(text);
}

export const pairCommands: CliCommand[] = [
  {
    words: ['pairs', 'list'],
    args: '<campaign>',
    summary: 'List the candidate pairs of a campaign',
    options: {},
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const pairs = await context.call('pairs.list', { campaignId: campaign.id });
      return { json: pairs, text: pairTable(pairs) };
    },
  },
  {
    words: ['pairs', 'add'],
    args: '<campaign> <A-B>',
    summary: 'Add a candidate pair, e.g. pairs add "Cathode screen" Pt-Ni --target "Ni@Pt"',
    options: {
      target: { type: 'string', description: 'target architecture: alloy, A@B, Janus, … (default alloy)' },
      notes: { type: 'string', description: 'free text' },
    },
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const pair = await context.call('pairs.add', {
        campaignId: campaign.id,
        pair: requirePositional(args, 1, 'A-B'),
        target: optionalString(args, 'target') ?? 'alloy',
        notes: optionalString(args, 'notes') ?? '',
      });
      return { json: pair, text: `added ${pair.elementA}-${pair.elementB} (target ${pair.target}) as pair ${pair.id}` };
    },
  },
  {
    words: ['pairs', 'update'],
    args: '<pair id>',
    summary: 'Change the status, target or notes of a pair',
    options: {
      status: { type: 'string', description: 'candidate, planned, in synthesis, characterized, dropped' },
      target: { type: 'string', description: 'target architecture' },
      notes: { type: 'string', description: 'free text' },
    },
    run: async (args, context) => {
      const id = parseId(requirePositional(args, 0, 'pair id'), 'pair id');
      const status = optionalString(args, 'status');
      const pair = await context.call('pairs.update', {
        id,
        ...(status !== undefined ? { status: status as CandidatePair['status'] } : {}),
        ...(optionalString(args, 'target') !== undefined ? { target: optionalString(args, 'target') } : {}),
        ...(optionalString(args, 'notes') !== undefined ? { notes: optionalString(args, 'notes') } : {}),
      });
      return {
        json: pair,
        text: `pair ${pair.id} ${pair.elementA}-${pair.elementB}: target ${pair.target}, status ${pair.status}`,
      };
    },
  },
  {
    words: ['pairs', 'remove'],
    args: '<pair id>',
    summary: 'Remove a pair (needs --yes)',
    options: { yes: { type: 'boolean', description: 'confirm the removal' } },
    run: async (args, context) => {
      const id = parseId(requirePositional(args, 0, 'pair id'), 'pair id');
      if (args.values.yes !== true) throw new CliError(`removing pair ${id} needs confirmation: add --yes`);
      const result = await context.call('pairs.remove', { id, confirm: true });
      return { json: result, text: `removed pair ${result.removed}` };
    },
  },
];
