import { describe, expect, it } from 'vitest';
import { validateEnv } from './env.validation';

describe('validateEnv', () => {
  it('gives working local defaults for an empty environment', () => {
    const env = validateEnv({});
    expect(env.API_PORT).toBe(3000);
    expect(env.DB_PORT).toBe(3307);
    expect(env.REDIS_PORT).toBe(6380);
    expect(env.S3_ENDPOINT).toBe('http://127.0.0.1:4569');
    expect(env.SMTP_PORT).toBe(2525);
    expect(env.S3_FORCE_PATH_STYLE).toBe(true);
  });

  it('converts numbers and booleans from their text form', () => {
    const env = validateEnv({ DB_PORT: '4406', SMTP_SECURE: 'true', S3_FORCE_PATH_STYLE: 'false' });
    expect(env.DB_PORT).toBe(4406);
    expect(env.SMTP_SECURE).toBe(true);
    expect(env.S3_FORCE_PATH_STYLE).toBe(false);
  });

  it('names every bad variable in one error', () => {
    expect(() =>
      validateEnv({ DB_PORT: 'abc', REDIS_PORT: '70000', S3_ENDPOINT: 'not a url' }),
    ).toThrow(
      /DB_PORT[\s\S]*REDIS_PORT[\s\S]*S3_ENDPOINT|DB_PORT[\s\S]*S3_ENDPOINT[\s\S]*REDIS_PORT/,
    );
  });

  it('gives account settings that work on loopback without TLS', () => {
    const env = validateEnv({});
    expect(env.PUBLIC_URL).toBe('http://127.0.0.1:3000');
    expect(env.COOKIE_SECURE).toBe(false);
    expect(env.TRUST_PROXY).toBe('loopback');
    expect(validateEnv({ COOKIE_SECURE: 'true' }).COOKIE_SECURE).toBe(true);
    expect(() => validateEnv({ PUBLIC_URL: 'not a url' })).toThrow(/PUBLIC_URL/);
  });

  it('rejects a short admin password', () => {
    expect(() => validateEnv({ ADMIN_PASSWORD: 'short' })).toThrow(/ADMIN_PASSWORD/);
  });
});
