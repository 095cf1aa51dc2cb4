/**
 * Runs once when a server starts (Next's instrumentation hook): writes in lib/ mark
 * thread pages stale through Next's page cache (lib/questions/after-write.ts), search builds its
 * index in the background so the first search does not wait for it, and the mail
 * scheduler starts the outbox worker and the digests (MAIL_WORKER=off skips it).
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const [{ revalidatePath }, { onPageStale }] = await Promise.all([
    import('next/cache'),
    import('@/lib/questions/after-write'),
  ]);
  onPageStale((path) => revalidatePath(path));
  if (process.env.DB_REPLICAS) await readYourWritesInPages();
  if (process.env.MAIL_WORKER !== 'off') {
    const { startMailScheduler } = await import('@/lib/mail/scheduler');
    startMailScheduler();
  }
  if (process.env.SEARCH_WARM_ON_START === 'off') return;
  const { ensureIndex } = await import('@/lib/search');
  ensureIndex().catch((err) =>
    console.error(`search: the index will be built on the first search (${err instanceof Error ? err.message : err})`),
  );
}

/**
 * With read replicas, which renders read the primary (lib/db/read-your-writes.ts). Next
 * serves each request inside its work-unit store; reading that store (not `cookies()`)
 * neither opts a page out of the page cache nor throws during a prerender.
 * - a request whose member wrote in the last few seconds (the `cw_rw` marker): the primary,
 *   so they see what they just wrote;
 * - a render Next keeps and hands to every reader (a page-cache regeneration after a write
 *   marked it stale, a prerender): the primary, so the kept copy is never a replica's older
 *   one. These are rare (at most one per page per revalidate period), so they cost the
 *   primary little.
 * Everything else (a request without the marker) reads a replica.
 */
async function readYourWritesInPages() {
  const [{ workUnitAsyncStorage }, { wantPrimaryWhen, PRIMARY_MARKER_COOKIE }] = await Promise.all([
    import('next/dist/server/app-render/work-unit-async-storage.external'),
    import('@/lib/db/read-your-writes'),
  ]);
  wantPrimaryWhen(() => {
    const store = workUnitAsyncStorage.getStore();
    if (!store) return false;
    if (store.type === 'request') return store.cookies.has(PRIMARY_MARKER_COOKIE);
    return true;
  });
}
