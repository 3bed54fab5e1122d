import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { World, type TestUser } from './support/world';
import { library, takeFor } from './support/production';
import { Role } from '../src/users/entities/role';
import { Shot } from '../src/shots/entities/shot.entity';
import { isoWeek } from '../src/shots/iso-week';
import type { Show } from '../src/shows/entities/show.entity';

/** Parses the export's CSV (RFC 4180 quoting) into rows of fields. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted && ch === '"' && text[i + 1] === '"') {
      field += '"';
      i++;
    } else if (ch === '"') {
      quoted = !quoted;
    } else if (quoted || (ch !== ',' && ch !== '\n')) {
      field += ch;
    } else {
      row.push(ch === '\n' ? field.replace(/\r$/, '') : field);
      field = '';
      if (ch === '\n') {
        rows.push(row);
        row = [];
      }
    }
  }
  return rows;
}

const day = (offset: number) =>
  new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);

describe('tracking: shot list filters, paging, CSV export, counts, lateness, throughput', () => {
  let app: NestExpressApplication;
  let world: World;
  let show: Show;
  let ta: TestUser & { cookie: string };
  let producer: string;
  let supervisor: string;
  let animator: TestUser;
  const codes: Record<string, string> = {};

  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
    show = await world.show('Tracking show');
    ta = await world.member(Role.TechnicalArtist, [show]);
    producer = (await world.member(Role.Producer, [show])).cookie;
    supervisor = (await world.member(Role.Supervisor, [show])).cookie;
    animator = await world.user(Role.Animator, [show]);
    const { profileId } = await library(world, show.id, ta.user);
    // Seven shots: two sequences, due dates past and future, one assignee on some.
    const plan: [string, string, string | null, boolean][] = [
      ['SQ010', 'SQ010_0010', day(-10), true],
      ['SQ010', 'SQ010_0020', day(-3), false],
      ['SQ010', 'SQ010_0030', day(5), true],
      ['SQ020', 'SQ020_0010', day(-1), false],
      ['SQ020', 'SQ020_0020', null, true],
      ['SQ020', 'SQ020_0030', day(20), false],
      ['SQ020', 'SQ020_0040', day(-20), false],
    ];
    for (const [sequence, code, dueDate, assigned] of plan) {
      const res = await request(world.server)
        .post(`/api/shows/${show.id}/shots`)
        .set('Cookie', ta.cookie)
        .send({
          sequence,
          code,
          frameStart: 1001,
          frameEnd: 1100,
          fps: 24,
          ...(dueDate ? { dueDate } : {}),
          ...(assigned ? { assigneeIds: [animator.user.id] } : {}),
        });
      expect(res.status).toBe(201);
      codes[code] = res.body.id;
    }
    // SQ020_0040 is past due but approved, so not late; SQ010_0020 has a take awaiting review.
    const take = await takeFor(world, codes.SQ020_0040, profileId, ta.user);
    const decided = await request(world.server)
      .post(`/api/shows/${show.id}/takes/${take.id}/decisions`)
      .set('Cookie', supervisor)
      .send({ decision: 'approved' });
    expect(decided.status).toBe(201);
    await takeFor(world, codes.SQ010_0020, profileId, ta.user);
  });
  afterAll(async () => {
    await app?.close();
  });

  const list = (query: string) =>
    request(world.server).get(`/api/shows/${show.id}/shots?${query}`).set('Cookie', producer);
  const listCodes = async (query: string) =>
    (await list(query)).body.items.map((s: { code: string }) => s.code);

  it('filters by sequence, assignee, state, lateness and search', async () => {
    expect(await listCodes('sequence=SQ010')).toEqual(['SQ010_0010', 'SQ010_0020', 'SQ010_0030']);
    expect(await listCodes(`assigneeId=${animator.user.id}`)).toEqual([
      'SQ010_0010',
      'SQ010_0030',
      'SQ020_0020',
    ]);
    expect(await listCodes('late=true&sort=dueDate:asc')).toEqual([
      'SQ010_0010',
      'SQ010_0020',
      'SQ020_0010',
    ]);
    expect(await listCodes('reviewState=approved')).toEqual(['SQ020_0040']);
    expect(await listCodes('reviewState=awaiting_review')).toEqual(['SQ010_0020']);
    expect(await listCodes('solveState=none&sequence=SQ020')).toEqual([
      'SQ020_0010',
      'SQ020_0020',
      'SQ020_0030',
    ]);
    expect(await listCodes('search=0_003')).toEqual(['SQ010_0030', 'SQ020_0030']);
    // LIKE wildcards in the search are taken literally.
    expect(await listCodes('search=%25')).toEqual([]);
  });

  it('sorts and pages without overlap, with the total', async () => {
    const all = await listCodes('sort=dueDate:desc,code:asc&pageSize=200');
    expect(all).toHaveLength(7);
    const pages: string[] = [];
    for (let page = 1; page <= 3; page++) {
      const res = await list(`sort=dueDate:desc,code:asc&pageSize=3&page=${page}`);
      expect(res.body).toMatchObject({ total: 7, page, pageSize: 3 });
      pages.push(...res.body.items.map((s: { code: string }) => s.code));
    }
    expect(pages).toEqual(all);
    // Dates compare as text in YYYY-MM-DD: descending, shots without a date last (MariaDB sorts NULL lowest).
    const dated = (await list('sort=dueDate:desc&pageSize=200')).body.items.map(
      (s: { dueDate: string | null }) => s.dueDate,
    );
    expect(dated).toEqual([...dated].sort((a, b) => (b ?? '').localeCompare(a ?? '')));
    const bad = await list('sort=password:asc');
    expect(bad.status).toBe(400);
    expect(bad.body.code).toBe('VALIDATION_FAILED');
  });

  it('exports the same rows as the list with the same filters, as streamed CSV', async () => {
    for (const query of [
      'sort=code:desc',
      'late=true&sort=dueDate:asc',
      `assigneeId=${animator.user.id}`,
    ]) {
      const res = await request(world.server)
        .get(`/api/shows/${show.id}/shots/export?${query}`)
        .set('Cookie', producer);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toMatch(/^text\/csv/);
      const [header, ...rows] = parseCsv(res.text);
      expect(header.slice(0, 4)).toEqual(['sequence', 'code', 'frame_start', 'frame_end']);
      const items = (await list(`${query}&pageSize=200`)).body.items;
      const col = (name: string) => header.indexOf(name);
      expect(rows.map((r) => r[col('code')])).toEqual(items.map((s: { code: string }) => s.code));
      expect(rows.map((r) => r[col('due_date')])).toEqual(
        items.map((s: { dueDate: string | null }) => s.dueDate ?? ''),
      );
      expect(rows.map((r) => r[col('late')])).toEqual(
        items.map((s: { late: boolean }) => (s.late ? 'yes' : 'no')),
      );
      expect(rows.map((r) => r[col('review_state')])).toEqual(
        items.map((s: { reviewState: string | null }) => s.reviewState ?? ''),
      );
    }
  });

  it('counts shots by state and lists the late ones', async () => {
    const res = await request(world.server)
      .get(`/api/shows/${show.id}/shots/summary`)
      .set('Cookie', producer);
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(7);
    expect(res.body.render.not_started).toBe(7);
    expect(res.body.review).toMatchObject({ approved: 1, awaiting_review: 1, none: 5 });
    expect(res.body.solve).toMatchObject({ solved: 2, none: 5 });
    expect(res.body.late.count).toBe(3);
    expect(
      res.body.late.shots.map((s: { code: string; daysLate: number }) => [s.code, s.daysLate]),
    ).toEqual([
      ['SQ010_0010', 10],
      ['SQ010_0020', 3],
      ['SQ020_0010', 1],
    ]);
  });

  it('counts approved takes per ISO week, with empty weeks as zero', async () => {
    const res = await request(world.server)
      .get(`/api/shows/${show.id}/shots/throughput?weeks=4`)
      .set('Cookie', producer);
    expect(res.status).toBe(200);
    expect(res.body).toHaveLength(4);
    expect(res.body.map((w: { approved: number }) => w.approved)).toEqual([0, 0, 0, 1]);
    expect(res.body[3].week).toBe(isoWeek(new Date()));
  });

  it('computes ISO weeks at year boundaries', () => {
    // Worked examples of ISO 8601 week dates (quoted from memory of the standard's examples): 2005-01-01 is in 2004-W53; 2008-12-29 is in 2009-W01; 2010-01-03 in 2009-W53.
    expect(isoWeek(new Date('2005-01-01T12:00:00Z'))).toBe('2004-W53');
    expect(isoWeek(new Date('2008-12-29T00:00:00Z'))).toBe('2009-W01');
    expect(isoWeek(new Date('2010-01-03T23:59:59Z'))).toBe('2009-W53');
  });

  it('keeps the late flag in step with the stored state', async () => {
    const stored = await world.em().findOneOrFail(Shot, codes.SQ020_0040);
    expect(stored.reviewState).toBe('approved');
    const got = await request(world.server)
      .get(`/api/shows/${show.id}/shots/${stored.id}`)
      .set('Cookie', producer);
    expect(got.body).toMatchObject({ late: false, reviewState: 'approved', latestTakeVersion: 1 });
  });
});
