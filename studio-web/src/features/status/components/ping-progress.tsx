import { Flex, Progress, Text } from '@radix-ui/themes';
import { Mono } from '@/components/ui/mono';
import { formatClockTime } from '@/lib/format';
import type { PingJob } from '../api/ping-job';
import { PingStateLabel } from './ping-state-label';

/** Where one test job is: state, progress bar with stage and percent, then its outcome. */
export function PingProgress({ job }: { job: PingJob }) {
  const percent = Math.round(job.progress.percent);
  return (
    <Flex direction="column" gap="2">
      <Flex justify="between" align="center" gap="3" wrap="wrap">
        <PingStateLabel state={job.state} />
        <Text size="1" color="gray">
          Job <Mono size="1">{job.id}</Mono>
        </Text>
      </Flex>
      <Progress value={percent} max={100} aria-label="Test job progress" />
      <Flex justify="between" gap="3">
        <Text size="2" color="gray" data-testid="ping-stage">
          {job.progress.stage || 'No stage reported yet'}
        </Text>
        <Mono size="2">{percent} %</Mono>
      </Flex>
      {job.state === 'completed' && job.result ? (
        <Text as="p" size="2" data-testid="ping-result">
          Handled by worker <Mono size="2">{job.result.worker}</Mono> in{' '}
          <Mono size="2">{job.result.steps}</Mono> steps, finished at{' '}
          <Mono size="2">{formatClockTime(job.result.finishedAt)}</Mono>.
        </Text>
      ) : null}
      {job.state === 'failed' ? (
        <Text as="p" size="2" color="red" data-testid="ping-failure">
          {job.failedReason ?? 'The worker did not say why the job failed.'}
        </Text>
      ) : null}
    </Flex>
  );
}
