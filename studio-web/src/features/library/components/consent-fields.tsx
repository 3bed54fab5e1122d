import { Flex, Grid, Select, TextArea, TextField } from '@radix-ui/themes';
import { FormField } from '@/components/ui/form-field';
import { todayUtc } from '@/lib/dates';
import type { Character } from '../api/library-types';
import type { ConsentInput } from '../api/upload-types';

/** The capture form's values: the character it is registered to and the consent record. */
export interface CaptureDetails extends ConsentInput {
  characterId: string;
}

/** An empty capture form. */
export const EMPTY_CAPTURE_DETAILS: CaptureDetails = {
  characterId: '',
  performerCode: '',
  scope: '',
  expiresOn: '',
};

/** Field → what is wrong with it. */
export type CaptureDetailErrors = Partial<Record<keyof CaptureDetails, string>>;

// The API's rule for reference codes (upload DTO): 2–40 letters, digits, . _ -.
const PERFORMER_CODE = /^[A-Za-z0-9][A-Za-z0-9._-]{1,39}$/;

/** Checks the capture form; each problem in words, by field. */
export function checkCaptureDetails(d: CaptureDetails, today = todayUtc()): CaptureDetailErrors {
  const errors: CaptureDetailErrors = {};
  if (!d.characterId) errors.characterId = 'Choose the character this capture is registered to.';
  const code = d.performerCode.trim();
  if (code === '') errors.performerCode = 'Enter the performer’s reference code.';
  else if (!PERFORMER_CODE.test(code)) {
    errors.performerCode = 'Use 2 to 40 letters, digits, dots, dashes or underscores, no spaces.';
  }
  const scope = d.scope.trim();
  if (scope === '') errors.scope = 'Say what the performer agreed to.';
  else if (scope.length > 500) errors.scope = 'Keep the scope to 500 characters.';
  if (!/^\d{4}-\d{2}-\d{2}$/.test(d.expiresOn))
    errors.expiresOn = 'Enter the last day the consent holds.';
  else if (d.expiresOn < today) {
    errors.expiresOn = `This consent expired on ${d.expiresOn}; record a current consent first.`;
  }
  return errors;
}

/** Props of the capture details fields. */
export interface ConsentFieldsProps {
  value: CaptureDetails;
  onChange: (value: CaptureDetails) => void;
  /** Ready characters to choose from. */
  characters: Character[];
  /** Problems to show; only after the user tried to upload. */
  errors: CaptureDetailErrors;
}

/** Character select and consent record of a capture upload. */
export function ConsentFields({ value, onChange, characters, errors }: ConsentFieldsProps) {
  const set = (field: keyof CaptureDetails) => (v: string) => onChange({ ...value, [field]: v });
  return (
    <Flex direction="column" gap="3" data-testid="consent-fields">
      <Grid columns={{ initial: '1', sm: '3' }} gap="3">
        <FormField label="Registered to character" error={errors.characterId}>
          {(control) => (
            <Select.Root value={value.characterId || undefined} onValueChange={set('characterId')}>
              <Select.Trigger
                {...control}
                placeholder={characters.length ? 'Choose…' : 'No ready character yet'}
              />
              <Select.Content>
                {characters.map((c) => (
                  <Select.Item key={c.id} value={c.id}>
                    {c.name}
                    {c.version ? ` v${c.version}` : ''}
                  </Select.Item>
                ))}
              </Select.Content>
            </Select.Root>
          )}
        </FormField>
        <FormField
          label="Performer reference code"
          hint="The studio’s code for the performer, never a name."
          error={errors.performerCode}
        >
          {(control) => (
            <TextField.Root
              {...control}
              className="mono"
              value={value.performerCode}
              onChange={(e) => set('performerCode')(e.target.value)}
              autoComplete="off"
            />
          )}
        </FormField>
        <FormField
          label="Consent expires on"
          hint="The last day it holds."
          error={errors.expiresOn}
        >
          {(control) => (
            <TextField.Root
              {...control}
              type="date"
              value={value.expiresOn}
              onChange={(e) => set('expiresOn')(e.target.value)}
            />
          )}
        </FormField>
      </Grid>
      <FormField
        label="Consent scope"
        hint="What the performer agreed to, e.g. tissue-profile learning for this show only."
        error={errors.scope}
      >
        {(control) => (
          <TextArea
            {...control}
            rows={2}
            value={value.scope}
            onChange={(e) => set('scope')(e.target.value)}
          />
        )}
      </FormField>
    </Flex>
  );
}
