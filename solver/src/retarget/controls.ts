// The artist's controls: defaults, validation, the mode mask for mute/solo and the soft
// displacement clamp. Stiffness and damping act on the poles (see pole-edit.ts); gain and region
// gains act on displacement only, so a gain of 2 gives exactly twice the offsets.
import { SolverInputError } from '../errors.js';
import type { Controls } from '../types.js';

/** Default controls: the profile as learned, a one-second settle, frequencies kept. */
export const CONTROLS_DEFAULTS: Required<Controls> = {
  gain: 1,
  regionGains: {},
  stiffness: 1,
  damping: 1,
  prerollSeconds: 1,
  physicalScaling: false,
  sizeExponent: -0.5,
  mutedModes: [],
  soloModes: [],
  maxDisplacement: null,
};

/** Controls with defaults filled in, checked: BAD_CONTROL names the control that is wrong. */
export function resolveControls(partial: Partial<Controls> = {}, modeCount = Infinity): Controls {
  const c: Controls = {
    ...CONTROLS_DEFAULTS,
    ...partial,
    regionGains: { ...(partial.regionGains ?? {}) },
    mutedModes: [...(partial.mutedModes ?? [])],
    soloModes: [...(partial.soloModes ?? [])],
  };
  const bad = (item: string, why: string): never => {
    throw new SolverInputError('BAD_CONTROL', `${item} ${why}`, { item });
  };
  if (!Number.isFinite(c.gain)) bad('gain', `must be a finite number, got ${c.gain}`);
  if (!(c.stiffness > 0 && Number.isFinite(c.stiffness))) {
    bad('stiffness', `must be a positive number, got ${c.stiffness}`);
  }
  if (!(c.damping > 0 && Number.isFinite(c.damping))) {
    bad('damping', `must be a positive number, got ${c.damping}`);
  }
  if (!(c.prerollSeconds >= 0 && Number.isFinite(c.prerollSeconds))) {
    bad('prerollSeconds', `must be zero or more seconds, got ${c.prerollSeconds}`);
  }
  if (!Number.isFinite(c.sizeExponent)) bad('sizeExponent', 'must be a finite number');
  if (
    c.maxDisplacement !== null &&
    !(c.maxDisplacement > 0 && Number.isFinite(c.maxDisplacement))
  ) {
    bad('maxDisplacement', `must be a positive length in metres or null, got ${c.maxDisplacement}`);
  }
  for (const [name, g] of Object.entries(c.regionGains)) {
    if (!Number.isFinite(g)) bad(`regionGains.${name}`, `must be a finite number, got ${g}`);
  }
  for (const [key, list] of [
    ['mutedModes', c.mutedModes],
    ['soloModes', c.soloModes],
  ] as const) {
    for (const m of list) {
      if (!Number.isInteger(m) || m < 0 || m >= modeCount) {
        bad(key, `refers to mode ${m}, but the profile has ${modeCount} modes`);
      }
    }
  }
  return c;
}

/**
 * Which poles sound (1) or not (0) given the profile mode of each pole: muted modes are silent;
 * when any mode is soloed, only soloed modes sound. Returns null when every pole sounds.
 */
export function poleMask(
  modeOf: Int32Array,
  muted: number[],
  solo: number[],
  out: Uint8Array,
): Uint8Array | null {
  let all = true;
  for (let i = 0; i < modeOf.length; i++) {
    const m = modeOf[i];
    let on = solo.length === 0 || (m >= 0 && solo.includes(m));
    if (m >= 0 && muted.includes(m)) on = false;
    out[i] = on ? 1 : 0;
    if (!on) all = false;
  }
  return all ? null : out;
}

/**
 * Soft clamp of a displacement magnitude m to at most `max`: unchanged up to half of `max`, then
 * a tanh shoulder that is continuous in value and slope, so a clamped shot does not kink.
 * Returns the factor to scale the displacement by.
 */
export function clampFactor(m: number, max: number): number {
  const knee = 0.5 * max;
  if (m <= knee) return 1;
  const room = max - knee;
  return (knee + room * Math.tanh((m - knee) / room)) / m;
}
