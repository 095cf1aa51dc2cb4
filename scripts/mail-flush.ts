/**
 * npm run mail:flush — sends every message due in the outbox, once. Safe beside the
 * server's own worker: each message is claimed by one sender.
 */
import { getSequelize } from '@/lib/db';
import { flushOutbox } from '@/lib/mail/outbox';

async function main() {
  try {
    const r = await flushOutbox();
    console.log(`outbox: ${r.sent} sent, ${r.retrying} waiting to retry, ${r.failed} failed for good`);
  } finally {
    await getSequelize().close();
  }
}

main().catch((err) => {
  console.error(`mail flush failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
