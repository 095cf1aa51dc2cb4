import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { tagPage } from '@/lib/questions/tags';
import { listPageSchema } from '@/lib/validation/list-page';
import { QuestionList } from '@/components/QuestionList';
import { ListPager } from '@/components/questions/ListPager';
import { readUnitPreference } from '@/lib/units/server';

type Props = { params: Promise<{ tag: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  return { title: `Questions tagged ${(await params).tag}` };
}

export default async function TagPage({ params, searchParams }: Props) {
  const { tag } = await params;
  const sp = await searchParams;
  const one = (v: string | string[] | undefined) => (typeof v === 'string' ? v : undefined);
  const parsed = listPageSchema.safeParse({ page: one(sp.page), after: one(sp.after), before: one(sp.before) });
  if (!parsed.success || !/^[a-z0-9-]{2,40}$/.test(tag)) notFound();
  const [loaded, units] = await Promise.all([tagPage(tag, parsed.data), readUnitPreference()]);
  if (!loaded) notFound();
  const { tag: t, questions: data } = loaded;
  if ((data.page ?? 1) > data.totalPages || (data.page === null && data.items.length === 0)) notFound();
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">{t.name}</h1>
      {t.description ? <p className="cw-prose cw-muted">{t.description}</p> : null}
      <QuestionList items={data.items} units={units} />
      <ListPager data={data} basePath={`/tags/${tag}`} />
    </div>
  );
}
