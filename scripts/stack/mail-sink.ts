// Starts and stops the local SMTP sink process (mail-sink-server.ts).
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, type StackConfig } from './config.js';
import { alive, portOpen, startDetached, stopPid, waitFor } from './processes.js';

type Smtp = StackConfig['smtp'];

/** Starts the sink unless its SMTP port answers; returns the pid it started, or null when reused. */
export async function startMailSink(smtp: Smtp): Promise<number | null> {
  mkdirSync(smtp.dir, { recursive: true });
  if (await portOpen(smtp.host, smtp.port)) return null;
  const log = join(smtp.dir, '..', 'mail-sink.log');
  const pid = startDetached(
    process.execPath,
    ['--import', 'tsx', join(ROOT, 'scripts/stack/mail-sink-server.ts')],
    log,
    {
      cwd: ROOT,
      env: {
        ...process.env,
        MAIL_SINK_HOST: smtp.host,
        MAIL_SINK_SMTP_PORT: String(smtp.port),
        MAIL_SINK_HTTP_PORT: String(smtp.inboxPort),
        MAIL_SINK_DIR: smtp.dir,
      },
    },
  );
  await waitFor(
    `mail sink on port ${smtp.port}`,
    async () => {
      if (!alive(pid)) throw new Error(`mail sink exited at start; see ${log}`);
      return (await portOpen(smtp.host, smtp.port)) && (await portOpen(smtp.host, smtp.inboxPort));
    },
    30_000,
  );
  return pid;
}

/** Stops the mail sink. */
export const stopMailSink = (pid: number) => stopPid(pid);
