import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import { SolverInputError, type SolverErrorCode } from '@overshoot/solver';
import type {
  LearnReply,
  LearnRequest,
  RetargetReply,
  RetargetRequest,
  SolveRequest,
  ThreadError,
  ThreadMessage,
} from './solve-messages';

/** The compiled thread entry, beside this file in dist/. */
const THREAD_FILE = join(__dirname, 'solve-thread.js');

/** Called at each solver stage; a rejection ends the thread (canceled, or the job was lost). */
export type StageSink = (stage: string, fraction: number) => Promise<void>;

/** A thread's error as an Error again (a SolverInputError keeps its class, code and location). */
function revive(e: ThreadError): Error {
  if (e.name === 'SolverInputError' && e.code) {
    return new SolverInputError(e.code as SolverErrorCode, e.message, e.where ?? {});
  }
  const err = new Error(e.message);
  err.name = e.name;
  if (e.stack) err.stack = e.stack;
  return err;
}

/**
 * Runs one solve in a new thread. Stage reports go to `onStage` one at a time, in order; when one
 * rejects, or `signal` aborts, the thread is terminated and the promise rejects with that reason.
 */
export function runInThread(
  req: LearnRequest,
  onStage: StageSink,
  signal: AbortSignal,
): Promise<LearnReply>;
export function runInThread(
  req: RetargetRequest,
  onStage: StageSink,
  signal: AbortSignal,
): Promise<RetargetReply>;
export function runInThread(
  req: SolveRequest,
  onStage: StageSink,
  signal: AbortSignal,
): Promise<LearnReply | RetargetReply> {
  if (!existsSync(THREAD_FILE)) {
    return Promise.reject(new Error(`the solver thread ${THREAD_FILE} is missing: build the API`));
  }
  return new Promise((resolve, reject) => {
    const thread = new Worker(THREAD_FILE);
    let settled = false;
    // The thread ends on its own once it has answered; the answer waits for earlier stages.
    let answered = false;
    let stages = Promise.resolve();
    const finish = (fn: () => void) => {
      if (settled) return;
      settled = true;
      signal.removeEventListener('abort', onAbort);
      void thread.terminate();
      fn();
    };
    const onAbort = () => finish(() => reject(signal.reason));
    if (signal.aborted) return onAbort();
    signal.addEventListener('abort', onAbort);
    thread.on('message', (m: ThreadMessage) => {
      if (m.type === 'progress') {
        stages = stages
          .then(() => (settled ? undefined : onStage(m.stage, m.fraction)))
          .catch((e: unknown) => finish(() => reject(e)));
      } else if (m.type === 'done') {
        answered = true;
        // Let the last stage report land before answering.
        void stages.then(() => finish(() => resolve(m.reply)));
      } else {
        finish(() => reject(revive(m.error)));
      }
    });
    thread.on('error', (e) => finish(() => reject(e)));
    thread.on('exit', (code) => {
      if (!answered)
        finish(() => reject(new Error(`the solver thread stopped (exit code ${code})`)));
    });
    thread.postMessage(req);
  });
}
