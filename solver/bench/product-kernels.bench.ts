// Benchmark: the big products of learning on a learn-sized snapshot matrix (600 frames of the
// ~7,500-vertex swimmer: 600 × 22,686 Float32), each way it was tried, in one run so the ratios
// hold even when the shared machine's load moves the absolute figures. Each figure is the best
// of `REPEATS` runs. The reference is ml-matrix (straightforward dense mmul), timed on a
// 2,000-column slice and scaled by width (the full products take tens of seconds).
//
// Approaches tried for the Gram (busiest-thread cpu, best of 3, load average 7.9 on the shared
// 2-core machine; the wall times move with the load, the cpu times much less):
// - ml-matrix mmul: 21.7 s (scaled from the slice); a plain dot-product loop: 6.0 s.
// - Float64 tiles of 256 columns, 4 × 4 register blocks: 2.1 s; register blocks straight on the
//   Float32 rows over 512-column blocks: 2.0 s — kept (no packing copy, Float64 sums).
// - tfjs-backend-wasm SIMD matMul (devDependency, for this comparison only): 6.0 s with
//   transposeB; 0.71 s on a pre-transposed copy of X (another 54 MB), 2.8× the kept kernel, but
//   with Float32 sums (relative error 1e-5, so re-solves would not be byte-identical across
//   backends) and a WASM module to ship and load in workers and browsers. Not kept.
// - kept + worker threads (SharedArrayBuffer, blocking wait; bit-identical): 1.0 s with one
//   worker (1.8 s wall: the second core was busy), 0.76 s with two (3.2 s wall: more threads than
//   cores). Optional: `startKernelThreads` (the CLI's --threads, SOLVER_THREADS in the worker).
// The thin products: (XᵀV)ᵀ 1.26 s as an axpy per (row, column), 0.35 s as packed slabs with 4 × 4
// blocks (kept); XWᵀ 0.47 s with 1 × 4 blocks, 0.32 s with 4 × 4 (kept).
import { loadavg } from 'node:os';
import { createRequire } from 'node:module';
import { Matrix } from 'ml-matrix';
import { multiplyByRows, multiplyTransposed, snapshotGram } from '../src/index.js';
import { startKernelThreads, stopKernelThreads } from '../src/linalg/kernel-threads.js';
import { benchCapture, benchSwimmer } from './learn-fixtures.js';
import { timeWithCpu } from './thread-cpu.js';

const REPEATS = 3;
const K = 42;

/** Best wall time and best busiest-thread CPU time (ms) of `REPEATS` runs of `fn`. */
async function best(fn: () => unknown): Promise<Timing> {
  const out = { wall: Infinity, cpu: Infinity };
  for (let r = 0; r < REPEATS; r++) {
    const { wall, cpu } = await timeWithCpu(fn);
    out.wall = Math.min(out.wall, wall);
    out.cpu = Math.min(out.cpu, cpu);
  }
  return out;
}

/** Wall time, and CPU time of the busiest thread (the wall time with a free core per thread). */
interface Timing {
  wall: number;
  cpu: number;
}

/** Largest entry difference relative to the largest entry. */
function relError(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let m = 0;
  let e = 0;
  for (let i = 0; i < a.length; i++) {
    m = Math.max(m, Math.abs(a[i]));
    e = Math.max(e, Math.abs(a[i] - b[i]));
  }
  return e / (m || 1);
}

/** The plain Gram: one dot product per pair, no blocking. */
function plainGram(x: Float32Array, t: number, d: number): Float64Array {
  const out = new Float64Array(t * t);
  for (let i = 0; i < t; i++) {
    for (let j = 0; j <= i; j++) {
      let s = 0;
      for (let c = 0; c < d; c++) s += x[i * d + c] * x[j * d + c];
      out[i * t + j] = out[j * t + i] = s;
    }
  }
  return out;
}

