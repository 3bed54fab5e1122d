// Where every local service listens and keeps its data, for `npm start` (dev) and `npm test` (test).
// Each value can be set by an environment variable; `npm test` reads the same names prefixed
// with TEST_ so that a test run never shares a port, database, prefix or bucket with the demo.
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export type Profile = 'dev' | 'test';

/** Repository root. */
export const ROOT = resolve(fileURLToPath(new URL('../..', import.meta.url)));

/** Every setting of the local stack. */
export interface StackConfig {
  profile: Profile;
  dataDir: string;
  mariadb: {
    host: string;
    port: number;
    dir: string;
    database: string;
    user: string;
    password: string;
  };
  redis: { host: string; port: number; dir: string; prefix: string };
  s3: {
    host: string;
    port: number;
    dir: string;
    bucket: string;
    accessKeyId: string;
    secretAccessKey: string;
  };
  smtp: { host: string; port: number; inboxPort: number; dir: string; from: string };
  api: { host: string; port: number };
  admin: { email: string; password?: string };
}

const DEFAULTS: Record<Profile, Record<string, string>> = {
  dev: {
    DATA_DIR: join(ROOT, '.data'),
    DB_PORT: '3307',
    DB_NAME: 'overshoot',
    REDIS_PORT: '6380',
    REDIS_PREFIX: 'overshoot',
    S3_PORT: '4569',
    S3_BUCKET: 'overshoot',
    SMTP_PORT: '2525',
    MAIL_SINK_PORT: '2526',
    API_PORT: '3000',
  },
  test: {
    DATA_DIR: join(ROOT, '.data', 'test'),
    DB_PORT: '3317',
    DB_NAME: 'overshoot_test',
    REDIS_PORT: '6390',
    REDIS_PREFIX: 'overshoot-test',
    S3_PORT: '4579',
    S3_BUCKET: 'overshoot-test',
    SMTP_PORT: '2535',
    MAIL_SINK_PORT: '2536',
    API_PORT: '3010',
    ADMIN_PASSWORD: 'test-admin-password-1',
  },
};

const COMMON: Record<string, string> = {
  HOST: '127.0.0.1',
  DB_USER: 'overshoot',
  DB_PASSWORD: 'overshoot-local',
  S3_ACCESS_KEY_ID: 'S3RVER',
  S3_SECRET_ACCESS_KEY: 'S3RVER',
  MAIL_FROM: 'Overshoot <overshoot@localhost>',
  ADMIN_EMAIL: 'admin@overshoot.localhost',
};

/** Reads the stack settings of a profile from the environment, with working defaults. */
export function stackConfig(profile: Profile, env: NodeJS.ProcessEnv = process.env): StackConfig {
  const prefix = profile === 'test' ? 'TEST_' : '';
  const get = (name: string): string | undefined =>
    env[prefix + name] ?? DEFAULTS[profile][name] ?? COMMON[name];
  const must = (name: string): string => get(name) as string;
  const port = (name: string): number => {
    const n = Number(must(name));
    if (!Number.isInteger(n) || n <= 0 || n > 65535) {
      throw new Error(`${prefix}${name} must be a TCP port number, got "${must(name)}"`);
    }
    return n;
  };
  const dataDir = resolve(must('DATA_DIR'));
  const host = must('HOST');
  return {
    profile,
    dataDir,
    mariadb: {
      host,
      port: port('DB_PORT'),
      dir: join(dataDir, 'mariadb'),
      database: must('DB_NAME'),
      user: must('DB_USER'),
      password: must('DB_PASSWORD'),
    },
    redis: {
      host,
      port: port('REDIS_PORT'),
      dir: join(dataDir, 'redis'),
      prefix: must('REDIS_PREFIX'),
    },
    s3: {
      host,
      port: port('S3_PORT'),
      dir: join(dataDir, 's3'),
      bucket: must('S3_BUCKET'),
      accessKeyId: must('S3_ACCESS_KEY_ID'),
      secretAccessKey: must('S3_SECRET_ACCESS_KEY'),
    },
    smtp: {
      host,
      port: port('SMTP_PORT'),
      inboxPort: port('MAIL_SINK_PORT'),
      dir: join(dataDir, 'mail'),
      from: must('MAIL_FROM'),
    },
    api: { host, port: port('API_PORT') },
    admin: { email: must('ADMIN_EMAIL'), password: get('ADMIN_PASSWORD') },
  };
}

/** The environment the API and worker processes read (see pipeline-api/src/config). */
export function serviceEnv(cfg: StackConfig): Record<string, string> {
  return {
    NODE_ENV: cfg.profile === 'test' ? 'test' : 'development',
    API_HOST: cfg.api.host,
    API_PORT: String(cfg.api.port),
    DB_HOST: cfg.mariadb.host,
    DB_PORT: String(cfg.mariadb.port),
    DB_NAME: cfg.mariadb.database,
    DB_USER: cfg.mariadb.user,
    DB_PASSWORD: cfg.mariadb.password,
    REDIS_HOST: cfg.redis.host,
    REDIS_PORT: String(cfg.redis.port),
    REDIS_PREFIX: cfg.redis.prefix,
    S3_ENDPOINT: `http://${cfg.s3.host}:${cfg.s3.port}`,
    S3_REGION: 'us-east-1',
    S3_BUCKET: cfg.s3.bucket,
    S3_ACCESS_KEY_ID: cfg.s3.accessKeyId,
    S3_SECRET_ACCESS_KEY: cfg.s3.secretAccessKey,
    SMTP_HOST: cfg.smtp.host,
    SMTP_PORT: String(cfg.smtp.port),
    MAIL_FROM: cfg.smtp.from,
    MAIL_SINK_URL: `http://${cfg.smtp.host}:${cfg.smtp.inboxPort}`,
    WEB_DIST_DIR: join(ROOT, 'studio-web', 'dist'),
    ADMIN_EMAIL: cfg.admin.email,
    ...(cfg.admin.password ? { ADMIN_PASSWORD: cfg.admin.password } : {}),
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
  };
}
