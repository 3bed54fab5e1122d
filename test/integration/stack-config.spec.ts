import { describe, expect, it } from 'vitest';
import { serviceEnv, stackConfig } from '../../scripts/stack/config.ts';

describe('local stack settings', () => {
  it('keeps the test profile apart from the demo data on every port, path, database, prefix and bucket', () => {
    const dev = stackConfig('dev', {});
    const test = stackConfig('test', {});
    expect(test.dataDir).not.toBe(dev.dataDir);
    const ports = (c: typeof dev) => [
      c.mariadb.port,
      c.redis.port,
      c.s3.port,
      c.smtp.port,
      c.smtp.inboxPort,
      c.api.port,
    ];
    for (const p of ports(test)) expect(ports(dev)).not.toContain(p);
    expect(test.mariadb.database).not.toBe(dev.mariadb.database);
    expect(test.redis.prefix).not.toBe(dev.redis.prefix);
    expect(test.s3.bucket).not.toBe(dev.s3.bucket);
  });

  it('reads every setting from the environment, TEST_-prefixed for the test profile', () => {
    const env = {
      DB_PORT: '4000',
      TEST_DB_PORT: '4001',
      S3_BUCKET: 'dev-b',
      TEST_S3_BUCKET: 'test-b',
      API_PORT: '8080',
    };
    expect(stackConfig('dev', env).mariadb.port).toBe(4000);
    expect(stackConfig('test', env).mariadb.port).toBe(4001);
    expect(stackConfig('test', env).s3.bucket).toBe('test-b');
    // A dev override never leaks into the test profile.
    expect(stackConfig('test', env).api.port).not.toBe(8080);
  });

  it('rejects a port that is not a port', () => {
    expect(() => stackConfig('dev', { REDIS_PORT: 'six' })).toThrow(/REDIS_PORT/);
    expect(() => stackConfig('test', { TEST_API_PORT: '70000' })).toThrow(/TEST_API_PORT/);
  });

  it('hands the API and worker the same services it started', () => {
    const cfg = stackConfig('test', {});
    const env = serviceEnv(cfg);
    expect(env.DB_PORT).toBe(String(cfg.mariadb.port));
    expect(env.S3_ENDPOINT).toBe(`http://127.0.0.1:${cfg.s3.port}`);
    expect(env.REDIS_PREFIX).toBe(cfg.redis.prefix);
    expect(env.NODE_ENV).toBe('test');
  });
});
