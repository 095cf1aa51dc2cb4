import 'server-only';
import { createHash } from 'node:crypto';
import { col, fn, Op, QueryTypes, type Transaction } from 'sequelize';
import type { MailStatus } from '@/models/MailMessage';
import { getSequelize } from '@/lib/db';
import { isLockConflict } from '@/lib/db/errors';
import { initModels } from '@/models';
import { getTransport, mailFrom } from './transport';

/**
 * The outbox. Every message is written here in the same transaction as the event
 * that causes it, under a key naming the event and the recipient, so a retried
 * request or a second digest run cannot queue it twice. A worker then sends what is
 * due, with exponential backoff after a failure; after the last attempt the message
 * is marked failed with the SMTP error, for admins to see at /admin/outbox.
 */
export interface OutgoingMail {
  /** the event and the recipient: "answer:12:to:7" */
  key: string;
  userId: number | null;
  to: string;
  kind: string;
  subject: string;
  text: string;
  html?: string;
  headers?: Record<string, string>;
}

export function maxAttempts(): number {
  const n = Number(process.env.MAIL_MAX_ATTEMPTS ?? 10);
  return Number.isInteger(n) && n >= 1 && n <= 50 ? n : 10;
}

/** Wait before attempt n+1 after n failed ones: 30 s, 1 min, 2 min, … capped at 6 hours. */
export function backoffMs(failedAttempts: number): number {
  return Math.min(30_000 * 2 ** Math.max(0, failedAttempts - 1), 6 * 3_600_000);
}

/** How long a worker's claim on a message lasts before another worker may take it over. */
const CLAIM_MS = 2 * 60_000;

/** Queues messages inside the caller's transaction; a key already queued is left as it is. Returns how many are new. */
export async function enqueue(mails: OutgoingMail[], transaction: Transaction): Promise<number> {
  if (mails.length === 0) return 0;
  const { MailMessage } = initModels();
  const keys = mails.map((m) => m.key);
  const before = await MailMessage.count({ where: { dedupeKey: { [Op.in]: keys } }, transaction });
  const now = new Date();
  // INSERT IGNORE: a concurrent transaction queuing the same key waits on the unique
  // index, then its row is skipped; neither request fails.
  await MailMessage.bulkCreate(
    mails.map((m) => ({
      dedupeKey: m.key,
      userId: m.userId,
      toAddress: m.to,
      kind: m.kind,
      subject: m.subject.slice(0, 300),
      textBody: m.text,
      htmlBody: m.html ?? null,
      headers: m.headers ?? null,
      nextAttemptAt: now,
    })),
    { transaction, ignoreDuplicates: true },
  );
  const after = await MailMessage.count({ where: { dedupeKey: { [Op.in]: keys } }, transaction });
  if (after > before) transaction.afterCommit(() => kickOutbox());
  return after - before;
}

export interface FlushResult {
  sent: number;
  retrying: number;
  failed: number;
}

/** Whether this process runs the outbox worker (the scheduler and the kick after each commit). */
export function mailWorkerEnabled(): boolean {
  return process.env.MAIL_WORKER !== 'off';
}

let kick: NodeJS.Timeout | null = null;

/** Sends what was just queued soon after its transaction commits, without waiting for the next scheduled run. */
export function kickOutbox(): void {
  if (!mailWorkerEnabled() || kick) return;
  kick = setTimeout(() => {
    kick = null;
    flushOutbox().catch((err) =>
      console.error(`mail: the outbox worker stopped: ${err instanceof Error ? err.message : err}`),
    );
  }, 200);
  kick.unref?.();
}

/**
 * Claims up to `limit` due messages for this worker; rows another worker holds are
 * skipped, not waited for. Two workers claiming at once can still meet in InnoDB's
 * index locks (the claim moves rows between status values) and one is rolled back as
 * a deadlock: a claim changes nothing until it commits, so it simply runs again.
 */
async function claim(limit: number, now: Date): Promise<number[]> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await claimOnce(limit, now);
    } catch (err) {
      if (attempt >= 5 || !isLockConflict(err)) throw err;
      await new Promise((resolve) => setTimeout(resolve, 20 * attempt + Math.random() * 30));
    }
  }
}

async function claimOnce(limit: number, now: Date): Promise<number[]> {
  return getSequelize().transaction(async (transaction) => {
    const rows = await getSequelize().query<{ id: number }>(
      `SELECT id FROM mail_outbox
        WHERE (status = 'pending' AND next_attempt_at <= :now) OR (status = 'sending' AND locked_until < :now)
        ORDER BY next_attempt_at, id LIMIT :limit FOR UPDATE SKIP LOCKED`,
      { replacements: { now, limit }, type: QueryTypes.SELECT, transaction },
    );
    const ids = rows.map((r) => r.id);
    if (ids.length) {
      const { MailMessage } = initModels();
      await MailMessage.update(
        { status: 'sending', lockedUntil: new Date(now.getTime() + CLAIM_MS) },
        { where: { id: { [Op.in]: ids } }, transaction },
      );
    }
    return ids;
  });
}

function smtpError(err: unknown): string {
  if (!(err instanceof Error)) return String(err);
  const e = err as Error & { code?: string; responseCode?: number; response?: string };
  return [e.code, e.responseCode, e.response ?? e.message].filter(Boolean).join(' ').slice(0, 2000);
}

