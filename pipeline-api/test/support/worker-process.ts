// A worker process of our own for tests that kill one: the built dist/worker.js with the test
// environment, on a queue prefix of its own so that the stack's worker never takes its jobs.
import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const WORKER = join(__dirname, '..', '..', 'dist', 'worker.js');

/** A running worker process and how it ended. */
export interface WorkerProcess {
  child: ChildProcess;
  /** Where its output goes. */
  log: string;
  /** Resolves with its exit code and signal once it has stopped. */
  exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
}

/** Starts a worker with `env` on top of the test environment; resolves once it takes jobs. */
export async function startWorker(
  name: string,
  env: Record<string, string>,
): Promise<WorkerProcess> {
  const log = join(tmpdir(), `overshoot-${name}-${process.pid}.log`);
  const out = createWriteStream(log);
  const child = spawn(process.execPath, [WORKER], {
    env: { ...process.env, ...env, NO_COLOR: '1' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) =>
    child.once('exit', (code, signal) => resolve({ code, signal })),
  );
  let text = '';
  const ready = new Promise<void>((resolve, reject) => {
    const onData = (chunk: Buffer) => {
      out.write(chunk);
      text += chunk.toString();
      if (text.includes('processing queues')) resolve();
    };
    child.stdout?.on('data', onData);
    child.stderr?.on('data', (c: Buffer) => out.write(c));
    void exited.then(({ code, signal }) =>
      reject(new Error(`worker ${name} exited at start (${code ?? signal}); see ${log}`)),
    );
    const timer = setTimeout(
      () => reject(new Error(`worker ${name} not ready in time; see ${log}`)),
      90_000,
    );
    timer.unref();
  });
  await ready;
  return { child, log, exited };
}
