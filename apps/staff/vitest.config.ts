import { defineConfig } from 'vitest/config';

// The staff app's unit tests (the models beside the code); `--project staff`.
export default defineConfig({ test: { name: 'staff' } });
