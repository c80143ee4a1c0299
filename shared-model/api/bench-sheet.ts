/** The printable bench sheet of a saved batch (reagents to pipette, order of addition, hazards, record lines). */
import { z } from 'zod';
import type { BenchSheet } from '../benchsheet/sheet';
import { operation } from './operation';
import { idSchema } from './schemas';

export interface BenchSheetDocument {
  sheet: BenchSheet;
  /** The sheet as a self-contained printable HTML document. */
  html: string;
}

export const benchSheetOperations = {
  'batches.sheet': operation<BenchSheetDocument>()({
    kind: 'query',
    summary: 'The bench sheet of a saved batch: reagents and volumes, order of addition, GHS hazards and precautions',
    input: z.object({
      id: idSchema,
      /** The date printed on the sheet (ISO yyyy-mm-dd); today when omitted. */
      printedOn: z
        .string()
        .regex(/^\d{4}-\d{2}-\d{2}$/, 'must be a date as yyyy-mm-dd')
        .optional(),
    }),
  }),
};
