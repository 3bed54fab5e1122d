import { Button, DataList, Flex, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { FormField } from '@/components/ui/form-field';
import { Mono } from '@/components/ui/mono';
import {
  checkNewPassword,
  checkRepeat,
  checkText,
  collectErrors,
  isValid,
  type FormErrors,
} from '@/lib/validation';
import { useAcceptInvitation } from '../api/accept-invitation';
import type { Invitation } from '../api/invitation';
import type { SessionUser } from '../api/session-user';
import { ROLE_LABELS } from '../permissions';
import { NewPasswordFields } from './new-password-fields';

type Field = 'displayName' | 'password' | 'repeat';

/** Props of the invitation form. */
export interface AcceptInvitationFormProps {
  token: string;
  invitation: Invitation;
  /** Called with the new, signed-in user. */
  onAccepted: (user: SessionUser) => void;
}

/** What the invitation offers, then a name and a password to create the account. */
export function AcceptInvitationForm({ token, invitation, onAccepted }: AcceptInvitationFormProps) {
  const accept = useAcceptInvitation();
  const [displayName, setDisplayName] = useState('');
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [errors, setErrors] = useState<FormErrors<Field>>({});

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const found = collectErrors<Field>({
      displayName: checkText(displayName, 'your name', 120),
      password: checkNewPassword(password),
      repeat: checkRepeat(password, repeat),
    });
    setErrors(found);
    if (!isValid(found)) return;
    accept.mutate({ token, displayName: displayName.trim(), password }, { onSuccess: onAccepted });
  };

  return (
    <Flex direction="column" gap="5">
      <DataList.Root size="2">
        <DataList.Item>
          <DataList.Label minWidth="64px">E-mail</DataList.Label>
          <DataList.Value>{invitation.email}</DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label minWidth="64px">Role</DataList.Label>
          <DataList.Value>{ROLE_LABELS[invitation.role]}</DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label minWidth="64px">Shows</DataList.Label>
          <DataList.Value>
            {invitation.shows.length
              ? invitation.shows.map((s) => (
                  <span key={s.id}>
                    <Mono size="2">{s.code}</Mono> {s.name}
                    <br />
                  </span>
                ))
              : 'None yet; an admin adds you to shows.'}
          </DataList.Value>
        </DataList.Item>
      </DataList.Root>
      <form onSubmit={submit} noValidate aria-label="Accept the invitation">
        <Flex direction="column" gap="4">
          <FormField
            label="Your name"
            hint="As colleagues see it on shots and notes."
            error={errors.displayName}
          >
            {(control) => (
              <TextField.Root
                {...control}
                name="name"
                autoComplete="name"
                size="3"
                value={displayName}
                onChange={(e) => setDisplayName(e.target.value)}
              />
            )}
          </FormField>
          <NewPasswordFields
            password={password}
            repeat={repeat}
            onPassword={setPassword}
            onRepeat={setRepeat}
            errors={errors}
          />
          {accept.isError ? <ApiErrorCallout error={accept.error} /> : null}
          <Button type="submit" size="3" loading={accept.isPending}>
            Create my account
          </Button>
        </Flex>
      </form>
    </Flex>
  );
}
