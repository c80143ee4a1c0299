import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    reporters: ['default'],
    // Browser tests poll the page; leave room for a busy 2-core CI machine.
    expect: { poll: { timeout: 8_000 } },
  },
});
