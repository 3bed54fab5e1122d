import { Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { useCreatePing } from '../api/create-ping';
import { usePing } from '../api/get-ping';
import { isPingFinished } from '../api/ping-job';
import { PingProgress } from './ping-progress';

// Enough steps to watch the bar move, few enough to finish in a moment.
const TEST_JOB_STEPS = 5;

/** "Worker round trip": queue a test job, watch a worker pick it up, report, and finish. */
export function PingPanel() {
  const createPing = useCreatePing();
  const ping = usePing(createPing.data?.id);
  const job = ping.data ?? createPing.data;
  // A job whose polling failed may never finish on screen, so let the user send another.
  const running =
    createPing.isPending || (job !== undefined && !isPingFinished(job.state) && !ping.isError);

  return (
    <Card data-testid="ping-panel" data-state={job?.state ?? 'idle'} asChild>
      <section aria-labelledby="ping-heading">
        <Flex direction="column" gap="3">
          <Flex justify="between" align="center" gap="3" wrap="wrap">
            <Flex direction="column" gap="1">
              <Heading as="h2" size="4" id="ping-heading">
                Worker round trip
              </Heading>
              <Text size="2" color="gray">
                Sends a small test job through the queue to a worker and follows it back.
              </Text>
            </Flex>
            <Button
              onClick={() => createPing.mutate({ steps: TEST_JOB_STEPS })}
              loading={createPing.isPending}
              disabled={running}
            >
              Send test job
            </Button>
          </Flex>
          {createPing.isError ? <ApiErrorCallout error={createPing.error} /> : null}
          {job ? <PingProgress job={job} /> : null}
          {ping.isError ? <ApiErrorCallout error={ping.error} /> : null}
        </Flex>
      </section>
    </Card>
  );
}
