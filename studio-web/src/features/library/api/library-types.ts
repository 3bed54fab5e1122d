// Shapes of the library's answers (characters, captures, clips, uploaded files) and their checks.
import {
  asObject,
  num,
  oneOf,
  optNum,
  optStr,
  optStrings,
  str,
  type Json,
} from '@/lib/parse-answer';

/** What an uploaded file holds. */
export type AssetKind = 'character' | 'capture' | 'clip';
/** Every asset kind, in the order the library shows them. */
export const ASSET_KINDS: readonly AssetKind[] = ['character', 'capture', 'clip'];

/** Where an uploaded file is: waiting for its file or check, usable, or refused. */
export type AssetState = 'pending' | 'ready' | 'rejected';
const ASSET_STATES: readonly AssetState[] = ['pending', 'ready', 'rejected'];

/** Why a file was refused: a stable code, a sentence and where in the file. */
export interface ValidationReport {
  code: string;
  message: string;
  where: Record<string, unknown>;
  checkedAt: string | null;
}

/** Progress of the background check of a file. */
export interface AssetProgress {
  stage: string;
  percent: number;
}

/** Check state shared by every library item backed by a file. */
export interface FileState {
  assetId: string;
  state: AssetState;
  validationReport: ValidationReport | null;
}

/** A rigged, skinned character. */
export interface Character extends FileState {
  id: string;
  name: string;
  version: number | null;
  vertexCount: number | null;
  triangleCount: number | null;
  joints: string[] | null;
  regions: string[] | null;
  createdAt: string;
}

/** The performer's consent record kept with a capture. */
export interface ConsentRecord {
  performerCode: string;
  scope: string;
  expiresOn: string;
  expired: boolean;
}

/** A performer's registered mesh sequence. */
export interface Capture extends FileState {
  id: string;
  characterId: string;
  frameCount: number | null;
  fps: number | null;
  consent: ConsentRecord;
  deleted: { at: string; reason: string } | null;
}

/** Skeletal motion (BVH or glTF animation). */
export interface Clip extends FileState {
  id: string;
  name: string;
  format: 'bvh' | 'glb';
  fps: number | null;
  frameCount: number | null;
  joints: string[] | null;
  createdAt: string;
}

/** An uploaded file as the upload list shows it. */
export interface Asset {
  id: string;
  kind: AssetKind;
  state: AssetState;
  fileName: string;
  size: number;
  progress: AssetProgress | null;
  validationReport: ValidationReport | null;
}

/** A short-lived download link for a file. */
export interface FileLink {
  url: string;
  fileName: string;
  size: number;
}

/** Checks a validation report; null when absent. */
export function parseReport(value: unknown): ValidationReport | null {
  if (typeof value !== 'object' || value === null) return null;
  const r = value as Json;
  return {
    code: typeof r.code === 'string' ? r.code : 'UNKNOWN',
    message: typeof r.message === 'string' ? r.message : 'The check did not say why.',
    where: typeof r.where === 'object' && r.where !== null ? (r.where as Json) : {},
    checkedAt: optStr(r, 'checkedAt'),
  };
}

function parseProgress(value: unknown): AssetProgress | null {
  if (typeof value !== 'object' || value === null) return null;
  const p = value as Json;
  return { stage: optStr(p, 'stage') ?? '', percent: optNum(p, 'percent') ?? 0 };
}

function fileState(body: Json, what: string): FileState {
  return {
    assetId: str(body, 'assetId', what),
    state: oneOf(body, 'state', ASSET_STATES, what),
    validationReport: parseReport(body.validationReport),
  };
}

/** Checks a character answer. */
export function parseCharacter(value: unknown): Character {
  const what = 'character';
  const b = asObject(value, what);
  return {
    ...fileState(b, what),
    id: str(b, 'id', what),
    name: str(b, 'name', what),
    version: optNum(b, 'version'),
    vertexCount: optNum(b, 'vertexCount'),
    triangleCount: optNum(b, 'triangleCount'),
    joints: optStrings(b, 'joints'),
    regions: optStrings(b, 'regions'),
    createdAt: optStr(b, 'createdAt') ?? '',
  };
}

/** Checks a capture answer. */
export function parseCapture(value: unknown): Capture {
  const what = 'capture';
  const b = asObject(value, what);
  const consent = asObject(b.consent, 'capture consent');
  const deleted = typeof b.deleted === 'object' && b.deleted !== null ? (b.deleted as Json) : null;
  return {
    ...fileState(b, what),
    id: str(b, 'id', what),
    characterId: str(b, 'characterId', what),
    frameCount: optNum(b, 'frameCount'),
    fps: optNum(b, 'fps'),
    consent: {
      performerCode: str(consent, 'performerCode', 'capture consent'),
      scope: optStr(consent, 'scope') ?? '',
      expiresOn: str(consent, 'expiresOn', 'capture consent'),
      expired: consent.expired === true,
    },
    deleted: deleted
      ? { at: optStr(deleted, 'at') ?? '', reason: optStr(deleted, 'reason') ?? '' }
      : null,
  };
}

/** Checks a clip answer. */
export function parseClip(value: unknown): Clip {
  const what = 'clip';
  const b = asObject(value, what);
  return {
    ...fileState(b, what),
    id: str(b, 'id', what),
    name: str(b, 'name', what),
    format: oneOf(b, 'format', ['bvh', 'glb'] as const, what),
    fps: optNum(b, 'fps'),
    frameCount: optNum(b, 'frameCount'),
    joints: optStrings(b, 'joints'),
    createdAt: optStr(b, 'createdAt') ?? '',
  };
}

/** Checks an uploaded-file answer. */
export function parseAsset(value: unknown): Asset {
  const what = 'uploaded file';
  const b = asObject(value, what);
  return {
    id: str(b, 'id', what),
    kind: oneOf(b, 'kind', ASSET_KINDS, what),
    state: oneOf(b, 'state', ASSET_STATES, what),
    fileName: optStr(b, 'fileName') ?? '',
    size: optNum(b, 'size') ?? 0,
    progress: parseProgress(b.progress),
    validationReport: parseReport(b.validationReport),
  };
}

/** Checks a download-link answer. */
export function parseFileLink(value: unknown): FileLink {
  const what = 'download link';
  const b = asObject(value, what);
  return {
    url: str(b, 'url', what),
    fileName: optStr(b, 'fileName') ?? '',
    size: num(b, 'size', what),
  };
}
