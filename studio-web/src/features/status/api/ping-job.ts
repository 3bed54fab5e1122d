// Shape of a worker round-trip test job ("ping") and a check that an answer has it.

/** Where a test job is in the queue. */
export type PingState = 'waiting' | 'active' | 'completed' | 'failed';

const PING_STATES: readonly PingState[] = ['waiting', 'active', 'completed', 'failed'];

/** A test job sent through the queue to a worker and back. */
export interface PingJob {
  id: string;
  state: PingState;
  progress: { stage: string; percent: number };
  /** Set once a worker has finished the job. */
  result?: { worker: string; steps: number; finishedAt: string };
  /** Why the job failed, when it did. */
  failedReason?: string;
}

/** True once the job can no longer change: completed or failed. */
export function isPingFinished(state: PingState | undefined): boolean {
  return state === 'completed' || state === 'failed';
}

/** Checks a test-job answer and returns it typed; throws a TypeError naming the missing part. */
export function parsePingJob(value: unknown): PingJob {
  const body = (value ?? {}) as Record<string, unknown>;
  if (typeof body.id !== 'string' || body.id === '') {
    throw new TypeError('The test job answer has no job id.');
  }
  if (!PING_STATES.includes(body.state as PingState)) {
    throw new TypeError(`The test job answer has an unknown state: ${JSON.stringify(body.state)}.`);
  }
  const progress = (body.progress ?? {}) as Record<string, unknown>;
  const result = body.result as PingJob['result'] | undefined;
  return {
    id: body.id,
    state: body.state as PingState,
    progress: {
      stage: typeof progress.stage === 'string' ? progress.stage : '',
      percent:
        typeof progress.percent === 'number' ? Math.min(100, Math.max(0, progress.percent)) : 0,
    },
    result: result && typeof result.worker === 'string' ? result : undefined,
    failedReason: typeof body.failedReason === 'string' ? body.failedReason : undefined,
  };
}
