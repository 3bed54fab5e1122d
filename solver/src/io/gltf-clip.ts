// Clip import from glTF animations: joint TRS channels sampled once per frame.
import type { Animation, AnimationChannel, Document, Node } from '@gltf-transform/core';
import { SolverInputError } from '../errors.js';
import { quatMakeContinuous } from '../linalg/quat.js';
import { parentsFirstOrder } from '../rig/skeleton.js';
import type { Clip } from '../types.js';
import { snapFps } from './bvh.js';
import { openGlb } from './glb-container.js';
import { accessorFloats } from './gltf-accessors.js';
import { listSkinnedNodes } from './gltf-character.js';
import { evaluateSampler, type Interpolation, type SamplerData } from './gltf-sampling.js';
import { readSkinSkeleton } from './gltf-skeleton.js';

/** Options for reading a glTF clip. */
export interface ReadGltfClipOptions {
  /** Animation to read, by index or name (default: the first with joint channels). */
  animation?: number | string;
  /** Rate for files without extras.fps whose key spacing is irregular or single-key. */
  fallbackFps?: number;
}

/** Default glTF clip read options. */
export const READ_GLTF_CLIP_DEFAULTS: Required<Omit<ReadGltfClipOptions, 'animation'>> = {
  fallbackFps: 30,
};

/** Reads a clip from .glb bytes. */
export async function readGltfClip(
  bytes: Uint8Array,
  options: ReadGltfClipOptions = {},
): Promise<Clip> {
  const clip = clipFromDocument(await openGlb(bytes), options);
  if (!clip) throw new SolverInputError('NO_FRAMES', 'the file has no joint animation', {});
  return clip;
}

/** The joints of a document: the largest skin's joints, else animated nodes and their ancestors. */
function documentJoints(doc: Document, warnings: string[]): { nodes: Node[]; parents: Int32Array } {
  const skinned = listSkinnedNodes(doc);
  const skin = skinned[0]?.getSkin() ?? doc.getRoot().listSkins()[0];
  if (skin) {
    const { skeleton, nodes } = readSkinSkeleton(skin, warnings);
    return { nodes, parents: skeleton.parents };
  }
  const set = new Set<Node>();
  for (const anim of doc.getRoot().listAnimations()) {
    for (const ch of anim.listChannels()) {
      if (ch.getTargetPath() === 'weights') continue;
      for (let n = ch.getTargetNode(); n; n = n.getParentNode()) set.add(n);
    }
  }
  const list = [...set];
  const index = new Map(list.map((n, i) => [n, i]));
  const raw = list.map((n) => {
    const p = n.getParentNode();
    return p ? (index.get(p) ?? -1) : -1;
  });
  const order = parentsFirstOrder(raw);
  const pos = new Int32Array(list.length);
  order.forEach((k, j) => (pos[k] = j));
  return {
    nodes: order.map((k) => list[k]),
    parents: Int32Array.from(order.map((k) => (raw[k] >= 0 ? pos[raw[k]] : -1))),
  };
}

/** Picks the animation to read; null when the document has no joint animation. */
function pickAnimation(doc: Document, which: number | string | undefined): Animation | null {
  const anims = doc.getRoot().listAnimations();
  if (typeof which === 'number') return anims[which] ?? null;
  if (typeof which === 'string') return anims.find((a) => a.getName() === which) ?? null;
  return anims.find((a) => a.listChannels().some((c) => c.getTargetPath() !== 'weights')) ?? null;
}

