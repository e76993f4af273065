import { defineConfig } from 'vitest/config';

// Checks of the code's shape rather than its behaviour: every workspace
// type-checks, the import boundaries in .dependency-cruiser.cjs hold, and the
// workspace manifests point at files that exist. Each failure names the file.
export default defineConfig({
  test: {
    name: 'structure',
    include: ['**/*.test.ts'],
    // the type-checks run two at a time inside typecheck.test.ts
    maxConcurrency: 2,
    // one workspace takes well under a minute on an idle 2-core machine; generous for a busy one
    testTimeout: 400_000,
    hookTimeout: 120_000,
  },
});
