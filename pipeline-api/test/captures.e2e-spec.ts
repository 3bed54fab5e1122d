import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { World } from './support/world';
import { tinyCaptureGlb, tinyCharacterGlb } from './support/tiny-assets';
import {
  assetKey,
  createUpload,
  sha256,
  showObjects,
  uploadFile,
  waitForCheck,
} from './support/uploads';
import { Role } from '../src/users/entities/role';
import { Asset } from '../src/assets/entities/asset.entity';
import { Capture } from '../src/library/entities/capture.entity';
import { Character } from '../src/library/entities/character.entity';
import { TissueProfile } from '../src/library/entities/tissue-profile.entity';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { CapturesService } from '../src/library/captures.service';
import type { Show } from '../src/shows/entities/show.entity';

/** A date `days` from today (UTC), `YYYY-MM-DD`. */
const dayFromNow = (days: number) =>
  new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

describe('captures: consent records, deletion, and the consent check before learning', () => {
  let app: NestExpressApplication;
  let world: World;
  let show: Show;
  let ta: string;
  let characterId: string;
  const consent = () => ({
    performerCode: 'PRF-0042',
    scope: 'Profile learning for this show',
    expiresOn: dayFromNow(365),
  });

  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
    show = await world.show('Capture show');
    ta = (await world.member(Role.TechnicalArtist, [show])).cookie;
    const assetId = await uploadFile(world, ta, show.id, {
      kind: 'character',
      fileName: 'tube.glb',
      bytes: await tinyCharacterGlb(),
    });
    expect((await waitForCheck(world, ta, show.id, assetId)).state).toBe('ready');
    characterId = (await world.em().findOneOrFail(Character, { asset: assetId })).id;
  });
  afterAll(async () => {
    await app?.close();
  });

  const uploadCapture = async (seconds = 3, expiresOn = dayFromNow(365)) => {
    const assetId = await uploadFile(world, ta, show.id, {
      kind: 'capture',
      fileName: 'take_07.glb',
      bytes: await tinyCaptureGlb(seconds),
      extra: { characterId, consent: { ...consent(), expiresOn } },
    });
    const checked = await waitForCheck(world, ta, show.id, assetId);
    const capture = await world.em().findOneOrFail(Capture, { asset: assetId });
    return { assetId, checked, capture };
  };

  it('accepts a capture with its consent record and checks it against its character', async () => {
    const { checked, capture } = await uploadCapture();
    expect(checked.state).toBe('ready');
    const res = await request(world.server)
      .get(`/api/shows/${show.id}/captures/${capture.id}`)
      .set('Cookie', ta);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      characterId,
      frameCount: 90,
      fps: 30,
      consent: {
        performerCode: 'PRF-0042',
        scope: 'Profile learning for this show',
        expired: false,
      },
      deleted: null,
    });
  });

  it('rejects a capture too short for its character, with the report and no file left', async () => {
    // validateCapture wants at least two seconds of frames.
    const { checked, assetId } = await uploadCapture(1);
    expect(checked.state).toBe('rejected');
    expect(checked.validationReport.code).toBe('NO_FRAMES');
    expect(await showObjects(world, show.id)).not.toContain(await assetKey(world, assetId));
  });

  it('answers 400 CONSENT_REQUIRED for a capture without consent, writing nothing', async () => {
    const before = {
      rows: await world.em().count(Asset, { show: show.id }),
      objects: await showObjects(world, show.id),
    };
    const bytes = await tinyCaptureGlb();
    const base = {
      kind: 'capture',
      fileName: 'c.glb',
      size: bytes.length,
      sha256: sha256(bytes),
      characterId,
    };
    const none = await createUpload(world, ta, show.id, base);
    expect(none.status).toBe(400);
    expect(none.body.code).toBe('CONSENT_REQUIRED');
    const partial = await createUpload(world, ta, show.id, {
      ...base,
      consent: { performerCode: 'PRF-1' },
    });
    expect(partial.status).toBe(400);
    expect(partial.body).toMatchObject({
      code: 'CONSENT_REQUIRED',
      details: { missing: ['consent.scope', 'consent.expiresOn'] },
    });
    expect(await world.em().count(Asset, { show: show.id })).toBe(before.rows);
    expect(await showObjects(world, show.id)).toEqual(before.objects);
  });

  it('answers 400 CONSENT_EXPIRED for a consent past its expiry date, writing nothing', async () => {
    const before = await world.em().count(Capture, { show: show.id });
    const bytes = await tinyCaptureGlb();
    const res = await createUpload(world, ta, show.id, {
      kind: 'capture',
      fileName: 'c.glb',
      size: bytes.length,
      sha256: sha256(bytes),
      characterId,
      consent: { ...consent(), expiresOn: dayFromNow(-1) },
    });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('CONSENT_EXPIRED');
    expect(await world.em().count(Capture, { show: show.id })).toBe(before);
  });

  it('blocks new learning from a capture whose consent has expired', async () => {
    const { capture } = await uploadCapture(3, dayFromNow(10));
    const service = app.get(CapturesService);
    const em = world.em();
    await expect(
      service.assertUsableForLearning(em, show.id, capture.id, dayFromNow(10)),
    ).resolves.toMatchObject({
      id: capture.id,
    });
    await expect(
      service.assertUsableForLearning(em, show.id, capture.id, dayFromNow(11)),
    ).rejects.toMatchObject({
      code: 'CONSENT_EXPIRED',
    });
    // The same without a date: the record itself now says the consent ended yesterday.
    await world.em().nativeUpdate(Capture, capture.id, { consentExpiresOn: dayFromNow(-1) });
    await expect(
      service.assertUsableForLearning(world.em(), show.id, capture.id),
    ).rejects.toMatchObject({
      code: 'CONSENT_EXPIRED',
    });
    const view = await request(world.server)
      .get(`/api/shows/${show.id}/captures/${capture.id}`)
      .set('Cookie', ta);
    expect(view.body.consent.expired).toBe(true);
  });

  it('deletes a capture: files gone, record kept with the reason, profiles marked, audited', async () => {
    const { capture, assetId } = await uploadCapture();
    const key = await assetKey(world, assetId);
    expect(await showObjects(world, show.id)).toContain(key);
    const em = world.em();
    const profile = new TissueProfile(
      await em.findOneOrFail(Capture, capture.id),
      em.getReference(Character, characterId),
      'from take 07',
    );
    await em.persistAndFlush(profile);

    const url = `/api/shows/${show.id}/captures/${capture.id}`;
    const noReason = await request(world.server).delete(url).set('Cookie', ta).send({});
    expect(noReason.status).toBe(400);
    expect(await showObjects(world, show.id)).toContain(key);

    const res = await request(world.server)
      .delete(url)
      .set('Cookie', ta)
      .send({ reason: 'Performer withdrew consent' });
    expect(res.status).toBe(200);
    expect(res.body.deleted).toMatchObject({ reason: 'Performer withdrew consent' });
    expect(await showObjects(world, show.id)).not.toContain(key);
    const p = await request(world.server)
      .get(`/api/shows/${show.id}/profiles/${profile.id}`)
      .set('Cookie', ta);
    const stored = await request(world.server).get(url).set('Cookie', ta);
    expect(stored.body.deleted.at).toEqual(expect.any(String));
    expect(p.body.sourceCaptureDeletedAt).toEqual(stored.body.deleted.at);
    const audit = await world
      .em()
      .find(AuditEvent, { action: 'capture.deleted', objectId: capture.id });
    expect(audit).toHaveLength(1);
    expect(audit[0].details).toMatchObject({
      reason: 'Performer withdrew consent',
      objects: [key],
    });

    const list = await request(world.server)
      .get(`/api/shows/${show.id}/captures`)
      .set('Cookie', ta);
    expect(list.body.map((c: { id: string }) => c.id)).not.toContain(capture.id);
    const withDeleted = await request(world.server)
      .get(`/api/shows/${show.id}/captures?includeDeleted=true`)
      .set('Cookie', ta);
    expect(withDeleted.body.map((c: { id: string }) => c.id)).toContain(capture.id);
    const file = await request(world.server).get(`${url}/file`).set('Cookie', ta);
    expect(file.status).toBe(409);
    expect(file.body.code).toBe('CAPTURE_DELETED');
    await expect(
      app.get(CapturesService).assertUsableForLearning(world.em(), show.id, capture.id),
    ).rejects.toMatchObject({
      code: 'CAPTURE_DELETED',
    });
    const again = await request(world.server)
      .delete(url)
      .set('Cookie', ta)
      .send({ reason: 'twice' });
    expect(again.status).toBe(409);
  });
});
