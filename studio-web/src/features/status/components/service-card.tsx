import { Card, Flex, Text } from '@radix-ui/themes';
import { Mono } from '@/components/ui/mono';
import { formatLatency } from '@/lib/format';
import type { ServiceHealth, ServiceName } from '../api/health-report';
import { SERVICE_LABELS } from './service-labels';
import { ServiceStateLabel } from './service-state-label';

/** Props of one service's card. */
export interface ServiceCardProps {
  name: ServiceName;
  health: ServiceHealth;
}

/** One backing service: name, purpose, state in words, check latency and, when down, why. */
export function ServiceCard({ name, health }: ServiceCardProps) {
  const { label, purpose } = SERVICE_LABELS[name];
  return (
    <Card data-testid={`service-${name}`} data-state={health.status}>
      <Flex direction="column" gap="2">
        <Flex justify="between" align="start" gap="3">
          <Flex direction="column" gap="1">
            <Text as="div" size="3" weight="medium">
              {label}
            </Text>
            <Text as="div" size="1" color="gray">
              {purpose}
            </Text>
          </Flex>
          <ServiceStateLabel state={health.status} />
        </Flex>
        <Text as="div" size="2" color="gray">
          Check took{' '}
          <Mono size="2" highContrast>
            {formatLatency(health.latencyMs)}
          </Mono>
        </Text>
        {health.status === 'down' ? (
          <Text as="p" size="2" color="red" data-testid="service-error">
            {health.error ?? 'The API did not say why.'}
          </Text>
        ) : null}
      </Flex>
    </Card>
  );
}
