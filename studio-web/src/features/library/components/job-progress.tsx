import { Flex, Progress, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { Mono } from '@/components/ui/mono';
import { isJobFinished, type Job } from '../api/job-view';
import { SolveStateLabel } from '@/components/ui/shot-state-labels';

// The stages the worker and the solver report, in words.
const STAGE_WORDS: Record<string, string> = {
  starting: 'Starting on a worker',
  download: 'Fetching the files',
  read: 'Reading the files',
  write: 'Writing the result',
  upload: 'Storing the result',
  // Learning.
  validate: 'Checking the capture against the character',
  poses: 'Estimating the skeleton’s pose per frame',
  unpose: 'Removing what skinning explains',
  separate: 'Separating pose-driven from dynamic motion',
  subspace: 'Finding the tissue subspace',
  dynamics: 'Fitting the dynamics',
  modes: 'Naming the modes',
  spectra: 'Measuring the spectra',
  report: 'Writing the fit report',
  // Retargeting.
  check: 'Checking the inputs',
  map: 'Mapping the joints',
  transfer: 'Transferring onto the character',
  drive: 'Driving from the clip',
  simulate: 'Simulating the shot',
  metrics: 'Measuring the take',
};

/** A solver stage in words; unknown stages pass through with their dashes and underscores read. */
export function jobStageWords(stage: string | null): string {
  if (!stage) return 'No stage reported yet';
  return STAGE_WORDS[stage] ?? stage.replace(/[_-]+/g, ' ');
}

/** Props of a job's progress. */
export interface JobProgressProps {
  job: Job;
  /** What the job is doing, for the bar's accessible name, e.g. "Retarget job". */
  label: string;
  /** Buttons shown beside the state (cancel, …). */
  actions?: ReactNode;
}

/** A job's state, a progress bar with stage and percent, and why it failed. */
export function JobProgress({ job, label, actions }: JobProgressProps) {
  const percent = Math.round(job.state === 'solved' ? 100 : job.percent);
  return (
    <Flex
      direction="column"
      gap="2"
      data-testid="job-progress"
      data-state={job.state}
      data-job={job.id}
    >
      <Flex justify="between" align="center" gap="3" wrap="wrap">
        <SolveStateLabel state={job.state} />
        {actions}
      </Flex>
      {job.state !== 'canceled' ? (
        <Progress value={percent} max={100} aria-label={`${label} progress`} />
      ) : null}
      <Flex justify="between" gap="3">
        <Text size="2" color="gray" data-testid="job-stage">
          {isJobFinished(job.state)
            ? job.state === 'solved'
              ? 'Finished'
              : 'Stopped'
            : jobStageWords(job.stage)}
        </Text>
        <Mono size="2">{percent} %</Mono>
      </Flex>
      {job.state === 'failed' ? (
        <Text as="p" size="2" color="red" role="alert">
          {job.errorMessage ?? 'The solver did not say why the job failed.'}
          {job.errorCode ? (
            <>
              {' '}
              <Mono size="1">({job.errorCode})</Mono>
            </>
          ) : null}
        </Text>
      ) : null}
    </Flex>
  );
}
