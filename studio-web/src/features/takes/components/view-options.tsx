import { Button, Flex, SegmentedControl, Select, Switch, Text } from '@radix-ui/themes';
import type { Mode } from '@overshoot/solver';
import { KeyHint } from '@/components/ui/key-hint';
import type { Take } from '../api/take-view';
import type { CompareKind } from '../player/take-viewer';
import type { CompareLayout } from '../player/viewport-stage';

/** What the viewer is set to show. */
export interface ViewSettings {
  compare: CompareKind;
  /** The compared take when `compare` is "take". */
  otherTakeId: string | null;
  layout: CompareLayout;
  heatMap: boolean;
  /** The camera travels with the character. */
  follow: boolean;
}

/** Props of the view options. */
export interface ViewOptionsProps {
  settings: ViewSettings;
  onChange: (patch: Partial<ViewSettings>) => void;
  /** The shot's other takes, to compare with. */
  otherTakes: Take[];
  /** Modes of the take, for playing one alone. */
  modes: Mode[];
  solo: number | null;
  onSolo: (mode: number | null) => void;
  /** Points the camera at the character again. */
  onFrameCharacter: () => void;
}

const NONE = 'none';
const SKINNING = 'skinning';

/** Describes a mode in a few words: number, region, frequency. */
export function modeLabel(mode: Mode, index: number): string {
  return `Mode ${index + 1} · ${mode.region} · ${mode.frequencyHz.toFixed(2)} Hz`;
}

/** Compare, heat map and mode solo: how the take is looked at (nothing here is saved). */
export function ViewOptions({
  settings,
  onChange,
  otherTakes,
  modes,
  solo,
  onSolo,
  onFrameCharacter,
}: ViewOptionsProps) {
  const compareValue =
    settings.compare === 'take' && settings.otherTakeId ? settings.otherTakeId : settings.compare;
  return (
    <Flex gap="4" align="end" wrap="wrap" className="take-view-options" data-testid="view-options">
      <Flex direction="column" gap="1">
        <Text size="1" color="gray" id="compare-label">
          Compare with
        </Text>
        <Select.Root
          size="2"
          value={compareValue}
          onValueChange={(v) => {
            if (v === NONE || v === SKINNING) onChange({ compare: v, otherTakeId: null });
            else onChange({ compare: 'take', otherTakeId: v });
          }}
        >
          <Select.Trigger aria-label="Compare with" data-testid="compare-select" />
          <Select.Content>
            <Select.Item value={NONE}>Nothing</Select.Item>
            <Select.Item value={SKINNING}>Skinning only</Select.Item>
            {otherTakes.length > 0 ? <Select.Separator /> : null}
            {otherTakes.map((t) => (
              <Select.Item key={t.id} value={t.id} disabled={t.solveState !== 'solved'}>
                Take v{t.version}
              </Select.Item>
            ))}
          </Select.Content>
        </Select.Root>
      </Flex>
      {settings.compare === 'none' ? null : (
        <Flex direction="column" gap="1">
          <Text size="1" color="gray">
            Compare layout
          </Text>
          <SegmentedControl.Root
            size="2"
            value={settings.layout}
            onValueChange={(v) => onChange({ layout: v as CompareLayout })}
            aria-label="Compare layout"
          >
            <SegmentedControl.Item value="side-by-side">Side by side</SegmentedControl.Item>
            <SegmentedControl.Item value="overlay">Overlaid</SegmentedControl.Item>
          </SegmentedControl.Root>
        </Flex>
      )}
      <Text as="label" size="2">
        <Flex gap="2" align="center" height="32px">
          <Switch checked={settings.follow} onCheckedChange={(follow) => onChange({ follow })} />
          Follow the character
        </Flex>
      </Text>
      <Flex height="32px" align="center">
        <Button variant="soft" color="gray" onClick={onFrameCharacter}>
          Frame the character <KeyHint command="frameCharacter" />
        </Button>
      </Flex>
      <Text as="label" size="2">
        <Flex gap="2" align="center" height="32px">
          <Switch
            checked={settings.heatMap}
            onCheckedChange={(heatMap) => onChange({ heatMap })}
            data-testid="heat-map-switch"
          />
          Heat map <KeyHint command="toggleHeatMap" />
        </Flex>
      </Text>
      <Flex direction="column" gap="1">
        <Text size="1" color="gray">
          Solo a mode
        </Text>
        <Select.Root
          size="2"
          value={solo === null ? 'all' : String(solo)}
          onValueChange={(v) => onSolo(v === 'all' ? null : Number(v))}
        >
          <Select.Trigger aria-label="Solo a mode" data-testid="solo-select" />
          <Select.Content>
            <Select.Item value="all">All modes</Select.Item>
            {modes.map((m, i) => (
              <Select.Item key={i} value={String(i)}>
                {modeLabel(m, i)}
              </Select.Item>
            ))}
          </Select.Content>
        </Select.Root>
      </Flex>
    </Flex>
  );
}
