/**
 * `pairwright screen <campaign>`: Monte Carlo for every pair of the campaign's elements × composition ×
 * size, queued over all cores but one; waits, then prints the pair × pair matrix (architecture of each
 * run beside the analytic prediction) and the pairs skipped with why.
 */
import type { ScreenStatus } from '../../../shared-model/api/screen';
import { readUserNumber } from '../../../shared-model/text/user-number';
import {
  CliError,
  optionalNumber,
  optionalString,
  requirePositional,
  type CliCommand,
  type ParsedArgs,
} from '../command';
import { formatTable } from '../table';
import { resolveCampaign } from './campaigns';

/** A comma-separated list of numbers (decimals with a point: the comma separates the items). */
function numberList(args: ParsedArgs, name: string): number[] | undefined {
  const text = optionalString(args, name);
  if (text === undefined) return undefined;
  return text.split(',').map((piece) => {
    const read = readUserNumber(piece, `--${name}`);
    if (!read.ok) throw new CliError(read.message);
    return read.value;
  });
}

/** Compositions as at.% (25,50,75) or fractions (0.25,0.5): a list with any value above 1 is read as at.%. */
function compositions(args: ParsedArgs): number[] {
  const values = numberList(args, 'xB');
  if (!values) throw new CliError('--xB is required (compositions of B, e.g. --xB 25,50,75 in at.%)');
  const percent = values.some((v) => v > 1);
  return values.map((v) => (percent ? v / 100 : v));
}

function matrixText(status: ScreenStatus): string {
  const blocks: string[] = [];
  for (const d of status.diameters) {
    for (const x of status.compositions) {
      const cells = status.cells.filter((c) => c.diameterNm === d && Math.abs(c.x - x) < 1e-9);
      const header = `${d} nm, column element at ${Math.round(x * 100)} at.% — Monte Carlo / analytic prediction`;
      const rows = status.elements.map((row) => ({ row }));
      const table = formatTable(rows, [
        { header: '', value: (r) => r.row },
        ...status.elements.map((column) => ({
          header: column,
          value: (r: { row: string }) => {
            const cell = cells.find((c) => c.row === r.row && c.column === column);
            if (!cell) return r.row === column ? '·' : '';
            return `${cell.status === 'done' ? (cell.architecture ?? '?') : cell.status} / ${cell.prediction ?? '–'}`;
          },
        })),
      ]);
      blocks.push(`${header}\n${table}`);
    }
  }
  return blocks.join('\n\n');
}

export const screenCommands: CliCommand[] = [
  {
    words: ['screen'],
    args: '<campaign>',
    summary:
      "Monte Carlo for every pair of a campaign's elements × composition × size (all cores but one); prints the matrix",
    options: {
      xB: {
        type: 'string',
        description: 'compositions of B, comma-separated, in at.% (25,50,75) or fractions; required',
      },
      'diameter-nm': { type: 'string', description: 'particle diameters in nm, comma-separated (e.g. 3,6); required' },
      'temperature-k': { type: 'string', description: 'temperature in K, required' },
      shape: { type: 'string', description: 'cuboctahedron (default), icosahedron, truncated-octahedron or sphere' },
      sweeps: { type: 'string', description: 'most sweeps per run (default 3000; each run stops at the answer)' },
      seed: { type: 'string', description: 'random seed of every run (default 1)' },
    },
    run: async (args, context) => {
      const campaign = await resolveCampaign(context, requirePositional(args, 0, 'campaign'));
      const diameterNm = numberList(args, 'diameter-nm');
      if (!diameterNm) throw new CliError('--diameter-nm is required (e.g. --diameter-nm 3,6)');
      const temperatureK = optionalNumber(args, 'temperature-k');
      if (temperatureK === undefined) throw new CliError('--temperature-k is required');
      const sweeps = optionalNumber(args, 'sweeps');
      const seed = optionalNumber(args, 'seed');
      const started = await context.call('screen.start', {
        campaignId: campaign.id,
        xB: compositions(args),
        diameterNm,
        temperatureK,
        ...(optionalString(args, 'shape') !== undefined ? { shape: optionalString(args, 'shape') } : {}),
        ...(sweeps !== undefined ? { sweeps } : {}),
        ...(seed !== undefined ? { seed } : {}),
      });
      const runIds = started.runs.map((r) => r.runId);
      let status: ScreenStatus;
      for (;;) {
        status = await context.call('screen.status', { runIds });
        if (status.finished === status.total) break;
        await new Promise((resolve) => setTimeout(resolve, 250));
      }
      const json = {
        campaign: campaign.name,
        label: started.label,
        concurrency: started.concurrency,
        elements: started.elements,
        runs: status.runs,
        cells: status.cells,
        skipped: started.skipped,
        wallTimeMs: status.elapsedMs,
      };
      const skipped = started.skipped.map((s) => `skipped ${s.pair}: ${s.reason}`);
      const failed = status.runs
        .filter((r) => r.status !== 'done')
        .map((r) => `run ${r.runId} ${r.elementA}-${r.elementB} ${r.status}: ${r.error ?? ''}`);
      const text = [
        `${status.total} runs over ${started.concurrency} worker(s) for ${campaign.name}${status.elapsedMs !== null ? `, ${(status.elapsedMs / 1000).toFixed(1)} s` : ''}`,
        matrixText(status),
        ...failed,
        ...skipped,
      ].join('\n\n');
      return { json, text };
    },
  },
];