/** The Gram with each 256-column block packed into a contiguous Float64 tile, 4 × 4 blocks. */
function packedGram(x: Float32Array, t: number, d: number): Float64Array {
  const block = 256;
  const out = new Float64Array(t * t);
  const p = new Float64Array(t * block);
  for (let c0 = 0; c0 < d; c0 += block) {
    const w = Math.min(block, d - c0);
    for (let r = 0; r < t; r++) for (let c = 0; c < w; c++) p[r * w + c] = x[r * d + c0 + c];
    for (let i = 0; i + 4 <= t; i += 4) {
      const a0 = i * w, a1 = a0 + w, a2 = a1 + w, a3 = a2 + w; // prettier-ignore
      for (let j = 0; j <= i; j += 4) {
        const b0 = j * w, b1 = b0 + w, b2 = b1 + w, b3 = b2 + w; // prettier-ignore
        let s00 = 0, s01 = 0, s02 = 0, s03 = 0, s10 = 0, s11 = 0, s12 = 0, s13 = 0; // prettier-ignore
        let s20 = 0, s21 = 0, s22 = 0, s23 = 0, s30 = 0, s31 = 0, s32 = 0, s33 = 0; // prettier-ignore
        for (let c = 0; c < w; c++) {
          const x0 = p[a0 + c], x1 = p[a1 + c], x2 = p[a2 + c], x3 = p[a3 + c]; // prettier-ignore
          const y0 = p[b0 + c], y1 = p[b1 + c], y2 = p[b2 + c], y3 = p[b3 + c]; // prettier-ignore
          s00 += x0 * y0;
          s01 += x0 * y1;
          s02 += x0 * y2;
          s03 += x0 * y3; // prettier-ignore
          s10 += x1 * y0;
          s11 += x1 * y1;
          s12 += x1 * y2;
          s13 += x1 * y3; // prettier-ignore
          s20 += x2 * y0;
          s21 += x2 * y1;
          s22 += x2 * y2;
          s23 += x2 * y3; // prettier-ignore
          s30 += x3 * y0;
          s31 += x3 * y1;
          s32 += x3 * y2;
          s33 += x3 * y3; // prettier-ignore
        }
        const o0 = i * t + j, o1 = o0 + t, o2 = o1 + t, o3 = o2 + t; // prettier-ignore
        out[o0] += s00;
        out[o0 + 1] += s01;
        out[o0 + 2] += s02;
        out[o0 + 3] += s03; // prettier-ignore
        out[o1] += s10;
        out[o1 + 1] += s11;
        out[o1 + 2] += s12;
        out[o1 + 3] += s13; // prettier-ignore
        out[o2] += s20;
        out[o2 + 1] += s21;
        out[o2 + 2] += s22;
        out[o2 + 3] += s23; // prettier-ignore
        out[o3] += s30;
        out[o3 + 1] += s31;
        out[o3 + 2] += s32;
        out[o3 + 3] += s33; // prettier-ignore
      }
    }
  }
  for (let i = 0; i < t; i++) for (let j = i + 1; j < t; j++) out[i * t + j] = out[j * t + i];
  return out;
}

/** The previous XWᵀ: one row of X against four rows of W over 512-column blocks. */
function oneByFourRows(
  x: Float32Array,
  t: number,
  d: number,
  w: Float64Array,
  k: number,
): Float64Array {
  // prettier-ignore
  const out = new Float64Array(t * k);
  for (let c0 = 0; c0 < d; c0 += 512) {
    const c1 = Math.min(d, c0 + 512);
    for (let r = 0; r < t; r++) {
      let q = 0;
      for (; q + 4 <= k; q += 4) {
        let s0 = 0, s1 = 0, s2 = 0, s3 = 0; // prettier-ignore
        for (let c = c0; c < c1; c++) {
          const xv = x[r * d + c];
          s0 += xv * w[q * d + c];
          s1 += xv * w[(q + 1) * d + c];
          s2 += xv * w[(q + 2) * d + c];
          s3 += xv * w[(q + 3) * d + c];
        }
        out[r * k + q] += s0;
        out[r * k + q + 1] += s1;
        out[r * k + q + 2] += s2;
        out[r * k + q + 3] += s3;
      }
      for (; q < k; q++) {
        let s = 0;
        for (let c = c0; c < c1; c++) s += x[r * d + c] * w[q * d + c];
        out[r * k + q] += s;
      }
    }
  }
  return out;
}

