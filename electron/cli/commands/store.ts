/** Store commands: backups (now, to a file, how many kept), restore and the full integrity check. */
import { resolve } from 'node:path';
import { CliError, optionalNumber, optionalString, requirePositional, type CliCommand } from '../command';
import { formatTable } from '../table';

export const storeCommands: CliCommand[] = [
  {
    words: ['backup'],
    args: '',
    summary: 'Back up the store now (into its backups folder, or --to a new file); --keep N sets how many are kept',
    options: {
      to: { type: 'string', description: 'write the backup to this new file instead of the backups folder' },
      keep: { type: 'string', description: 'how many backups the backups folder keeps from now on' },
    },
    run: async (args, context) => {
      const keep = optionalNumber(args, 'keep');
      const kept = keep === undefined ? null : await context.call('backups.setKeep', { keep });
      const to = optionalString(args, 'to');
      const made = await context.call('backups.create', to === undefined ? {} : { to: resolve(to) });
      const lines = [`backed up to ${made.path} (${made.bytes} bytes)`];
      if (kept) lines.push(`the backups folder keeps the newest ${kept.keep}; removed ${kept.removed.length} older`);
      return { json: { ...made, keep: kept?.keep ?? null }, text: lines.join('\n') };
    },
  },
  {
    words: ['backups', 'list'],
    args: '',
    summary: 'List the backups of the store',
    options: {},
    run: async (_args, context) => {
      const overview = await context.call('backups.list', {});
      const table = formatTable(overview.backups, [
        { header: 'made (UTC)', value: (b) => b.createdAt.slice(0, 19).replace('T', ' ') },
        { header: 'why', value: (b) => b.reason },
        { header: 'schema', value: (b) => b.schemaVersion, align: 'right' },
        { header: 'bytes', value: (b) => b.bytes, align: 'right' },
        { header: 'file', value: (b) => b.fileName },
      ]);
      return { json: overview, text: `${overview.folder} (keeps the newest ${overview.keep})\n${table}` };
    },
  },
  {
    words: ['restore'],
    args: '<backup file>',
    summary: 'Replace the store with a backup (checked first; the current store is kept in the backups folder)',
    options: {},
    run: async (args, context) => {
      const file = requirePositional(args, 0, 'backup file');
      const report = await context.maintenance.restore(resolve(file));
      const kept = report.previousStoreKeptAt ? `; the previous store is kept at ${report.previousStoreKeptAt}` : '';
      return {
        json: report,
        text: `restored ${report.restoredFrom} (schema ${report.fromSchemaVersion} → ${report.schemaVersion})${kept}`,
      };
    },
  },
  {
    words: ['check'],
    args: '',
    summary: 'Run the full SQLite integrity check on the store',
    options: {},
    run: (_args, context) => {
      const result = context.maintenance.check();
      if (result.schemaVersion < 1) throw new CliError(`${result.path} has no schema`);
      return Promise.resolve({
        json: { ...result, ok: true },
        text: `${result.path}: integrity ok (schema ${result.schemaVersion})`,
      });
    },
  },
];
