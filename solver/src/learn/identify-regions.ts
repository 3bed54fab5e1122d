// Dynamics identified region by region and assembled into one profile model. Each region's
// tissue directions get their own drivers (the joints its skin hangs on), their own choice of
// driver signals, an ARX fit, an output-error refinement and the stability bound; the profile's
// A1, A2 are block-diagonal (regions do not drive each other) and B0, B1 read the union of the
// drivers. A region's few coefficients and inputs keep its model well determined where one model
// of every direction and every driver had hundreds of loosely determined gains.
import { pseudoInverse, Matrix } from 'ml-matrix';
import { ALL_DRIVER_SIGNALS, driverInputs } from '../dynamics/driver-inputs.js';
import type { ArxModel } from '../dynamics/arx-fit.js';
import { refineOutputError } from '../dynamics/output-error.js';
import type { SavitzkyGolayOptions } from '../dynamics/savitzky-golay.js';
import { enforceStability, MAX_POLE_RADIUS } from '../dynamics/stability.js';
import type { Character, Clip, Driver, DriverSignal, LinearDynamics } from '../types.js';
import { chooseSignals } from './choose-signals.js';
import { selectDrivers } from './select-drivers.js';

/** How one region's dynamics were identified. */
export interface RegionFit {
  region: number;
  /** Basis rows of the region. */
  rows: number[];
  drivers: Driver[];
  /** Input ridge chosen for the ARX start, and the free-run error before and after refinement. */
  lambda: number;
  errorBefore: number;
  errorAfter: number;
  /** Poles moved onto the stability bound. */
  polesMoved: number;
}

/** The assembled model. */
export interface RegionalIdentification {
  drivers: Driver[];
  dynamics: LinearDynamics;
  /** Inputs scaled with the final inputMean and inputScale (T×M). */
  scaledInputs: Float64Array;
  fits: RegionFit[];
}

/** Options of the regional identification. */
export interface IdentifyRegionsOptions {
  maxDrivers: number;
  sg: SavitzkyGolayOptions;
  maxPoleRadius?: number;
}

/** A region's model in inputs scaled about the rest input, (raw − rest) / scale. */
interface RegionModel {
  model: ArxModel;
  drivers: Driver[];
  scale: Float64Array;
  rest: Float64Array;
}

/**
 * Identifies the dynamics of coefficients `c` (T×K) whose basis rows (K rows of 3N) belong to the
 * regions `rowRegion`, driven by `clip`; frames [2, trainEnd) are fitted.
 */
export function identifyRegions(
  c: Float64Array,
  frames: number,
  basis: Float64Array,
  rowRegion: Int32Array,
  character: Character,
  clip: Clip,
  trainEnd: number,
  options: IdentifyRegionsOptions,
): RegionalIdentification {
  const k = rowRegion.length;
  const d = basis.length / Math.max(1, k);
  const groups = new Map<number, number[]>();
  rowRegion.forEach((r, q) => groups.set(r, [...(groups.get(r) ?? []), q]));
  const fits: RegionFit[] = [];
  const models: RegionModel[] = [];
  for (const [region, rows] of [...groups].sort((a, b) => a[0] - b[0])) {
    const kr = rows.length;
    const cr = new Float64Array(frames * kr);
    for (let t = 0; t < frames; t++) rows.forEach((q, i) => (cr[t * kr + i] = c[t * k + q]));
    const br = new Float64Array(kr * d);
    rows.forEach((q, i) => br.set(basis.subarray(q * d, (q + 1) * d), i * d));
    const all = selectDrivers(character, br, kr, { maxDrivers: options.maxDrivers });
    const inputs = driverInputs(character.skeleton, clip, all, options.sg);
    const choice = chooseSignals(cr, all, inputs, frames, kr, trainEnd);
    const id = choice.identification;
    const { m, inputMean, inputScale } = id.dynamics;
    const rest = choice.inputs.rest;
    // Into inputs scaled about rest: u_mean = u_rest + (rest − mean)/scale.
    const shift = Float64Array.from(rest, (r, j) => (r - inputMean[j]) / inputScale[j]);
    const start: ArxModel = {
      k: kr,
      m,
      a1: id.dynamics.a1,
      a2: id.dynamics.a2,
      b0: id.dynamics.b0,
      b1: id.dynamics.b1,
      d: Float64Array.from({ length: kr }, (_, q) => {
        let s = 0;
        for (let j = 0; j < m; j++)
          s += (id.dynamics.b0[q * m + j] + id.dynamics.b1[q * m + j]) * shift[j];
        return s;
      }),
    };
    const u = new Float64Array(frames * m);
    for (let t = 0; t < frames; t++)
      for (let j = 0; j < m; j++)
        u[t * m + j] = (choice.inputs.values[t * m + j] - rest[j]) / inputScale[j];
    const refined = refineOutputError(start, cr, u, 2, trainEnd);
    const stable = enforceStability(
      refined.model,
      cr,
      u,
      2,
      trainEnd,
      id.lambda,
      options.maxPoleRadius ?? MAX_POLE_RADIUS,
    );
    models.push({ model: stable.model, drivers: choice.drivers, scale: inputScale, rest });
    fits.push({
      region,
      rows,
      drivers: choice.drivers,
      lambda: id.lambda,
      errorBefore: refined.errorBefore,
      errorAfter: refined.errorAfter,
      polesMoved: stable.moved,
    });
  }
  return assemble(models, fits, frames, k, character, clip, options.sg);
}

