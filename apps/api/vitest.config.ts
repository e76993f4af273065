import { defineConfig } from 'vitest/config';

// API tests run the real app against a real PostgreSQL (started by
// `npm test`), one file at a time because they share one database.
export default defineConfig({
  test: {
    name: 'api',
    include: ['test/**/*.test.ts', 'src/**/*.test.ts'],
    globalSetup: ['test/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 60_000,
  },
});
