// Shape of a tissue profile: its modes, spectra, fit report and learn job, and their check.
import { parseJob, type Job } from './job-view';
import { asArray, asObject, num, oneOf, optNum, optStr, str, type Json } from '@/lib/parse-answer';

/** Where a profile is: waiting to learn, learning, usable, or failed. */
export type ProfileState = 'queued' | 'learning' | 'ready' | 'failed';
const PROFILE_STATES: readonly ProfileState[] = ['queued', 'learning', 'ready', 'failed'];

/** One oscillation the profile learned. */
export interface Mode {
  frequencyHz: number;
  dampingRatio: number;
  region: string;
  energyShare: number;
  flags: string[];
}

/** A spectrum peak. */
export interface SpectrumPeak {
  frequencyHz: number;
  power: number;
}

/** Power spectrum of one region's dynamic motion. */
export interface RegionSpectrum {
  region: string;
  frequencyHz: number[];
  power: number[];
  peaks: SpectrumPeak[];
}

/** A tissue profile. */
export interface Profile {
  id: string;
  name: string;
  state: ProfileState;
  captureId: string;
  characterId: string;
  /** The capture it was learned from has been deleted. */
  captureDeleted: boolean;
  createdAt: string;
  modes: Mode[] | null;
  /** Fit figures by name (oneStepNrmse, freeRunNrmse, varianceExplained, stabilityMargin, …). */
  fitReport: Record<string, unknown> | null;
  spectra: RegionSpectrum[] | null;
  job: Job | null;
}

function parseMode(value: unknown): Mode {
  const m = asObject(value, 'profile mode');
  return {
    frequencyHz: num(m, 'frequencyHz', 'profile mode'),
    dampingRatio: num(m, 'dampingRatio', 'profile mode'),
    region: optStr(m, 'region') ?? '',
    energyShare: optNum(m, 'energyShare') ?? 0,
    flags: Array.isArray(m.flags) ? m.flags.filter((f): f is string => typeof f === 'string') : [],
  };
}

function numbers(value: unknown): number[] {
  return Array.isArray(value) ? value.map(Number) : [];
}

function parseSpectrum(value: unknown): RegionSpectrum {
  const s = asObject(value, 'profile spectrum');
  return {
    region: optStr(s, 'region') ?? '',
    frequencyHz: numbers(s.frequencyHz),
    power: numbers(s.power),
    peaks: Array.isArray(s.peaks)
      ? s.peaks.map((p) => {
          const peak = asObject(p, 'spectrum peak');
          return { frequencyHz: Number(peak.frequencyHz), power: Number(peak.power) };
        })
      : [],
  };
}

/** Checks a profile answer and returns it typed. */
export function parseProfile(value: unknown): Profile {
  const what = 'tissue profile';
  const b = asObject(value, what);
  return {
    id: str(b, 'id', what),
    name: str(b, 'name', what),
    state: oneOf(b, 'state', PROFILE_STATES, what),
    captureId: str(b, 'captureId', what),
    characterId: str(b, 'characterId', what),
    // Older answers carry the deletion time instead of the flag.
    captureDeleted: b.captureDeleted === true || typeof b.sourceCaptureDeletedAt === 'string',
    createdAt: optStr(b, 'createdAt') ?? '',
    modes: Array.isArray(b.modes) ? asArray(b.modes, what).map(parseMode) : null,
    fitReport:
      typeof b.fitReport === 'object' && b.fitReport !== null ? (b.fitReport as Json) : null,
    spectra: Array.isArray(b.spectra) ? b.spectra.map(parseSpectrum) : null,
    job: typeof b.job === 'object' && b.job !== null ? parseJob(b.job) : null,
  };
}
