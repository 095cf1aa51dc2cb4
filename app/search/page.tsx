import type { Metadata } from 'next';
import Link from 'next/link';
import { findQuestionsByText } from '@/lib/questions/find';
import { isDatabaseUnavailable } from '@/lib/db/errors';
import { ServiceUnavailable } from '@/components/ServiceUnavailable';

export const metadata: Metadata = { title: 'Search', robots: { index: false } };

export default async function SearchPage({ searchParams }: { searchParams: Promise<Record<string, string | string[]>> }) {
  const sp = await searchParams;
  const q = (typeof sp.q === 'string' ? sp.q : '').trim().slice(0, 200);
  let results: Awaited<ReturnType<typeof findQuestionsByText>> = [];
  if (q) {
    try {
      results = await findQuestionsByText(q);
    } catch (err) {
      if (isDatabaseUnavailable(err)) return <ServiceUnavailable what="search results" />;
      throw err;
    }
  }
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Search</h1>
      {!q ? (
        <p className="cw-muted">Type in the search box above: a symptom, a pipe size, a tag.</p>
      ) : results.length === 0 ? (
        <p className="cw-muted">
          Nothing matched “{q}”. Try fewer words, or{' '}
          <Link href="/questions" className="cw-link">
            browse the questions
          </Link>
          .
        </p>
      ) : (
        <ul className="flex flex-col gap-2">
          {results.map((r) => (
            <li key={r.id} className="cw-card">
              <span className="font-serif font-semibold">{r.title}</span>{' '}
              <span className="cw-muted cw-num text-sm">· {r.answerCount} answers</span>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
