import { defineProject } from 'vitest/config';

// End-to-end tests drive Debian's Chromium against the server that infra-local/test.sh started;
// budget tests read the apps that it built.
export default defineProject({
  test: {
    name: 'e2e',
    environment: 'node',
    include: ['e2e/**/*.test.ts', 'budget/**/*.test.ts'],
    testTimeout: 60_000,
    hookTimeout: 60_000,
    fileParallelism: false,
  },
});
