// CPU time per thread of this process (Linux /proc; empty elsewhere). On a shared machine the
// wall time of a run depends on other jobs; the CPU time of the busiest thread does much less,
// and is what the wall time would be with a free core per thread.
import { existsSync, readdirSync, readFileSync } from 'node:fs';

/** CPU milliseconds (user + system) of each thread, by thread id; {} where /proc is missing. */
export function threadCpuMs(): Record<string, number> {
  if (!existsSync('/proc/self/task')) return {};
  const out: Record<string, number> = {};
  for (const tid of readdirSync('/proc/self/task')) {
    try {
      const stat = readFileSync(`/proc/self/task/${tid}/stat`, 'utf8');
      // Fields after the command name: utime and stime are the 12th and 13th (clock ticks, 10 ms).
      const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      out[tid] = (Number(fields[11]) + Number(fields[12])) * 10;
    } catch {
      // The thread ended while being read.
    }
  }
  return out;
}

/** Wall time and the busiest thread's CPU time (ms) of `fn`; cpu is NaN where /proc is missing. */
export async function timeWithCpu(fn: () => unknown): Promise<{ wall: number; cpu: number }> {
  const before = threadCpuMs();
  const t0 = performance.now();
  await fn();
  const wall = performance.now() - t0;
  const after = threadCpuMs();
  const used = Object.keys(after).map((tid) => after[tid] - (before[tid] ?? 0));
  return { wall, cpu: used.length > 0 ? Math.max(...used) : NaN };
}
