/**
 * Loading the demo campaign (campaigns.loadDemo through the dispatcher) into fresh stores on real SQLite
 * files: the first load in the process (cold: JIT, catalog seeding) and then warm loads, each into a new
 * empty store. Most of the time is the two EDX line-scan fits. Figures only; nothing is asserted.
 */
import { performance } from 'node:perf_hooks';
import os from 'node:os';
import { openStore } from '../../db/store';
import { dispatch } from '../../electron/services/dispatch';
import { removeTempDir, tempDir } from '../support/temp-dirs';

async function loadOnce(): Promise<number> {
  const dataDir = tempDir('pairwright-bench-demo-');
  const store = openStore({ dataDir });
  try {
    const start = performance.now();
    const result = await dispatch({ store }, 'campaigns.loadDemo', {});
    const elapsed = performance.now() - start;
    if (!result.ok) throw new Error(`campaigns.loadDemo: ${result.error.message}`);
    return elapsed;
  } finally {
    store.close();
    removeTempDir(dataDir);
  }
}

export async function run(): Promise<void> {
  console.log(
    `load average ${os
      .loadavg()
      .map((v) => v.toFixed(2))
      .join(' ')} on ${os.cpus().length} cores`,
  );
  const cold = await loadOnce();
  console.log(`${'demo load, first in the process (cold)'.padEnd(52)} ${cold.toFixed(0)} ms`);
  const warm: number[] = [];
  for (let i = 0; i < 5; i += 1) warm.push(await loadOnce());
  warm.sort((a, b) => a - b);
  console.log(
    `${'demo load, warm (median of 5 fresh stores)'.padEnd(52)} ${(warm[2] as number).toFixed(0)} ms (min ${(warm[0] as number).toFixed(0)}, max ${(warm[4] as number).toFixed(0)})`,
  );
}
