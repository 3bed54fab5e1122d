// `overshoot-solve retarget`: profile + character + clip → take .glb. JSON result on stdout,
// progress on stderr, exit 2 with the error code on bad input; nothing is written on failure
// (the take goes to a temporary file renamed into place only once complete).
import { readFile, rename, rm, writeFile } from 'node:fs/promises';
import { extname } from 'node:path';
import { parseArgs } from 'node:util';
import { SolverInputError } from '../errors.js';
import { readCharacter } from '../io/gltf-character.js';
import { readProfile } from '../io/profile-format.js';
import { readClip } from '../io/read-clip.js';
import { writeTakeGlb } from '../io/take-writer.js';
import { parseJointMap } from '../rig/joint-map.js';
import { retarget } from '../retarget/retarget.js';
import type { Controls } from '../types.js';

/** Usage of the retarget command. */
export const RETARGET_USAGE = `usage: overshoot-solve retarget --profile PROFILE --character T.glb --clip M.bvh|M.glb --out TAKE.glb
         [--gain 1] [--region-gain NAME=VALUE ...] [--stiffness 1] [--damping 1] [--preroll-s 1]
         [--physical-scaling] [--joint-map MAP.json] [--frames A:B] [--fps F]
`;

/** A usage problem (exit 2, like bad input). */
class UsageError extends Error {}

/** Runs `retarget` with its arguments; resolves to the exit code. */
export async function retargetCommand(args: string[]): Promise<number> {
  try {
    return await run(args);
  } catch (e) {
    if (e instanceof UsageError) {
      process.stderr.write(`BAD_ARGUMENTS: ${e.message}\n\n${RETARGET_USAGE}`);
      return 2;
    }
    if (e instanceof SolverInputError) {
      process.stderr.write(`${e.code}: ${e.message} ${JSON.stringify(e.where)}\n`);
      return 2;
    }
    throw e;
  }
}

async function run(args: string[]): Promise<number> {
  if (args.includes('--help') || args.includes('-h')) {
    process.stdout.write(RETARGET_USAGE);
    return 0;
  }
  let values;
  try {
    ({ values } = parseArgs({
      args,
      strict: true,
      options: {
        profile: { type: 'string' },
        character: { type: 'string' },
        clip: { type: 'string' },
        out: { type: 'string' },
        gain: { type: 'string' },
        'region-gain': { type: 'string', multiple: true },
        stiffness: { type: 'string' },
        damping: { type: 'string' },
        'preroll-s': { type: 'string' },
        'physical-scaling': { type: 'boolean' },
        'joint-map': { type: 'string' },
        frames: { type: 'string' },
        fps: { type: 'string' },
      },
    }));
  } catch (e) {
    throw new UsageError((e as Error).message);
  }
  for (const required of ['profile', 'character', 'clip', 'out'] as const) {
    if (!values[required]) throw new UsageError(`--${required} is required`);
  }
  const controls: Partial<Controls> = {};
  if (values.gain !== undefined) controls.gain = number('gain', values.gain);
  if (values.stiffness !== undefined) controls.stiffness = number('stiffness', values.stiffness);
  if (values.damping !== undefined) controls.damping = number('damping', values.damping);
  if (values['preroll-s'] !== undefined)
    controls.prerollSeconds = number('preroll-s', values['preroll-s']);
  if (values['physical-scaling']) controls.physicalScaling = true;
  if (values['region-gain']) {
    controls.regionGains = {};
    for (const pair of values['region-gain']) {
      const eq = pair.lastIndexOf('=');
      if (eq <= 0) throw new UsageError(`--region-gain takes NAME=VALUE, got "${pair}"`);
      controls.regionGains[pair.slice(0, eq)] = number('region-gain', pair.slice(eq + 1));
    }
  }
  let frames: [number, number] | null = null;
  if (values.frames !== undefined) {
    const m = values.frames.match(/^(\d+):(\d+)$/);
    if (!m)
      throw new UsageError(`--frames takes A:B (inclusive frame numbers), got "${values.frames}"`);
    frames = [Number(m[1]), Number(m[2])];
  }
  const fps = values.fps !== undefined ? number('fps', values.fps) : null;

  const profile = readProfile(await readInput(values.profile!));
  const character = await readCharacter(await readInput(values.character!));
  const clipPath = values.clip!;
  const kind = extname(clipPath).toLowerCase() === '.bvh' ? 'bvh' : 'gltf';
  const clip = await readClip(await readInput(clipPath), kind);
  const jointMap = values['joint-map']
    ? parseJointMap(new TextDecoder().decode(await readInput(values['joint-map'])))
    : null;

  const result = retarget(profile, character, clip, {
    controls,
    jointMap,
    frames,
    fps,
    onProgress: (stage, fraction) => {
      process.stderr.write(`progress ${stage} ${Math.round(100 * fraction)}%\n`);
    },
  });
  const bytes = await writeTakeGlb(result.take, character, result.clip);
  const out = values.out!;
  const partial = `${out}.partial-${process.pid}`;
  try {
    await writeFile(partial, bytes);
    await rename(partial, out);
  } catch (e) {
    await rm(partial, { force: true });
    throw e;
  }
  process.stderr.write('progress write 100%\n');
  const { take } = result;
  const summary = {
    out,
    bytes: bytes.length,
    profile: { id: take.profileId, name: take.profileName },
    fps: take.fps,
    frameCount: take.frameCount,
    controls: take.controls,
    modes: take.modes,
    metrics: take.metrics,
    drivers: result.drivers.entries,
    unmappedDrivers: result.drivers.unmapped,
    warnings: take.warnings,
  };
  process.stdout.write(`${JSON.stringify(summary, null, 2)}\n`);
  return 0;
}

function number(flag: string, text: string): number {
  const v = Number(text);
  if (text.trim() === '' || !Number.isFinite(v))
    throw new UsageError(`--${flag} takes a number, got "${text}"`);
  return v;
}

async function readInput(path: string): Promise<Uint8Array> {
  try {
    return new Uint8Array(await readFile(path));
  } catch (e) {
    throw new SolverInputError(
      'UNSUPPORTED_INPUT',
      `cannot read ${path}: ${(e as Error).message}`,
      { item: path },
    );
  }
}
