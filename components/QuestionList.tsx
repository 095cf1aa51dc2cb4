import Link from 'next/link';
import type { QuestionSummary } from '@/lib/questions/list';
import { formatDate } from '@/lib/dates';

export function QuestionList({ items }: { items: QuestionSummary[] }) {
  if (items.length === 0) return <p className="cw-muted">No questions yet.</p>;
  return (
    <ol className="flex flex-col gap-3" data-testid="question-list">
      {items.map((q) => (
        <li key={q.id} className="cw-card">
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <h3 className="font-serif text-lg font-semibold leading-snug">
              <Link href={`/questions/${q.id}`} className="no-underline hover:underline">
                {q.title}
              </Link>
            </h3>
            <span className="cw-num flex-none text-sm">
              {q.fixed ? (
                <span className="rounded bg-moss px-2 py-0.5 font-semibold text-limestone-50">fixed it</span>
              ) : (
                <span className="cw-muted">
                  {q.answerCount} {q.answerCount === 1 ? 'answer' : 'answers'}
                </span>
              )}
            </span>
          </div>
          <p className="cw-muted mt-1 font-serif text-sm">{q.excerpt}</p>
          <div className="mt-2 flex flex-wrap items-center gap-2 text-xs">
            {q.tags.map((t) => (
              <Link
                key={t.slug}
                href={`/tags/${t.slug}`}
                className="rounded-full border border-creek-300 px-2 py-0.5 no-underline dark:border-creek-500"
              >
                {t.name}
              </Link>
            ))}
            <span className="cw-muted ml-auto">
              {q.author.displayName} · <time dateTime={q.createdAt}>{formatDate(q.createdAt)}</time>
            </span>
          </div>
        </li>
      ))}
    </ol>
  );
}

export function Pager({
  page,
  totalPages,
  basePath,
  query = {},
  words = ['← Newer', 'Older →'],
}: {
  page: number;
  totalPages: number;
  basePath: string;
  query?: Record<string, string>;
  /** link words for the previous and next page; lists not in date order say "Previous"/"Next" */
  words?: readonly [string, string];
}) {
  if (totalPages <= 1) return null;
  const href = (p: number) => `${basePath}?${new URLSearchParams({ ...query, page: String(p) })}`;
  return (
    <nav aria-label="Pages" className="mt-6 flex items-center justify-between text-sm">
      {page > 1 ? (
        <Link href={href(page - 1)} className="cw-link" rel="prev">
          {words[0]}
        </Link>
      ) : (
        <span />
      )}
      <span className="cw-muted cw-num">
        Page {page} of {totalPages}
      </span>
      {page < totalPages ? (
        <Link href={href(page + 1)} className="cw-link" rel="next">
          {words[1]}
        </Link>
      ) : (
        <span />
      )}
    </nav>
  );
}
