/** `pairwright catalog`: the reagent catalog. */
import type { CatalogReagent } from '../../../../shared-model/api/batches';
import type { CliCommand } from '../../command';
import { formatTable } from '../../table';

const catalogTable = (catalog: readonly CatalogReagent[]): string =>
  formatTable(catalog, [
    { header: 'key', value: (r) => r.key },
    { header: 'name', value: (r) => r.name },
    { header: 'formula', value: (r) => r.formula },
    { header: 'g/mol', value: (r) => r.molarMassGPerMol.toFixed(2), align: 'right' },
    { header: 'roles', value: (r) => r.roles.join(', ') },
    { header: 'metal', value: (r) => (r.metal ? `${r.metal.symbol}(${r.metal.oxidationState})` : '') },
    { header: 'H-codes', value: (r) => r.hCodes.join(' ') },
    { header: 'rev', value: (r) => r.revision, align: 'right' },
  ]);

export const catalogCommand: CliCommand = {
  words: ['catalog'],
  args: '',
  summary: 'List the reagent catalog',
  options: {},
  run: async (_args, context) => {
    const catalog = await context.call('reagents.catalog', {});
    return { json: catalog, text: catalogTable(catalog) };
  },
};
