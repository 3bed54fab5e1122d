import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: { name: 'assets-sample', include: ['test/**/*.spec.ts'], passWithNoTests: true },
});
