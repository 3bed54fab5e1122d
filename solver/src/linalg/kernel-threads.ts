// Optional worker threads for the big snapshot products (Node only: from the main thread or
// from a worker thread such as a job's solve thread). The products stay synchronous: the
// calling thread posts one share to each worker, computes its own share, then blocks on
// Atomics.wait until the workers flag theirs done. Inputs and outputs go through
// SharedArrayBuffers (an input that already lives in one is not copied). Without
// startKernelThreads, or where worker_threads, SharedArrayBuffer or a blocking wait are missing
// (browsers), every product runs on the calling thread as before. Each output element is summed
// by one share in the same order, so results are bit-identical with and without threads.
// The pool is module state on purpose: one per process, started and stopped explicitly.
import type { Worker as NodeWorker } from 'node:worker_threads';
import { byRowsShare, gramShare, transposedShare } from './product-kernels.js';

/** Options of the worker pool. */
export interface KernelThreadsOptions {
  /** Worker threads besides the calling thread (default: cores − 1, at least 1). */
  threads?: number;
  /** Multiply-adds below which a product runs on the calling thread alone. */
  minWork?: number;
  /** Longest wait for a worker's share (ms) before the calling thread computes it itself. */
  timeoutMs?: number;
}

/**
 * Defaults: threads 0 means "cores − 1"; 10⁷ multiply-adds is about 5 ms of one thread, well
 * above the cost of a split (posting the shares, copying a region-sized input: under 1 ms).
 */
export const KERNEL_THREADS_DEFAULTS: Required<KernelThreadsOptions> = {
  threads: 0,
  minWork: 1e7,
  timeoutMs: 600_000,
};

type Floats = Float32Array | Float64Array;

/** One product to split: XXᵀ, (XᵀV)ᵀ or XWᵀ (see gram-kernel.ts for the layouts). */
export type ProductJob =
  | { kind: 'gram'; x: Floats; t: number; d: number; out: Float64Array }
  | { kind: 'transposed' | 'byRows'; x: Floats; t: number; d: number; y: Floats; k: number; out: Float64Array }; // prettier-ignore

interface Pool {
  workers: NodeWorker[];
  flags: Int32Array;
  options: Required<KernelThreadsOptions>;
  scratch: { x: SharedArrayBuffer | null; y: SharedArrayBuffer | null; out: SharedArrayBuffer | null }; // prettier-ignore
}

let pool: Pool | null = null;

/** The worker's program: the share kernels' own source text and a message loop. */
function workerSource(): string {
  return `'use strict';
const { parentPort } = require('node:worker_threads');
${gramShare.toString()}
${transposedShare.toString()}
${byRowsShare.toString()}
function run(m) {
  if (m.kind === 'gram') gramShare(m.x, m.t, m.d, m.out, m.part, m.parts);
  else if (m.kind === 'transposed') transposedShare(m.x, m.t, m.d, m.y, m.k, m.out, m.from, m.to);
  else byRowsShare(m.x, m.d, m.y, m.k, m.out, m.from, m.to);
}
parentPort.on('message', (m) => {
  let status = 1;
  try { run(m); } catch (e) { status = 2; }
  Atomics.store(m.flags, m.slot, status);
  Atomics.notify(m.flags, m.slot);
});
// Self-check before reporting ready: a 4×4 product of each kind.
const probe = new Float64Array(16).fill(1);
gramShare(probe, 4, 4, new Float64Array(16), 0, 1);
transposedShare(probe, 4, 4, probe, 4, new Float64Array(16), 0, 4);
byRowsShare(probe, 4, probe, 4, new Float64Array(16), 0, 4);
parentPort.postMessage('ready');`;
}

/**
 * Starts the worker pool (Node only); resolves to the number of worker threads, 0 where threads
 * are unavailable (then every product runs on the calling thread). Idempotent.
 */
export async function startKernelThreads(options: KernelThreadsOptions = {}): Promise<number> {
  if (pool) return pool.workers.length;
  if (typeof SharedArrayBuffer === 'undefined' || typeof Atomics?.wait !== 'function') return 0;
  const opts = { ...KERNEL_THREADS_DEFAULTS, ...options };
  // Specifiers in variables keep browser bundlers from trying to resolve Node built-ins.
  const wtName = 'node:worker_threads';
  const osName = 'node:os';
  let wt: typeof import('node:worker_threads');
  let os: typeof import('node:os');
  try {
    wt = await import(/* @vite-ignore */ wtName);
    os = await import(/* @vite-ignore */ osName);
  } catch {
    return 0;
  }
  const threads = opts.threads > 0 ? opts.threads : Math.max(1, os.availableParallelism() - 1);
  const workers: NodeWorker[] = [];
  try {
    for (let i = 0; i < threads; i++) workers.push(new wt.Worker(workerSource(), { eval: true }));
    await Promise.all(
      workers.map(
        (w) =>
          new Promise<void>((resolve, reject) => {
            w.once('message', (m) => (m === 'ready' ? resolve() : reject(new Error(String(m)))));
            w.once('error', reject);
          }),
      ),
    );
  } catch {
    await Promise.all(workers.map((w) => w.terminate()));
    return 0;
  }
  for (const w of workers) w.unref();
  pool = {
    workers,
    flags: new Int32Array(new SharedArrayBuffer(4 * threads)),
    options: opts,
    scratch: { x: null, y: null, out: null },
  };
  return threads;
}

