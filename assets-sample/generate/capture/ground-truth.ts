// Ground truth of a synthetic capture: a JSON description (modes, regions, drivers, correctives,
// noise, clip, model equations) and a little-endian binary holding the dense arrays it names.
import type { BuiltCharacter } from '../body/build-character.js';
import { GRAVITY } from '../motion/hops.js';
import { FINE_RATE } from '../motion/sample-motion.js';
import type { BuiltCapture } from './build-capture.js';
import { REST_SPECIFIC_FORCE } from './specific-force.js';

/** Where an array lives in the binary file. */
export interface ArrayRef {
  dtype: 'float32' | 'float64';
  shape: number[];
  byteOffset: number;
  byteLength: number;
  layout: string;
}

/** Files and names the ground truth refers to. */
export interface TruthContext {
  /** Paths relative to the files/ folder. */
  capture: string;
  character: string;
  clipBvh: string;
  clipGlb: string;
  bin: string;
  seed: number;
  generator: string;
  notice: string;
}

type Arrays = Record<
  string,
  { data: Float32Array | Float64Array; shape: number[]; layout: string }
>;

function packArrays(arrays: Arrays): { refs: Record<string, ArrayRef>; bin: Uint8Array } {
  const refs: Record<string, ArrayRef> = {};
  let size = 0;
  for (const [name, a] of Object.entries(arrays)) {
    const width = a.data instanceof Float64Array ? 8 : 4;
    refs[name] = {
      dtype: width === 8 ? 'float64' : 'float32',
      shape: a.shape,
      byteOffset: size,
      byteLength: a.data.length * width,
      layout: a.layout,
    };
    size += a.data.length * width;
  }
  const bin = new Uint8Array(size);
  const view = new DataView(bin.buffer);
  for (const [name, a] of Object.entries(arrays)) {
    const { byteOffset } = refs[name];
    const wide = a.data instanceof Float64Array;
    for (let i = 0; i < a.data.length; i++) {
      if (wide) view.setFloat64(byteOffset + 8 * i, a.data[i], true);
      else view.setFloat32(byteOffset + 4 * i, a.data[i], true);
    }
  }
  return { refs, bin };
}

function stack(rows: Float64Array[], width: number): Float32Array {
  const out = new Float32Array(rows.length * width);
  rows.forEach((r, k) => out.set(r, k * width));
  return out;
}

