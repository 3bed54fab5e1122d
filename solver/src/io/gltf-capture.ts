// Capture import from .glb: one morph target per frame, selected over time by a STEP weights
// animation, optionally with the skeleton's animation. All frames land in one Float32Array,
// filled target by target in one pass (no per-vertex objects).
import type { Animation, Document, Node } from '@gltf-transform/core';
import { SolverInputError } from '../errors.js';
import type { Capture } from '../types.js';
import { openGlb } from './glb-container.js';
import { accessorFloats } from './gltf-accessors.js';
import { clipFps, clipFromDocument } from './gltf-clip.js';
import { meshVertexCount, readMeshGeometry, type MeshGeometry } from './gltf-mesh.js';

/** Reads a capture from .glb bytes. */
export async function readCapture(bytes: Uint8Array): Promise<Capture> {
  return captureFromDocument(await openGlb(bytes));
}

/** The node whose mesh carries the most morph-target data, or null. */
export function findCaptureNode(doc: Document): Node | null {
  let best: Node | null = null;
  let bestSize = 0;
  for (const node of doc.getRoot().listNodes()) {
    const mesh = node.getMesh();
    if (!mesh) continue;
    const targets = mesh.listPrimitives()[0]?.listTargets().length ?? 0;
    const size = targets * meshVertexCount(mesh);
    if (targets > 0 && size > bestSize) {
      best = node;
      bestSize = size;
    }
  }
  return best;
}

/** Reads the capture held by a parsed document. */
export function captureFromDocument(doc: Document): Capture {
  const node = findCaptureNode(doc);
  if (!node) {
    throw new SolverInputError(
      'NO_MORPH_TARGETS',
      'the file has no mesh with morph targets (one per frame)',
      {},
    );
  }
  const mesh = node.getMesh()!;
  const name = mesh.getName() || node.getName() || 'capture';
  const warnings: string[] = [];
  const geometry = readMeshGeometry(mesh, warnings);
  const targets = checkTargets(geometry, name);
  const n = geometry.positions.length / 3;
  const { fps, keyFrames, keyWeights, frameCount } = frameSchedule(doc, node, targets, warnings);
  const stride = 3 * n;
  const positions = new Float32Array(frameCount * stride);
  // Frames are first filled with the base mesh, then each key adds its weighted targets.
  for (let f = 0; f < frameCount; f++) positions.set(geometry.positions, f * stride);
  for (let k = 0; k < keyFrames.length; k++) {
    const frame = keyFrames[k];
    const end = k + 1 < keyFrames.length ? keyFrames[k + 1] : frameCount;
    for (let m = 0; m < targets; m++) {
      const w = keyWeights[k * targets + m];
      if (w === 0) continue;
      addTarget(geometry, m, w, positions, frame * stride);
    }
    // STEP holds a key's shape until the next key; copy it into frames without their own key.
    for (let f = frame + 1; f < end; f++) {
      positions.copyWithin(f * stride, frame * stride, (frame + 1) * stride);
    }
  }
  for (let i = 0; i < positions.length; i++) {
    if (!Number.isFinite(positions[i])) {
      const frame = Math.floor(i / stride);
      const vertex = Math.floor((i % stride) / 3);
      throw new SolverInputError(
        'NON_FINITE_VALUE',
        `frame ${frame}, vertex ${vertex}: position is not finite`,
        {
          frame,
          vertex,
        },
      );
    }
  }
  const clip = clipFromDocument(doc);
  if (clip && clip.frameCount !== frameCount) {
    warnings.push(`skeleton animation has ${clip.frameCount} frames, the mesh ${frameCount}`);
  }
  return {
    name,
    fps,
    frameCount,
    vertexCount: n,
    positions,
    basePositions: geometry.positions,
    triangles: geometry.triangles,
    clip,
    warnings,
  };
}

/** Every primitive must have the same number of targets with matching vertex counts. */
function checkTargets(geometry: MeshGeometry, name: string): number {
  const count = geometry.primitives[0].listTargets().length;
  geometry.primitives.forEach((p, k) => {
    const targets = p.listTargets();
    if (targets.length !== count) {
      throw new SolverInputError(
        'VERTEX_COUNT_MISMATCH',
        `${name}: primitives have different target counts`,
        {
          item: `primitive ${k}`,
        },
      );
    }
    const expected = p.getAttribute('POSITION')!.getCount();
    targets.forEach((t, m) => {
      const pos = t.getAttribute('POSITION');
      if (!pos || pos.getCount() !== expected) {
        throw new SolverInputError(
          'VERTEX_COUNT_MISMATCH',
          `${name}: morph target ${m} has ${pos?.getCount() ?? 0} positions, the mesh ${expected}`,
          { item: `target ${m}`, frame: m },
        );
      }
    });
  });
  return count;
}

