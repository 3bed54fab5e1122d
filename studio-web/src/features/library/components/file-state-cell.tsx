import { Flex, Table } from '@radix-ui/themes';
import type { FileState } from '../api/library-types';
import { AssetStateLabel } from './asset-state-label';
import { IngestProgress } from './ingest-progress';
import { ValidationReportCallout } from './validation-report';

/** Props of a file's state cell. */
export interface FileStateCellProps {
  item: FileState;
  showId: string;
  live: boolean;
  /** The role may read upload progress (the upload list). */
  showProgress: boolean;
}

/** A library item's state in words, with the check's progress while it runs. */
export function FileStateCell({ item, showId, live, showProgress }: FileStateCellProps) {
  return (
    <Table.Cell>
      <Flex direction="column" gap="1" align="start">
        <AssetStateLabel state={item.state} />
        {item.state === 'pending' && showProgress ? (
          <IngestProgress showId={showId} assetId={item.assetId} live={live} />
        ) : null}
      </Flex>
    </Table.Cell>
  );
}

/** The row under a refused item that says what was wrong with its file and where. */
export function ReportRow({
  item,
  columns,
  name,
}: {
  item: FileState;
  columns: number;
  name: string;
}) {
  if (item.state !== 'rejected' || !item.validationReport) return null;
  return (
    <Table.Row className="row-report">
      <Table.Cell colSpan={columns}>
        <ValidationReportCallout report={item.validationReport} fileName={name} />
      </Table.Cell>
    </Table.Row>
  );
}
