import { defineConfig } from 'vitest/config';

// Browser tests drive one Chromium against one in-process server; run files in order.
export default defineConfig({
  test: {
    include: ['browser/**/*.test.ts', 'cross/**/*.test.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 90_000,
  },
});
