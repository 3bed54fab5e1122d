import { Card, DataList, Flex, Select } from '@radix-ui/themes';
import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { FormField } from '@/components/ui/form-field';
import { Mono } from '@/components/ui/mono';
import { useCurrentShow } from '@/features/auth';
import { useCharacters } from '../api/get-characters';
import { useClip } from '../api/get-clip';
import { downloadFile } from '../api/get-file-link';
import type { Character, Clip } from '../api/library-types';
import { AssetStateLabel } from '../components/asset-state-label';
import { clipSeconds } from '../components/clip-table';
import { DetailHeader } from '../components/detail-header';
import { JointsItem } from '../components/joints-item';
import { QueryState } from '../components/query-state';
import { ValidationReportCallout } from '../components/validation-report';
import { AssetPreview } from '../preview/asset-preview';
import { clipContent, clipOnCharacterContent } from '../preview/preview-content';

const STICK = 'stick-figure';

/** Characters whose skeleton shares at least half of the clip's joints by name. */
export function matchingCharacters(clip: Clip, characters: Character[]): Character[] {
  const joints = new Set(clip.joints ?? []);
  if (joints.size === 0) return [];
  return characters.filter((c) => {
    if (c.state !== 'ready' || !c.joints) return false;
    const shared = c.joints.filter((j) => joints.has(j)).length;
    return shared >= joints.size / 2;
  });
}

/** One clip: its figures and its motion, as a stick figure or on a matching character. */
export function ClipRoute() {
  const { showId } = useCurrentShow();
  const id = useParams().clipId ?? '';
  const clip = useClip(showId, id);
  const characters = useCharacters(showId);
  const [shownOn, setShownOn] = useState(STICK);
  return (
    <QueryState query={clip} what="the clip">
      {(c) => {
        const matches = matchingCharacters(c, characters.data ?? []);
        return (
          <Flex direction="column" gap="4">
            <title>{`${c.name} · Library · Overshoot`}</title>
            <DetailHeader
              showId={showId}
              section="Clips"
              tab="clips"
              title={c.name}
              badges={<AssetStateLabel state={c.state} />}
            />
            {c.validationReport ? (
              <ValidationReportCallout report={c.validationReport} fileName={c.name} />
            ) : null}
            {c.state === 'ready' ? (
              <>
                <Flex maxWidth="320px">
                  <FormField
                    label="Show the motion"
                    hint={
                      matches.length ? undefined : 'No character shares this clip’s joint names.'
                    }
                  >
                    {(control) => (
                      <Select.Root value={shownOn} onValueChange={setShownOn}>
                        <Select.Trigger {...control} />
                        <Select.Content>
                          <Select.Item value={STICK}>As a stick figure</Select.Item>
                          {matches.map((m) => (
                            <Select.Item key={m.id} value={m.id}>
                              On {m.name}
                              {m.version ? ` v${m.version}` : ''}
                            </Select.Item>
                          ))}
                        </Select.Content>
                      </Select.Root>
                    )}
                  </FormField>
                </Flex>
                <AssetPreview
                  key={`${c.id}:${shownOn}`}
                  label={`Clip ${c.name}`}
                  load={async (signal) => {
                    const clipBytes = await downloadFile(showId, 'clip', c.id, { signal });
                    if (shownOn === STICK) return clipContent(clipBytes, c.format, c.fps);
                    const characterBytes = await downloadFile(showId, 'character', shownOn, {
                      signal,
                    });
                    return clipOnCharacterContent(clipBytes, c.format, characterBytes, c.fps);
                  }}
                />
              </>
            ) : null}
            <Card>
              <DataList.Root>
                <DataList.Item>
                  <DataList.Label>Format</DataList.Label>
                  <DataList.Value>
                    <Mono>{c.format.toUpperCase()}</Mono>
                  </DataList.Value>
                </DataList.Item>
                <DataList.Item>
                  <DataList.Label>Frames</DataList.Label>
                  <DataList.Value>
                    <Mono>
                      {c.frameCount ?? '—'}
                      {c.fps ? ` at ${c.fps} fps (${clipSeconds(c.frameCount, c.fps)})` : ''}
                    </Mono>
                  </DataList.Value>
                </DataList.Item>
                <JointsItem joints={c.joints} />
              </DataList.Root>
            </Card>
          </Flex>
        );
      }}
    </QueryState>
  );
}
