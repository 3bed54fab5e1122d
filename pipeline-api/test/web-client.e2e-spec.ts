// The built web client served by the API process: its files, and index.html for its client-side
// routes — never for API paths, which answer JSON whatever the client accepts.
import { mkdtempSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';

describe('web client files', () => {
  let app: NestExpressApplication;
  const dir = mkdtempSync(join(tmpdir(), 'overshoot-web-'));

  beforeAll(async () => {
    writeFileSync(join(dir, 'index.html'), '<!doctype html><title>studio</title>');
    mkdirSync(join(dir, 'assets'));
    writeFileSync(join(dir, 'assets', 'app.js'), 'console.log(1);');
    // A file where an API path would be, were API paths looked up on disk.
    mkdirSync(join(dir, 'api'));
    writeFileSync(join(dir, 'api', 'health'), 'not the API');
    app = await createTestApp({ env: { WEB_DIST_DIR: dir } });
  });
  afterAll(async () => {
    await app?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('serves the client’s files, and index.html for its routes', async () => {
    const file = await request(app.getHttpServer()).get('/assets/app.js');
    expect([file.status, file.text]).toEqual([200, 'console.log(1);']);
    const route = await request(app.getHttpServer())
      .get('/shows/abc/shots')
      .set('Accept', 'text/html');
    expect(route.status).toBe(200);
    expect(route.text).toContain('<title>studio</title>');
  });

  it('leaves API paths to the API, even where a file of that name exists', async () => {
    const health = await request(app.getHttpServer()).get('/api/health');
    expect(health.headers['content-type']).toMatch(/^application\/json/);
    expect(health.text).not.toBe('not the API');
    const unknown = await request(app.getHttpServer())
      .get('/api/no-such-route')
      .set('Accept', 'text/html');
    expect([unknown.status, unknown.body.code]).toEqual([404, 'ROUTE_NOT_FOUND']);
  });
});
