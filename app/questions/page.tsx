import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { paginationSchema } from '@/lib/validation/pagination';
import Link from 'next/link';
import { listQuestions, type ListFilter } from '@/lib/questions/list';
import { currentUserInPage } from '@/lib/auth/session';
import { QuestionList, Pager } from '@/components/QuestionList';

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
  const parsed = paginationSchema.safeParse({ page: one(sp.page), perPage: one(sp.perPage) });
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
  const data = await listQuestions(parsed.data, filter);
  if (parsed.data.page > data.totalPages) notFound();

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="font-serif text-3xl font-semibold">Questions</h1>
        <p className="cw-muted cw-num text-sm">{data.total} questions, newest first</p>
        <Link href="/questions/ask" className="cw-button">
          Ask a question
        </Link>
      </div>
      <nav aria-label="Which questions" className="mb-4 flex flex-wrap gap-3 text-sm">
        {[
          ['newest', 'Newest'],
          ['unanswered', 'Unanswered'],
          ...(signedIn
            ? [
                ['mine', 'My questions'],
                ['followed', 'Followed'],
              ]
            : []),
        ].map(([k, label]) => (
          <Link
            key={k}
            href={k === 'newest' ? '/questions' : `/questions?show=${k}`}
            aria-current={show === k ? 'page' : undefined}
            className={show === k ? 'font-semibold' : 'cw-link'}
          >
            {label}
          </Link>
        ))}
      </nav>
      <QuestionList items={data.items} />
      <Pager
        page={data.page}
        totalPages={data.totalPages}
        basePath="/questions"
        query={{
          ...(one(sp.perPage) ? { perPage: String(data.perPage) } : {}),
          ...(show !== 'newest' ? { show } : {}),
        }}
      />
    </div>
  );
}
