import { Flex, Grid, Heading, Slider, Switch, Text, TextField } from '@radix-ui/themes';
import { FormField } from '@/components/ui/form-field';
import type { ControlErrors, ControlField, ControlValues } from './controls-values';

/** Props of the controls fields. */
export interface ControlsFieldsProps {
  value: ControlValues;
  onChange: (value: ControlValues) => void;
  errors: ControlErrors;
}

interface NumberSpec {
  field: ControlField;
  label: string;
  hint: string;
  min: number;
  max: number;
  step: number;
}

const MAIN: NumberSpec[] = [
  {
    field: 'gain',
    label: 'Gain',
    hint: 'Scales all tissue motion; 1 is as learned.',
    min: 0,
    max: 3,
    step: 0.05,
  },
  {
    field: 'stiffness',
    label: 'Stiffness',
    hint: 'Multiplies every mode’s frequency.',
    min: 0.25,
    max: 4,
    step: 0.05,
  },
  {
    field: 'damping',
    label: 'Damping',
    hint: 'Multiplies every mode’s damping ratio.',
    min: 0.25,
    max: 4,
    step: 0.05,
  },
  {
    field: 'prerollSeconds',
    label: 'Pre-roll (s)',
    hint: 'The first pose is held this long so the shot starts at rest.',
    min: 0,
    max: 5,
    step: 0.1,
  },
];

/** A number typed or dragged: a text field for the exact value and a slider beside it. */
function NumberControl({
  spec,
  raw,
  error,
  disabled,
  onChange,
}: {
  spec: NumberSpec;
  raw: string;
  error?: string;
  disabled?: boolean;
  onChange: (raw: string) => void;
}) {
  const n = Number(raw);
  return (
    <FormField label={spec.label} hint={spec.hint} error={error}>
      {(control) => (
        <Flex gap="3" align="center">
          <TextField.Root
            {...control}
            className="mono"
            type="number"
            step={spec.step}
            value={raw}
            disabled={disabled}
            onChange={(e) => onChange(e.target.value)}
            style={{ width: 96 }}
          />
          <Slider
            size="1"
            min={spec.min}
            max={spec.max}
            step={spec.step}
            disabled={disabled}
            value={[Number.isFinite(n) ? Math.min(spec.max, Math.max(spec.min, n)) : spec.min]}
            onValueChange={([v]) => onChange(String(Number(v.toFixed(3))))}
            aria-label={`${spec.label} slider`}
          />
        </Flex>
      )}
    </FormField>
  );
}

/** Gain, region gains, stiffness, damping, pre-roll, physical scaling and the displacement clamp. */
export function ControlsFields({ value, onChange, errors }: ControlsFieldsProps) {
  const set = (change: Partial<ControlValues>) => onChange({ ...value, ...change });
  const regions = Object.keys(value.regionGains);
  return (
    <Flex direction="column" gap="4" data-testid="controls-fields">
      <Grid columns={{ initial: '1', sm: '2' }} gap="4">
        {MAIN.map((spec) => (
          <NumberControl
            key={spec.field}
            spec={spec}
            raw={value[spec.field]}
            error={errors[spec.field]}
            onChange={(raw) => set({ [spec.field]: raw })}
          />
        ))}
      </Grid>
      <Grid columns={{ initial: '1', sm: '2' }} gap="4">
        <Flex direction="column" gap="2">
          <Text as="label" size="2" weight="medium">
            <Flex gap="2" align="center">
              <Switch
                checked={value.physicalScaling}
                onCheckedChange={(physicalScaling) => set({ physicalScaling })}
              />
              Physical size scaling
            </Flex>
          </Text>
          <Text size="1" color="gray">
            On: frequencies follow the character’s size. Off: frequencies kept as learned
            (stylised).
          </Text>
          <NumberControl
            spec={{
              field: 'sizeExponent',
              label: 'Size exponent',
              hint: '−0.5 for gravity-led tissue, −1 for elastic.',
              min: -1.5,
              max: 0,
              step: 0.05,
            }}
            raw={value.sizeExponent}
            error={errors.sizeExponent}
            disabled={!value.physicalScaling}
            onChange={(sizeExponent) => set({ sizeExponent })}
          />
        </Flex>
        <Flex direction="column" gap="2">
          <Text as="label" size="2" weight="medium">
            <Flex gap="2" align="center">
              <Switch
                checked={value.clampDisplacement}
                onCheckedChange={(clampDisplacement) => set({ clampDisplacement })}
              />
              Limit displacement
            </Flex>
          </Text>
          <Text size="1" color="gray">
            Softly caps how far any vertex moves, for shots that go too far.
          </Text>
          <FormField label="Largest displacement (m)" error={errors.maxDisplacement}>
            {(control) => (
              <TextField.Root
                {...control}
                className="mono"
                type="number"
                step={0.005}
                value={value.maxDisplacement}
                disabled={!value.clampDisplacement}
                onChange={(e) => set({ maxDisplacement: e.target.value })}
                style={{ width: 120 }}
              />
            )}
          </FormField>
        </Flex>
      </Grid>
      {regions.length > 0 ? (
        <Flex direction="column" gap="2" role="group" aria-labelledby="region-gains-heading">
          <Heading as="h3" size="2" id="region-gains-heading">
            Region gains
          </Heading>
          <Text size="1" color="gray">
            Per body region, on top of the gain; blended smoothly at region borders.
          </Text>
          <Grid columns={{ initial: '1', sm: '2', md: '3' }} gap="3">
            {regions.map((region) => (
              <NumberControl
                key={region}
                spec={{ field: 'gain', label: region, hint: '', min: 0, max: 3, step: 0.05 }}
                raw={value.regionGains[region]}
                error={errors[`region:${region}`]}
                onChange={(raw) => set({ regionGains: { ...value.regionGains, [region]: raw } })}
              />
            ))}
          </Grid>
        </Flex>
      ) : null}
    </Flex>
  );
}
