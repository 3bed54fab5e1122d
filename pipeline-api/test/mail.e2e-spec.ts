import { randomUUID } from 'node:crypto';
import { Test } from '@nestjs/testing';
import { describe, expect, it } from 'vitest';
import { AppConfigModule } from '../src/config/app-config.module';
import { MailModule } from '../src/mail/mail.module';
import { MailService } from '../src/mail/mail.service';

interface SinkMessage {
  to: string[];
  subject: string;
  text: string;
  from: string;
}

describe('MailService', () => {
  it('delivers a message through SMTP to the local mail sink', async () => {
    const moduleRef = await Test.createTestingModule({
      imports: [AppConfigModule, MailModule],
    }).compile();
    const mail = moduleRef.get(MailService);
    const subject = `Take ready for review ${randomUUID()}`;
    await mail.send({ to: 'supervisor@example.test', subject, text: 'Shot 010 take v2 is ready.' });
    await moduleRef.close();

    const inbox = (await (
      await fetch(`${process.env.MAIL_SINK_URL}/messages`)
    ).json()) as SinkMessage[];
    const received = inbox.find((m) => m.subject === subject);
    expect(received?.to).toEqual(['supervisor@example.test']);
    expect(received?.text.trim()).toBe('Shot 010 take v2 is ready.');
    expect(received?.from).toContain(process.env.MAIL_FROM?.match(/<(.+)>/)?.[1] ?? 'overshoot');
  });
});
