/** The bench sheet of a saved batch, built from the batch as saved and its campaign's name. */
import { getCampaign } from '../../db/repositories/campaigns';
import type { benchSheetOperations } from '../../shared-model/api/bench-sheet';
import { benchSheet } from '../../shared-model/benchsheet/sheet';
import { benchSheetHtml } from '../../shared-model/benchsheet/sheet-html';
import { batchHandlers, getDesignedBatch } from './batches';
import type { HandlerMap } from './context';

export const benchSheetHandlers: HandlerMap<keyof typeof benchSheetOperations> = {
  'batches.sheet': async (input, context) => {
    getDesignedBatch(context.store.db, input.id, 'id');
    const batch = await batchHandlers['batches.get']({ id: input.id }, context);
    const campaignName = batch.campaignId === null ? null : getCampaign(context.store.db, batch.campaignId).name;
    const sheet = benchSheet(batch, campaignName, input.printedOn ?? new Date().toISOString().slice(0, 10));
    return { sheet, html: benchSheetHtml(sheet) };
  },
};
