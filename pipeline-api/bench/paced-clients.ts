// Clients that each send one request per second, like people paging through a table, started at
// evenly spread moments of the first second so they do not fire in step (a load tool's per-client
// rate starts every client at once: 50 requests land together each second and the last one waits
// for the 49 before it, which no office of 50 people does). Each client keeps its own connection.
import { Agent, request } from 'node:http';

/** Latencies in milliseconds, and the requests that failed (non-2xx or error). */
export interface PacedResult {
  ms: number[];
  rps: number;
  failures: number;
}

/** One GET on the client's own kept-alive connection; resolves with its status. */
function get(url: URL, headers: Record<string, string>, agent: Agent): Promise<number> {
  return new Promise((resolve, reject) => {
    const req = request(url, { agent, headers }, (res) => {
      res.resume();
      res.on('end', () => resolve(res.statusCode ?? 0));
      res.on('error', reject);
    });
    req.setTimeout(10_000, () => req.destroy(new Error('timed out after 10 s')));
    req.on('error', reject);
    req.end();
  });
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, Math.max(0, ms)));

/** `clients` clients, each `perClient` requests one second apart; `headersOf(i)` per client. */
export async function runPaced(
  url: string,
  clients: number,
  perClient: number,
  headersOf: (client: number) => Record<string, string>,
): Promise<PacedResult> {
  const target = new URL(url);
  const ms: number[] = [];
  let failures = 0;
  const started = performance.now();
  await Promise.all(
    Array.from({ length: clients }, async (_, i) => {
      const agent = new Agent({ keepAlive: true, maxSockets: 1 });
      const headers = headersOf(i);
      const offset = (1000 * i) / clients;
      try {
        for (let k = 0; k < perClient; k++) {
          await sleep(started + offset + 1000 * k - performance.now());
          const t0 = performance.now();
          try {
            const status = await get(target, headers, agent);
            if (status < 200 || status >= 300) failures += 1;
          } catch {
            failures += 1;
          }
          ms.push(performance.now() - t0);
        }
      } finally {
        agent.destroy();
      }
    }),
  );
  return { ms, rps: ms.length / ((performance.now() - started) / 1000), failures };
}
