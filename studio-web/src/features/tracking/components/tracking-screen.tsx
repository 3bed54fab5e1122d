import { Flex, Grid, Heading, Spinner, Text } from '@radix-ui/themes';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { Mono } from '@/components/ui/mono';
import { useCurrentShow, usePermissions } from '@/features/auth';
import { useThroughput } from '../api/get-throughput';
import { useShotSummary } from '../api/get-shot-summary';
import { useTrackedShots } from '../api/get-tracked-shots';
import { useShotFilters } from '../hooks/use-shot-filters';
import { ExportButton } from './export-button';
import { LatenessChart } from './lateness-chart';
import { ShotFilterBar } from './shot-filter-bar';
import { ShotTable } from './shot-table';
import { StateCounts } from './state-counts';
import { TablePager } from './table-pager';
import { ThroughputChart } from './throughput-chart';

function Waiting({ what }: { what: string }) {
  return (
    <Flex align="center" gap="2">
      <Spinner />
      <Text color="gray">Loading {what}…</Text>
    </Flex>
  );
}

/** The producer's view of a show: counts, charts, and the filterable shot table with export. */
export function TrackingScreen() {
  const { showId, show } = useCurrentShow();
  const { can } = usePermissions();
  const summary = useShotSummary(showId);
  const throughput = useThroughput(showId);
  const [filters, setFilters] = useShotFilters();
  const shots = useTrackedShots(showId, filters);

  return (
    <Flex direction="column" gap="6">
      <title>{`Tracking · ${show?.code ?? 'Show'} · Overshoot`}</title>
      <Flex direction="column" gap="1">
        <Text size="2" color="gray">
          {show ? (
            <>
              <Mono size="2">{show.code}</Mono> · {show.name}
            </>
          ) : (
            ' '
          )}
        </Text>
        <Heading as="h1" size="7">
          Tracking
        </Heading>
      </Flex>

      <section aria-labelledby="counts-heading">
        <Heading as="h2" size="4" id="counts-heading" mb="3">
          Shots by state
        </Heading>
        {summary.isPending ? <Waiting what="the counts" /> : null}
        {summary.isError ? <ApiErrorCallout error={summary.error} /> : null}
        {summary.data ? <StateCounts summary={summary.data} /> : null}
      </section>

      <section aria-label="Charts">
        <Grid columns={{ initial: '1', md: '2' }} gap="3">
          {throughput.isPending ? <Waiting what="throughput" /> : null}
          {throughput.isError ? <ApiErrorCallout error={throughput.error} /> : null}
          {throughput.data ? <ThroughputChart weeks={throughput.data} /> : null}
          {summary.data ? <LatenessChart late={summary.data.late} /> : null}
        </Grid>
      </section>

      <Flex direction="column" gap="3" asChild>
        <section aria-labelledby="table-heading">
          <Flex justify="between" align="start" gap="3">
            <Heading as="h2" size="4" id="table-heading">
              Shot table
            </Heading>
            {can('exportReports') ? (
              <ExportButton showId={showId} showCode={show?.code} filters={filters} />
            ) : null}
          </Flex>
          <ShotFilterBar showId={showId} filters={filters} onChange={setFilters} />
          {shots.isPending ? <Waiting what="shots" /> : null}
          {shots.isError ? <ApiErrorCallout error={shots.error} /> : null}
          {shots.data ? (
            <>
              {shots.data.items.length ? (
                <ShotTable
                  showId={showId}
                  shots={shots.data.items}
                  sort={filters.sort}
                  onSort={(sort) => setFilters({ ...filters, sort, page: undefined })}
                  canPlan={can('planShot')}
                  canRender={can('setRenderState')}
                />
              ) : (
                <Text color="gray" data-testid="no-shots">
                  No shot matches these filters.
                </Text>
              )}
              <TablePager
                page={shots.data.page}
                pageSize={shots.data.pageSize}
                total={shots.data.total}
                onPage={(page) => setFilters({ ...filters, page })}
              />
            </>
          ) : null}
        </section>
      </Flex>
    </Flex>
  );
}
