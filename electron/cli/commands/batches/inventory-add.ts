/** `pairwright inventory add <reagent key> <amount> <unit>`: add an inventory entry. */
import type { InventoryRecord } from '../../../../shared-model/api/batches';
import { optionalString, readNumberText, requirePositional, type CliCommand } from '../../command';

export const inventoryAddCommand: CliCommand = {
  words: ['inventory', 'add'],
  args: '<reagent key> <amount> <mg|g|kg|mL|L>',
  summary: 'Add an inventory entry (see pairwright catalog for the keys)',
  options: {
    location: { type: 'string', description: 'where it is kept' },
    lot: { type: 'string', description: 'lot number' },
  },
  run: async (args, context) => {
    const item = await context.call('inventory.upsert', {
      reagentKey: requirePositional(args, 0, 'reagent key'),
      amount: readNumberText(requirePositional(args, 1, 'amount'), '<amount>'),
      unit: requirePositional(args, 2, 'unit') as InventoryRecord['unit'],
      location: optionalString(args, 'location') ?? '',
      lot: optionalString(args, 'lot') ?? '',
    });
    return { json: item, text: `inventory #${item.id}: ${item.reagentName} ${item.amount} ${item.unit}` };
  },
};
