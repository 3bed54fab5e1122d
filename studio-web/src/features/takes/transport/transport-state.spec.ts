import { describe, expect, it } from 'vitest';
import {
  initialTransport,
  MAX_TICK_SECONDS,
  transportReducer,
  type TransportAction,
  type TransportState,
} from './transport-state';

const run = (s: TransportState, ...actions: TransportAction[]) =>
  actions.reduce(transportReducer, s);

describe('transport', () => {
  it('starts stopped on the requested frame with the whole take as its loop range', () => {
    const s = initialTransport(100, 24, 12);
    expect(s).toMatchObject({ frame: 12, playing: false, rangeIn: 0, rangeOut: 99, fps: 24 });
  });

  it('steps one frame at a time, pauses playback, and stops at either end', () => {
    let s = run(initialTransport(10, 24, 5), { type: 'play' }, { type: 'step', by: 1 });
    expect(s).toMatchObject({ frame: 6, playing: false });
    s = run(s, { type: 'step', by: -10 });
    expect(s.frame).toBe(0);
    s = run(s, { type: 'step', by: 100 });
    expect(s.frame).toBe(9);
  });

  it('advances by the playback rate, carrying fractions of a frame between ticks', () => {
    // 24 fps: 1/48 s is half a frame, so two such ticks make exactly one frame.
    let s = run(initialTransport(100, 24), { type: 'play' }, { type: 'tick', seconds: 1 / 48 });
    expect(s.frame).toBe(0);
    s = run(s, { type: 'tick', seconds: 1 / 48 });
    expect(s.frame).toBe(1);
    s = run(s, { type: 'setFps', fps: 12 }, { type: 'tick', seconds: 0.25 });
    expect(s.frame).toBe(4);
  });

  it('never jumps more than MAX_TICK_SECONDS of frames in one tick (a hidden tab)', () => {
    const s = run(initialTransport(1000, 24), { type: 'play' }, { type: 'tick', seconds: 30 });
    expect(s.frame).toBe(Math.floor(MAX_TICK_SECONDS * 24));
  });

  it('wraps from loop out back to loop in while looping', () => {
    let s = run(
      initialTransport(100, 10, 20),
      { type: 'setIn' },
      { type: 'seek', frame: 24 },
      { type: 'setOut' },
      { type: 'seek', frame: 23 },
      { type: 'play' },
    );
    expect(s).toMatchObject({ rangeIn: 20, rangeOut: 24, frame: 23, playing: true });
    // 0.2 s at 10 fps = 2 frames: 23 → 24 → 20.
    s = run(s, { type: 'tick', seconds: 0.2 });
    expect(s.frame).toBe(20);
    expect(s.playing).toBe(true);
  });

  it('stops on loop out when looping is off', () => {
    const s = run(
      initialTransport(30, 10, 27),
      { type: 'setLoop', loop: false },
      { type: 'play' },
      { type: 'tick', seconds: 0.25 },
    );
    expect(s).toMatchObject({ frame: 29, playing: false });
  });

  it('starts again from loop in when play is pressed outside the range or on its end', () => {
    const ranged = run(
      initialTransport(50, 24, 10),
      { type: 'setIn' },
      { type: 'seek', frame: 20 },
    );
    const fromEnd = run(ranged, { type: 'setOut' }, { type: 'play' });
    expect(fromEnd.frame).toBe(10);
    const fromOutside = run(
      ranged,
      { type: 'setOut' },
      { type: 'seek', frame: 40 },
      { type: 'play' },
    );
    expect(fromOutside.frame).toBe(10);
  });

  it('keeps in ≤ out when either is set past the other, and clears back to the whole take', () => {
    let s = run(initialTransport(50, 24, 30), { type: 'setOut' }, { type: 'setIn', frame: 40 });
    expect([s.rangeIn, s.rangeOut]).toEqual([40, 40]);
    s = run(s, { type: 'setOut', frame: 5 });
    expect([s.rangeIn, s.rangeOut]).toEqual([5, 5]);
    s = run(s, { type: 'clearRange' });
    expect([s.rangeIn, s.rangeOut]).toEqual([0, 49]);
  });

  it('goes to the range ends and ignores a playback rate that is not a positive number', () => {
    let s = run(
      initialTransport(50, 24, 3),
      { type: 'setIn', frame: 5 },
      { type: 'setOut', frame: 9 },
    );
    expect(run(s, { type: 'toRangeEnd' }).frame).toBe(9);
    expect(run(s, { type: 'toRangeStart' }).frame).toBe(5);
    s = run(s, { type: 'setFps', fps: 0 }, { type: 'setFps', fps: Number.NaN });
    expect(s.fps).toBe(24);
  });
});
