import { Flex, Text } from '@radix-ui/themes';
import { Mono } from '@/components/ui/mono';
import { rampCssGradient } from '../player/colour-ramp';

/** Props of the legend. */
export interface HeatMapLegendProps {
  /** Offset at the top of the ramp, in millimetres. */
  scaleMm: number;
  /** A line about what is shown, e.g. the soloed mode. */
  note?: string | null;
}

const fmt = (mm: number) => (mm >= 10 ? mm.toFixed(0) : mm >= 1 ? mm.toFixed(1) : mm.toFixed(2));

/** The heat map's colour ramp with its scale in millimetres of dynamic offset. */
export function HeatMapLegend({ scaleMm, note }: HeatMapLegendProps) {
  return (
    <Flex direction="column" gap="1" className="take-heat-legend" data-testid="heat-legend">
      <Text size="1" weight="medium">
        Dynamic offset (mm)
      </Text>
      <div
        className="take-heat-ramp"
        style={{ backgroundImage: rampCssGradient('to right') }}
        role="img"
        aria-label={`Colour ramp from 0 to ${fmt(scaleMm)} millimetres`}
      />
      <Flex justify="between">
        <Mono size="1">0</Mono>
        <Mono size="1">{fmt(scaleMm / 2)}</Mono>
        <span>
          <Mono size="1" data-testid="heat-scale">
            {fmt(scaleMm)}
          </Mono>
          <Mono size="1" aria-label="or more">
            +
          </Mono>
        </span>
      </Flex>
      <Text size="1" color="gray">
        Nineteen frames in twenty stay below the top colour.
      </Text>
      {note ? (
        <Text size="1" color="gray">
          {note}
        </Text>
      ) : null}
    </Flex>
  );
}
