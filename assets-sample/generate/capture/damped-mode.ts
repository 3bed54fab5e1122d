// One damped mode, q̈ + 2ζωₙq̇ + ωₙ²q = u(t), simulated exactly: over each step the input is held
// constant and the state advances by the closed-form zero-order-hold transition (Franklin, Powell
// & Workman, "Digital Control of Dynamic Systems"): x⁺ = Φx + Γu with Φ = e^{Ah} and
// Γ = A⁻¹(Φ − I)B. For the underdamped oscillator both have closed forms, so nothing is
// integrated numerically (no Euler, no Runge–Kutta) and free motion is exact at any step.

/** A damped mode's dynamics (0 < dampingRatio < 1). */
export interface ModeDynamics {
  frequencyHz: number;
  dampingRatio: number;
}

/** Zero-order-hold transition of one step h: Φ (row-major 2×2) and Γ (2). */
export interface ZohStep {
  phi: [number, number, number, number];
  gamma: [number, number];
}

/** Closed-form zero-order-hold discretisation of the mode for step h (seconds). */
export function zohStep(mode: ModeDynamics, h: number): ZohStep {
  const wn = 2 * Math.PI * mode.frequencyHz;
  const zeta = mode.dampingRatio;
  if (!(zeta > 0 && zeta < 1) || !(wn > 0) || !(h > 0)) {
    throw new Error(
      `mode needs f > 0, 0 < ζ < 1 and h > 0 (f=${mode.frequencyHz}, ζ=${zeta}, h=${h})`,
    );
  }
  const sigma = zeta * wn;
  const wd = wn * Math.sqrt(1 - zeta * zeta);
  const e = Math.exp(-sigma * h);
  const c = Math.cos(wd * h);
  const s = Math.sin(wd * h);
  const p11 = e * (c + (sigma / wd) * s);
  const p12 = (e * s) / wd;
  const p21 = (-e * wn * wn * s) / wd;
  const p22 = e * (c - (sigma / wd) * s);
  // Γ = A⁻¹(Φ − I)B with B = [0, 1]ᵀ simplifies to [(1 − Φ₁₁)/ωₙ², Φ₁₂].
  return { phi: [p11, p12, p21, p22], gamma: [(1 - p11) / (wn * wn), p12] };
}

/**
 * Simulates the mode over steps of h with input u[k] held on [k·h, (k+1)·h); writes the
 * displacement at every step boundary into q (length u.length + 1) and returns the final velocity.
 */
export function simulateMode(
  mode: ModeDynamics,
  h: number,
  u: ArrayLike<number>,
  x0: number,
  v0: number,
  q: Float64Array,
): number {
  const { phi, gamma } = zohStep(mode, h);
  let x = x0;
  let v = v0;
  q[0] = x;
  for (let k = 0; k < u.length; k++) {
    const nx = phi[0] * x + phi[1] * v + gamma[0] * u[k];
    const nv = phi[2] * x + phi[3] * v + gamma[1] * u[k];
    x = nx;
    v = nv;
    q[k + 1] = x;
  }
  return v;
}

/** Static displacement of the mode under a constant input u: u / ωₙ². */
export function staticResponse(mode: ModeDynamics, u: number): number {
  const wn = 2 * Math.PI * mode.frequencyHz;
  return u / (wn * wn);
}
