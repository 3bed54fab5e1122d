// The committed bad-input corpus: every file is rejected through the public entry with its
// expected code and location, as a SolverInputError with a readable message, and the generator
// still writes exactly the committed bytes.
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  inspectFile,
  readCapture,
  readCharacter,
  SolverInputError,
  validateCapture,
} from '../../src/index.js';
import {
  BAD_DIR,
  buildBadCorpus,
  EXPECTED_FILE,
  FIXTURES_DIR,
  type ExpectedEntry,
} from '../fixtures/make-bad-corpus.js';

const expected: Record<string, ExpectedEntry> = JSON.parse(
  await readFile(join(BAD_DIR, EXPECTED_FILE), 'utf8'),
);
const files = (await readdir(BAD_DIR)).filter((f) => f !== EXPECTED_FILE).sort();

/** The error thrown by `fn`, or a failure when it returns normally. */
async function thrownBy(fn: () => Promise<unknown>): Promise<unknown> {
  try {
    await fn();
  } catch (e) {
    return e;
  }
  throw new Error('expected the input to be rejected, but it was accepted');
}

/** Reads a bad file the way a user would: inspect, or for captures, validate against the character. */
async function reject(name: string, entry: ExpectedEntry): Promise<unknown> {
  const bytes = new Uint8Array(await readFile(join(BAD_DIR, name)));
  if (!entry.character) return thrownBy(() => inspectFile(bytes, name));
  const character = await readCharacter(
    new Uint8Array(await readFile(join(FIXTURES_DIR, entry.character))),
  );
  return thrownBy(async () => validateCapture(character, await readCapture(bytes)));
}

describe('bad-input corpus', () => {
  it('lists every file in expected.json and nothing more, with at least 25 small files', async () => {
    expect(Object.keys(expected).sort()).toEqual(files);
    expect(files.length).toBeGreaterThanOrEqual(25);
    let total = 0;
    for (const f of files) total += (await readFile(join(BAD_DIR, f))).byteLength;
    expect(total).toBeLessThan(1_000_000);
  });

  it.each(files)('rejects %s with its expected code and location', async (name) => {
    const entry = expected[name];
    const e = await reject(name, entry);
    // Never a crash from deeper down: only the typed input error.
    expect(e).toBeInstanceOf(SolverInputError);
    const error = e as SolverInputError;
    expect({ file: name, code: error.code }).toEqual({ file: name, code: entry.code });
    if (entry.where) expect(error.where).toMatchObject(entry.where);
    // A human sentence: several words, one line, no leaked internals.
    expect(error.message.split(/\s+/).length).toBeGreaterThanOrEqual(3);
    expect(error.message).toMatch(/[a-z]{2,}/);
    expect(error.message).not.toMatch(/\n|undefined|\[object |TypeError|RangeError/);
  });

  it('is reproduced byte for byte by make-bad-corpus.ts', async () => {
    const generated = await buildBadCorpus();
    const onDisk = [...files, EXPECTED_FILE].map((f) => `bad/${f}`);
    expect([...generated.keys()].filter((k) => k.startsWith('bad/')).sort()).toEqual(onDisk.sort());
    for (const [path, bytes] of generated) {
      const committed = new Uint8Array(await readFile(join(FIXTURES_DIR, path)));
      expect({ path, same: Buffer.compare(committed, bytes) === 0 }).toEqual({ path, same: true });
    }
  });
});
