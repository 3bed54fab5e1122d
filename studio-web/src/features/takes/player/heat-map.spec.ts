import { describe, expect, it } from 'vitest';
import { niceCeil, rampCssGradient, rampSrgb, RAMP_STOPS } from './colour-ramp';
import { framePeaks, offsetMagnitudes, robustPeak } from './heat-map';

// Two vertices, two modes; basis column-major by mode: [v0x v0y v0z v1x v1y v1z] per mode.
const BASIS = Float32Array.from([
  // mode 0: v0 moves along x, v1 along y
  1, 0, 0, 0, 2, 0,
  // mode 1: v0 moves along y, v1 not at all
  0, 1, 0, 0, 0, 0,
]);

describe('heat map', () => {
  it('takes each vertex’s offset length from the weighted sum of the morph targets', () => {
    // Frame 1 weights (0.003, 0.004): v0 = (0.003, 0.004, 0) → 0.005 m; v1 = (0, 0.006, 0).
    const weights = Float32Array.from([0, 0, 0.003, 0.004]);
    const out = offsetMagnitudes(BASIS, 2, weights, 1, new Float32Array(6), new Float32Array(2));
    expect(out[0]).toBeCloseTo(0.005, 7);
    expect(out[1]).toBeCloseTo(0.006, 7);
  });

  it('finds the largest offset of any vertex in each frame', () => {
    // Frame 0: v1 = 2 × 0.01 = 0.02; frame 1: v0 = |(0.003, 0.004)| = 0.005, v1 = 0.006.
    const weights = Float32Array.from([0.01, 0, 0.003, 0.004]);
    const peaks = framePeaks(BASIS, 2, weights);
    expect(peaks[0]).toBeCloseTo(0.02, 7);
    expect(peaks[1]).toBeCloseTo(0.006, 7);
  });

  it('scales to what 95 % of the frames stay below, so one wild frame does not wash out the rest', () => {
    // 19 frames at 1…19 mm and one at 1 m: the 19th smallest of 20 is 19 mm.
    const peaks = [...Array.from({ length: 19 }, (_, i) => (i + 1) / 1000), 1];
    expect(robustPeak(peaks)).toBeCloseTo(0.019, 12);
    expect(robustPeak([0.004])).toBe(0.004);
    expect(robustPeak([])).toBe(0);
  });

  it('rounds the legend scale up to 1, 2, 2.5 or 5 times a power of ten', () => {
    expect(niceCeil(3.2)).toBe(5);
    expect(niceCeil(2.1)).toBe(2.5);
    expect(niceCeil(20)).toBe(20);
    expect(niceCeil(0.013)).toBeCloseTo(0.02, 12);
    expect(niceCeil(0)).toBe(1);
  });

  it('runs the ramp from its first stop to its last, and the legend uses the same stops', () => {
    expect(rampSrgb(0)).toEqual([...RAMP_STOPS[0].rgb]);
    expect(rampSrgb(1)).toEqual([...RAMP_STOPS[RAMP_STOPS.length - 1].rgb]);
    expect(rampSrgb(2)).toEqual(rampSrgb(1));
    for (const stop of RAMP_STOPS)
      expect(rampCssGradient()).toContain(`rgb(${stop.rgb.join(' ')})`);
  });
});
