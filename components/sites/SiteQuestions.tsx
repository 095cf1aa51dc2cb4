import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { siteLinks } from '@/lib/sites/links';
import type { SiteView } from '@/lib/sites/store';
import { formatDate } from '@/lib/dates';
import { STATE_WORDS } from '@/components/questions/state-words';
import { StateDrop } from '@/components/questions/StateDrop';
import { SiteCalculations } from './SiteCalculations';

/**
 * The site's links on its page: the questions asked about it (the owner asks from here, the
 * site sheet filled from the plan) and, below, the worked calculations made from it.
 * Hidden and deleted questions are left out, except for moderators, who see them marked.
 */
export async function SiteQuestions({ site }: { site: SiteView }) {
  const viewer = await currentUserInPage();
  const links = await siteLinks(viewer, site.id);
  if (!links) return null;
  const { questions } = links;
  return (
    <>
      <section aria-labelledby="site-questions" className="flex flex-col gap-2 font-sans" data-print-hide>
        <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
          <h2 id="site-questions" className="font-serif text-xl font-semibold">
            Questions about this site
          </h2>
          {site.mine ? (
            <Link
              href={`/questions/ask?site=${site.id}`}
              className="cw-link inline-flex min-h-6 items-center font-semibold"
              data-testid="ask-about-site"
            >
              Ask about this site
            </Link>
          ) : null}
        </div>
        {questions.length === 0 ? (
          <p className="cw-muted text-sm">
            {site.mine
              ? 'None yet. A question asked from here carries the plan’s numbers in its site sheet.'
              : 'None yet.'}
          </p>
        ) : (
          <ul className="flex flex-col gap-2" data-testid="site-questions">
            {questions.map((q) => (
              <li key={q.id} className="cw-card flex flex-col gap-1 py-3">
                <Link href={`/questions/${q.id}`} className="cw-link font-semibold">
                  {q.title}
                </Link>
                <p className="cw-muted flex flex-wrap items-center gap-x-2 text-sm">
                  <StateDrop kind={q.state} className={q.state === 'fixed' ? 'text-moss-700 dark:text-moss-300' : ''} />
                  <span>{STATE_WORDS[q.state]}</span>
                  <span aria-hidden="true">·</span>
                  <span>asked {formatDate(q.createdAt)}</span>
                  {q.takenDown ? <span className="font-semibold">· hidden from readers</span> : null}
                </p>
              </li>
            ))}
          </ul>
        )}
      </section>
      <SiteCalculations site={site} calculations={links.calculations} />
    </>
  );
}
