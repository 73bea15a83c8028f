import { defineConfig } from 'vitest/config';

// End-to-end tests: real Chromium driven by playwright-core, one file at a time.
export default defineConfig({
  test: {
    globals: true,
    include: ['test/e2e/**/*.e2e.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 180_000,
    hookTimeout: 120_000,
    globalSetup: ['test/e2e/support/global-setup.ts'],
    reporters: ['default', ['json', { outputFile: 'test-results/e2e.json' }]],
  },
});
