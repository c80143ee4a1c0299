import { defineConfig } from 'vitest/config';
import { TIMEOUTS } from './test/support/timeouts.ts';

// Tiers (DEVELOPERS.md "Tests"): `npm run test:unit` runs the unit project only (model, db, services, renderer form models: no
// browser, no child processes); `npm test` runs all three.
const UNIT = [
  'test/shared-model/**/*.test.ts',
  'test/db/**/*.test.ts',
  'test/services/**/*.test.ts',
  // renderer form models: pure modules, no browser
  'test/renderer/**/*.test.ts',
];
// Lints and compiles fixtures in child processes: tooling, not the model.
const UNIT_EXCLUDE = ['test/shared-model/layer-rules.test.ts'];

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
      { extends: true, test: { name: 'unit', include: UNIT, exclude: UNIT_EXCLUDE } },
      {
        extends: true,
        test: {
          name: 'integration',
          include: [
            'test/electron/**/*.test.ts',
            'test/reference/**/*.test.ts',
            'test/types/**/*.test.ts',
            ...UNIT_EXCLUDE,
          ],
        },
      },
      // Attacks, crashes, fuzzing (`npm run test:trust`; .ci/run runs them through `npm test`).
      { extends: true, test: { name: 'trust', include: ['test/trust/**/*.test.ts'] } },
      {
        extends: true,
        test: { name: 'browser', include: ['test/e2e/**/*.test.ts'], testTimeout: TIMEOUTS.browserTestMs },
      },
    ],
  },
});
