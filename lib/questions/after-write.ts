import { indexFieldLog, indexThread } from '@/lib/search';

/**
 * What every write to a thread or a field log entry brings up to date once its
 * transaction has committed, in the same request.
 *
 * Thread pages are rendered once for every reader (signed-out view) and kept by
 * Next's page cache; each signed-in reader's own marks, and the hidden posts
 * moderators see, are fetched by the browser after the page loads. A write marks the
 * thread's page stale, so the next visit renders it afresh (the page's `revalidate`
 * is the backstop for writes made on another app instance). The lists' counts need
 * nothing here: the database keeps them in the write's own transaction (migration 017).
 */
export function threadChanged(questionId: number | null | undefined): void {
  if (questionId) pageStale(`/questions/${questionId}`);
}

type PageStaleHook = (path: string) => void;

/*
 * Kept on globalThis, not in this module: the hook is set from instrumentation.ts,
 * which Next bundles apart from the route handlers, so each bundle has its own copy of
 * this module but all share the process.
 */
const PAGE_STALE = Symbol.for('clackwater.pageStale');
const hooks = globalThis as { [PAGE_STALE]?: PageStaleHook };

/**
 * The app layer says how to mark a page stale (Next's `revalidatePath`, set in
 * instrumentation.ts), so lib/ stays free of the framework. Without a hook (scripts,
 * tests) there is no page cache to mark and nothing happens.
 */
export function onPageStale(hook: PageStaleHook | undefined): void {
  hooks[PAGE_STALE] = hook;
}

function pageStale(path: string): void {
  try {
    hooks[PAGE_STALE]?.(path);
  } catch {
    // outside a request's render or handler there is no page cache to mark
  }
}

/**
 * The page as above, then search: the thread's documents, and a field log
 * entry's. `reindex: false` for a write search does not see (a flag that hid nothing).
 */
export async function postsChanged(w: {
  questionId: number | null;
  fieldLogEntryId?: number | null;
  reindex?: boolean;
}): Promise<void> {
  threadChanged(w.questionId);
  if (w.reindex === false) return;
  if (w.questionId) await indexThread(w.questionId);
  if (w.fieldLogEntryId) await indexFieldLog([w.fieldLogEntryId]);
}
