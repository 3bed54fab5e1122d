import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { uniq, World } from './support/world';
import { waitForMail } from './support/mail-sink';

describe('admin mail outbox', () => {
  let app: NestExpressApplication;
  let world: World;
  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
  });
  afterAll(async () => {
    await app?.close();
  });

  it('lists what the local mail sink received, newest first', async () => {
    const admin = await world.admin();
    const email = `outbox.${uniq()}@example.test`;
    await request(world.server)
      .post('/api/admin/invitations')
      .set('Cookie', admin)
      .send({ email, role: 'producer', showIds: [] });
    await waitForMail(email, /invited/);
    const res = await request(world.server).get('/api/admin/outbox').set('Cookie', admin);
    expect(res.status).toBe(200);
    const mine = res.body.find((m: { to: string[] }) => m.to.includes(email));
    expect(mine).toMatchObject({ subject: 'You are invited to Overshoot' });
    const ids = res.body.map((m: { id: string }) => m.id);
    expect(ids).toEqual([...ids].sort().reverse());
  });

  it('does not exist in production', async () => {
    const production = await createTestApp({ env: { NODE_ENV: 'production' } });
    try {
      const admin = await new World(production).admin();
      const res = await request(production.getHttpServer())
        .get('/api/admin/outbox')
        .set('Cookie', admin);
      expect(res.status).toBe(404);
      expect(res.body.code).toBe('OUTBOX_DISABLED');
    } finally {
      await production.close();
    }
  });
});
