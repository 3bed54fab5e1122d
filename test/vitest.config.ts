import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    name: 'test',
    environment: 'node',
    include: ['integration/**/*.spec.ts', 'browser/**/*.spec.ts'],
    // These files start browsers and private servers: one at a time keeps the 2-core machine calm.
    fileParallelism: false,
    // After the unit projects: these need the whole stack and a browser.
    sequence: { groupOrder: 1 },
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
