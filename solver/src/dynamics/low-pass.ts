// Zero-phase low-pass filtering: a Butterworth filter (cascaded biquads from the bilinear
// transform with pre-warping) run forward and then backward, so the output has no delay. The
// filter starts in its steady state for the first (or last) sample, which keeps the ends from
// ringing without inventing padding.

/** Options for the zero-phase low-pass filter. */
export interface LowPassOptions {
  /** Butterworth order of each pass (even); the forward-backward result has twice the slope. */
  order?: number;
}

/** Default: 4th order per pass (48 dB per octave after both passes). */
export const LOW_PASS_DEFAULTS: Required<LowPassOptions> = { order: 4 };

/** Biquad sections [b0, b1, b2, a1, a2] of a Butterworth low-pass at `cutoffHz` for rate `fps`. */
export function butterworthSections(cutoffHz: number, fps: number, order: number): Float64Array[] {
  const sections: Float64Array[] = [];
  const k = Math.tan((Math.PI * Math.min(cutoffHz, 0.499 * fps)) / fps);
  const pairs = Math.max(1, Math.round(order / 2));
  for (let s = 1; s <= pairs; s++) {
    // Pole-pair quality of the analogue Butterworth prototype.
    const q = 1 / (2 * Math.sin(((2 * s - 1) * Math.PI) / (4 * pairs)));
    const norm = 1 / (1 + k / q + k * k);
    const b0 = k * k * norm;
    sections.push(
      Float64Array.of(b0, 2 * b0, b0, 2 * (k * k - 1) * norm, (1 - k / q + k * k) * norm),
    );
  }
  return sections;
}

/**
 * Runs one biquad over every channel at once, frame by frame (rows stay contiguous in memory),
 * forward or backward, in place.
 */
function runSection(
  sec: Float64Array,
  data: Float32Array | Float64Array,
  frames: number,
  channels: number,
  reverse: boolean,
  state: Float64Array,
): void {
  const [b0, b1, b2, a1, a2] = sec;
  const first = reverse ? frames - 1 : 0;
  // Steady state for a constant input equal to the first sample (unit DC gain).
  for (let ch = 0; ch < channels; ch++) {
    const v = data[first * channels + ch];
    state[4 * ch] = v;
    state[4 * ch + 1] = v;
    state[4 * ch + 2] = v;
    state[4 * ch + 3] = v;
  }
  for (let i = 0; i < frames; i++) {
    const row = (reverse ? frames - 1 - i : i) * channels;
    for (let ch = 0, o = 0; ch < channels; ch++, o += 4) {
      const xi = data[row + ch];
      const yi =
        b0 * xi + b1 * state[o] + b2 * state[o + 1] - a1 * state[o + 2] - a2 * state[o + 3];
      state[o + 1] = state[o];
      state[o] = xi;
      state[o + 3] = state[o + 2];
      state[o + 2] = yi;
      data[row + ch] = yi;
    }
  }
}

/**
 * Zero-phase low-pass of `channels` interleaved series of `frames` samples (frame-major), in
 * place: every section forward, then every section backward.
 */
export function lowPassZeroPhase(
  data: Float32Array | Float64Array,
  frames: number,
  channels: number,
  cutoffHz: number,
  fps: number,
  options: LowPassOptions = {},
): void {
  const { order } = { ...LOW_PASS_DEFAULTS, ...options };
  const sections = butterworthSections(cutoffHz, fps, order);
  const state = new Float64Array(4 * channels);
  for (const s of sections) runSection(s, data, frames, channels, false, state);
  for (const s of sections) runSection(s, data, frames, channels, true, state);
}
