import { Flex, Progress, Text } from '@radix-ui/themes';
import { Mono } from '@/components/ui/mono';
import { useAsset } from '../api/get-asset';

const STAGE_WORDS: Record<string, string> = {
  uploading: 'Waiting for the file to arrive',
  queued: 'Waiting for a worker to check it',
  downloading: 'Reading the file',
  validating: 'Checking the contents',
  ready: 'Checked',
  rejected: 'Checked: not accepted',
};

/** A check stage in words ("Reading the file"); unknown stages pass through as they are. */
export function stageWords(stage: string | undefined): string {
  if (!stage) return 'Waiting to start';
  return STAGE_WORDS[stage] ?? stage;
}

/** Props of the ingest progress line. */
export interface IngestProgressProps {
  showId: string;
  assetId: string;
  /** The live event stream is open (no need to poll). */
  live: boolean;
}

/** How far the background check of an uploaded file has got: stage in words and a bar. */
export function IngestProgress({ showId, assetId, live }: IngestProgressProps) {
  const asset = useAsset(showId, assetId, { poll: !live });
  const percent = Math.round(asset.data?.progress?.percent ?? 0);
  const stage = asset.data?.progress?.stage;
  return (
    <Flex
      direction="column"
      gap="1"
      minWidth="180px"
      data-testid="ingest-progress"
      data-stage={stage ?? ''}
    >
      <Progress value={percent} max={100} size="1" aria-label="Check progress" />
      <Flex justify="between" gap="2">
        <Text size="1" color="gray">
          {stageWords(stage)}
        </Text>
        <Mono size="1">{percent} %</Mono>
      </Flex>
    </Flex>
  );
}
