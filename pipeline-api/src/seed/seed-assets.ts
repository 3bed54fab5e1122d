// The demo's files as real uploads: each one stored in the S3 store, read back and its SHA-256
// checked, then read by the solver exactly as the ingest check reads an upload, and recorded ready
// with what the solver found (joints, regions, frame counts) — or the seeding stops with the
// solver's report of what is wrong and where.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { Asset, AssetKind, AssetState } from '../assets/entities/asset.entity';
import { BadFile, readAsset, type AssetFacts } from '../assets/ingest/read-asset';
import { Character } from '../library/entities/character.entity';
import { Clip, ClipFormat } from '../library/entities/clip.entity';
import { Capture } from '../library/entities/capture.entity';
import type { User } from '../users/entities/user.entity';
import { readObject, writeObject } from '../jobs/solve/object-store';
import { DemoDataError } from './demo-show-file';
import { dayFrom, demoItem, demoUser, type SeedContext } from './seed-context';

const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

/** Stores one file as an asset of the show; returns the row (not yet ready) and the bytes. */
async function upload(
  ctx: SeedContext,
  kind: AssetKind,
  path: string,
  by: User,
  where: string,
): Promise<{ asset: Asset; bytes: Uint8Array }> {
  let bytes: Uint8Array;
  try {
    bytes = new Uint8Array(readFileSync(join(ctx.filesDir, path)));
  } catch (e) {
    throw new DemoDataError(`file ${path} cannot be read (${(e as Error).message})`, where);
  }
  const contentType = path.endsWith('.bvh') ? 'text/plain' : 'model/gltf-binary';
  const file = {
    size: bytes.length,
    sha256: sha256(bytes),
    contentType,
    originalName: basename(path),
  };
  const asset = new Asset(ctx.show, kind, file, by);
  await writeObject(ctx.storage, asset.s3Key, bytes, contentType);
  // What ingest verifies first: the stored object is the declared file.
  const stored = sha256(await readObject(ctx.storage, asset.s3Key));
  if (stored !== asset.sha256) {
    throw new Error(`the S3 store gave back other bytes for ${path} (SHA-256 ${stored})`);
  }
  asset.uploadedAt = ctx.now;
  ctx.em.persist(asset);
  return { asset, bytes };
}

/** The solver's reading of a stored file, as ingest makes it; a refusal stops the seeding. */
async function check(
  asset: Asset,
  bytes: Uint8Array,
  where: string,
  characterBytes?: Uint8Array,
): Promise<AssetFacts> {
  try {
    const facts = await readAsset(
      asset.kind,
      bytes,
      asset.originalName,
      characterBytes ? async () => characterBytes : undefined,
    );
    asset.state = AssetState.Ready;
    asset.checkedAt = new Date();
    asset.validationReport = null;
    asset.progress = { stage: 'ready', percent: 100 };
    return facts;
  } catch (e) {
    if (e instanceof BadFile) {
      throw new DemoDataError(
        `the solver refuses ${asset.originalName}: ${e.code} ${e.message} ${JSON.stringify(e.where)}`,
        where,
      );
    }
    throw e;
  }
}

/** Uploads and checks the characters, clips (BVH) and captures with their consent records. */
export async function seedAssets(ctx: SeedContext, uploader: User): Promise<void> {
  const { demo } = ctx;
  for (const [i, c] of demo.characters.entries()) {
    const where = `characters[${i}]`;
    const { asset, bytes } = await upload(ctx, AssetKind.Character, c.file, uploader, where);
    const facts = await check(asset, bytes, where);
    if (facts.kind !== AssetKind.Character) throw new DemoDataError('is not a character', where);
    const row = new Character(asset, c.title);
    Object.assign(row, {
      version: 1,
      vertexCount: facts.vertexCount,
      triangleCount: facts.triangleCount,
      joints: facts.joints,
      regions: facts.regions,
      bbox: facts.bbox,
    });
    ctx.em.persist(row);
    ctx.characters.set(c.key, { row, bytes });
    ctx.log(`character ${c.title}: ${facts.vertexCount} vertices, ${facts.joints.length} joints`);
  }
  for (const [i, c] of demo.clips.entries()) {
    const where = `clips[${i}]`;
    demoItem(ctx.characters, c.character, 'the character', `${where}.character`);
    const { asset, bytes } = await upload(ctx, AssetKind.Clip, c.bvh, uploader, where);
    const facts = await check(asset, bytes, where);
    if (facts.kind !== AssetKind.Clip) throw new DemoDataError('is not a clip', where);
    const row = new Clip(asset, c.title, ClipFormat.Bvh);
    Object.assign(row, { fps: facts.fps, frameCount: facts.frameCount, joints: facts.joints });
    ctx.em.persist(row);
    ctx.clips.set(c.key, { row, bytes, kind: 'bvh' });
  }
  ctx.log(`${demo.clips.length} clips stored and checked`);
  for (const [i, c] of demo.captures.entries()) {
    const where = `captures[${i}]`;
    const character = demoItem(ctx.characters, c.character, 'the character', `${where}.character`);
    const recordedBy = demoUser(ctx, c.consent.recordedBy, `${where}.consent.recordedBy`);
    const { asset, bytes } = await upload(ctx, AssetKind.Capture, c.file, uploader, where);
    const facts = await check(asset, bytes, where, character.bytes);
    if (facts.kind !== AssetKind.Capture) throw new DemoDataError('is not a capture', where);
    const consent = {
      performerCode: performerCode(c.key),
      scope: c.consent.scope,
      expiresOn: dayFrom(ctx.now, c.consent.expiresInDays),
    };
    const row = new Capture(asset, character.row, consent, recordedBy);
    Object.assign(row, { frameCount: facts.frameCount, fps: facts.fps });
    ctx.em.persist(row);
    ctx.captures.set(c.key, { row, bytes });
    ctx.log(`capture ${c.title}: ${facts.frameCount} frames at ${facts.fps} fps, consent recorded`);
  }
}

/**
 * The consent record's performer reference. The demo captures are synthetic (no person performed
 * them), so the reference says so; real ones are a code the studio's records resolve.
 */
export function performerCode(captureKey: string): string {
  return `synthetic-${captureKey}`.replace(/[^A-Za-z0-9._-]/g, '-').slice(0, 40);
}
