import { Flex, Heading, Text } from '@radix-ui/themes';
import { usePermissions, useCurrentShow } from '@/features/auth';
import { useCaptures } from '../api/get-captures';
import { useCharacters } from '../api/get-characters';
import { useClips } from '../api/get-clips';
import { useProfiles } from '../api/get-profiles';
import { CaptureCaution } from '../components/capture-caution';
import { CaptureTable } from '../components/capture-table';
import { CharacterTable } from '../components/character-table';
import { ClipTable } from '../components/clip-table';
import { LearnProfileForm } from '../components/learn-profile-form';
import { LibraryTabs, type LibraryTab } from '../components/library-tabs';
import { LiveIndicator } from '../components/live-indicator';
import { ProfileTable } from '../components/profile-table';
import { QueryState } from '../components/query-state';
import { UploadPanel } from '../components/upload-panel';
import { useLiveLibrary } from '../hooks/use-live-library';
import { useUploads } from '../upload/use-uploads';

/** The Library of a show; a new show starts a fresh page (its own uploads and tabs). */
export function LibraryRoute() {
  const { showId } = useCurrentShow();
  return <LibraryPage key={showId} />;
}

/** Upload, then characters, captures, clips and profiles. */
function LibraryPage() {
  const { showId, show } = useCurrentShow();
  const { can } = usePermissions();
  const { live } = useLiveLibrary(showId);
  const poll = !live;
  const seeCaptures = can('viewCaptures');
  const characters = useCharacters(showId, { poll });
  const captures = useCaptures(showId, { poll, enabled: seeCaptures });
  const clips = useClips(showId, { poll });
  const profiles = useProfiles(showId, { poll });
  const uploads = useUploads(showId);
  const readyCharacters = (characters.data ?? []).filter((c) => c.state === 'ready');

  const tabs: LibraryTab[] = [
    {
      value: 'characters',
      label: 'Characters',
      count: characters.data?.length,
      content: (
        <QueryState query={characters} what="characters">
          {(data) => (
            <CharacterTable
              showId={showId}
              characters={data}
              live={live}
              showProgress={seeCaptures}
            />
          )}
        </QueryState>
      ),
    },
    ...(seeCaptures
      ? [
          {
            value: 'captures',
            label: 'Captures',
            count: captures.data?.length,
            content: (
              <>
                <CaptureCaution />
                <QueryState query={captures} what="captures">
                  {(data) => (
                    <CaptureTable
                      showId={showId}
                      captures={data}
                      characters={characters.data ?? []}
                      live={live}
                    />
                  )}
                </QueryState>
              </>
            ),
          },
        ]
      : []),
    {
      value: 'clips',
      label: 'Clips',
      count: clips.data?.length,
      content: (
        <QueryState query={clips} what="clips">
          {(data) => (
            <ClipTable showId={showId} clips={data} live={live} showProgress={seeCaptures} />
          )}
        </QueryState>
      ),
    },
    {
      value: 'profiles',
      label: 'Tissue profiles',
      count: profiles.data?.length,
      content: (
        <>
          {can('learn') && seeCaptures ? (
            <LearnProfileForm
              showId={showId}
              captures={captures.data ?? []}
              characters={characters.data ?? []}
            />
          ) : null}
          <QueryState query={profiles} what="tissue profiles">
            {(data) => (
              <ProfileTable showId={showId} profiles={data} characters={characters.data ?? []} />
            )}
          </QueryState>
        </>
      ),
    },
  ];

  return (
    <Flex direction="column" gap="5">
      <title>{`Library · ${show?.name ?? 'Show'} · Overshoot`}</title>
      <Flex direction="column" gap="1">
        <Flex justify="between" align="center" gap="3">
          <Heading as="h1" size="7">
            Library
          </Heading>
          <LiveIndicator live={live} />
        </Flex>
        <Text color="gray">
          {show ? `${show.name}: ` : ''}characters, captures, clips and the tissue profiles learned
          from them.
        </Text>
      </Flex>
      {can('upload') ? (
        <UploadPanel
          showId={showId}
          uploads={uploads}
          characters={readyCharacters}
          allowCaptures={seeCaptures}
          live={live}
        />
      ) : null}
      <LibraryTabs tabs={tabs} />
    </Flex>
  );
}
