import { Callout, Card, Flex, Heading, SegmentedControl, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { WarningIcon } from '@/components/ui/icons';
import type { AssetKind, Character } from '../api/library-types';
import type { Uploads } from '../upload/use-uploads';
import { CaptureCaution } from './capture-caution';
import {
  checkCaptureDetails,
  ConsentFields,
  EMPTY_CAPTURE_DETAILS,
  type CaptureDetailErrors,
  type CaptureDetails,
} from './consent-fields';
import { UploadDropZone } from './upload-drop-zone';
import { UploadRow } from './upload-row';

const KIND_HELP: Record<AssetKind, string> = {
  character: 'A rigged, skinned mesh with its skeleton (glTF binary).',
  capture:
    'A performer’s mesh sequence registered to a character, one morph target per frame (glTF binary).',
  clip: 'Skeletal motion for a character: BVH, or a glTF binary with an animation.',
};

/** Props of the upload panel. */
export interface UploadPanelProps {
  showId: string;
  uploads: Uploads;
  /** Ready characters, for registering captures. */
  characters: Character[];
  /** Captures may be uploaded (the role may see them). */
  allowCaptures: boolean;
  live: boolean;
}

/** Choose what you upload, give a capture its consent record, drop files, follow each upload. */
export function UploadPanel({
  showId,
  uploads,
  characters,
  allowCaptures,
  live,
}: UploadPanelProps) {
  const [kind, setKind] = useState<AssetKind>('character');
  const [details, setDetails] = useState<CaptureDetails>(EMPTY_CAPTURE_DETAILS);
  const [errors, setErrors] = useState<CaptureDetailErrors>({});
  const [refused, setRefused] = useState<string[]>([]);

  const onFiles = (files: File[]) => {
    if (kind === 'capture') {
      const problems = checkCaptureDetails(details);
      setErrors(problems);
      if (Object.keys(problems).length > 0) {
        setRefused(['Fill in the consent record before uploading a capture.']);
        return;
      }
    }
    for (const file of files) {
      uploads.add(
        kind === 'capture'
          ? {
              file,
              kind,
              characterId: details.characterId,
              consent: {
                performerCode: details.performerCode.trim(),
                scope: details.scope.trim(),
                expiresOn: details.expiresOn,
              },
            }
          : { file, kind },
      );
    }
  };

  return (
    <Card asChild>
      <section aria-labelledby="upload-heading" data-testid="upload-panel">
        <Flex direction="column" gap="3">
          <Flex justify="between" align="center" gap="3" wrap="wrap">
            <Heading as="h2" size="4" id="upload-heading">
              Upload files
            </Heading>
            <SegmentedControl.Root
              value={kind}
              onValueChange={(v) => {
                setKind(v as AssetKind);
                setRefused([]);
                setErrors({});
              }}
              aria-label="Kind of file to upload"
            >
              <SegmentedControl.Item value="character">Character</SegmentedControl.Item>
              {allowCaptures ? (
                <SegmentedControl.Item value="capture">Capture</SegmentedControl.Item>
              ) : null}
              <SegmentedControl.Item value="clip">Clip</SegmentedControl.Item>
            </SegmentedControl.Root>
          </Flex>
          <Text size="2" color="gray">
            {KIND_HELP[kind]} Each file is checked in the background after it arrives.
          </Text>
          {kind === 'capture' ? (
            <>
              <CaptureCaution />
              <ConsentFields
                value={details}
                onChange={(v) => {
                  setDetails(v);
                  // Re-check only once the user has been told what is missing.
                  if (Object.keys(errors).length > 0) setErrors(checkCaptureDetails(v));
                }}
                characters={characters}
                errors={errors}
              />
            </>
          ) : null}
          <UploadDropZone
            kind={kind}
            onFiles={(files) => {
              setRefused([]);
              onFiles(files);
            }}
            onRejected={(messages) => {
              if (messages.length > 0) setRefused(messages);
            }}
          />
          {refused.length > 0 ? (
            <Callout.Root color="red" size="1" role="alert" data-testid="upload-refused">
              <Callout.Icon>
                <WarningIcon size={16} />
              </Callout.Icon>
              {refused.map((m) => (
                <Callout.Text key={m}>{m}</Callout.Text>
              ))}
            </Callout.Root>
          ) : null}
          {uploads.uploads.length > 0 ? (
            <Flex direction="column" gap="2" role="list" aria-label="Uploads">
              {uploads.uploads.map((u) => (
                <div role="listitem" key={u.key}>
                  <UploadRow
                    upload={u}
                    showId={showId}
                    live={live}
                    onRetry={() => uploads.retry(u.key)}
                    onCancel={() => uploads.cancel(u.key)}
                    onDismiss={() => uploads.dismiss(u.key)}
                  />
                </div>
              ))}
            </Flex>
          ) : null}
        </Flex>
      </section>
    </Card>
  );
}
