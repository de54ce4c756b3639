import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '@/lib/env';
import { log } from '@/lib/server/log';

const g = globalThis as unknown as { rungbookMail?: Transporter };

function transport(): Transporter {
  if (!g.rungbookMail) {
    const url = new URL(env().SMTP_URL);
    const loopback = ['127.0.0.1', 'localhost', '[::1]'].includes(url.hostname);
    // The local capture speaks plain SMTP on loopback; a real server is used with STARTTLS/TLS.
    g.rungbookMail = nodemailer.createTransport(env().SMTP_URL, loopback ? { ignoreTLS: true } : {});
  }
  return g.rungbookMail;
}

export interface Mail {
  to: string | string[];
  subject: string;
  text: string;
}

export async function sendMail(mail: Mail): Promise<void> {
  const to = Array.isArray(mail.to) ? mail.to : [mail.to];
  if (to.length === 0) return;
  await transport().sendMail({ from: env().MAIL_FROM, to, subject: mail.subject, text: mail.text });
  log.info({ to: to.length, subject: mail.subject }, 'mail sent');
}
