// Local stand-ins for the hosted services, on loopback only: an SMTP capture with a small inbox
// page (http://127.0.0.1:<web port>/) and an S3-compatible object store. `npm start` and
// `npm test` start this; the app talks to them through nodemailer and the S3 SDK exactly as it
// would to the real services.
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { join } from 'node:path';
import { simpleParser } from 'mailparser';
import S3rver from 's3rver';
import { SMTPServer } from 'smtp-server';

const state = process.env.FAKES_STATE ?? '.data/fakes';
const smtpPort = Number(process.env.FAKES_SMTP_PORT ?? 2525);
const webPort = Number(process.env.FAKES_MAIL_WEB_PORT ?? 2580);
const s3Port = Number(process.env.FAKES_S3_PORT ?? 4569);
const mailDir = join(state, 'mail');
const s3Dir = join(state, 's3');
mkdirSync(mailDir, { recursive: true });
mkdirSync(s3Dir, { recursive: true });

interface CapturedMail {
  id: string;
  to: string[];
  from: string;
  subject: string;
  text: string;
  receivedAt: string;
}

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS', 'AUTH'],
  logger: false,
  async onData(stream, session, callback) {
    try {
      const parsed = await simpleParser(stream);
      const id = `${Date.now()}-${Math.random().toString(36).slice(2, 8)}`;
      const mail: CapturedMail = {
        id,
        to: session.envelope.rcptTo.map((r) => r.address),
        from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
        subject: parsed.subject ?? '',
        text: parsed.text ?? '',
        receivedAt: new Date().toISOString(),
      };
      writeFileSync(join(mailDir, `${id}.json`), JSON.stringify(mail, null, 2));
      callback();
    } catch (error) {
      callback(error as Error);
    }
  },
});

function inbox(): CapturedMail[] {
  return readdirSync(mailDir)
    .filter((f) => f.endsWith('.json'))
    .map((f) => JSON.parse(readFileSync(join(mailDir, f), 'utf8')) as CapturedMail)
    .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
}

const escape = (s: string) => s.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);

const web = createServer((req, res) => {
  const url = new URL(req.url ?? '/', `http://127.0.0.1:${webPort}`);
  if (url.pathname === '/health') return void res.writeHead(200, { 'content-type': 'application/json' }).end('{"ok":true}');
  if (url.pathname === '/messages') {
    const to = url.searchParams.get('to');
    const list = inbox().filter((m) => !to || m.to.includes(to.toLowerCase()));
    return void res.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify({ messages: list }));
  }
  const rows = inbox()
    .map((m) => `<article><h2>${escape(m.subject)}</h2><p><b>To:</b> ${escape(m.to.join(', '))} · ${escape(m.receivedAt)}</p><pre>${escape(m.text)}</pre></article>`)
    .join('');
  res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
  res.end(`<!doctype html><meta charset="utf-8"><title>Captured mail · Rungbook (local)</title><style>body{font:15px system-ui;margin:2rem;max-width:60rem}article{border:1px solid #ccc;border-radius:8px;padding:1rem;margin:1rem 0}pre{white-space:pre-wrap}</style><h1>Captured mail (local only)</h1><p>Mail sent by Rungbook to the local SMTP capture. JSON: <a href="/messages">/messages</a></p>${rows || '<p>No mail yet.</p>'}`);
});

const s3 = new S3rver({ address: '127.0.0.1', port: s3Port, directory: s3Dir, silent: true, configureBuckets: [] });

await s3.run();
await new Promise<void>((resolve) => smtp.listen(smtpPort, '127.0.0.1', resolve));
await new Promise<void>((resolve) => web.listen(webPort, '127.0.0.1', resolve));
console.log(`fakes: SMTP 127.0.0.1:${smtpPort}, inbox http://127.0.0.1:${webPort}, S3 http://127.0.0.1:${s3Port}`);

const stop = () => {
  smtp.close(() => undefined);
  web.close();
  void s3.close().finally(() => process.exit(0));
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
