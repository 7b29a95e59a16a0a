import { defineConfig } from 'vitest/config';

// One run over every package: each project keeps its own environment and include pattern.
export default defineConfig({
  test: {
    projects: [
      'packages/*/vitest.config.ts',
      'apps/server/vitest.config.ts',
      'apps/console',
      'apps/viewer',
      'tests/vitest.config.ts',
    ],
  },
});
