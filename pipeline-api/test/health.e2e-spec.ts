import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';

describe('GET /api/health', () => {
  let app: NestExpressApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app?.close();
  });

  it('reports db, redis, s3 and smtp up with their latency, without sign-in', async () => {
    const res = await request(app.getHttpServer()).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-store');
    expect(res.body.status).toBe('up');
    expect(Object.keys(res.body.services).sort()).toEqual(['db', 'redis', 's3', 'smtp']);
    for (const s of Object.values(res.body.services) as { status: string; latencyMs: number }[]) {
      expect(s.status).toBe('up');
      expect(s.latencyMs).toBeGreaterThanOrEqual(0);
    }
    expect(Date.parse(res.body.checkedAt)).not.toBeNaN();
  });

  it('serves the OpenAPI document with the health route in it', async () => {
    const res = await request(app.getHttpServer()).get('/api/docs/openapi.json');
    expect(res.status).toBe(200);
    expect(res.body.info.title).toBe('Overshoot pipeline API');
    expect(Object.keys(res.body.paths)).toContain('/api/health');
  });

  it('sends security headers', async () => {
    const res = await request(app.getHttpServer()).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
  });
});
