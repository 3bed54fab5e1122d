import { Flex, Text } from '@radix-ui/themes';
import { useId, type ReactNode } from 'react';

/** The ids and states a control needs to be tied to its label, hint and error. */
export interface FieldControlProps {
  id: string;
  'aria-invalid': boolean | undefined;
  'aria-describedby': string | undefined;
}

/** Props of a labelled form field. */
export interface FormFieldProps {
  /** The visible label. */
  label: string;
  /** A short help text under the label. */
  hint?: ReactNode;
  /** What is wrong with the value, shown under the control and announced with it. */
  error?: string | null;
  /** Renders the control with the ids and states it needs. */
  children: (control: FieldControlProps) => ReactNode;
}

/** A label, the control, an optional hint and the field's error, wired for screen readers. */
export function FormField({ label, hint, error, children }: FormFieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <Flex direction="column" gap="1">
      <Text as="label" htmlFor={id} size="2" weight="medium">
        {label}
      </Text>
      {hint ? (
        <Text id={hintId} size="1" color="gray">
          {hint}
        </Text>
      ) : null}
      {children({ id, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
      {error ? (
        <Text id={errorId} size="1" color="red" className="field-error">
          {error}
        </Text>
      ) : null}
    </Flex>
  );
}
