// Local SMTP sink: accepts every message on loopback, keeps it as an .eml file under the data
// directory, and lists what arrived as JSON over HTTP (for tests and the admin outbox in development).
import { createServer } from 'node:http';
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';

const host = process.env.MAIL_SINK_HOST ?? '127.0.0.1';
const smtpPort = Number(process.env.MAIL_SINK_SMTP_PORT ?? 2525);
const httpPort = Number(process.env.MAIL_SINK_HTTP_PORT ?? 2526);
const dir = process.env.MAIL_SINK_DIR ?? join(process.cwd(), '.data', 'mail');
mkdirSync(dir, { recursive: true });

let counter = 0;
const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  logger: false,
  onData(stream, session, callback) {
    const chunks: Buffer[] = [];
    stream.on('data', (c: Buffer) => chunks.push(c));
    stream.on('end', () => {
      const id = `${Date.now()}-${String(++counter).padStart(6, '0')}`;
      writeFileSync(join(dir, `${id}.eml`), Buffer.concat(chunks));
      callback();
    });
  },
});

async function listMessages() {
  const files = readdirSync(dir)
    .filter((f) => f.endsWith('.eml'))
    .sort();
  return Promise.all(
    files.map(async (f) => {
      const mail = await simpleParser(readFileSync(join(dir, f)));
      const addresses = (a: typeof mail.to) =>
        (Array.isArray(a) ? a : a ? [a] : []).flatMap((x) => x.value.map((v) => v.address ?? ''));
      return {
        id: f.replace(/\.eml$/, ''),
        from: mail.from?.text ?? '',
        to: addresses(mail.to),
        subject: mail.subject ?? '',
        date: mail.date?.toISOString() ?? null,
        text: mail.text ?? '',
        html: typeof mail.html === 'string' ? mail.html : null,
      };
    }),
  );
}

const http = createServer((req, res) => {
  const send = (status: number, body: unknown) => {
    res.writeHead(status, { 'content-type': 'application/json' });
    res.end(JSON.stringify(body));
  };
  if (req.url === '/messages' && req.method === 'GET') {
    listMessages().then(
      (m) => send(200, m),
      (e: Error) => send(500, { code: 'MAIL_SINK_READ_FAILED', message: e.message }),
    );
  } else if (req.url === '/messages' && req.method === 'DELETE') {
    for (const f of readdirSync(dir)) rmSync(join(dir, f));
    send(204, null);
  } else {
    send(404, { code: 'NOT_FOUND', message: `${req.method} ${req.url} is not a mail sink route` });
  }
});

smtp.listen(smtpPort, host, () => {
  http.listen(httpPort, host, () => {
    console.log(`mail sink: SMTP ${host}:${smtpPort}, inbox http://${host}:${httpPort}/messages`);
  });
});

const stop = () => {
  http.close();
  smtp.close(() => process.exit(0));
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
