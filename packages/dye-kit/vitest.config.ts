import { defineProject } from 'vitest/config';

export default defineProject({
  test: {
    name: 'dye-kit',
    environment: 'node',
    include: ['src/**/*.test.ts'],
  },
});
