// Library items with real files for job tests, made without the upload path (uploads and ingest
// have their own tests): the files go straight into the bucket under the keys ingest would use,
// and the rows are made ready with the metadata the solver reads from those files.
import { createHash } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/core';
import { readCapture, readCharacter, readClip } from '@overshoot/solver';
import type { World } from './world';
import { Asset, AssetKind, AssetState } from '../../src/assets/entities/asset.entity';
import { Character } from '../../src/library/entities/character.entity';
import { Capture } from '../../src/library/entities/capture.entity';
import { Clip, ClipFormat } from '../../src/library/entities/clip.entity';
import { Show } from '../../src/shows/entities/show.entity';
import { User } from '../../src/users/entities/user.entity';
import { StorageService } from '../../src/storage/storage.service';
import { writeObject } from '../../src/jobs/solve/object-store';

/** The files of a stored library. */
export interface LibraryFiles {
  character: Uint8Array;
  capture: Uint8Array;
  clip: Uint8Array;
  /** Last day of the capture's consent (default far ahead). */
  consentExpiresOn?: string;
}

/** Ids of what was stored. */
export interface StoredLibrary {
  characterId: string;
  captureId: string;
  clipId: string;
}

async function readyAsset(
  world: World,
  em: EntityManager,
  show: Show,
  kind: AssetKind,
  name: string,
  bytes: Uint8Array,
  by: User,
): Promise<Asset> {
  const asset = new Asset(
    show,
    kind,
    {
      size: bytes.length,
      sha256: createHash('sha256').update(bytes).digest('hex'),
      contentType: name.endsWith('.bvh') ? 'text/plain' : 'model/gltf-binary',
      originalName: name,
    },
    by,
  );
  await writeObject(world.app.get(StorageService), asset.s3Key, bytes, asset.contentType);
  asset.state = AssetState.Ready;
  asset.uploadedAt = asset.checkedAt = new Date();
  em.persist(asset);
  return asset;
}

/** A ready character, capture (registered to it, with consent) and BVH clip, files stored. */
export async function storedLibrary(
  world: World,
  showId: string,
  user: User,
  files: LibraryFiles,
): Promise<StoredLibrary> {
  const em = world.em();
  const show = await em.findOneOrFail(Show, showId);
  const by = em.getReference(User, user.id);
  const solverCharacter = await readCharacter(files.character);
  const solverCapture = await readCapture(files.capture);
  const solverClip = await readClip(files.clip, 'bvh');

  const character = new Character(
    await readyAsset(world, em, show, AssetKind.Character, 'tube.glb', files.character, by),
    `tube_${show.code}_${Date.now() % 100000}`,
  );
  Object.assign(character, {
    version: 1,
    vertexCount: solverCharacter.restPositions.length / 3,
    triangleCount: solverCharacter.triangles.length / 3,
    joints: solverCharacter.skeleton.names,
    regions: solverCharacter.regions?.names ?? null,
  });
  const capture = new Capture(
    await readyAsset(world, em, show, AssetKind.Capture, 'take.glb', files.capture, by),
    character,
    {
      performerCode: 'PRF-TEST',
      scope: 'tests',
      expiresOn: files.consentExpiresOn ?? '2099-12-31',
    },
    by,
  );
  Object.assign(capture, { frameCount: solverCapture.frameCount, fps: solverCapture.fps });
  const clip = new Clip(
    await readyAsset(world, em, show, AssetKind.Clip, 'bend.bvh', files.clip, by),
    'bend',
    ClipFormat.Bvh,
  );
  Object.assign(clip, {
    frameCount: solverClip.frameCount,
    fps: solverClip.fps,
    joints: solverClip.jointNames,
  });
  em.persist([character, capture, clip]);
  await em.flush();
  return { characterId: character.id, captureId: capture.id, clipId: clip.id };
}
