import { Flex, Link as RadixLink, Table, Text } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { WarningIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { StateLabel } from '@/components/ui/state-label';
import { paths } from '@/config/paths';
import type { Character } from '../api/library-types';
import type { Profile } from '../api/profile-types';
import { formatDay } from './format-date';
import { ProfileStateLabel } from './profile-state-label';

/** Props of the profile table. */
export interface ProfileTableProps {
  showId: string;
  profiles: Profile[];
  characters: Character[];
}

/** The show's tissue profiles: name, state, modes, character, when learned. */
export function ProfileTable({ showId, profiles, characters }: ProfileTableProps) {
  if (profiles.length === 0) return <Text color="gray">No tissue profiles yet.</Text>;
  const characterName = (id: string) =>
    characters.find((c) => c.id === id)?.name ?? 'unknown character';
  return (
    <Table.Root variant="surface" aria-label="Tissue profiles" data-testid="profile-table">
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>State</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Modes</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Character</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Created</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {profiles.map((p) => (
          <Table.Row key={p.id} data-testid="profile-row" data-name={p.name} data-state={p.state}>
            <Table.RowHeaderCell>
              <Flex direction="column" gap="1" align="start">
                <RadixLink asChild>
                  <Link to={paths.profile.getHref(showId, p.id)}>{p.name}</Link>
                </RadixLink>
                {p.captureDeleted ? (
                  <StateLabel icon={<WarningIcon />} color="orange">
                    Learned from a deleted capture
                  </StateLabel>
                ) : null}
              </Flex>
            </Table.RowHeaderCell>
            <Table.Cell>
              <ProfileStateLabel state={p.state} />
            </Table.Cell>
            <Table.Cell justify="end">
              <Mono size="2">{p.modes?.length ?? '—'}</Mono>
            </Table.Cell>
            <Table.Cell>{characterName(p.characterId)}</Table.Cell>
            <Table.Cell>{formatDay(p.createdAt)}</Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
