import { defineProject } from 'vitest/config';

// End-to-end tests drive Debian's Chromium against the server that infra-local/test.sh started.
export default defineProject({
  test: {
    name: 'e2e',
    environment: 'node',
    include: ['e2e/**/*.test.ts'],
    testTimeout: 60_000,
    hookTimeout: 60_000,
    fileParallelism: false,
  },
});
