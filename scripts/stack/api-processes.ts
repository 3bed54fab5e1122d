// Runs the pipeline API's one-off set-up (migrations, the demo show, first admin) and starts the
// API and worker.
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { ROOT, serviceEnv, type StackConfig } from './config.js';
import { portOpen, waitFor, alive } from './processes.js';
import type { Stack } from './stack.js';

const API = join(ROOT, 'pipeline-api', 'dist');

/** A demo sign-in that works on the database (its password is a demo-only one). */
export interface DemoSignIn {
  role: string;
  email: string;
  displayName: string;
  password: string;
}

/** What the set-up says about the demo show (see pipeline-api/src/seed/demo-setup.ts). */
export interface DemoReport {
  demo: 'loaded' | 'present' | 'absent';
  note: string | null;
  signIns: DemoSignIn[];
  passwordNotice: string | null;
}

/**
 * Applies migrations, loads the demo show into an empty database when `demo` is set (as `npm
 * start` does; tests keep their database to themselves), and creates the first admin when there
 * is none (prints its sign-in once). Returns the demo report, or null without `demo`.
 */
export function runSetup(cfg: StackConfig, opts: { demo?: boolean } = {}): DemoReport | null {
  const report = join(cfg.dataDir, 'demo-report.json');
  rmSync(report, { force: true });
  const args = [join(API, 'setup.js'), ...(opts.demo ? ['--demo', '--report', report] : [])];
  const r = spawnSync(process.execPath, args, {
    stdio: 'inherit',
    env: { ...process.env, ...serviceEnv(cfg) },
  });
  if (r.status !== 0) {
    throw new Error(
      'database set-up failed (migrations, demo show or first admin); see the lines above',
    );
  }
  if (!opts.demo || !existsSync(report)) return null;
  const parsed = JSON.parse(readFileSync(report, 'utf8')) as DemoReport;
  rmSync(report, { force: true });
  return parsed;
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
