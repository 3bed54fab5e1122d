// How well learned dynamics describe frames they never saw: one-step and free-run normalised RMS
// errors on the held-out end of the capture, the variance the free run explains, and the
// stability margin.
import type { ArxModel } from '../dynamics/arx-fit.js';
import { companionEigen, spectralRadius } from '../dynamics/poles.js';
import { freeRun, oneStepPrediction } from '../dynamics/simulate.js';
import type { FitReport, SpectrumPeak } from '../types.js';

/** ‖pred − c‖ / ‖c − mean(c)‖ over frames [from, to) (1 when the signal is constant). */
export function nrmse(
  pred: Float64Array,
  c: Float64Array,
  k: number,
  from: number,
  to: number,
): number {
  const mean = new Float64Array(k);
  for (let t = from; t < to; t++) for (let q = 0; q < k; q++) mean[q] += c[t * k + q] / (to - from);
  let e = 0;
  let v = 0;
  for (let t = from; t < to; t++) {
    for (let q = 0; q < k; q++) {
      e += (pred[t * k + q] - c[t * k + q]) ** 2;
      v += (c[t * k + q] - mean[q]) ** 2;
    }
  }
  return v > 0 ? Math.sqrt(e / v) : 1;
}

/** Inputs of the report besides the model. */
export interface FitReportInput {
  model: ArxModel;
  /** Measured coefficients (T×K) and scaled inputs (T×M). */
  coefficients: Float64Array;
  inputs: Float64Array;
  frames: number;
  trainEnd: number;
  poseShare: number;
  dynamicShare: number;
  spectrumPeaks: SpectrumPeak[];
}

/** Fit report on frames [trainEnd, frames). */
export function fitReport(input: FitReportInput): FitReport {
  const { model, coefficients: c, inputs: u, frames, trainEnd } = input;
  const k = model.k;
  const from = Math.max(2, trainEnd);
  const pred = new Float64Array(c.length);
  oneStepPrediction(model, c, u, from, frames, pred);
  const oneStepNrmse = nrmse(pred, c, k, from, frames);
  freeRun(model, u, from, frames, c.slice((from - 2) * k, from * k), pred);
  const freeRunNrmse = nrmse(pred, c, k, from, frames);
  const eig = companionEigen(model.a1, model.a2, k);
  return {
    trainFrames: trainEnd,
    heldOutFrames: frames - trainEnd,
    oneStepNrmse,
    freeRunNrmse,
    varianceExplained: Math.min(1, Math.max(0, 1 - freeRunNrmse ** 2)),
    stabilityMargin: 1 - spectralRadius(eig.zRe, eig.zIm),
    poseShare: input.poseShare,
    dynamicShare: input.dynamicShare,
    spectrumPeaks: input.spectrumPeaks,
  };
}