/** The previous (XᵀV)ᵀ: an axpy per (row, column) pair over 512-column blocks. */
function axpyTransposed(
  x: Float32Array,
  t: number,
  d: number,
  v: Float64Array,
  k: number,
): Float64Array {
  // prettier-ignore
  const out = new Float64Array(k * d);
  for (let c0 = 0; c0 < d; c0 += 512) {
    const c1 = Math.min(d, c0 + 512);
    for (let r = 0; r < t; r++) {
      for (let q = 0; q < k; q++) {
        const w = v[r * k + q];
        for (let c = c0; c < c1; c++) out[q * d + c] += w * x[r * d + c];
      }
    }
  }
  return out;
}

/** ml-matrix X (rows × cols) from the first `cols` columns of row-major `x` (T × d). */
function slice(x: Float32Array, t: number, d: number, cols: number): Matrix {
  const m = new Matrix(t, cols);
  for (let i = 0; i < t; i++) for (let c = 0; c < cols; c++) m.set(i, c, x[i * d + c]);
  return m;
}

/** tfjs-core with the WASM SIMD backend (a devDependency, for this comparison only), or null. */
async function loadTfjs(): Promise<typeof import('@tensorflow/tfjs-core') | null> {
  try {
    const tf = await import('@tensorflow/tfjs-core');
    const wasm = await import('@tensorflow/tfjs-backend-wasm');
    const require = createRequire(import.meta.url);
    const pkg = require.resolve('@tensorflow/tfjs-backend-wasm/package.json');
    wasm.setWasmPaths(pkg.replace(/package\.json$/, 'wasm-out/'));
    tf.env().set('WASM_HAS_MULTITHREAD_SUPPORT', false);
    if (!(await tf.setBackend('wasm'))) return null;
    await tf.ready();
    return tf;
  } catch {
    return null;
  }
}

/** A timing as "wall s (cpu s)", and its ratio to a reference on both. */
function show(name: string, m: Timing, ref: Timing, kept: Timing | null): string {
  const sec = (ms: number) => (Number.isFinite(ms) ? `${(ms / 1000).toFixed(2)} s` : '–');
  const vsRef = `×${(ref.wall / m.wall).toFixed(1)} (cpu ×${(ref.cpu / m.cpu).toFixed(1)}) vs ml-matrix`;
  const vsKept = kept ? `, cpu ×${(kept.cpu / m.cpu).toFixed(2)} vs kept` : '';
  return `    ${name.padEnd(76)} ${sec(m.wall).padStart(8)} wall, ${sec(m.cpu).padStart(7)} busiest-thread cpu  ${vsRef}${vsKept}`;
}

