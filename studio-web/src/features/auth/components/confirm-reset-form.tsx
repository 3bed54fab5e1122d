import { Button, Callout, Flex } from '@radix-ui/themes';
import { useState, type FormEvent, type ReactNode } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { CheckIcon } from '@/components/ui/icons';
import {
  checkNewPassword,
  checkRepeat,
  collectErrors,
  isValid,
  type FormErrors,
} from '@/lib/validation';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';
import { NewPasswordFields } from './new-password-fields';

type Field = 'password' | 'repeat';

/** Props of the new-password form of a reset link. */
export interface ConfirmResetFormProps {
  /** The link's token. */
  token: string;
  /** Shown once the password is set, e.g. a link to sign in. */
  done: ReactNode;
}

/** Sets a new password with a reset link's token. */
export function ConfirmResetForm({ token, done }: ConfirmResetFormProps) {
  const confirm = useConfirmPasswordReset();
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [errors, setErrors] = useState<FormErrors<Field>>({});

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const found = collectErrors<Field>({
      password: checkNewPassword(password),
      repeat: checkRepeat(password, repeat),
    });
    setErrors(found);
    if (isValid(found)) confirm.mutate({ token, password });
  };

  if (confirm.isSuccess) {
    return (
      <Flex direction="column" gap="4">
        <Callout.Root color="green" role="status">
          <Callout.Icon>
            <CheckIcon size={16} />
          </Callout.Icon>
          <Callout.Text>Your password is set. Every earlier session has ended.</Callout.Text>
        </Callout.Root>
        {done}
      </Flex>
    );
  }
  return (
    <form onSubmit={submit} noValidate aria-label="Choose a new password">
      <Flex direction="column" gap="4">
        <NewPasswordFields
          password={password}
          repeat={repeat}
          onPassword={setPassword}
          onRepeat={setRepeat}
          errors={errors}
        />
        {confirm.isError ? <ApiErrorCallout error={confirm.error} /> : null}
        <Button type="submit" size="3" loading={confirm.isPending}>
          Set the new password
        </Button>
      </Flex>
    </form>
  );
}
