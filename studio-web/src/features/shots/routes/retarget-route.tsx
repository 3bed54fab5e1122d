import { Callout, Flex, Heading, Link as RadixLink, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { WarningIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { useCurrentShow, usePermissions } from '@/features/auth';
import { useCharacter } from '@/features/library/api/get-character';
import { useProfiles } from '@/features/library/api/get-profiles';
import type { Job } from '@/features/library/api/job-view';
import { LiveIndicator } from '@/features/library/components/live-indicator';
import { QueryState } from '@/features/library/components/query-state';
import { useShot } from '../api/get-shot';
import { LiveJob } from '../components/live-job';
import { RetargetForm } from '../components/retarget-form';
import { RoleNotice } from '../components/role-notice';
import { useLiveShots } from '../hooks/use-live-shots';

/** Submit a retarget job for a shot and follow it until it is solved. */
export function RetargetRoute() {
  const { showId } = useCurrentShow();
  const shotId = useParams().shotId ?? '';
  const { can } = usePermissions();
  const { live } = useLiveShots(showId);
  const shot = useShot(showId, shotId);
  const profiles = useProfiles(showId);
  const character = useCharacter(showId, shot.data?.characterId ?? undefined);
  const [submitted, setSubmitted] = useState<Job[]>([]);
  return (
    <QueryState query={shot} what="the shot">
      {(s) => (
        <Flex direction="column" gap="4">
          <title>{`Retarget ${s.code} · Overshoot`}</title>
          <Flex direction="column" gap="1">
            <Text size="2">
              <RadixLink asChild>
                <Link to={paths.shot.getHref(showId, s.id)}>← Shot {s.code}</Link>
              </RadixLink>
            </Text>
            <Flex justify="between" align="center" gap="3">
              <Heading as="h1" size="7">
                Retarget <Mono>{s.code}</Mono>
              </Heading>
              <LiveIndicator live={live} />
            </Flex>
            <Text color="gray">
              Apply a tissue profile to the shot’s character and clip, frames{' '}
              <Mono>
                {s.frameStart}–{s.frameEnd}
              </Mono>
              . The result is a new take.
            </Text>
          </Flex>
          {submitted.map((job) => (
            <LiveJob key={job.id} showId={showId} job={job} live={live} />
          ))}
          {!can('submitJob') ? (
            <RoleNotice>Your role may not submit retarget jobs.</RoleNotice>
          ) : !s.characterId || !s.clipId ? (
            <Callout.Root color="orange">
              <Callout.Icon>
                <WarningIcon size={16} />
              </Callout.Icon>
              <Callout.Text>
                The shot needs a target character and a clip before it can be retargeted.{' '}
                <RadixLink asChild>
                  <Link to={paths.editShot.getHref(showId, s.id)}>Edit the shot</Link>
                </RadixLink>
              </Callout.Text>
            </Callout.Root>
          ) : (
            <QueryState query={profiles} what="tissue profiles">
              {(list) =>
                character.data ? (
                  <RetargetForm
                    showId={showId}
                    shotId={s.id}
                    profiles={list}
                    regions={character.data.regions ?? []}
                    targetJoints={character.data.joints ?? []}
                    onSubmitted={(job) => setSubmitted((jobs) => [job, ...jobs])}
                  />
                ) : (
                  <QueryState query={character} what="the character">
                    {() => null}
                  </QueryState>
                )
              }
            </QueryState>
          )}
        </Flex>
      )}
    </QueryState>
  );
}
