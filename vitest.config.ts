import { defineConfig } from 'vitest/config';
import { TIMEOUTS } from './test/support/timeouts.ts';

// Tiers (DEVELOPERS.md "Tests"): `npm run test:unit` runs the unit project only (model, db, services, renderer form models: no
// browser, no child processes, no long Monte Carlo validation runs); `npm test` runs every project.
const UNIT = [
  'test/shared-model/**/*.test.ts',
  'test/db/**/*.test.ts',
  'test/services/**/*.test.ts',
  // renderer form models: pure modules, no browser
  'test/renderer/**/*.test.ts',
];
// Lints and compiles fixtures in child processes: tooling, not the model.
const TOOLING = ['test/shared-model/layer-rules.test.ts'];
// Whole Monte Carlo runs checked against published results (surface enrichment, demixing, detailed balance,
// the stopping rule): minutes of CPU, so they run in `npm test` (the physics project), not in the fast tier.
const PHYSICS = [
  'test/shared-model/montecarlo/simulate.test.ts',
  'test/shared-model/montecarlo/relaxed-simulation.test.ts',
  'test/shared-model/montecarlo/swap-engine.test.ts',
];
const UNIT_EXCLUDE = [...TOOLING, ...PHYSICS];

export default defineConfig({
  test: {
    environment: 'node',
    reporters: ['default'],
    // The timeout policy: test/support/timeouts.ts.
    testTimeout: TIMEOUTS.testMs,
    hookTimeout: TIMEOUTS.hookMs,
    expect: { poll: { timeout: TIMEOUTS.pageActionMs } },
    // Every test's temporary folders are removed after it; a folder left behind fails the run.
    setupFiles: ['test/support/setup-temp-dirs.ts'],
    globalSetup: ['test/support/global-temp-root.ts'],
    projects: [
      // The fast tier shares one module graph per worker (isolate: false): 102 files in 25 s on a quiet 2-core
      // machine instead of 61 s (with `--maxWorkers=100%` in `npm run test:unit`: 23 s for 112 files), two thirds of which went to importing the same modules again for each file.
      // Tests hold no module state between files; .ci/run's shuffled run would catch one that did.
      { extends: true, test: { name: 'unit', include: UNIT, exclude: UNIT_EXCLUDE, isolate: false } },
      {
        extends: true,
        test: {
          name: 'integration',
          include: ['test/electron/**/*.test.ts', 'test/reference/**/*.test.ts', 'test/types/**/*.test.ts', ...TOOLING],
        },
      },
      { extends: true, test: { name: 'physics', include: PHYSICS } },
      // Attacks, crashes, fuzzing (`npm run test:trust`; .ci/run runs them through `npm test`).
      { extends: true, test: { name: 'trust', include: ['test/trust/**/*.test.ts'] } },
      {
        extends: true,
        test: { name: 'browser', include: ['test/e2e/**/*.test.ts'], testTimeout: TIMEOUTS.browserTestMs },
      },
    ],
  },
});
