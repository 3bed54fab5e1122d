import { Flex, Heading, Text } from '@radix-ui/themes';
import type { QueryClient } from '@tanstack/react-query';
import { getHealthQueryOptions } from '@/features/status/api/get-health';
import { HealthPanel } from '@/features/status/components/health-panel';
import { PingPanel } from '@/features/status/components/ping-panel';

/** Starts the health request as the route is entered. */
export function statusLoader(queryClient: QueryClient) {
  return () => {
    // Not awaited: the page shows its own "checking" and "cannot reach the API" states, so a
    // slow or stopped API must not hold up navigation.
    void queryClient.prefetchQuery(getHealthQueryOptions());
    return null;
  };
}

/** The Status page: live service health and the worker round-trip check. */
export function StatusRoute() {
  return (
    <Flex direction="column" gap="6">
      <title>Status · Overshoot</title>
      <Flex direction="column" gap="1">
        <Heading as="h1" size="7">
          Status
        </Heading>
        <Text color="gray">The services Overshoot runs on, checked live.</Text>
      </Flex>
      <HealthPanel />
      <PingPanel />
    </Flex>
  );
}
