import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { World } from './support/world';
import { tinyCharacterGlb, tinyClipBvh } from './support/tiny-assets';
import {
  assetKey,
  completeUpload,
  createUpload,
  putParts,
  sha256,
  showObjects,
  uploadFile,
  waitForCheck,
  type CreatedUpload,
} from './support/uploads';
import { Role } from '../src/users/entities/role';
import { Asset } from '../src/assets/entities/asset.entity';
import { Character } from '../src/library/entities/character.entity';
import type { Show } from '../src/shows/entities/show.entity';

const MB = 1024 * 1024;

describe('uploads: presigned multipart to the S3 store, then the ingest check', () => {
  let app: NestExpressApplication;
  let world: World;
  let show: Show;
  let ta: string;
  beforeAll(async () => {
    // The smallest part size S3 allows, so a few MB make a real multipart upload.
    app = await createTestApp({ env: { UPLOAD_PART_BYTES: 5 * MB } });
    world = new World(app);
    show = await world.show('Upload show');
    ta = (await world.member(Role.TechnicalArtist, [show])).cookie;
  });
  afterAll(async () => {
    await app?.close();
  });

  const assetCount = () => world.em().count(Asset, { show: show.id });

  it('takes a character end to end: ready with metadata, versioned, downloadable', async () => {
    const bytes = await tinyCharacterGlb();
    const first = await uploadFile(world, ta, show.id, {
      kind: 'character',
      fileName: 'tube.glb',
      bytes,
    });
    const checked = await waitForCheck(world, ta, show.id, first);
    expect(checked).toMatchObject({ state: 'ready', validationReport: null, size: bytes.length });
    expect(checked.progress).toEqual({ stage: 'ready', percent: 100 });
    const character = await world.em().findOneOrFail(Character, { asset: first });
    // The tube has 4 rings of 6 vertices and 2 × 6 triangles between each pair of rings.
    expect(character).toMatchObject({
      name: 'tube',
      version: 1,
      vertexCount: 24,
      triangleCount: 36,
    });
    expect(character.joints).toEqual(['root', 'tip']);
    expect(character.bbox?.max[1]).toBeCloseTo(0.5, 5);

    const second = await uploadFile(world, ta, show.id, {
      kind: 'character',
      fileName: 'tube.glb',
      bytes,
    });
    expect((await waitForCheck(world, ta, show.id, second)).state).toBe('ready');
    const list = await request(world.server)
      .get(`/api/shows/${show.id}/characters`)
      .set('Cookie', ta);
    expect(
      list.body
        .filter((c: { name: string }) => c.name === 'tube')
        .map((c: { version: number }) => c.version),
    ).toEqual([2, 1]);

    const link = await request(world.server)
      .get(`/api/shows/${show.id}/characters/${character.id}/file`)
      .set('Cookie', ta);
    expect(link.status).toBe(200);
    const downloaded = new Uint8Array(await (await fetch(link.body.url)).arrayBuffer());
    expect(sha256(downloaded)).toBe(sha256(bytes));
  });

  it('uploads a clip in several parts and reads its rate, length and joints', async () => {
    // A long BVH: more than one 5 MB part.
    const bytes = tinyClipBvh(70_000);
    // 9 values of 9–10 characters a frame: about 6 MB.
    expect(bytes.length).toBeGreaterThan(5 * MB);
    const created = await createUpload(world, ta, show.id, {
      kind: 'clip',
      fileName: 'bend.bvh',
      size: bytes.length,
      sha256: sha256(bytes),
    });
    expect(created.status).toBe(201);
    expect(created.body.partCount).toBe(Math.ceil(bytes.length / (5 * MB)));
    expect(created.body.partCount).toBeGreaterThan(1);
    const etags = await putParts(created.body as CreatedUpload, bytes);
    const done = await completeUpload(world, ta, show.id, created.body.asset.id, etags);
    expect(done.status).toBe(200);
    await waitForCheck(world, ta, show.id, created.body.asset.id);
    const clips = await request(world.server).get(`/api/shows/${show.id}/clips`).set('Cookie', ta);
    const clip = clips.body.find((c: { assetId: string }) => c.assetId === created.body.asset.id);
    expect(clip).toMatchObject({
      state: 'ready',
      format: 'bvh',
      frameCount: 70_000,
      joints: ['root', 'tip'],
    });
    expect(clip.fps).toBeCloseTo(24, 3);
  });

  it('rejects a file that is not a model, with its report, and deletes it', async () => {
    const bytes = new TextEncoder().encode('these bytes are not a glTF binary at all');
    const id = await uploadFile(world, ta, show.id, {
      kind: 'character',
      fileName: 'junk.glb',
      bytes,
    });
    const checked = await waitForCheck(world, ta, show.id, id);
    expect(checked.state).toBe('rejected');
    // The solver's code for input that is neither .glb nor .bvh.
    expect(checked.validationReport).toMatchObject({ code: 'NOT_GLTF' });
    expect(checked.validationReport.message).toEqual(expect.any(String));
    expect(await showObjects(world, show.id)).not.toContain(await assetKey(world, id));
  });

  it('rejects a character declared as a clip (WRONG_KIND) and deletes it', async () => {
    const bytes = await tinyCharacterGlb();
    const id = await uploadFile(world, ta, show.id, { kind: 'clip', fileName: 'tube.glb', bytes });
    const checked = await waitForCheck(world, ta, show.id, id);
    expect(checked.validationReport).toMatchObject({
      code: 'WRONG_KIND',
      where: { found: 'character' },
    });
    expect(await showObjects(world, show.id)).not.toContain(await assetKey(world, id));
  });

  it('rejects a file whose SHA-256 is not the declared one and deletes it', async () => {
    const bytes = await tinyCharacterGlb();
    const declared = sha256(new TextEncoder().encode('something else'));
    const id = await uploadFile(world, ta, show.id, {
      kind: 'character',
      fileName: 'tube.glb',
      bytes,
      sha256: declared,
    });
    const checked = await waitForCheck(world, ta, show.id, id);
    expect(checked.validationReport).toMatchObject({
      code: 'SHA256_MISMATCH',
      where: { declared, actual: sha256(bytes) },
    });
    expect(await showObjects(world, show.id)).not.toContain(await assetKey(world, id));
    expect(await world.em().count(Character, { asset: id, version: { $ne: null } })).toBe(0);
  });

  it('refuses a declared size above the limit with 413, writing nothing', async () => {
    const before = { rows: await assetCount(), objects: await showObjects(world, show.id) };
    const res = await createUpload(world, ta, show.id, {
      kind: 'clip',
      fileName: 'huge.bvh',
      size: 100 * MB + 1,
      sha256: 'a'.repeat(64),
    });
    expect(res.status).toBe(413);
    expect(res.body).toMatchObject({ code: 'UPLOAD_TOO_LARGE', details: { limit: 100 * MB } });
    expect(await assetCount()).toBe(before.rows);
    expect(await showObjects(world, show.id)).toEqual(before.objects);
  });

  it('refuses a file name that does not fit the kind, writing nothing', async () => {
    const before = await assetCount();
    const res = await createUpload(world, ta, show.id, {
      kind: 'character',
      fileName: 'body.fbx',
      size: 10,
      sha256: 'a'.repeat(64),
    });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('UPLOAD_FILE_TYPE');
    expect(await assetCount()).toBe(before);
  });

  it('deletes a file of the wrong size at completion and says so', async () => {
    const bytes = tinyClipBvh();
    const created = await createUpload(world, ta, show.id, {
      kind: 'clip',
      fileName: 'short.bvh',
      size: bytes.length + 10,
      sha256: sha256(bytes),
    });
    const etags = await putParts(created.body as CreatedUpload, bytes);
    const done = await completeUpload(world, ta, show.id, created.body.asset.id, etags);
    expect(done.status).toBe(400);
    expect(done.body).toMatchObject({
      code: 'UPLOAD_SIZE_MISMATCH',
      details: { declared: bytes.length + 10, stored: bytes.length },
    });
    const asset = await world.em().findOneOrFail(Asset, created.body.asset.id);
    expect(asset.state).toBe('rejected');
    expect(await showObjects(world, show.id)).not.toContain(asset.s3Key);
  });

  it('refuses a completion that does not list every part, and keeps the upload open', async () => {
    const bytes = tinyClipBvh();
    const created = await createUpload(world, ta, show.id, {
      kind: 'clip',
      fileName: 'open.bvh',
      size: bytes.length,
      sha256: sha256(bytes),
    });
    const etags = await putParts(created.body as CreatedUpload, bytes);
    const wrong = await completeUpload(world, ta, show.id, created.body.asset.id, [
      { partNumber: 2, etag: etags[0].etag },
    ]);
    expect(wrong.status).toBe(400);
    expect(wrong.body.code).toBe('UPLOAD_PARTS_INVALID');
    const right = await completeUpload(world, ta, show.id, created.body.asset.id, etags);
    expect(right.status).toBe(200);
    await waitForCheck(world, ta, show.id, created.body.asset.id);
    const again = await completeUpload(world, ta, show.id, created.body.asset.id, etags);
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('UPLOAD_NOT_OPEN');
    const abort = await request(world.server)
      .delete(`/api/shows/${show.id}/uploads/${created.body.asset.id}`)
      .set('Cookie', ta);
    expect(abort.body.code).toBe('UPLOAD_NOT_OPEN');
  });

  it('aborts an upload: its rows and parts are gone', async () => {
    const bytes = tinyClipBvh();
    const created = await createUpload(world, ta, show.id, {
      kind: 'clip',
      fileName: 'dropped.bvh',
      size: bytes.length,
      sha256: sha256(bytes),
    });
    await putParts(created.body as CreatedUpload, bytes);
    const id = created.body.asset.id as string;
    const key = await assetKey(world, id);
    const res = await request(world.server)
      .delete(`/api/shows/${show.id}/uploads/${id}`)
      .set('Cookie', ta);
    expect(res.status).toBe(204);
    expect(await world.em().count(Asset, id)).toBe(0);
    expect(await showObjects(world, show.id)).not.toContain(key);
    const complete = await completeUpload(world, ta, show.id, id, [{ partNumber: 1, etag: 'x' }]);
    expect(complete.status).toBe(404);
    expect(complete.body.code).toBe('ASSET_NOT_FOUND');
  });

  it('gives fresh part URLs for an open upload, and only for its parts', async () => {
    const bytes = tinyClipBvh();
    const created = await createUpload(world, ta, show.id, {
      kind: 'clip',
      fileName: 'resume.bvh',
      size: bytes.length,
      sha256: sha256(bytes),
    });
    const url = `/api/shows/${show.id}/uploads/${created.body.asset.id}/parts`;
    const ok = await request(world.server)
      .post(url)
      .set('Cookie', ta)
      .send({ partNumbers: [1] });
    expect(ok.status).toBe(200);
    expect(ok.body.parts).toHaveLength(1);
    const etags = await putParts({ ...created.body, parts: ok.body.parts } as CreatedUpload, bytes);
    expect(etags[0].etag).toMatch(/\S/);
    const outside = await request(world.server)
      .post(url)
      .set('Cookie', ta)
      .send({ partNumbers: [2] });
    expect(outside.status).toBe(400);
    expect(outside.body.code).toBe('UPLOAD_PARTS_INVALID');
  });
});
