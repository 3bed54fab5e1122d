// The captures' ground truth, checked independently of the generator: unposing each capture with
// the known clip (read from its BVH file, through the solver) leaves exactly the correctives plus
// the mode responses (plus noise), and the stored responses are the stated damped modes.
import { readBvh, readCapture, readCharacter, unpose } from '@overshoot/solver';
import { describe, expect, it } from 'vitest';
import { leastSquares } from './helpers/linear-algebra.js';
import { fileBytes, groundTruth, manifest } from './helpers/sample-files.js';

const m = manifest();

describe.each(m.captures.map((c) => [c.key, c] as const))('capture %s', (_, entry) => {
  const { truth, array } = groundTruth(entry.groundTruth);
  const T: number = truth.frameCount;
  const N: number = truth.vertexCount;
  const K: number = truth.modes.length;
  const C: number = truth.correctives.length;
  const modeShapes = array('modeShapes');
  const correctiveShapes = array('correctiveShapes');
  const responses = array('modeResponses');
  const activations = array('correctiveActivations');
  const shape = (s: Float32Array | Float64Array, k: number) =>
    s.subarray(3 * N * k, 3 * N * (k + 1));

  it('names the files, modes, regions, drivers and noise it describes', () => {
    expect(truth).toMatchObject({ invented: true, fps: 60, capture: entry.file, clip: { name: entry.clip } }); // prettier-ignore
    expect(K).toBeGreaterThanOrEqual(3);
    for (const mode of truth.modes) {
      expect(mode.frequencyHz).toBeGreaterThanOrEqual(1.5);
      expect(mode.frequencyHz).toBeLessThanOrEqual(8);
      expect(mode.dampingRatio).toBeGreaterThanOrEqual(0.05);
      expect(mode.dampingRatio).toBeLessThanOrEqual(0.4);
      expect(truth.regions.names).toContain(mode.region);
      expect(truth.drivers.map((d: { joint: string }) => d.joint)).toContain(mode.driver);
    }
    expect(truth.noise === null ? 0 : truth.noise.sigmaMetres).toBe(entry.noiseSigmaMetres);
  });

  it('confines each mode shape to its region and keeps it orthogonal to the correctives', async () => {
    const character = await readCharacter(fileBytes(truth.character));
    const labels = character.regions!.labels;
    truth.modes.forEach((mode: { region: string }, k: number) => {
      const r = character.regions!.names.indexOf(mode.region);
      const s = shape(modeShapes, k);
      let inside = 0;
      for (let v = 0; v < N; v++) {
        const len = Math.hypot(s[3 * v], s[3 * v + 1], s[3 * v + 2]);
        if (labels[v] !== r) expect(len, `${mode.region} vertex ${v}`).toBe(0);
        else inside = Math.max(inside, len);
      }
      expect(inside).toBeCloseTo(1, 5);
      for (let c = 0; c < C; c++) {
        const cs = shape(correctiveShapes, c);
        let dot = 0, nc = 0; // prettier-ignore
        for (let i = 0; i < 3 * N; i++) {
          dot += s[i] * cs[i];
          nc += cs[i] * cs[i];
        }
        expect(Math.abs(dot) / Math.sqrt(nc)).toBeLessThan(1e-5);
      }
    });
  });

  it('is rebuilt by unposing the capture and projecting on the known shapes', async () => {
    const character = await readCharacter(fileBytes(truth.character));
    const capture = await readCapture(fileBytes(entry.file));
    const clip = readBvh(new TextDecoder().decode(fileBytes(truth.clip.bvh)));
    expect(capture.frameCount).toBe(T);
    const { residuals, degenerate } = unpose(character, capture, clip);
    expect(degenerate).toBe(0);
    const columns = [...Array.from({ length: C }, (_, c) => shape(correctiveShapes, c)), ...Array.from({ length: K }, (_, k) => shape(modeShapes, k))]; // prettier-ignore
    const sigma: number = truth.noise?.sigmaMetres ?? 0;
    // White noise of σ projects onto a shape with a standard error of about σ/‖shape‖; the
    // tolerance is 5 of those plus what BVH text and float32 storage lose without noise.
    const tolerance = columns.map((col) => {
      let n2 = 0;
      for (const x of col) n2 += x * x;
      return 5 * (sigma / Math.sqrt(n2)) + 2e-5 / Math.sqrt(n2);
    });
    let sumLeft = 0;
    let worst = 0;
    for (let t = 0; t < T; t += 3) {
      const r = residuals.subarray(3 * N * t, 3 * N * (t + 1));
      const coef = leastSquares(columns, r);
      const known = [...activations.subarray(t * C, (t + 1) * C), ...responses.subarray(t * K, (t + 1) * K)]; // prettier-ignore
      coef.forEach((x, j) => (worst = Math.max(worst, Math.abs(x - known[j]) / tolerance[j])));
      for (let i = 0; i < 3 * N; i++) {
        let fit = 0;
        for (let j = 0; j < C + K; j++) fit += coef[j] * columns[j][i];
        sumLeft += (r[i] - fit) ** 2;
      }
    }
    const left = Math.sqrt(sumLeft / (Math.ceil(T / 3) * 3 * N));
    // BVH text keeps 1e-6 m and 1e-6°, float32 storage ~1e-7 m: a few µm at most without noise.
    expect(left).toBeLessThan(Math.max(5e-6, 1.1 * sigma));
    if (sigma > 0) expect(left).toBeGreaterThan(0.8 * sigma);
    expect(worst).toBeLessThan(1);
    // The dynamic part is far above these errors: the check can tell it apart.
    expect(Math.max(...truth.modes.map((x: { peakDisplacement: number }) => x.peakDisplacement))).toBeGreaterThan(0.01); // prettier-ignore
  });

  // Discrete poles z = e^{sT} of a sampled second-order system (Franklin, Powell & Workman,
  // "Digital Control of Dynamic Systems"): an AR(2) fit with input taps on the stored responses
  // gives back each mode's natural frequency and damping ratio.
  it('stores responses that are the stated damped modes', () => {
    const force = array('driverSpecificForce');
    const D: number = truth.drivers.length;
    const rest: number[] = truth.model.restSpecificForce;
    truth.modes.forEach(
      (
        mode: { driver: string; inputGain: number[]; frequencyHz: number; dampingRatio: number },
        k: number,
      ) => {
        // prettier-ignore
        const d = truth.drivers.findIndex((x: { joint: string }) => x.joint === mode.driver);
        const u = (t: number) => {
          let s = 0;
          for (let c = 0; c < 3; c++)
            s += mode.inputGain[c] * (force[3 * (t * D + d) + c] - rest[c]);
          return s;
        };
        const q = (t: number) => responses[t * K + k];
        const rows = Array.from({ length: T - 2 }, (_, i) => i + 2);
        const col = (f: (t: number) => number) => rows.map(f);
        const [a1, a2] = leastSquares([col((t) => q(t - 1)), col((t) => q(t - 2)), col(u), col((t) => u(t - 1)), col((t) => u(t - 2))], col(q)); // prettier-ignore
        const re = a1 / 2;
        const im = Math.sqrt(-(a1 * a1 + 4 * a2)) / 2;
        const s = {
          re: Math.log(Math.hypot(re, im)) * truth.fps,
          im: Math.atan2(im, re) * truth.fps,
        };
        const wn = Math.hypot(s.re, s.im);
        expect(wn / (2 * Math.PI) / mode.frequencyHz).toBeCloseTo(1, 2);
        expect(Math.abs(-s.re / wn / mode.dampingRatio - 1)).toBeLessThan(0.02);
      },
    );
  });
});
