import { Flex, Heading, Select, Spinner, Table, Text } from '@radix-ui/themes';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { Mono } from '@/components/ui/mono';
import { ROLE_LABELS, ROLES, useSession, type Role } from '@/features/auth';
import { useAdminShows } from '../api/get-admin-shows';
import { useUsers } from '../api/get-users';
import { useUpdateUser } from '../api/update-user';
import { AccountStateLabel } from './account-state-label';
import { ConfirmButton } from './confirm-button';

/** Every user: change a role, disable or enable an account. */
export function UsersScreen() {
  const users = useUsers();
  const shows = useAdminShows();
  const update = useUpdateUser();
  const { user: me } = useSession();
  const showCode = (id: string) => shows.data?.find((s) => s.id === id)?.code ?? '…';

  return (
    <Flex direction="column" gap="3">
      <title>Users · Admin · Overshoot</title>
      <Heading as="h2" size="5">
        Users
      </Heading>
      <Text size="2" color="gray">
        Disabling an account ends its sessions at once. New people join by invitation.
      </Text>
      {update.isError ? <ApiErrorCallout error={update.error} /> : null}
      {users.isPending ? <Spinner /> : null}
      {users.isError ? <ApiErrorCallout error={users.error} /> : null}
      {users.data ? (
        <Table.Root variant="surface" size="2" data-testid="users-table">
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Role</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Shows</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Account</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>
                <span className="visually-hidden">Actions</span>
              </Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {users.data.map((user) => {
              const self = user.id === me.id;
              return (
                <Table.Row
                  key={user.id}
                  align="center"
                  data-testid="user-row"
                  data-email={user.email}
                >
                  <Table.RowHeaderCell>
                    <Flex direction="column">
                      <Text weight="medium">
                        {user.displayName}
                        {self ? (
                          <Text color="gray" weight="regular">
                            {' '}
                            (you)
                          </Text>
                        ) : null}
                      </Text>
                      <Text size="1" color="gray">
                        {user.email}
                      </Text>
                    </Flex>
                  </Table.RowHeaderCell>
                  <Table.Cell>
                    <Select.Root
                      value={user.role}
                      disabled={self || update.isPending}
                      onValueChange={(role) =>
                        update.mutate({ userId: user.id, role: role as Role })
                      }
                    >
                      <Select.Trigger aria-label={`Role of ${user.displayName}`} />
                      <Select.Content position="popper">
                        {ROLES.map((r) => (
                          <Select.Item key={r} value={r}>
                            {ROLE_LABELS[r]}
                          </Select.Item>
                        ))}
                      </Select.Content>
                    </Select.Root>
                  </Table.Cell>
                  <Table.Cell>
                    {user.role === 'admin' ? (
                      <Text color="gray">Every show</Text>
                    ) : user.showIds.length ? (
                      <Mono size="2">{user.showIds.map(showCode).join(', ')}</Mono>
                    ) : (
                      <Text color="gray">None</Text>
                    )}
                  </Table.Cell>
                  <Table.Cell>
                    <AccountStateLabel disabled={user.disabled} />
                  </Table.Cell>
                  <Table.Cell justify="end">
                    {user.disabled ? (
                      <ConfirmButton
                        label="Enable"
                        ariaLabel={`Enable ${user.displayName}`}
                        color="gray"
                        title={`Enable ${user.displayName}?`}
                        description="They can sign in again with their password."
                        confirm="Enable the account"
                        onConfirm={() => update.mutate({ userId: user.id, disabled: false })}
                      />
                    ) : (
                      <ConfirmButton
                        label="Disable"
                        ariaLabel={`Disable ${user.displayName}`}
                        disabled={self}
                        title={`Disable ${user.displayName}?`}
                        description="Their sessions end now and they cannot sign in until enabled again. Their work stays."
                        confirm="Disable the account"
                        onConfirm={() => update.mutate({ userId: user.id, disabled: true })}
                      />
                    )}
                  </Table.Cell>
                </Table.Row>
              );
            })}
          </Table.Body>
        </Table.Root>
      ) : null}
    </Flex>
  );
}
