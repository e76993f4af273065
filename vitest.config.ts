import { defineConfig } from 'vitest/config';

// One run covers every workspace. Projects that need PostgreSQL or a browser
// carry their own vitest.config.ts with a globalSetup.
export default defineConfig({
  test: {
    projects: ['packages/*', 'fakes/*', 'apps/api', 'apps/shop', 'apps/staff', 'tests', 'tests/structure'],
  },
});