/** Stops the worker pool and frees its shared buffers. */
export async function stopKernelThreads(): Promise<void> {
  const p = pool;
  pool = null;
  if (p) await Promise.all(p.workers.map((w) => w.terminate()));
}

/** Worker threads running now (0 when products run on the calling thread only). */
export function kernelThreadCount(): number {
  return pool ? pool.workers.length : 0;
}

/** `a` itself when it lives in shared memory, else a copy in the pool's grow-only scratch. */
function shared(a: Floats, slot: 'x' | 'y' | 'out', scratch: Pool['scratch']): Floats {
  if (a.buffer instanceof SharedArrayBuffer) return a;
  let buf = scratch[slot];
  if (!buf || buf.byteLength < a.byteLength) buf = scratch[slot] = new SharedArrayBuffer(a.byteLength); // prettier-ignore
  const view = a instanceof Float32Array ? new Float32Array(buf, 0, a.length) : new Float64Array(buf, 0, a.length); // prettier-ignore
  if (slot !== 'out') view.set(a);
  return view;
}

/**
 * `x` in shared memory for several products in a row: `x` itself without a pool or when already
 * shared, else a copy in the pool's scratch. The copy stays valid until the next product whose
 * snapshot input is outside shared memory; `x` must not change while it is used.
 */
export function sharedInput<A extends Floats>(x: A): A {
  const p = pool;
  return p ? (shared(x, 'x', p.scratch) as A) : x;
}

/** Boundaries splitting [0, n) into `parts` ranges, multiples of `align` except the last. */
function cuts(n: number, parts: number, align: number): number[] {
  const out = [0];
  for (let p = 1; p < parts; p++) out.push(Math.min(n, Math.round((n * p) / parts / align) * align)); // prettier-ignore
  out.push(n);
  return out;
}

/** Runs one share on the calling thread. */
function runShare(
  job: ProductJob,
  out: Float64Array,
  part: number,
  parts: number,
  range: number[],
): void {
  // prettier-ignore
  if (job.kind === 'gram') gramShare(job.x, job.t, job.d, out, part, parts);
  else if (job.kind === 'transposed') transposedShare(job.x, job.t, job.d, job.y, job.k, out, range[part], range[part + 1]); // prettier-ignore
  else byRowsShare(job.x, job.d, job.y, job.k, out, range[part], range[part + 1]);
}

/**
 * Runs `job` split over the pool and the calling thread, writing `job.out`. False when no pool
 * runs, the product is small or a worker failed: the caller then computes it alone into a zeroed
 * `job.out`.
 */
export function splitProduct(job: ProductJob): boolean {
  const p = pool;
  if (!p) return false;
  const { t, d } = job;
  const work = job.kind === 'gram' ? (t * t * d) / 2 : t * d * job.k;
  if (work < p.options.minWork) return false;
  const parts = p.workers.length + 1;
  const x = shared(job.x, 'x', p.scratch);
  const y = job.kind === 'gram' ? null : shared(job.y, 'y', p.scratch);
  const out = shared(job.out, 'out', p.scratch) as Float64Array;
  if (job.kind !== 'transposed') out.fill(0);
  const range = job.kind === 'transposed' ? cuts(d, parts, 16) : cuts(t, parts, 4);
  const base = { kind: job.kind, x, y, out, t, d, k: job.kind === 'gram' ? 0 : job.k, parts, flags: p.flags }; // prettier-ignore
  const local = { ...job, x, y } as ProductJob;
  for (let w = 0; w < p.workers.length; w++) {
    Atomics.store(p.flags, w, 0);
    const part = w + 1;
    p.workers[w].postMessage({ ...base, part, from: range[part], to: range[part + 1], slot: w });
  }
  runShare(local, out, 0, parts, range);
  let ok = true;
  for (let w = 0; w < p.workers.length; w++) {
    if (Atomics.load(p.flags, w) === 0) Atomics.wait(p.flags, w, 0, p.options.timeoutMs);
    if (Atomics.load(p.flags, w) !== 1) ok = false;
  }
  if (!ok) {
    // A worker failed or hung: stop using the pool and let the caller compute the product alone.
    void stopKernelThreads();
    if (out === job.out) job.out.fill(0);
    return false;
  }
  if (out !== job.out) job.out.set(out);
  return true;
}
