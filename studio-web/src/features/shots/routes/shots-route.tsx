import { Button, Flex, Heading, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { usePermissions, useCurrentShow } from '@/features/auth';
import { QueryState } from '@/features/library/components/query-state';
import { useShots } from '../api/get-shots';
import { Pager } from '../components/pager';
import { ShotsTable } from '../components/shots-table';
import { ShotsToolbar } from '../components/shots-toolbar';
import { useLiveShots } from '../hooks/use-live-shots';
import { useShotListParams } from '../hooks/use-shot-list-params';

/** The Shots screen: the show's shots, searched, filtered, sorted and paged by the API. */
export function ShotsRoute() {
  const { showId, show } = useCurrentShow();
  const { can } = usePermissions();
  useLiveShots(showId);
  const [params, update] = useShotListParams();
  const shots = useShots(showId, params);
  return (
    <Flex direction="column" gap="4">
      <title>{`Shots · ${show?.name ?? 'Show'} · Overshoot`}</title>
      <Flex justify="between" align="end" gap="3" wrap="wrap">
        <Flex direction="column" gap="1">
          <Heading as="h1" size="7">
            Shots
          </Heading>
          <Text color="gray">
            {show ? `${show.name}: ` : ''}every shot with its solve, review and render state.
          </Text>
        </Flex>
        {can('createShot') ? (
          <Button asChild>
            <Link to={paths.newShot.getHref(showId)}>New shot</Link>
          </Button>
        ) : null}
      </Flex>
      <ShotsToolbar params={params} onChange={update} />
      <QueryState query={shots} what="shots">
        {(page) => (
          <Flex direction="column" gap="3" data-fetching={shots.isFetching}>
            {page.items.length > 0 ? (
              <ShotsTable
                showId={showId}
                shots={page.items}
                sort={params.sort}
                onSort={(sort) => update({ sort })}
              />
            ) : (
              <Text color="gray">
                {page.total === 0 && !params.search
                  ? 'No shots match.'
                  : 'No shots match these filters.'}
              </Text>
            )}
            <Pager
              page={page.page}
              pageSize={page.pageSize}
              total={page.total}
              onPage={(p) => update({ page: p })}
              onPageSize={(s) => update({ pageSize: s })}
            />
          </Flex>
        )}
      </QueryState>
    </Flex>
  );
}
