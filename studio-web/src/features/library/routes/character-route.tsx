import { Card, DataList, Flex } from '@radix-ui/themes';
import { useParams } from 'react-router-dom';
import { useCurrentShow } from '@/features/auth';
import { Mono } from '@/components/ui/mono';
import { useCharacter } from '../api/get-character';
import { downloadFile } from '../api/get-file-link';
import { AssetStateLabel } from '../components/asset-state-label';
import { DetailHeader } from '../components/detail-header';
import { JointsItem } from '../components/joints-item';
import { QueryState } from '../components/query-state';
import { ValidationReportCallout } from '../components/validation-report';
import { AssetPreview } from '../preview/asset-preview';
import { characterContent } from '../preview/preview-content';

/** One character: its rig and mesh figures and a 3D preview. */
export function CharacterRoute() {
  const { showId } = useCurrentShow();
  const id = useParams().characterId ?? '';
  const character = useCharacter(showId, id);
  return (
    <QueryState query={character} what="the character">
      {(c) => (
        <Flex direction="column" gap="4">
          <title>{`${c.name} · Library · Overshoot`}</title>
          <DetailHeader
            showId={showId}
            section="Characters"
            tab="characters"
            title={
              <>
                {c.name}
                {c.version ? <Mono color="gray"> v{c.version}</Mono> : null}
              </>
            }
            badges={<AssetStateLabel state={c.state} />}
          />
          {c.validationReport ? (
            <ValidationReportCallout report={c.validationReport} fileName={c.name} />
          ) : null}
          {c.state === 'ready' ? (
            <AssetPreview
              key={c.id}
              label={`Character ${c.name}`}
              load={async (signal) =>
                characterContent(await downloadFile(showId, 'character', c.id, { signal }))
              }
            />
          ) : null}
          <Card>
            <DataList.Root>
              <DataList.Item>
                <DataList.Label>Vertices</DataList.Label>
                <DataList.Value>
                  <Mono>{c.vertexCount?.toLocaleString() ?? '—'}</Mono>
                </DataList.Value>
              </DataList.Item>
              <DataList.Item>
                <DataList.Label>Triangles</DataList.Label>
                <DataList.Value>
                  <Mono>{c.triangleCount?.toLocaleString() ?? '—'}</Mono>
                </DataList.Value>
              </DataList.Item>
              <DataList.Item>
                <DataList.Label>Regions</DataList.Label>
                <DataList.Value>{c.regions?.join(', ') || '—'}</DataList.Value>
              </DataList.Item>
              <JointsItem joints={c.joints} />
            </DataList.Root>
          </Card>
        </Flex>
      )}
    </QueryState>
  );
}