/** A failure of the connection rather than of this one message: the rest of the batch would fail the same way. */
function connectionDown(err: unknown): boolean {
  const code = (err as { code?: string })?.code;
  return (
    code === 'ECONNECTION' || code === 'ETIMEDOUT' || code === 'ESOCKET' || code === 'EDNS' || code === 'ECONNREFUSED'
  );
}

let running: Promise<FlushResult> | null = null;
let again = false;

/**
 * Sends every due message, a batch at a time. Safe to run in several processes at
 * once: each message is claimed by one worker (SELECT … FOR UPDATE SKIP LOCKED) and
 * marked sent by the worker that sent it. In one process, overlapping calls share a run.
 */
export function flushOutbox(
  opts: {
    limit?: number;
    now?: () => Date;
    /** run as a worker of its own, as another process would */ separate?: boolean;
  } = {},
): Promise<FlushResult> {
  if (opts.separate) return flushOnce(opts);
  if (running) {
    // a message queued after the running pass looked: go round once more when it ends
    again = true;
    return running;
  }
  running = (async () => {
    const total: FlushResult = { sent: 0, retrying: 0, failed: 0 };
    do {
      again = false;
      const r = await flushOnce(opts);
      total.sent += r.sent;
      total.retrying += r.retrying;
      total.failed += r.failed;
    } while (again);
    return total;
  })().finally(() => {
    running = null;
  });
  return running;
}

async function flushOnce({
  limit = 50,
  now = () => new Date(),
}: {
  limit?: number;
  now?: () => Date;
}): Promise<FlushResult> {
  const { MailMessage } = initModels();
  const result: FlushResult = { sent: 0, retrying: 0, failed: 0 };
  const max = maxAttempts();
  for (;;) {
    const ids = await claim(limit, now());
    if (ids.length === 0) return result;
    const rows = await MailMessage.findAll({ where: { id: { [Op.in]: ids } }, order: [['id', 'ASC']] });
    for (const [i, m] of rows.entries()) {
      try {
        await getTransport().sendMail({
          from: mailFrom(),
          to: m.toAddress,
          subject: m.subject,
          text: m.textBody,
          html: m.htmlBody ?? undefined,
          headers: m.headers ?? undefined,
          // the same id on every attempt, so a receiving server can drop a repeat
          messageId: `<${createHash('sha256').update(m.dedupeKey).digest('hex').slice(0, 32)}@clackwater.mail>`,
        });
        await m.update({ status: 'sent', sentAt: now(), attempts: m.attempts + 1, lockedUntil: null, lastError: null });
        result.sent++;
      } catch (err) {
        const attempts = m.attempts + 1;
        const message = smtpError(err);
        if (attempts >= max) {
          await m.update({ status: 'failed', attempts, lockedUntil: null, lastError: message });
          result.failed++;
          console.error(`mail: gave up on message ${m.id} to ${m.toAddress} after ${attempts} attempts: ${message}`);
        } else {
          const next = new Date(now().getTime() + backoffMs(attempts));
          await m.update({ status: 'pending', attempts, nextAttemptAt: next, lockedUntil: null, lastError: message });
          result.retrying++;
          console.error(
            `mail: message ${m.id} to ${m.toAddress} not sent (attempt ${attempts} of ${max}), next try ${next.toISOString()}: ${message}`,
          );
        }
        if (connectionDown(err)) {
          // Hand the rest of the batch back untried: they wait for the server, keep their
          // attempts for when it answers, and each waits as its own attempts say (a message
          // queued a moment ago waits the first interval, not this one's longer one).
          const rest = rows.slice(i + 1);
          for (const r of rest) {
            await MailMessage.update(
              {
                status: 'pending',
                lockedUntil: null,
                nextAttemptAt: new Date(now().getTime() + backoffMs(Math.max(1, r.attempts))),
              },
              { where: { id: r.id, status: 'sending' } },
            );
          }
          result.retrying += rest.length;
          return result;
        }
      }
    }
  }
}

/** Puts a failed message back in the queue for one more round of attempts (admins, from /admin/outbox). */
export async function retryFailed(id: number): Promise<boolean> {
  const { MailMessage } = initModels();
  const [n] = await MailMessage.update(
    { status: 'pending', attempts: 0, nextAttemptAt: new Date(), lockedUntil: null },
    { where: { id, status: 'failed' } },
  );
  if (n > 0) kickOutbox();
  return n > 0;
}

/** For /admin/outbox: how many messages in each status, and the newest 100 (of one status, or all). */
export async function outboxView(status: MailStatus | null) {
  const { MailMessage } = initModels();
  const grouped = (await MailMessage.findAll({
    attributes: ['status', [fn('COUNT', col('id')), 'n']],
    group: ['status'],
    raw: true,
  })) as unknown as { status: string; n: number }[];
  const rows = await MailMessage.findAll({
    where: status ? { status } : {},
    attributes: [
      'id',
      'toAddress',
      'kind',
      'subject',
      'status',
      'attempts',
      'nextAttemptAt',
      'lastError',
      'sentAt',
      'createdAt',
    ],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: 100,
  });
  return { counts: Object.fromEntries(grouped.map((g) => [g.status, Number(g.n)])) as Record<string, number>, rows };
}
