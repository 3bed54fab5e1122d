// The generator is deterministic: the same seed gives byte-identical files, the seed changes only
// the measurement noise, and the committed files are exactly what the generator makes today.
import { readCapture } from '@overshoot/solver';
import { describe, expect, it } from 'vitest';
import { generateAll } from '../generate/generate-all.js';
import { SEED } from '../generate/scenario.js';
import { fileBytes, manifest } from './helpers/sample-files.js';

const small = { cellScale: 2.2, captureSeconds: 1.5 };

function same(a: Uint8Array, b: Uint8Array): boolean {
  return a.length === b.length && Buffer.compare(Buffer.from(a), Buffer.from(b)) === 0;
}

describe('generator', () => {
  it('gives byte-identical files when run twice with the same seed', async () => {
    const one = await generateAll({ seed: 11, ...small });
    const two = await generateAll({ seed: 11, ...small });
    expect([...two.files.keys()]).toEqual([...one.files.keys()]);
    for (const [path, bytes] of one.files)
      expect(same(bytes, two.files.get(path)!), path).toBe(true);
  }, 30_000);

  it('changes only the measurement noise with another seed', async () => {
    const a = await generateAll({ seed: 11, ...small });
    const b = await generateAll({ seed: 12, ...small });
    const positions = async (set: typeof a, key: string) => {
      const entry = set.index.captures.find((c) => c.key === key)!;
      return (await readCapture(set.files.get(entry.file)!)).positions;
    };
    for (const c of a.index.captures) {
      const pa = await positions(a, c.key);
      const pb = await positions(b, c.key);
      let diff = 0;
      for (let i = 0; i < pa.length; i++) diff = Math.max(diff, Math.abs(pa[i] - pb[i]));
      if (c.noiseSigmaMetres === 0) expect(diff, c.key).toBe(0);
      else {
        expect(diff, c.key).toBeGreaterThan(c.noiseSigmaMetres);
        expect(diff, c.key).toBeLessThan(12 * c.noiseSigmaMetres);
      }
    }
  }, 30_000);

  it('reproduces the files on disk exactly', async () => {
    const { files } = await generateAll({ seed: SEED });
    const listed = manifest().files.map((f) => f.path);
    expect([...files.keys()].sort()).toEqual(listed);
    for (const [path, bytes] of files) {
      const hint = `${path} differs from a fresh generation: run npm run generate -w assets-sample -- --force`;
      expect(same(bytes, fileBytes(path)), hint).toBe(true);
    }
  }, 60_000);
});
