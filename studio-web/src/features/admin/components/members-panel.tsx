import { Button, Card, Flex, Heading, Select, Spinner, Table, Text } from '@radix-ui/themes';
import { useId, useState } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { Mono } from '@/components/ui/mono';
import { ROLE_LABELS } from '@/features/auth';
import { useShowMembers } from '@/features/shows';
import { useAddMember } from '../api/add-member';
import { useUsers } from '../api/get-users';
import { useRemoveMember } from '../api/remove-member';
import { AccountStateLabel } from './account-state-label';
import { ConfirmButton } from './confirm-button';

/** Who belongs to a show: add people, take them off. */
export function MembersPanel({ showId, showCode }: { showId: string; showCode: string }) {
  const members = useShowMembers(showId);
  const users = useUsers();
  const add = useAddMember();
  const remove = useRemoveMember();
  const [userId, setUserId] = useState('');
  const pickLabel = useId();

  const memberIds = new Set((members.data ?? []).map((m) => m.userId));
  // Admins see every show already; offer the people who would gain something.
  const candidates = (users.data ?? []).filter(
    (u) => !memberIds.has(u.id) && u.role !== 'admin' && !u.disabled,
  );

  return (
    <Card size="3">
      <Flex direction="column" gap="4">
        <Heading as="h3" size="4">
          Members
        </Heading>
        <Flex gap="3" align="end" wrap="wrap">
          <Flex direction="column" gap="1">
            <Text id={pickLabel} size="2" weight="medium">
              Add a person
            </Text>
            <Select.Root value={userId} onValueChange={setUserId} disabled={!candidates.length}>
              <Select.Trigger
                aria-labelledby={pickLabel}
                placeholder={candidates.length ? 'Choose a person' : 'Everyone is a member'}
                style={{ width: 280 }}
              />
              <Select.Content position="popper">
                {candidates.map((u) => (
                  <Select.Item key={u.id} value={u.id}>
                    {u.displayName} · {ROLE_LABELS[u.role]}
                  </Select.Item>
                ))}
              </Select.Content>
            </Select.Root>
          </Flex>
          <Button
            variant="soft"
            disabled={!userId}
            loading={add.isPending}
            onClick={() => add.mutate({ showId, userId }, { onSuccess: () => setUserId('') })}
          >
            Add to {showCode}
          </Button>
        </Flex>
        {add.isError ? <ApiErrorCallout error={add.error} /> : null}
        {remove.isError ? <ApiErrorCallout error={remove.error} /> : null}
        {members.isPending ? <Spinner /> : null}
        {members.isError ? <ApiErrorCallout error={members.error} /> : null}
        {members.data?.length === 0 ? (
          <Text color="gray">Nobody belongs to this show yet.</Text>
        ) : null}
        {members.data?.length ? (
          <Table.Root size="1" data-testid="members-table">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Role</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Account</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Member since</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>
                  <span className="visually-hidden">Actions</span>
                </Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {members.data.map((m) => (
                <Table.Row key={m.userId} align="center">
                  <Table.RowHeaderCell>
                    <Flex direction="column">
                      <Text weight="medium">{m.displayName}</Text>
                      <Text size="1" color="gray">
                        {m.email}
                      </Text>
                    </Flex>
                  </Table.RowHeaderCell>
                  <Table.Cell>{ROLE_LABELS[m.role]}</Table.Cell>
                  <Table.Cell>
                    <AccountStateLabel disabled={m.disabled} />
                  </Table.Cell>
                  <Table.Cell>
                    <Mono size="2">{m.since.slice(0, 10)}</Mono>
                  </Table.Cell>
                  <Table.Cell justify="end">
                    <ConfirmButton
                      label="Remove"
                      ariaLabel={`Remove ${m.displayName} from ${showCode}`}
                      title={`Remove ${m.displayName} from ${showCode}?`}
                      description="They stop seeing the show. Their shots and notes stay."
                      confirm="Remove"
                      loading={remove.isPending && remove.variables?.userId === m.userId}
                      onConfirm={() => remove.mutate({ showId, userId: m.userId })}
                    />
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
        ) : null}
      </Flex>
    </Card>
  );
}
