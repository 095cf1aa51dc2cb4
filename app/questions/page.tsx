import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { listPageSchema } from '@/lib/validation/list-page';
import Link from 'next/link';
import { listQuestions, type ListFilter } from '@/lib/questions/list';
import { currentUserInPage } from '@/lib/auth/session';
import { QuestionList } from '@/components/QuestionList';
import { ListPager } from '@/components/questions/ListPager';
import { STATE_WORDS } from '@/components/questions/state-words';
import { readUnitPreference } from '@/lib/units/server';

export const metadata: Metadata = {
  title: 'Questions',
  description: 'Questions from ram pump builders, with their measurements, and answers with the numbers.',
};

export default async function QuestionsPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[]>>;
}) {
  const sp = await searchParams;
  const one = (v: string | string[] | undefined) => (typeof v === 'string' ? v : undefined);
  const parsed = listPageSchema.safeParse({
    page: one(sp.page),
    perPage: one(sp.perPage),
    after: one(sp.after),
    before: one(sp.before),
  });
  if (!parsed.success) notFound();

  const show = one(sp.show) ?? 'newest';
  const viewer = await currentUserInPage();
  const signedIn = viewer !== null;
  const filter: ListFilter =
    show === 'unanswered'
      ? { kind: 'unanswered' }
      : show === 'mine' && viewer
        ? { kind: 'mine', userId: viewer.id }
        : show === 'followed' && viewer
          ? { kind: 'followed', userId: viewer.id }
          : { kind: 'newest' };
  const [data, units] = await Promise.all([listQuestions(parsed.data, filter), readUnitPreference()]);
  // past the end by number, or a place with nothing older: nothing to show
  if ((data.page ?? 1) > data.totalPages || (data.page === null && data.items.length === 0)) notFound();

  const choices: [string, string][] = [
    ['newest', 'all questions'],
    ['unanswered', STATE_WORDS.waiting],
    ...(signedIn
      ? ([
          ['mine', 'the ones I asked'],
          ['followed', 'the ones I follow'],
        ] as [string, string][])
      : []),
  ];

  return (
    <div>
      <h1 className="font-serif text-3xl font-semibold">Questions</h1>
      <p className="cw-prose mt-2">
        Builders’ questions with their site’s numbers, and the answers that worked them out. Stuck at your own water?{' '}
        <Link href="/questions/ask" className="cw-link">
          Ask the builders
        </Link>{' '}
        — bring your fall, lift and flow.
      </p>
      <nav aria-label="Which questions" className="mt-4 mb-2 text-sm">
        <span className="cw-muted">Show: </span>
        {choices.map(([k, label], i) => (
          <span key={k}>
            {i ? <span className="cw-muted"> · </span> : null}
            {show === k ? (
              <span aria-current="page" className="font-semibold">
                {label}
              </span>
            ) : (
              <Link href={k === 'newest' ? '/questions' : `/questions?show=${k}`} className="cw-link">
                {label}
              </Link>
            )}
          </span>
        ))}
      </nav>
      <p className="cw-muted cw-num mb-2 text-sm">{data.total.toLocaleString('en-US')} questions, newest first</p>
      <QuestionList items={data.items} units={units} />
      <ListPager
        data={data}
        basePath="/questions"
        query={{
          ...(one(sp.perPage) ? { perPage: String(data.perPage) } : {}),
          ...(show !== 'newest' ? { show } : {}),
        }}
      />
    </div>
  );
}
