import { Card, Flex, Grid, Heading, Spinner, Text } from '@radix-ui/themes';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { HEALTH_REFRESH_MS, useHealth } from '../api/get-health';
import { SERVICE_NAMES } from '../api/health-report';
import { HealthSummary } from './health-summary';
import { ServiceCard } from './service-card';

const RETRY_NOTE = `This page keeps asking every ${HEALTH_REFRESH_MS / 1000} seconds.`;

/** Live health of the API's backing services, with the last known report kept on screen. */
export function HealthPanel() {
  const health = useHealth();
  return (
    <Flex direction="column" gap="3" asChild>
      <section aria-labelledby="services-heading">
        <Heading as="h2" size="4" id="services-heading">
          Services
        </Heading>
        {health.isPending ? (
          <Card>
            <Flex align="center" gap="2">
              <Spinner />
              <Text color="gray">Checking services…</Text>
            </Flex>
          </Card>
        ) : null}
        {health.isError ? <ApiErrorCallout error={health.error} retryNote={RETRY_NOTE} /> : null}
        {health.data ? (
          <>
            {health.isError ? (
              <Text size="2" color="gray">
                Showing the last report that arrived.
              </Text>
            ) : null}
            <HealthSummary report={health.data} />
            <Grid columns={{ initial: '1', sm: '2' }} gap="3">
              {SERVICE_NAMES.map((name) => (
                <ServiceCard key={name} name={name} health={health.data.services[name]} />
              ))}
            </Grid>
          </>
        ) : null}
      </section>
    </Flex>
  );
}
