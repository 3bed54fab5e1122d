// CPU time the servers spend, read from /proc (Linux): on a shared machine, latency mostly measures
// the other tenants, while CPU milliseconds per request measure our own code. Elsewhere every
// figure is null and the benchmark prints "n/a".
import { readFileSync, readdirSync, readlinkSync } from 'node:fs';
import { execFileSync } from 'node:child_process';

/** Clock ticks per second of /proc/<pid>/stat times. */
function ticksPerSecond(): number {
  try {
    return Number(execFileSync('getconf', ['CLK_TCK'], { encoding: 'utf8' }).trim()) || 100;
  } catch {
    return 100; // the Linux default
  }
}

const TICKS = ticksPerSecond();

/** User + system CPU of a process and its live children, in milliseconds; null if unreadable. */
export function cpuMs(pid: number): number | null {
  try {
    const pids = [pid, ...childrenOf(pid)];
    let ticks = 0;
    for (const p of pids) {
      const stat = readFileSync(`/proc/${p}/stat`, 'utf8');
      // Fields after the command name (which may hold spaces): utime and stime are 14 and 15.
      const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      ticks += Number(fields[11]) + Number(fields[12]);
    }
    return (1000 * ticks) / TICKS;
  } catch {
    return null;
  }
}

function childrenOf(pid: number): number[] {
  try {
    const tasks = readdirSync(`/proc/${pid}/task`);
    return tasks.flatMap((t) =>
      readFileSync(`/proc/${pid}/task/${t}/children`, 'utf8')
        .trim()
        .split(/\s+/)
        .filter(Boolean)
        .map(Number),
    );
  } catch {
    return [];
  }
}

/** The pid of the process listening on a TCP port of this machine, or null. */
export function pidListeningOn(port: number): number | null {
  const inodes = new Set<string>();
  for (const table of ['/proc/net/tcp', '/proc/net/tcp6']) {
    let text: string;
    try {
      text = readFileSync(table, 'utf8');
    } catch {
      continue;
    }
    for (const line of text.split('\n').slice(1)) {
      const cols = line.trim().split(/\s+/);
      // local_address is HEXIP:HEXPORT; state 0A is LISTEN; column 9 is the socket inode.
      if (cols.length > 9 && cols[3] === '0A' && parseInt(cols[1].split(':')[1], 16) === port) {
        inodes.add(cols[9]);
      }
    }
  }
  if (inodes.size === 0) return null;
  for (const entry of safeList('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    for (const fd of safeList(`/proc/${entry}/fd`)) {
      try {
        const m = /^socket:\[(\d+)\]$/.exec(readlinkSync(`/proc/${entry}/fd/${fd}`));
        if (m && inodes.has(m[1])) return Number(entry);
      } catch {
        /* gone or not ours to read */
      }
    }
  }
  return null;
}

function safeList(dir: string): string[] {
  try {
    return readdirSync(dir);
  } catch {
    return [];
  }
}

/** Reads the CPU of the named servers now; `since` gives each one's milliseconds from then. */
export function cpuMeter(servers: Record<string, number | null>) {
  const start = Object.fromEntries(
    Object.entries(servers).map(([name, pid]) => [name, pid === null ? null : cpuMs(pid)]),
  );
  return {
    /** Milliseconds of CPU per server since the meter was made (null when unreadable). */
    since(): Record<string, number | null> {
      return Object.fromEntries(
        Object.entries(servers).map(([name, pid]) => {
          const now = pid === null ? null : cpuMs(pid);
          const then = start[name];
          return [name, now === null || then === null ? null : now - then];
        }),
      );
    },
  };
}
