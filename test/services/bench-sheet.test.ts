/** The bench sheet operation on a real SQLite file, through the dispatcher every transport uses. */
import { rmSync } from 'node:fs';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import type { ServiceContext } from '../../electron/services/context';
import { dispatch } from '../../electron/services/dispatch';
import type { BenchSheetDocument } from '../../shared-model/api/bench-sheet';
import type { SavedBatch } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import { dispatchValue } from '../support/dispatch';
import { tempDataDir } from '../support/host-fixture';
import { ptNi } from '../support/sample-batches';

let store: Store;
let context: ServiceContext;
let dataDir: string;
beforeEach(() => {
  dataDir = tempDataDir();
  store = openStore({ dataDir });
  context = { store };
});
afterEach(() => {
  store.close();
  rmSync(dataDir, { recursive: true, force: true });
});

const ok = <T>(name: string, input: unknown): Promise<T> => dispatchValue<T>(context, name, input);

describe('batches.sheet', () => {
  it('prints the saved batch with its campaign, volumes to pipette, hazards, precautions and the SDS reminder', async () => {
    const campaign = await ok<Campaign>('campaigns.create', { name: 'Cathode screen' });
    const saved = await ok<SavedBatch>('batches.save', {
      name: 'PtNi-07',
      campaignId: campaign.id,
      design: ptNi,
      lots: [{ reagentKey: 'nabh4', lot: 'LOT-42' }],
    });
    const { sheet, html } = await ok<BenchSheetDocument>('batches.sheet', { id: saved.id, printedOn: '2026-12-02' });
    expect(sheet.campaignName).toBe('Cathode screen');
    expect(sheet.batchName).toBe('PtNi-07');
    expect(sheet.printedOn).toBe('2026-12-02');
    // Volumes to pipette are the saved design's, reagent by reagent.
    for (const reagent of saved.design.reagents) {
      expect(sheet.reagents.find((r) => r.key === reagent.key)?.volumeMl).toBe(reagent.volumeMl);
    }
    expect(sheet.reagents.find((r) => r.key === 'nabh4')?.lot).toBe('LOT-42');
    expect(sheet.hazards.map((h) => h.code)).toEqual(saved.design.hazardSummary.hazards.map((h) => h.code));
    expect(sheet.precautions.some((p) => p.code === 'P280')).toBe(true);
    expect(sheet.procedure.length).toBeGreaterThanOrEqual(4);
    expect(html).toContain('Bench sheet — PtNi-07');
    expect(html).toContain('Cathode screen');
    expect(html).toContain('Wear protective gloves/protective clothing/eye protection/face protection.');
    expect(html).toContain("supplier's safety data sheet (SDS)");
    expect(html.match(/<svg /g)?.length).toBe(sheet.pictograms.length);
    expect(html).not.toMatch(/<script/i);
  });

  it('lists only incompatibilities between reagents of this batch', async () => {
    const saved = await ok<SavedBatch>('batches.save', { name: 'PtNi-08', design: ptNi });
    const { sheet } = await ok<BenchSheetDocument>('batches.sheet', { id: saved.id });
    const keys = new Set(saved.design.reagents.map((r) => r.key));
    for (const warning of sheet.incompatibilities) {
      expect(warning.reagentKeys.every((k) => keys.has(k))).toBe(true);
    }
    expect(sheet.campaignName).toBeNull();
    expect(sheet.printedOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  });

  it('refuses an unknown batch and a malformed date naming the field', async () => {
    expect(await dispatch(context, 'batches.sheet', { id: 999 })).toMatchObject({ ok: false });
    const saved = await ok<SavedBatch>('batches.save', { name: 'B', design: ptNi });
    expect(await dispatch(context, 'batches.sheet', { id: saved.id, printedOn: '2/12/2026' })).toMatchObject({
      ok: false,
      error: { field: 'printedOn' },
    });
  });
});

describe('batches.sheet escaping', () => {
  it('prints names with markup characters as text', async () => {
    const saved = await ok<SavedBatch>('batches.save', { name: 'Pt<b>Ni</b> & co', design: ptNi });
    const { html } = await ok<BenchSheetDocument>('batches.sheet', { id: saved.id });
    expect(html).toContain('Pt&lt;b&gt;Ni&lt;/b&gt; &amp; co');
    expect(html).not.toContain('<b>Ni</b>');
  });
});
