// Test helper: the generated files on disk (assets-sample/files) and their ground truth.
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Manifest } from '../../generate/manifest.js';

/** Absolute path of the generated files folder. */
export const FILES_DIR = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'files');

/** Bytes of a generated file (path relative to files/). */
export function fileBytes(path: string): Uint8Array {
  return new Uint8Array(readFileSync(join(FILES_DIR, path)));
}

/** The manifest of the generated files. */
export function manifest(): Manifest {
  return JSON.parse(readFileSync(join(FILES_DIR, 'manifest.json'), 'utf8')) as Manifest;
}

/** A capture's ground-truth JSON (loosely typed: tests check its fields). */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type Truth = any;

/** Ground truth of a capture, with a reader for its binary arrays. */
export function groundTruth(path: string): {
  truth: Truth;
  array: (name: string) => Float32Array | Float64Array;
} {
  const truth = JSON.parse(readFileSync(join(FILES_DIR, path), 'utf8')) as Truth;
  const bin = readFileSync(join(FILES_DIR, dirname(path), truth.arrays.file));
  const array = (name: string) => {
    const e = truth.arrays.entries[name];
    if (!e) throw new Error(`no array ${name} in ${path}`);
    const view = new DataView(bin.buffer, bin.byteOffset + e.byteOffset, e.byteLength);
    const wide = e.dtype === 'float64';
    const out = wide ? new Float64Array(e.byteLength / 8) : new Float32Array(e.byteLength / 4);
    for (let i = 0; i < out.length; i++) {
      out[i] = wide ? view.getFloat64(8 * i, true) : view.getFloat32(4 * i, true);
    }
    return out;
  };
  return { truth, array };
}
