import { Flex, Heading, Link as ThemeLink, Spinner, Text } from '@radix-ui/themes';
import { Link, useParams } from 'react-router-dom';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { useAdminShows } from '../api/get-admin-shows';
import { MembersPanel } from './members-panel';
import { ShowSettingsForm } from './show-settings-form';
import { TokensPanel } from './tokens-panel';

/** One show's settings, members and pipeline tokens. */
export function ShowAdminScreen() {
  const showId = useParams().showId ?? '';
  const shows = useAdminShows();
  const show = shows.data?.find((s) => s.id === showId);

  return (
    <Flex direction="column" gap="4">
      <title>{`${show?.code ?? 'Show'} · Admin · Overshoot`}</title>
      <Text size="2">
        <ThemeLink asChild>
          <Link to={paths.adminShows.getHref()}>All shows</Link>
        </ThemeLink>
      </Text>
      {shows.isPending ? <Spinner /> : null}
      {shows.isError ? <ApiErrorCallout error={shows.error} /> : null}
      {shows.data && !show ? (
        <Text role="alert">There is no show with this address. It may have been removed.</Text>
      ) : null}
      {show ? (
        <>
          <Heading as="h2" size="6">
            <Mono size="6">{show.code}</Mono> · {show.name}
          </Heading>
          <ShowSettingsForm key={show.id} show={show} />
          <MembersPanel showId={show.id} showCode={show.code} />
          <TokensPanel showId={show.id} />
        </>
      ) : null}
    </Flex>
  );
}
