import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';

export interface CaughtMail {
  to: string[];
  subject: string;
  text: string;
  html: string;
  headers: Map<string, unknown>;
  /** each header as sent, by lower-case name (mailparser folds List-* headers into one object) */
  raw: Map<string, string>;
}

/** An in-process SMTP server that keeps every message it is given, for tests. */
export class SmtpCatcher {
  readonly messages: CaughtMail[] = [];
  private server?: SMTPServer;
  private waiters: (() => void)[] = [];

  /**
   * `reject`: addresses refused at RCPT TO with a permanent 550, as a real server refuses an unknown mailbox.
   * `delayMs`: how long the server takes to accept each message, as a slow relay does.
   */
  constructor(
    readonly port: number,
    private readonly opts: { reject?: string[]; delayMs?: number } = {},
  ) {}

  /** How many messages reached `address`, whatever their subject. */
  countTo(address: string): number {
    return this.messages.filter((m) => m.to.includes(address)).length;
  }

  async start() {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      onRcptTo: (address, _session, done) => {
        if (this.opts.reject?.includes(address.address)) {
          const err = new Error('5.1.1 mailbox unavailable') as Error & { responseCode: number };
          err.responseCode = 550;
          return done(err);
        }
        done();
      },
      onData: (stream, _session, done) => {
        simpleParser(stream)
          .then(async (mail) => {
            if (this.opts.delayMs) await new Promise((r) => setTimeout(r, this.opts.delayMs));
            return mail;
          })
          .then((mail) => {
            const to = ([] as { value: { address?: string }[] }[])
              .concat((mail.to as never) ?? [])
              .flatMap((a) => a.value.map((v) => v.address ?? ''));
            this.messages.push({
              to,
              subject: mail.subject ?? '',
              text: mail.text ?? '',
              html: typeof mail.html === 'string' ? mail.html : '',
              headers: mail.headers,
              raw: new Map(mail.headerLines.map((h) => [h.key, h.line.slice(h.line.indexOf(':') + 1).trim()])),
            });
            this.waiters.splice(0).forEach((w) => w());
            done();
          })
          .catch((err: Error) => done(err));
      },
    });
    await new Promise<void>((resolve, reject) => {
      this.server!.once('error', reject);
      this.server!.listen(this.port, '127.0.0.1', () => resolve());
    });
  }

  async stop() {
    await new Promise<void>((resolve) => (this.server ? this.server.close(() => resolve()) : resolve()));
  }

  /** The newest message to `address` matching `subject`, waiting up to `ms` for it to arrive. */
  async waitFor(address: string, subject: RegExp, ms = 10_000): Promise<CaughtMail> {
    const deadline = Date.now() + ms;
    for (;;) {
      const found = [...this.messages].reverse().find((m) => m.to.includes(address) && subject.test(m.subject));
      if (found) return found;
      if (Date.now() > deadline) throw new Error(`no mail to ${address} matching ${subject} within ${ms} ms`);
      await new Promise<void>((r) => {
        this.waiters.push(r);
        setTimeout(r, 200);
      });
    }
  }
}

/** The first link in a message's text that starts with `path`, and its token. */
export function linkIn(mail: CaughtMail, path: string): { url: string; token: string } {
  const m = new RegExp(`(https?://[^\\s]+${path.replace(/[/?]/g, '\\$&')}[^\\s]*)`).exec(mail.text);
  if (!m) throw new Error(`no ${path} link in: ${mail.text}`);
  return { url: m[1], token: new URL(m[1]).searchParams.get('token') ?? '' };
}
