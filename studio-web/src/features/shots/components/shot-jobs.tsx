import { Flex, Table, Text } from '@radix-ui/themes';
import { Mono } from '@/components/ui/mono';
import { isJobFinished, type Job } from '@/features/library/api/job-view';
import { formatDay } from '@/features/library/components/format-date';
import { SolveStateLabel } from '@/components/ui/shot-state-labels';
import { LiveJob } from './live-job';

/** Props of a shot's jobs. */
export interface ShotJobsProps {
  showId: string;
  jobs: Job[];
  live: boolean;
}

/** Running jobs with live progress on top; finished ones below in a table. */
export function ShotJobs({ showId, jobs, live }: ShotJobsProps) {
  const running = jobs.filter((j) => !isJobFinished(j.state));
  const finished = jobs.filter((j) => isJobFinished(j.state));
  if (jobs.length === 0) return <Text color="gray">No retarget jobs yet.</Text>;
  return (
    <Flex direction="column" gap="3">
      {running.map((j) => (
        <LiveJob key={j.id} showId={showId} job={j} live={live} />
      ))}
      {finished.length > 0 ? (
        <Table.Root
          variant="surface"
          size="1"
          aria-label="Finished jobs"
          data-testid="finished-jobs"
        >
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Job</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>State</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Submitted</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Outcome</Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {finished.map((j) => (
              <Table.Row key={j.id}>
                <Table.RowHeaderCell>
                  <Mono size="2">{j.id.slice(0, 8)}</Mono>
                </Table.RowHeaderCell>
                <Table.Cell>
                  <SolveStateLabel state={j.state} />
                </Table.Cell>
                <Table.Cell>{formatDay(j.createdAt)}</Table.Cell>
                <Table.Cell>
                  <Text size="2" color={j.state === 'failed' ? 'red' : 'gray'}>
                    {j.state === 'failed'
                      ? (j.errorMessage ?? j.errorCode ?? 'Failed without a reason.')
                      : j.state === 'solved'
                        ? 'Made a take'
                        : 'Stopped by hand'}
                  </Text>
                </Table.Cell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      ) : null}
    </Flex>
  );
}
