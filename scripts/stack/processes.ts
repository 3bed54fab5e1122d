// Small process helpers shared by every service launcher: run a command, wait for a port,
// stop a pid and wait until it is gone.
import { spawn, spawnSync, type SpawnOptions } from 'node:child_process';
import { closeSync, mkdirSync, openSync, readFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { connect } from 'node:net';

/** Runs a command to completion; throws with its output when it fails. */
export function run(
  cmd: string,
  args: string[],
  opts: { input?: string; env?: NodeJS.ProcessEnv; cwd?: string } = {},
): string {
  const r = spawnSync(cmd, args, {
    encoding: 'utf8',
    input: opts.input,
    env: opts.env,
    cwd: opts.cwd,
  });
  if (r.error) throw new Error(`${cmd} could not start: ${r.error.message}`);
  if (r.status !== 0) {
    throw new Error(
      `${cmd} ${args.join(' ')} exited with ${r.status}: ${(r.stderr || r.stdout).trim()}`,
    );
  }
  return r.stdout;
}

/** Starts a long-running process in its own session, output appended to a log file; returns its pid. */
export function startDetached(
  cmd: string,
  args: string[],
  logFile: string,
  opts: SpawnOptions = {},
): number {
  mkdirSync(dirname(logFile), { recursive: true });
  const fd = openSync(logFile, 'a');
  // Own session: Ctrl-C in the terminal reaches only the orchestrator, which stops services in order.
  const child = spawn(cmd, args, { ...opts, detached: true, stdio: ['ignore', fd, fd] });
  closeSync(fd);
  if (child.pid === undefined) throw new Error(`${cmd} could not start`);
  child.unref();
  return child.pid;
}

/** True while a process with this pid exists. */
export function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
  } catch {
    return false;
  }
  // A zombie still answers kill(0) until its parent reaps it; for us it is gone.
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    return stat.slice(stat.lastIndexOf(')') + 2, stat.lastIndexOf(')') + 3) !== 'Z';
  } catch {
    return true;
  }
}

/** Sleeps. */
export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Polls until `check` is true or the time runs out. */
export async function waitFor(
  what: string,
  check: () => boolean | Promise<boolean>,
  timeoutMs: number,
  everyMs = 200,
): Promise<void> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    if (await check()) return;
    if (Date.now() > until)
      throw new Error(`timed out after ${timeoutMs / 1000} s waiting for ${what}`);
    await sleep(everyMs);
  }
}

/** True when something accepts TCP connections on host:port. */
export function portOpen(host: string, port: number, timeoutMs = 500): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect({ host, port });
    const done = (ok: boolean) => {
      socket.destroy();
      resolve(ok);
    };
    socket.setTimeout(timeoutMs, () => done(false));
    socket.once('connect', () => done(true));
    socket.once('error', () => done(false));
  });
}

/** Sends SIGTERM (then SIGKILL after the grace time) and waits until the pid is gone. */
export async function stopPid(pid: number, graceMs = 10_000): Promise<void> {
  if (!alive(pid)) return;
  try {
    process.kill(pid, 'SIGTERM');
  } catch {
    return;
  }
  const until = Date.now() + graceMs;
  while (alive(pid) && Date.now() < until) await sleep(100);
  if (alive(pid)) {
    try {
      process.kill(pid, 'SIGKILL');
    } catch {
      /* already gone */
    }
    while (alive(pid)) await sleep(50);
  }
}
