import { Callout, Card, Flex, Grid, Heading, Link as RadixLink, Text } from '@radix-ui/themes';
import { Link, useParams } from 'react-router-dom';
import { WarningIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { useCurrentShow } from '@/features/auth';
import { useCharacter } from '../api/get-character';
import { useProfile } from '../api/get-profile';
import { DetailHeader } from '../components/detail-header';
import { FitReport } from '../components/fit-report';
import { formatDay } from '../components/format-date';
import { JobProgress } from '../components/job-progress';
import { LiveIndicator } from '../components/live-indicator';
import { ModesTable } from '../components/modes-table';
import { ProfileStateLabel } from '../components/profile-state-label';
import { QueryState } from '../components/query-state';
import { SpectrumChart } from '../components/spectrum-chart';
import { useLiveLibrary } from '../hooks/use-live-library';

/** A tissue profile: its learn job, modes, spectra per region and fit report. */
export function ProfileRoute() {
  const { showId } = useCurrentShow();
  const id = useParams().profileId ?? '';
  const { live } = useLiveLibrary(showId);
  const profile = useProfile(showId, id, { poll: !live });
  const character = useCharacter(showId, profile.data?.characterId);
  return (
    <QueryState query={profile} what="the tissue profile">
      {(p) => (
        <Flex direction="column" gap="5">
          <title>{`${p.name} · Tissue profile · Overshoot`}</title>
          <DetailHeader
            showId={showId}
            section="Tissue profiles"
            tab="profiles"
            title={p.name}
            badges={
              <>
                <ProfileStateLabel state={p.state} />
                <LiveIndicator live={live} />
              </>
            }
          />
          <Text color="gray">
            Learned from capture{' '}
            {p.captureDeleted ? (
              'that has since been deleted'
            ) : (
              <RadixLink asChild>
                <Link to={paths.capture.getHref(showId, p.captureId)}>
                  <Mono>{p.captureId.slice(0, 8)}</Mono>
                </Link>
              </RadixLink>
            )}{' '}
            on{' '}
            <RadixLink asChild>
              <Link to={paths.character.getHref(showId, p.characterId)}>
                {character.data?.name ?? 'its character'}
              </Link>
            </RadixLink>
            , created {formatDay(p.createdAt)}.
          </Text>
          {p.captureDeleted ? (
            <Callout.Root color="orange" data-testid="capture-deleted-notice">
              <Callout.Icon>
                <WarningIcon size={16} />
              </Callout.Icon>
              <Callout.Text>
                Learned from a deleted capture. The capture’s files are gone; this profile keeps
                only what the solver learned. Check with the studio’s counsel before using it on new
                shots.
              </Callout.Text>
            </Callout.Root>
          ) : null}
          {p.job && (p.state !== 'ready' || p.job.state !== 'solved') ? (
            <Card>
              <Flex direction="column" gap="2">
                <Heading as="h2" size="4">
                  Learning
                </Heading>
                <JobProgress job={p.job} label="Learn job" />
              </Flex>
            </Card>
          ) : null}
          {p.modes ? (
            <Flex direction="column" gap="2" asChild>
              <section aria-labelledby="modes-heading">
                <Heading as="h2" size="4" id="modes-heading">
                  Modes
                </Heading>
                <Text size="2" color="gray">
                  Each mode is one oscillation of the tissue: how fast it swings, how quickly it
                  settles, where on the body, and its share of the motion.
                </Text>
                <ModesTable modes={p.modes} />
              </section>
            </Flex>
          ) : null}
          {p.spectra && p.spectra.length > 0 ? (
            <Flex direction="column" gap="2" asChild>
              <section aria-labelledby="spectra-heading">
                <Heading as="h2" size="4" id="spectra-heading">
                  Spectrum by region
                </Heading>
                <Grid columns={{ initial: '1', md: '2' }} gap="3">
                  {p.spectra.map((s) => (
                    <SpectrumChart key={s.region} spectrum={s} />
                  ))}
                </Grid>
              </section>
            </Flex>
          ) : null}
          {p.fitReport ? (
            <Flex direction="column" gap="2" asChild>
              <section aria-labelledby="fit-heading">
                <Heading as="h2" size="4" id="fit-heading">
                  Fit report
                </Heading>
                <Card>
                  <FitReport report={p.fitReport} />
                </Card>
              </section>
            </Flex>
          ) : null}
        </Flex>
      )}
    </QueryState>
  );
}
