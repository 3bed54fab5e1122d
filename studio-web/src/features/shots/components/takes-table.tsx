import { Link as RadixLink, Table, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import { formatDay } from '@/features/library/components/format-date';
import type { Take } from '../api/shot-types';
import { ReviewStateLabel } from '@/components/ui/shot-state-labels';

/** A shot's takes, newest first, each opening in the take player. */
export function TakesTable({ showId, takes }: { showId: string; takes: Take[] }) {
  if (takes.length === 0)
    return <Text color="gray">No takes yet: a solved retarget job makes one.</Text>;
  return (
    <Table.Root variant="surface" aria-label="Takes" data-testid="takes-table">
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Take</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Review</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Made</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {takes.map((t) => (
          <Table.Row key={t.id} data-testid="take-row">
            <Table.RowHeaderCell>
              <RadixLink asChild>
                <Link to={paths.take.getHref(showId, t.id)}>
                  <Mono>v{t.version}</Mono> · open in the player
                </Link>
              </RadixLink>
            </Table.RowHeaderCell>
            <Table.Cell>
              <ReviewStateLabel state={t.reviewState} />
            </Table.Cell>
            <Table.Cell>{formatDay(t.createdAt)}</Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
