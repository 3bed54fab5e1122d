import { Card, Flex, Heading, Spinner, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { CheckIcon, StopIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { StateLabel } from '@/components/ui/state-label';
import { useTokens } from '../api/get-tokens';
import { TOKEN_SCOPE_WORDS, type CreatedToken } from '../api/pipeline-token';
import { useRevokeToken } from '../api/revoke-token';
import { ConfirmButton } from './confirm-button';
import { NewTokenForm } from './new-token-form';
import { TokenSecret } from './token-secret';

const day = (iso: string | null) => (iso ? iso.slice(0, 16).replace('T', ' ') : 'Never');

/** A show's pipeline tokens: create (secret shown once), list, revoke. */
export function TokensPanel({ showId }: { showId: string }) {
  const tokens = useTokens(showId);
  const revoke = useRevokeToken();
  // Kept in this component only: leaving the page drops the secret for good.
  const [created, setCreated] = useState<CreatedToken | null>(null);

  return (
    <Card size="3">
      <Flex direction="column" gap="4">
        <Flex direction="column" gap="1">
          <Heading as="h3" size="4">
            Pipeline tokens
          </Heading>
          <Text size="2" color="gray">
            Machine access to this show only, e.g. for the render farm to report render state.
          </Text>
        </Flex>
        {created ? (
          <TokenSecret token={created} onDone={() => setCreated(null)} />
        ) : (
          <NewTokenForm showId={showId} onCreated={setCreated} />
        )}
        {revoke.isError ? <ApiErrorCallout error={revoke.error} /> : null}
        {tokens.isPending ? <Spinner /> : null}
        {tokens.isError ? <ApiErrorCallout error={tokens.error} /> : null}
        {tokens.data?.length === 0 ? <Text color="gray">This show has no token.</Text> : null}
        {tokens.data?.length ? (
          <Table.Root size="1" data-testid="tokens-table">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>May</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Starts with</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Last used (UTC)</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>State</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>
                  <span className="visually-hidden">Actions</span>
                </Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {tokens.data.map((t) => (
                <Table.Row key={t.id} align="center" data-testid="token-row" data-name={t.name}>
                  <Table.RowHeaderCell>{t.name}</Table.RowHeaderCell>
                  <Table.Cell>{t.scopes.map((s) => TOKEN_SCOPE_WORDS[s]).join(', ')}</Table.Cell>
                  <Table.Cell>
                    <Mono size="2">{t.hint}…</Mono>
                  </Table.Cell>
                  <Table.Cell>
                    <Mono size="2">{day(t.lastUsedAt)}</Mono>
                  </Table.Cell>
                  <Table.Cell>
                    {t.revokedAt ? (
                      <StateLabel icon={<StopIcon />} color="gray">
                        Revoked
                      </StateLabel>
                    ) : (
                      <StateLabel icon={<CheckIcon />} color="green">
                        Active
                      </StateLabel>
                    )}
                  </Table.Cell>
                  <Table.Cell justify="end">
                    {t.revokedAt ? null : (
                      <ConfirmButton
                        label="Revoke"
                        ariaLabel={`Revoke ${t.name}`}
                        title={`Revoke “${t.name}”?`}
                        description="Every request with it fails from now on. This cannot be undone; create a new token instead."
                        confirm="Revoke the token"
                        onConfirm={() => revoke.mutate({ showId, tokenId: t.id })}
                      />
                    )}
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
