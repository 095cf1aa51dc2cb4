import { revalidatePath } from 'next/cache';
import { forgetListCounts } from '@/lib/questions/list';
import { indexFieldLog, indexThread } from '@/lib/search';

/**
 * What every write to a thread or a field log entry brings up to date once its
 * transaction has committed, in the same request.
 *
 * Thread pages are rendered once for every reader (signed-out view) and kept by
 * Next's page cache; each signed-in reader's own marks, and the hidden posts
 * moderators see, are fetched by the browser after the page loads. A write marks the
 * thread's page stale, so the next visit renders it afresh (the page's `revalidate`
 * is the backstop for writes made on another app instance), and forgets the lists'
 * cached counts.
 */
export function threadChanged(questionId: number | null | undefined): void {
  forgetListCounts();
  if (!questionId) return;
  try {
    revalidatePath(`/questions/${questionId}`);
  } catch {
    // outside a Next request (scripts, tests): there is no page cache to mark
  }
}

/**
 * The page and counts as above, then search: the thread's documents, and a field log
 * entry's. `reindex: false` for a write search does not see (a flag that hid nothing).
 */
export async function postsChanged(w: { questionId: number | null; fieldLogEntryId?: number | null; reindex?: boolean }): Promise<void> {
  threadChanged(w.questionId);
  if (w.reindex === false) return;
  if (w.questionId) await indexThread(w.questionId);
  if (w.fieldLogEntryId) await indexFieldLog([w.fieldLogEntryId]);
}