/** The JSON and binary ground truth of a built capture. */
export function groundTruth(
  built: BuiltCharacter,
  cap: BuiltCapture,
  ctx: TruthContext,
): { json: object; bin: Uint8Array } {
  const { recipe, shapes, clip } = cap;
  const { modes, correctives } = recipe.tissue;
  const n = built.character.restPositions.length / 3;
  const T = clip.frameCount;
  const K = modes.length;
  const C = correctives.length;
  const D = cap.drivers.length;
  const { refs, bin } = packArrays({
    modeShapes: { data: stack(shapes.modeShapes, 3 * n), shape: [K, n, 3], layout: 'mode, vertex, xyz (rest space, metres per unit response)' }, // prettier-ignore
    correctiveShapes: { data: stack(shapes.correctiveShapes, 3 * n), shape: [C, n, 3], layout: 'corrective, vertex, xyz (rest space, metres per unit activation)' }, // prettier-ignore
    modeResponses: { data: cap.modeResponses, shape: [T, K], layout: 'frame, mode (metres at the peak vertex)' }, // prettier-ignore
    correctiveActivations: { data: cap.correctiveActivations, shape: [T, C], layout: 'frame, corrective (1 − cos θ)' }, // prettier-ignore
    driverSpecificForce: { data: cap.driverForce, shape: [T, D, 3], layout: 'frame, driver, xyz in the driver joint frame (m/s²)' }, // prettier-ignore
  });
  let totalEnergy = 0;
  const stats = modes.map((_, k) => {
    let peak = 0;
    let sum2 = 0;
    for (let f = 0; f < T; f++) {
      const v = cap.modeResponses[f * K + k];
      peak = Math.max(peak, Math.abs(v));
      sum2 += v * v;
    }
    let norm2 = 0;
    for (const x of shapes.modeShapes[k]) norm2 += x * x;
    totalEnergy += sum2 * norm2;
    return { peak, rms: Math.sqrt(sum2 / T), energy: sum2 * norm2 };
  });
  const regionCounts: Record<string, number> = {};
  const labels = built.character.regions!.labels;
  built.plan.regions.forEach((name, r) => {
    regionCounts[name] = labels.reduce((s, l) => s + (l === r ? 1 : 0), 0);
  });
  const json = {
    invented: true,
    notice: ctx.notice,
    generator: ctx.generator,
    seed: ctx.seed,
    capture: ctx.capture,
    character: ctx.character,
    clip: { name: clip.name, bvh: ctx.clipBvh, glb: ctx.clipGlb, fps: clip.fps, frameCount: T },
    fps: clip.fps,
    frameCount: T,
    vertexCount: n,
    units: 'metres, seconds; quaternions [x, y, z, w]',
    model: {
      positions:
        'v_t = LBS_t(rest + Σ_c a_c(t)·correctiveShapes[c] + Σ_k q_k(t)·modeShapes[k]) + noise, with LBS_t the skinning by the clip frame t (the capture file carries the same clip)',
      mode: "q'' + 2ζω_n q' + ω_n² q = inputGain · (f(t) − restSpecificForce), ω_n = 2π·frequencyHz",
      specificForce:
        'f = Rᵀ(a − g): linear acceleration of the driver joint minus gravity, in the joint frame (rest rotations are identity)',
      gravity: [0, -GRAVITY, 0],
      restSpecificForce: REST_SPECIFIC_FORCE,
      simulation: {
        method:
          'exact zero-order-hold discretisation (closed-form state transition), not numerical integration',
        stepSeconds: 1 / FINE_RATE,
        inputHold:
          'each step holds the mean of the input at its two ends; a is the central second difference of the joint path at the step rate',
        initialState: "static equilibrium for the input at t = 0 (q = u(0)/ω_n², q' = 0)",
      },
      correctiveActivation:
        '1 − cos θ = (3 − trace R)/2 = 2(1 − w²) of the joint local rotation (w: quaternion scalar part)',
      shapes:
        'mode shapes are orthogonal to the span of the corrective shapes and peak at 1; each shape is zero outside its region',
    },
    modes: modes.map((m, k) => ({
      id: m.id,
      region: m.region,
      driver: m.driver,
      frequencyHz: m.frequencyHz,
      dampingRatio: m.dampingRatio,
      inputGain: m.inputGain,
      shape: { array: 'modeShapes', index: k },
      response: { array: 'modeResponses', column: k },
      peakDisplacement: stats[k].peak,
      rmsDisplacement: stats[k].rms,
      energyShare: stats[k].energy / totalEnergy,
    })),
    correctives: correctives.map((c, i) => ({
      id: c.id,
      region: c.region,
      joint: c.joint,
      amplitude: c.amplitude,
      shape: { array: 'correctiveShapes', index: i },
      activation: { array: 'correctiveActivations', column: i },
    })),
    drivers: cap.drivers.map((joint, d) => ({ joint, specificForce: { array: 'driverSpecificForce', index: d } })), // prettier-ignore
    regions: { names: built.plan.regions, vertexCounts: regionCounts, source: 'the character file’s _REGION attribute' }, // prettier-ignore
    noise:
      recipe.noiseSigma > 0
        ? { kind: 'independent Gaussian per coordinate, world space', sigmaMetres: recipe.noiseSigma, seed: recipe.seed } // prettier-ignore
        : null,
    arrays: { file: ctx.bin, byteOrder: 'little-endian', entries: refs },
  };
  return { json, bin };
}
