// The local S3 store (s3rver), one node process, with the bucket created and CORS set at start.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, type StackConfig } from './config.js';
import { alive, portOpen, startDetached, stopPid, waitFor } from './processes.js';

type S3 = StackConfig['s3'];

/** Starts s3rver unless its port answers; returns the pid it started, or null when it reused one. */
export async function startS3(s3: S3): Promise<number | null> {
  mkdirSync(s3.dir, { recursive: true });
  if (await portOpen(s3.host, s3.port)) return null;
  const pid = startDetached(
    process.execPath,
    [
      join(ROOT, 'node_modules/s3rver/bin/s3rver.js'),
      '--directory',
      s3.dir,
      '--address',
      s3.host,
      '--port',
      String(s3.port),
      '--silent',
      '--configure-bucket',
      s3.bucket,
      join(ROOT, 'scripts/stack/s3-cors.xml'),
    ],
    join(s3.dir, '..', 's3.log'),
  );
  await waitFor(
    `S3 store on port ${s3.port}`,
    async () => {
      if (!alive(pid))
        throw new Error(`s3rver exited at start; see ${join(s3.dir, '..', 's3.log')}`);
      return portOpen(s3.host, s3.port);
    },
    30_000,
  );
  return pid;
}

/** Stops the S3 store. */
export const stopS3 = (pid: number) => stopPid(pid);
