// MariaDB from Debian's package, run as root on loopback with its data under the project.
import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { alive, run, sleep, startDetached, waitFor } from './processes.js';
import type { StackConfig } from './config.js';

type Db = StackConfig['mariadb'];

const sock = (db: Db) => join(db.dir, 'mariadb.sock');
const adminArgs = (db: Db) => ['--no-defaults', '-uroot', `--socket=${sock(db)}`];

/** True when the server of this data directory answers. */
export function mariadbUp(db: Db): boolean {
  try {
    run('mariadb-admin', [...adminArgs(db), '--connect-timeout=2', 'ping']);
    return true;
  } catch {
    return false;
  }
}

/** Starts MariaDB unless it already runs; returns the pid it started, or null when it reused one. */
export async function startMariadb(db: Db): Promise<number | null> {
  mkdirSync(db.dir, { recursive: true });
  // A second server on the same files would hang for half a minute on InnoDB's lock.
  if (mariadbUp(db)) return null;
  const dataDir = join(db.dir, 'data');
  if (!existsSync(join(dataDir, 'mysql'))) {
    run('mariadb-install-db', [
      '--no-defaults',
      '--user=root',
      `--datadir=${dataDir}`,
      '--auth-root-authentication-method=socket',
      '--skip-test-db',
    ]);
  }
  const pid = startDetached(
    'mariadbd',
    [
      '--no-defaults',
      '--user=root',
      `--datadir=${dataDir}`,
      `--port=${db.port}`,
      `--bind-address=${db.host}`,
      `--socket=${sock(db)}`,
      `--pid-file=${join(db.dir, 'mariadb.pid')}`,
      `--log-error=${join(db.dir, 'error.log')}`,
      '--skip-name-resolve',
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
    ],
    join(db.dir, 'console.log'),
  );
  await waitFor(
    `MariaDB on port ${db.port} (see ${join(db.dir, 'error.log')})`,
    () => {
      if (!alive(pid)) throw new Error(`MariaDB exited at start; see ${join(db.dir, 'error.log')}`);
      return mariadbUp(db);
    },
    60_000,
  );
  return pid;
}

const q = (s: string) => `'${s.replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;
const ident = (s: string) => {
  if (!/^[A-Za-z0-9_]+$/.test(s))
    throw new Error(`database name "${s}" must be letters, digits or _`);
  return `\`${s}\``;
};

/** Creates the database and the application user (for 127.0.0.1 and localhost); `fresh` drops it first. */
export function ensureDatabase(db: Db, opts: { fresh?: boolean } = {}): void {
  const sql = [
    opts.fresh ? `DROP DATABASE IF EXISTS ${ident(db.database)};` : '',
    `CREATE DATABASE IF NOT EXISTS ${ident(db.database)} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
    ...['127.0.0.1', 'localhost'].flatMap((h) => [
      `CREATE USER IF NOT EXISTS ${q(db.user)}@${q(h)} IDENTIFIED BY ${q(db.password)};`,
      `ALTER USER ${q(db.user)}@${q(h)} IDENTIFIED BY ${q(db.password)};`,
      `GRANT ALL PRIVILEGES ON ${ident(db.database)}.* TO ${q(db.user)}@${q(h)};`,
    ]),
    'FLUSH PRIVILEGES;',
  ].join('\n');
  run('mariadb', adminArgs(db), { input: sql });
}

/** Shuts the server down cleanly and waits until its process is gone. */
export async function stopMariadb(db: Db, pid: number): Promise<void> {
  try {
    run('mariadb-admin', [...adminArgs(db), 'shutdown']);
  } catch {
    if (alive(pid)) process.kill(pid, 'SIGTERM');
  }
  while (alive(pid)) await sleep(100);
}