function addTarget(
  geometry: MeshGeometry,
  m: number,
  w: number,
  out: Float32Array,
  offset: number,
): void {
  geometry.primitives.forEach((p, k) => {
    const delta = accessorFloats(p.listTargets()[m].getAttribute('POSITION')!);
    const o = offset + 3 * geometry.vertexOffsets[k];
    for (let i = 0; i < delta.length; i++) out[o + i] += w * delta[i];
  });
}

interface FrameSchedule {
  fps: number;
  /** Frame index of each key (ascending). */
  keyFrames: number[];
  /** Target weights per key (keys × targets). */
  keyWeights: Float32Array;
  frameCount: number;
}

/** Which targets show at which frame, from the weights animation or (without one) in order. */
function frameSchedule(
  doc: Document,
  node: Node,
  targets: number,
  warnings: string[],
): FrameSchedule {
  let anim: Animation | null = null;
  let channel = null;
  for (const a of doc.getRoot().listAnimations()) {
    channel =
      a.listChannels().find((c) => c.getTargetNode() === node && c.getTargetPath() === 'weights') ??
      null;
    if (channel) {
      anim = a;
      break;
    }
  }
  if (!anim || !channel) {
    const fps = declaredFps(node, doc);
    if (fps === null) {
      throw new SolverInputError(
        'BAD_FPS',
        'no weights animation and no extras.fps: the frame rate is unknown',
        {
          item: node.getName() || 'mesh',
        },
      );
    }
    warnings.push('no weights animation; taking one morph target per frame in order');
    const keyWeights = new Float32Array(targets * targets);
    for (let m = 0; m < targets; m++) keyWeights[m * targets + m] = 1;
    return {
      fps,
      keyFrames: Array.from({ length: targets }, (_, m) => m),
      keyWeights,
      frameCount: targets,
    };
  }
  const sampler = channel.getSampler()!;
  const times = accessorFloats(sampler.getInput()!);
  const values = accessorFloats(sampler.getOutput()!);
  if (times.length === 0)
    throw new SolverInputError('NO_FRAMES', 'the weights animation has no keys', {});
  const cubic = sampler.getInterpolation() === 'CUBICSPLINE';
  if (sampler.getInterpolation() !== 'STEP') {
    warnings.push(
      `weights animation is ${sampler.getInterpolation()}, not STEP; frames read at key times`,
    );
  }
  const intervals: number[] = [];
  for (let k = 0; k < times.length; k++) {
    if (!Number.isFinite(times[k])) {
      throw new SolverInputError(
        'NON_FINITE_VALUE',
        `weights key time ${k} is not a finite number`,
        {
          frame: k,
        },
      );
    }
    if (k > 0 && !(times[k] > times[k - 1])) {
      throw new SolverInputError(
        'KEY_TIMES_NOT_INCREASING',
        `weights key ${k} is at ${times[k]} s, not after key ${k - 1} at ${times[k - 1]} s; re-export the capture with one key per frame in time order`,
        { frame: k },
      );
    }
    if (k > 0) intervals.push(times[k] - times[k - 1]);
  }
  const fps = clipFps(anim, intervals, 30, warnings);
  const keyFrames = Array.from(times, (t) => Math.round((t - times[0]) * fps));
  const keyWeights = new Float32Array(times.length * targets);
  const stride = cubic ? 3 * targets : targets;
  for (let k = 0; k < times.length; k++) {
    for (let m = 0; m < targets; m++)
      keyWeights[k * targets + m] = values[k * stride + (cubic ? targets : 0) + m];
  }
  for (let k = 1; k < keyFrames.length; k++) {
    if (keyFrames[k] <= keyFrames[k - 1]) {
      throw new SolverInputError(
        'BAD_FPS',
        `keys ${k - 1} and ${k} fall on the same frame at ${fps} fps`,
        {
          frame: keyFrames[k],
        },
      );
    }
  }
  return { fps, keyFrames, keyWeights, frameCount: keyFrames[keyFrames.length - 1] + 1 };
}

/** extras.fps of the node, its mesh, the scene or the asset root; BAD_FPS when invalid. */
function declaredFps(node: Node, doc: Document): number | null {
  const holders = [node, node.getMesh()!, ...doc.getRoot().listScenes(), doc.getRoot()];
  for (const h of holders) {
    const v = h.getExtras()['fps'];
    if (v === undefined) continue;
    if (typeof v !== 'number' || !(v > 0) || !Number.isFinite(v)) {
      throw new SolverInputError(
        'BAD_FPS',
        `extras.fps is ${JSON.stringify(v)}, not a positive number`,
        {
          item: h.getName() || 'extras',
        },
      );
    }
    return v;
  }
  return null;
}
