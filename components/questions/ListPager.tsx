import Link from 'next/link';
import type { QuestionPage } from '@/lib/questions/list';
import { MAX_NUMBERED_PAGE } from '@/lib/validation/list-page';
import { formatDate } from '@/lib/dates';

/**
 * Newer and older links under a question list. The first pages go by number
 * ("Page 2 of 4,900"); past them a page is reached from its neighbour by place, and
 * says how far back it is by the date of its newest question.
 */
export function ListPager({
  data,
  basePath,
  query = {},
}: {
  data: QuestionPage;
  basePath: string;
  query?: Record<string, string>;
}) {
  const href = (extra: Record<string, string>) => {
    const qs = new URLSearchParams({ ...query, ...extra }).toString();
    return qs ? `${basePath}?${qs}` : basePath;
  };
  const { page } = data;
  const newer =
    page === null
      ? data.newer
        ? href({ before: data.newer })
        : null
      : page > 1
        ? href(page > 2 ? { page: String(page - 1) } : {})
        : null;
  const older =
    data.older === null
      ? null
      : page !== null && page < MAX_NUMBERED_PAGE
        ? href({ page: String(page + 1) })
        : href({ after: data.older });
  if (!newer && !older) return null;
  const first = data.items[0];
  return (
    <nav aria-label="Pages" className="mt-6 flex items-center justify-between gap-3 text-sm">
      {newer ? (
        <Link href={newer} className="cw-link" rel="prev">
          ← Newer
        </Link>
      ) : (
        <span />
      )}
      <span className="cw-muted cw-num text-center">
        {page !== null
          ? `Page ${page} of ${data.totalPages.toLocaleString('en-GB')}`
          : first
            ? `asked ${formatDate(first.createdAt)} and before`
            : null}
      </span>
      {older ? (
        <Link href={older} className="cw-link" rel="next">
          Older →
        </Link>
      ) : (
        <span />
      )}
    </nav>
  );
}
