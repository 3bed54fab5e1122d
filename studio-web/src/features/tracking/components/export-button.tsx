import { Button, Flex } from '@radix-ui/themes';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { todayUtc } from '@/lib/dates';
import { saveFile } from '@/lib/save-file';
import { useExportShots } from '../api/export-shots';
import type { ShotFilters } from '../api/shot-filters';

/** Props of the CSV export. */
export interface ExportButtonProps {
  showId: string;
  /** Shown in the file name. */
  showCode: string | undefined;
  filters: ShotFilters;
}

/** Downloads every shot matching the table's filters (all pages) as a CSV file. */
export function ExportButton({ showId, showCode, filters }: ExportButtonProps) {
  const exporter = useExportShots();
  const download = () =>
    exporter.mutate(
      { showId, filters },
      {
        onSuccess: ({ blob }) => {
          const name = `${showCode ?? 'show'}-shots${filters.late ? '-late' : ''}-${todayUtc()}.csv`;
          saveFile(blob, name);
        },
      },
    );
  return (
    <Flex direction="column" gap="2" align="end">
      <Button onClick={download} loading={exporter.isPending} data-testid="export-csv">
        Export CSV
      </Button>
      {exporter.isError ? <ApiErrorCallout error={exporter.error} /> : null}
    </Flex>
  );
}
