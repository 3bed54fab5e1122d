import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    name: 'pipeline-api',
    environment: 'node',
    include: ['src/**/*.spec.ts', 'test/**/*.e2e-spec.ts'],
    setupFiles: ['test/setup-env.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
