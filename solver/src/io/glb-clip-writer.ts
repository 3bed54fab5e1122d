// Writes a clip to .glb: joint nodes plus one animation (LINEAR keys, one per frame, fps in extras).
import {
  Document,
  type Animation,
  type Buffer as GltfBuffer,
  type Node,
} from '@gltf-transform/core';
import type { Character, Clip } from '../types.js';
import { writeGlb } from './glb-container.js';
import { addCharacter, addSkeletonNodes, floatAccessor } from './glb-character-writer.js';

/** Options for writing a clip. */
export interface WriteClipOptions {
  /** Write the clip on this character (joints matched by name) instead of bare joint nodes. */
  character?: Character | null;
}

/** Adds the clip's channels for the joints in `nodesByName` to `anim`. */
export function addClipChannels(
  doc: Document,
  buffer: GltfBuffer,
  anim: Animation,
  clip: Clip,
  nodesByName: Map<string, Node>,
): void {
  const { frameCount: t, jointNames } = clip;
  const jc = jointNames.length;
  const times = new Float32Array(t);
  for (let f = 0; f < t; f++) times[f] = f / clip.fps;
  const input = floatAccessor(doc, buffer, 'SCALAR', times);
  jointNames.forEach((name, j) => {
    const node = nodesByName.get(name);
    if (!node) return;
    const rot = new Float32Array(4 * t);
    for (let f = 0; f < t; f++)
      rot.set(clip.rotations.subarray(4 * (f * jc + j), 4 * (f * jc + j) + 4), 4 * f);
    addChannel(doc, anim, node, 'rotation', input, floatAccessor(doc, buffer, 'VEC4', rot));
    if (!clip.translationAnimated[j]) return;
    const tr = new Float32Array(3 * t);
    for (let f = 0; f < t; f++)
      tr.set(clip.translations.subarray(3 * (f * jc + j), 3 * (f * jc + j) + 3), 3 * f);
    addChannel(doc, anim, node, 'translation', input, floatAccessor(doc, buffer, 'VEC3', tr));
  });
  anim.setExtras({ ...anim.getExtras(), fps: clip.fps });
}

function addChannel(
  doc: Document,
  anim: Animation,
  node: Node,
  path: 'rotation' | 'translation',
  input: ReturnType<typeof floatAccessor>,
  output: ReturnType<typeof floatAccessor>,
): void {
  const sampler = doc
    .createAnimationSampler()
    .setInput(input)
    .setOutput(output)
    .setInterpolation('LINEAR');
  anim.addSampler(sampler);
  anim.addChannel(
    doc.createAnimationChannel().setTargetNode(node).setTargetPath(path).setSampler(sampler),
  );
}

/** Serialises a clip to .glb bytes (on a character when given). */
export async function writeClipGlb(
  clip: Clip,
  options: WriteClipOptions = {},
): Promise<Uint8Array> {
  const doc = new Document();
  const buffer = doc.createBuffer();
  const scene = doc.createScene('scene');
  let joints: Node[];
  let names: string[];
  if (options.character) {
    const written = addCharacter(doc, options.character);
    written.sceneRoots.forEach((n) => scene.addChild(n));
    scene.addChild(written.meshNode);
    joints = written.joints;
    names = options.character.skeleton.names;
  } else {
    const jc = clip.jointNames.length;
    const written = addSkeletonNodes(doc, {
      names: clip.jointNames,
      parents: clip.parents,
      restTranslations: clip.offsets,
      restRotations: Float64Array.from(clip.rotations.subarray(0, 4 * jc)),
      restScales: new Float64Array(3 * jc).fill(1),
      inverseBindMatrices: new Float64Array(16 * jc),
      rootParentMatrix: Float64Array.from([1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1]),
    });
    written.sceneRoots.forEach((n) => scene.addChild(n));
    joints = written.joints;
    names = clip.jointNames;
  }
  const anim = doc.createAnimation(clip.name);
  addClipChannels(doc, buffer, anim, clip, new Map(names.map((n, j) => [n, joints[j]])));
  return writeGlb(doc);
}
