// Solver tests run in Node.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    name: 'solver',
    include: ['test/**/*.spec.ts'],
    environment: 'node',
    pool: 'forks',
    testTimeout: 60_000,
  },
});
