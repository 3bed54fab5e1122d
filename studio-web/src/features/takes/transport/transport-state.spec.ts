import { describe, expect, it } from 'vitest';
import { takeFrameRange } from './shot-frames';
import {
  initialTransport,
  MAX_TICK_SECONDS,
  transportReducer,
  type TransportAction,
  type TransportState,
} from './transport-state';

const run = (s: TransportState, ...actions: TransportAction[]) =>
  actions.reduce(transportReducer, s);

// A shot that starts at frame 1001, as most do; every frame below is a shot frame.
const shot = (frames: number) => takeFrameRange(1001, frames);

describe('transport', () => {
  it('starts stopped on the requested shot frame with the whole take as its loop range', () => {
    const s = initialTransport(shot(100), 24, 1012);
    expect(s).toMatchObject({
      frame: 1012,
      playing: false,
      rangeIn: 1001,
      rangeOut: 1100,
      fps: 24,
    });
    expect(initialTransport(shot(100), 24).frame).toBe(1001);
  });

  it('steps one frame at a time, pauses playback, and stops at either end of the shot', () => {
    let s = run(initialTransport(shot(10), 24, 1005), { type: 'play' }, { type: 'step', by: 1 });
    expect(s).toMatchObject({ frame: 1006, playing: false });
    s = run(s, { type: 'step', by: -10 });
    expect(s.frame).toBe(1001);
    s = run(s, { type: 'step', by: 100 });
    expect(s.frame).toBe(1010);
  });

  it('advances by the playback rate, carrying fractions of a frame between ticks', () => {
    // 24 fps: 1/48 s is half a frame, so two such ticks make exactly one frame.
    let s = run(
      initialTransport(shot(100), 24),
      { type: 'play' },
      { type: 'tick', seconds: 1 / 48 },
    );
    expect(s.frame).toBe(1001);
    s = run(s, { type: 'tick', seconds: 1 / 48 });
    expect(s.frame).toBe(1002);
    s = run(s, { type: 'setFps', fps: 12 }, { type: 'tick', seconds: 0.25 });
    expect(s.frame).toBe(1005);
  });

  it('never jumps more than MAX_TICK_SECONDS of frames in one tick (a hidden tab)', () => {
    const s = run(
      initialTransport(shot(1000), 24),
      { type: 'play' },
      { type: 'tick', seconds: 30 },
    );
    expect(s.frame).toBe(1001 + Math.floor(MAX_TICK_SECONDS * 24));
  });

  it('wraps from loop out back to loop in while looping', () => {
    let s = run(
      initialTransport(shot(100), 10, 1021),
      { type: 'setIn' },
      { type: 'seek', frame: 1025 },
      { type: 'setOut' },
      { type: 'seek', frame: 1024 },
      { type: 'play' },
    );
    expect(s).toMatchObject({ rangeIn: 1021, rangeOut: 1025, frame: 1024, playing: true });
    // 0.2 s at 10 fps = 2 frames: 1024 → 1025 → 1021.
    s = run(s, { type: 'tick', seconds: 0.2 });
    expect(s.frame).toBe(1021);
    expect(s.playing).toBe(true);
  });

  it('stops on loop out when looping is off', () => {
    const s = run(
      initialTransport(shot(30), 10, 1028),
      { type: 'setLoop', loop: false },
      { type: 'play' },
      { type: 'tick', seconds: 0.25 },
    );
    expect(s).toMatchObject({ frame: 1030, playing: false });
  });

  it('starts again from loop in when play is pressed outside the range or on its end', () => {
    const ranged = run(
      initialTransport(shot(50), 24, 1011),
      { type: 'setIn' },
      { type: 'seek', frame: 1021 },
    );
    const fromEnd = run(ranged, { type: 'setOut' }, { type: 'play' });
    expect(fromEnd.frame).toBe(1011);
    const fromOutside = run(
      ranged,
      { type: 'setOut' },
      { type: 'seek', frame: 1041 },
      { type: 'play' },
    );
    expect(fromOutside.frame).toBe(1011);
  });

  it('keeps in ≤ out when either is set past the other, and clears back to the whole take', () => {
    let s = run(
      initialTransport(shot(50), 24, 1031),
      { type: 'setOut' },
      { type: 'setIn', frame: 1041 },
    );
    expect([s.rangeIn, s.rangeOut]).toEqual([1041, 1041]);
    s = run(s, { type: 'setOut', frame: 1006 });
    expect([s.rangeIn, s.rangeOut]).toEqual([1006, 1006]);
    s = run(s, { type: 'clearRange' });
    expect([s.rangeIn, s.rangeOut]).toEqual([1001, 1050]);
  });

  it('keeps seeks and loop points inside the shot: a 0-based take frame is not a shot frame', () => {
    const s = run(initialTransport(shot(50), 24), { type: 'seek', frame: 9 }, { type: 'setIn' });
    expect([s.frame, s.rangeIn]).toEqual([1001, 1001]);
    expect(run(s, { type: 'seek', frame: 5000 }).frame).toBe(1050);
  });

  it('goes to the range ends and ignores a playback rate that is not a positive number', () => {
    let s = run(
      initialTransport(shot(50), 24, 1004),
      { type: 'setIn', frame: 1006 },
      { type: 'setOut', frame: 1010 },
    );
    expect(run(s, { type: 'toRangeEnd' }).frame).toBe(1010);
    expect(run(s, { type: 'toRangeStart' }).frame).toBe(1006);
    s = run(s, { type: 'setFps', fps: 0 }, { type: 'setFps', fps: Number.NaN });
    expect(s.fps).toBe(24);
  });
});
