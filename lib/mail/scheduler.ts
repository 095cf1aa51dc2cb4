import 'server-only';
import cron, { type ScheduledTask } from 'node-cron';
import { flushOutbox, mailWorkerEnabled } from './outbox';
import { runDigests, type DigestFrequency } from './digest';

/**
 * node-cron inside the server: the outbox worker every 15 seconds, daily digests each
 * morning and weekly ones on Monday morning (UTC). Several servers may run this at
 * once; the outbox's claims and the digests' keys keep every message single.
 * MAIL_WORKER=off leaves it all to `npm run mail:flush` and `npm run mail:digest`.
 */
const g = globalThis as unknown as { __clackwaterMailTasks?: ScheduledTask[] };

function report(what: string) {
  return (err: unknown) => console.error(`mail: ${what} failed: ${err instanceof Error ? err.message : err}`);
}

async function digestAndFlush(frequency: DigestFrequency) {
  const r = await runDigests(frequency);
  console.log(
    `mail: ${r.frequency} digest ${r.period}: ${r.queued} queued, ${r.nothingNew} with nothing new, ${r.alreadyQueued} already queued`,
  );
  await flushOutbox();
}

export function startMailScheduler(): ScheduledTask[] {
  if (!mailWorkerEnabled()) return [];
  if (g.__clackwaterMailTasks) return g.__clackwaterMailTasks;
  const opts = { timezone: 'UTC', noOverlap: true };
  g.__clackwaterMailTasks = [
    cron.schedule(
      process.env.MAIL_FLUSH_CRON ?? '*/15 * * * * *',
      () => flushOutbox().then(() => undefined, report('the outbox worker')),
      { ...opts, name: 'mail-flush' },
    ),
    cron.schedule(
      process.env.MAIL_DAILY_CRON ?? '0 6 * * *',
      () => digestAndFlush('daily').catch(report('the daily digest')),
      { ...opts, name: 'mail-digest-daily' },
    ),
    cron.schedule(
      process.env.MAIL_WEEKLY_CRON ?? '0 6 * * 1',
      () => digestAndFlush('weekly').catch(report('the weekly digest')),
      { ...opts, name: 'mail-digest-weekly' },
    ),
  ];
  return g.__clackwaterMailTasks;
}
