import { Button, Card, Flex, Grid, Heading, Spinner, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { usePermissions } from '@/features/auth/hooks/use-permissions';
import { useShows } from '../api/get-shows';

/** The caller's shows as cards, each with the sections their role can open. */
export function ShowList() {
  const shows = useShows();
  const { can } = usePermissions();

  if (shows.isPending) {
    return (
      <Flex align="center" gap="2">
        <Spinner />
        <Text color="gray">Loading your shows…</Text>
      </Flex>
    );
  }
  if (shows.isError) return <ApiErrorCallout error={shows.error} />;
  if (shows.data.length === 0) {
    return (
      <Card>
        <Text color="gray">
          You are not a member of any show yet. An admin adds people to shows.
          {can('admin') ? ' You are an admin: create a show under Admin, Shows.' : ''}
        </Text>
      </Card>
    );
  }
  return (
    <Grid columns={{ initial: '1', sm: '2', md: '3' }} gap="3" asChild>
      <ul className="plain-list" aria-label="Your shows">
        {shows.data.map((show) => (
          <li key={show.id}>
            <Card size="2" data-testid={`show-${show.code}`}>
              <Flex direction="column" gap="3">
                <Flex direction="column" gap="1">
                  <Mono size="2" color="gray">
                    {show.code}
                  </Mono>
                  <Heading as="h2" size="4">
                    <Link to={paths.shots.getHref(show.id)} className="card-title-link">
                      {show.name}
                    </Link>
                  </Heading>
                </Flex>
                <Flex gap="2" wrap="wrap">
                  <Button asChild size="1" variant="soft" color="gray">
                    <Link to={paths.library.getHref(show.id)}>Library</Link>
                  </Button>
                  <Button asChild size="1" variant="soft" color="gray">
                    <Link to={paths.shots.getHref(show.id)}>Shots</Link>
                  </Button>
                  {can('track') ? (
                    <Button asChild size="1" variant="soft" color="gray">
                      <Link to={paths.tracking.getHref(show.id)}>Tracking</Link>
                    </Button>
                  ) : null}
                </Flex>
              </Flex>
            </Card>
          </li>
        ))}
      </ul>
    </Grid>
  );
}
