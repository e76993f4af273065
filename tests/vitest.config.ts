import { defineConfig } from 'vitest/config';

// End-to-end journeys in Debian's Chromium against the whole stack (API with
// its jobs, both built apps and the three fakes), on a database of their own.
export default defineConfig({
  test: {
    name: 'e2e',
    include: ['e2e/**/*.test.ts', 'setup/**/*.test.ts'],
    globalSetup: ['support/global-setup.ts'],
    setupFiles: ['support/report-failures.ts'],
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
