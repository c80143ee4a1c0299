/**
 * The one timeout policy of the suite (stated in DEVELOPERS.md, applied in vitest.config.ts and
 * test/support/browser.ts). The figures leave room for a busy 2-core machine shared by several test runs.
 * A test that needs a longer wait names one of these constants; no other figures.
 */
export const TIMEOUTS = {
  /** One unit, db, service, CLI or reference test. */
  testMs: 30_000,
  /** beforeAll/afterAll/beforeEach/afterEach hooks (a browser launch, a host start). */
  hookMs: 60_000,
  /** One browser test: it starts its own host and page and sets up its own data. */
  browserTestMs: 120_000,
  /** A page action (click, fill, goto, waitFor) and an `expect.poll` on the page. */
  pageActionMs: 15_000,
  /** A wait for background work seen through the page: a Monte Carlo run, a demo build, line-scan fits. */
  longWaitMs: 60_000,
  /** A CLI test that runs several child processes in sequence (each starts Node; seconds on a busy machine). */
  cliSequenceMs: 180_000,
  /** One operation's fuzz run in the trust suite (1,000 generated inputs in CI, each within its own 2 s budget). */
  fuzzOperationMs: 180_000,
} as const;
