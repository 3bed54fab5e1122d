import { Button, Card, Flex, Heading, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { FormField } from '@/components/ui/form-field';
import type { Show } from '@/features/shows';
import { checkText, collectErrors, isValid, type FormErrors } from '@/lib/validation';
import { checkShowCode } from '../admin-rules';
import { useCreateShow } from '../api/create-show';

type Field = 'code' | 'name';

/** Creates a show from a code and a name. */
export function CreateShowForm({ onCreated }: { onCreated?: (show: Show) => void }) {
  const create = useCreateShow();
  const [code, setCode] = useState('');
  const [name, setName] = useState('');
  const [errors, setErrors] = useState<FormErrors<Field>>({});

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const found = collectErrors<Field>({
      code: checkShowCode(code),
      name: checkText(name, 'a name', 120),
    });
    setErrors(found);
    if (!isValid(found)) return;
    create.mutate(
      { code: code.trim(), name: name.trim() },
      {
        onSuccess: (show) => {
          setCode('');
          setName('');
          onCreated?.(show);
        },
      },
    );
  };

  return (
    <Card size="3">
      <form onSubmit={submit} noValidate aria-labelledby="create-show-heading">
        <Flex direction="column" gap="4">
          <Heading as="h3" size="4" id="create-show-heading">
            Create a show
          </Heading>
          <Flex gap="4" wrap="wrap" align="start">
            <FormField
              label="Code"
              hint="2–16 letters, digits, - or _; stored in capitals."
              error={errors.code}
            >
              {(control) => (
                <TextField.Root
                  {...control}
                  value={code}
                  onChange={(e) => setCode(e.target.value)}
                  className="mono"
                  style={{ width: 200 }}
                />
              )}
            </FormField>
            <FormField label="Name" hint="As people see it in the show picker." error={errors.name}>
              {(control) => (
                <TextField.Root
                  {...control}
                  value={name}
                  onChange={(e) => setName(e.target.value)}
                  style={{ width: 320 }}
                />
              )}
            </FormField>
          </Flex>
          {create.isError ? <ApiErrorCallout error={create.error} /> : null}
          <Flex>
            <Button type="submit" loading={create.isPending}>
              Create the show
            </Button>
          </Flex>
        </Flex>
      </form>
    </Card>
  );
}
