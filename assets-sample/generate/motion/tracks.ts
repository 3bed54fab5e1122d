// Smooth scalar schedules for procedural motion. A track is a base value plus ramps shaped by
// the quintic smootherstep S(u) = 6u⁵ − 15u⁴ + 10u³, whose first and second derivatives vanish at
// both ends: accelerations derived from tracks stay continuous, as in real motion. Integrals are
// exact (∫S = u⁶ − 3u⁵ + 2.5u⁴), so a phase driven by a varying cadence has no drift.

/** One change of value from t0 to t1 (seconds). */
export interface Ramp {
  t0: number;
  t1: number;
  delta: number;
}

/** A smooth schedule: base value plus ramps. */
export interface Track {
  base: number;
  ramps: Ramp[];
}

/** A track holding `base`, then moving through (time, value) keys with ramps of `width` s. */
export function track(base: number, keys: [number, number][] = [], width = 0.6): Track {
  const ramps: Ramp[] = [];
  let last = base;
  for (const [t, v] of keys) {
    ramps.push({ t0: t - width / 2, t1: t + width / 2, delta: v - last });
    last = v;
  }
  return { base, ramps };
}

/** A track given by explicit ramps [t0, t1, value after]. */
export function rampTrack(base: number, ramps: [number, number, number][]): Track {
  let last = base;
  return {
    base,
    ramps: ramps.map(([t0, t1, v]) => {
      const r = { t0, t1, delta: v - last };
      last = v;
      return r;
    }),
  };
}

/** Quintic smootherstep of u clamped to [0, 1]. */
export function smootherstep(u: number): number {
  const x = Math.max(0, Math.min(1, u));
  return x * x * x * (x * (6 * x - 15) + 10);
}

/** ∫₀ᵘ smootherstep, for u in [0, 1]. */
function smootherIntegral(u: number): number {
  return u * u * u * u * (u * (u - 3) + 2.5);
}

/** Value of a track at time t. */
export function valueAt(tr: Track, t: number): number {
  let v = tr.base;
  for (const r of tr.ramps) {
    if (t >= r.t1) v += r.delta;
    else if (t > r.t0) v += r.delta * smootherstep((t - r.t0) / (r.t1 - r.t0));
  }
  return v;
}

/** ∫₀ᵗ track, exact. */
export function integralAt(tr: Track, t: number): number {
  let s = tr.base * t;
  for (const r of tr.ramps) {
    const span = r.t1 - r.t0;
    if (t >= r.t1) s += r.delta * (span / 2 + (t - r.t1));
    else if (t > r.t0) s += r.delta * span * smootherIntegral((t - r.t0) / span);
  }
  return s;
}

/** A bump: 0 before t0, rises to `height` by t0 + rise, holds, falls back to 0 by t1. */
export function bump(
  t0: number,
  t1: number,
  height: number,
  rise: number,
): [number, number, number][] {
  return [
    [t0, t0 + rise, height],
    [t1 - rise, t1, 0],
  ];
}
