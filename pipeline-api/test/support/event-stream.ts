// Reads a `text/event-stream` response with fetch, parsing the frames by hand: events (name and
// JSON data) and comment lines (heartbeats), in arrival order.

/** One frame of the stream: an event, or a comment. */
export type StreamItem =
  | { kind: 'event'; event: string; data: Record<string, unknown> }
  | { kind: 'comment'; text: string };

/** An open stream: the response, and the frames as they arrive. */
export interface EventStream {
  status: number;
  contentType: string | null;
  /** The body of a refused request (JSON error), when the status is not 200. */
  body?: { code?: string };
  /** The next frame that matches; throws when the stream ends or the time runs out first. */
  next(match?: (item: StreamItem) => boolean, timeoutMs?: number): Promise<StreamItem>;
  /** Resolves once the server has ended the stream (throws when the time runs out). */
  ended(timeoutMs?: number): Promise<void>;
  close(): void;
}

/** Parses one frame (the lines between blank lines). */
function parseFrame(frame: string): StreamItem | null {
  let event = 'message';
  const data: string[] = [];
  const comments: string[] = [];
  for (const line of frame.split('\n')) {
    if (line.startsWith(':')) comments.push(line.slice(1).trim());
    else if (line.startsWith('event:')) event = line.slice(6).trim();
    else if (line.startsWith('data:')) data.push(line.slice(5).trimStart());
  }
  if (data.length > 0) return { kind: 'event', event, data: JSON.parse(data.join('\n')) };
  if (comments.length > 0) return { kind: 'comment', text: comments.join('\n') };
  return null;
}

/** Opens `url` as an event stream with the given headers. */
export async function openEventStream(
  url: string,
  headers: Record<string, string> = {},
): Promise<EventStream> {
  const abort = new AbortController();
  const res = await fetch(url, {
    headers: { accept: 'text/event-stream', ...headers },
    signal: abort.signal,
  });
  const contentType = res.headers.get('content-type');
  if (res.status !== 200 || !res.body) {
    return {
      status: res.status,
      contentType,
      body: (await res.json()) as { code?: string },
      next: () => Promise.reject(new Error(`no stream: ${res.status}`)),
      ended: () => Promise.resolve(),
      close: () => abort.abort(),
    };
  }
  const reader = res.body.pipeThrough(new TextDecoderStream()).getReader();
  const queue: StreamItem[] = [];
  let buffer = '';
  let done = false;

  /** Reads more bytes into the queue; false once the stream is over. */
  const pull = async (deadline: number): Promise<boolean> => {
    if (done) return false;
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error('no event in time')), deadline - Date.now());
    });
    try {
      const chunk = await Promise.race([reader.read(), timeout]);
      if (chunk.done) {
        done = true;
        return false;
      }
      buffer += chunk.value;
      let end: number;
      while ((end = buffer.indexOf('\n\n')) >= 0) {
        const item = parseFrame(buffer.slice(0, end));
        buffer = buffer.slice(end + 2);
        if (item) queue.push(item);
      }
      return true;
    } catch (e) {
      if ((e as Error).name === 'AbortError' || (e as Error).name === 'TypeError') {
        done = true;
        return false;
      }
      throw e;
    } finally {
      clearTimeout(timer);
    }
  };

  return {
    status: res.status,
    contentType,
    async next(match = () => true, timeoutMs = 20_000) {
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        while (queue.length > 0) {
          const item = queue.shift() as StreamItem;
          if (match(item)) return item;
        }
        if (!(await pull(deadline))) throw new Error('the stream ended before a matching event');
      }
    },
    async ended(timeoutMs = 20_000) {
      const deadline = Date.now() + timeoutMs;
      while (await pull(deadline)) queue.length = 0;
    },
    close: () => abort.abort(),
  };
}

/** Matches an event by name and, optionally, data fields. */
export const isEvent =
  (event: string, fields: Record<string, unknown> = {}) =>
  (item: StreamItem) =>
    item.kind === 'event' &&
    item.event === event &&
    Object.entries(fields).every(([k, v]) => item.data[k] === v);
