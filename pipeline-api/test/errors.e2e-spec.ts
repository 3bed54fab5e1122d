import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';

describe('error bodies', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app?.close();
  });

  it('answers a malformed JSON body with 400 MALFORMED_JSON', async () => {
    const res = await request(app.getHttpServer())
      .post('/api/diagnostics/pings')
      .set('content-type', 'application/json')
      .send('{"steps": 3,');
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('MALFORMED_JSON');
    expect(res.body.message).toMatch(/not valid JSON/);
    expect(Object.keys(res.body).sort()).toEqual(['code', 'message']);
  });

  it('answers an unknown route with 404 ROUTE_NOT_FOUND in the same shape', async () => {
    const res = await request(app.getHttpServer()).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body).toEqual({
      code: 'ROUTE_NOT_FOUND',
      message: 'No route GET /api/no-such-thing.',
    });
  });

  it('lists every invalid field with VALIDATION_FAILED', async () => {
    const res = await request(app.getHttpServer())
      .post('/api/diagnostics/pings')
      .send({ steps: 0, colour: 'red' });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    const fields = (res.body.details as { field: string }[]).map((d) => d.field).sort();
    expect(fields).toEqual(['colour', 'steps']);
  });

  it('answers a missing record with a domain code, not a generic one', async () => {
    const res = await request(app.getHttpServer()).get('/api/diagnostics/pings/does-not-exist');
    expect(res.status).toBe(404);
    expect(res.body.code).toBe('PING_NOT_FOUND');
    expect(res.body.details).toEqual({ id: 'does-not-exist' });
  });
});
