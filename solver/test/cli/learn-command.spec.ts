// The learn and modes commands, run as child processes on invented files in a temp folder.
import { execFile } from 'node:child_process';
import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readProfile, writeCaptureGlb, writeCharacterGlb } from '../../src/index.js';
import { readFile } from 'node:fs/promises';
import { tissueCapture } from '../helpers/tissue-capture.js';

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
  dir = await mkdtemp(join(tmpdir(), 'overshoot-learn-'));
  const { character, capture } = tissueCapture(3, 60);
  await writeFile(join(dir, 'body.glb'), await writeCharacterGlb(character));
  await writeFile(join(dir, 'capture.glb'), await writeCaptureGlb(capture));
  const still = capture.positions.slice();
  const d = 3 * capture.vertexCount;
  for (let t = 1; t < capture.frameCount; t++) still.copyWithin(t * d, 0, d);
  await writeFile(join(dir, 'still.glb'), await writeCaptureGlb({ ...capture, positions: still }));
});
afterAll(() => rm(dir, { recursive: true, force: true }));

describe('overshoot-solve learn and modes', () => {
  it('writes a profile, prints a JSON summary and progress, and lists its modes', async () => {
    const out = join(dir, 'tissue.ovsp');
    const r = await run([
      'learn',
      '--character',
      join(dir, 'body.glb'),
      '--capture',
      join(dir, 'capture.glb'),
      '--out',
      out,
      '--max-modes',
      '4',
    ]);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain('learn: report 100%');
    const summary = JSON.parse(r.stdout);
    const profile = readProfile(new Uint8Array(await readFile(out)));
    expect(summary.id).toBe(profile.id);
    expect(profile.dynamics.k).toBeLessThanOrEqual(4);
    const modes = await run(['modes', out]);
    expect(modes.code).toBe(0);
    const rows = JSON.parse(modes.stdout);
    expect(rows).toEqual(
      profile.modes.map(({ frequencyHz, dampingRatio, region, energyShare }) => ({
        frequencyHz,
        dampingRatio,
        region,
        energyShare,
      })),
    );
  }, 60_000);

  it('exits 2 with NO_MOTION for a capture that never moves and writes nothing', async () => {
    const out = join(dir, 'none.ovsp');
    const r = await run([
      'learn',
      '--character',
      join(dir, 'body.glb'),
      '--capture',
      join(dir, 'still.glb'),
      '--out',
      out,
    ]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^NO_MOTION: /m);
    expect(r.stdout).toBe('');
    expect((await readdir(dir)).filter((f) => f.startsWith('none'))).toEqual([]);
  }, 60_000);

  it('starts the worker threads asked for and writes the same profile as without', async () => {
    const learn = (threads: string, out: string) =>
      run(['learn', '--character', join(dir, 'body.glb'), '--capture', join(dir, 'capture.glb'), '--out', join(dir, out), '--max-modes', '4', '--threads', threads, '--cutoff-hz', 'off']); // prettier-ignore
    const [alone, pooled] = [await learn('0', 'alone.ovsp'), await learn('1', 'pooled.ovsp')];
    expect(alone.code).toBe(0);
    expect(pooled.code).toBe(0);
    expect(JSON.parse(alone.stdout).threads).toBe(0);
    expect(JSON.parse(pooled.stdout).threads).toBe(1);
    expect(pooled.stderr).toContain('learn: 1 worker thread\n');
    const bytes = await Promise.all(['alone', 'pooled'].map((f) => readFile(join(dir, `${f}.ovsp`)))); // prettier-ignore
    expect(bytes[1].equals(bytes[0])).toBe(true);
  }, 60_000);

  it('exits 2 with BAD_ARGUMENTS and the usage for a thread count that is not a whole number ≥ 0', async () => {
    const r = await run(['learn', '--character', 'a.glb', '--capture', 'b.glb', '--out', 'c', '--threads=-1']); // prettier-ignore
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^BAD_ARGUMENTS: --threads must be an integer ≥ 0/);
    expect(r.stderr).toContain('--threads N');
  });

  it('exits 2 with NOT_A_PROFILE when modes is given another file', async () => {
    const r = await run(['modes', join(dir, 'body.glb')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^NOT_A_PROFILE: /);
  });
});
