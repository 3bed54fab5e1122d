import { TextField } from '@radix-ui/themes';
import { FormField } from '@/components/ui/form-field';

/** Props of the account e-mail field. */
export interface EmailFieldProps {
  value: string;
  onChange: (value: string) => void;
  error?: string | null;
}

/** "E-mail", marked as the account's user name so password managers fill it. */
export function EmailField({ value, onChange, error }: EmailFieldProps) {
  return (
    <FormField label="E-mail" error={error}>
      {(control) => (
        <TextField.Root
          {...control}
          type="email"
          name="email"
          autoComplete="username"
          size="3"
          value={value}
          onChange={(e) => onChange(e.target.value)}
        />
      )}
    </FormField>
  );
}
