import { defineConfig } from 'vitest/config';

// Integration tests share one real MariaDB, so files run one after another.
export default defineConfig({
  test: {
    include: ['test/**/*.test.ts', 'src/**/*.test.ts'],
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
