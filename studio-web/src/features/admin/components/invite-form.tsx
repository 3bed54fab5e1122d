import { Button, Card, Checkbox, Flex, Heading, Select, Text, TextField } from '@radix-ui/themes';
import { useId, useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { FormField } from '@/components/ui/form-field';
import { CheckIcon } from '@/components/ui/icons';
import { Mono } from '@/components/ui/mono';
import { ROLE_LABELS, ROLES, isRole, type Role } from '@/features/auth';
import { checkEmail, collectErrors, isValid, type FormErrors } from '@/lib/validation';
import { useCreateInvitation } from '../api/create-invitation';
import { useAdminShows } from '../api/get-admin-shows';

type Field = 'email' | 'role';

/** Invites an e-mail address with a role and shows; the e-mail goes out through the worker. */
export function InviteForm() {
  const invite = useCreateInvitation();
  const shows = useAdminShows();
  const showsLabel = useId();
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role | ''>('');
  const [showIds, setShowIds] = useState<string[]>([]);
  const [errors, setErrors] = useState<FormErrors<Field>>({});

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const found = collectErrors<Field>({
      email: checkEmail(email),
      role: role ? null : 'Choose a role.',
    });
    setErrors(found);
    if (!isValid(found) || !role) return;
    invite.mutate(
      { email: email.trim(), role, showIds },
      {
        onSuccess: () => {
          setEmail('');
          setShowIds([]);
        },
      },
    );
  };
  const toggle = (id: string, on: boolean) =>
    setShowIds((ids) => (on ? [...ids, id] : ids.filter((x) => x !== id)));
  const openShows = (shows.data ?? []).filter((s) => !s.archived);

  return (
    <Card size="3">
      <form onSubmit={submit} noValidate aria-labelledby="invite-heading">
        <Flex direction="column" gap="4">
          <Heading as="h3" size="4" id="invite-heading">
            Invite someone
          </Heading>
          <Flex gap="4" wrap="wrap">
            <FormField label="E-mail" error={errors.email}>
              {(control) => (
                <TextField.Root
                  {...control}
                  type="email"
                  value={email}
                  onChange={(e) => setEmail(e.target.value)}
                  style={{ width: 280 }}
                />
              )}
            </FormField>
            <FormField label="Role" error={errors.role}>
              {(control) => (
                <Select.Root value={role} onValueChange={(v) => setRole(isRole(v) ? v : '')}>
                  <Select.Trigger {...control} placeholder="Choose a role" style={{ width: 200 }} />
                  <Select.Content position="popper">
                    {ROLES.map((r) => (
                      <Select.Item key={r} value={r}>
                        {ROLE_LABELS[r]}
                      </Select.Item>
                    ))}
                  </Select.Content>
                </Select.Root>
              )}
            </FormField>
          </Flex>
          <Flex direction="column" gap="2" role="group" aria-labelledby={showsLabel}>
            <Text id={showsLabel} size="2" weight="medium">
              Shows
            </Text>
            {openShows.length === 0 ? (
              <Text size="2" color="gray">
                No shows yet. Admins see every show; others need at least one.
              </Text>
            ) : null}
            <Flex gap="4" wrap="wrap">
              {openShows.map((show) => (
                <Text as="label" size="2" key={show.id}>
                  <Flex gap="2" align="center">
                    <Checkbox
                      checked={showIds.includes(show.id)}
                      onCheckedChange={(on) => toggle(show.id, on === true)}
                    />
                    <Mono size="2">{show.code}</Mono> {show.name}
                  </Flex>
                </Text>
              ))}
            </Flex>
          </Flex>
          {invite.isError ? <ApiErrorCallout error={invite.error} /> : null}
          {invite.isSuccess ? (
            <Text size="2" color="green" role="status">
              <Flex gap="1" align="center">
                <CheckIcon /> Invitation sent to {invite.data.email}.
              </Flex>
            </Text>
          ) : null}
          <Flex>
            <Button type="submit" loading={invite.isPending}>
              Send the invitation
            </Button>
          </Flex>
        </Flex>
      </form>
    </Card>
  );
}
