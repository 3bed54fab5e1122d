import type { Job } from 'bullmq';

/** Input of a diagnostic ping: how many progress steps the worker reports. */
export interface PingData {
  steps: number;
}

/** What the worker returns: who handled it. */
export interface PingResult {
  worker: string;
  steps: number;
  finishedAt: string;
}

/** Progress as every job of the product reports it. */
export interface JobProgress {
  stage: string;
  percent: number;
}

export type PingJob = Job<PingData, PingResult, 'ping'>;
