// A solver thread: runs one learn or retarget off the worker's main thread, so the main thread
// keeps renewing queue locks, reporting progress and watching for cancellation (it ends the
// thread at once when the job is canceled). The same library calls as `overshoot-solve learn`
// and `overshoot-solve retarget`, on bytes instead of paths.
import { parentPort } from 'node:worker_threads';
import {
  driverEnergyShares,
  learnProfile,
  modesMatchPeaks,
  readCapture,
  readCharacter,
  readClip,
  readProfile,
  resampleClip,
  retarget,
  startKernelThreads,
  stopKernelThreads,
  writeProfile,
  writeTake,
  type LearnResult,
} from '@overshoot/solver';
import type {
  LearnReply,
  LearnRequest,
  RetargetReply,
  RetargetRequest,
  SolveRequest,
  ThreadError,
  ThreadMessage,
} from './solve-messages';

/** Keeps six significant digits: spectra are for plotting, and JSON stays small. */
const round = (v: number) => (Number.isFinite(v) ? Number(v.toPrecision(6)) : 0);

function send(message: ThreadMessage, transfer: ArrayBuffer[] = []): void {
  parentPort?.postMessage(message, transfer);
}

const progress = (stage: string, fraction: number) => send({ type: 'progress', stage, fraction });

/**
 * Kernel worker threads a learn adds for the solver's big products, from SOLVER_THREADS. Default
 * 0: the worker already runs jobs concurrently, each in its own solve thread, and the 2-core
 * machines it runs on have no spare core for more; raise it only where cores sit idle. Profiles
 * are bit-identical whatever the count.
 */
function kernelThreads(): number {
  const raw = process.env.SOLVER_THREADS?.trim();
  if (!raw) return 0;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 0) {
    throw new Error(`SOLVER_THREADS must be a whole number ≥ 0, not "${raw}"`);
  }
  return n;
}

async function learn(req: LearnRequest): Promise<LearnReply> {
  progress('read', 0);
  const threads = kernelThreads();
  const character = await readCharacter(req.character);
  const capture = await readCapture(req.capture);
  // Retargeting has no product big enough to split, so only a learn starts them.
  if (threads > 0) await startKernelThreads({ threads });
  let result: LearnResult;
  try {
    result = learnProfile(character, capture, {
      ...req.settings,
      name: req.name,
      onProgress: progress,
    });
  } finally {
    await stopKernelThreads();
  }
  const { profile } = result;
  const shares = driverEnergyShares(profile.drivers, profile.dynamics);
  return {
    profile: writeProfile(profile),
    modes: profile.modes.map((m) => ({ ...m, flags: [...m.flags] })),
    fitReport: {
      ...profile.fitReport,
      basisSize: profile.dynamics.k,
      fps: profile.fps,
      clipSource: result.clipSource,
      peakAgreement: modesMatchPeaks(profile.modes, result.spectra, profile.fps),
    },
    spectra: result.spectra.map((s) => ({
      region: s.region,
      energyShare: round(s.energyShare),
      frequencyHz: Array.from(s.spectrum.frequencies, round),
      power: Array.from(s.spectrum.power, round),
      peaks: s.peaks.map((p) => ({ frequencyHz: round(p.frequencyHz), power: round(p.power) })),
    })),
    drivers: profile.drivers.map((d, i) => ({ joint: d.joint, energyShare: shares[i] })),
    sourceJoints: [...character.skeleton.names],
  };
}

async function retargetShot(req: RetargetRequest): Promise<RetargetReply> {
  progress('read', 0);
  const profile = readProfile(req.profile);
  const character = await readCharacter(req.character);
  const source = await readClip(req.clip, req.clipKind);
  // `frames` count from the clip's start at the shot's rate (shots/shot-frames.ts): resample to
  // the shot rate, then cut the range.
  const clip = Math.abs(source.fps - req.fps) > 1e-9 ? resampleClip(source, req.fps) : source;
  const result = retarget(profile, character, clip, {
    controls: req.controls,
    jointMap: req.jointMap,
    frames: req.frames,
    onProgress: progress,
  });
  progress('write', 1);
  const { take } = result;
  // The file's warnings: the take's own and what writing it found (e.g. correctives).
  const written = await writeTake(take, character, result.clip);
  return {
    take: written.bytes,
    metrics: {
      ...take.metrics,
      fps: take.fps,
      frameCount: take.frameCount,
      modes: take.modes,
      unmappedDrivers: result.drivers.unmapped,
      warnings: written.extras.warnings,
      profileId: take.profileId,
    },
  };
}

function asThreadError(e: unknown): ThreadError {
  const err = e as Partial<ThreadError> & { toJSON?: unknown };
  return {
    name: String(err?.name ?? 'Error'),
    message: String(err?.message ?? e),
    code: typeof err?.code === 'string' ? err.code : undefined,
    where: typeof err?.where === 'object' ? (err.where as Record<string, unknown>) : undefined,
    stack: typeof err?.stack === 'string' ? err.stack : undefined,
  };
}

parentPort?.once('message', (req: SolveRequest) => {
  const work = req.kind === 'learn' ? learn(req) : retargetShot(req);
  work.then(
    (reply) => {
      const file = 'take' in reply ? reply.take : reply.profile;
      send({ type: 'done', reply }, [file.buffer as ArrayBuffer]);
    },
    (e: unknown) => send({ type: 'error', error: asThreadError(e) }),
  );
});
