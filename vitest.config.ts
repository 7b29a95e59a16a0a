import { defineConfig } from 'vitest/config';

// One run over every package: each project keeps its own environment and include pattern.
export default defineConfig({
  test: {
    projects: ['packages/*/vitest.config.ts', 'apps/*/vitest.config.ts', 'tests/vitest.config.ts'],
  },
});
