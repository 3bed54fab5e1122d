// The big snapshot products against ml-matrix (the reference dense library), and the worker-thread
// split against the single-thread kernels (the split must give the same bits).
import { Matrix } from 'ml-matrix';
import { afterEach, describe, expect, it } from 'vitest';
import {
  gramColumns,
  multiplyByRows,
  multiplyTransposed,
  randomizedSvd,
  snapshotGram,
} from '../../src/index.js';
import {
  kernelThreadCount,
  startKernelThreads,
  stopKernelThreads,
} from '../../src/linalg/kernel-threads.js';
import { seededRandom } from '../helpers/random.js';

// Sizes that are not multiples of the 4-row blocks or 16-column slabs.
const T = 38;
const D = 1003;
const K = 7;
const rand = seededRandom(11);
const x = Float32Array.from({ length: T * D }, () => rand() - 0.5);
const v = Float64Array.from({ length: T * K }, () => rand() - 0.5);
const w = Float64Array.from({ length: K * D }, () => rand() - 0.5);
const rows = (a: ArrayLike<number>, r: number, c: number) =>
  new Matrix(
    Array.from({ length: r }, (_, i) => Array.from({ length: c }, (_, j) => a[i * c + j])),
  );
const close = (got: ArrayLike<number>, want: Matrix) => {
  const flat = want.to1DArray();
  const scale = Math.max(...flat.map(Math.abs));
  flat.forEach((e, i) => expect(Math.abs(got[i] - e)).toBeLessThan(1e-12 * scale));
};
const bits = (a: Float64Array, b: Float64Array) =>
  Buffer.from(a.buffer).equals(Buffer.from(b.buffer));

describe('snapshot products', () => {
  afterEach(async () => stopKernelThreads());

  it('agree with ml-matrix: XXᵀ, (XᵀV)ᵀ and XWᵀ', () => {
    const xm = rows(x, T, D);
    close(snapshotGram(x, T, D), xm.mmul(xm.transpose()));
    close(multiplyTransposed(x, T, D, v, K), rows(v, T, K).transpose().mmul(xm));
    close(multiplyByRows(x, T, D, w, K), xm.mmul(rows(w, K, D).transpose()));
    const small = Float64Array.from(x.subarray(0, T * 13));
    const sm = rows(small, T, 13);
    close(gramColumns(small, 13, 0, T), sm.transpose().mmul(sm));
  });

  it('give the same bits split over one or two worker threads, shared input or not', async () => {
    const gram = snapshotGram(x, T, D);
    const tr = multiplyTransposed(x, T, D, v, K);
    const br = multiplyByRows(x, T, D, w, K);
    const sharedX = new Float32Array(new SharedArrayBuffer(x.byteLength));
    sharedX.set(x);
    for (const threads of [1, 2]) {
      expect(await startKernelThreads({ threads, minWork: 0 })).toBe(threads);
      expect(kernelThreadCount()).toBe(threads);
      for (const input of [x, sharedX]) {
        expect(bits(snapshotGram(input, T, D), gram)).toBe(true);
        expect(bits(multiplyTransposed(input, T, D, v, K), tr)).toBe(true);
        expect(bits(multiplyByRows(input, T, D, w, K), br)).toBe(true);
      }
      await stopKernelThreads();
    }
    expect(kernelThreadCount()).toBe(0);
  });

  it('leave a randomized SVD unchanged to the bit when its products run on worker threads', async () => {
    const alone = randomizedSvd(x, T, D, 5, { seed: 3 });
    await startKernelThreads({ threads: 1, minWork: 0 });
    const split = randomizedSvd(x, T, D, 5, { seed: 3 });
    expect(bits(split.basis, alone.basis)).toBe(true);
    expect(bits(split.coefficients, alone.coefficients)).toBe(true);
  });

  it('keep one pool: starting again reports the running threads, stopping twice is harmless', async () => {
    expect(await startKernelThreads({ threads: 1 })).toBe(1);
    expect(await startKernelThreads({ threads: 2 })).toBe(1);
    await stopKernelThreads();
    await stopKernelThreads();
    expect(kernelThreadCount()).toBe(0);
  });
});
