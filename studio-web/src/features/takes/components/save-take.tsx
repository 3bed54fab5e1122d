import { Button, Flex, Text } from '@radix-ui/themes';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { useCreateRetargetJob } from '../api/create-retarget-job';
import { useJob } from '../api/get-job';
import { takeKeys } from '../api/take-keys';
import type { Take } from '../api/take-view';
import { JobProgress } from './job-progress';

/** Props of "save as new take". */
export interface SaveTakeProps {
  showId: string;
  take: Take;
  /** The full controls to submit (the take's, with the tuned ones changed). */
  controls: Record<string, unknown>;
  /** True when the controls differ from the take's. */
  changed: boolean;
}

/** Submits the tuned controls as a retarget job and follows it to the new take. */
export function SaveTake({ showId, take, controls, changed }: SaveTakeProps) {
  const queryClient = useQueryClient();
  const source = useJob(showId, take.jobId);
  const create = useCreateRetargetJob();
  const job = useJob(showId, create.data?.id, { follow: true });
  const current = job.data ?? create.data;
  const running =
    current !== undefined && (current.state === 'queued' || current.state === 'solving');
  const profileId = source.data?.profileId ?? null;

  // A new take joins the shot's list (for compare) as soon as it exists.
  const solvedTakeId = current?.state === 'solved' ? current.takeId : null;
  useEffect(() => {
    if (solvedTakeId) {
      void queryClient.invalidateQueries({ queryKey: takeKeys.shotTakes(showId, take.shotId) });
    }
  }, [solvedTakeId, queryClient, showId, take.shotId]);

  return (
    <Flex direction="column" gap="2">
      <Flex align="center" gap="3" wrap="wrap">
        <Button
          onClick={() =>
            profileId &&
            create.mutate({ showId, shotId: take.shotId, profileId, controls, baseTakeId: take.id })
          }
          disabled={!changed || !profileId || running}
          loading={create.isPending}
          data-testid="save-new-take"
        >
          Save as new take
        </Button>
        <Text size="1" color="gray">
          {changed
            ? 'Solves the shot again with these controls; this take stays as it is.'
            : 'Move a control to make a new take.'}
        </Text>
      </Flex>
      {source.isError ? <ApiErrorCallout error={source.error} /> : null}
      {create.isError ? <ApiErrorCallout error={create.error} /> : null}
      {current ? <JobProgress showId={showId} job={current} /> : null}
      {job.isError ? <ApiErrorCallout error={job.error} /> : null}
    </Flex>
  );
}
