// Redis from Debian's package, on loopback, append-only file under the project.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { alive, run, sleep, startDetached, waitFor } from './processes.js';
import type { StackConfig } from './config.js';

type Redis = StackConfig['redis'];

/** True when Redis answers PING on this port. */
export function redisUp(r: Redis): boolean {
  try {
    return run('redis-cli', ['-h', r.host, '-p', String(r.port), 'ping']).trim() === 'PONG';
  } catch {
    return false;
  }
}

/** Starts Redis unless it already answers; returns the pid it started, or null when it reused one. */
export async function startRedis(r: Redis): Promise<number | null> {
  mkdirSync(r.dir, { recursive: true });
  if (redisUp(r)) return null;
  // Runs in the foreground as our child (not --daemonize), so it is reaped and stopped by its pid.
  const pid = startDetached(
    'redis-server',
    [
      '--bind',
      r.host,
      '--port',
      String(r.port),
      '--protected-mode',
      'yes',
      '--dir',
      r.dir,
      '--appendonly',
      'yes',
      '--appendfsync',
      'everysec',
      '--save',
      '',
      '--daemonize',
      'no',
      '--maxmemory-policy',
      'noeviction',
    ],
    join(r.dir, 'redis.log'),
  );
  await waitFor(
    `Redis on port ${r.port}`,
    () => {
      if (!alive(pid)) throw new Error(`Redis exited at start; see ${join(r.dir, 'redis.log')}`);
      return redisUp(r);
    },
    30_000,
  );
  return pid;
}

/** Empties the instance (test profile only: its own server, never the demo's). */
export function flushRedis(r: Redis): void {
  run('redis-cli', ['-h', r.host, '-p', String(r.port), 'flushall']);
}

/** Asks Redis to shut down and waits until the process is gone. */
export async function stopRedis(r: Redis, pid: number): Promise<void> {
  try {
    run('redis-cli', ['-h', r.host, '-p', String(r.port), 'shutdown']);
  } catch {
    if (alive(pid)) process.kill(pid, 'SIGTERM');
  }
  while (alive(pid)) await sleep(100);
}
