// The take's `extras.overshoot` block: JSON for settings and figures, packed little-endian
// arrays for the drive and dynamics. Browser-safe, so the web client can rebuild live tuning
// from `gltf.userData.overshoot` without the profile.
import { SolverInputError } from '../errors.js';
import type { Controls, LiveTuneData, Mode, Take, TakeMetrics } from '../types.js';
import { packArray, unpackArray, type PackedArray } from './packed-arrays.js';

/** Version of the extras block. */
export const TAKE_EXTRAS_VERSION = 1;

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
  /** Morph weights are coefficients × gain; coefficients before gain (T × K). */
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

/** The extras block of a take. */
export function takeExtras(take: Take): TakeExtras {
  const { live } = take;
  return {
    kind: 'take',
    formatVersion: TAKE_EXTRAS_VERSION,
    fps: take.fps,
    frameCount: take.frameCount,
    profile: { id: take.profileId, name: take.profileName },
    controls: take.controls,
    modes: take.modes,
    metrics: take.metrics,
    warnings: take.warnings,
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
  if (block.formatVersion !== TAKE_EXTRAS_VERSION) {
    throw new SolverInputError(
      'NOT_A_TAKE',
      `take data version ${block.formatVersion} is not ${TAKE_EXTRAS_VERSION}`,
      {
        item: 'extras.overshoot.formatVersion',
      },
    );
  }
  return block;
}
