/** `pairwright reagents --batches 3,4,7`: reagent totals for batches against the inventory (table or CSV). */
import type { ReagentList } from '../../../../shared-model/recipes/reagent-list';
import { CliError, optionalString, type CliCommand } from '../../command';
import { formatTable } from '../../table';
import { num } from './format';

function parseBatchIds(text: string | undefined): number[] {
  if (!text) throw new CliError('--batches is required, e.g. --batches 3,4,7');
  const ids = text.split(',').map((part) => part.trim());
  for (const id of ids)
    if (!/^\d+$/.test(id) || Number(id) === 0)
      throw new CliError(`--batches must be batch ids separated by commas, got "${text}"`);
  return ids.map(Number);
}

const reagentListTable = (list: ReagentList): string =>
  [
    formatTable(list.lines, [
      { header: 'reagent', value: (l) => l.name },
      { header: 'formula', value: (l) => l.formula },
      { header: 'total mg', value: (l) => num(l.totalMassMg), align: 'right' },
      { header: 'total mL', value: (l) => num(l.totalVolumeMl), align: 'right' },
      { header: 'on hand', value: (l) => l.onHandText },
      { header: 'location', value: (l) => l.locations.join('; ') },
      { header: 'short mg', value: (l) => (l.shortfallMg ? num(l.shortfallMg) : ''), align: 'right' },
      { header: 'status', value: (l) => l.status },
    ]),
    '',
    `hazards (${list.hazardSummary.signalWord ?? 'no signal word'}): ${list.hazardSummary.hazards.map((h) => h.code).join(' ')}`,
    ...list.hazardSummary.warnings.map((w) => `  [${w.severity}] ${w.message}`),
    list.hazardSummary.caution,
  ].join('\n');

export const reagentsCommand: CliCommand = {
  words: ['reagents'],
  args: '',
  summary: 'Reagent totals for batches vs the inventory, e.g. reagents --batches 3,4,7 --csv',
  options: {
    batches: { type: 'string', description: 'batch ids separated by commas' },
    csv: { type: 'boolean', description: 'print CSV' },
    out: { type: 'string', description: 'write the CSV to this file instead of printing it' },
  },
  run: async (args, context) => {
    const batchIds = parseBatchIds(optionalString(args, 'batches'));
    if (args.values.csv === true || optionalString(args, 'out')) {
      const { csv, filename } = await context.call('reagents.csv', { batchIds });
      const out = optionalString(args, 'out');
      if (out) {
        context.writeTextFile(out, csv);
        return { json: { written: out, filename }, text: `wrote ${out}` };
      }
      return { json: { csv, filename }, text: csv };
    }
    const list = await context.call('reagents.list', { batchIds });
    return { json: list, text: reagentListTable(list) };
  },
};
