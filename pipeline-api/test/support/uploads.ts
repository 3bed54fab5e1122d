// Uploads through the API the way the web client does: create, PUT each part to its presigned
// URL on the S3 store, complete; then wait for the ingest check in the worker.
import { createHash } from 'node:crypto';
import request from 'supertest';
import { expect } from 'vitest';
import type { World } from './world';
import { StorageService } from '../../src/storage/storage.service';
import { Asset } from '../../src/assets/entities/asset.entity';

/** SHA-256 of bytes, hex. */
export const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

/** The create answer. */
export interface CreatedUpload {
  asset: { id: string; state: string };
  partSize: number;
  partCount: number;
  parts: { partNumber: number; url: string }[];
}

/** Starts an upload; returns the raw response (the caller checks its status). */
export function createUpload(world: World, cookie: string, showId: string, body: object) {
  return request(world.server)
    .post(`/api/shows/${showId}/uploads`)
    .set('Cookie', cookie)
    .send(body);
}

/** PUTs each part of `bytes` to its presigned URL; returns the ETags the store answered. */
export async function putParts(created: CreatedUpload, bytes: Uint8Array) {
  const etags: { partNumber: number; etag: string }[] = [];
  for (const part of created.parts) {
    const start = (part.partNumber - 1) * created.partSize;
    const res = await fetch(part.url, {
      method: 'PUT',
      body: bytes.subarray(start, start + created.partSize),
    });
    expect(res.status, `PUT part ${part.partNumber}`).toBe(200);
    etags.push({ partNumber: part.partNumber, etag: res.headers.get('etag') as string });
  }
  return etags;
}

/** Completes an upload; returns the raw response. */
export function completeUpload(
  world: World,
  cookie: string,
  showId: string,
  assetId: string,
  parts: { partNumber: number; etag: string }[],
) {
  return request(world.server)
    .post(`/api/shows/${showId}/uploads/${assetId}/complete`)
    .set('Cookie', cookie)
    .send({ parts });
}

/** Create, PUT, complete; returns the asset id once the API accepted the completion. */
export async function uploadFile(
  world: World,
  cookie: string,
  showId: string,
  file: { kind: string; fileName: string; bytes: Uint8Array; sha256?: string; extra?: object },
): Promise<string> {
  const created = await createUpload(world, cookie, showId, {
    kind: file.kind,
    fileName: file.fileName,
    size: file.bytes.length,
    sha256: file.sha256 ?? sha256(file.bytes),
    ...file.extra,
  });
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  const etags = await putParts(created.body as CreatedUpload, file.bytes);
  const done = await completeUpload(world, cookie, showId, created.body.asset.id, etags);
  expect(done.status, JSON.stringify(done.body)).toBe(200);
  return created.body.asset.id as string;
}

/** Polls the asset until the worker has decided (ready or rejected). */
export async function waitForCheck(world: World, cookie: string, showId: string, assetId: string) {
  const until = Date.now() + 20_000;
  for (;;) {
    const res = await request(world.server)
      .get(`/api/shows/${showId}/assets/${assetId}`)
      .set('Cookie', cookie);
    expect(res.status).toBe(200);
    if (res.body.state !== 'pending') return res.body;
    if (Date.now() > until)
      throw new Error(`asset ${assetId} still pending: ${JSON.stringify(res.body)}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** The bucket keys under a show's prefix. */
export const showObjects = (world: World, showId: string) =>
  world.app.get(StorageService).list(`shows/${showId}/`);

/** The object key of an asset (not in the API's answers). */
export const assetKey = async (world: World, assetId: string) =>
  (await world.em().findOneOrFail(Asset, assetId)).s3Key;
