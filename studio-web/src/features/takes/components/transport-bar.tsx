import { Button, Flex, Kbd, Select, Switch, Text } from '@radix-ui/themes';
import type { CSSProperties, Dispatch } from 'react';
import { Mono } from '@/components/ui/mono';
import { shotFrameOf } from '../review/note-frames';
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
  /** Shot frame number of frame index 0. */
  frameStart: number;
  /** The shot's own rate (the default). */
  shotFps: number;
  dispatch: Dispatch<TransportAction>;
}

/** Play, pause, step, the loop range, the playback rate and the frame counter. */
export function TransportBar({ state, frameStart, shotFps, dispatch }: TransportBarProps) {
  const last = state.frameCount - 1;
  const rates = [...new Set([shotFps, ...COMMON_RATES])].sort((a, b) => a - b);
  const pct = (i: number) => (last > 0 ? (i / last) * 100 : 0);
  // The loop range shows on the scrubber's track as a lighter band.
  const rangeStyle = {
    '--range-in': `${pct(state.rangeIn)}%`,
    '--range-out': `${pct(state.rangeOut)}%`,
  } as CSSProperties;
  const shot = (i: number) => shotFrameOf(i, frameStart);

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
          min={0}
          max={last}
          step={1}
          value={state.frame}
          style={rangeStyle}
          aria-valuetext={`Frame ${shot(state.frame)}`}
          onChange={(e) => dispatch({ type: 'seek', frame: Number(e.target.value) })}
        />
        <Mono size="3" data-testid="frame-counter" aria-live="off">
          {shot(state.frame)}
        </Mono>
        <Mono size="1" color="gray">
          {shot(0)}–{shot(last)}
        </Mono>
      </Flex>
      <Flex align="center" gap="2" wrap="wrap">
        <Button variant="soft" color="gray" onClick={() => dispatch({ type: 'step', by: -1 })}>
          <StepIcon /> Back <Kbd size="1">,</Kbd>
        </Button>
        <Button
          onClick={() => dispatch({ type: 'toggle' })}
          aria-pressed={state.playing}
          data-testid="play-toggle"
          className="take-play-button"
        >
          {state.playing ? <PauseIcon /> : <PlayIcon />}
          {state.playing ? 'Pause' : 'Play'} <Kbd size="1">Space</Kbd>
        </Button>
        <Button variant="soft" color="gray" onClick={() => dispatch({ type: 'step', by: 1 })}>
          Forward <StepIcon forward /> <Kbd size="1">.</Kbd>
        </Button>
        <span className="take-transport-gap" />
        <Button variant="soft" color="gray" onClick={() => dispatch({ type: 'setIn' })}>
          <BracketIcon /> Loop in <Kbd size="1">[</Kbd>
        </Button>
        <Button variant="soft" color="gray" onClick={() => dispatch({ type: 'setOut' })}>
          Loop out <BracketIcon out /> <Kbd size="1">]</Kbd>
        </Button>
        <Button
          variant="ghost"
          color="gray"
          disabled={!hasCustomRange(state)}
          onClick={() => dispatch({ type: 'clearRange' })}
        >
          Clear range
        </Button>
        <Mono size="1" color="gray" data-testid="loop-range">
          {shot(state.rangeIn)}–{shot(state.rangeOut)}
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
            Loop the range <Kbd size="1">R</Kbd>
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
