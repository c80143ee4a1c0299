/**
 * Batch design throughput: one design (geometry, amounts, kinetic checks, hazard block), a catalog
 * preparation (mf-parser on every formula), and a reagent list over 200 saved designs. Warm-up first,
 * then the median of several timed runs. Figures only; nothing is asserted.
 */
import { performance } from 'node:perf_hooks';
import { designBatch } from '../../shared-model/recipes/design';
import { batchDesignInputSchema } from '../../shared-model/recipes/design-input';
import { prepareReagent } from '../../shared-model/recipes/reagent';
import { buildReagentList, reagentListCsv } from '../../shared-model/recipes/reagent-list';
import { REAGENT_SEED } from '../../shared-model/recipes/reagent-seed';
import { ptNi } from '../support/sample-batches';

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? (sorted[mid] as number) : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

function time(label: string, repeats: number, runs: number, fn: () => void): void {
  for (let i = 0; i < repeats; i += 1) fn();
  const samples: number[] = [];
  for (let r = 0; r < runs; r += 1) {
    const start = performance.now();
    for (let i = 0; i < repeats; i += 1) fn();
    samples.push((performance.now() - start) / repeats);
  }
  console.log(`${label.padEnd(52)} ${median(samples).toFixed(3)} ms (median of ${runs} runs × ${repeats})`);
}

export async function run(): Promise<void> {
  const catalog = REAGENT_SEED.map((r) => prepareReagent(r));
  const input = batchDesignInputSchema.parse({ ...ptNi, capping: { reagentKey: 'pvp', molPerMolMetal: 10 } });
  time(`prepare catalog (${REAGENT_SEED.length} reagents, mf-parser)`, 20, 7, () => {
    REAGENT_SEED.map((r) => prepareReagent(r));
  });
  time('validate input (zod) + design one batch', 200, 7, () => {
    designBatch(batchDesignInputSchema.parse(input), { catalog, thermodynamicSurfaceElement: 'Pt' });
  });
  const design = designBatch(input, { catalog });
  const batches = Array.from({ length: 200 }, (_, i) => ({
    batchId: i + 1,
    batchName: `b${i + 1}`,
    reagents: design.reagents,
  }));
  time('reagent list over 200 batches + CSV', 20, 7, () => {
    reagentListCsv(
      buildReagentList(
        batches,
        [{ reagentKey: 'nabh4', amount: 5, unit: 'g', location: 'cabinet', lot: 'L1' }],
        catalog,
      ),
    );
  });
}
