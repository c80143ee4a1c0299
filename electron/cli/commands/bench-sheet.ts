/** `pairwright batches sheet <id> --pdf FILE`: the bench sheet of a saved batch, as the app prints it. */
import { writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { CliError, optionalString, requirePositional, type CliCommand } from '../command';
import { htmlToPdf } from '../pdf';

function batchId(text: string): number {
  if (!/^\d+$/.test(text)) throw new CliError(`<batch> must be a batch id (a whole number), got "${text}"`);
  return Number(text);
}

export const benchSheetCommands: CliCommand[] = [
  {
    words: ['batches', 'sheet'],
    args: '<batch>',
    summary:
      'Write the bench sheet of a saved batch (reagents to pipette, order of addition, GHS hazards) as PDF or HTML',
    options: {
      pdf: { type: 'string', description: 'write the sheet as PDF to this file (needs Chromium)' },
      html: { type: 'string', description: 'write the sheet as printable HTML to this file' },
      date: { type: 'string', description: 'date printed on the sheet (yyyy-mm-dd; default today)' },
    },
    run: async (args, context) => {
      const id = batchId(requirePositional(args, 0, 'batch'));
      const pdfPath = optionalString(args, 'pdf');
      const htmlPath = optionalString(args, 'html');
      const date = optionalString(args, 'date');
      const document = await context.call('batches.sheet', { id, ...(date !== undefined ? { printedOn: date } : {}) });
      const written: string[] = [];
      if (htmlPath !== undefined) {
        context.writeTextFile(htmlPath, document.html);
        written.push(resolve(htmlPath));
      }
      if (pdfPath !== undefined) {
        writeFileSync(resolve(pdfPath), await htmlToPdf(document.html));
        written.push(resolve(pdfPath));
      }
      const s = document.sheet;
      const lines = [
        `Bench sheet for batch #${s.batchId} "${s.batchName}" (${s.campaignName ?? 'no campaign'}), ${s.pair}, ${s.routeLabel}`,
        `${s.reagents.length} reagents, ${s.procedure.length} steps, ${s.hazards.length} hazard and ` +
          `${s.precautions.length} precautionary statements`,
        ...(written.length > 0
          ? written.map((path) => `written: ${path}`)
          : ['give --pdf FILE or --html FILE to write it']),
      ];
      return { json: { ...document, written }, text: lines.join('\n') };
    },
  },
];
