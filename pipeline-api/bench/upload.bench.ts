// Upload throughput of a capture-sized file through the real presigned multipart path (create →
// PUT parts straight to the S3 store → complete), then the worker's ingest: streaming the object
// back while hashing it, timed from the show's live events. Prints figures only.
import { createHash, randomFillSync } from 'node:crypto';
import { openEventStream, type StreamItem } from '../test/support/event-stream';

const MB = 1024 * 1024;
/** A capture-sized file: 200 MiB. */
const SIZE = 200 * MB;
/** Parts in flight at once, as a browser uploading one file would keep a few. */
const PARALLEL_PARTS = 4;

interface Created {
  asset: { id: string };
  partSize: number;
  parts: { partNumber: number; url: string }[];
}

const seconds = (ms: number) => (ms / 1000).toFixed(2);
const rate = (bytes: number, ms: number) => (bytes / MB / (ms / 1000)).toFixed(0);

async function api(apiUrl: string, cookie: string, path: string, body: object): Promise<unknown> {
  const res = await fetch(`${apiUrl}${path}`, {
    method: 'POST',
    headers: { cookie, 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });
  const answer = await res.json();
  if (!res.ok) throw new Error(`${path} answered ${res.status}: ${JSON.stringify(answer)}`);
  return answer;
}

async function putParts(
  created: Created,
  bytes: Buffer,
): Promise<{ partNumber: number; etag: string }[]> {
  const etags: { partNumber: number; etag: string }[] = [];
  const queue = [...created.parts];
  const worker = async () => {
    for (let part = queue.shift(); part; part = queue.shift()) {
      const start = (part.partNumber - 1) * created.partSize;
      const res = await fetch(part.url, {
        method: 'PUT',
        body: bytes.subarray(start, start + created.partSize),
      });
      if (res.status !== 200) throw new Error(`PUT part ${part.partNumber} answered ${res.status}`);
      etags.push({ partNumber: part.partNumber, etag: res.headers.get('etag') as string });
    }
  };
  await Promise.all(Array.from({ length: PARALLEL_PARTS }, worker));
  return etags.sort((a, b) => a.partNumber - b.partNumber);
}

/** Uploads 200 MiB of noise as a capture of `characterId` and times each step. */
export async function runUploadBench(
  apiUrl: string,
  cookie: string,
  showId: string,
  characterId: string,
): Promise<void> {
  console.log(
    `\nupload: ${SIZE / MB} MiB capture, presigned multipart, ${PARALLEL_PARTS} parts in flight`,
  );
  const bytes = randomFillSync(Buffer.allocUnsafe(SIZE));
  let t = performance.now();
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  const hashMs = performance.now() - t;
  console.log(
    `  client SHA-256                ${seconds(hashMs).padStart(6)} s   ${rate(SIZE, hashMs).padStart(5)} MB/s`,
  );

  const events = await openEventStream(`${apiUrl}/api/shows/${showId}/events`, { cookie });
  const start = performance.now();
  const created = (await api(apiUrl, cookie, `/api/shows/${showId}/uploads`, {
    kind: 'capture',
    fileName: 'bench_capture.glb',
    size: SIZE,
    sha256,
    characterId,
    consent: {
      performerCode: 'PRF-BENCH',
      scope: 'Benchmark data, no performer',
      expiresOn: '2099-12-31',
    },
  })) as Created;
  const createMs = performance.now() - start;
  t = performance.now();
  const etags = await putParts(created, bytes);
  const putMs = performance.now() - t;
  t = performance.now();
  await api(apiUrl, cookie, `/api/shows/${showId}/uploads/${created.asset.id}/complete`, {
    parts: etags,
  });
  const completeMs = performance.now() - t;
  const completedAt = performance.now();
  const totalMs = completedAt - start;
  console.log(
    `  create (${created.parts.length} part URLs)        ${seconds(createMs).padStart(6)} s`,
  );
  console.log(
    `  PUT parts                     ${seconds(putMs).padStart(6)} s   ${rate(SIZE, putMs).padStart(5)} MB/s`,
  );
  console.log(`  complete (join parts)         ${seconds(completeMs).padStart(6)} s`);
  console.log(
    `  create → complete             ${seconds(totalMs).padStart(6)} s   ${rate(SIZE, totalMs).padStart(5)} MB/s`,
  );

  // The worker reports `downloading` as it streams and hashes, `validating` once the digest is
  // checked, then ready or rejected (200 MiB of noise is no capture: rejected and deleted).
  const mine = (i: StreamItem) => i.kind === 'event' && i.data.assetId === created.asset.id;
  let hashedAt: number | undefined;
  let final: StreamItem | undefined;
  try {
    for (;;) {
      const item = await events.next(mine, 120_000);
      if (item.kind !== 'event') continue;
      if (item.data.stage === 'validating') hashedAt = performance.now();
      if (item.data.state !== 'pending') {
        final = item;
        break;
      }
    }
  } catch (e) {
    console.log(`  ingest: no final event (${(e as Error).message})`);
  } finally {
    events.close();
  }
  if (hashedAt !== undefined) {
    const ms = hashedAt - completedAt;
    console.log(
      `  ingest: read back + SHA-256   ${seconds(ms).padStart(6)} s   ${rate(SIZE, ms).padStart(5)} MB/s  (from completion, queue pick-up included)`,
    );
  }
  if (final?.kind === 'event') {
    console.log(
      `  ingest decided                ${seconds(performance.now() - completedAt).padStart(6)} s   ${final.data.state} (${final.data.stage})`,
    );
  }
}
