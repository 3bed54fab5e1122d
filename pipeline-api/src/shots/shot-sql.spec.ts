import { describe, expect, it } from 'vitest';
import { DEFAULT_SHOT_SORT, shotOrderBy, shotWhere } from './shot-sql';
import type { ShotFilterQuery } from './dto/list-shots.query';

const placeholders = (sql: string) => (sql.match(/\?/g) ?? []).length;

describe('shot list SQL', () => {
  it('binds one parameter per placeholder for every combination of filters', () => {
    const filters: ShotFilterQuery[] = [
      {},
      { renderState: 'queued' as never, reviewState: 'none', solveState: 'solved' as never },
      { reviewState: 'approved' as never, solveState: 'none', sequence: 'sq010' },
      { assigneeId: '00000000-0000-4000-8000-000000000000', late: true, search: 'a%b_c' },
      { late: false, search: 'x' },
    ];
    for (const f of filters) {
      const q = shotWhere('show-1', f, '2026-12-02');
      expect(placeholders(q.from), JSON.stringify(f)).toBe(0);
      expect(placeholders(q.where), JSON.stringify(f)).toBe(q.params.length);
      expect(q.params[0]).toBe('show-1');
    }
  });

  it('escapes LIKE wildcards in the search text', () => {
    const where = shotWhere('s', { search: '50%_a\\b' }, '2026-12-02');
    expect(where.params.slice(1)).toEqual(['%50\\%\\_a\\\\b%', '%50\\%\\_a\\\\b%']);
  });

  it('counts a shot without review state as not approved when it is late', () => {
    const q = shotWhere('s', { late: true }, '2026-12-02');
    expect(q.where).toContain('s.review_state is null or s.review_state <> ?');
  });

  it('filters by assignee through the assignment key, one row per shot, without a subquery', () => {
    const q = shotWhere('s', { assigneeId: 'u' }, '2026-12-02');
    expect(q.from).toBe('shots s join shot_assignees sa on sa.shot_id = s.id');
    expect(`${q.from} ${q.where}`).not.toMatch(/select|exists/i);
  });

  it('orders by the asked fields and then the id, so pages never overlap', () => {
    expect(shotOrderBy(DEFAULT_SHOT_SORT)).toBe('s.sequence asc, s.code asc, s.id asc');
    expect(shotOrderBy('dueDate:desc,renderState:asc')).toBe(
      's.due_date desc, s.render_state asc, s.id asc',
    );
  });

  it('refuses a field the list does not sort by', () => {
    expect(() => shotOrderBy('passwordHash:asc')).toThrow(/unknown shot sort/);
    expect(() => shotOrderBy('code:sideways')).toThrow(/unknown shot sort/);
  });
});
