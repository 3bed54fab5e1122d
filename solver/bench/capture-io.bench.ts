// Benchmark: writing and reading a 10k-vertex × 1000-frame capture .glb.
import { readCapture, writeCaptureGlb, type Capture } from '../src/index.js';
import { rng, timeIt } from './fixtures.js';

/** Runs the capture I/O benchmark and prints figures. */
export async function runCaptureBench(): Promise<void> {
  const n = 10_000;
  const t = 1_000;
  const rand = rng(2);
  const base = Float32Array.from({ length: 3 * n }, () => rand());
  const positions = new Float32Array(3 * n * t);
  for (let f = 0; f < t; f++)
    for (let i = 0; i < 3 * n; i++) positions[3 * n * f + i] = base[i] + 0.001 * f;
  const capture: Capture = {
    name: 'bench',
    fps: 60,
    frameCount: t,
    vertexCount: n,
    positions,
    basePositions: base,
    triangles: Uint32Array.from({ length: 3 * (n - 2) }, (_, k) => Math.floor(k / 3) + (k % 3)),
    clip: null,
    warnings: [],
  };
  let bytes: Uint8Array = new Uint8Array(0);
  const writeMs = await timeIt(async () => (bytes = await writeCaptureGlb(capture)));
  // Two loads: the first includes compiling the reader, the second is the steady rate.
  const readMs = [await timeIt(() => readCapture(bytes)), await timeIt(() => readCapture(bytes))];
  const mb = bytes.byteLength / 1e6;
  const rate = (ms: number) => (mb / (ms / 1000)).toFixed(0);
  console.log(
    `capture   write ${n} vertices × ${t} frames: ${writeMs.toFixed(0)} ms (${mb.toFixed(0)} MB file, ${rate(writeMs)} MB/s)`,
  );
  console.log(
    `capture   load  ${n} vertices × ${t} frames: ${readMs[1].toFixed(0)} ms = ${rate(readMs[1])} MB/s ` +
      `(first load ${readMs[0].toFixed(0)} ms = ${rate(readMs[0])} MB/s)`,
  );
}
