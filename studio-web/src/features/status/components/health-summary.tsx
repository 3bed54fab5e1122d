import { Flex, Text } from '@radix-ui/themes';
import { CheckIcon, WarningIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { StateLabel } from '@/components/ui/state-label';
import { formatClockTime } from '@/lib/format';
import { HEALTH_REFRESH_MS } from '../api/get-health';
import { SERVICE_NAMES, type HealthReport } from '../api/health-report';

/** Overall state in words, how many services are down, and when the API last checked. */
export function HealthSummary({ report }: { report: HealthReport }) {
  const down = SERVICE_NAMES.filter((name) => report.services[name].status === 'down').length;
  return (
    <Flex justify="between" align="center" gap="3" wrap="wrap">
      {report.status === 'up' ? (
        <StateLabel icon={<CheckIcon />} color="jade">
          All services up
        </StateLabel>
      ) : (
        <StateLabel icon={<WarningIcon />} color="red">
          {`Degraded: ${down} of ${SERVICE_NAMES.length} down`}
        </StateLabel>
      )}
      <Text size="2" color="gray" data-testid="checked-at">
        Last checked{' '}
        <Mono size="2" highContrast>
          <time dateTime={report.checkedAt}>{formatClockTime(report.checkedAt)}</time>
        </Mono>{' '}
        · refreshes every {HEALTH_REFRESH_MS / 1000} seconds
      </Text>
    </Flex>
  );
}
