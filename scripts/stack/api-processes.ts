// Runs the pipeline API's one-off set-up (migrations, first admin) and starts the API and worker.
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { ROOT, serviceEnv, type StackConfig } from './config.js';
import { portOpen, waitFor, alive } from './processes.js';
import type { Stack } from './stack.js';

const API = join(ROOT, 'pipeline-api', 'dist');

/** Applies migrations and creates the first admin when there is none (prints its sign-in once). */
export function runSetup(cfg: StackConfig): void {
  const r = spawnSync(process.execPath, [join(API, 'setup.js')], {
    stdio: 'inherit',
    env: { ...process.env, ...serviceEnv(cfg) },
  });
  if (r.status !== 0)
    throw new Error('database set-up failed (migrations or first admin); see the lines above');
}

/** Starts the API and one worker; resolves when the API answers /api/health. */
export async function startApiAndWorker(stack: Stack): Promise<{ url: string }> {
  const { cfg } = stack;
  if (await portOpen(cfg.api.host, cfg.api.port)) {
    throw new Error(
      `port ${cfg.api.port} is already in use; stop what runs there or set ${cfg.profile === 'test' ? 'TEST_' : ''}API_PORT`,
    );
  }
  const env = { ...process.env, ...serviceEnv(cfg) };
  const logs = join(cfg.dataDir, 'logs');
  const apiPid = stack.spawnNode('API', [join(API, 'main.js')], env, join(logs, 'api.log'));
  stack.spawnNode('worker', [join(API, 'worker.js')], env, join(logs, 'worker.log'));
  const url = `http://${cfg.api.host}:${cfg.api.port}`;
  await waitFor(
    `the API at ${url}`,
    async () => {
      if (!alive(apiPid)) throw new Error(`the API exited at start; see ${join(logs, 'api.log')}`);
      try {
        const res = await fetch(`${url}/api/health`);
        return res.status === 200 || res.status === 503;
      } catch {
        return false;
      }
    },
    60_000,
    250,
  );
  return { url };
}
