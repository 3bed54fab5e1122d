import { Flex, Text } from '@radix-ui/themes';
import { useId } from 'react';
import { Mono } from '@/components/ui/mono';

/** Props of one labelled control slider. */
export interface SliderRowProps {
  label: string;
  value: number;
  min: number;
  max: number;
  step: number;
  /** Shown after the value, e.g. "×". */
  unit?: string;
  onChange: (value: number) => void;
  /** The take's own value, marked so the user sees how far they moved. */
  original?: number;
  testId?: string;
}

/** A labelled slider with its value in mono; moves call `onChange` continuously. */
export function SliderRow({
  label,
  value,
  min,
  max,
  step,
  unit = '',
  onChange,
  original,
  testId,
}: SliderRowProps) {
  const id = useId();
  const moved = original !== undefined && Math.abs(original - value) > 1e-9;
  return (
    <Flex direction="column" gap="1" className="take-slider-row">
      <Flex justify="between" align="baseline" gap="2">
        <Text as="label" htmlFor={id} size="2">
          {label}
        </Text>
        <Mono size="2" color={moved ? 'amber' : undefined}>
          {value.toFixed(2)}
          {unit}
        </Mono>
      </Flex>
      <input
        id={id}
        className="take-range"
        type="range"
        min={min}
        max={max}
        step={step}
        value={value}
        data-testid={testId}
        onChange={(e) => onChange(Number(e.target.value))}
      />
    </Flex>
  );
}
