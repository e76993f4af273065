import { defineConfig } from 'vitest/config';

// The shop's unit tests (the models beside the code); `--project shop`.
export default defineConfig({ test: { name: 'shop' } });
