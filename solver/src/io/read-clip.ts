// One entry point for clips from either format.
import { SolverInputError } from '../errors.js';
import type { Clip } from '../types.js';
import { readBvh, type ReadBvhOptions } from './bvh.js';
import { readGltfClip, type ReadGltfClipOptions } from './gltf-clip.js';

/** Source format of a clip. */
export type ClipKind = 'bvh' | 'gltf';

/** Options for `readClip` (each applies to its format). */
export type ReadClipOptions = ReadBvhOptions & ReadGltfClipOptions;

/** Reads a clip from BVH (text or bytes) or glTF (.glb bytes). */
export async function readClip(
  input: Uint8Array | string,
  kind: ClipKind,
  options: ReadClipOptions = {},
): Promise<Clip> {
  if (kind === 'bvh') {
    const text = typeof input === 'string' ? input : new TextDecoder().decode(input);
    return readBvh(text, options);
  }
  if (typeof input === 'string') {
    throw new SolverInputError('NOT_GLTF', 'glTF clips are read from .glb bytes, not text', {});
  }
  return readGltfClip(input, options);
}
