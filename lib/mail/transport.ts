import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';

/**
 * One SMTP transport per process. Development and tests point at a local catcher
 * (maildev on 127.0.0.1:1025, or the tests' smtp-server); SMTP_* in .env points the
 * same code at a real relay.
 */
const g = globalThis as unknown as { __clackwaterMail?: Transporter };

export function mailFrom(): string {
  return process.env.MAIL_FROM ?? 'Clackwater <no-reply@clackwater.example>';
}

export function getTransport(): Transporter {
  if (!g.__clackwaterMail) {
    const secure = process.env.SMTP_SECURE === '1';
    g.__clackwaterMail = nodemailer.createTransport({
      host: process.env.SMTP_HOST ?? '127.0.0.1',
      port: Number(process.env.SMTP_PORT ?? 1025),
      secure,
      ignoreTLS: !secure && process.env.SMTP_REQUIRE_TLS !== '1',
      auth: process.env.SMTP_USER ? { user: process.env.SMTP_USER, pass: process.env.SMTP_PASSWORD ?? '' } : undefined,
      connectionTimeout: 5_000,
      greetingTimeout: 5_000,
      socketTimeout: 10_000,
    });
  }
  return g.__clackwaterMail;
}

export interface Message {
  to: string;
  subject: string;
  text: string;
  html?: string;
  headers?: Record<string, string>;
}

export async function sendMail(m: Message) {
  return getTransport().sendMail({ from: mailFrom(), ...m });
}
