/**
 * Runs once when a server starts (Next's instrumentation hook): writes in lib/ mark
 * thread pages stale through Next's page cache (lib/questions/after-write.ts), search builds its
 * index in the background so the first search does not wait for it, and the mail
 * scheduler starts the outbox worker and the digests (MAIL_WORKER=off skips it). With
 * REDIS_URL the shared Redis connection opens at once.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const [{ revalidatePath }, { onPageStale }] = await Promise.all([
    import('next/cache'),
    import('@/lib/questions/after-write'),
  ]);
  // the production server's response cache (scripts/response-cache.mjs) keeps the lists
  // and the home page that show this thread, so a stale thread empties it too
  // (set up by the server after this runs, so looked up at each write)
  const responseCache = () =>
    (globalThis as { [k: symbol]: { clear(reason: string): void } | undefined })[
      Symbol.for('clackwater.responseCache')
    ];
  onPageStale((path) => {
    responseCache()?.clear(`stale ${path}`);
    revalidatePath(path);
  });
  if (process.env.DB_REPLICAS) await readYourWritesInPages();
  if (process.env.REDIS_URL) {
    // connect now: until the connection is ready, rate limits count in this process's memory only
    const { redis } = await import('@/lib/redis');
    redis();
  }
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

/** With read replicas, renders outside guarded() read the primary when they must (lib/http/read-your-writes.ts). */
async function readYourWritesInPages() {
  const [{ wantPrimaryWhen }, { renderWantsPrimary }] = await Promise.all([
    import('@/lib/db/read-your-writes'),
    import('@/lib/http/read-your-writes'),
  ]);
  wantPrimaryWhen(renderWantsPrimary);
}

/**
 * A page whose render failed (the database went away mid-render, say) may still go out
 * as a 200 with the error boundary in it: the response cache must not keep it. The
 * server marks each render it may keep with a header (scripts/response-cache.mjs).
 */
export function onRequestError(_err: unknown, request: Readonly<{ headers: NodeJS.Dict<string | string[]> }>) {
  const id = request.headers['x-clackwater-render'];
  const cache = (globalThis as { [k: symbol]: { renderFailed?(id: string): void } | undefined })[
    Symbol.for('clackwater.responseCache')
  ];
  if (typeof id === 'string') cache?.renderFailed?.(id);
}
