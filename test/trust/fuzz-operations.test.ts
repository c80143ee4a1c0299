/**
 * Property-based fuzzing of every operation of the contract through dispatch (fast-check, seeded, fixed counts):
 * RUNS_PER_OPERATION generated inputs per operation (1,000 with CI=true, 100 otherwise), from arbitrary JSON and
 * from near-valid mutations of valid inputs, on a real SQLite store. See fuzz/harness.ts for what each input must
 * satisfy and fuzz/seeds.ts for the operations whose inputs are bounded (none is left out).
 * Reproduce one failure: FUZZ_SEED=<seed> FUZZ_RUNS=<n> npx vitest run test/trust/fuzz-operations.test.ts -t <name>.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OPERATION_NAMES } from '../../shared-model/api/contract';
import { TIMEOUTS } from '../support/timeouts';
import { buildTemplate, type FixtureTemplate } from './fuzz/fixture';
import { BASE_SEED, fuzzOperation, RUNS_PER_OPERATION, type OperationStats } from './fuzz/harness';

let template: FixtureTemplate;
beforeAll(async () => {
  template = await buildTemplate();
}, TIMEOUTS.hookMs);

const report: OperationStats[] = [];
afterAll(() => {
  if (report.length === 0) return;
  const lines = report.map((s) => {
    const rejected = Object.entries(s.rejected)
      .map(([code, n]) => `${code} ${n}`)
      .join(', ');
    return (
      `${s.name.padEnd(26)} ${String(s.inputs).padStart(5)} inputs, ${String(s.accepted).padStart(4)} accepted, ` +
      `rejected: ${rejected || 'none'} (${s.fullDumps} with all tables compared); slowest ${s.slowestMs.toFixed(0)} ms, ` +
      `calls ${(s.totalMs / 1000).toFixed(1)} s, dumps ${(s.dumpMs / 1000).toFixed(1)} s` +
      (s.bounded ? ` [bounded: ${s.bounded}]` : '')
    );
  });
  const sum = (f: (s: OperationStats) => number): number => report.reduce((n, s) => n + f(s), 0);
  const total = sum((s) => s.inputs);
  const rejected = sum((s) => Object.values(s.rejected).reduce((a, b) => a + b, 0));
  const peak = Math.max(...report.map((s) => s.peakRssMb));
  console.log(
    `[fuzz operations] seed ${BASE_SEED}, ${RUNS_PER_OPERATION} per operation: ${total} inputs over ${report.length} ` +
      `operations, ${rejected} rejected (every one with no row written, ${sum((s) => s.fullDumps)} with all tables ` +
      `compared), calls ${(sum((s) => s.totalMs) / 1000).toFixed(0)} s, dumps ${(sum((s) => s.dumpMs) / 1000).toFixed(0)} s, ` +
      `peak RSS ${peak.toFixed(0)} MB\n${lines.join('\n')}`,
  );
});

describe(`every operation through dispatch, ${RUNS_PER_OPERATION} generated inputs each`, () => {
  it('covers every operation of the contract', () => {
    expect(OPERATION_NAMES.length).toBeGreaterThan(60);
  });
  for (const name of OPERATION_NAMES) {
    it(
      name,
      async () => {
        const stats = await fuzzOperation(template, name);
        report.push(stats);
        expect(stats.inputs).toBe(RUNS_PER_OPERATION);
      },
      TIMEOUTS.fuzzOperationMs,
    );
  }
});
