// The overshoot-solve command line, run as a child process on files written to a temp folder.
import { execFile } from 'node:child_process';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeCaptureGlb, writeCharacterGlb } from '../../src/index.js';
import { makeBvh } from '../helpers/bvh-text.js';
import { syntheticCapture, syntheticClip } from '../helpers/synthetic-capture.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';

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
  dir = await mkdtemp(join(tmpdir(), 'overshoot-cli-'));
  const character = syntheticCharacter();
  await writeFile(join(dir, 'body.glb'), await writeCharacterGlb(character));
  const { capture } = syntheticCapture(character, syntheticClip(character, 6, 60));
  await writeFile(join(dir, 'capture.glb'), await writeCaptureGlb(capture));
  await writeFile(join(dir, 'walk.bvh'), makeBvh(5, 1 / 30));
  await writeFile(
    join(dir, 'broken.bvh'),
    makeBvh(5, 1 / 30).replace(/Frame Time: .*/, 'Frame Time: -1'),
  );
});
afterAll(() => rm(dir, { recursive: true, force: true }));

describe('overshoot-solve inspect', () => {
  it('describes a character as JSON', async () => {
    const r = await run(['inspect', join(dir, 'body.glb')]);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    const c = syntheticCharacter();
    expect(out.kind).toBe('character');
    expect(out.vertexCount).toBe(c.restPositions.length / 3);
    expect(out.triangleCount).toBe(c.triangles.length / 3);
    expect(out.jointNames).toEqual(c.skeleton.names);
    expect(out.boundingBox.max[1]).toBeGreaterThan(1.5);
  });

  it('describes a capture and a BVH clip', async () => {
    const cap = JSON.parse((await run(['inspect', join(dir, 'capture.glb')])).stdout);
    expect(cap).toMatchObject({ kind: 'capture', frameCount: 6, fps: 60 });
    const clip = JSON.parse((await run(['inspect', join(dir, 'walk.bvh')])).stdout);
    expect(clip).toMatchObject({ kind: 'clip', frameCount: 5, fps: 30, vertexCount: 0 });
    expect(clip.jointNames).toContain('LeftHand');
  });

  it('exits 2 with the error code on stderr for an invalid file', async () => {
    const r = await run(['inspect', join(dir, 'broken.bvh')]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/^BAD_FPS: /);
  });

  it('exits 2 with "CODE: message" for a truncated .glb from the bad-input corpus', async () => {
    const file = fileURLToPath(new URL('../fixtures/bad/truncated-character.glb', import.meta.url));
    const r = await run(['inspect', file]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    // One line: the stable code, then a sentence saying what is wrong.
    expect(r.stderr).toMatch(/^TRUNCATED_FILE: file declares \d+ bytes but holds only \d+ /);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
  });

  it('exits 2 with usage for no arguments and for a learn without its required files', async () => {
    const none = await run([]);
    expect(none.code).toBe(2);
    expect(none.stderr).toContain('usage: overshoot-solve');
    const learn = await run(['learn', '--character', 'a.glb']);
    expect(learn.code).toBe(2);
    expect(learn.stderr).toMatch(/^BAD_ARGUMENTS: --capture is required/);
  });
});
