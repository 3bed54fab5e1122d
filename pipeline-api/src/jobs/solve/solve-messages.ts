// What the worker's main thread and a solver thread say to each other. Files go in as bytes and
// come back as bytes; everything else is plain data.
import type { Controls } from '@overshoot/solver';
import type {
  ProfileDriver,
  ProfileMode,
  ProfileSpectrum,
  TissueProfile,
} from '../../library/entities/tissue-profile.entity';
import type { LearnSettings } from '../entities/learn-job.entity';

/** Learn a profile: character and capture files in, profile file and its summary out. */
export interface LearnRequest {
  kind: 'learn';
  name: string;
  character: Uint8Array;
  capture: Uint8Array;
  settings: LearnSettings;
}

/** What a learn gives back. */
export interface LearnReply {
  /** The profile file (the solver's profile format). */
  profile: Uint8Array;
  modes: ProfileMode[];
  fitReport: Record<string, unknown>;
  spectra: ProfileSpectrum[];
  drivers: ProfileDriver[];
  sourceJoints: string[];
}

/** Fills a profile row with what a learn gave back and the key its file was stored under. */
export function recordLearned(profile: TissueProfile, reply: LearnReply, fileKey: string): void {
  const { modes, fitReport, spectra, drivers, sourceJoints } = reply;
  Object.assign(profile, { modes, fitReport, spectra, drivers, sourceJoints, files: [fileKey] });
}

/** Retarget a shot: profile, character and clip files in, take file and its figures out. */
export interface RetargetRequest {
  kind: 'retarget';
  profile: Uint8Array;
  character: Uint8Array;
  clip: Uint8Array;
  clipKind: 'bvh' | 'gltf';
  controls: Partial<Controls>;
  jointMap: Record<string, string> | null;
  /** Shot frames, inclusive, at the shot rate. */
  frames: [number, number];
  /** Shot rate (the clip is resampled to it first when it differs). */
  fps: number;
}

/** What a retarget gives back. */
export interface RetargetReply {
  /** The take .glb. */
  take: Uint8Array;
  metrics: Record<string, unknown>;
}

/** Any request. */
export type SolveRequest = LearnRequest | RetargetRequest;

/** A thrown error, as plain data (a SolverInputError keeps its code and location). */
export interface ThreadError {
  name: string;
  message: string;
  code?: string;
  where?: Record<string, unknown>;
  stack?: string;
}

/** A message from a solver thread. */
export type ThreadMessage =
  | { type: 'progress'; stage: string; fraction: number }
  | { type: 'done'; reply: LearnReply | RetargetReply }
  | { type: 'error'; error: ThreadError };
