import { Flex, Link as TextLink, Progress, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { ActivityIcon, CheckIcon, ClockIcon, CrossIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { StateLabel } from '@/components/ui/state-label';
import { paths } from '@/config/paths';
import type { Job as RetargetJob } from '@/features/library/api/job-view';
import type { JobState } from '../api/take-view';
import { useTake } from '../api/get-take';

type Look = { word: string; icon: ReactNode; color: 'gray' | 'amber' | 'green' | 'red' };

const JOB_WORDS: Record<JobState, Look> = {
  queued: { word: 'Waiting in queue', icon: <ClockIcon />, color: 'gray' },
  solving: { word: 'Solving', icon: <ActivityIcon />, color: 'amber' },
  solved: { word: 'Solved', icon: <CheckIcon />, color: 'green' },
  failed: { word: 'Failed', icon: <CrossIcon />, color: 'red' },
  canceled: { word: 'Canceled', icon: <CrossIcon />, color: 'gray' },
};

/** A retarget job's state in words with an icon. */
export function JobStateLabel({ state }: { state: JobState }) {
  const { word, icon, color } = JOB_WORDS[state];
  return (
    <StateLabel icon={icon} color={color}>
      {word}
    </StateLabel>
  );
}

function NewTakeLink({ showId, takeId }: { showId: string; takeId: string }) {
  const take = useTake(showId, takeId);
  return (
    <TextLink asChild>
      <Link to={paths.take.getHref(showId, takeId)} data-testid="new-take-link">
        Open take{take.data ? ` v${take.data.version}` : ''}
      </Link>
    </TextLink>
  );
}

/** Where a "save as new take" job is: state, stage, percent, and the new take once solved. */
export function JobProgress({ showId, job }: { showId: string; job: RetargetJob }) {
  return (
    <Flex direction="column" gap="2" data-testid="save-job" data-state={job.state}>
      <Flex align="center" gap="3" wrap="wrap">
        <JobStateLabel state={job.state} />
        {job.stage && job.state === 'solving' ? (
          <Text size="1" color="gray">
            {job.stage}
          </Text>
        ) : null}
        <Mono size="1">{Math.round(job.percent)} %</Mono>
      </Flex>
      {job.state === 'queued' || job.state === 'solving' ? (
        <Progress value={job.percent} aria-label="Progress of the new take" />
      ) : null}
      {job.state === 'failed' ? (
        <Text size="2" color="red">
          {job.errorMessage ?? 'The job failed.'}
          {job.errorCode ? <Mono size="1"> ({job.errorCode})</Mono> : null}
        </Text>
      ) : null}
      {job.state === 'solved' && job.takeId ? (
        <NewTakeLink showId={showId} takeId={job.takeId} />
      ) : null}
    </Flex>
  );
}
