// The API keeps running while MariaDB or Redis goes away and comes back: its health route turns
// the service down within 5 s and up again after the restart, with no restart of the API.
// Uses a private MariaDB and Redis (own ports and data) so the shared test stack is never stopped.
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROOT, serviceEnv, stackConfig, type StackConfig } from '../../scripts/stack/config.ts';
import { ensureDatabase, startMariadb, stopMariadb } from '../../scripts/stack/mariadb.ts';
import { startRedis, stopRedis } from '../../scripts/stack/redis.ts';
import { alive, startDetached, stopPid, waitFor } from '../../scripts/stack/processes.ts';
import { TEST_DATA_DIR } from '../helpers/env.ts';

type Health = { services: Record<string, { status: 'up' | 'down' }> };

describe('health while services stop and restart', () => {
  let cfg: StackConfig;
  let url: string;
  let apiPid = 0;
  let dbPid: number | null = null;
  let redisPid: number | null = null;

  const state = async (service: string) => {
    const res = await fetch(`${url}/api/health`);
    return ((await res.json()) as Health).services[service].status;
  };

  /** Polls the health route until the service reports `want`; returns the seconds it took. */
  const secondsUntil = async (service: string, want: 'up' | 'down', limitMs: number) => {
    const t0 = Date.now();
    await waitFor(
      `${service} to be ${want}`,
      async () => (await state(service)) === want,
      limitMs,
      100,
    );
    return (Date.now() - t0) / 1000;
  };

  beforeAll(async () => {
    cfg = stackConfig('test', {
      ...process.env,
      TEST_DATA_DIR: join(TEST_DATA_DIR, 'recovery'),
      TEST_DB_PORT: '3327',
      TEST_REDIS_PORT: '6400',
      TEST_API_PORT: '3020',
    });
    dbPid = await startMariadb(cfg.mariadb);
    ensureDatabase(cfg.mariadb);
    redisPid = await startRedis(cfg.redis);
    apiPid = startDetached(
      process.execPath,
      [join(ROOT, 'pipeline-api/dist/main.js')],
      join(cfg.dataDir, 'api.log'),
      {
        env: { ...process.env, ...serviceEnv(cfg) },
      },
    );
    url = `http://${cfg.api.host}:${cfg.api.port}`;
    await waitFor(
      'the private API',
      async () => (await fetch(`${url}/api/health`).catch(() => null))?.ok === true,
      60_000,
      250,
    );
  });

  afterAll(async () => {
    if (apiPid) await stopPid(apiPid);
    if (redisPid) await stopRedis(cfg.redis, redisPid);
    if (dbPid) await stopMariadb(cfg.mariadb, dbPid);
  });

  it('turns db down within 5 s of MariaDB stopping and up again after it restarts', async () => {
    expect(await state('db')).toBe('up');
    await stopMariadb(cfg.mariadb, dbPid as number);
    dbPid = null;
    const down = await secondsUntil('db', 'down', 5_000);
    dbPid = await startMariadb(cfg.mariadb);
    const up = await secondsUntil('db', 'up', 15_000);
    console.log(
      `db: down after ${down.toFixed(2)} s, up ${up.toFixed(2)} s after MariaDB answered again`,
    );
    expect(alive(apiPid)).toBe(true);
  });

  it('turns redis down within 5 s of Redis stopping and up again after it restarts', async () => {
    expect(await state('redis')).toBe('up');
    await stopRedis(cfg.redis, redisPid as number);
    redisPid = null;
    const down = await secondsUntil('redis', 'down', 5_000);
    redisPid = await startRedis(cfg.redis);
    const up = await secondsUntil('redis', 'up', 15_000);
    console.log(
      `redis: down after ${down.toFixed(2)} s, up ${up.toFixed(2)} s after Redis answered again`,
    );
    expect(alive(apiPid)).toBe(true);
  });
});
