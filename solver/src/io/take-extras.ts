// The take's `extras.overshoot` block: JSON for settings and figures, packed little-endian
// arrays for the drive and dynamics. Browser-safe, so the web client can rebuild live tuning
// from `gltf.userData.overshoot` without the profile. Version 2 adds the corrective morph targets
// after the K dynamic ones and says which targets are which (`morphTargets`); version 1 takes
// (dynamic targets only) still read.
import { SolverInputError } from '../errors.js';
import type { Controls, LiveTuneData, Mode, Take, TakeMetrics } from '../types.js';
import { packArray, unpackArray, type PackedArray } from './packed-arrays.js';

/** Version of the extras block written now. */
export const TAKE_EXTRAS_VERSION = 2;

/** Versions of the extras block that still read. */
const READABLE_VERSIONS = [1, 2];

/** Which of the mesh's morph targets (and weights in each animation frame) are which. */
export interface TakeMorphLayout {
  /** All morph targets of the take's mesh (the weights animation has this many per frame). */
  count: number;
  /** The K dynamic targets: live tuning rescales only their weights. */
  dynamic: { first: number; count: number };
  /**
   * The pose correctives as targets with fixed weights per frame. `errorBound` (metres) bounds
   * any vertex's offset error in any frame; `tolerance` is what was asked for.
   */
  corrective: { first: number; count: number; errorBound: number; tolerance: number };
}

/** What a take .glb carries in `extras.overshoot`. */
export interface TakeExtras {
  kind: 'take';
  formatVersion: number;
  fps: number;
  frameCount: number;
  profile: { id: string; name: string };
  controls: Controls;
  modes: Mode[];
  metrics: TakeMetrics;
  warnings: string[];
  /** Morph targets: the dynamic ones first, then the correctives (absent in version 1). */
  morphTargets?: TakeMorphLayout;
  /** Dynamic morph weights are coefficients × gain; coefficients before gain (T × K). */
  coefficients: PackedArray;
  vertexGains: PackedArray;
  dynamics: { a1: PackedArray; a2: PackedArray };
  live: {
    k: number;
    simFps: number;
    simFrames: number;
    frameCount: number;
    fps: number;
    drive: PackedArray;
    modal: {
      fps: number;
      zRe: PackedArray;
      zIm: PackedArray;
      vRe: PackedArray;
      vIm: PackedArray;
      modeOf: PackedArray;
    };
    sampleIndex: PackedArray;
    sampleWeight: PackedArray;
  };
}

/** A warning when the corrective targets could not reach the tolerance within their cap. */
function correctiveWarnings(c: TakeMorphLayout['corrective']): string[] {
  if (!(c.errorBound > c.tolerance)) return [];
  const mm = (v: number) => `${(v * 1000).toPrecision(2)} mm`;
  return [
    `pose correctives: ${c.count} corrective morph targets leave an offset error of up to ${mm(c.errorBound)}, above the ${mm(c.tolerance)} tolerance`,
  ];
}

/** The extras block of a take whose mesh carries `corrective` morph targets after the K dynamic ones. */
export function takeExtras(
  take: Take,
  corrective: TakeMorphLayout['corrective'] | null = null,
): TakeExtras {
  const { live } = take;
  const k = live.k;
  const morphTargets: TakeMorphLayout = {
    count: k + (corrective?.count ?? 0),
    dynamic: { first: 0, count: k },
    corrective: corrective ?? { first: k, count: 0, errorBound: 0, tolerance: 0 },
  };
  return {
    kind: 'take',
    formatVersion: TAKE_EXTRAS_VERSION,
    fps: take.fps,
    frameCount: take.frameCount,
    profile: { id: take.profileId, name: take.profileName },
    morphTargets,
    controls: take.controls,
    modes: take.modes,
    metrics: take.metrics,
    warnings: [...take.warnings, ...correctiveWarnings(morphTargets.corrective)],
    coefficients: packArray('f32', take.coefficients),
    vertexGains: packArray('f32', take.vertexGains),
    dynamics: { a1: packArray('f64', take.a1), a2: packArray('f64', take.a2) },
    live: {
      k: live.k,
      simFps: live.simFps,
      simFrames: live.simFrames,
      frameCount: live.frameCount,
      fps: live.fps,
      drive: packArray('f32', live.drive),
      modal: {
        fps: live.modal.fps,
        zRe: packArray('f64', live.modal.zRe),
        zIm: packArray('f64', live.modal.zIm),
        vRe: packArray('f64', live.modal.vRe),
        vIm: packArray('f64', live.modal.vIm),
        modeOf: packArray('i32', live.modal.modeOf),
      },
      sampleIndex: packArray('i32', live.sampleIndex),
      sampleWeight: packArray('f64', live.sampleWeight),
    },
  };
}

