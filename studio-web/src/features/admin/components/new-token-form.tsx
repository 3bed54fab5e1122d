import { Button, Checkbox, Flex, Text, TextField } from '@radix-ui/themes';
import { useId, useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { FormField } from '@/components/ui/form-field';
import { checkText, collectErrors, isValid, type FormErrors } from '@/lib/validation';
import { checkChosen } from '../admin-rules';
import { useCreateToken } from '../api/create-token';
import {
  TOKEN_SCOPE_WORDS,
  TOKEN_SCOPES,
  type CreatedToken,
  type TokenScope,
} from '../api/pipeline-token';

type Field = 'name' | 'scopes';

/** Creates a pipeline token for a show with a name and scopes. */
export function NewTokenForm({
  showId,
  onCreated,
}: {
  showId: string;
  onCreated: (token: CreatedToken) => void;
}) {
  const create = useCreateToken();
  const scopesLabel = useId();
  const [name, setName] = useState('');
  const [scopes, setScopes] = useState<TokenScope[]>([]);
  const [errors, setErrors] = useState<FormErrors<Field>>({});

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const found = collectErrors<Field>({
      name: checkText(name, 'a name', 80),
      scopes: checkChosen(scopes, 'scope'),
    });
    setErrors(found);
    if (!isValid(found)) return;
    create.mutate(
      { showId, name: name.trim(), scopes },
      {
        onSuccess: (token) => {
          setName('');
          setScopes([]);
          onCreated(token);
        },
      },
    );
  };
  const toggle = (scope: TokenScope, on: boolean) =>
    setScopes((s) => (on ? [...s, scope] : s.filter((x) => x !== scope)));

  return (
    <form onSubmit={submit} noValidate aria-label="Create a pipeline token">
      <Flex direction="column" gap="3">
        <FormField label="Token name" hint="Who uses it, e.g. render farm." error={errors.name}>
          {(control) => (
            <TextField.Root
              {...control}
              value={name}
              onChange={(e) => setName(e.target.value)}
              style={{ width: 280 }}
            />
          )}
        </FormField>
        <Flex direction="column" gap="2" role="group" aria-labelledby={scopesLabel}>
          <Text id={scopesLabel} size="2" weight="medium">
            May
          </Text>
          <Flex gap="4" wrap="wrap">
            {TOKEN_SCOPES.map((scope) => (
              <Text as="label" size="2" key={scope}>
                <Flex gap="2" align="center">
                  <Checkbox
                    checked={scopes.includes(scope)}
                    onCheckedChange={(on) => toggle(scope, on === true)}
                  />
                  {TOKEN_SCOPE_WORDS[scope]}
                </Flex>
              </Text>
            ))}
          </Flex>
          {errors.scopes ? (
            <Text size="1" color="red" className="field-error">
              {errors.scopes}
            </Text>
          ) : null}
        </Flex>
        {create.isError ? <ApiErrorCallout error={create.error} /> : null}
        <Flex>
          <Button type="submit" loading={create.isPending}>
            Create the token
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
