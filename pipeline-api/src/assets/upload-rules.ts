// Checks on an upload request that need no database: file type, size limit, consent record.
import { DomainError } from '../common/errors/domain-error';
import type { Env } from '../config/env.validation';
import type { ConsentInput } from '../library/entities/capture.entity';
import { ClipFormat } from '../library/entities/clip.entity';
import { AssetKind } from './entities/asset.entity';
import type { ConsentDto } from './dto/create-upload.dto';

/** Largest accepted file per kind, from the environment. */
export function sizeLimit(env: Env, kind: AssetKind): number {
  if (kind === AssetKind.Character) return env.UPLOAD_MAX_CHARACTER_BYTES;
  if (kind === AssetKind.Capture) return env.UPLOAD_MAX_CAPTURE_BYTES;
  return env.UPLOAD_MAX_CLIP_BYTES;
}

/** Throws UPLOAD_TOO_LARGE when the declared size is above the kind's limit. */
export function assertSize(env: Env, kind: AssetKind, size: number): void {
  const limit = sizeLimit(env, kind);
  if (size <= limit) return;
  throw new DomainError(
    'too_large',
    'UPLOAD_TOO_LARGE',
    `A ${kind} file may be at most ${limit} bytes; this one is ${size}.`,
    { kind, limit, size },
  );
}

/** The file's format from its name, or UPLOAD_FILE_TYPE when it does not fit the kind. */
export function fileFormat(kind: AssetKind, fileName: string): ClipFormat {
  const ext = /\.([A-Za-z0-9]+)$/.exec(fileName)?.[1]?.toLowerCase();
  const allowed = kind === AssetKind.Clip ? ['bvh', 'glb'] : ['glb'];
  if (ext && allowed.includes(ext)) return ext as ClipFormat;
  throw new DomainError(
    'invalid',
    'UPLOAD_FILE_TYPE',
    `A ${kind} must be a ${allowed.map((e) => `.${e}`).join(' or ')} file; got ${fileName}.`,
    { kind, fileName, allowed },
  );
}

/** The content type to record when the client gives none. */
export const defaultContentType = (format: ClipFormat): string =>
  format === ClipFormat.Bvh ? 'text/plain' : 'model/gltf-binary';

/** Today's date in UTC, `YYYY-MM-DD`. */
export const todayUtc = (now = new Date()): string => now.toISOString().slice(0, 10);

/** The complete, unexpired consent record, or CONSENT_REQUIRED / CONSENT_EXPIRED. */
export function requireConsent(consent: ConsentDto | undefined, today: string): ConsentInput {
  const missing = (['performerCode', 'scope', 'expiresOn'] as const).filter((f) => !consent?.[f]);
  if (!consent || missing.length > 0) {
    throw new DomainError(
      'invalid',
      'CONSENT_REQUIRED',
      'Body captures are personal data: a capture upload needs the consent record ' +
        '(performer reference code, consent scope, expiry date).',
      { missing: missing.map((f) => `consent.${f}`) },
    );
  }
  const record = consent as Required<ConsentDto>;
  if (record.expiresOn < today) {
    throw new DomainError(
      'invalid',
      'CONSENT_EXPIRED',
      `The consent expired on ${record.expiresOn}; record a current consent before uploading.`,
      { expiresOn: record.expiresOn, today },
    );
  }
  return record;
}
