import { Button, Card, DataList, Flex, Heading, Link as RadixLink, Text } from '@radix-ui/themes';
import { Link, useParams } from 'react-router-dom';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { useCurrentShow, usePermissions } from '@/features/auth';
import { useCharacter } from '@/features/library/api/get-character';
import { useClip } from '@/features/library/api/get-clip';
import { formatDay } from '@/features/library/components/format-date';
import { LiveIndicator } from '@/features/library/components/live-indicator';
import { QueryState } from '@/features/library/components/query-state';
import { useShotJobs } from '../api/get-jobs';
import { useShot } from '../api/get-shot';
import { useShotTakes } from '../api/get-shot-takes';
import {
  RenderStateLabel,
  ReviewStateLabel,
  SolveStateLabel,
} from '@/components/ui/shot-state-labels';
import { LateLabel } from '../components/late-label';
import { ShotJobs } from '../components/shot-jobs';
import { TakesTable } from '../components/takes-table';
import { useLiveShots } from '../hooks/use-live-shots';

/** A field naming a library item: a link to it, or "None yet" while the shot has none. */
function LinkedItem({ label, href, name }: { label: string; href: string | null; name: string }) {
  return (
    <DataList.Item>
      <DataList.Label>{label}</DataList.Label>
      <DataList.Value>
        {href ? (
          <RadixLink asChild>
            <Link to={href}>{name}</Link>
          </RadixLink>
        ) : (
          'None yet'
        )}
      </DataList.Value>
    </DataList.Item>
  );
}

/** One shot: its fields, states, retarget jobs (live) and takes. */
export function ShotRoute() {
  const { showId } = useCurrentShow();
  const shotId = useParams().shotId ?? '';
  const { can } = usePermissions();
  const { live } = useLiveShots(showId);
  const shot = useShot(showId, shotId);
  const character = useCharacter(showId, shot.data?.characterId ?? undefined);
  const clip = useClip(showId, shot.data?.clipId ?? undefined);
  const takes = useShotTakes(showId, shotId);
  const jobs = useShotJobs(showId, shotId, { poll: !live });
  return (
    <QueryState query={shot} what="the shot">
      {(s) => (
        <Flex direction="column" gap="5">
          <title>{`${s.code} · Shots · Overshoot`}</title>
          <Flex direction="column" gap="2">
            <Text size="2">
              <RadixLink asChild>
                <Link to={paths.shots.getHref(showId)}>← Shots</Link>
              </RadixLink>
            </Text>
            <Flex justify="between" align="center" gap="3" wrap="wrap">
              <Heading as="h1" size="7">
                <Mono>{s.code}</Mono>
              </Heading>
              <Flex gap="2">
                {can('editShot') || can('planShot') ? (
                  <Button variant="soft" asChild>
                    <Link to={paths.editShot.getHref(showId, s.id)}>Edit shot</Link>
                  </Button>
                ) : null}
                {can('submitJob') ? (
                  <Button asChild>
                    <Link to={paths.retarget.getHref(showId, s.id)}>Retarget…</Link>
                  </Button>
                ) : null}
              </Flex>
            </Flex>
            <Flex gap="2" wrap="wrap" align="center" aria-label="States">
              <SolveStateLabel state={s.solveState} />
              <ReviewStateLabel state={s.reviewState} />
              <RenderStateLabel state={s.renderState} />
              {s.late ? <LateLabel /> : null}
              <LiveIndicator live={live} />
            </Flex>
          </Flex>
          <Card>
            <DataList.Root>
              <DataList.Item>
                <DataList.Label>Sequence</DataList.Label>
                <DataList.Value>
                  <Mono>{s.sequence}</Mono>
                </DataList.Value>
              </DataList.Item>
              <DataList.Item>
                <DataList.Label>Frames</DataList.Label>
                <DataList.Value>
                  <Mono>
                    {s.frameStart}–{s.frameEnd} ({s.frameEnd - s.frameStart + 1} frames) at {s.fps}{' '}
                    fps
                  </Mono>
                </DataList.Value>
              </DataList.Item>
              <LinkedItem
                label="Target character"
                href={s.characterId ? paths.character.getHref(showId, s.characterId) : null}
                name={character.data?.name ?? 'the character'}
              />
              <LinkedItem
                label="Clip"
                href={s.clipId ? paths.clip.getHref(showId, s.clipId) : null}
                name={clip.data?.name ?? 'the clip'}
              />
              <DataList.Item>
                <DataList.Label>Assignees</DataList.Label>
                <DataList.Value>
                  {s.assignees.map((a) => a.displayName).join(', ') || 'Nobody yet'}
                </DataList.Value>
              </DataList.Item>
              <DataList.Item>
                <DataList.Label>Due</DataList.Label>
                <DataList.Value>{formatDay(s.dueDate)}</DataList.Value>
              </DataList.Item>
            </DataList.Root>
          </Card>
          <Flex direction="column" gap="2" asChild>
            <section aria-labelledby="jobs-heading">
              <Heading as="h2" size="4" id="jobs-heading">
                Retarget jobs
              </Heading>
              <QueryState query={jobs} what="jobs">
                {(list) => <ShotJobs showId={showId} jobs={list} live={live} />}
              </QueryState>
            </section>
          </Flex>
          <Flex direction="column" gap="2" asChild>
            <section aria-labelledby="takes-heading">
              <Heading as="h2" size="4" id="takes-heading">
                Takes
              </Heading>
              <QueryState query={takes} what="takes">
                {(list) => <TakesTable showId={showId} takes={list} />}
              </QueryState>
            </section>
          </Flex>
        </Flex>
      )}
    </QueryState>
  );
}
