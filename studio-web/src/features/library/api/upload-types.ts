// Shapes of the upload answers (open upload, fresh part URLs) and their checks.
import { parseAsset, type Asset, type AssetKind } from './library-types';
import { asArray, asObject, num, str } from '@/lib/parse-answer';

/** Where to PUT one part of a file. */
export interface PartUrl {
  partNumber: number;
  url: string;
}

/** An open upload: the recorded file and how to send it. */
export interface OpenUpload {
  asset: Asset;
  partSize: number;
  partCount: number;
  parts: PartUrl[];
}

/** The consent record a capture upload carries. */
export interface ConsentInput {
  performerCode: string;
  scope: string;
  /** Last day the consent holds, YYYY-MM-DD. */
  expiresOn: string;
}

/** What is about to be uploaded. */
export interface CreateUploadInput {
  kind: AssetKind;
  fileName: string;
  size: number;
  sha256: string;
  contentType?: string;
  name?: string;
  characterId?: string;
  consent?: ConsentInput;
}

/** Checks a list of part URLs. */
export function parsePartUrls(value: unknown): PartUrl[] {
  return asArray(value, 'part URL').map((p) => {
    const part = asObject(p, 'part URL');
    return { partNumber: num(part, 'partNumber', 'part URL'), url: str(part, 'url', 'part URL') };
  });
}

/** Checks an open-upload answer. */
export function parseOpenUpload(value: unknown): OpenUpload {
  const b = asObject(value, 'upload');
  return {
    asset: parseAsset(b.asset),
    partSize: num(b, 'partSize', 'upload'),
    partCount: num(b, 'partCount', 'upload'),
    parts: parsePartUrls(b.parts),
  };
}
