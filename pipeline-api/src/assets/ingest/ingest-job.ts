import type { Job } from 'bullmq';

/** Input of an ingest check: the asset whose file to verify and read. */
export interface IngestJobData {
  assetId: string;
}

/** What the check decided. */
export interface IngestResult {
  state: 'ready' | 'rejected' | 'skipped';
  code?: string;
}

/** A job of the `ingest` queue. */
export type IngestJob = Job<IngestJobData, IngestResult, 'check'>;
