// Live tuning in the browser: re-simulates the take with the solver's live tuner while a control
// moves, and writes the result into what the viewer plays (the morph-weight track, and for region
// gains the morph targets themselves).
import {
  createLiveTuner,
  rescaleRegionGains,
  vertexGainField,
  type LiveControls,
  type LiveTuner,
  type TakeFile,
} from '@overshoot/solver';
import type { BufferAttribute, InterleavedBufferAttribute } from 'three';
import type { TakeModel } from './take-model';

/** How long one update took, and what it left behind. */
export interface TuneResult {
  /** Wall-clock milliseconds of the re-simulation and the write into the weights track. */
  ms: number;
}

/** Result of a region gain change. */
export interface RegionGainResult extends TuneResult {
  /** Vertices whose baked gain was 0, so no live gain brings them back (re-solve instead). */
  lostVertices: number;
}

/**
 * Writes dynamic weights (T × K) into the interleaved weights of all morph targets (T × count),
 * leaving the pose correctives as they are.
 */
export function writeDynamicWeights(
  all: { [i: number]: number; length: number },
  layout: TakeFile['layout'],
  weights: Float32Array,
): void {
  const { count, dynamic } = layout;
  const k = dynamic.count;
  for (let t = 0, frames = weights.length / k; t < frames; t++) {
    const o = t * count + dynamic.first;
    for (let c = 0; c < k; c++) all[o + c] = weights[t * k + c];
  }
}

/** Drives one loaded take's motion from controls. */
export class LiveTuning {
  private readonly tuner: LiveTuner;
  /** Where warm-up runs write, so they exercise the same code without touching the view. */
  private scratch: Float32Array | null = null;
  /** The basis as shown now (3N × K): the file's, rescaled by the live region gains. */
  readonly basis: Float32Array;

  constructor(private readonly model: TakeModel) {
    this.tuner = createLiveTuner(model.take.live, model.take.basis);
    this.basis = Float32Array.from(model.take.basis);
  }

  /**
   * Runs the simulation with the take's own controls without showing the result. The browser
   * compiles hot code only after a few runs (the first run of a 600-frame, K = 32 take takes
   * about a hundred times longer than later ones), so the page warms it up before a slider moves.
   */
  warmUp(): void {
    const c = this.model.take.extras.controls;
    this.scratch ??= new Float32Array(this.model.weightsTrack.values.length);
    const weights = this.tuner.tune({
      gain: c.gain,
      stiffness: c.stiffness,
      damping: c.damping,
      mutedModes: c.mutedModes,
      soloModes: c.soloModes,
      maxDisplacement: c.maxDisplacement,
    });
    writeDynamicWeights(this.scratch, this.model.take.layout, weights);
  }

  /** Re-simulates with `controls` and puts the new weights in the take's weights track. */
  apply(controls: LiveControls): TuneResult {
    const start = performance.now();
    const weights = this.tuner.tune(controls);
    this.model.dynamicWeights.set(weights);
    writeDynamicWeights(this.model.weightsTrack.values, this.model.take.layout, weights);
    return { ms: performance.now() - start };
  }

  /** Rescales the morph targets to new per-region gains (names missing from `gains`: 1). */
  applyRegionGains(gains: Record<string, number>): RegionGainResult {
    const start = performance.now();
    const field = vertexGainField(this.model.character, gains);
    const lostVertices = rescaleRegionGains(
      this.model.take.basis,
      this.model.vertexGains,
      field,
      this.basis,
    );
    const geometry = this.model.mesh.geometry;
    const targets = geometry.morphAttributes.position as (
      BufferAttribute | InterleavedBufferAttribute
    )[];
    const n = targets[0].count;
    targets.forEach((attr, c) => {
      const o = c * 3 * n;
      for (let v = 0; v < n; v++) {
        attr.setXYZ(v, this.basis[o + 3 * v], this.basis[o + 3 * v + 1], this.basis[o + 3 * v + 2]);
      }
    });
    // three.js packs morph targets into a texture once per geometry; dropping the geometry's GPU
    // copy makes the next frame upload the rescaled targets.
    geometry.dispose();
    return { ms: performance.now() - start, lostVertices };
  }
}
