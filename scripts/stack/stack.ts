// Brings the local services up in order and takes down, in reverse, exactly what it started.
import type { StackConfig } from './config.js';
import { ensureDatabase, startMariadb, stopMariadb } from './mariadb.js';
import { flushRedis, startRedis, stopRedis } from './redis.js';
import { startS3, stopS3 } from './s3.js';
import { startMailSink, stopMailSink } from './mail-sink.js';
import { startDetached, stopPid } from './processes.js';

interface Started {
  name: string;
  pid: number;
  stop: () => Promise<void>;
}

/** The services of one profile and the processes this run started. */
export class Stack {
  private readonly started: Started[] = [];

  constructor(
    readonly cfg: StackConfig,
    private readonly log = (m: string) => console.log(`[stack] ${m}`),
  ) {}

  /** Starts MariaDB, Redis, the S3 store and the mail sink; `fresh` empties the database and Redis. */
  async up(opts: { fresh?: boolean } = {}): Promise<void> {
    const { cfg } = this;
    await this.track(
      'MariaDB',
      `127.0.0.1:${cfg.mariadb.port}`,
      () => startMariadb(cfg.mariadb),
      (pid) => stopMariadb(cfg.mariadb, pid),
    );
    ensureDatabase(cfg.mariadb, { fresh: opts.fresh });
    await this.track(
      'Redis',
      `127.0.0.1:${cfg.redis.port}`,
      () => startRedis(cfg.redis),
      (pid) => stopRedis(cfg.redis, pid),
    );
    if (opts.fresh) flushRedis(cfg.redis);
    await this.track('S3 store', `127.0.0.1:${cfg.s3.port}`, () => startS3(cfg.s3), stopS3);
    await this.track(
      'mail sink',
      `127.0.0.1:${cfg.smtp.port}`,
      () => startMailSink(cfg.smtp),
      stopMailSink,
    );
  }

  /** Starts a node process of ours (API, worker) in its own session and tracks it. */
  spawnNode(name: string, args: string[], env: NodeJS.ProcessEnv, logFile: string): number {
    const pid = startDetached(process.execPath, args, logFile, { env });
    this.started.push({ name, pid, stop: () => stopPid(pid) });
    this.log(`${name} started (pid ${pid}, log ${logFile})`);
    return pid;
  }

  /** Stops everything this run started, newest first, each by its own pid. */
  async down(): Promise<void> {
    while (this.started.length > 0) {
      const s = this.started.pop() as Started;
      try {
        await s.stop();
        this.log(`${s.name} stopped (pid ${s.pid})`);
      } catch (e) {
        this.log(`${s.name} (pid ${s.pid}) did not stop cleanly: ${(e as Error).message}`);
      }
    }
  }

  /** Names and pids of what this run started. */
  pids(): { name: string; pid: number }[] {
    return this.started.map(({ name, pid }) => ({ name, pid }));
  }

  private async track(
    name: string,
    where: string,
    start: () => Promise<number | null>,
    stop: (pid: number) => Promise<void>,
  ): Promise<void> {
    const pid = await start();
    if (pid === null) {
      this.log(`${name} already running on ${where}; reusing it`);
      return;
    }
    this.started.push({ name, pid, stop: () => stop(pid) });
    this.log(`${name} started on ${where} (pid ${pid})`);
  }
}
