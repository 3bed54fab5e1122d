import { Button, Flex, Select, Switch, Text } from '@radix-ui/themes';
import type { CSSProperties, Dispatch } from 'react';
import { Mono } from '@/components/ui/mono';
import { KeyHint } from '@/components/ui/key-hint';
import {
  hasCustomRange,
  type TransportAction,
  type TransportState,
} from '../transport/transport-state';
import { BracketIcon, PauseIcon, PlayIcon, StepIcon } from './transport-icons';

/** Playback rates offered besides the shot's own. */
const COMMON_RATES = [12, 24, 25, 30, 48, 60];

/** Props of the transport. */
export interface TransportBarProps {
  state: TransportState;
  /** The shot's own rate (the default). */
  shotFps: number;
  dispatch: Dispatch<TransportAction>;
}

/** Play, pause, step, the loop range, the playback rate and the frame counter (shot frames). */
export function TransportBar({ state, shotFps, dispatch }: TransportBarProps) {
  const { first, last } = state;
  const rates = [...new Set([shotFps, ...COMMON_RATES])].sort((a, b) => a - b);
  const pct = (f: number) => (last > first ? ((f - first) / (last - first)) * 100 : 0);
  // The loop range shows on the scrubber's track as a lighter band.
  const rangeStyle = {
    '--range-in': `${pct(state.rangeIn)}%`,
    '--range-out': `${pct(state.rangeOut)}%`,
  } as CSSProperties;

  return (
    <Flex direction="column" gap="2" className="take-transport" data-testid="transport">
      <Flex align="center" gap="3">
        <label htmlFor="take-scrubber" className="take-label">
          Frame
        </label>
        <input
          id="take-scrubber"
          className="take-range take-scrubber"
          type="range"
          min={first}
          max={last}
          step={1}
          value={state.frame}
          style={rangeStyle}
          aria-valuetext={`Frame ${state.frame} of ${first}–${last}`}
          onChange={(e) => dispatch({ type: 'seek', frame: Number(e.target.value) })}
        />
        <Mono size="3" data-testid="frame-counter" aria-live="off">
          {state.frame}
        </Mono>
        <Mono size="1" color="gray" data-testid="frame-range">
          {first}–{last}
        </Mono>
      </Flex>
      <Flex align="center" gap="2" wrap="wrap">
        <Button variant="soft" color="gray" onClick={() => dispatch({ type: 'step', by: -1 })}>
          <StepIcon /> Back <KeyHint command="stepBack" />
        </Button>
        <Button
          onClick={() => dispatch({ type: 'toggle' })}
          aria-pressed={state.playing}
          data-testid="play-toggle"
          className="take-play-button"
        >
          {state.playing ? <PauseIcon /> : <PlayIcon />}
          {state.playing ? 'Pause' : 'Play'} <KeyHint command="togglePlay" />
        </Button>
        <Button variant="soft" color="gray" onClick={() => dispatch({ type: 'step', by: 1 })}>
          Forward <StepIcon forward /> <KeyHint command="stepForward" />
        </Button>
        <span className="take-transport-gap" />
        <Button variant="soft" color="gray" onClick={() => dispatch({ type: 'setIn' })}>
          <BracketIcon /> Loop in <KeyHint command="setIn" />
        </Button>
        <Button variant="soft" color="gray" onClick={() => dispatch({ type: 'setOut' })}>
          Loop out <BracketIcon out /> <KeyHint command="setOut" />
        </Button>
        <Button
          variant="ghost"
          color="gray"
          disabled={!hasCustomRange(state)}
          onClick={() => dispatch({ type: 'clearRange' })}
        >
          Clear range <KeyHint command="clearRange" />
        </Button>
        <Mono size="1" color="gray" data-testid="loop-range">
          {state.rangeIn}–{state.rangeOut}
        </Mono>
      </Flex>
      <Flex align="center" gap="4" wrap="wrap">
        <Text as="label" size="2">
          <Flex gap="2" align="center">
            <Switch
              size="1"
              checked={state.loop}
              onCheckedChange={(loop) => dispatch({ type: 'setLoop', loop })}
            />
            Loop the range <KeyHint command="toggleLoop" />
          </Flex>
        </Text>
        <Flex gap="2" align="center">
          <Text size="2" id="take-rate-label">
            Playback rate
          </Text>
          <Select.Root
            size="1"
            value={String(state.fps)}
            onValueChange={(v) => dispatch({ type: 'setFps', fps: Number(v) })}
          >
            <Select.Trigger aria-labelledby="take-rate-label" className="mono" />
            <Select.Content>
              {rates.map((r) => (
                <Select.Item key={r} value={String(r)}>
                  {r} fps{r === shotFps ? ' (shot)' : ''}
                </Select.Item>
              ))}
            </Select.Content>
          </Select.Root>
        </Flex>
      </Flex>
    </Flex>
  );
}
