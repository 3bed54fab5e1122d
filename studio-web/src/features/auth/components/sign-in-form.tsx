import { Button, Flex, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { FormField } from '@/components/ui/form-field';
import {
  checkEmail,
  checkPasswordPresent,
  collectErrors,
  isValid,
  type FormErrors,
} from '@/lib/validation';
import { useSignIn } from '../api/sign-in';
import type { SessionUser } from '../api/session-user';
import { EmailField } from './email-field';

type Field = 'email' | 'password';

/** Props of the sign-in form. */
export interface SignInFormProps {
  /** Called once the API accepted the e-mail and password. */
  onSignedIn: (user: SessionUser) => void;
}

/** E-mail and password; field problems are shown before anything is sent. */
export function SignInForm({ onSignedIn }: SignInFormProps) {
  const signIn = useSignIn();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<FormErrors<Field>>({});

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const found = collectErrors<Field>({
      email: checkEmail(email),
      password: checkPasswordPresent(password),
    });
    setErrors(found);
    if (!isValid(found)) return;
    signIn.mutate({ email: email.trim(), password }, { onSuccess: onSignedIn });
  };

  return (
    <form onSubmit={submit} noValidate aria-label="Sign in">
      <Flex direction="column" gap="4">
        <EmailField value={email} onChange={setEmail} error={errors.email} />
        <FormField label="Password" error={errors.password}>
          {(control) => (
            <TextField.Root
              {...control}
              type="password"
              name="password"
              autoComplete="current-password"
              size="3"
              value={password}
              onChange={(e) => setPassword(e.target.value)}
            />
          )}
        </FormField>
        {signIn.isError ? <ApiErrorCallout error={signIn.error} /> : null}
        <Button type="submit" size="3" loading={signIn.isPending}>
          Sign in
        </Button>
      </Flex>
    </form>
  );
}
