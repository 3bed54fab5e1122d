// Shot list latency under 50 concurrent clients on loopback: the first page in the default sort,
// and a filtered, sorted query (one assignee's late shots by due date). Three loads: one client
// alone (the latency of a request with no queue), saturated (each of 50 clients sends its next
// request as soon as the last answers, so latency is mostly queueing: 50 clients ÷ requests per
// second) and paced (each client one request per second, people paging through the table; the
// clients start spread over the first second, see paced-clients.ts). Beside latency: the CPU
// milliseconds the API and the database spend per request (from /proc), and the machine's load
// average. On a shared machine latency measures the other tenants too; CPU per request measures
// only our code. Prints figures only.
//
// Figures on two shared cores (1,000 shots; p50 / p95 ms, API CPU ms per request):
// - before the show check was cached and API paths skipped the web client's file lookup
//   (load 7.7–8.6): paced p50 21–28, p95 389–581, API 7.5–8.0; saturated p50 403, p95 774–859,
//   111–115 req/s, API 5.2–5.6; one client alone API 7.4–9.2; MariaDB 2.3–5.1.
// - after (load 3.4–6.1): paced p50 6–10, p95 12–30, API 4.0–5.0; saturated p50 122–252, p95
//   195–506, 176–374 req/s, API 2.4–3.6; one client alone API 3.0–6.5; MariaDB 1.3–3.5.
// The machine was quieter for the second set, which flatters its latency; CPU per request moves
// far less with the load and is the figure to compare.
import { loadavg } from 'node:os';
import autocannon from 'autocannon';
import { fmt, latencyFigures } from './stats';
import { cpuMeter } from './server-cpu';
import { runPaced } from './paced-clients';

/** Concurrent clients, as the product's target states. */
const CONNECTIONS = 50;
/** Requests per saturated run (bounded: under a minute each on two cores). */
const REQUESTS = 3000;
/** Requests per paced run: ten seconds at one request per client per second. */
const PACED_REQUESTS = 500;
/** Requests of one client alone, one after another: the latency without any queueing. */
const SINGLE_REQUESTS = 200;
const WARM_UP = 300;

/** How the clients send: one alone, all as fast as answered, or each once a second. */
type Load = 'single' | 'saturated' | 'paced';

/** One measured query. */
export interface ShotListCase {
  name: string;
  path: string;
}

/** What a run measured. */
export interface ShotListFigures {
  name: string;
  load: Load;
  p50: number;
  p95: number;
  p99: number;
  rps: number;
  failures: number;
  /** CPU milliseconds per request of the API process(es) and of the database (null: unknown). */
  apiCpuMs: number | null;
  dbCpuMs: number | null;
  /** One-minute load average of the machine at the end of the run. */
  load1: number;
}

/** Pids of the servers whose CPU to count (null: not found). */
export interface ServerPids {
  api: number | null;
  db: number | null;
}

/**
 * Each client has its own address (X-Forwarded-For, trusted from loopback), as 50 people at 50
 * desks would: the API's per-address request limit is for one client, not for the whole studio.
 */
function run(
  url: string,
  cookie: string,
  amount: number,
  connections = CONNECTIONS,
): Promise<{ ms: number[]; rps: number; failures: number }> {
  const ms: number[] = [];
  let next = 0;
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        url,
        connections,
        amount,
        timeout: 10,
        headers: { cookie, accept: 'application/json' },
        setupClient: (client) => {
          next += 1;
          client.setHeaders({
            cookie,
            accept: 'application/json',
            'x-forwarded-for': `10.77.0.${next}`,
          });
        },
      },
      (err, result) => {
        if (err) return reject(err);
        const failures = result.errors + result.timeouts + result.non2xx;
        resolve({ ms, rps: result.requests.total / result.duration, failures });
      },
    );
    instance.on('response', (_client, _status, _bytes, time) => {
      ms.push(time);
    });
  });
}

/** Measures each case after a short warm-up; returns and prints the figures. */
export async function runShotListBench(
  apiUrl: string,
  cookie: string,
  cases: ShotListCase[],
  pids: ServerPids,
): Promise<ShotListFigures[]> {
  console.log(
    `\nshot list: one client alone (${SINGLE_REQUESTS} requests), then ${CONNECTIONS} concurrent clients: saturated ${REQUESTS} requests, paced ${PACED_REQUESTS} at 1/s per client`,
  );
  console.log(
    '  query                            load         p50 ms  p95 ms  p99 ms    req/s  failed  API ms/req  DB ms/req  loadavg',
  );
  const out: ShotListFigures[] = [];
  for (const c of cases) {
    const url = `${apiUrl}${c.path}`;
    const probe = await fetch(url, { headers: { cookie } });
    if (probe.status !== 200)
      throw new Error(`${c.path} answered ${probe.status}: ${await probe.text()}`);
    await run(url, cookie, WARM_UP);
    for (const load of ['single', 'saturated', 'paced'] as const) {
      const meter = cpuMeter({ api: pids.api, db: pids.db });
      const { ms, rps, failures } =
        load === 'single'
          ? await run(url, cookie, SINGLE_REQUESTS, 1)
          : load === 'saturated'
            ? await run(url, cookie, REQUESTS)
            : await runPaced(url, CONNECTIONS, PACED_REQUESTS / CONNECTIONS, (i) => ({
                cookie,
                accept: 'application/json',
                'x-forwarded-for': `10.77.1.${i + 1}`,
              }));
      const cpu = meter.since();
      const perRequest = (v: number | null) => (v === null ? null : v / ms.length);
      const f: ShotListFigures = {
        name: c.name,
        load,
        ...latencyFigures(ms),
        rps,
        failures,
        apiCpuMs: perRequest(cpu.api),
        dbCpuMs: perRequest(cpu.db),
        load1: loadavg()[0],
      };
      out.push(f);
      const cpuText = (v: number | null, w: number) =>
        v === null ? 'n/a'.padStart(w) : fmt(v, 2, w);
      console.log(
        `  ${c.name.padEnd(32)} ${load.padEnd(10)} ${fmt(f.p50)} ${fmt(f.p95)} ${fmt(f.p99)} ${fmt(f.rps, 0, 8)} ${String(failures).padStart(7)} ${cpuText(f.apiCpuMs, 11)} ${cpuText(f.dbCpuMs, 10)} ${fmt(f.load1, 1, 8)}`,
      );
    }
  }
  return out;
}
