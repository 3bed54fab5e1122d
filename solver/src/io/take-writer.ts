// Writes a take to .glb: the target's skinned mesh with K dynamic morph targets (the dynamic
// basis, region gains baked, in rest space since glTF applies morph targets before skinning)
// followed by R corrective morph targets (the pose correctives over the shot), the clip's joint
// animation and the morph-weight animation on one timeline (per frame: coefficients × gain for
// the dynamic targets, the corrective weights after them), and in the root `extras.overshoot`
// the rate, controls, profile identity, which targets are which, and what live tuning needs.
// Any glTF viewer then shows skinning + correctives + gain × dynamics; gain 0 leaves skinning +
// correctives.
import { Document, type Node } from '@gltf-transform/core';
import {
  CORRECTIVE_MORPH_DEFAULTS,
  correctiveMorphs,
  type CorrectiveMorphOptions,
} from '../retarget/corrective-morphs.js';
import type { Character, Clip, Take } from '../types.js';
import { addCharacter, floatAccessor } from './glb-character-writer.js';
import { addClipChannels } from './glb-clip-writer.js';
import { writeGlb } from './glb-container.js';
import { takeExtras, type TakeExtras } from './take-extras.js';

/** Options of the take writer. */
export interface WriteTakeOptions {
  /** How the pose correctives become morph targets. */
  correctives?: CorrectiveMorphOptions;
}

/** A written take: the file and the extras it carries (layout and warnings of the file). */
export interface WrittenTake {
  bytes: Uint8Array;
  extras: TakeExtras;
}

/** Serialises `take` on `character` with the shot `clip` (the one `retarget` returned). */
export async function writeTakeGlb(
  take: Take,
  character: Character,
  clip: Clip,
  options: WriteTakeOptions = {},
): Promise<Uint8Array> {
  return (await writeTake(take, character, clip, options)).bytes;
}

/**
 * Serialises a take like `writeTakeGlb` and also returns its extras, whose warnings include what
 * writing found (corrective targets short of their tolerance) beyond the take's own.
 */
export async function writeTake(
  take: Take,
  character: Character,
  clip: Clip,
  options: WriteTakeOptions = {},
): Promise<WrittenTake> {
  const k = take.live.k;
  const n3 = character.restPositions.length;
  const frames = take.frameCount;
  const corrective = correctiveMorphs(take.correctives, character.skeleton, clip, options.correctives); // prettier-ignore
  const r = corrective.count;
  const doc = new Document();
  const buffer = doc.createBuffer();
  const scene = doc.createScene('take');
  const written = addCharacter(doc, character);
  written.sceneRoots.forEach((root) => scene.addChild(root));
  scene.addChild(written.meshNode);
  const mesh = written.meshNode.getMesh()!;
  const prim = mesh.listPrimitives()[0];
  const targetNames: string[] = [];
  const addTarget = (name: string, column: Float32Array): void => {
    targetNames.push(name);
    prim.addTarget(
      doc
        .createPrimitiveTarget(name)
        .setAttribute('POSITION', floatAccessor(doc, buffer, 'VEC3', column)),
    );
  };
  for (let c = 0; c < k; c++) addTarget(`dynamic_${c}`, take.basis.slice(c * n3, (c + 1) * n3));
  for (let c = 0; c < r; c++) addTarget(`corrective_${c}`, corrective.basis.slice(c * n3, (c + 1) * n3)); // prettier-ignore
  mesh.setWeights(new Array(k + r).fill(0)).setExtras({ targetNames });

  // Per frame: the K dynamic weights, then the R corrective weights.
  const weights = new Float32Array(frames * (k + r));
  for (let f = 0; f < frames; f++) {
    weights.set(take.weights.subarray(f * k, (f + 1) * k), f * (k + r));
    weights.set(corrective.weights.subarray(f * r, (f + 1) * r), f * (k + r) + k);
  }
  const anim = doc.createAnimation(clip.name || 'take');
  const jointNodes = new Map<string, Node>(
    character.skeleton.names.map((name, j) => [name, written.joints[j]]),
  );
  addClipChannels(doc, buffer, anim, clip, jointNodes);
  const times = new Float32Array(frames);
  for (let f = 0; f < frames; f++) times[f] = f / take.fps;
  const sampler = doc
    .createAnimationSampler()
    .setInput(floatAccessor(doc, buffer, 'SCALAR', times))
    .setOutput(floatAccessor(doc, buffer, 'SCALAR', weights))
    .setInterpolation('LINEAR');
  anim.addSampler(sampler);
  anim.addChannel(
    doc
      .createAnimationChannel()
      .setTargetNode(written.meshNode)
      .setTargetPath('weights')
      .setSampler(sampler),
  );
  anim.setExtras({ ...anim.getExtras(), fps: take.fps });
  const root = doc.getRoot();
  const tolerance = options.correctives?.tolerance ?? CORRECTIVE_MORPH_DEFAULTS.tolerance;
  const extras = takeExtras(take, { first: k, count: r, errorBound: corrective.errorBound, tolerance }); // prettier-ignore
  root.setExtras({ ...root.getExtras(), overshoot: extras });
  return { bytes: await writeGlb(doc), extras };
}
