/** `pairwright inventory`: the inventory (amount on hand, location, lot). */
import type { InventoryRecord } from '../../../../shared-model/api/batches';
import type { CliCommand } from '../../command';
import { formatTable } from '../../table';

export const inventoryCommand: CliCommand = {
  words: ['inventory'],
  args: '',
  summary: 'List the inventory (amount on hand, location, lot)',
  options: {},
  run: async (_args, context) => {
    const items = await context.call('inventory.list', {});
    return { json: items, text: inventoryTable(items) };
  },
};

function inventoryTable(items: readonly InventoryRecord[]): string {
  if (items.length === 0) return 'The inventory is empty (pairwright inventory add <reagent key> <amount> <unit>).';
  return formatTable(items, [
    { header: '#', value: (i) => i.id },
    { header: 'reagent', value: (i) => i.reagentName },
    { header: 'amount', value: (i) => Number(i.amount.toPrecision(6)) },
    { header: 'unit', value: (i) => i.unit },
    { header: 'location', value: (i) => i.location },
    { header: 'lot', value: (i) => i.lot },
  ]);
}
