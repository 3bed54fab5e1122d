// Component and unit tests run in a simulated browser (happy-dom) with the app's own Vite set-up.
import { defineConfig, mergeConfig } from 'vitest/config';
import viteConfig from './vite.config.ts';

export default mergeConfig(
  viteConfig,
  defineConfig({
    test: {
      name: 'studio-web',
      environment: 'happy-dom',
      include: ['src/**/*.spec.{ts,tsx}'],
      setupFiles: ['src/testing/setup.ts'],
      unstubGlobals: true,
      restoreMocks: true,
    },
  }),
);
