import Link from 'next/link';
import type { QuestionState, QuestionSummary } from '@/lib/questions/list';
import { siteGlance } from '@/lib/questions/site-glance';
import type { UnitSystem } from '@/lib/hydraulics';
import { STATE_WORDS } from '@/components/questions/state-words';
import { StateDrop } from '@/components/questions/StateDrop';
import { formatDate } from '@/lib/dates';
import { withReadings } from '@/lib/units/in-text';

function StateLine({ id, state, units }: { id: number; state: QuestionState; units: UnitSystem }) {
  if (state.kind === 'fixed') {
    return (
      <p className="flex items-start gap-1.5 text-sm text-moss-700 dark:text-moss-300" data-state="fixed">
        <StateDrop kind="fixed" className="mt-0.5" />
        <span>
          <span className="font-semibold">{STATE_WORDS.fixed}</span>
          {state.line ? (
            <>
              {' — '}
              <Link href={`/questions/${id}#answer-${state.answerId}`} className="font-serif underline-offset-2">
                <span data-member-words>{withReadings(state.line, units)}</span>
              </Link>
            </>
          ) : null}
        </span>
      </p>
    );
  }
  return (
    <p
      className={`flex items-center gap-1.5 text-sm ${state.kind === 'waiting' ? 'text-clay-600 dark:text-clay-300' : 'text-creek-500 dark:text-creek-200'}`}
      data-state={state.kind}
    >
      <StateDrop kind={state.kind} />
      <span>{STATE_WORDS[state.kind]}</span>
    </p>
  );
}

/**
 * Questions as builders scan them: the site's numbers in the reader's units next to
 * the title, where the question stands in our words, then who asked and where it is
 * filed. Questions without a site sheet show the start of their text instead.
 */
export function QuestionList({ items, units }: { items: QuestionSummary[]; units: UnitSystem }) {
  if (items.length === 0) return <p className="cw-muted">No questions here yet.</p>;
  return (
    <ol className="flex flex-col" data-testid="question-list">
      {items.map((q) => {
        const glance = siteGlance(q.siteSheet, units);
        return (
          <li
            key={q.id}
            data-question={q.id}
            className="grid gap-x-5 gap-y-2 border-t border-limestone-300 py-4 first:border-t-0 sm:grid-cols-[15rem_1fr] sm:grid-rows-[auto_1fr] dark:border-creek-700"
          >
            <div className="flex flex-col gap-1.5 sm:col-start-2 sm:row-start-1">
              <h3 className="font-serif text-lg font-semibold leading-snug">
                <Link href={`/questions/${q.id}`} className="no-underline hover:underline">
                  {q.title}
                </Link>
              </h3>
              <StateLine id={q.id} state={q.state} units={units} />
              {!glance ? <p className="cw-muted line-clamp-2 font-serif text-sm">{q.excerpt}</p> : null}
            </div>
            {glance ? (
              <div
                className="self-start rounded-md bg-creek-50 px-3 py-2 text-sm sm:col-start-1 sm:row-span-2 sm:row-start-1 dark:bg-creek-800"
                data-testid="site-glance"
              >
                <dl className="cw-num flex flex-wrap gap-x-4 gap-y-0.5 font-sans sm:grid sm:grid-cols-[auto_1fr] sm:gap-x-3">
                  {glance.numbers.map((n) => (
                    <div key={n.key} className="flex gap-1.5 sm:contents" data-glance={n.key}>
                      <dt className="cw-muted">{n.label}</dt>
                      <dd className="whitespace-nowrap font-semibold">{n.value}</dd>
                    </div>
                  ))}
                </dl>
                {glance.symptom ? (
                  <p className="mt-1 text-xs text-signal-700 dark:text-signal-200" data-glance="symptom">
                    {glance.symptom}
                  </p>
                ) : null}
              </div>
            ) : (
              <p className="cw-muted hidden text-xs italic sm:col-start-1 sm:row-span-2 sm:row-start-1 sm:block">
                no site sheet
              </p>
            )}
            <p className="cw-muted self-start text-xs sm:col-start-2 sm:row-start-2">
              asked by {q.author.displayName} on <time dateTime={q.createdAt}>{formatDate(q.createdAt)}</time>
              {q.tags.length ? (
                <>
                  {' · filed under '}
                  {q.tags.map((t, i) => (
                    <span key={t.slug}>
                      {i ? ', ' : ''}
                      <Link href={`/tags/${t.slug}`} className="cw-link">
                        {t.name}
                      </Link>
                    </span>
                  ))}
                </>
              ) : null}
            </p>
          </li>
        );
      })}
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