/** Block-diagonal A1, A2, and B0, B1 over the union of drivers; intercept folded into inputMean. */
function assemble(
  models: RegionModel[],
  fits: RegionFit[],
  frames: number,
  k: number,
  character: Character,
  clip: Clip,
  sg: SavitzkyGolayOptions,
): RegionalIdentification {
  const names = character.skeleton.names;
  const wanted = new Map<string, Set<DriverSignal>>();
  for (const { drivers } of models)
    for (const dr of drivers) {
      const set = wanted.get(dr.joint) ?? new Set<DriverSignal>();
      dr.signals.forEach((s) => set.add(s));
      wanted.set(dr.joint, set);
    }
  const drivers: Driver[] = [...wanted]
    .sort((a, b) => names.indexOf(a[0]) - names.indexOf(b[0]))
    .map(([joint, set]) => ({ joint, signals: ALL_DRIVER_SIGNALS.filter((s) => set.has(s)) }));
  const column = new Map<string, number>();
  let m = 0;
  for (const dr of drivers)
    for (const s of dr.signals) column.set(`${dr.joint}|${s}`, (m += 3) - 3);
  const a1 = new Float64Array(k * k);
  const a2 = new Float64Array(k * k);
  const b0 = new Float64Array(k * m);
  const b1 = new Float64Array(k * m);
  const dGlobal = new Float64Array(k);
  const inputScale = new Float64Array(m).fill(1);
  const rest = new Float64Array(m);
  models.forEach(({ model, drivers: rd, scale, rest: rr }, g) => {
    const rows = fits[g].rows;
    const map: number[] = [];
    for (const dr of rd) {
      for (const s of dr.signals) {
        const first = column.get(`${dr.joint}|${s}`) as number;
        map.push(first, first + 1, first + 2);
      }
    }
    map.forEach((col, j) => {
      inputScale[col] = scale[j];
      rest[col] = rr[j];
    });
    rows.forEach((q, i) => {
      dGlobal[q] = model.d[i];
      rows.forEach((s, jj) => {
        a1[q * k + s] = model.a1[i * model.k + jj];
        a2[q * k + s] = model.a2[i * model.k + jj];
      });
      map.forEach((col, j) => {
        b0[q * m + col] = model.b0[i * model.m + j];
        b1[q * m + col] = model.b1[i * model.m + j];
      });
    });
  });
  // (B0 + B1) δ = d, least-norm δ: the dynamics then rest exactly when the inputs equal inputMean.
  const g = new Matrix(k, m);
  for (let r = 0; r < k; r++)
    for (let j = 0; j < m; j++) g.set(r, j, b0[r * m + j] + b1[r * m + j]);
  const delta = pseudoInverse(g).mmul(Matrix.columnVector(Array.from(dGlobal)));
  const inputMean = Float64Array.from(rest, (r, j) => r - inputScale[j] * delta.get(j, 0));
  const raw = driverInputs(character.skeleton, clip, drivers, sg);
  const scaledInputs = new Float64Array(frames * m);
  for (let t = 0; t < frames; t++)
    for (let j = 0; j < m; j++)
      scaledInputs[t * m + j] = (raw.values[t * m + j] - inputMean[j]) / inputScale[j];
  return {
    drivers,
    dynamics: { k, m, a1, a2, b0, b1, inputMean, inputScale },
    scaledInputs,
    fits,
  };
}
