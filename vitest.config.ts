// One Vitest run over every workspace, so `npm test` prints one total.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    projects: ['solver', 'pipeline-api', 'studio-web', 'assets-sample', 'test'],
  },
});
