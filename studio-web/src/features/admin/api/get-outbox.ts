// GET /api/admin/outbox: the e-mails the local mail sink received (development only).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';

/** One received e-mail. */
export interface OutboxMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  date: string | null;
  text: string;
}

/** Checks the outbox answer. */
export function parseOutbox(value: unknown): OutboxMessage[] {
  if (!Array.isArray(value)) throw new TypeError('The outbox answer is not a list.');
  return value.map((m, i) => {
    const b = (m ?? {}) as Record<string, unknown>;
    if (typeof b.id !== 'string') throw new TypeError(`Message ${i + 1} of the outbox has no id.`);
    return {
      id: b.id,
      from: String(b.from ?? ''),
      to: Array.isArray(b.to) ? b.to.map(String) : [],
      subject: String(b.subject ?? ''),
      date: typeof b.date === 'string' ? b.date : null,
      text: String(b.text ?? ''),
    };
  });
}

/** Fetches the newest messages first. */
export function getOutbox({ signal }: { signal?: AbortSignal } = {}): Promise<OutboxMessage[]> {
  return apiRequest('/admin/outbox', { signal }, parseOutbox);
}

/** How often the outbox asks again while open, in milliseconds. */
export const OUTBOX_REFRESH_MS = 5000;

/** Query options for the outbox, refreshed while the page is open. */
export function getOutboxQueryOptions() {
  return queryOptions({
    queryKey: ['admin', 'outbox'],
    queryFn: ({ signal }) => getOutbox({ signal }),
    refetchInterval: OUTBOX_REFRESH_MS,
  });
}

/** The received e-mails, newest first. */
export function useOutbox() {
  return useQuery(getOutboxQueryOptions());
}
