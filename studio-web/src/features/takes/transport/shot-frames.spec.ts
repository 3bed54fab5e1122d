import { describe, expect, it } from 'vitest';
import { nextNoteFrame } from '../review/note-frames';
import {
  clampShotFrame,
  frameCountOf,
  shotFrameAt,
  takeFrameRange,
  takeIndexOf,
} from './shot-frames';
import { initialTransport, transportReducer } from './transport-state';

// A 48-frame take of a shot numbered from 1001 (frames 1001 … 1048).
const RANGE = takeFrameRange(1001, 48);

describe('shot frames and take frames', () => {
  it('number a take’s frames from the shot’s first frame', () => {
    expect(RANGE).toEqual({ first: 1001, last: 1048 });
    expect(frameCountOf(RANGE)).toBe(48);
    expect(shotFrameAt(0, RANGE)).toBe(1001);
    expect(shotFrameAt(47, RANGE)).toBe(1048);
  });

  it('show shot frame 1010 with the take’s tenth frame (index 9)', () => {
    expect(takeIndexOf(1010, RANGE)).toBe(9);
    expect(takeIndexOf(1001, RANGE)).toBe(0);
    expect(takeIndexOf(1048, RANGE)).toBe(47);
  });

  it('go there and back for every frame of the take', () => {
    for (let i = 0; i < 48; i++) expect(takeIndexOf(shotFrameAt(i, RANGE), RANGE)).toBe(i);
  });

  it('keep frames outside the shot at its ends instead of posing a frame the take lacks', () => {
    expect(clampShotFrame(12, RANGE)).toBe(1001);
    expect(takeIndexOf(12, RANGE)).toBe(0);
    expect(takeIndexOf(2000, RANGE)).toBe(47);
    expect(takeIndexOf(1010.4, RANGE)).toBe(9);
  });

  it('send a note at frame 1010 to the take’s tenth frame through the transport', () => {
    const s = transportReducer(initialTransport(RANGE, 24), { type: 'seek', frame: 1010 });
    expect(s.frame).toBe(1010);
    expect(takeIndexOf(s.frame, RANGE)).toBe(9);
  });

  it('find the next and previous note frames from the frame on screen', () => {
    const frames = [1010, 1030, 1010, 1020];
    expect(nextNoteFrame(frames, 1001, 1)).toBe(1010);
    expect(nextNoteFrame(frames, 1010, 1)).toBe(1020);
    expect(nextNoteFrame(frames, 1030, 1)).toBeNull();
    expect(nextNoteFrame(frames, 1025, -1)).toBe(1020);
    expect(nextNoteFrame(frames, 1010, -1)).toBeNull();
  });
});