/** Live-tuning data from a take's `extras.overshoot` (or the whole root extras). NOT_A_TAKE when absent or malformed. */
export function liveTuneDataFromExtras(extras: unknown): LiveTuneData {
  const block = asTakeExtras(extras);
  const l = block.live;
  try {
    const data: LiveTuneData = {
      k: l.k,
      simFps: l.simFps,
      simFrames: l.simFrames,
      frameCount: l.frameCount,
      fps: l.fps,
      drive: unpackArray(l.drive) as Float32Array,
      modal: {
        k: l.k,
        fps: l.modal.fps,
        zRe: unpackArray(l.modal.zRe) as Float64Array,
        zIm: unpackArray(l.modal.zIm) as Float64Array,
        vRe: unpackArray(l.modal.vRe) as Float64Array,
        vIm: unpackArray(l.modal.vIm) as Float64Array,
        modeOf: unpackArray(l.modal.modeOf) as Int32Array,
      },
      sampleIndex: unpackArray(l.sampleIndex) as Int32Array,
      sampleWeight: unpackArray(l.sampleWeight) as Float64Array,
    };
    const k = data.k;
    const ok =
      data.drive.length === data.simFrames * k &&
      data.modal.zRe.length === 2 * k &&
      data.modal.vRe.length === 2 * k * k &&
      data.sampleIndex.length === 4 * data.frameCount &&
      Array.from(data.sampleIndex).every((i) => i >= 0 && i < data.simFrames);
    if (!ok) throw new RangeError('array sizes do not agree');
    return data;
  } catch (e) {
    throw new SolverInputError(
      'NOT_A_TAKE',
      `the take's live-tuning data is damaged: ${(e as Error).message}`,
      {
        item: 'extras.overshoot.live',
      },
    );
  }
}

/** The extras block, checked for its kind and version; NOT_A_TAKE otherwise. */
export function asTakeExtras(extras: unknown): TakeExtras {
  const root = extras as { overshoot?: unknown; kind?: unknown } | null;
  const block = (
    root && typeof root === 'object' && 'overshoot' in root ? root.overshoot : root
  ) as TakeExtras | null;
  if (!block || typeof block !== 'object' || block.kind !== 'take' || !block.live) {
    throw new SolverInputError('NOT_A_TAKE', 'the file carries no take data in extras.overshoot', {
      item: 'extras',
    });
  }
  if (!READABLE_VERSIONS.includes(block.formatVersion)) {
    throw new SolverInputError(
      'NOT_A_TAKE',
      `take data version ${block.formatVersion} is not one of ${READABLE_VERSIONS.join(', ')}`,
      {
        item: 'extras.overshoot.formatVersion',
      },
    );
  }
  return block;
}

/** The morph-target layout of a take (version 1 takes: the K dynamic targets only). NOT_A_TAKE when inconsistent. */
export function takeMorphLayout(extras: unknown): TakeMorphLayout {
  const block = asTakeExtras(extras);
  const k = block.live.k;
  const layout = block.morphTargets ?? {
    count: k,
    dynamic: { first: 0, count: k },
    corrective: { first: k, count: 0, errorBound: 0, tolerance: 0 },
  };
  const { dynamic: dy, corrective: co } = layout;
  const fits = (r: { first: number; count: number }) =>
    Number.isInteger(r.first) && Number.isInteger(r.count) && r.first >= 0 && r.count >= 0 && r.first + r.count <= layout.count; // prettier-ignore
  const overlap = dy.first < co.first + co.count && co.first < dy.first + dy.count;
  if (
    dy.count !== k ||
    !fits(dy) ||
    !fits(co) ||
    (co.count > 0 && overlap) ||
    dy.count + co.count !== layout.count
  ) {
    // prettier-ignore
    throw new SolverInputError('NOT_A_TAKE', "the take's morph-target layout does not add up", {
      item: 'extras.overshoot.morphTargets',
    });
  }
  return layout;
}

/** The weights of one range of targets (T × count) out of the interleaved T × layout.count weights. */
export function morphWeightsOf(
  all: ArrayLike<number>,
  layout: TakeMorphLayout,
  range: { first: number; count: number },
): Float32Array {
  const frames = Math.floor(all.length / layout.count);
  const out = new Float32Array(frames * range.count);
  for (let t = 0; t < frames; t++) {
    for (let c = 0; c < range.count; c++) out[t * range.count + c] = all[t * layout.count + range.first + c]; // prettier-ignore
  }
  return out;
}

/** Writes dynamic weights (T × K, e.g. from live tuning) into the interleaved weights of all targets, leaving the correctives as they are. */
export function setDynamicMorphWeights(
  all: { [i: number]: number; length: number },
  layout: TakeMorphLayout,
  dynamic: ArrayLike<number>,
): void {
  const { first, count } = layout.dynamic;
  const frames = Math.floor(all.length / layout.count);
  for (let t = 0; t < frames; t++) {
    for (let c = 0; c < count; c++) all[t * layout.count + first + c] = dynamic[t * count + c];
  }
}
