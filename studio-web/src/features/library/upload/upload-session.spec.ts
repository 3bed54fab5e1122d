import { describe, expect, it, vi } from 'vitest';
import { calls, mockApi } from '@/app/testing/mock-api';
import { jsonResponse } from '@/testing/mock-fetch';
import type { PutPart } from './put-part';
import { UploadSession, type UploadSnapshot } from './upload-session';

const SHOW = 'show-1';
const ASSET = 'asset-9';
// Ten bytes in parts of four: parts 1 and 2 hold four bytes, part 3 holds two.
const FILE = () => new File(['0123456789'], 'coach.glb', { type: 'model/gltf-binary' });

const asset = (state = 'pending') => ({
  id: ASSET,
  kind: 'character',
  state,
  fileName: 'coach.glb',
  size: 10,
});

function api(extra: Record<string, Parameters<typeof mockApi>[0][string]> = {}) {
  const bodies: Record<string, unknown[]> = {};
  const keep = (key: string, init: RequestInit) => {
    (bodies[key] ??= []).push(init.body ? JSON.parse(String(init.body)) : undefined);
  };
  const spy = mockApi({
    [`POST /api/shows/${SHOW}/uploads`]: (_url, init) => {
      keep('create', init);
      return jsonResponse(
        {
          asset: asset(),
          partSize: 4,
          partCount: 3,
          parts: [1, 2, 3].map((n) => ({ partNumber: n, url: `https://store.test/p${n}?first` })),
          expiresAt: '2030-01-01T00:00:00.000Z',
        },
        201,
      );
    },
    [`POST /api/shows/${SHOW}/uploads/${ASSET}/parts`]: (_url, init) => {
      keep('parts', init);
      const { partNumbers } = JSON.parse(String(init.body)) as { partNumbers: number[] };
      return jsonResponse({
        parts: partNumbers.map((n) => ({ partNumber: n, url: `https://store.test/p${n}?fresh` })),
        expiresAt: '2030-01-01T00:00:00.000Z',
      });
    },
    [`POST /api/shows/${SHOW}/uploads/${ASSET}/complete`]: (_url, init) => {
      keep('complete', init);
      return jsonResponse(asset());
    },
    [`DELETE /api/shows/${SHOW}/uploads/${ASSET}`]: () => new Response(null, { status: 204 }),
    ...extra,
  });
  return { spy, bodies };
}

const sha256 = async () => 'ab'.repeat(32);

/** A store that answers each PUT with an ETag naming the part and URL, unless `fail` says no. */
function store(fail: (url: string, attempt: number) => boolean) {
  const seen: string[] = [];
  const putPart: PutPart = vi.fn(async (url: string, body: Blob, { onProgress }) => {
    seen.push(url);
    const attempt = seen.filter((u) => u === url).length;
    if (fail(url, attempt)) throw new Error(`The file store refused ${url}.`);
    onProgress(body.size);
    return `"etag-${new URL(url).pathname.slice(1)}-${body.size}"`;
  });
  return { putPart, seen };
}

describe('UploadSession', () => {
  it('declares the file, sends every part and completes with each part’s ETag', async () => {
    const { spy, bodies } = api();
    const { putPart } = store(() => false);
    const session = new UploadSession(
      SHOW,
      { file: FILE(), kind: 'character' },
      { putPart, sha256 },
    );
    await session.start();

    expect(session.snapshot().phase).toBe('uploaded');
    expect(session.snapshot().sentBytes).toBe(10);
    expect(bodies.create[0]).toMatchObject({
      kind: 'character',
      fileName: 'coach.glb',
      size: 10,
      sha256: 'ab'.repeat(32),
    });
    expect(bodies.complete[0]).toEqual({
      parts: [
        { partNumber: 1, etag: '"etag-p1-4"' },
        { partNumber: 2, etag: '"etag-p2-4"' },
        { partNumber: 3, etag: '"etag-p3-2"' },
      ],
    });
    expect(calls(spy)).not.toContain(`DELETE /api/shows/${SHOW}/uploads/${ASSET}`);
  });

  it('tries a failed part again by itself before giving up', async () => {
    const { bodies } = api();
    const { putPart, seen } = store((url, attempt) => url.includes('/p2') && attempt === 1);
    const session = new UploadSession(
      SHOW,
      { file: FILE(), kind: 'clip' },
      { putPart, sha256 },
      { retryDelayMs: 0 },
    );
    await session.start();

    expect(session.snapshot().phase).toBe('uploaded');
    expect(seen.filter((u) => u.includes('/p2'))).toHaveLength(2);
    expect((bodies.complete[0] as { parts: unknown[] }).parts).toHaveLength(3);
  });

  it('stops with the failed parts listed, then resends only those with freshly signed URLs', async () => {
    const { bodies } = api();
    let storeDown = true;
    const { putPart, seen } = store((url) => storeDown && url.includes('/p3'));
    const session = new UploadSession(
      SHOW,
      { file: FILE(), kind: 'character' },
      { putPart, sha256 },
      { retryDelayMs: 0, attemptsPerPart: 2 },
    );
    await session.start();

    const failed: UploadSnapshot = session.snapshot();
    expect(failed.phase).toBe('failed');
    expect(failed.failedParts).toEqual([3]);
    expect(String(failed.error)).toContain('refused');
    expect(bodies.complete).toBeUndefined();

    storeDown = false;
    seen.length = 0;
    await session.retry();

    expect(bodies.parts).toEqual([{ partNumbers: [3] }]);
    expect(seen).toEqual(['https://store.test/p3?fresh']);
    expect(session.snapshot().phase).toBe('uploaded');
    expect(
      (bodies.complete[0] as { parts: { partNumber: number }[] }).parts.map((p) => p.partNumber),
    ).toEqual([1, 2, 3]);
  });

  it('cancel aborts the parts in flight and drops the upload in the API', async () => {
    const { spy, bodies } = api();
    const aborted: string[] = [];
    let started!: () => void;
    const inFlight = new Promise<void>((resolve) => (started = resolve));
    const putPart: PutPart = (url, _body, { signal }) =>
      new Promise((_resolve, reject) => {
        started();
        signal.addEventListener('abort', () => {
          aborted.push(url);
          reject(new DOMException('canceled', 'AbortError'));
        });
      });
    const session = new UploadSession(
      SHOW,
      { file: FILE(), kind: 'character' },
      { putPart, sha256 },
    );
    const run = session.start();
    await inFlight;
    await session.cancel();
    await run;

    expect(session.snapshot().phase).toBe('canceled');
    expect(aborted.length).toBeGreaterThan(0);
    expect(calls(spy)).toContain(`DELETE /api/shows/${SHOW}/uploads/${ASSET}`);
    expect(bodies.complete).toBeUndefined();
  });

  it('reports the API’s refusal to open the upload in its own words', async () => {
    api({
      [`POST /api/shows/${SHOW}/uploads`]: () =>
        jsonResponse(
          {
            code: 'CONSENT_EXPIRED',
            message:
              'The consent expired on 2020-01-01; record a current consent before uploading.',
          },
          422,
        ),
    });
    const { putPart } = store(() => false);
    const session = new UploadSession(SHOW, { file: FILE(), kind: 'capture' }, { putPart, sha256 });
    await session.start();

    expect(session.snapshot().phase).toBe('failed');
    expect(session.snapshot().asset).toBeNull();
    expect((session.snapshot().error as Error).message).toContain('consent expired on 2020-01-01');
    expect(putPart).not.toHaveBeenCalled();
  });
});
