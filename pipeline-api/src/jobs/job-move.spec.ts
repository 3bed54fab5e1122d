import { describe, expect, it } from 'vitest';
import { applyJobMove, type JobRecord } from './job-move';
import { JobState } from './job-state';

const fresh = (): JobRecord => ({ state: JobState.Queued, percent: 0, attempts: 0 });

describe('applyJobMove', () => {
  it('counts an attempt and records the worker each time a job starts solving', () => {
    const job = fresh();
    applyJobMove(job, JobState.Solving, { worker: 'host:1:a' });
    expect([job.attempts, job.worker, job.startedAt instanceof Date]).toEqual([
      1,
      'host:1:a',
      true,
    ]);
    applyJobMove(job, JobState.Queued, { message: 'its worker stopped' });
    applyJobMove(job, JobState.Solving, { worker: 'host:2:b' });
    expect([job.attempts, job.worker, job.errorMessage]).toEqual([2, 'host:2:b', null]);
  });

  it('starts progress over when a job goes back to queued', () => {
    const job = { ...fresh(), state: JobState.Solving, stage: 'separate', percent: 40 };
    applyJobMove(job, JobState.Queued, { message: 'attempt 1 stopped on a fault' });
    expect([job.stage, job.percent, job.errorMessage]).toEqual([
      null,
      0,
      'attempt 1 stopped on a fault',
    ]);
  });

  it('keeps the failure code and message, and the percent reached', () => {
    const job = { ...fresh(), state: JobState.Solving, percent: 61 };
    applyJobMove(job, JobState.Failed, { errorCode: 'CLIP_TOO_SHORT', message: 'too short' });
    expect([job.errorCode, job.errorMessage, job.percent]).toEqual([
      'CLIP_TOO_SHORT',
      'too short',
      61,
    ]);
    expect(job.finishedAt).toBeInstanceOf(Date);
  });

  it('refuses to move a finished job', () => {
    const job = { ...fresh(), state: JobState.Solved };
    expect(() => applyJobMove(job, JobState.Canceled)).toThrow(
      expect.objectContaining({ code: 'JOB_STATE_INVALID_TRANSITION' }),
    );
  });
});
