// Choosing the driver signals: specific force alone unless a richer set clearly helps.
import { describe, expect, it } from 'vitest';
import { ALL_DRIVER_SIGNALS, modalToPole, seededNormal, type Driver } from '../../src/index.js';
import { chooseSignals, selectSignalColumns } from '../../src/learn/choose-signals.js';

const FRAMES = 480;
const TRAIN = 384;

/** One driver's 9 smooth random inputs (force, angular velocity, angular acceleration). */
function inputs(): { m: number; values: Float64Array; rest: Float64Array } {
  const normal = seededNormal(21);
  const m = 9;
  const values = new Float64Array(FRAMES * m);
  const level = new Float64Array(m);
  for (let t = 0; t < FRAMES; t++) {
    for (let j = 0; j < m; j++) {
      if (t % 12 === 0) level[j] = normal();
      values[t * m + j] = (t > 0 ? 0.8 * values[(t - 1) * m + j] : 0) + 0.2 * level[j];
    }
  }
  return { m, values, rest: new Float64Array(m) };
}

/** A 3 Hz mode driven by the given input columns with the given gains, measured with 1 % noise. */
function response(u: Float64Array, m: number, gains: Record<number, number>): Float64Array {
  const z = modalToPole(3, 0.15, 60);
  const a1 = 2 * z.re;
  const a2 = -(z.re * z.re + z.im * z.im);
  const c = new Float64Array(FRAMES);
  for (let t = 0; t < FRAMES; t++) {
    let drive = 0;
    for (const [j, g] of Object.entries(gains)) drive += g * u[t * m + Number(j)];
    c[t] = (t > 0 ? a1 * c[t - 1] : 0) + (t > 1 ? a2 * c[t - 2] : 0) + 0.01 * drive;
  }
  const rms = Math.sqrt(c.reduce((s, v) => s + v * v, 0) / FRAMES);
  const noise = seededNormal(22);
  return c.map((v) => v + 0.01 * rms * noise());
}

const drivers: Driver[] = [{ joint: 'chest', signals: [...ALL_DRIVER_SIGNALS] }];

describe('chooseSignals', () => {
  it('keeps specific force alone when the tissue answers to it alone', () => {
    const all = inputs();
    const c = response(all.values, all.m, { 1: 1, 2: -0.5 });
    const choice = chooseSignals(c, drivers, all, FRAMES, 1, TRAIN);
    expect(choice.drivers[0].signals).toEqual(['specificForce']);
    expect(choice.inputs.m).toBe(3);
  });

  it('takes angular velocity when the tissue answers to it strongly', () => {
    const all = inputs();
    // Columns 3–5 are the angular velocity.
    const c = response(all.values, all.m, { 1: 0.3, 4: 1 });
    const choice = chooseSignals(c, drivers, all, FRAMES, 1, TRAIN);
    expect(choice.drivers[0].signals).toContain('angularVelocity');
  });

  it('selects the columns of each signal in driver then signal order', () => {
    const values = Float64Array.from({ length: 2 * 18 }, (_, i) => i);
    const two = { m: 18, values, rest: Float64Array.from({ length: 18 }, (_, i) => 100 + i) };
    const picked = selectSignalColumns(two, 2, ['specificForce', 'angularAcceleration']);
    expect(picked.m).toBe(12);
    expect(Array.from(picked.values.subarray(0, 12))).toEqual([0, 1, 2, 6, 7, 8, 9, 10, 11, 15, 16, 17]); // prettier-ignore
    expect(Array.from(picked.rest.subarray(0, 3))).toEqual([100, 101, 102]);
  });
});
