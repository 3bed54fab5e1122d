// `overshoot-solve retarget`, run as a child process on files in a temp folder: JSON on stdout,
// progress on stderr, exit 2 with the error code on bad input and nothing written.
import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeProfile } from '../../src/io/profile-format.js';
import { readTakeGlb, writeCharacterGlb, writeClipGlb } from '../../src/index.js';
import { landingMotion, sampledClip } from '../helpers/known-clips.js';
import { knownProfile } from '../helpers/known-profile.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';
import { TWO_MODES } from '../retarget/fixtures.js';

const main = fileURLToPath(new URL('../../src/cli/main.ts', import.meta.url));

function run(args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile(process.execPath, ['--import', 'tsx', main, ...args], (error, stdout, stderr) => {
      resolve({ code: error ? ((error as { code?: number }).code ?? 1) : 0, stdout, stderr });
    });
  });
}

let dir = '';
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'overshoot-retarget-'));
  const character = syntheticCharacter();
  await writeFile(join(dir, 'body.glb'), await writeCharacterGlb(character));
  await writeFile(
    join(dir, 'jump.glb'),
    await writeClipGlb(sampledClip(character, 30, 2, landingMotion(0.3))),
  );
  await writeFile(join(dir, 'body.profile'), writeProfile(knownProfile(character, 60, TWO_MODES)));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

const base = () => [
  'retarget',
  '--profile',
  join(dir, 'body.profile'),
  '--character',
  join(dir, 'body.glb'),
  '--clip',
  join(dir, 'jump.glb'),
];

describe('overshoot-solve retarget', () => {
  it('writes a take and prints its summary as JSON, progress on stderr', async () => {
    const out = join(dir, 'take.glb');
    const r = await run([
      ...base(),
      '--out',
      out,
      '--gain',
      '2',
      '--stiffness',
      '1.2',
      '--preroll-s',
      '0.5',
    ]);
    expect(r.stderr).toContain('progress simulate');
    expect(r.code).toBe(0);
    const summary = JSON.parse(r.stdout);
    expect(summary).toMatchObject({
      out,
      fps: 30,
      frameCount: 61,
      controls: { gain: 2, stiffness: 1.2, prerollSeconds: 0.5 },
    });
    expect(summary.modes).toHaveLength(2);
    const take = await readTakeGlb(new Uint8Array(await readFile(out)));
    expect(take.extras.controls.gain).toBe(2);
  });

  it('exits 2 with the error code and writes nothing on bad input', async () => {
    const out = join(dir, 'bad.glb');
    const region = await run([...base(), '--out', out, '--region-gain', 'tail=2']);
    expect(region.code).toBe(2);
    expect(region.stdout).toBe('');
    expect(region.stderr).toMatch(/^UNKNOWN_REGION: /m);
    const short = await run([...base(), '--out', out, '--preroll-s', '5']);
    expect(short.code).toBe(2);
    expect(short.stderr).toMatch(/^CLIP_TOO_SHORT: /m);
    const usage = await run([...base(), '--out', out, '--gain', 'loud']);
    expect(usage.code).toBe(2);
    expect(usage.stderr).toMatch(/^BAD_ARGUMENTS: /m);
    expect(existsSync(out)).toBe(false);
  });
});
