import { Flex, Link as RadixLink, Table, Text } from '@radix-ui/themes';
import { Fragment } from 'react';
import { Link } from 'react-router-dom';
import { WarningIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { StateLabel } from '@/components/ui/state-label';
import { paths } from '@/config/paths';
import type { Capture, Character } from '../api/library-types';
import { FileStateCell, ReportRow } from './file-state-cell';

/** Props of the capture table. */
export interface CaptureTableProps {
  showId: string;
  captures: Capture[];
  characters: Character[];
  live: boolean;
}

/** The consent expiry date, flagged in words once it has passed. */
export function ConsentExpiry({ expiresOn, expired }: { expiresOn: string; expired: boolean }) {
  return (
    <Flex direction="column" gap="1" align="start">
      <Mono size="2">{expiresOn}</Mono>
      {expired ? (
        <StateLabel icon={<WarningIcon />} color="red">
          Consent expired
        </StateLabel>
      ) : null}
    </Flex>
  );
}

/** The show's captures: performer code, character, state, frames, consent scope and expiry. */
export function CaptureTable({ showId, captures, characters, live }: CaptureTableProps) {
  if (captures.length === 0) return <Text color="gray">No captures yet.</Text>;
  const characterName = (id: string) =>
    characters.find((c) => c.id === id)?.name ?? 'unknown character';
  return (
    <Table.Root variant="surface" aria-label="Captures" data-testid="capture-table">
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Performer</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Character</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>State</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Frames</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Consent scope</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Consent until</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {captures.map((c) => (
          <Fragment key={c.id}>
            <Table.Row data-testid="capture-row" data-state={c.state}>
              <Table.RowHeaderCell>
                {c.state === 'ready' ? (
                  <RadixLink asChild>
                    <Link to={paths.capture.getHref(showId, c.id)}>
                      <Mono>{c.consent.performerCode}</Mono>
                    </Link>
                  </RadixLink>
                ) : (
                  <Mono>{c.consent.performerCode}</Mono>
                )}
              </Table.RowHeaderCell>
              <Table.Cell>{characterName(c.characterId)}</Table.Cell>
              <FileStateCell item={c} showId={showId} live={live} showProgress />
              <Table.Cell justify="end">
                <Mono size="2">
                  {c.frameCount ?? '—'}
                  {c.fps ? ` @ ${c.fps} fps` : ''}
                </Mono>
              </Table.Cell>
              <Table.Cell>
                <Text size="1">{c.consent.scope}</Text>
              </Table.Cell>
              <Table.Cell>
                <ConsentExpiry expiresOn={c.consent.expiresOn} expired={c.consent.expired} />
              </Table.Cell>
            </Table.Row>
            <ReportRow item={c} columns={6} name={`Capture ${c.consent.performerCode}`} />
          </Fragment>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
