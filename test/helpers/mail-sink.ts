// Reads what the test stack's local mail sink received, as JSON over its HTTP side.
import { stackConfig } from '../../scripts/stack/config.ts';

const cfg = stackConfig('test');

/** Base URL of the mail sink's message list. */
export const MAIL_SINK_URL =
  process.env.OVERSHOOT_MAIL_SINK_URL ?? `http://${cfg.smtp.host}:${cfg.smtp.inboxPort}`;

/** One received e-mail. */
export interface SinkMessage {
  id: string;
  to: string[];
  subject: string;
  text: string;
}

/** Every message received so far. */
export async function sinkMessages(): Promise<SinkMessage[]> {
  const res = await fetch(`${MAIL_SINK_URL}/messages`);
  if (!res.ok) throw new Error(`The mail sink answered ${res.status}.`);
  return (await res.json()) as SinkMessage[];
}

/**
 * Waits for an e-mail to `to` whose text holds a link matching `pattern` and returns the link.
 * The worker sends mail from a queue, so it arrives a moment after the request.
 */
export async function readLink(to: string, pattern: RegExp, timeoutMs = 20_000): Promise<string> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const messages = (await sinkMessages()).filter((m) => m.to.includes(to));
    for (const m of messages.reverse()) {
      const link = m.text.match(/https?:\/\/\S+/g)?.find((l) => pattern.test(l));
      if (link) return link;
    }
    if (Date.now() > deadline) throw new Error(`No e-mail to ${to} with a link ${pattern}.`);
    await new Promise((r) => setTimeout(r, 250));
  }
}
