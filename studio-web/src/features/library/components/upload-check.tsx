import { Flex } from '@radix-ui/themes';
import { useAsset } from '../api/get-asset';
import { AssetStateLabel } from './asset-state-label';
import { IngestProgress } from './ingest-progress';
import { ValidationReportCallout } from './validation-report';

/** Props of an uploaded file's check. */
export interface UploadCheckProps {
  showId: string;
  assetId: string;
  fileName: string;
  live: boolean;
}

/** After the upload: the background check's progress, then ready or the report in words. */
export function UploadCheck({ showId, assetId, fileName, live }: UploadCheckProps) {
  const asset = useAsset(showId, assetId, { poll: !live });
  const state = asset.data?.state ?? 'pending';
  return (
    <Flex direction="column" gap="2" data-testid="upload-check" data-state={state}>
      <Flex align="center" gap="3" wrap="wrap">
        <AssetStateLabel state={state} />
        {state === 'pending' ? (
          <IngestProgress showId={showId} assetId={assetId} live={live} />
        ) : null}
      </Flex>
      {state === 'rejected' && asset.data?.validationReport ? (
        <ValidationReportCallout report={asset.data.validationReport} fileName={fileName} />
      ) : null}
    </Flex>
  );
}
