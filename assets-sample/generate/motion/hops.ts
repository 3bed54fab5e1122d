// Vertical root offset of hops and jumps: crouch, push-off, a free-fall parabola (acceleration
// exactly −g, so the body's specific force is zero in the air), a landing that absorbs the
// impact, and recovery. Pieces are quintic Hermite segments matching position, velocity and
// acceleration at every key, so the acceleration is continuous.

/** Standard gravity (m/s²). */
export const GRAVITY = 9.81;

/** One hop. */
export interface Hop {
  /** Take-off time (s). */
  takeoff: number;
  /** Time in the air (s). */
  flight: number;
  /** Depth of the crouch before take-off (m). */
  crouch: number;
  /** Time to absorb the landing (s): shorter is a harder landing. */
  absorb: number;
}

interface Key {
  t: number;
  p: number;
  v: number;
  a: number;
}

/** Hip rise at take-off and touch-down from extended legs and ankles (m). */
const EXTENSION = 0.03;

function keysOf(h: Hop): { before: Key[]; after: Key[]; v0: number } {
  const v0 = (GRAVITY * h.flight) / 2;
  const t1 = h.takeoff + h.flight;
  // Landing depth matching a roughly constant deceleration over `absorb`.
  const land = Math.min(0.25, Math.max(0.05, (v0 * h.absorb) / 2 - EXTENSION));
  return {
    v0,
    before: [
      { t: h.takeoff - 0.6, p: 0, v: 0, a: 0 },
      { t: h.takeoff - 0.22, p: -h.crouch, v: 0, a: 0 },
      { t: h.takeoff, p: EXTENSION, v: v0, a: -GRAVITY },
    ],
    after: [
      { t: t1, p: EXTENSION, v: -v0, a: -GRAVITY },
      { t: t1 + h.absorb, p: -land, v: 0, a: 0 },
      { t: t1 + h.absorb + 0.5, p: 0, v: 0, a: 0 },
    ],
  };
}

/** Quintic Hermite interpolation between two keys: [position, velocity, acceleration] at t. */
function quintic(k0: Key, k1: Key, t: number): [number, number, number] {
  const T = k1.t - k0.t;
  const s = (t - k0.t) / T;
  // Coefficients of p(s) = Σ cᵢ sⁱ with derivatives scaled to the unit interval.
  const p0 = k0.p, v0 = k0.v * T, a0 = k0.a * T * T; // prettier-ignore
  const p1 = k1.p, v1 = k1.v * T, a1 = k1.a * T * T; // prettier-ignore
  const c3 = 10 * (p1 - p0) - 6 * v0 - 4 * v1 - 1.5 * a0 + 0.5 * a1;
  const c4 = -15 * (p1 - p0) + 8 * v0 + 7 * v1 + 1.5 * a0 - a1;
  const c5 = 6 * (p1 - p0) - 3 * v0 - 3 * v1 - 0.5 * a0 + 0.5 * a1;
  const c2 = a0 / 2;
  const p = p0 + s * (v0 + s * (c2 + s * (c3 + s * (c4 + s * c5))));
  const v = v0 + s * (2 * c2 + s * (3 * c3 + s * (4 * c4 + s * 5 * c5)));
  const a = 2 * c2 + s * (6 * c3 + s * (12 * c4 + s * 20 * c5));
  return [p, v / T, a / (T * T)];
}

function piecewise(keys: Key[], t: number): number | null {
  for (let i = 0; i + 1 < keys.length; i++) {
    if (t >= keys[i].t && t < keys[i + 1].t) return quintic(keys[i], keys[i + 1], t)[0];
  }
  return null;
}

/** Vertical offset of the root (m) at time t from all hops (they must not overlap). */
export function hopOffset(hops: Hop[], t: number): number {
  let y = 0;
  for (const h of hops) {
    const { before, after, v0 } = keysOf(h);
    const b = piecewise(before, t);
    if (b !== null) {
      y += b;
      continue;
    }
    if (t >= h.takeoff && t < h.takeoff + h.flight) {
      const s = t - h.takeoff;
      y += EXTENSION + v0 * s - 0.5 * GRAVITY * s * s;
      continue;
    }
    y += piecewise(after, t) ?? 0;
  }
  return y;
}

/** 1 while airborne, 0 on the ground, smooth in between (for tucking feet and arms). */
export function airborne(hops: Hop[], t: number): number {
  let v = 0;
  for (const h of hops) {
    const s = (t - h.takeoff) / h.flight;
    if (s > 0 && s < 1) v = Math.max(v, Math.sin(Math.PI * s) ** 2);
  }
  return v;
}

/** Arm swing that goes with a hop: back in the crouch, forward-up at take-off, down on landing. */
export function hopArmSwing(hops: Hop[], t: number): number {
  let v = 0;
  for (const h of hops) {
    const u = t - h.takeoff;
    const back = -0.5 * Math.exp(-(((u + 0.25) / 0.13) ** 2));
    const up = 1.4 * Math.exp(-(((u - h.flight * 0.35) / (0.18 + h.flight * 0.3)) ** 2));
    v += back + up;
  }
  return v;
}
