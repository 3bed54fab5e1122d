import { describe, expect, it } from 'vitest';
import { apiQuery, filtersFromSearch, filtersToSearch } from './shot-filters';

describe('shot filters', () => {
  it('read the address and write the same view back', () => {
    const address =
      'search=SQ01&late=true&solveState=none&renderState=failed&sort=dueDate:desc&page=3';
    const filters = filtersFromSearch(new URLSearchParams(address));
    expect(filters).toEqual({
      search: 'SQ01',
      late: true,
      solveState: 'none',
      renderState: 'failed',
      sort: { field: 'dueDate', direction: 'desc' },
      page: 3,
    });
    expect(filtersToSearch(filters, { paging: 'address' }).toString()).toBe(
      new URLSearchParams(address).toString(),
    );
  });

  it('drop values the API would refuse instead of sending them', () => {
    const filters = filtersFromSearch(
      new URLSearchParams('late=maybe&solveState=done&sort=owner:asc&page=-2&renderState='),
    );
    expect(filters).toEqual({});
  });

  it('send the list its page and the export none, with the same filters and sort', () => {
    const f = filtersFromSearch(new URLSearchParams('late=true&sort=dueDate:asc&page=2'));
    expect(apiQuery(f, true)).toBe('?late=true&sort=dueDate%3Aasc%2Ccode%3Aasc&page=2&pageSize=25');
    expect(apiQuery(f, false)).toBe('?late=true&sort=dueDate%3Aasc%2Ccode%3Aasc');
    expect(apiQuery({}, false)).toBe('');
  });
});