/** Reads the clip held by a parsed document, or null when it has no joint animation. */
export function clipFromDocument(doc: Document, options: ReadGltfClipOptions = {}): Clip | null {
  const opts = { ...READ_GLTF_CLIP_DEFAULTS, ...options };
  const anim = pickAnimation(doc, options.animation);
  if (!anim) return null;
  const warnings: string[] = [];
  const { nodes, parents } = documentJoints(doc, warnings);
  const jointOf = new Map(nodes.map((n, j) => [n, j]));
  const jc = nodes.length;
  const channels: { joint: number; path: string; data: SamplerData }[] = [];
  let tStart = Infinity;
  let tEnd = -Infinity;
  const intervals: number[] = [];
  for (const ch of anim.listChannels()) {
    const path = ch.getTargetPath();
    const node = ch.getTargetNode();
    if (!path || path === 'weights' || !node) continue;
    const joint = jointOf.get(node);
    if (joint === undefined) {
      warnings.push(`channel on "${node.getName()}" ignored: not a joint`);
      continue;
    }
    const data = samplerData(ch, path, node.getName());
    if (path === 'scale') {
      if (data.values.some((v) => Math.abs(v - 1) > 1e-4)) {
        warnings.push(`scale animation on "${node.getName()}" ignored`);
      }
      continue;
    }
    channels.push({ joint, path, data });
    tStart = Math.min(tStart, data.times[0]);
    tEnd = Math.max(tEnd, data.times[data.times.length - 1]);
    for (let k = 1; k < data.times.length; k++) intervals.push(data.times[k] - data.times[k - 1]);
  }
  if (channels.length === 0) return null;
  const fps = clipFps(anim, intervals, opts.fallbackFps, warnings);
  const frameCount = Math.round((tEnd - tStart) * fps + 1e-6) + 1;
  const rotations = new Float32Array(4 * jc * frameCount);
  const translations = new Float32Array(3 * jc * frameCount);
  const translationAnimated = new Uint8Array(jc);
  const offsets = new Float64Array(3 * jc);
  nodes.forEach((n, j) => {
    offsets.set(n.getTranslation(), 3 * j);
    const r = n.getRotation();
    const t = n.getTranslation();
    for (let f = 0; f < frameCount; f++) {
      rotations.set(r, 4 * (f * jc + j));
      translations.set(t, 3 * (f * jc + j));
    }
  });
  for (const { joint, path, data } of channels) {
    const rot = path === 'rotation';
    if (!rot) translationAnimated[joint] = 1;
    const target = rot ? rotations : translations;
    const size = rot ? 4 : 3;
    for (let f = 0; f < frameCount; f++) {
      evaluateSampler(data, tStart + f / fps, target, size * (f * jc + joint));
    }
  }
  for (let j = 0; j < jc; j++) quatMakeContinuous(rotations, frameCount, 4 * jc, 4 * j);
  return {
    name: anim.getName() || 'clip',
    fps,
    frameCount,
    jointNames: nodes.map((n, j) => n.getName() || `joint_${j}`),
    parents,
    offsets,
    rotations,
    translations,
    translationAnimated,
    warnings,
  };
}

/** Frames per second: extras.fps when present (must be > 0), else the median key interval. */
export function clipFps(
  anim: Animation,
  intervals: number[],
  fallbackFps: number,
  warnings: string[],
): number {
  const declared = anim.getExtras()['fps'];
  if (declared !== undefined) {
    if (typeof declared !== 'number' || !(declared > 0) || !Number.isFinite(declared)) {
      throw new SolverInputError(
        'BAD_FPS',
        `extras.fps is ${JSON.stringify(declared)}, not a positive number`,
        {
          item: anim.getName() || 'animation',
        },
      );
    }
    return declared;
  }
  if (intervals.length === 0) {
    warnings.push(`single-key animation without extras.fps; assuming ${fallbackFps} fps`);
    return fallbackFps;
  }
  const sorted = [...intervals].sort((a, b) => a - b);
  const median = sorted[sorted.length >> 1];
  if (sorted[sorted.length - 1] - sorted[0] > 1e-3 * median) {
    warnings.push('key spacing is irregular; fps taken from the median interval');
  }
  return snapFps(1 / median);
}

function samplerData(ch: AnimationChannel, path: string, nodeName: string): SamplerData {
  const sampler = ch.getSampler()!;
  const input = sampler.getInput();
  const output = sampler.getOutput();
  const where = { joint: nodeName, item: path };
  if (!input || !output || input.getCount() === 0) {
    throw new SolverInputError(
      'NO_FRAMES',
      `the ${path} channel of "${nodeName}" has no keys`,
      where,
    );
  }
  const times = accessorFloats(input);
  const values = accessorFloats(output);
  for (let k = 0; k < times.length; k++) {
    if (!Number.isFinite(times[k])) {
      throw new SolverInputError(
        'NON_FINITE_VALUE',
        `key time ${k} of the ${path} channel of "${nodeName}" is not a finite number`,
        { ...where, frame: k },
      );
    }
    if (k > 0 && !(times[k] > times[k - 1])) {
      throw new SolverInputError(
        'KEY_TIMES_NOT_INCREASING',
        `key ${k} of the ${path} channel of "${nodeName}" is at ${times[k]} s, not after key ${k - 1} at ${times[k - 1]} s; re-export the clip with strictly increasing key times`,
        { ...where, frame: k },
      );
    }
  }
  const components = path === 'rotation' ? 4 : 3;
  for (let i = 0; i < values.length; i++) {
    if (!Number.isFinite(values[i])) {
      const key = Math.floor(
        i / (components * (sampler.getInterpolation() === 'CUBICSPLINE' ? 3 : 1)),
      );
      throw new SolverInputError(
        'NON_FINITE_VALUE',
        `${path} of "${nodeName}" is not finite at key ${key}`,
        {
          ...where,
          frame: key,
        },
      );
    }
  }
  return {
    times,
    values,
    interpolation: sampler.getInterpolation() as Interpolation,
    components,
    rotation: path === 'rotation',
  };
}
