import { revalidatePath } from 'next/cache';
import { forgetListCounts } from '@/lib/questions/list';

/**
 * Thread pages are rendered once for every reader (signed-out view) and kept by
 * Next's page cache; each signed-in reader's own marks, and the hidden posts
 * moderators see, are fetched by the browser after the page loads. Every write to a
 * thread marks its page stale here, so the next visit renders it afresh; the page's
 * `revalidate` period is the backstop for writes made on another app instance.
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
