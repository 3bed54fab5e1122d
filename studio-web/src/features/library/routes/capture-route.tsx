import { Card, DataList, Flex, Link as RadixLink } from '@radix-ui/themes';
import { Link, useParams } from 'react-router-dom';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { useCurrentShow } from '@/features/auth';
import { useCapture } from '../api/get-capture';
import { useCharacter } from '../api/get-character';
import { downloadFile } from '../api/get-file-link';
import { AssetStateLabel } from '../components/asset-state-label';
import { CaptureCaution } from '../components/capture-caution';
import { ConsentExpiry } from '../components/capture-table';
import { DetailHeader } from '../components/detail-header';
import { QueryState } from '../components/query-state';
import { ValidationReportCallout } from '../components/validation-report';
import { AssetPreview } from '../preview/asset-preview';
import { captureContent } from '../preview/preview-content';

/** One capture: its consent record, the caution, and its frames played in 3D. */
export function CaptureRoute() {
  const { showId } = useCurrentShow();
  const id = useParams().captureId ?? '';
  const capture = useCapture(showId, id);
  const character = useCharacter(showId, capture.data?.characterId);
  return (
    <QueryState query={capture} what="the capture">
      {(c) => (
        <Flex direction="column" gap="4">
          <title>{`Capture ${c.consent.performerCode} · Library · Overshoot`}</title>
          <DetailHeader
            showId={showId}
            section="Captures"
            tab="captures"
            title={
              <>
                Capture <Mono>{c.consent.performerCode}</Mono>
              </>
            }
            badges={<AssetStateLabel state={c.state} />}
          />
          <CaptureCaution />
          {c.validationReport ? <ValidationReportCallout report={c.validationReport} /> : null}
          {c.state === 'ready' && !c.deleted ? (
            <AssetPreview
              key={c.id}
              label={`Capture ${c.consent.performerCode}`}
              load={async (signal) =>
                captureContent(await downloadFile(showId, 'capture', c.id, { signal }), c.fps)
              }
            />
          ) : null}
          <Card>
            <DataList.Root>
              <DataList.Item>
                <DataList.Label>Registered to</DataList.Label>
                <DataList.Value>
                  <RadixLink asChild>
                    <Link to={paths.character.getHref(showId, c.characterId)}>
                      {character.data?.name ?? 'the character'}
                    </Link>
                  </RadixLink>
                </DataList.Value>
              </DataList.Item>
              <DataList.Item>
                <DataList.Label>Frames</DataList.Label>
                <DataList.Value>
                  <Mono>
                    {c.frameCount ?? '—'}
                    {c.fps ? ` at ${c.fps} fps` : ''}
                  </Mono>
                </DataList.Value>
              </DataList.Item>
              <DataList.Item>
                <DataList.Label>Performer reference</DataList.Label>
                <DataList.Value>
                  <Mono>{c.consent.performerCode}</Mono>
                </DataList.Value>
              </DataList.Item>
              <DataList.Item>
                <DataList.Label>Consent scope</DataList.Label>
                <DataList.Value>{c.consent.scope}</DataList.Value>
              </DataList.Item>
              <DataList.Item>
                <DataList.Label>Consent until</DataList.Label>
                <DataList.Value>
                  <ConsentExpiry expiresOn={c.consent.expiresOn} expired={c.consent.expired} />
                </DataList.Value>
              </DataList.Item>
              {c.deleted ? (
                <DataList.Item>
                  <DataList.Label>Deleted</DataList.Label>
                  <DataList.Value>{c.deleted.reason}</DataList.Value>
                </DataList.Item>
              ) : null}
            </DataList.Root>
          </Card>
        </Flex>
      )}
    </QueryState>
  );
}
