// The manifest lets `npm run generate` skip work: it is current only while the generator's
// inputs are unchanged and every listed file is intact.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { inputsHash, isCurrent, sha256, type Manifest } from '../generate/manifest.js';
import { SEED } from '../generate/scenario.js';
import { FILES_DIR, manifest } from './helpers/sample-files.js';

const GENERATOR_DIR = join(dirname(fileURLToPath(import.meta.url)), '..', 'generate');
const dir = mkdtempSync(join(tmpdir(), 'overshoot-manifest-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('manifest', () => {
  it('records the inputs of the files on disk, so generating again is a no-op', () => {
    const m = manifest();
    expect(m.inputsHash).toBe(inputsHash(GENERATOR_DIR, SEED));
    expect(isCurrent(FILES_DIR, m, m.inputsHash)).toBe(true);
  });

  it('is not current when a file changed, went missing or the inputs differ', () => {
    const bytes = new TextEncoder().encode('content');
    writeFileSync(join(dir, 'a.txt'), bytes);
    const m = { inputsHash: 'h', files: [{ path: 'a.txt', bytes: bytes.length, sha256: sha256(bytes) }] } as Manifest; // prettier-ignore
    expect(isCurrent(dir, m, 'h')).toBe(true);
    expect(isCurrent(dir, m, 'other')).toBe(false);
    expect(isCurrent(dir, null, 'h')).toBe(false);
    writeFileSync(join(dir, 'a.txt'), 'contenT');
    expect(isCurrent(dir, m, 'h')).toBe(false);
    rmSync(join(dir, 'a.txt'));
    expect(isCurrent(dir, m, 'h')).toBe(false);
  });

  it('changes its inputs hash with the seed', () => {
    expect(inputsHash(GENERATOR_DIR, SEED + 1)).not.toBe(inputsHash(GENERATOR_DIR, SEED));
  });
});
