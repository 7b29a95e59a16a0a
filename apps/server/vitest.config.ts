import { defineProject } from 'vitest/config';

// Integration tests talk to the real services that infra-local/test.sh started.
export default defineProject({
  test: {
    name: 'server',
    environment: 'node',
    include: ['src/**/*.test.ts'],
    testTimeout: 20_000,
    hookTimeout: 30_000,
  },
});
