import { Card, Flex, Heading, Spinner, Text } from '@radix-ui/themes';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { Mono } from '@/components/ui/mono';
import { OUTBOX_REFRESH_MS, useOutbox } from '../api/get-outbox';

/** The e-mails the local mail sink received, newest first (development only). */
export function OutboxScreen() {
  const outbox = useOutbox();
  return (
    <Flex direction="column" gap="3">
      <title>Outbox · Admin · Overshoot</title>
      <Heading as="h2" size="5">
        Outbox
      </Heading>
      <Text size="2" color="gray">
        In development, e-mail goes to a local mail sink instead of people: here is what it
        received, newest first. This page asks again every {OUTBOX_REFRESH_MS / 1000} seconds.
      </Text>
      {outbox.isPending ? <Spinner /> : null}
      {outbox.isError ? <ApiErrorCallout error={outbox.error} /> : null}
      {outbox.data?.length === 0 ? <Text color="gray">No e-mail has been sent yet.</Text> : null}
      {outbox.data?.length ? (
        <ul className="plain-list outbox-list" data-testid="outbox">
          {outbox.data.map((m) => (
            <li key={m.id}>
              <Card size="2">
                <details>
                  <summary className="outbox-summary">
                    <Text weight="medium">{m.subject || '(no subject)'}</Text>
                    <Text size="2" color="gray">
                      {' '}
                      to {m.to.join(', ')}
                      {m.date ? (
                        <>
                          {' · '}
                          <Mono size="2">{m.date.slice(0, 19).replace('T', ' ')}</Mono> UTC
                        </>
                      ) : null}
                    </Text>
                  </summary>
                  <pre className="outbox-text">{m.text}</pre>
                </details>
              </Card>
            </li>
          ))}
        </ul>
      ) : null}
    </Flex>
  );
}
