import { Flex, Heading, Link as ThemeLink, Spinner, Table, Text } from '@radix-ui/themes';
import { Link, useNavigate } from 'react-router-dom';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { useAdminShows } from '../api/get-admin-shows';
import { CreateShowForm } from './create-show-form';
import { ShowStateLabel } from './show-state-label';

/** Every show, archived ones too, and a form to create one. */
export function ShowsScreen() {
  const shows = useAdminShows();
  const navigate = useNavigate();
  return (
    <Flex direction="column" gap="5">
      <title>Shows · Admin · Overshoot</title>
      <CreateShowForm onCreated={(show) => void navigate(paths.adminShow.getHref(show.id))} />
      <Flex direction="column" gap="3">
        <Heading as="h2" size="5">
          Shows
        </Heading>
        {shows.isPending ? <Spinner /> : null}
        {shows.isError ? <ApiErrorCallout error={shows.error} /> : null}
        {shows.data?.length === 0 ? (
          <Text color="gray">No show yet: create the first one.</Text>
        ) : null}
        {shows.data?.length ? (
          <Table.Root variant="surface" data-testid="admin-shows-table">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Code</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>State</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Created</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {shows.data.map((show) => (
                <Table.Row key={show.id} align="center">
                  <Table.RowHeaderCell>
                    <ThemeLink asChild>
                      <Link to={paths.adminShow.getHref(show.id)}>
                        <Mono size="2" weight="medium">
                          {show.code}
                        </Mono>
                      </Link>
                    </ThemeLink>
                  </Table.RowHeaderCell>
                  <Table.Cell>{show.name}</Table.Cell>
                  <Table.Cell>
                    <ShowStateLabel archived={show.archived} />
                  </Table.Cell>
                  <Table.Cell>
                    <Mono size="2">{show.createdAt.slice(0, 10)}</Mono>
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
        ) : null}
      </Flex>
    </Flex>
  );
}
