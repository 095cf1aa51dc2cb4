/**
 * npm run mail:digest — queues this week's digests (add `-- --daily` for the daily
 * ones, `-- --all` for both) and sends what is due. Running it twice, or while the
 * server's own scheduler runs, queues one digest per member per period.
 */
import { getSequelize } from '@/lib/db';
import { runDigests, type DigestFrequency } from '@/lib/mail/digest';
import { flushOutbox } from '@/lib/mail/outbox';

async function main() {
  const args = process.argv.slice(2);
  const frequencies: DigestFrequency[] = args.includes('--all')
    ? ['daily', 'weekly']
    : args.includes('--daily')
      ? ['daily']
      : ['weekly'];
  try {
    for (const f of frequencies) {
      const r = await runDigests(f);
      console.log(
        `${r.frequency} digest ${r.period}: ${r.members} members on it, ${r.queued} queued, ${r.nothingNew} with nothing new, ${r.alreadyQueued} already queued earlier`,
      );
    }
    const sent = await flushOutbox();
    console.log(`outbox: ${sent.sent} sent, ${sent.retrying} waiting to retry, ${sent.failed} failed for good`);
  } finally {
    await getSequelize().close();
  }
}

main().catch((err) => {
  console.error(`mail digest failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
