import { describe, expect, it } from 'vitest';
import { lastShotFrame, shotClipFrames } from './shot-frames';

describe('shot frames in the clip', () => {
  it('starts the clip at the shot’s first frame, whatever its number', () => {
    expect(shotClipFrames({ frameStart: 1001, frameEnd: 1100, fps: 24 })).toEqual([0, 99]);
    expect(shotClipFrames({ frameStart: 0, frameEnd: 99, fps: 24 })).toEqual([0, 99]);
  });

  it('reaches the clip’s last frame from the first: 600 frames at 60 fps end at 1001 + 599', () => {
    expect(lastShotFrame({ frameStart: 1001, frameEnd: 1001, fps: 60 }, 600, 60)).toBe(1600);
  });

  it('counts at the shot’s rate: 599 / 60 s at 24 fps is 239.6 frames, so frame 1001 + 239', () => {
    expect(lastShotFrame({ frameStart: 1001, frameEnd: 1001, fps: 24 }, 600, 60)).toBe(1240);
  });

  it('keeps a last frame that lands exactly on the clip’s end: 239 / 24 s at 48 fps is 478', () => {
    expect(lastShotFrame({ frameStart: 0, frameEnd: 0, fps: 48 }, 240, 24)).toBe(478);
    // Floating-point rounding: 3 frames at 30 fps span 2 / 30 s, which at 90 fps is 6 frames.
    expect(lastShotFrame({ frameStart: 10, frameEnd: 10, fps: 90 }, 3, 30)).toBe(16);
  });
});
