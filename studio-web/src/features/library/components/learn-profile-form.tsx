import { Button, Card, Flex, Grid, Heading, Select, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { FormField } from '@/components/ui/form-field';
import { paths } from '@/config/paths';
import { useCreateProfile } from '../api/create-profile';
import { fieldErrorMap } from '../api/field-errors';
import type { Capture, Character } from '../api/library-types';

/** The learn form's values. */
export interface LearnValues {
  name: string;
  captureId: string;
  characterId: string;
}

type LearnErrors = Partial<Record<keyof LearnValues, string>>;
const FIELDS = ['name', 'captureId', 'characterId'] as const;

/** Checks the learn form; each problem in words, by field. */
export function checkLearnValues(v: LearnValues, captures: Capture[]): LearnErrors {
  const errors: LearnErrors = {};
  const name = v.name.trim();
  if (name === '') errors.name = 'Name the profile, e.g. "Madge belly, drill".';
  else if (name.length > 120) errors.name = 'Keep the name to 120 characters.';
  const capture = captures.find((c) => c.id === v.captureId);
  if (!capture) errors.captureId = 'Choose the capture to learn from.';
  else if (capture.consent.expired) {
    errors.captureId = `The consent for ${capture.consent.performerCode} expired on ${capture.consent.expiresOn}: it cannot be learned from.`;
  }
  if (!v.characterId) errors.characterId = 'Choose the character.';
  return errors;
}

/** Props of the learn form. */
export interface LearnProfileFormProps {
  showId: string;
  captures: Capture[];
  characters: Character[];
}

/** "Learn a profile": capture + character + name → a queued learn job, then its page. */
export function LearnProfileForm({ showId, captures, characters }: LearnProfileFormProps) {
  const navigate = useNavigate();
  const create = useCreateProfile(showId);
  const [values, setValues] = useState<LearnValues>({ name: '', captureId: '', characterId: '' });
  const [errors, setErrors] = useState<LearnErrors>({});
  const ready = captures.filter((c) => c.state === 'ready');
  const serverErrors = fieldErrorMap(create.error, FIELDS);
  const shown = { ...serverErrors, ...errors };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const problems = checkLearnValues(values, ready);
    setErrors(problems);
    if (Object.keys(problems).length > 0) return;
    create.mutate(
      { name: values.name.trim(), captureId: values.captureId, characterId: values.characterId },
      { onSuccess: (profile) => navigate(paths.profile.getHref(showId, profile.id)) },
    );
  };

  const pickCapture = (captureId: string) => {
    const capture = ready.find((c) => c.id === captureId);
    // A capture is registered to one character: start from it.
    setValues((v) => ({
      ...v,
      captureId,
      characterId: v.characterId || capture?.characterId || '',
    }));
  };

  return (
    <Card asChild>
      <form onSubmit={submit} aria-labelledby="learn-heading" noValidate data-testid="learn-form">
        <Flex direction="column" gap="3">
          <Heading as="h3" size="3" id="learn-heading">
            Learn a profile
          </Heading>
          <Text size="2" color="gray">
            The solver learns the soft-tissue dynamics of a capture on its character. It takes a few
            minutes; this page follows it.
          </Text>
          <Grid columns={{ initial: '1', sm: '3' }} gap="3">
            <FormField label="Capture" error={shown.captureId}>
              {(control) => (
                <Select.Root value={values.captureId || undefined} onValueChange={pickCapture}>
                  <Select.Trigger
                    {...control}
                    placeholder={ready.length ? 'Choose…' : 'No ready capture'}
                  />
                  <Select.Content>
                    {ready.map((c) => (
                      <Select.Item key={c.id} value={c.id}>
                        {c.consent.performerCode}
                        {c.frameCount ? ` · ${c.frameCount} frames` : ''}
                        {c.consent.expired ? ' · consent expired' : ''}
                      </Select.Item>
                    ))}
                  </Select.Content>
                </Select.Root>
              )}
            </FormField>
            <FormField label="Character" error={shown.characterId}>
              {(control) => (
                <Select.Root
                  value={values.characterId || undefined}
                  onValueChange={(characterId) => setValues((v) => ({ ...v, characterId }))}
                >
                  <Select.Trigger {...control} placeholder="Choose…" />
                  <Select.Content>
                    {characters
                      .filter((c) => c.state === 'ready')
                      .map((c) => (
                        <Select.Item key={c.id} value={c.id}>
                          {c.name}
                          {c.version ? ` v${c.version}` : ''}
                        </Select.Item>
                      ))}
                  </Select.Content>
                </Select.Root>
              )}
            </FormField>
            <FormField label="Profile name" error={shown.name}>
              {(control) => (
                <TextField.Root
                  {...control}
                  value={values.name}
                  onChange={(e) => setValues((v) => ({ ...v, name: e.target.value }))}
                />
              )}
            </FormField>
          </Grid>
          {create.isError && Object.keys(serverErrors).length === 0 ? (
            <ApiErrorCallout error={create.error} />
          ) : null}
          <Flex justify="end">
            <Button type="submit" loading={create.isPending}>
              Start learning
            </Button>
          </Flex>
        </Flex>
      </form>
    </Card>
  );
}
