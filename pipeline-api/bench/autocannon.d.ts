// The part of autocannon's programmatic API the benchmarks use (the package ships no types).
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';

  /** One connection of a run. */
  interface Client extends EventEmitter {
    setHeaders(headers: Record<string, string>): void;
  }

  /** Options of a run. */
  interface Options {
    url: string;
    connections?: number;
    amount?: number;
    duration?: number;
    connectionRate?: number;
    timeout?: number;
    headers?: Record<string, string>;
    setupClient?: (client: Client) => void;
  }

  /** Totals of a run. */
  interface Result {
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    requests: { average: number; total: number };
    statusCodeStats: Record<string, { count: number }>;
  }

  /** A running benchmark. */
  interface Instance extends EventEmitter {
    on(
      event: 'response',
      fn: (client: Client, status: number, bytes: number, ms: number) => void,
    ): this;
    on(event: string, fn: (...args: unknown[]) => void): this;
  }

  /** Starts a run; the callback gets its totals. */
  function autocannon(opts: Options, cb: (err: Error | null, result: Result) => void): Instance;
  export = autocannon;
}
