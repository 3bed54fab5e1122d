// Benchmark: learning a profile for a character of about 7,500 vertices (the invented swimmer of
// assets-sample) from a 600-frame, 60 fps capture made here (skinning of a smooth clip plus one
// damped jiggle on the belly). Prints wall time per stage, on the calling thread alone and with
// the big products split over worker threads, and the leading-eigenpair solver against a full
// decomposition. The products themselves are compared in product-kernels.bench.ts.
//
// Approaches tried (wall times on the shared 2-core machine, load average 4–8, so ±30 %):
// - before this work: 19.3 s. Faster products (register-blocked Gram and thin products,
//   `gramColumns`, subspace iteration for the leading eigenpairs, 7.6× a full EVD here): 15.9 s.
// - per-region tissue directions, correctives fitted with them projected out: 10.1–11.1 s, half
//   of it in the pose-driven fit, whose held-out ridge errors cost p² per vertex with a division
//   inside. Two p × p sums per vertex group and register-blocked cross products instead: 6.8 s
//   at load 4; 12.3 s wall / 6.2 s busiest-thread cpu at load 6.2 in the last run.
// - with one kernel worker thread: 8.8 s wall / 5.2 s cpu at load 6.3 (bit-identical profile).
// - tfjs-backend-wasm SIMD for the Gram: see product-kernels.bench.ts (faster on its own, Float32
//   sums; not kept).
import { cpus, loadavg } from 'node:os';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { learnProfile, snapshotGram, topEigen } from '../src/index.js';
import { startKernelThreads, stopKernelThreads } from '../src/linalg/kernel-threads.js';
import { timeIt } from './fixtures.js';
import { benchCapture, benchSwimmer } from './learn-fixtures.js';
import { timeWithCpu } from './thread-cpu.js';

/** Runs the learn benchmark and prints figures. */
export async function runLearnBench(): Promise<void> {
  const character = await benchSwimmer();
  const n = character.restPositions.length / 3;
  const frames = 600;
  const capture = benchCapture(character, frames, 60);
  console.log(
    `\nlearn: ${n} vertices, ${character.triangles.length / 3} triangles, ${frames} frames at 60 fps, ${cpus().length} cores`,
  );
  for (const threads of [0, 1]) {
    const started = threads > 0 ? await startKernelThreads({ threads }) : 0;
    if (threads > 0 && started === 0) break;
    const load = loadavg()[0];
    let result: ReturnType<typeof learnProfile> | null = null;
    const { wall: ms, cpu } = await timeWithCpu(() => (result = learnProfile(character, capture)));
    const r = result as unknown as ReturnType<typeof learnProfile>;
    const how =
      started > 0 ? `calling thread + ${started} worker thread(s)` : 'calling thread only';
    console.log(
      `  learn wall time ${(ms / 1000).toFixed(2)} s (target ≤ 10 s); busiest-thread cpu ${(cpu / 1000).toFixed(2)} s ` +
        `(≈ wall with a free core per thread); K = ${r.profile.dynamics.k}, ${how}, load average ${load.toFixed(1)}`,
    );
    const line = Object.entries(r.timings)
      .map(([stage, t]) => `${stage} ${(t / 1000).toFixed(2)} s (${((100 * t) / ms).toFixed(1)} %)`)
      .join(', ');
    console.log(`    ${line}`);
    await stopKernelThreads();
  }
  const d = 3 * n;
  const gram = snapshotGram(capture.positions, frames, d);
  const topMs = await timeIt(() => topEigen(gram, frames, 32));
  const rows = Array.from({ length: frames }, (_, i) =>
    Array.from(gram.subarray(i * frames, (i + 1) * frames)),
  );
  const evdMs = await timeIt(
    () => new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true }),
  );
  console.log(
    `  leading 42 eigenpairs of the Gram: subspace iteration ${(topMs / 1000).toFixed(2)} s, ml-matrix full EVD ${(evdMs / 1000).toFixed(2)} s (×${(evdMs / topMs).toFixed(1)})`,
  );
}
