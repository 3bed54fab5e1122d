// Reads what the local mail sink received (the worker sends through real SMTP).

/** One message as the sink lists it. */
export interface SinkMessage {
  id: string;
  to: string[];
  subject: string;
  text: string;
  from: string;
}

/** Every message the sink holds. */
export async function sinkMessages(): Promise<SinkMessage[]> {
  const res = await fetch(`${process.env.MAIL_SINK_URL}/messages`);
  return (await res.json()) as SinkMessage[];
}

/** Waits for a message to `to` (delivery goes through the queue and the worker process). */
export async function waitForMail(
  to: string,
  subject: RegExp,
  timeoutMs = 15_000,
): Promise<SinkMessage> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const found = (await sinkMessages()).find((m) => m.to.includes(to) && subject.test(m.subject));
    if (found) return found;
    if (Date.now() > until) throw new Error(`no e-mail to ${to} matching ${subject} arrived`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** The secret of a link in an e-mail's text, e.g. `linkToken(text, '/reset-password')`. */
export function linkToken(text: string, path: string): string {
  const match = new RegExp(`${path}#token=([A-Za-z0-9_-]+)`).exec(text);
  if (!match) throw new Error(`no ${path} link in: ${text}`);
  return match[1];
}
