import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';

interface Operation {
  'x-roles'?: string[];
  'x-token-scope'?: string;
  'x-access'?: { public: boolean };
  responses: Record<string, { description: string; content?: Record<string, unknown> }>;
}

describe('OpenAPI document', () => {
  let app: NestExpressApplication;
  let paths: Record<string, Record<string, Operation>>;
  beforeAll(async () => {
    app = await createTestApp();
    paths = (await request(app.getHttpServer()).get('/api/docs/openapi.json')).body.paths;
  });
  afterAll(async () => {
    await app?.close();
  });

  const operations = () =>
    Object.entries(paths).flatMap(([path, ops]) =>
      Object.entries(ops).map(([method, op]) => ({ name: `${method.toUpperCase()} ${path}`, op })),
    );

  it('states who may call every operation', () => {
    const undocumented = operations().filter(
      ({ op }) => !op['x-roles'] && !op['x-token-scope'] && !op['x-access']?.public,
    );
    expect(undocumented.map((o) => o.name)).toEqual([]);
    expect(paths['/api/admin/users'].get['x-roles']).toEqual(['admin']);
    expect(paths['/api/shows/{showId}'].get['x-token-scope']).toBe('any');
  });

  it('lists the error codes of every non-public operation with their status', () => {
    const silent = operations().filter(({ op }) => !op['x-access']?.public && !op.responses['401']);
    expect(silent.map((o) => o.name)).toEqual([]);
    const member = paths['/api/shows/{showId}'].get.responses;
    expect(member['404'].description).toContain('`SHOW_NOT_FOUND`');
    expect(member['401'].description).toContain('`NOT_SIGNED_IN`');
    expect(member['403'].description).toContain('`ROLE_NOT_ALLOWED`');
    expect(paths['/api/auth/sign-in'].post.responses['429'].description).toContain(
      '`SIGN_IN_THROTTLED`',
    );
  });

  it('names each error code once per status, and answers errors as JSON', () => {
    const problems = operations().flatMap(({ name, op }) =>
      Object.entries(op.responses)
        .filter(([status]) => Number(status) >= 400)
        .flatMap(([status, r]) => {
          const codes = r.description.match(/`[A-Z0-9_]+`/g) ?? [];
          const out: string[] = [];
          if (new Set(codes).size !== codes.length) out.push(`${name} ${status}: codes repeated`);
          const types = Object.keys(r.content ?? { 'application/json': {} });
          if (types.join() !== 'application/json') out.push(`${name} ${status}: ${types.join()}`);
          return out;
        }),
    );
    expect(problems).toEqual([]);
  });

  it('documents the live event stream with who may watch it', () => {
    const events = paths['/api/shows/{showId}/events'].get;
    expect(events['x-roles']).toContain('animator');
    expect(events['x-token-scope']).toBe('any');
    expect(Object.keys(events.responses['200'].content ?? {})).toEqual(['text/event-stream']);
    expect(events.responses['404'].description).toContain('`SHOW_NOT_FOUND`');
  });
});
