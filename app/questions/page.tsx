import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { paginationSchema } from '@/lib/validation/pagination';
import { listQuestions, type QuestionPage } from '@/lib/questions/list';
import { isDatabaseUnavailable } from '@/lib/db/errors';
import { QuestionList, Pager } from '@/components/QuestionList';
import { ServiceUnavailable } from '@/components/ServiceUnavailable';

export const metadata: Metadata = {
  title: 'Questions',
  description: 'Questions from ram pump builders, with their measurements, and answers with the numbers.',
};

export default async function QuestionsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[]>> }) {
  const sp = await searchParams;
  const one = (v: string | string[] | undefined) => (typeof v === 'string' ? v : undefined);
  const parsed = paginationSchema.safeParse({ page: one(sp.page), perPage: one(sp.perPage) });
  if (!parsed.success) notFound();

  let data: QuestionPage;
  try {
    data = await listQuestions(parsed.data);
  } catch (err) {
    if (isDatabaseUnavailable(err)) return <ServiceUnavailable what="the questions" />;
    throw err;
  }
  if (parsed.data.page > data.totalPages) notFound();

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="font-serif text-3xl font-semibold">Questions</h1>
        <p className="cw-muted cw-num text-sm">{data.total} questions, newest first</p>
      </div>
      <QuestionList items={data.items} />
      <Pager
        page={data.page}
        totalPages={data.totalPages}
        basePath="/questions"
        query={one(sp.perPage) ? { perPage: String(data.perPage) } : {}}
      />
    </div>
  );
}
