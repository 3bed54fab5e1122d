import { describe, expect, it } from 'vitest';
import { readEnv } from './env';

describe('readEnv', () => {
  it('defaults the API base to /api and drops a trailing slash', () => {
    expect(readEnv({})).toEqual({ apiBaseUrl: '/api' });
    expect(readEnv({ VITE_API_BASE_URL: 'http://127.0.0.1:3000/api/' })).toEqual({
      apiBaseUrl: 'http://127.0.0.1:3000/api',
    });
  });

  it('rejects a base that is neither a path nor an http(s) URL, naming the variable', () => {
    expect(() => readEnv({ VITE_API_BASE_URL: 'api.example' })).toThrow(/VITE_API_BASE_URL/);
  });
});
