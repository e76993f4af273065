import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    name: 'fake-payments',
    include: ['src/**/*.test.ts'],
    testTimeout: 15_000,
  },
});
