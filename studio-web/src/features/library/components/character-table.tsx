import { Link as RadixLink, Table, Text } from '@radix-ui/themes';
import { Fragment } from 'react';
import { Link } from 'react-router-dom';
import { Mono } from '@/components/ui/mono';
import { paths } from '@/config/paths';
import type { Character } from '../api/library-types';
import { FileStateCell, ReportRow } from './file-state-cell';
import { formatDay } from './format-date';

/** Props of the character table. */
export interface CharacterTableProps {
  showId: string;
  characters: Character[];
  live: boolean;
  showProgress: boolean;
}

/** The show's characters: name and version, state, mesh and rig sizes, when added. */
export function CharacterTable({ showId, characters, live, showProgress }: CharacterTableProps) {
  if (characters.length === 0) {
    return <Text color="gray">No characters yet.</Text>;
  }
  return (
    <Table.Root variant="surface" aria-label="Characters" data-testid="character-table">
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>State</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Vertices</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Joints</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Regions</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Added</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {characters.map((c) => (
          <Fragment key={c.id}>
            <Table.Row data-testid="character-row" data-name={c.name} data-state={c.state}>
              <Table.RowHeaderCell>
                {c.state === 'ready' ? (
                  <RadixLink asChild>
                    <Link to={paths.character.getHref(showId, c.id)}>{c.name}</Link>
                  </RadixLink>
                ) : (
                  c.name
                )}
                {c.version ? (
                  <Mono size="1" color="gray">
                    {' '}
                    v{c.version}
                  </Mono>
                ) : null}
              </Table.RowHeaderCell>
              <FileStateCell item={c} showId={showId} live={live} showProgress={showProgress} />
              <Table.Cell justify="end">
                <Mono size="2">{c.vertexCount?.toLocaleString() ?? '—'}</Mono>
              </Table.Cell>
              <Table.Cell justify="end">
                <Mono size="2">{c.joints?.length ?? '—'}</Mono>
              </Table.Cell>
              <Table.Cell>
                <Text size="1" color="gray">
                  {c.regions?.join(', ') || '—'}
                </Text>
              </Table.Cell>
              <Table.Cell>{formatDay(c.createdAt)}</Table.Cell>
            </Table.Row>
            <ReportRow item={c} columns={6} name={c.name} />
          </Fragment>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
