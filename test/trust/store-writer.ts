/**
 * A second program writing to a store, for the crash and two-writer tests (bundled and run as a child process).
 * Usage: store-writer <dataDir> <tag> <batchId> <count|forever>. Writes through dispatch, like every transport:
 * a campaign per step and, every third step, a TEM size import (one row + its diameters, one transaction).
 * After each write returns it prints `ack campaign <name>` or `ack sizes <source file> <n>`; a failure prints
 * `error <message>` and exits 1.
 */
import { dispatch } from '../../electron/services/dispatch';
import { openWorkspace } from '../../electron/services/workspace';

const [dataDir, tag, batchText, countText] = process.argv.slice(2);
const context = openWorkspace({ dataDir: dataDir ?? '', dailyBackup: false });
const batchId = Number(batchText);
const count = countText === 'forever' ? Number.POSITIVE_INFINITY : Number(countText);

function diameters(step: number): { csv: string; n: number } {
  const n = 20 + (step % 40);
  const rows = Array.from({ length: n }, (_, i) => (8 + ((i * 37 + step) % 50) / 10).toFixed(2));
  return { csv: `d (nm)\n${rows.join('\n')}\n`, n };
}

for (let step = 0; step < count; step++) {
  const name = `${tag}-${step}`;
  const created = await dispatch(context, 'campaigns.create', { name });
  if (!created.ok) {
    process.stdout.write(`error ${created.error.code} ${created.error.message}\n`);
    process.exit(1);
  }
  process.stdout.write(`ack campaign ${name}\n`);
  if (step % 3 === 0 && batchId > 0) {
    const { csv, n } = diameters(step);
    const recorded = await dispatch(context, 'outcomes.record', {
      batchId,
      sizes: { csvText: csv, sourceFile: `${name}.csv` },
    });
    if (!recorded.ok) {
      process.stdout.write(`error ${recorded.error.code} ${recorded.error.message}\n`);
      process.exit(1);
    }
    process.stdout.write(`ack sizes ${name}.csv ${n}\n`);
  }
}
context.store.close();
