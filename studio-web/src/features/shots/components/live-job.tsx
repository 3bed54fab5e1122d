import { Button, Card, Flex, Link as RadixLink, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { usePermissions, useSession } from '@/features/auth';
import { isJobFinished, type Job } from '@/features/library/api/job-view';
import { formatDay } from '@/features/library/components/format-date';
import { JobProgress } from '@/features/library/components/job-progress';
import { useCancelJob } from '../api/cancel-job';
import { useJob } from '../api/get-job';

/** Props of a live job card. */
export interface LiveJobProps {
  showId: string;
  job: Job;
  /** The event stream is open: no need to poll. */
  live: boolean;
}

/** A retarget job followed live (events, or polling when the stream is down), with cancel. */
export function LiveJob({ showId, job: initial, live }: LiveJobProps) {
  const { can } = usePermissions();
  const { user } = useSession();
  const query = useJob(showId, initial.id, { poll: !live && !isJobFinished(initial.state) });
  const job = query.data ?? initial;
  const cancel = useCancelJob(showId);
  const mayCancel = (can('cancelJob') || job.submittedBy === user.id) && !isJobFinished(job.state);
  return (
    <Card data-testid="live-job">
      <Flex direction="column" gap="2">
        <Text size="1" color="gray">
          Retarget job <Mono size="1">{job.id.slice(0, 8)}</Mono> · submitted{' '}
          {formatDay(job.createdAt)}
          {job.attempts > 1 ? ` · attempt ${job.attempts}` : ''}
        </Text>
        <JobProgress
          job={job}
          label="Retarget job"
          actions={
            mayCancel ? (
              <Button
                size="1"
                variant="soft"
                color="red"
                loading={cancel.isPending}
                onClick={() => cancel.mutate(job.id)}
              >
                Cancel job
              </Button>
            ) : null
          }
        />
        {job.takeId ? (
          <Text size="2">
            <RadixLink asChild>
              <Link to={paths.take.getHref(showId, job.takeId)}>Open the take</Link>
            </RadixLink>
          </Text>
        ) : null}
        {cancel.isError ? <ApiErrorCallout error={cancel.error} /> : null}
      </Flex>
    </Card>
  );
}
