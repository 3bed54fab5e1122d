// A synthetic capture with known parts: positions = LBS(rest + Σ a_c(t)·C_c + Σ q_k(t)·Φ_k) + noise,
// where a_c are pose-corrective activations from the clip, q_k the exact responses of damped
// modes to their driver bones' specific force, and the noise white and Gaussian.
import {
  clipFramePose,
  createPose,
  matchClipJoints,
  skinningMatrices,
  skinPositions,
  worldMatrices,
  type Capture,
  type Clip,
} from '@overshoot/solver';
import type { BuiltCharacter } from '../body/build-character.js';
import type { MotionScript } from '../motion/motion-script.js';
import { rigInfo } from '../motion/rig-info.js';
import { FINE_RATE, fineKinematics, fineStride, sampleClip } from '../motion/sample-motion.js';
import { normalRandom, seededRandom } from '../random.js';
import { simulateMode, staticResponse } from './damped-mode.js';
import { REST_SPECIFIC_FORCE, specificForce } from './specific-force.js';
import { buildTissueShapes, type TissueShapes } from './tissue-shapes.js';
import type { TissueSpec } from './tissue-spec.js';

/** What a capture is made from. */
export interface CaptureRecipe {
  script: MotionScript;
  tissue: TissueSpec;
  /** Standard deviation of measurement noise per coordinate (m); 0 for none. */
  noiseSigma: number;
  /** Seed of the noise. */
  seed: number;
}

/** A capture and every known part of it. */
export interface BuiltCapture {
  recipe: CaptureRecipe;
  clip: Clip;
  capture: Capture;
  shapes: TissueShapes;
  /** Driver joints, in the order of `driverForce`. */
  drivers: string[];
  /** Mode displacement per frame (T × K). */
  modeResponses: Float64Array;
  /** Corrective activation per frame (T × C). */
  correctiveActivations: Float64Array;
  /** Specific force of each driver in its own frame per frame (T × D × 3). */
  driverForce: Float64Array;
}

/** Builds the capture of `recipe` on a character. */
export function buildCapture(built: BuiltCharacter, recipe: CaptureRecipe): BuiltCapture {
  const { character } = built;
  const { script, tissue } = recipe;
  const rig = rigInfo(built.plan);
  const clip = sampleClip(rig, script);
  const shapes = buildTissueShapes(built, tissue);
  const frames = clip.frameCount;
  const stride = fineStride(script.fps);
  const drivers = [...new Set(tissue.modes.map((m) => m.driver))];
  const driverJoints = drivers.map((d) => rig.names.indexOf(d));
  const pad = 2;
  const kin = fineKinematics(rig, script, driverJoints, pad);
  const forces = driverJoints.map((_, i) => specificForce(kin, i));

  // Modes: exact zero-order-hold simulation on the fine grid; each step holds the mean input.
  const K = tissue.modes.length;
  const steps = (frames - 1) * stride;
  const modeResponses = new Float64Array(frames * K);
  const u = new Float64Array(steps);
  const q = new Float64Array(steps + 1);
  tissue.modes.forEach((mode, k) => {
    const f = forces[drivers.indexOf(mode.driver)];
    const b = mode.inputGain;
    const input = (s: number) => {
      const o = 3 * (pad + s);
      let v = 0;
      for (let c = 0; c < 3; c++) v += b[c] * (f[o + c] - REST_SPECIFIC_FORCE[c]);
      return v;
    };
    for (let s = 0; s < steps; s++) u[s] = 0.5 * (input(s) + input(s + 1));
    // Start in static equilibrium with the first input, so nothing rings from t = 0.
    simulateMode(mode, 1 / FINE_RATE, u, staticResponse(mode, input(0)), 0, q);
    for (let fr = 0; fr < frames; fr++) modeResponses[fr * K + k] = q[fr * stride];
  });
  const driverForce = new Float64Array(frames * drivers.length * 3);
  for (let fr = 0; fr < frames; fr++) {
    forces.forEach((f, d) => {
      for (let c = 0; c < 3; c++) driverForce[3 * (fr * drivers.length + d) + c] = f[3 * (pad + fr * stride) + c]; // prettier-ignore
    });
  }

  // Correctives: activation 1 − cos θ = 2(1 − w²) of the joint's stored (float32) rotation.
  const C = tissue.correctives.length;
  const jc = clip.jointNames.length;
  const correctiveActivations = new Float64Array(frames * C);
  tissue.correctives.forEach((c, i) => {
    const j = clip.jointNames.indexOf(c.joint);
    if (j < 0) throw new Error(`corrective ${c.id}: no joint ${c.joint}`);
    for (let fr = 0; fr < frames; fr++) {
      const w = clip.rotations[4 * (fr * jc + j) + 3];
      correctiveActivations[fr * C + i] = 2 * (1 - w * w);
    }
  });

  // Skin rest + known displacement with the clip's own (float32) poses, then add noise.
  const n = character.restPositions.length / 3;
  const { skeleton } = character;
  const map = matchClipJoints(clip, skeleton, { requireAll: true });
  const pose = createPose(skeleton.names.length);
  const skin = new Float64Array(16 * skeleton.names.length);
  const displaced = new Float64Array(3 * n);
  const posed = new Float64Array(3 * n);
  const positions = new Float32Array(frames * 3 * n);
  const gauss = normalRandom(seededRandom(recipe.seed));
  for (let fr = 0; fr < frames; fr++) {
    displaced.set(character.restPositions);
    for (let i = 0; i < C; i++) addScaled(displaced, shapes.correctiveShapes[i], correctiveActivations[fr * C + i]); // prettier-ignore
    for (let k = 0; k < K; k++) addScaled(displaced, shapes.modeShapes[k], modeResponses[fr * K + k]); // prettier-ignore
    clipFramePose(clip, fr, skeleton, map, pose);
    worldMatrices(skeleton, pose, skin);
    skinningMatrices(skeleton, skin, skin);
    skinPositions(displaced, character.skinJoints, character.skinWeights, skin, posed);
    const o = fr * 3 * n;
    for (let i = 0; i < 3 * n; i++) {
      positions[o + i] = posed[i] + (recipe.noiseSigma > 0 ? recipe.noiseSigma * gauss() : 0);
    }
  }
  const capture: Capture = {
    name: script.id,
    fps: script.fps,
    frameCount: frames,
    vertexCount: n,
    positions,
    basePositions: character.restPositions,
    triangles: character.triangles,
    clip,
    warnings: [],
  };
  return { recipe, clip, capture, shapes, drivers, modeResponses, correctiveActivations, driverForce }; // prettier-ignore
}

function addScaled(out: Float64Array, v: Float64Array, s: number): void {
  if (s === 0) return;
  for (let i = 0; i < out.length; i++) out[i] += s * v[i];
}
