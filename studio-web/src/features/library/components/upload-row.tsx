import { Badge, Button, Card, Flex, Progress, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { ActivityIcon, CheckIcon, ClockIcon, CrossIcon, WarningIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { StateLabel, type StateLabelProps } from '@/components/ui/state-label';
import { errorSentence } from '../api/field-errors';
import type { UploadPhase, UploadSnapshot } from '../upload/upload-session';
import { formatBytes } from './format-bytes';
import { UploadCheck } from './upload-check';

const PHASES: Record<
  UploadPhase,
  { word: string; icon: ReactNode; color: StateLabelProps['color'] }
> = {
  hashing: { word: 'Fingerprinting the file', icon: <ClockIcon />, color: 'gray' },
  starting: { word: 'Opening the upload', icon: <ClockIcon />, color: 'gray' },
  uploading: { word: 'Uploading', icon: <ActivityIcon />, color: 'amber' },
  completing: { word: 'Joining the parts', icon: <ActivityIcon />, color: 'amber' },
  uploaded: { word: 'Uploaded', icon: <CheckIcon />, color: 'jade' },
  failed: { word: 'Upload stopped', icon: <WarningIcon />, color: 'red' },
  canceling: { word: 'Canceling', icon: <ClockIcon />, color: 'gray' },
  canceled: { word: 'Canceled', icon: <CrossIcon />, color: 'gray' },
};

const KIND_WORDS = { character: 'Character', capture: 'Capture', clip: 'Clip' } as const;

/** Props of one upload's row. */
export interface UploadRowProps {
  upload: UploadSnapshot;
  showId: string;
  live: boolean;
  onRetry: () => void;
  onCancel: () => void;
  onDismiss: () => void;
}

/** One file's upload: phase in words, bytes sent, failed parts, retry, cancel, then its check. */
export function UploadRow({ upload, showId, live, onRetry, onCancel, onDismiss }: UploadRowProps) {
  const { phase, size, sentBytes, failedParts, asset } = upload;
  const look = PHASES[phase];
  const percent = size > 0 ? Math.min(100, Math.round((100 * sentBytes) / size)) : 0;
  const active = phase !== 'uploaded' && phase !== 'failed' && phase !== 'canceled';
  const finished = phase === 'uploaded' || phase === 'canceled';
  return (
    <Card data-testid="upload-row" data-phase={phase} data-file={upload.fileName}>
      <Flex direction="column" gap="2">
        <Flex justify="between" align="center" gap="3" wrap="wrap">
          <Flex align="center" gap="2" minWidth="0">
            <Badge variant="outline" color="gray">
              {KIND_WORDS[upload.kind]}
            </Badge>
            <Mono size="2" truncate>
              {upload.fileName}
            </Mono>
            <Mono size="1" color="gray">
              {formatBytes(size)}
            </Mono>
          </Flex>
          <Flex align="center" gap="2">
            <StateLabel icon={look.icon} color={look.color}>
              {look.word}
            </StateLabel>
            {phase === 'failed' ? (
              <Button size="1" onClick={onRetry}>
                {failedParts.length > 0 ? 'Retry failed parts' : 'Retry'}
              </Button>
            ) : null}
            {active || phase === 'failed' ? (
              <Button
                size="1"
                variant="soft"
                color="gray"
                onClick={onCancel}
                disabled={phase === 'canceling'}
              >
                Cancel upload
              </Button>
            ) : null}
            {finished ? (
              <Button
                size="1"
                variant="ghost"
                color="gray"
                onClick={onDismiss}
                aria-label={`Dismiss ${upload.fileName}`}
              >
                Dismiss
              </Button>
            ) : null}
          </Flex>
        </Flex>
        {phase !== 'uploaded' && phase !== 'canceled' ? (
          <>
            <Progress value={percent} max={100} aria-label={`Upload of ${upload.fileName}`} />
            <Flex justify="between" gap="3">
              <Text size="1" color="gray">
                <Mono size="1">{formatBytes(sentBytes)}</Mono> sent
                {upload.parts.length > 1 ? (
                  <>
                    {' '}
                    in <Mono size="1">{upload.parts.length}</Mono> parts
                  </>
                ) : null}
              </Text>
              <Mono size="1">{percent} %</Mono>
            </Flex>
          </>
        ) : null}
        {phase === 'failed' ? (
          <Text as="p" size="2" color="red" role="alert" data-testid="upload-error">
            {failedParts.length > 0
              ? `Part${failedParts.length > 1 ? 's' : ''} ${failedParts.join(', ')} could not be sent. `
              : ''}
            {upload.error ? errorSentence(upload.error) : ''}
          </Text>
        ) : null}
        {phase === 'uploaded' && asset ? (
          <UploadCheck showId={showId} assetId={asset.id} fileName={upload.fileName} live={live} />
        ) : null}
      </Flex>
    </Card>
  );
}
