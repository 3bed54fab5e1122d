// `overshoot-solve learn`: character + capture (+ optional clip) → tissue profile file. JSON summary
// on stdout, progress on stderr, exit 2 with the error code on bad input; nothing is written on
// failure (the profile goes to a temporary file renamed into place once complete).
import { readFile, rename, rm, writeFile } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import { extname } from 'node:path';
import { parseArgs } from 'node:util';
import { isSolverInputError } from '../errors.js';
import { readCapture } from '../io/gltf-capture.js';
import { readCharacter } from '../io/gltf-character.js';
import { writeProfile } from '../io/profile-format.js';
import { readClip } from '../io/read-clip.js';
import { learnProfile, LEARN_DEFAULTS } from '../learn/learn.js';
import { startKernelThreads, stopKernelThreads } from '../linalg/kernel-threads.js';

/** Worker threads by default: one per core besides the calling thread. */
const DEFAULT_THREADS = Math.max(0, availableParallelism() - 1);

/** Usage of the learn command. */
export const LEARN_USAGE = `usage: overshoot-solve learn --character C.glb --capture P.glb [--clip S.bvh|S.glb] --out PROFILE
         [--max-modes ${LEARN_DEFAULTS.maxModes}] [--cutoff-hz HZ|off] [--threads N]

  --max-modes N    most tissue directions kept; K is the number of directions found above the
                   noise, at most N (default ${LEARN_DEFAULTS.maxModes})
  --cutoff-hz HZ   low-pass cut-off of the pose-driven fit (default: off, the full band)
  --threads N      worker threads for the big products besides this one (default: cores − 1,
                   here ${DEFAULT_THREADS}; 0: this thread only); the profile is the same for any N
`;

/** A usage problem (exit 2, like bad input). */
class UsageError extends Error {}

async function readInput(path: string): Promise<Uint8Array> {
  try {
    return new Uint8Array(await readFile(path));
  } catch (e) {
    throw new UsageError(`cannot read ${path}: ${(e as Error).message}`);
  }
}

function positive(
  name: string,
  text: string | undefined,
  fallback: number,
  integer: boolean,
): number {
  if (text === undefined) return fallback;
  const v = Number(text);
  if (!(v > 0) || !Number.isFinite(v) || (integer && !Number.isInteger(v))) {
    throw new UsageError(
      `--${name} must be a positive ${integer ? 'integer' : 'number'}, not "${text}"`,
    );
  }
  return v;
}

/** A count of worker threads: an integer ≥ 0. */
function threadCount(text: string | undefined): number {
  if (text === undefined) return DEFAULT_THREADS;
  const v = Number(text);
  if (!Number.isInteger(v) || v < 0 || text.trim() === '') {
    throw new UsageError(`--threads must be an integer ≥ 0, not "${text}"`);
  }
  return v;
}

/** Runs `learn` with its arguments; resolves to the exit code. */
export async function learnCommand(args: string[]): Promise<number> {
  try {
    return await run(args);
  } catch (e) {
    if (e instanceof UsageError) {
      process.stderr.write(`BAD_ARGUMENTS: ${e.message}\n\n${LEARN_USAGE}`);
      return 2;
    }
    if (isSolverInputError(e)) {
      process.stderr.write(`${e.code}: ${e.message} ${JSON.stringify(e.where)}\n`);
      return 2;
    }
    throw e;
  }
}

async function run(args: string[]): Promise<number> {
  if (args.includes('--help') || args.includes('-h')) {
    process.stdout.write(LEARN_USAGE);
    return 0;
  }
  let values: Record<string, string | undefined>;
  try {
    ({ values } = parseArgs({
      args,
      strict: true,
      options: {
        character: { type: 'string' },
        capture: { type: 'string' },
        clip: { type: 'string' },
        out: { type: 'string' },
        'max-modes': { type: 'string' },
        'cutoff-hz': { type: 'string' },
        threads: { type: 'string' },
      },
    }));
  } catch (e) {
    throw new UsageError((e as Error).message);
  }
  for (const required of ['character', 'capture', 'out']) {
    if (!values[required]) throw new UsageError(`--${required} is required`);
  }
  const maxModes = positive('max-modes', values['max-modes'], LEARN_DEFAULTS.maxModes, true);
  const cutoffText = values['cutoff-hz'];
  const cutoffHz =
    cutoffText === 'off' ? Infinity : positive('cutoff-hz', cutoffText, LEARN_DEFAULTS.cutoffHz, false); // prettier-ignore
  const threads = threadCount(values.threads);
  const character = await readCharacter(await readInput(values.character as string));
  const capture = await readCapture(await readInput(values.capture as string));
  let clip = null;
  if (values.clip) {
    const kind = extname(values.clip).toLowerCase() === '.bvh' ? 'bvh' : 'gltf';
    clip = await readClip(await readInput(values.clip), kind);
  }
  let last = '';
  // Worker threads pay for the big snapshot products only; results are bit-identical anyway.
  const started = threads > 0 ? await startKernelThreads({ threads }) : 0;
  process.stderr.write(`learn: ${started} worker thread${started === 1 ? '' : 's'}\n`);
  let result;
  try {
    result = learnProfile(character, capture, {
      clip,
      maxModes,
      cutoffHz,
      onProgress: (stage, fraction) => {
        const line = `${stage} ${Math.round(fraction * 100)}%`;
        if (line !== last) process.stderr.write(`learn: ${line}\n`);
        last = line;
      },
    });
  } finally {
    await stopKernelThreads();
  }
  const out = values.out as string;
  const temp = `${out}.partial-${process.pid}`;
  try {
    await writeFile(temp, writeProfile(result.profile));
    await rename(temp, out);
  } catch (e) {
    await rm(temp, { force: true });
    throw e;
  }
  const { profile } = result;
  process.stdout.write(
    `${JSON.stringify(
      {
        out,
        id: profile.id,
        name: profile.name,
        fps: profile.fps,
        basisSize: profile.dynamics.k,
        drivers: profile.drivers.map((d) => d.joint),
        clipSource: result.clipSource,
        threads: started,
        modes: profile.modes,
        fitReport: profile.fitReport,
        timingsMs: result.timings,
      },
      null,
      2,
    )}\n`,
  );
  return 0;
}
