import { TextField } from '@radix-ui/themes';
import { FormField } from '@/components/ui/form-field';
import { MIN_PASSWORD_LENGTH } from '@/lib/validation';

/** Props of the new-password pair. */
export interface NewPasswordFieldsProps {
  password: string;
  repeat: string;
  onPassword: (value: string) => void;
  onRepeat: (value: string) => void;
  errors: { password?: string; repeat?: string };
}

/** "New password" and "Repeat the password", with the length rule as a hint. */
export function NewPasswordFields({
  password,
  repeat,
  onPassword,
  onRepeat,
  errors,
}: NewPasswordFieldsProps) {
  return (
    <>
      <FormField
        label="New password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        error={errors.password}
      >
        {(control) => (
          <TextField.Root
            {...control}
            type="password"
            name="new-password"
            autoComplete="new-password"
            size="3"
            value={password}
            onChange={(e) => onPassword(e.target.value)}
          />
        )}
      </FormField>
      <FormField label="Repeat the password" error={errors.repeat}>
        {(control) => (
          <TextField.Root
            {...control}
            type="password"
            name="repeat-password"
            autoComplete="new-password"
            size="3"
            value={repeat}
            onChange={(e) => onRepeat(e.target.value)}
          />
        )}
      </FormField>
    </>
  );
}
