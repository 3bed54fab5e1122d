import { describe, expect, it } from 'vitest';
import { jsonResponse, mockFetch } from '@/testing/mock-fetch';
import { ApiError, apiRequest, isApiUnreachable } from './api-client';

async function caught(promise: Promise<unknown>): Promise<unknown> {
  try {
    await promise;
  } catch (error) {
    return error;
  }
  throw new Error('expected the request to fail');
}

describe('apiRequest', () => {
  it('maps an error body to an ApiError with status, code, message and details', async () => {
    mockFetch(() =>
      jsonResponse(
        {
          code: 'SHOT_NOT_FOUND',
          message: 'No shot 0420 in this show.',
          details: { shot: '0420' },
        },
        404,
      ),
    );
    const error = await caught(apiRequest('/shots/0420'));
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 404,
      code: 'SHOT_NOT_FOUND',
      message: 'No shot 0420 in this show.',
      details: { shot: '0420' },
    });
  });

  it('sends JSON to the /api base and returns the parsed body', async () => {
    const spy = mockFetch(() => jsonResponse({ id: 'p1' }, 201));
    const body = await apiRequest('/diagnostics/pings', { method: 'POST', body: { steps: 5 } });
    expect(body).toEqual({ id: 'p1' });
    const [url, init] = spy.mock.calls[0];
    expect(url).toBe('/api/diagnostics/pings');
    expect(init?.method).toBe('POST');
    expect(init?.body).toBe('{"steps":5}');
  });

  it('returns the body of a status the caller accepts, such as 503 from the health check', async () => {
    mockFetch(() => jsonResponse({ status: 'degraded' }, 503));
    await expect(apiRequest('/health', { acceptStatus: [503] })).resolves.toEqual({
      status: 'degraded',
    });
    const error = await caught(apiRequest('/health'));
    expect(error).toMatchObject({ status: 503, code: 'UNEXPECTED_RESPONSE' });
  });

  it('reports a rejected fetch as the API being unreachable', async () => {
    mockFetch(() => Promise.reject(new TypeError('Failed to fetch')));
    const error = await caught(apiRequest('/health'));
    expect(isApiUnreachable(error)).toBe(true);
    expect(error).toMatchObject({ status: 0 });
  });

  it('reports a gateway error without an API body as the API being unreachable', async () => {
    mockFetch(() => new Response('', { status: 502 }));
    expect(isApiUnreachable(await caught(apiRequest('/health')))).toBe(true);
    // Even where 503 is an accepted answer, a non-JSON one did not come from the API.
    mockFetch(() => new Response('Service Unavailable', { status: 503 }));
    const error = await caught(apiRequest('/health', { acceptStatus: [503] }));
    expect(isApiUnreachable(error)).toBe(true);
  });

  it('names the request when a success answer is not JSON', async () => {
    mockFetch(() => new Response('<!doctype html>', { status: 200 }));
    const error = await caught(apiRequest('/health'));
    expect(error).toMatchObject({ status: 200, code: 'UNEXPECTED_RESPONSE' });
    expect((error as Error).message).toContain('GET /health');
  });

  it('turns a body of the wrong shape into an ApiError carrying the parser’s reason', async () => {
    mockFetch(() => jsonResponse({ nope: true }));
    const parse = () => {
      throw new TypeError('The answer has no id.');
    };
    const error = await caught(apiRequest('/thing', {}, parse));
    expect(error).toMatchObject({ code: 'UNEXPECTED_RESPONSE', message: 'The answer has no id.' });
  });
});
