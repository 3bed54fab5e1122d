// Reads a take .glb back: its extras, live-tuning data, and the morph targets and weights split
// into the dynamic part (what live tuning rescales) and the pose correctives.
import { SolverInputError } from '../errors.js';
import type { LiveTuneData } from '../types.js';
import { openGlb } from './glb-container.js';
import {
  asTakeExtras,
  liveTuneDataFromExtras,
  morphWeightsOf,
  takeMorphLayout,
  type TakeExtras,
  type TakeMorphLayout,
} from './take-extras.js';

/** A take as read from .glb. */
export interface TakeFile {
  extras: TakeExtras;
  live: LiveTuneData;
  /** Which morph targets are dynamic and which corrective. */
  layout: TakeMorphLayout;
  /** Dynamic morph targets as one basis (3N × K, column k at [k·3N, (k+1)·3N)). */
  basis: Float32Array;
  /** Dynamic morph weights per frame (T × K) from the weights animation. */
  weights: Float32Array;
  /** Corrective morph targets (3N × R, same layout as `basis`; empty for R = 0). */
  correctiveBasis: Float32Array;
  /** Corrective morph weights per frame (T × R). */
  correctiveWeights: Float32Array;
}

/** Reads a take; NOT_A_TAKE when the file is a valid glTF without take data. */
export async function readTakeGlb(bytes: Uint8Array): Promise<TakeFile> {
  const doc = await openGlb(bytes);
  const extras = asTakeExtras(doc.getRoot().getExtras());
  const live = liveTuneDataFromExtras(extras);
  const layout = takeMorphLayout(extras);
  const prim = doc
    .getRoot()
    .listMeshes()
    .flatMap((m) => m.listPrimitives())
    .find((p) => p.listTargets().length === layout.count);
  const weightsChannel = doc
    .getRoot()
    .listAnimations()
    .flatMap((a) => a.listChannels())
    .find((c) => c.getTargetPath() === 'weights');
  if (!prim || !weightsChannel) {
    throw new SolverInputError(
      'NOT_A_TAKE',
      `the take has no mesh with ${layout.count} morph targets and weights`,
      { item: 'meshes' },
    );
  }
  const targets = prim.listTargets();
  const n3 = targets[0].getAttribute('POSITION')!.getArray()!.length;
  const columns = (range: { first: number; count: number }): Float32Array => {
    const out = new Float32Array(n3 * range.count);
    for (let c = 0; c < range.count; c++) {
      out.set(targets[range.first + c].getAttribute('POSITION')!.getArray() as Float32Array, c * n3); // prettier-ignore
    }
    return out;
  };
  const all = weightsChannel.getSampler()!.getOutput()!.getArray()!;
  return {
    extras,
    live,
    layout,
    basis: columns(layout.dynamic),
    weights: morphWeightsOf(all, layout, layout.dynamic),
    correctiveBasis: columns(layout.corrective),
    correctiveWeights: morphWeightsOf(all, layout, layout.corrective),
  };
}