/** Runs the product benchmark and prints figures and ratios. */
export async function runProductKernelBench(): Promise<void> {
  const character = await benchSwimmer();
  const t = 600;
  const capture = benchCapture(character, t, 60);
  const d = capture.positions.length / t;
  const x = capture.positions;
  console.log(
    `\nproducts  X = ${t} × ${d} Float32 (learn size), best of ${REPEATS}, load average ${loadavg()[0].toFixed(1)}; ` +
      'busiest-thread cpu ≈ wall time with a free core per thread',
  );
  const cols = 2000;
  const part = slice(x, t, d, cols);
  const scaled = (m: Timing): Timing => ({ wall: (m.wall * d) / cols, cpu: (m.cpu * d) / cols });
  const mlGram = scaled(await best(() => part.mmul(part.transpose())));
  const v = Float64Array.from({ length: t * K }, (_, i) => Math.sin(i));
  const vm = new Matrix(Array.from({ length: t }, (_, r) => Array.from(v.subarray(r * K, (r + 1) * K)))); // prettier-ignore
  const mlThin = scaled(await best(() => vm.transpose().mmul(part)));

  const gram = snapshotGram(x, t, d);
  const kept = await best(() => snapshotGram(x, t, d));
  const rows: [string, Timing][] = [
    ['ml-matrix mmul (reference, from a 2,000-column slice)', mlGram],
    ['plain loop', await best(() => plainGram(x, t, d))],
    ['packed Float64 tiles, 4 × 4 blocks', await best(() => packedGram(x, t, d))],
    ['kept: 4 × 4 register blocks, 512-column blocks', kept],
  ];
  const tf = await loadTfjs();
  if (tf) {
    const a = tf.tensor2d(x, [t, d]);
    const xt = new Float32Array(d * t);
    for (let r = 0; r < t; r++) for (let c = 0; c < d; c++) xt[c * t + r] = x[r * d + c];
    const b = tf.tensor2d(xt, [d, t]);
    const run = (pre: boolean) => {
      const p = pre ? tf.matMul(a, b) : tf.matMul(a, a, false, true);
      const out = p.dataSync();
      p.dispose();
      return out;
    };
    run(true); // compile and warm up
    const errB = relError(gram, run(false)).toExponential(0);
    rows.push([`tfjs-backend-wasm SIMD matMul, transposeB (Float32 sums, error ${errB})`, await best(() => run(false))]); // prettier-ignore
    const errP = relError(gram, run(true)).toExponential(0);
    rows.push([`tfjs-backend-wasm SIMD matMul, Xᵀ pre-transposed (Float32 sums, error ${errP})`, await best(() => run(true))]); // prettier-ignore
    a.dispose();
    b.dispose();
  } else {
    console.log('  (tfjs-backend-wasm not loadable here: its rows are left out)');
  }
  const keptThin = await best(() => multiplyTransposed(x, t, d, v, K));
  const thinRows: [string, Timing][] = [
    ['ml-matrix mmul (reference, from a 2,000-column slice)', mlThin],
    ['previous: axpy per (row, column)', await best(() => axpyTransposed(x, t, d, v, K))],
    ['kept: packed slabs, 4 × 4 blocks', keptThin],
  ];
  const w = multiplyTransposed(x, t, d, v, K);
  const keptRows = await best(() => multiplyByRows(x, t, d, w, K));
  const rowRows: [string, Timing][] = [
    ['ml-matrix mmul (reference, same multiply-adds as above)', mlThin],
    ['previous: 1 × 4 blocks', await best(() => oneByFourRows(x, t, d, w, K))],
    ['kept: 4 × 4 blocks', keptRows],
  ];
  for (const threads of [1, 2]) {
    const started = await startKernelThreads({ threads });
    if (started === 0) {
      console.log('  (worker threads unavailable: their rows are left out)');
      break;
    }
    const label = `kept + ${started} worker thread${started > 1 ? 's' : ''} (SharedArrayBuffer)`;
    const g = snapshotGram(x, t, d);
    const same = g.every((e, i) => Object.is(e, gram[i])) ? 'bit-identical' : 'DIFFERENT';
    rows.push([`${label}, ${same}`, await best(() => snapshotGram(x, t, d))]);
    thinRows.push([label, await best(() => multiplyTransposed(x, t, d, v, K))]);
    rowRows.push([label, await best(() => multiplyByRows(x, t, d, w, K))]);
    await stopKernelThreads();
  }
  console.log(`  Gram XXᵀ (${t} × ${t}, ${((t * t * d) / 2e9).toFixed(1)}·10⁹ multiply-adds):`);
  for (const [name, m] of rows) console.log(show(name, m, mlGram, kept));
  console.log(`  (XᵀV)ᵀ, K = ${K} (${((t * d * K) / 1e9).toFixed(2)}·10⁹ multiply-adds):`);
  for (const [name, m] of thinRows) console.log(show(name, m, mlThin, keptThin));
  console.log(`  XWᵀ, K = ${K}:`);
  for (const [name, m] of rowRows) console.log(show(name, m, mlThin, keptRows));
}
