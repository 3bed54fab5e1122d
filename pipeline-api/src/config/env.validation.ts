// The API's configuration: read from the environment once at start-up and validated, with
// defaults that match the local stack of `npm start`.
import { plainToInstance, Transform, Type } from 'class-transformer';
import {
  IsBoolean,
  IsEmail,
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  IsUrl,
  Max,
  Min,
  MinLength,
  validateSync,
} from 'class-validator';

/** One mebibyte. */
const MB = 1024 * 1024;

const toBool = ({ value }: { value: unknown }) =>
  typeof value === 'string' ? value === 'true' || value === '1' : value;

/** Every environment variable the API and worker read. */
export class Env {
  @IsIn(['development', 'test', 'production'])
  NODE_ENV: 'development' | 'test' | 'production' = 'development';

  @IsString() API_HOST = '127.0.0.1';
  @Type(() => Number) @IsInt() @Min(1) @Max(65535) API_PORT = 3000;

  @IsString() DB_HOST = '127.0.0.1';
  @Type(() => Number) @IsInt() @Min(1) @Max(65535) DB_PORT = 3307;
  @IsString() DB_NAME = 'overshoot';
  @IsString() DB_USER = 'overshoot';
  @IsString() DB_PASSWORD = 'overshoot-local';

  @IsString() REDIS_HOST = '127.0.0.1';
  @Type(() => Number) @IsInt() @Min(1) @Max(65535) REDIS_PORT = 6380;
  @IsString() REDIS_PREFIX = 'overshoot';

  @IsUrl({ require_tld: false, protocols: ['http', 'https'] }) S3_ENDPOINT =
    'http://127.0.0.1:4569';
  @IsString() S3_REGION = 'us-east-1';
  @IsString() S3_BUCKET = 'overshoot';
  @IsString() S3_ACCESS_KEY_ID = 'S3RVER';
  @IsString() S3_SECRET_ACCESS_KEY = 'S3RVER';
  @Transform(toBool) @IsBoolean() S3_FORCE_PATH_STYLE = true;

  @IsString() SMTP_HOST = '127.0.0.1';
  @Type(() => Number) @IsInt() @Min(1) @Max(65535) SMTP_PORT = 2525;
  @Transform(toBool) @IsBoolean() SMTP_SECURE = false;
  @Transform(toBool) @IsBoolean() SMTP_IGNORE_TLS = true;
  @IsOptional() @IsString() SMTP_USER?: string;
  @IsOptional() @IsString() SMTP_PASSWORD?: string;
  @IsString() MAIL_FROM = 'Overshoot <overshoot@localhost>';

  @IsOptional() @IsString() WEB_DIST_DIR?: string;
  /** The local mail sink's HTTP inbox, read by the development outbox route. */
  @IsOptional() @IsUrl({ require_tld: false, protocols: ['http', 'https'] }) MAIL_SINK_URL?: string;

  /** Where people open the web client; e-mailed links start with it. */
  @IsUrl({ require_tld: false, protocols: ['http', 'https'] }) PUBLIC_URL = 'http://127.0.0.1:3000';
  /** Send the session cookie over HTTPS only (set true behind TLS). */
  @Transform(toBool) @IsBoolean() COOKIE_SECURE = false;
  /** Express `trust proxy`: whose X-Forwarded-For to believe for the client address. */
  @IsString() TRUST_PROXY = 'loopback';
  @Type(() => Number) @IsInt() @Min(1) @Max(10_080) SESSION_IDLE_MINUTES = 480;
  @Type(() => Number) @IsInt() @Min(1) @Max(2_160) SESSION_ABSOLUTE_HOURS = 168;
  @Type(() => Number) @IsInt() @Min(1) @Max(1000) SIGN_IN_MAX_FAILURES_PER_EMAIL = 5;
  @Type(() => Number) @IsInt() @Min(1) @Max(10_000) SIGN_IN_MAX_FAILURES_PER_IP = 30;
  @Type(() => Number) @IsInt() @Min(10) @Max(86_400) SIGN_IN_WINDOW_SECONDS = 900;
  /** Tries per e-mail before it is marked failed (SMTP faults are retried with backoff). */
  @Type(() => Number) @IsInt() @Min(1) @Max(20) MAIL_MAX_ATTEMPTS = 5;

  @IsEmail({ require_tld: false }) ADMIN_EMAIL = 'admin@overshoot.localhost';
  @IsOptional() @IsString() @MinLength(12) ADMIN_PASSWORD?: string;

  @Type(() => Number) @IsInt() @Min(1) @Max(64) WORKER_CONCURRENCY = 2;
  /** Learn and retarget jobs each worker process runs at once per queue (one thread each). */
  @Type(() => Number) @IsInt() @Min(1) @Max(64) SOLVE_CONCURRENCY = 1;
  /** Tries per learn or retarget job for transient faults (bad input is never retried). */
  @Type(() => Number) @IsInt() @Min(1) @Max(20) SOLVE_MAX_ATTEMPTS = 3;
  /** First retry delay of a solve; each next one doubles. */
  @Type(() => Number) @IsInt() @Min(100) @Max(600_000) SOLVE_BACKOFF_MS = 5000;
  /** A solve whose worker stops renewing its lock this long is stalled and runs again. */
  @Type(() => Number) @IsInt() @Min(1000) @Max(600_000) SOLVE_LOCK_MS = 30_000;
  /** How often a worker looks for stalled solves. */
  @Type(() => Number) @IsInt() @Min(500) @Max(600_000) SOLVE_STALLED_CHECK_MS = 30_000;
  /** On shutdown, how long a running solve may finish before it is handed back to the queue. */
  @Type(() => Number) @IsInt() @Min(0) @Max(3600) SOLVE_SHUTDOWN_GRACE_SECONDS = 20;

  /** Largest file per asset kind, in bytes (a declared size above it is refused at once). */
  @Type(() => Number) @IsInt() @Min(1) UPLOAD_MAX_CHARACTER_BYTES = 200 * MB;
  @Type(() => Number) @IsInt() @Min(1) UPLOAD_MAX_CAPTURE_BYTES = 2048 * MB;
  @Type(() => Number) @IsInt() @Min(1) UPLOAD_MAX_CLIP_BYTES = 100 * MB;
  /** Size of each multipart part; S3 wants at least 5 MiB for every part but the last. */
  @Type(() => Number) @IsInt() @Min(5 * MB) @Max(5120 * MB) UPLOAD_PART_BYTES = 16 * MB;
  /** How long a presigned upload or download URL stays valid. */
  @Type(() => Number) @IsInt() @Min(60) @Max(604_800) PRESIGNED_URL_SECONDS = 3600;
  /** Tries per ingest job for transient faults (bad files are never retried). */
  @Type(() => Number) @IsInt() @Min(1) @Max(20) INGEST_MAX_ATTEMPTS = 3;
  @Type(() => Number) @IsInt() @Min(100) @Max(30_000) HEALTH_TIMEOUT_MS = 2000;
  /** Seconds between keep-alive comments (and access re-checks) on live event streams. */
  @Type(() => Number) @IsInt() @Min(1) @Max(300) EVENTS_HEARTBEAT_SECONDS = 15;
}

/** Validates `process.env`; throws one message listing every bad variable. */
export function validateEnv(raw: Record<string, unknown>): Env {
  const env = plainToInstance(Env, raw, { exposeDefaultValues: true });
  const errors = validateSync(env, { whitelist: false, skipMissingProperties: false });
  if (errors.length > 0) {
    const lines = errors.map(
      (e) => `  ${e.property}: ${Object.values(e.constraints ?? {}).join('; ')}`,
    );
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  return env;
}
