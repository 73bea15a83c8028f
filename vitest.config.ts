import { defineConfig } from 'vitest/config';

// Unit and reference tests: pure code in Node (IndexedDB from fake-indexeddb where needed).
export default defineConfig({
  test: {
    globals: true,
    include: ['test/unit/**/*.test.ts', 'test/unit/**/*.test.tsx', 'test/reference/**/*.test.ts'],
    environment: 'node',
    testTimeout: 60_000,
    reporters: ['default', ['json', { outputFile: 'test-results/unit.json' }]],
  },
});
