// What a file holds: kind, counts, joints, frames, bounds and warnings, as plain JSON.
import { SolverInputError } from '../errors.js';
import { clipWorldMatrices } from '../rig/skeleton.js';
import type { Clip } from '../types.js';
import { readBvh } from './bvh.js';
import { isGlb, openGlb } from './glb-container.js';
import { captureFromDocument, findCaptureNode } from './gltf-capture.js';
import { characterFromDocument, listSkinnedNodes } from './gltf-character.js';
import { clipFromDocument } from './gltf-clip.js';

/** Summary of a file's content. */
export interface FileSummary {
  /** What the file holds. */
  kind: 'character' | 'capture' | 'clip';
  /** Vertices of the mesh (0 for clips). */
  vertexCount: number;
  /** Triangles of the mesh (0 for clips). */
  triangleCount: number;
  /** Joint names (empty when none). */
  jointNames: string[];
  /** Frames of motion (0 for a still character). */
  frameCount: number;
  /** Frames per second (null without motion). */
  fps: number | null;
  /** Axis-aligned bounds in metres over the mesh (all frames for captures) or the clip's joints over all frames. */
  boundingBox: { min: [number, number, number]; max: [number, number, number] } | null;
  /** Non-fatal observations. */
  warnings: string[];
}

/** Inspects .glb or .bvh bytes; the file name only helps tell BVH text from binary. */
export async function inspectFile(bytes: Uint8Array, fileName = ''): Promise<FileSummary> {
  const head = new TextDecoder().decode(bytes.subarray(0, 64)).trimStart();
  if (/\.bvh$/i.test(fileName) || /^HIERARCHY\b/i.test(head)) {
    const clip = readBvh(new TextDecoder().decode(bytes), { name: fileName });
    return clipSummary(clip);
  }
  if (!isGlb(bytes) && !/\.glb$/i.test(fileName)) {
    throw new SolverInputError('NOT_GLTF', 'not a .glb or .bvh file', {
      item: fileName || 'input',
    });
  }
  const doc = await openGlb(bytes);
  if (findCaptureNode(doc)) {
    const capture = captureFromDocument(doc);
    return {
      kind: 'capture',
      vertexCount: capture.vertexCount,
      triangleCount: capture.triangles.length / 3,
      jointNames: capture.clip?.jointNames ?? [],
      frameCount: capture.frameCount,
      fps: capture.fps,
      boundingBox: bounds(capture.positions),
      warnings: capture.warnings,
    };
  }
  if (listSkinnedNodes(doc).length > 0) {
    const character = characterFromDocument(doc);
    const clip = clipFromDocument(doc);
    return {
      kind: 'character',
      vertexCount: character.restPositions.length / 3,
      triangleCount: character.triangles.length / 3,
      jointNames: character.skeleton.names,
      frameCount: clip?.frameCount ?? 0,
      fps: clip?.fps ?? null,
      boundingBox: bounds(character.restPositions),
      warnings: [...character.warnings, ...(clip?.warnings ?? [])],
    };
  }
  const clip = clipFromDocument(doc);
  if (!clip) {
    throw new SolverInputError(
      'NO_SKINNED_MESH',
      'the file has no skinned mesh, capture or animation',
      {},
    );
  }
  return clipSummary(clip);
}

function clipSummary(clip: Clip): FileSummary {
  const jc = clip.jointNames.length;
  const world = new Float64Array(16 * jc);
  const points = new Float32Array(3 * jc * clip.frameCount);
  for (let f = 0; f < clip.frameCount; f++) {
    clipWorldMatrices(clip, f, world);
    for (let j = 0; j < jc; j++) {
      for (let c = 0; c < 3; c++) points[3 * (f * jc + j) + c] = world[16 * j + 12 + c];
    }
  }
  return {
    kind: 'clip',
    vertexCount: 0,
    triangleCount: 0,
    jointNames: clip.jointNames,
    frameCount: clip.frameCount,
    fps: clip.fps,
    boundingBox: bounds(points),
    warnings: clip.warnings,
  };
}

function bounds(p: Float32Array): FileSummary['boundingBox'] {
  if (p.length === 0) return null;
  const min: [number, number, number] = [Infinity, Infinity, Infinity];
  const max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < p.length; i += 3) {
    for (let c = 0; c < 3; c++) {
      const v = p[i + c];
      if (v < min[c]) min[c] = v;
      if (v > max[c]) max[c] = v;
    }
  }
  return { min, max };
}
