// Build and dev-server set-up for the studio client. The API runs as its own process; in
// development Vite forwards /api to it so the browser sees a single origin.
import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig, type ProxyOptions } from 'vite';

/** Port of the local pipeline API; read once and checked so a typo fails at start-up. */
function apiPort(): number {
  const raw = process.env.OVERSHOOT_API_PORT ?? '3000';
  const port = Number(raw);
  if (!/^\d+$/.test(raw) || port < 1 || port > 65535) {
    throw new Error(`OVERSHOOT_API_PORT must be a port number from 1 to 65535; got "${raw}".`);
  }
  return port;
}

const apiProxy: Record<string, ProxyOptions> = {
  '/api': { target: `http://127.0.0.1:${apiPort()}` },
};

export default defineConfig({
  root: fileURLToPath(new URL('.', import.meta.url)),
  plugins: [react()],
  resolve: { alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) } },
  server: { proxy: apiProxy },
  preview: { proxy: apiProxy },
  build: { outDir: 'dist', emptyOutDir: true },
});
