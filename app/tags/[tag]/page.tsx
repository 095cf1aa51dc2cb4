import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { tagPage } from '@/lib/questions/tags';
import { paginationSchema } from '@/lib/validation/pagination';
import { QuestionList, Pager } from '@/components/QuestionList';
import { readUnitPreference } from '@/lib/units/server';

type Props = { params: Promise<{ tag: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  return { title: `Questions tagged ${(await params).tag}` };
}

export default async function TagPage({ params, searchParams }: Props) {
  const { tag } = await params;
  const sp = await searchParams;
  const parsed = paginationSchema.safeParse({ page: typeof sp.page === 'string' ? sp.page : undefined });
  if (!parsed.success || !/^[a-z0-9-]{2,40}$/.test(tag)) notFound();
  const [loaded, units] = await Promise.all([tagPage(tag, parsed.data), readUnitPreference()]);
  if (!loaded) notFound();
  const { tag: t, questions: data } = loaded;
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">{t.name}</h1>
      {t.description ? <p className="cw-prose cw-muted">{t.description}</p> : null}
      <QuestionList items={data.items} units={units} />
      <Pager page={data.page} totalPages={data.totalPages} basePath={`/tags/${tag}`} />
    </div>
  );
}
