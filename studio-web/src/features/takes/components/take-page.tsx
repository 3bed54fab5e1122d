import { Callout, Flex, Heading, Link as TextLink, Spinner, Text } from '@radix-ui/themes';
import { Link, useParams } from 'react-router-dom';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { WarningIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { useShot } from '@/features/shots/api/get-shot';
import { useTake } from '../api/get-take';
import { useTakeFile } from '../api/get-take-file';
import { describeModelError, useTakeModel } from '../hooks/use-take-model';
import { JobStateLabel } from './job-progress';
import { ReviewStateLabel } from './review-state-label';
import { TakePlayer } from './take-player';
import '../take-player.css';

function Waiting({ what }: { what: string }) {
  return (
    <Flex align="center" gap="2" py="6" data-testid="take-loading">
      <Spinner />
      <Text color="gray">{what}</Text>
    </Flex>
  );
}

/** The take player page: `/shows/:showId/takes/:takeId?frame=`. */
export function TakePage() {
  const { showId = '', takeId = '' } = useParams();
  const take = useTake(showId, takeId);
  const shot = useShot(showId, take.data?.shotId);
  const playable = take.data?.solveState === 'solved' && take.data.files.length > 0;
  const file = useTakeFile(showId, playable ? takeId : undefined);
  const model = useTakeModel(playable ? takeId : undefined, file.data);

  const title = take.data ? `Take v${take.data.version}` : 'Take';
  return (
    <Flex direction="column" gap="4">
      <title>{`${title}${shot.data ? ` · ${shot.data.sequence}/${shot.data.code}` : ''} · Overshoot`}</title>
      <Flex justify="between" align="end" gap="3" wrap="wrap">
        <Flex direction="column" gap="1">
          {shot.data ? (
            <TextLink asChild size="2" color="gray">
              <Link to={paths.shot.getHref(showId, shot.data.id)}>
                Shot{' '}
                <Mono>
                  {shot.data.sequence}/{shot.data.code}
                </Mono>
              </Link>
            </TextLink>
          ) : null}
          <Heading as="h1" size="7">
            {title}
          </Heading>
        </Flex>
        {take.data ? (
          <Flex gap="2" align="center">
            <JobStateLabel state={take.data.solveState} />
            <ReviewStateLabel state={take.data.reviewState} />
          </Flex>
        ) : null}
      </Flex>
      {take.isPending ? <Waiting what="Loading the take…" /> : null}
      {take.isError ? <ApiErrorCallout error={take.error} /> : null}
      {shot.isError ? <ApiErrorCallout error={shot.error} /> : null}
      {take.data && !playable ? (
        <Callout.Root color="amber">
          <Callout.Icon>
            <WarningIcon size={16} />
          </Callout.Icon>
          <Callout.Text>
            This take has no file to play: its job is {take.data.solveState}.
          </Callout.Text>
        </Callout.Root>
      ) : null}
      {playable && file.isPending ? <Waiting what="Downloading the take file…" /> : null}
      {file.isError ? <ApiErrorCallout error={file.error} /> : null}
      {file.data && model.isPending ? <Waiting what="Reading the take…" /> : null}
      {model.isError ? (
        <Callout.Root color="red" role="alert">
          <Callout.Icon>
            <WarningIcon size={16} />
          </Callout.Icon>
          <Callout.Text>
            This take's file cannot be shown: {describeModelError(model.error)}
          </Callout.Text>
        </Callout.Root>
      ) : null}
      {take.data && shot.data && model.data ? (
        <TakePlayer
          key={take.data.id}
          showId={showId}
          take={take.data}
          shot={shot.data}
          model={model.data}
        />
      ) : null}
    </Flex>
  );
}
