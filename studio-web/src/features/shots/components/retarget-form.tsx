import { Button, Callout, Card, Flex, Heading, Select, Spinner, Text } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { ApiErrorCallout } from '@/components/errors/api-error-callout';
import { WarningIcon } from '@/components/ui/icons';
import { FormField } from '@/components/ui/form-field';
import type { Job } from '@/features/library/api/job-view';
import type { Profile } from '@/features/library/api/profile-types';
import { useCreateRetargetJob } from '../api/create-retarget-job';
import { useJointMap } from '../api/get-joint-map';
import { ControlsFields } from './controls-fields';
import {
  checkControls,
  controlsToSend,
  defaultControlValues,
  serverControlErrors,
  type ControlErrors,
} from './controls-values';
import { JointMapReview, stillUnmapped } from './joint-map-review';

/** Props of the retarget form. */
export interface RetargetFormProps {
  showId: string;
  shotId: string;
  profiles: Profile[];
  /** The shot character's regions (for region gains) and joints (for mapping by hand). */
  regions: readonly string[];
  targetJoints: readonly string[];
  onSubmitted: (job: Job) => void;
}

/** Choose a profile, set the controls, review the joint map, submit a retarget job. */
export function RetargetForm({
  showId,
  shotId,
  profiles,
  regions,
  targetJoints,
  onSubmitted,
}: RetargetFormProps) {
  const ready = profiles.filter((p) => p.state === 'ready');
  const [profileId, setProfileId] = useState(ready[0]?.id ?? '');
  const [profileError, setProfileError] = useState<string | null>(null);
  const [controls, setControls] = useState(() => defaultControlValues(regions));
  const [errors, setErrors] = useState<ControlErrors>({});
  const [submitted, setSubmitted] = useState(false);
  const [overrides, setOverrides] = useState<Record<string, string>>({});
  const jointMap = useJointMap(showId, shotId, profileId || undefined);
  const submit = useCreateRetargetJob(showId, shotId);
  const shownErrors = { ...serverControlErrors(submit.error), ...errors };
  const missing = jointMap.data ? stillUnmapped(jointMap.data, overrides) : null;

  const onSubmit = (e: FormEvent) => {
    e.preventDefault();
    setSubmitted(true);
    const problems = checkControls(controls);
    setErrors(problems);
    setProfileError(profileId ? null : 'Choose the tissue profile to apply.');
    if (!profileId || Object.keys(problems).length > 0) return;
    const hasOverrides = Object.keys(overrides).length > 0;
    submit.mutate(
      {
        profileId,
        controls: controlsToSend(controls),
        ...(hasOverrides && jointMap.data
          ? {
              jointMap: {
                ...Object.fromEntries(jointMap.data.mapped.map((p) => [p.source, p.target])),
                ...overrides,
              },
            }
          : {}),
      },
      { onSuccess: onSubmitted },
    );
  };

  const onlyServer = submit.error && Object.keys(serverControlErrors(submit.error)).length === 0;

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Retarget job" data-testid="retarget-form">
      <Flex direction="column" gap="4">
        <Card>
          <Flex direction="column" gap="3">
            <Heading as="h2" size="4">
              Tissue profile
            </Heading>
            <FormField
              label="Profile to apply"
              error={profileError}
              hint={
                ready.length === 0 ? 'No ready profile yet: learn one in the Library.' : undefined
              }
            >
              {(control) => (
                <Select.Root
                  value={profileId || undefined}
                  onValueChange={(id) => {
                    setProfileId(id);
                    setOverrides({});
                    setProfileError(null);
                  }}
                >
                  <Select.Trigger {...control} placeholder="Choose…" />
                  <Select.Content>
                    {ready.map((p) => (
                      <Select.Item key={p.id} value={p.id}>
                        {p.name}
                        {p.modes ? ` · ${p.modes.length} modes` : ''}
                        {p.captureDeleted ? ' · learned from a deleted capture' : ''}
                      </Select.Item>
                    ))}
                  </Select.Content>
                </Select.Root>
              )}
            </FormField>
          </Flex>
        </Card>
        <Card>
          <Flex direction="column" gap="3">
            <Heading as="h2" size="4">
              Controls
            </Heading>
            <ControlsFields
              value={controls}
              onChange={(v) => {
                setControls(v);
                if (submitted) setErrors(checkControls(v));
              }}
              errors={shownErrors}
            />
          </Flex>
        </Card>
        <Card>
          <Flex direction="column" gap="3">
            <Heading as="h2" size="4">
              Joint map
            </Heading>
            <Text size="2" color="gray">
              The profile’s driver joints, matched by name to the shot character’s skeleton. Check
              the joints without a partner and map them by hand where you can.
            </Text>
            {!profileId ? <Text color="gray">Choose a profile to see its joint map.</Text> : null}
            {profileId && jointMap.isPending ? (
              <Flex gap="2" align="center">
                <Spinner />
                <Text color="gray">Matching joints…</Text>
              </Flex>
            ) : null}
            {jointMap.isError ? <ApiErrorCallout error={jointMap.error} /> : null}
            {jointMap.data ? (
              <JointMapReview
                map={jointMap.data}
                targetJoints={targetJoints}
                overrides={overrides}
                onOverride={(source, target) =>
                  setOverrides(({ [source]: _old, ...rest }) =>
                    target ? { ...rest, [source]: target } : rest,
                  )
                }
              />
            ) : null}
            {missing && missing.essential.length > 0 ? (
              <Callout.Root color="red" size="1" role="alert">
                <Callout.Icon>
                  <WarningIcon size={16} />
                </Callout.Icon>
                <Callout.Text>
                  The solve needs {missing.essential.join(', ')}: map{' '}
                  {missing.essential.length > 1 ? 'them' : 'it'} to a character joint, or the job
                  will be refused.
                </Callout.Text>
              </Callout.Root>
            ) : null}
          </Flex>
        </Card>
        {onlyServer ? <ApiErrorCallout error={submit.error} /> : null}
        {Object.keys(shownErrors).length > 0 ? (
          <Text size="2" color="red" role="alert">
            Some controls need attention; each says what above.
          </Text>
        ) : null}
        <Flex justify="end">
          <Button type="submit" size="3" loading={submit.isPending} disabled={ready.length === 0}>
            Submit retarget job
          </Button>
        </Flex>
      </Flex>
    </form>
  );
}
