import { Button, Card, Flex, Heading, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { FormField } from '@/components/ui/form-field';
import type { Show } from '@/features/shows';
import { checkText } from '@/lib/validation';
import { useUpdateShow } from '../api/update-show';
import { ConfirmButton } from './confirm-button';
import { ShowStateLabel } from './show-state-label';

/** Renames a show, archives or restores it. */
export function ShowSettingsForm({ show }: { show: Show }) {
  const update = useUpdateShow();
  const [name, setName] = useState(show.name);
  const [error, setError] = useState<string | null>(null);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const problem = checkText(name, 'a name', 120);
    setError(problem);
    if (!problem) update.mutate({ showId: show.id, name: name.trim() });
  };

  return (
    <Card size="3">
      <Flex direction="column" gap="4">
        <Flex justify="between" align="center">
          <Heading as="h3" size="4">
            Show
          </Heading>
          <ShowStateLabel archived={show.archived} />
        </Flex>
        <form onSubmit={submit} noValidate aria-label="Rename the show">
          <Flex gap="3" align="end" wrap="wrap">
            <FormField label="Name" error={error}>
              {(control) => (
                <TextField.Root
                  {...control}
                  value={name}
                  onChange={(e) => setName(e.target.value)}
                  style={{ width: 320 }}
                />
              )}
            </FormField>
            <Button type="submit" variant="soft" loading={update.isPending}>
              Save the name
            </Button>
          </Flex>
        </form>
        {update.isError ? <ApiErrorCallout error={update.error} /> : null}
        <Flex>
          {show.archived ? (
            <ConfirmButton
              label="Restore the show"
              color="gray"
              title={`Restore ${show.code}?`}
              description="Its members see it in their show picker again."
              confirm="Restore"
              onConfirm={() => update.mutate({ showId: show.id, archived: false })}
            />
          ) : (
            <ConfirmButton
              label="Archive the show"
              title={`Archive ${show.code}?`}
              description="It leaves everyone's show picker. Nothing is deleted; you can restore it."
              confirm="Archive"
              onConfirm={() => update.mutate({ showId: show.id, archived: true })}
            />
          )}
        </Flex>
      </Flex>
    </Card>
  );
}
