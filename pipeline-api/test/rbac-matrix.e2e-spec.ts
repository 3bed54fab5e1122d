import { randomUUID } from 'node:crypto';
import type { IncomingMessage } from 'node:http';
import { RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants';
import { DiscoveryService, MetadataScanner, ModulesContainer } from '@nestjs/core';
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { World } from './support/world';
import { ROUTE_TABLE, type RouteRow } from './rbac/route-table';
import { makeCallers, type Caller } from './rbac/callers';
import { actualOutcome, expectedOutcome } from './rbac/expectation';
import type { Show } from '../src/shows/entities/show.entity';

/** Every route the app serves, as `METHOD /api/path`, read from its controllers. */
function appRoutes(app: NestExpressApplication): string[] {
  const discovery = new DiscoveryService(app.get(ModulesContainer));
  const scanner = new MetadataScanner();
  const join = (...parts: string[]) =>
    '/' +
    parts
      .flatMap((p) => p.split('/'))
      .filter(Boolean)
      .join('/');
  const routes: string[] = [];
  for (const { instance, metatype } of discovery.getControllers()) {
    if (!instance || !metatype) continue;
    const bases = [Reflect.getMetadata(PATH_METADATA, metatype) ?? ''].flat() as string[];
    for (const name of scanner.getAllMethodNames(Object.getPrototypeOf(instance))) {
      const handler = (instance as Record<string, unknown>)[name] as object;
      const paths = Reflect.getMetadata(PATH_METADATA, handler) as string | string[] | undefined;
      if (paths === undefined) continue;
      const method = RequestMethod[Reflect.getMetadata(METHOD_METADATA, handler) as number];
      for (const base of bases)
        for (const path of [paths].flat()) routes.push(`${method} ${join('api', base, path)}`);
    }
  }
  return routes.sort();
}

/**
 * Parses a refusal's JSON body as usual, but hangs up on an event stream as soon as it starts
 * (it would never end): its status is what the matrix checks.
 */
function statusOnlyForStreams(
  response: request.Response,
  done: (err: Error | null, body: unknown) => void,
): void {
  // superagent hands a parser the raw Node response, whatever its declared type.
  const res = response as unknown as IncomingMessage;
  if (String(res.headers['content-type']).startsWith('text/event-stream')) {
    res.destroy();
    done(null, {});
    return;
  }
  let text = '';
  res.setEncoding('utf8');
  res.on('data', (chunk: string) => (text += chunk));
  res.on('end', () => done(null, text ? JSON.parse(text) : {}));
}

describe('RBAC matrix: every route × every kind of caller', () => {
  let app: NestExpressApplication;
  let world: World;
  let show: Show;
  let callers: Caller[];
  const otherId = randomUUID();
  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
    show = await world.show('Matrix show');
    callers = await makeCallers(world, show, await world.show('Other show'));
  });
  afterAll(async () => {
    await app?.close();
  });

  it('has a table row for every route of the app, and no row for a route that is gone', () => {
    const served = appRoutes(app);
    const listed = ROUTE_TABLE.map((r) => r.route);
    expect(
      served.filter((r) => !listed.includes(r)),
      'routes without a row in test/rbac/route-table.ts',
    ).toEqual([]);
    expect(
      listed.filter((r) => !served.includes(r)),
      'rows for routes the app does not serve',
    ).toEqual([]);
    expect(new Set(listed).size).toBe(listed.length);
  });

  const url = (route: string) =>
    route.replace(/:(\w+)/g, (_, name: string) => {
      if (name === 'showId') return show.id;
      const ids = ['userId', 'tokenId', 'id', 'assetId', 'characterId', 'captureId', 'clipId'];
      if ([...ids, 'profileId', 'shotId', 'takeId', 'noteId', 'jobId'].includes(name))
        return otherId;
      throw new Error(`no placeholder for :${name}; add one in rbac-matrix.e2e-spec.ts`);
    });

  const hiddenShow = () => ({
    code: 'SHOW_NOT_FOUND',
    message: `No show ${show.id}, or you are not a member of it.`,
    details: { showId: show.id },
  });

  async function call(row: RouteRow, caller: Caller) {
    const [method, path] = row.route.split(' ');
    const r = request(world.server)[
      method.toLowerCase() as 'get' | 'post' | 'patch' | 'put' | 'delete'
    ](url(path));
    r.set('X-Forwarded-For', caller.ip);
    if (caller.kind === 'user') {
      r.set(
        'Cookie',
        row.freshSession ? await world.signIn(caller.email, caller.password) : caller.cookie,
      );
    }
    if (caller.kind === 'token') r.set('Authorization', `Bearer ${caller.secret}`);
    if (method !== 'GET') r.send(row.body ?? {});
    if (row.stream) r.buffer(true).parse(statusOnlyForStreams);
    return r;
  }

  it.each(ROUTE_TABLE.map((row) => [row.route, row] as const))('%s', async (_, row) => {
    const wrong: string[] = [];
    for (const caller of callers) {
      const res = await call(row, caller);
      const want = expectedOutcome(row, caller);
      const got = actualOutcome(res.status, res.body);
      if (got !== want)
        wrong.push(`${caller.name}: expected ${want}, got ${res.status} ${res.body?.code ?? ''}`);
      // Nothing about the show: the same body as for a show that does not exist.
      else if (want === 404 && JSON.stringify(res.body) !== JSON.stringify(hiddenShow())) {
        wrong.push(
          `${caller.name}: 404 body ${JSON.stringify(res.body)} says more than "no such show"`,
        );
      }
    }
    expect(wrong).toEqual([]);
  });
});
