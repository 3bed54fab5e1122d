import { Button, Callout, Flex } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { CheckIcon } from '@/components/ui/icons';
import { checkEmail } from '@/lib/validation';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { EmailField } from './email-field';

/** Asks for a reset link by e-mail; says the same whether the address is known or not. */
export function RequestResetForm() {
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const [error, setError] = useState<string | null>(null);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const problem = checkEmail(email);
    setError(problem);
    if (!problem) request.mutate({ email: email.trim() });
  };

  if (request.isSuccess) {
    return (
      <Callout.Root color="green" role="status">
        <Callout.Icon>
          <CheckIcon size={16} />
        </Callout.Icon>
        <Callout.Text>{request.data} Check your inbox; the link works for one hour.</Callout.Text>
      </Callout.Root>
    );
  }
  return (
    <form onSubmit={submit} noValidate aria-label="Ask for a reset link">
      <Flex direction="column" gap="4">
        <EmailField value={email} onChange={setEmail} error={error} />
        {request.isError ? <ApiErrorCallout error={request.error} /> : null}
        <Button type="submit" size="3" loading={request.isPending}>
          Send a reset link
        </Button>
      </Flex>
    </form>
  );
}
