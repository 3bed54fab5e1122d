import { Flex, Select, Text } from '@radix-ui/themes';
import { useId } from 'react';

/** One choice of a labelled select. */
export interface SelectOption {
  value: string;
  label: string;
}

/** Props of a select with a visible label. */
export interface LabelledSelectProps {
  label: string;
  value: string;
  options: SelectOption[];
  onChange: (value: string) => void;
  disabled?: boolean;
  /** For tests and styling. */
  testId?: string;
}

/** A Radix select with a visible label tied to it. */
export function LabelledSelect({
  label,
  value,
  options,
  onChange,
  disabled,
  testId,
}: LabelledSelectProps) {
  const id = useId();
  return (
    <Flex direction="column" gap="1">
      <Text id={id} size="1" weight="medium" color="gray">
        {label}
      </Text>
      <Select.Root value={value} onValueChange={onChange} disabled={disabled} size="2">
        <Select.Trigger aria-labelledby={id} data-testid={testId} />
        <Select.Content position="popper">
          {options.map((o) => (
            <Select.Item key={o.value} value={o.value}>
              {o.label}
            </Select.Item>
          ))}
        </Select.Content>
      </Select.Root>
    </Flex>
  );
}
