import { Button, Card, Flex, Grid, Heading, Text } from '@radix-ui/themes';
import { memo } from 'react';
import { Mono } from '@/components/ui/mono';
import type { Take } from '../api/take-view';
import type { LiveTuningApi, TuningControls } from '../hooks/use-live-tuning';
import type { TakeModel } from '../player/take-model';
import { ModeTable } from './mode-table';
import { SaveTake } from './save-take';
import { SliderRow } from './slider-row';

/** Props of the controls panel. */
export interface ControlsPanelProps {
  showId: string;
  take: Take;
  model: TakeModel;
  tuning: LiveTuningApi;
  /** The user may save the tuned controls as a new take. */
  canSave: boolean;
}

/** The three whole-take sliders; stiffness and damping stop short of 0, where nothing settles. */
const DYNAMICS = [
  { key: 'gain', label: 'Gain', min: 0 },
  { key: 'stiffness', label: 'Stiffness', min: 0.25 },
  { key: 'damping', label: 'Damping', min: 0.25 },
] as const satisfies readonly { key: keyof TuningControls; label: string; min: number }[];

const fmtMs = (ms: number | null) => (ms === null ? '–' : ms.toFixed(1));

/** Gain, stiffness, damping, region gains and mode mutes, applied live while they move. */
export const ControlsPanel = memo(function ControlsPanel({
  showId,
  take,
  model,
  tuning,
  canSave,
}: ControlsPanelProps) {
  const { controls, initial, timing } = tuning;
  const base = model.take.extras.controls;
  const full: Record<string, unknown> = {
    ...base,
    gain: controls.gain,
    stiffness: controls.stiffness,
    damping: controls.damping,
    regionGains: controls.regionGains,
    mutedModes: controls.mutedModes,
    // Solo is a way of looking, not a control to keep.
    soloModes: [],
  };
  return (
    <Card asChild>
      <section aria-labelledby="controls-heading" data-testid="controls-panel">
        <Flex direction="column" gap="4">
          <Flex justify="between" align="center">
            <Heading as="h2" size="4" id="controls-heading">
              Controls
            </Heading>
            <Button
              size="1"
              variant="ghost"
              color="gray"
              disabled={!tuning.changed}
              onClick={tuning.reset}
            >
              Back to the take's controls
            </Button>
          </Flex>
          <Flex direction="column" gap="3">
            {DYNAMICS.map(({ key, label, min }) => (
              <SliderRow
                key={key}
                label={label}
                value={controls[key]}
                min={min}
                max={4}
                step={0.05}
                unit=" ×"
                original={initial[key]}
                onChange={(v) => tuning.update({ [key]: v })}
                testId={`control-${key}`}
              />
            ))}
          </Flex>
          <Flex direction="column" gap="2">
            <Heading as="h3" size="2">
              Region gains
            </Heading>
            <Grid columns="2" gapX="4" gapY="2">
              {model.regionNames.map((region) => (
                <SliderRow
                  key={region}
                  label={region}
                  value={controls.regionGains[region] ?? 1}
                  min={0}
                  max={4}
                  step={0.05}
                  unit=" ×"
                  original={initial.regionGains[region] ?? 1}
                  onChange={(g) =>
                    tuning.update({ regionGains: { ...controls.regionGains, [region]: g } })
                  }
                  testId={`control-region-${region}`}
                />
              ))}
            </Grid>
            {tuning.lostVertices > 0 ? (
              <Text size="1" color="amber">
                {tuning.lostVertices} vertices had a gain of 0 in this take and cannot move live;
                save a new take to bring them back.
              </Text>
            ) : null}
          </Flex>
          <Flex direction="column" gap="2">
            <Heading as="h3" size="2">
              Modes
            </Heading>
            <ModeTable
              modes={model.take.extras.modes}
              stiffnessFactor={controls.stiffness / (base.stiffness || 1)}
              dampingFactor={controls.damping / (base.damping || 1)}
              muted={controls.mutedModes}
              solo={tuning.solo}
              onMute={(mode, muted) =>
                tuning.update({
                  mutedModes: muted
                    ? [...controls.mutedModes, mode].sort((a, b) => a - b)
                    : controls.mutedModes.filter((m) => m !== mode),
                })
              }
            />
          </Flex>
          <Flex gap="3" align="baseline" data-testid="tune-timing">
            <Text size="1" color="gray">
              Last update
            </Text>
            <Mono size="2" data-testid="tune-ms">
              {fmtMs(timing.last)}
            </Mono>
            <Text size="1" color="gray">
              ms · slowest
            </Text>
            <Mono size="2" data-testid="tune-ms-slowest">
              {fmtMs(timing.slowest)}
            </Mono>
            <Text size="1" color="gray">
              ms ({model.frameCount} frames, basis of {model.k})
            </Text>
          </Flex>
          {canSave ? (
            <SaveTake showId={showId} take={take} controls={full} changed={tuning.changed} />
          ) : null}
        </Flex>
      </section>
    </Card>
  );
});
