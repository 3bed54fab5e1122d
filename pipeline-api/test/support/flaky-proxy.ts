// A TCP proxy in front of a service that the test can take down and bring back: while down it
// resets every connection, open ones included, as a store that went away does. Tests point a
// worker process of their own at it to meet a real network fault, with nothing of ours mocked.
import { connect, createServer, type Socket } from 'node:net';

/** A running proxy. */
export interface FlakyProxy {
  /** `http://127.0.0.1:<port>`, to use in place of the service's address. */
  url: string;
  /** Resets open connections and every new one until `up`. */
  down(): void;
  /** Passes connections through again. */
  up(): void;
  /** Connections reset since the start. */
  readonly resets: number;
  close(): Promise<void>;
}

/** Starts a proxy to `target` (an http URL on this machine) on a free loopback port. */
export async function startFlakyProxy(target: string): Promise<FlakyProxy> {
  const { hostname, port } = new URL(target);
  let failing = false;
  let resets = 0;
  const open = new Set<Socket>();
  const reset = (s: Socket) => {
    resets += 1;
    s.resetAndDestroy();
  };
  const server = createServer((client) => {
    if (failing) return reset(client);
    const upstream = connect(Number(port), hostname);
    const end = () => {
      for (const s of [client, upstream]) {
        s.destroy();
        open.delete(s);
      }
    };
    open.add(client);
    open.add(upstream);
    client.on('error', end).on('close', end);
    upstream.on('error', end).on('close', end);
    client.pipe(upstream).pipe(client);
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port: own } = server.address() as { port: number };
  return {
    url: `http://127.0.0.1:${own}`,
    down() {
      failing = true;
      for (const s of open) if (!s.destroyed) reset(s);
      open.clear();
    },
    up() {
      failing = false;
    },
    get resets() {
      return resets;
    },
    close: () =>
      new Promise<void>((resolve) => {
        for (const s of open) s.destroy();
        server.close(() => resolve());
      }),
  };
}
