// The take player's transport as pure state and a reducer: the current frame, play/pause, single
// steps, a loop range (in/out) and the playback rate. Every frame here is a shot frame number
// (first … last, e.g. 1001 … 1048); only the viewer converts to the take's own index
// (shot-frames.ts).
import { clampShotFrame, type ShotFrameRange } from './shot-frames';

/** Where the transport is. */
export interface TransportState {
  /** First and last shot frame of the take. */
  first: number;
  last: number;
  /** Current shot frame. */
  frame: number;
  playing: boolean;
  /** Loop range in shot frames, inclusive; the whole take unless the user set in or out. */
  rangeIn: number;
  rangeOut: number;
  /** Wrap from out to in (on) or stop at out (off). */
  loop: boolean;
  /** Playback rate in frames per second. */
  fps: number;
  /** Fraction of a frame carried between ticks, so playback keeps the rate exactly. */
  carry: number;
}

/** What the transport can be asked to do. */
export type TransportAction =
  | { type: 'play' }
  | { type: 'pause' }
  | { type: 'toggle' }
  | { type: 'step'; by: number }
  | { type: 'seek'; frame: number }
  | { type: 'setIn'; frame?: number }
  | { type: 'setOut'; frame?: number }
  | { type: 'clearRange' }
  | { type: 'toRangeStart' }
  | { type: 'toRangeEnd' }
  | { type: 'setLoop'; loop: boolean }
  | { type: 'setFps'; fps: number }
  | { type: 'tick'; seconds: number }
  | { type: 'reset'; range: ShotFrameRange; fps: number; frame?: number };

/** Longest wall-clock gap one tick may cover: a hidden tab must not skip half the shot. */
export const MAX_TICK_SECONDS = 0.25;

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/** A stopped transport at shot frame `frame` (default: the first) over the whole take, looping. */
export function initialTransport(
  range: ShotFrameRange,
  fps: number,
  frame = range.first,
): TransportState {
  const first = Math.round(range.first);
  const last = Math.max(first, Math.round(range.last));
  return {
    first,
    last,
    frame: clampShotFrame(frame, { first, last }),
    playing: false,
    rangeIn: first,
    rangeOut: last,
    loop: true,
    fps: fps > 0 ? fps : 24,
    carry: 0,
  };
}

/** Moves playback on by `seconds` of wall-clock time at the playback rate. */
function advance(s: TransportState, seconds: number): TransportState {
  if (!s.playing) return s;
  const carry = s.carry + clamp(seconds, 0, MAX_TICK_SECONDS) * s.fps;
  const whole = Math.floor(carry);
  if (whole === 0) return { ...s, carry };
  const span = s.rangeOut - s.rangeIn + 1;
  const next = s.frame + whole;
  // Without looping, playback ends on the out frame itself.
  if (!s.loop && next >= s.rangeOut) return { ...s, frame: s.rangeOut, playing: false, carry: 0 };
  if (next <= s.rangeOut) return { ...s, frame: next, carry: carry - whole };
  return { ...s, frame: s.rangeIn + ((next - s.rangeIn) % span), carry: carry - whole };
}

/** The next transport state. */
export function transportReducer(s: TransportState, a: TransportAction): TransportState {
  const { first, last } = s;
  switch (a.type) {
    case 'play': {
      if (s.playing) return s;
      // Starting outside the range, or parked on its end, begins again at its start.
      const outside = s.frame < s.rangeIn || s.frame >= s.rangeOut;
      return { ...s, playing: true, carry: 0, frame: outside ? s.rangeIn : s.frame };
    }
    case 'pause':
      return s.playing ? { ...s, playing: false, carry: 0 } : s;
    case 'toggle':
      return transportReducer(s, { type: s.playing ? 'pause' : 'play' });
    case 'step':
      return {
        ...s,
        playing: false,
        carry: 0,
        frame: clamp(s.frame + Math.trunc(a.by), first, last),
      };
    case 'seek':
      return { ...s, carry: 0, frame: clamp(Math.round(a.frame), first, last) };
    case 'setIn': {
      const frame = clamp(Math.round(a.frame ?? s.frame), first, last);
      return { ...s, rangeIn: frame, rangeOut: Math.max(frame, s.rangeOut) };
    }
    case 'setOut': {
      const frame = clamp(Math.round(a.frame ?? s.frame), first, last);
      return { ...s, rangeOut: frame, rangeIn: Math.min(frame, s.rangeIn) };
    }
    case 'clearRange':
      return { ...s, rangeIn: first, rangeOut: last };
    case 'toRangeStart':
      return { ...s, playing: false, carry: 0, frame: s.rangeIn };
    case 'toRangeEnd':
      return { ...s, playing: false, carry: 0, frame: s.rangeOut };
    case 'setLoop':
      return { ...s, loop: a.loop };
    case 'setFps':
      return a.fps > 0 && Number.isFinite(a.fps) ? { ...s, fps: a.fps, carry: 0 } : s;
    case 'tick':
      return advance(s, a.seconds);
    case 'reset':
      return initialTransport(a.range, a.fps, a.frame);
  }
}

/** True when the range is narrower than the whole take. */
export function hasCustomRange(s: TransportState): boolean {
  return s.rangeIn > s.first || s.rangeOut < s.last;
}
