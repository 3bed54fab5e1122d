import type { AssetState, ValidationReport } from '../assets/entities/asset.entity';
import type { Asset } from '../assets/entities/asset.entity';
import type { BoundingBox, Character } from './entities/character.entity';
import type { Capture } from './entities/capture.entity';
import type { Clip, ClipFormat } from './entities/clip.entity';
import type {
  ProfileMode,
  ProfileSpectrum,
  ProfileState,
  TissueProfile,
} from './entities/tissue-profile.entity';
import type { JobView } from '../jobs/job-view';
import { todayUtc } from '../assets/upload-rules';

/** Check state of the file behind a library item. */
interface FileState {
  assetId: string;
  state: AssetState;
  validationReport: ValidationReport | null;
}

const fileState = (a: Asset): FileState => ({
  assetId: a.id,
  state: a.state,
  validationReport: a.validationReport ?? null,
});

/** A character as the library lists it. */
export interface CharacterView extends FileState {
  id: string;
  name: string;
  version: number | null;
  vertexCount: number | null;
  triangleCount: number | null;
  joints: string[] | null;
  regions: string[] | null;
  bbox: BoundingBox | null;
  createdAt: string;
}

/** The view of a character (asset populated). */
export const characterView = (c: Character): CharacterView => ({
  id: c.id,
  ...fileState(c.asset),
  name: c.name,
  version: c.version ?? null,
  vertexCount: c.vertexCount ?? null,
  triangleCount: c.triangleCount ?? null,
  joints: c.joints ?? null,
  regions: c.regions ?? null,
  bbox: c.bbox ?? null,
  createdAt: c.createdAt.toISOString(),
});

/** A capture with its consent record (only for the roles that may see captures). */
export interface CaptureView extends FileState {
  id: string;
  characterId: string;
  frameCount: number | null;
  fps: number | null;
  consent: {
    performerCode: string;
    scope: string;
    expiresOn: string;
    expired: boolean;
    recordedBy: string;
    recordedAt: string;
  };
  deleted: { at: string; reason: string; by: string | null } | null;
}

/** The view of a capture (asset populated). */
export const captureView = (c: Capture): CaptureView => ({
  id: c.id,
  ...fileState(c.asset),
  characterId: c.character.id,
  frameCount: c.frameCount ?? null,
  fps: c.fps ?? null,
  consent: {
    performerCode: c.performerCode,
    scope: c.consentScope,
    expiresOn: c.consentExpiresOn,
    expired: c.consentExpired(todayUtc()),
    recordedBy: c.consentRecordedBy.id,
    recordedAt: c.consentRecordedAt.toISOString(),
  },
  deleted: c.deletedAt
    ? { at: c.deletedAt.toISOString(), reason: c.deletionReason ?? '', by: c.deletedBy?.id ?? null }
    : null,
});

/** A clip as the library lists it. */
export interface ClipView extends FileState {
  id: string;
  name: string;
  format: ClipFormat;
  fps: number | null;
  frameCount: number | null;
  joints: string[] | null;
  createdAt: string;
}

/** The view of a clip (asset populated). */
export const clipView = (c: Clip): ClipView => ({
  id: c.id,
  ...fileState(c.asset),
  name: c.name,
  format: c.format,
  fps: c.fps ?? null,
  frameCount: c.frameCount ?? null,
  joints: c.joints ?? null,
  createdAt: c.createdAt.toISOString(),
});

/** A tissue profile as the library lists it, with its learn job. */
export interface ProfileView {
  id: string;
  name: string;
  captureId: string;
  characterId: string;
  state: ProfileState;
  /** True once the capture it was learned from is deleted. */
  captureDeleted: boolean;
  /** When that capture was deleted. */
  sourceCaptureDeletedAt: string | null;
  modes: ProfileMode[] | null;
  fitReport: Record<string, unknown> | null;
  spectra: ProfileSpectrum[] | null;
  /** The learn job (null for a profile made without one). */
  job: JobView | null;
  createdAt: string;
}

/** The view of a profile, with the view of its learn job. */
export const profileView = (p: TissueProfile, job: JobView | null = null): ProfileView => ({
  id: p.id,
  name: p.name,
  captureId: p.capture.id,
  characterId: p.character.id,
  state: p.state,
  captureDeleted: !!p.captureDeletedAt,
  sourceCaptureDeletedAt: p.captureDeletedAt?.toISOString() ?? null,
  modes: p.modes ?? null,
  fitReport: p.fitReport ?? null,
  spectra: p.spectra ?? null,
  job,
  createdAt: p.createdAt.toISOString(),
});
