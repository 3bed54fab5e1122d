// Unit step response of an underdamped second-order system: the rise, overshoot and settle that
// gives the product its name, and the shape of its logo.

/** Shape and sampling of a step response curve. */
export interface StepResponseOptions {
  /** Damping ratio ζ, strictly between 0 and 1 (underdamped). */
  dampingRatio?: number;
  /** Natural frequency ω in radians per unit time, above 0. */
  naturalFrequency?: number;
  /** Length of the sampled time span, above 0. */
  duration?: number;
  /** Number of evenly spaced samples, including both ends; at least 2. */
  samples?: number;
}

/** Defaults: a lively overshoot (about 37 %) that has settled by the end of the span. */
export const STEP_RESPONSE_DEFAULTS: Required<StepResponseOptions> = {
  dampingRatio: 0.3,
  naturalFrequency: 1,
  duration: 14,
  samples: 64,
};

/** One sample of the response: time and value (the target value is 1). */
export interface StepSample {
  t: number;
  y: number;
}

/** Value at time t of the unit step response: 1 − e^{−ζωt}(cos ω_d t + ζ/√(1−ζ²) sin ω_d t). */
export function underdampedStep(t: number, dampingRatio: number, naturalFrequency: number): number {
  const zeta = dampingRatio;
  const root = Math.sqrt(1 - zeta * zeta);
  const dampedFrequency = naturalFrequency * root;
  const decay = Math.exp(-zeta * naturalFrequency * t);
  return (
    1 - decay * (Math.cos(dampedFrequency * t) + (zeta / root) * Math.sin(dampedFrequency * t))
  );
}

/** Samples the step response evenly over [0, duration]; throws RangeError on bad options. */
export function sampleStepResponse(options: StepResponseOptions = {}): StepSample[] {
  const { dampingRatio, naturalFrequency, duration, samples } = {
    ...STEP_RESPONSE_DEFAULTS,
    ...options,
  };
  if (!(dampingRatio > 0 && dampingRatio < 1)) {
    throw new RangeError(
      `dampingRatio must be between 0 and 1 (underdamped); got ${dampingRatio}.`,
    );
  }
  if (!(naturalFrequency > 0)) {
    throw new RangeError(`naturalFrequency must be above 0; got ${naturalFrequency}.`);
  }
  if (!(duration > 0)) throw new RangeError(`duration must be above 0; got ${duration}.`);
  if (!Number.isInteger(samples) || samples < 2) {
    throw new RangeError(`samples must be a whole number of at least 2; got ${samples}.`);
  }
  const step = duration / (samples - 1);
  return Array.from({ length: samples }, (_, i) => {
    const t = i * step;
    return { t, y: underdampedStep(t, dampingRatio, naturalFrequency) };
  });
}
