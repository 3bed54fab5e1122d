import { Flex, Heading, Spinner, Table, Text } from '@radix-ui/themes';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { Mono } from '@/components/ui/mono';
import { ROLE_LABELS } from '@/features/auth';
import { useInvitations } from '../api/get-invitations';
import { InviteForm } from './invite-form';

/** Send invitations and see the ones not yet accepted. */
export function InvitationsScreen() {
  const invitations = useInvitations();
  return (
    <Flex direction="column" gap="5">
      <title>Invitations · Admin · Overshoot</title>
      <InviteForm />
      <Flex direction="column" gap="3">
        <Heading as="h2" size="5">
          Open invitations
        </Heading>
        {invitations.isPending ? <Spinner /> : null}
        {invitations.isError ? <ApiErrorCallout error={invitations.error} /> : null}
        {invitations.data?.length === 0 ? (
          <Text color="gray">No invitation is waiting to be accepted.</Text>
        ) : null}
        {invitations.data?.length ? (
          <Table.Root variant="surface" data-testid="invitations-table">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>E-mail</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Role</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Shows</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Link works until</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {invitations.data.map((inv) => (
                <Table.Row key={inv.id}>
                  <Table.RowHeaderCell>{inv.email}</Table.RowHeaderCell>
                  <Table.Cell>{ROLE_LABELS[inv.role]}</Table.Cell>
                  <Table.Cell>
                    {inv.shows.length ? (
                      <Mono size="2">{inv.shows.map((s) => s.code).join(', ')}</Mono>
                    ) : (
                      <Text color="gray">None</Text>
                    )}
                  </Table.Cell>
                  <Table.Cell>
                    <Mono size="2">{inv.expiresAt.slice(0, 16).replace('T', ' ')}</Mono> UTC
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
        ) : null}
      </Flex>
    </Flex>
  );
}
