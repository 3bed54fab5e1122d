import { Button, Card, Checkbox, Flex, Grid, Select, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { FormField } from '@/components/ui/form-field';
import type { Character, Clip } from '@/features/library/api/library-types';
import type { Member } from '../api/shot-types';
import {
  checkShotValues,
  serverShotErrors,
  type ShotField,
  type ShotFormErrors,
  type ShotFormValues,
} from './shot-form-values';

const NONE = 'none';

/** Props of the shot form. */
export interface ShotFormProps {
  initial: ShotFormValues;
  /** Fields the user may change; the others are shown but locked. */
  editable: readonly ShotField[];
  characters: Character[];
  clips: Clip[];
  members: Member[];
  submitLabel: string;
  pending: boolean;
  /** The API's refusal of the last submit, spread over the fields where it can be. */
  error: unknown;
  onSubmit: (values: ShotFormValues) => void;
  onCancel: () => void;
}

/** Create or edit a shot, with each problem shown under its field. */
export function ShotForm(props: ShotFormProps) {
  const {
    initial,
    editable,
    characters,
    clips,
    members,
    submitLabel,
    pending,
    error,
    onSubmit,
    onCancel,
  } = props;
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<ShotFormErrors>({});
  const [submitted, setSubmitted] = useState(false);
  const clip = clips.find((c) => c.id === values.clipId);
  const server = serverShotErrors(error);
  const shown: ShotFormErrors = { ...server.fields, ...errors };
  const locked = (f: ShotField) => !editable.includes(f);

  const set = <K extends ShotField>(field: K, value: ShotFormValues[K]) => {
    const next = { ...values, [field]: value };
    setValues(next);
    // After a first submit, re-check as the user fixes things.
    if (submitted)
      setErrors(
        checkShotValues(
          next,
          clips.find((c) => c.id === next.clipId),
        ),
      );
  };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setSubmitted(true);
    const problems = checkShotValues(values, clip);
    setErrors(problems);
    if (Object.keys(problems).length === 0) onSubmit(values);
  };

  const text = (
    field: ShotField,
    label: string,
    hint?: string,
    type: 'text' | 'number' | 'date' = 'text',
  ) => (
    <FormField label={label} hint={hint} error={shown[field]}>
      {(control) => (
        <TextField.Root
          {...control}
          type={type}
          className={
            type === 'number' || field === 'code' || field === 'sequence' ? 'mono' : undefined
          }
          value={values[field] as string}
          disabled={locked(field)}
          onChange={(e) => set(field, e.target.value)}
        />
      )}
    </FormField>
  );

  const choice = (
    field: 'characterId' | 'clipId',
    label: string,
    items: { id: string; label: string }[],
  ) => (
    <FormField label={label} error={shown[field]}>
      {(control) => (
        <Select.Root
          value={values[field] || NONE}
          onValueChange={(v) => set(field, v === NONE ? '' : v)}
          disabled={locked(field)}
        >
          <Select.Trigger {...control} />
          <Select.Content>
            <Select.Item value={NONE}>None yet</Select.Item>
            {items.map((i) => (
              <Select.Item key={i.id} value={i.id}>
                {i.label}
              </Select.Item>
            ))}
          </Select.Content>
        </Select.Root>
      )}
    </FormField>
  );

  return (
    <Card asChild>
      <form onSubmit={submit} noValidate aria-label="Shot" data-testid="shot-form">
        <Flex direction="column" gap="4">
          <Grid columns={{ initial: '1', sm: '2' }} gap="3">
            {text('sequence', 'Sequence code', 'e.g. SQ010')}
            {text('code', 'Shot code', 'Unique in the show, e.g. SQ010_0040')}
          </Grid>
          <Grid columns={{ initial: '1', sm: '3' }} gap="3">
            {text('frameStart', 'First frame', 'e.g. 1001', 'number')}
            {text('frameEnd', 'Last frame', 'Inclusive', 'number')}
            {text('fps', 'Frame rate (fps)', 'e.g. 24', 'number')}
          </Grid>
          <Grid columns={{ initial: '1', sm: '2' }} gap="3">
            {choice(
              'characterId',
              'Target character',
              characters
                .filter((c) => c.state === 'ready')
                .map((c) => ({ id: c.id, label: `${c.name}${c.version ? ` v${c.version}` : ''}` })),
            )}
            {choice(
              'clipId',
              'Clip',
              clips
                .filter((c) => c.state === 'ready')
                .map((c) => ({
                  id: c.id,
                  label: `${c.name} (${c.frameCount ?? '?'} frames at ${c.fps ?? '?'} fps)`,
                })),
            )}
          </Grid>
          <Grid columns={{ initial: '1', sm: '2' }} gap="3">
            <FormField label="Assignees" error={shown.assigneeIds}>
              {(control) => (
                <Flex
                  direction="column"
                  gap="1"
                  role="group"
                  id={control.id}
                  aria-describedby={control['aria-describedby']}
                >
                  {members.filter((m) => !m.disabled).length === 0 ? (
                    <Text size="2" color="gray">
                      No members to assign.
                    </Text>
                  ) : null}
                  {members
                    .filter((m) => !m.disabled)
                    .map((m) => (
                      <Text as="label" size="2" key={m.userId}>
                        <Flex gap="2" align="center">
                          <Checkbox
                            disabled={locked('assigneeIds')}
                            checked={values.assigneeIds.includes(m.userId)}
                            onCheckedChange={(on) =>
                              set(
                                'assigneeIds',
                                on === true
                                  ? [...values.assigneeIds, m.userId]
                                  : values.assigneeIds.filter((id) => id !== m.userId),
                              )
                            }
                          />
                          {m.displayName}
                        </Flex>
                      </Text>
                    ))}
                </Flex>
              )}
            </FormField>
            {text('dueDate', 'Due date', 'Optional', 'date')}
          </Grid>
          {server.rest ? <ApiErrorCallout error={server.rest} /> : null}
          {Object.keys(shown).length > 0 ? (
            <Text size="2" color="red" role="alert" data-testid="form-problems">
              {Object.keys(shown).length === 1
                ? 'One field needs attention.'
                : `${Object.keys(shown).length} fields need attention.`}
            </Text>
          ) : null}
          <Flex gap="3" justify="end">
            <Button type="button" variant="soft" color="gray" onClick={onCancel}>
              Cancel
            </Button>
            <Button type="submit" loading={pending}>
              {submitLabel}
            </Button>
          </Flex>
        </Flex>
      </form>
    </Card>
  );
}
