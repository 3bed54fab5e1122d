// Reads a take .glb back: its extras, live-tuning data, morph targets (basis) and weights.
import { SolverInputError } from '../errors.js';
import type { LiveTuneData } from '../types.js';
import { openGlb } from './glb-container.js';
import { asTakeExtras, liveTuneDataFromExtras, type TakeExtras } from './take-extras.js';

/** A take as read from .glb. */
export interface TakeFile {
  extras: TakeExtras;
  live: LiveTuneData;
  /** Morph targets as one basis (3N × K, column k at [k·3N, (k+1)·3N)). */
  basis: Float32Array;
  /** Morph weights per frame (T × K) from the weights animation. */
  weights: Float32Array;
}

/** Reads a take; NOT_A_TAKE when the file is a valid glTF without take data. */
export async function readTakeGlb(bytes: Uint8Array): Promise<TakeFile> {
  const doc = await openGlb(bytes);
  const extras = asTakeExtras(doc.getRoot().getExtras());
  const live = liveTuneDataFromExtras(extras);
  const prim = doc
    .getRoot()
    .listMeshes()
    .flatMap((m) => m.listPrimitives())
    .find((p) => p.listTargets().length === live.k);
  const weightsChannel = doc
    .getRoot()
    .listAnimations()
    .flatMap((a) => a.listChannels())
    .find((c) => c.getTargetPath() === 'weights');
  if (!prim || !weightsChannel) {
    throw new SolverInputError(
      'NOT_A_TAKE',
      `the take has no mesh with ${live.k} morph targets and weights`,
      {
        item: 'meshes',
      },
    );
  }
  const targets = prim.listTargets();
  const n3 = targets[0].getAttribute('POSITION')!.getArray()!.length;
  const basis = new Float32Array(n3 * live.k);
  targets.forEach((t, c) =>
    basis.set(t.getAttribute('POSITION')!.getArray() as Float32Array, c * n3),
  );
  const weights = Float32Array.from(weightsChannel.getSampler()!.getOutput()!.getArray()!);
  return { extras, live, basis, weights };
}
