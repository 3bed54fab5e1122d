// Writes a take to .glb: the target's skinned mesh with K morph targets (the dynamic basis, region
// gains baked, in rest space since glTF applies morph targets before skinning), the clip's joint
// animation and the morph-weight animation (coefficients × gain) on one timeline, and in the
// root `extras.overshoot` the rate, controls, profile identity and what live tuning needs.
import { Document, type Node } from '@gltf-transform/core';
import type { Character, Clip, Take } from '../types.js';
import { addCharacter, floatAccessor } from './glb-character-writer.js';
import { addClipChannels } from './glb-clip-writer.js';
import { writeGlb } from './glb-container.js';
import { takeExtras } from './take-extras.js';

/** Serialises `take` on `character` with the shot `clip` (the one `retarget` returned). */
export async function writeTakeGlb(
  take: Take,
  character: Character,
  clip: Clip,
): Promise<Uint8Array> {
  const k = take.live.k;
  const n3 = character.restPositions.length;
  const doc = new Document();
  const buffer = doc.createBuffer();
  const scene = doc.createScene('take');
  const written = addCharacter(doc, character);
  written.sceneRoots.forEach((r) => scene.addChild(r));
  scene.addChild(written.meshNode);
  const mesh = written.meshNode.getMesh()!;
  const prim = mesh.listPrimitives()[0];
  const targetNames: string[] = [];
  for (let c = 0; c < k; c++) {
    const name = `dynamic_${c}`;
    targetNames.push(name);
    const column = take.basis.slice(c * n3, (c + 1) * n3);
    prim.addTarget(
      doc
        .createPrimitiveTarget(name)
        .setAttribute('POSITION', floatAccessor(doc, buffer, 'VEC3', column)),
    );
  }
  mesh.setWeights(new Array(k).fill(0)).setExtras({ targetNames });

  const anim = doc.createAnimation(clip.name || 'take');
  const jointNodes = new Map<string, Node>(
    character.skeleton.names.map((name, j) => [name, written.joints[j]]),
  );
  addClipChannels(doc, buffer, anim, clip, jointNodes);
  const times = new Float32Array(take.frameCount);
  for (let f = 0; f < take.frameCount; f++) times[f] = f / take.fps;
  const sampler = doc
    .createAnimationSampler()
    .setInput(floatAccessor(doc, buffer, 'SCALAR', times))
    .setOutput(floatAccessor(doc, buffer, 'SCALAR', take.weights))
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
  root.setExtras({ ...root.getExtras(), overshoot: takeExtras(take) });
  return writeGlb(doc);
}
