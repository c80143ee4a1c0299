/**
 * The Monte Carlo runs a campaign's physics prior reads (shared-model/learn/screen-prior.ts matches them to
 * candidates): finished runs linked to one of the campaign's pairs (a run started from the Simulation view
 * for that pair, or a screen cell of a pair the campaign has), and the runs of the campaign's screens
 * ("screen <campaign name> <ISO time>", which also covers pairs of its elements that it does not list). A run
 * given by shells rather than a diameter is left out (the candidates are by diameter); so is a screen run of a
 * campaign under its former name, when the campaign was renamed after the screen (the label keeps the old name).
 */
import { getCampaign } from '../../db/repositories/campaigns';
import { listPairs } from '../../db/repositories/pairs';
import { listFinishedRunLabels } from '../../db/repositories/simulation';
import type { Store } from '../../db/store';
import type { MonteCarloLabel } from '../../shared-model/learn/screen-prior';

const ISO_TIME = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d+)?Z$/;

export function campaignMonteCarloLabels(store: Store, campaignId: number): MonteCarloLabel[] {
  const campaign = getCampaign(store.db, campaignId);
  const pairIds = listPairs(store.db, campaignId).map((p) => p.id);
  const prefix = `screen ${campaign.name} `;
  const linked = new Set(pairIds);
  return listFinishedRunLabels(store.db, { pairIds, labelPrefix: prefix })
    .filter((r) => {
      if (r.spec.diameterNm === undefined) return false;
      // A label of another campaign whose name starts like this one's ("screen A B …" for campaign "A").
      const byLabel = r.label.startsWith(prefix) && ISO_TIME.test(r.label.slice(prefix.length));
      return byLabel || linkedRun(r, linked);
    })
    .map((r) => ({
      runId: r.id,
      elementA: r.spec.elementA,
      elementB: r.spec.elementB,
      xB: r.spec.xB,
      diameterNm: r.spec.diameterNm as number,
      temperatureK: r.spec.temperatureK,
      architecture: r.architecture,
      createdAt: r.createdAt,
    }));
}

function linkedRun(run: { pairId: number | null }, pairIds: ReadonlySet<number>): boolean {
  return run.pairId !== null && pairIds.has(run.pairId);
}
