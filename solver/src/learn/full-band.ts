// Vertices whose residual the pose features explain almost entirely over the full band carry no
// tissue dynamics to protect: for them the full-band fit is kept, because a low-pass throws away
// the fast part of the pose signal (a gait's hip flexion changes at 1–2 Hz) and with it the
// information that pins their correctives down.
import type { Separation } from './separate.js';

/** Per vertex: the full-band fit where it leaves under `maxUnexplained` of the residual energy. */
export function preferFullBand(
  lowPassed: Separation,
  fullBand: Separation,
  residuals: Float32Array,
  frames: number,
  maxUnexplained: number,
): { separation: Separation; vertices: number } {
  const d = residuals.length / frames;
  const n = d / 3;
  const fpv = lowPassed.correctives.featuresPerVertex;
  const pose = Float32Array.from(lowPassed.poseDisplacement);
  const coefficients = Float32Array.from(lowPassed.correctives.coefficients);
  let vertices = 0;
  for (let i = 0; i < n; i++) {
    let e = 0;
    let r2 = 0;
    for (let t = 0; t < frames; t++) {
      for (let a = 0; a < 3; a++) {
        const o = t * d + 3 * i + a;
        r2 += residuals[o] ** 2;
        e += (residuals[o] - fullBand.poseDisplacement[o]) ** 2;
      }
    }
    if (!(r2 > 0) || e > maxUnexplained * r2) continue;
    vertices++;
    for (let t = 0; t < frames; t++)
      for (let a = 0; a < 3; a++)
        pose[t * d + 3 * i + a] = fullBand.poseDisplacement[t * d + 3 * i + a];
    const c0 = 3 * i * fpv;
    coefficients.set(fullBand.correctives.coefficients.subarray(c0, c0 + 3 * fpv), c0);
  }
  return {
    separation: {
      ...lowPassed,
      correctives: { ...lowPassed.correctives, coefficients },
      poseDisplacement: pose,
    },
    vertices,
  };
}
